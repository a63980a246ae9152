// One cold search in a fresh process, for instruction counts (bench/search.ts runs it under valgrind's
// callgrind): read a requirements file, build its problem, run the grid once as `design` runs it (the
// default grouped list collects every feasible cell, unpruned), print what it found.
// With --stop-before-search the process does everything but the search, so that the difference of the
// two counts is the search phase's own, start-up and JIT warm-up of the search code included.
// usage: node dist/bench/coldProbe.js <requirements.yaml> [--stop-before-search]
import { loadCatalog } from '../src/catalogs/load.js';
import { readInputFile } from '../src/input/document.js';
import { buildSpringProblem } from '../src/kinds/compression/problem.js';
import { readRequirements } from '../src/kinds/compression/requirements.js';
import { gridSearch } from '../src/search/grid.js';

const [file, flag] = process.argv.slice(2);
const req = readRequirements(readInputFile(file), loadCatalog());
const problem = buildSpringProblem(req);
if (flag !== '--stop-before-search') {
  const r = gridSearch(problem, { top: req.top, collectAll: req.bestPerWire, maxScanPoints: 40 });
  process.stdout.write(JSON.stringify({ evaluations: r.evaluations, boundCalls: r.boundCalls, best: r.best.map((b) => Array.from(b.x)) }) + '\n');
}
