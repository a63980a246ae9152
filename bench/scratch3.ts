import { loadCatalog } from '../src/catalogs/load.js';
import { readInputFile } from '../src/input/document.js';
import { readRequirements } from '../src/input/requirements.js';
import { runDesign } from '../src/spring/design.js';
const req = readRequirements(readInputFile(process.argv[2]), loadCatalog());
for (let i = 0; i < 3; i++) {
const r = runDesign(req, { strategy: process.argv[3] as 'grid' });
console.log(r.searchMs.toFixed(2), 'ms', r.cells, 'cells', r.result.evaluations, 'evals', r.result.feasibleCells, 'feasible', r.result.prunedCells, 'pruned', r.lp, r.gap);
if (i === 2) { console.log(r.result.cutBy); for (const c of r.candidates.slice(0, 5)) console.log(c.geometry, c.analysis.geometry.mass, Math.max(...c.checks)); }
}
