// Robust design over the demo's whole feasible cloud: the reference the in-search yield test must
// agree with. Each check is a property of our own model (no outside values).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { readRequirements } from '../../../../src/kinds/compression/requirements.js';
import { candidateAt } from '../../../../src/kinds/compression/design.js';
import { Objective } from '../../../../src/kinds/compression/objectives.js';
import { loadToleranceCatalog } from '../../../../src/kinds/compression/tolerance/catalog.js';
import { bestReaching, cloudYields, collectingRun } from '../../../../src/kinds/compression/tolerance/robust.js';
import { springYield } from '../../../../src/kinds/compression/tolerance/springYield.js';
import { catalog } from './specs.js';

const tc = loadToleranceCatalog();
const req = readRequirements(parse(readFileSync('examples/washer-trigger.yaml', 'utf8')), catalog);
const run = collectingRun(req);
const yields = cloudYields(run, tc, { grade: 2, overrides: {} });
const massAt = (i: number) => run.result.cloud!.f(i)[Objective.mass];

describe('robust design on the demo (grade 2)', () => {
  it('the nominal best is the lightest of the cloud and its yield is far below 0.99', () => {
    const i = bestReaching(run, yields, 0);
    expect(massAt(i)).toBeCloseTo(run.candidates[0].objectives[Objective.mass], 12);
    expect(yields[i]).toBeLessThan(0.6);
  });

  it('raising min_yield never lowers the best mass', () => {
    let last = 0;
    for (const minYield of [0, 0.5, 0.8, 0.9, 0.95, 0.99, 0.995, 0.999]) {
      const i = bestReaching(run, yields, minYield);
      if (i < 0) {
        last = Infinity;
        continue;
      }
      expect(massAt(i)).toBeGreaterThanOrEqual(last);
      last = massAt(i);
    }
  });

  it('the robust best at 99% is confirmed by the Monte Carlo within four standard errors, and passes every check nominally', () => {
    const i = bestReaching(run, yields, 0.99);
    expect(i).toBeGreaterThanOrEqual(0);
    const c = candidateAt(run.problem, run.result.cloud!.x(i), Float64Array.from(run.result.cloud!.f(i)));
    expect(Math.max(...c.checks)).toBeLessThanOrEqual(0);
    const y = springYield(tc, { grade: 2, overrides: {} }, { geometry: c.geometry, figures: c.item.figures, material: c.item.choice.material }, req, {
      samples: 40_000,
    });
    expect(y.estimate).toBeGreaterThanOrEqual(0.99);
    expect(Math.abs(y.estimate - y.monteCarlo.yield)).toBeLessThan(4 * y.monteCarlo.standardError);
    expect(c.analysis.geometry.mass).toBeGreaterThan(run.candidates[0].analysis.geometry.mass);
  }, 60_000);
});
