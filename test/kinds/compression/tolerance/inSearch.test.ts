// min_yield inside the search: the yield check of the compression problem, judged by the first-order
// estimate for candidates that pass every other check. Properties of our own model (no outside values):
// the search agrees with the exhaustive reference over the whole feasible cloud (src/kinds/compression/tolerance/robust.ts),
// a higher min_yield never buys a lighter spring, and the Monte Carlo that confirms the reported
// springs gives the same verdicts by the fast checks as by the full analysis.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { readRequirements, type Requirements } from '../../../../src/kinds/compression/requirements.js';
import { CHECK, activeChecks } from '../../../../src/kinds/compression/verify.js';
import { runDesign } from '../../../../src/kinds/compression/design.js';
import { Objective } from '../../../../src/kinds/compression/objectives.js';
import { loadToleranceCatalog } from '../../../../src/kinds/compression/tolerance/catalog.js';
import { candidateYield, confirmRun, designedSpring } from '../../../../src/kinds/compression/tolerance/confirm.js';
import { yieldChecks } from '../../../../src/kinds/compression/tolerance/madeSpring.js';
import { standardDeviations } from '../../../../src/kinds/compression/tolerance/model.js';
import { monteCarloYield } from '../../../../src/kinds/compression/tolerance/monteCarlo.js';
import { bestReaching, cloudYields, collectingRun } from '../../../../src/kinds/compression/tolerance/robust.js';
import { analysisEvaluator, designedTolerances, fastEvaluator, nominalQuantities } from '../../../../src/kinds/compression/tolerance/springYield.js';
import { catalog } from './specs.js';

const tc = loadToleranceCatalog();
const demoDoc = parse(readFileSync('examples/washer-trigger.yaml', 'utf8')) as Record<string, unknown>;
const demo = (extra: Record<string, unknown> = {}) => readRequirements({ ...demoDoc, ...extra }, catalog);

// Scenarios of our own (invented for these tests): a cabinet-door soft-close return spring in music
// wire, and a guided pump-valve spring in chrome-silicon with a tight force band.
const DOOR = {
  units: 'si',
  material: 'music-wire',
  load: { force: 8, length: 30 },
  operating_length: 22,
  operating_force: 14,
  load_tolerance: '8%',
  envelope: { max_outer_diameter: 12, max_free_length: 48 },
  cycles: 2e5,
  top: 3,
};
const VALVE = {
  units: 'si',
  material: 'chrome-silicon',
  ends: ['squared-ground', 'squared'],
  load: { force: 120, length: 40 },
  operating_length: 31,
  operating_force: 190,
  load_tolerance: '4%',
  envelope: { max_outer_diameter: 22, min_inner_diameter: 11 },
  cycles: 1e7,
  guided: true,
  top: 3,
};

describe('reading tolerance_grade, tolerances and min_yield', () => {
  it('defaults to grade 2 with no overrides and no min_yield: the yield check is off', () => {
    const req = demo();
    expect(req.tolerance).toEqual({ grade: 2, overrides: {} });
    expect(req.minYield).toBeUndefined();
    expect(activeChecks(req)[CHECK.yield]).toBe(false);
  });

  it('reads all three, and turns the yield check on with min_yield', () => {
    const req = demo({ tolerance_grade: 1, min_yield: '99%', tolerances: { wire_diameter: '0.02 mm', active_coils: 0.5 } });
    expect(req.tolerance.grade).toBe(1);
    expect(req.tolerance.overrides.wire_diameter).toEqual({ absolute: 0.02 });
    expect(req.tolerance.overrides.active_coils).toEqual({ absolute: 0.5 });
    expect(req.minYield).toBeCloseTo(0.99, 12);
    expect(activeChecks(req)[CHECK.yield]).toBe(true);
  });

  it('refuses a min_yield of 1 and an unknown tolerance, naming the field', () => {
    expect(() => demo({ min_yield: 1 })).toThrow(/min_yield/);
    expect(() => demo({ tolerances: { pitch: 0.1 } })).toThrow(/tolerances\.pitch/);
  });
});

/** The in-search best and the reference's best of the same requirements at min_yield y. */
function both(base: Requirements, minYield: number) {
  const req: Requirements = { ...base, minYield, top: 1 };
  const searched = runDesign(req).candidates[0] ?? null;
  const run = collectingRun(base);
  const i = bestReaching(run, cloudYields(run, tc, base.tolerance), minYield);
  return {
    req,
    searched,
    referenceMass: i >= 0 ? run.result.cloud!.f(i)[Objective.mass] : null,
    referenceX: i >= 0 ? Array.from(run.result.cloud!.x(i)) : null,
  };
}

