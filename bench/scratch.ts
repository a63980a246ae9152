import { gridSearch } from '../src/search/grid.js';
import { geneticSearch } from '../src/search/genetic.js';
import { sandgrenProblem } from './problems/sandgren.js';
import { tensionCompressionProblem } from './problems/tensionCompression.js';
let t = performance.now();
const r = gridSearch(sandgrenProblem(), { top: 3 });
console.log('sandgren grid', performance.now() - t, r.best.map(b => [...b.x, b.f[0]]), r.evaluations, r.cells, r.feasibleCells, r.prunedCells);
t = performance.now();
const r2 = gridSearch(tensionCompressionProblem(), { top: 1, refine: 40 });
console.log('tc grid', performance.now() - t, r2.best.map(b => [...b.x, b.f[0]]), r2.evaluations, r2.cells);
let hits = 0;
for (let seed = 1; seed <= 20; seed++) {
  const g = geneticSearch(sandgrenProblem(), { seed, maxEvaluations: r.evaluations * 0.1 });
  if (g.best.length && g.best[0].f[0] <= 2.658559 * 1.005) hits++;
}
console.log('sandgren ga hits', hits, '/20');
