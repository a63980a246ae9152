import { tensionCompressionProblem } from './problems/tensionCompression.js';
import { gridSearch } from '../src/search/grid.js';
const p = tensionCompressionProblem();
for (const [d0, D0, rd] of [[0.05226, 0.37061, 0.0001], [0.0517, 0.3567, 0.00005]]) {
const q = { ...p, variables: [
  { kind: 'continuous' as const, name: 'd', min: d0 - 4*rd, max: d0 + 4*rd, resolution: rd },
  { kind: 'continuous' as const, name: 'D', min: D0 - 100*rd, max: D0 + 100*rd, resolution: 25*rd }, p.variables[2]] };
const r = gridSearch(q, { top: 3 });
console.log(r.best.map(b => [...b.x, b.f[0]]), r.cutBy, r.cells, r.feasibleCells, r.prunedCells);
}