describe('the in-search yield check agrees with the exhaustive reference (robust.ts)', () => {
  for (const [name, base] of [
    ['demo', demo()],
    ['door closer', readRequirements(DOOR, catalog)],
    ['pump valve', readRequirements(VALVE, catalog)],
  ] as const) {
    it(`${name}: same wire, end type and coil count; mean diameter within two scan steps; estimate at min_yield or above`, () => {
      for (const minYield of [0.9, 0.99]) {
        const { req, searched, referenceMass, referenceX } = both(base, minYield);
        expect(searched === null).toBe(referenceMass === null);
        if (!searched || referenceMass === null || !referenceX) continue;
        const decodedRef = runDesign({ ...req, top: 1 }).problem.decode(Float64Array.from(referenceX));
        expect(searched.item).toEqual(decodedRef.item);
        expect(searched.geometry.ends).toBe(decodedRef.geometry.ends);
        expect(searched.geometry.activeCoils).toBe(decodedRef.geometry.activeCoils);
        // The reference walks the scan grid; the search refines the first feasible step downwards.
        expect(Math.abs(searched.geometry.meanDiameter - decodedRef.geometry.meanDiameter)).toBeLessThanOrEqual(2 * req.diameterResolution + 1e-9);
        expect(searched.objectives[Objective.mass]).toBeLessThanOrEqual(referenceMass * (1 + 1e-3));
        expect(candidateYield(searched, req, tc).estimate).toBeGreaterThanOrEqual(minYield);
      }
    }, 60_000);
  }
});

describe('raising min_yield never lowers the best mass (property)', () => {
  it('over the demo, with random pairs of min_yield and tolerance grades', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 0.995, noNaN: true }),
        fc.double({ min: 0.05, max: 0.995, noNaN: true }),
        fc.constantFrom(1, 2, 3),
        (a, b, grade) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          const best = (y: number) => runDesign(demo({ min_yield: y, tolerance_grade: grade, top: 1 })).candidates[0]?.objectives[Objective.mass] ?? Infinity;
          const nominal = runDesign(demo({ top: 1 })).candidates[0].objectives[Objective.mass];
          const mLo = best(lo);
          expect(mLo).toBeGreaterThanOrEqual(nominal);
          expect(best(hi)).toBeGreaterThanOrEqual(mLo);
        },
      ),
      { numRuns: 12 },
    );
  }, 120_000);
});

describe('confirming the reported springs by the Monte Carlo', () => {
  it('the fast checks and the full analysis count the same sampled springs as passing (same seed)', () => {
    const req = demo();
    for (const c of runDesign({ ...req, top: 3 }).candidates) {
      const s = designedSpring(c);
      const sigma = standardDeviations(designedTolerances(tc, req.tolerance, s, req));
      const nominal = nominalQuantities(s, req);
      const fast = monteCarloYield(fastEvaluator(s, req), nominal, sigma, yieldChecks(req), { seed: 7, samples: 2000 });
      const full = monteCarloYield(analysisEvaluator(s, req), nominal, sigma, yieldChecks(req), { seed: 7, samples: 2000 });
      expect(fast).toEqual(full);
    }
  }, 60_000);

  it('without min_yield every spring is listed with its yield at grade 2; the edge spring of the demo makes under half', () => {
    const run = confirmRun(runDesign(demo({ top: 3, variants: true })), tc, 5000);
    expect(run.candidates).toHaveLength(3);
    expect(run.refused).toEqual([]);
    expect(run.yields![0].monteCarlo.yield).toBeLessThan(0.5);
    expect(run.yields![0].limiting).toBe('operating_force_max');
    expect(run.yields![0].tolerances.grade).toBe(2);
  });

  it('with min_yield 0.99 the listed springs are confirmed within their standard error, or refused and moved out', () => {
    const run = confirmRun(runDesign(demo({ min_yield: 0.99, top: 5, variants: true })), tc);
    for (const y of run.yields!) expect(y.monteCarlo.yield).toBeGreaterThanOrEqual(0.99 - y.monteCarlo.standardError);
    for (const r of run.refused!) expect(r.yield.monteCarlo.yield).toBeLessThan(0.99 - r.yield.monteCarlo.standardError);
    expect(run.candidates.length + run.refused!.length).toBe(5);
  }, 60_000);

  it('the same seed gives the same figures', () => {
    const a = confirmRun(runDesign(demo({ top: 2 })), tc, 3000).yields!.map((y) => y.monteCarlo.yield);
    const b = confirmRun(runDesign(demo({ top: 2 })), tc, 3000).yields!.map((y) => y.monteCarlo.yield);
    expect(a).toEqual(b);
  });
});
