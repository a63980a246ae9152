// The cost of robust design (issue 9): the demo designed without and with min_yield 0.99 (grade 2),
// evaluations and time measured in the same run, interleaved, as ratios; and the Monte Carlo's
// samples per second, through the allocation-free made-spring checks and through the full analysis.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { loadCatalog } from '../src/catalogs/load.js';
import { readRequirements } from '../src/kinds/compression/requirements.js';
import { runDesign } from '../src/kinds/compression/design.js';
import { loadToleranceCatalog } from '../src/kinds/compression/tolerance/catalog.js';
import { designedSpring } from '../src/kinds/compression/tolerance/confirm.js';
import { yieldChecks } from '../src/kinds/compression/tolerance/madeSpring.js';
import { standardDeviations } from '../src/kinds/compression/tolerance/model.js';
import { monteCarloYield } from '../src/kinds/compression/tolerance/monteCarlo.js';
import { analysisEvaluator, designedTolerances, fastEvaluator, nominalQuantities } from '../src/kinds/compression/tolerance/springYield.js';

const catalog = loadCatalog();
const tc = loadToleranceCatalog();
const doc = parse(readFileSync('examples/washer-trigger.yaml', 'utf8')) as Record<string, unknown>;
const nominalReq = readRequirements(doc, catalog);
const robustReq = readRequirements({ ...doc, min_yield: 0.99 }, catalog);

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ms = (f: () => void) => {
  const t = performance.now();
  f();
  return performance.now() - t;
};

// Warm both paths, then interleave the timed runs so that a busy machine slows both alike.
runDesign(nominalReq);
runDesign(robustReq);
const tNominal: number[] = [];
const tRobust: number[] = [];
for (let i = 0; i < 9; i++) {
  tNominal.push(ms(() => runDesign(nominalReq, { skipBound: true })));
  tRobust.push(ms(() => runDesign(robustReq, { skipBound: true })));
}
const nominal = runDesign(nominalReq);
const robust = runDesign(robustReq);
const mass = (r: typeof nominal) => r.candidates[0].analysis.geometry.mass * 1000;

const best = nominal.candidates[0];
const spring = designedSpring(best);
const sigma = standardDeviations(designedTolerances(tc, nominalReq.tolerance, spring, nominalReq));
const q = nominalQuantities(spring, nominalReq);
const include = yieldChecks(nominalReq);
const rate = (evaluate: Parameters<typeof monteCarloYield>[0], samples: number) => {
  monteCarloYield(evaluate, q, sigma, include, { seed: 1, samples: Math.min(samples, 2000) });
  const times: number[] = [];
  for (let i = 0; i < 3; i++) times.push(ms(() => monteCarloYield(evaluate, q, sigma, include, { seed: i + 1, samples })));
  return samples / (median(times) / 1000);
};
const fastRate = rate(fastEvaluator(spring, nominalReq), 200_000);
const fullRate = rate(analysisEvaluator(spring, nominalReq), 20_000);

const say = (s: string) => process.stdout.write(s + '\n');
say('## Robust design (min_yield) and the Monte Carlo');
say('');
say(
  `Demo (examples/washer-trigger.yaml), grid, medians of 9 interleaved runs without the LP bound, load average ${(await import('node:os')).loadavg()[0].toFixed(1)}:`,
);
say(`- nominal: ${nominal.result.evaluations.toLocaleString('en-US')} evaluations, ${median(tNominal).toFixed(1)} ms; best ${mass(nominal).toFixed(2)} g`);
say(
  `- min_yield 0.99 (grade 2): ${robust.result.evaluations.toLocaleString('en-US')} evaluations (${(robust.result.evaluations / nominal.result.evaluations).toFixed(2)}x), ${median(tRobust).toFixed(1)} ms (${(median(tRobust) / median(tNominal)).toFixed(2)}x); best ${mass(robust).toFixed(2)} g (+${((mass(robust) / mass(nominal) - 1) * 100).toFixed(1)}% mass). The yield estimate runs only for candidates that pass every other check.`,
);
say(
  `- Monte Carlo, samples per second: ${Math.round(fastRate).toLocaleString('en-US')} through the allocation-free made-spring checks (what confirms every listed spring: 20,000 samples each), ${Math.round(fullRate).toLocaleString('en-US')} through the full single-spring analysis (${(fastRate / fullRate).toFixed(0)}x slower; the two count the same passes, test/tolerance/inSearch.test.ts).`,
);
