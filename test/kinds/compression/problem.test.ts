// The spring problem's own promises to the engine (each check is a property, no outside values):
// declared trends hold, and bracket bounds are true lower bounds.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readInputFile } from '../../../src/input/document.js';
import { readRequirements } from '../../../src/kinds/compression/requirements.js';
import { gridSearch } from '../../../src/search/grid.js';
import { TREND, valueAt, valueCount } from '../../../src/search/problem.js';
import { CHECKS } from '../../../src/kinds/compression/verify.js';
import { runDesign } from '../../../src/kinds/compression/design.js';
import { buildSpringProblem } from '../../../src/kinds/compression/problem.js';

const catalog = loadCatalog();

const problemArb = fc
  .record({
    force: fc.double({ min: 5, max: 150, noNaN: true }),
    length: fc.double({ min: 20, max: 80, noNaN: true }),
    stroke: fc.double({ min: 0.1, max: 0.5, noNaN: true }),
    rise: fc.option(fc.double({ min: 1.2, max: 2.5, noNaN: true })),
    tolerance: fc.constantFrom(0.02, 0.1),
    material: fc.constantFrom('music-wire', 'stainless-302', 'phosphor-bronze'),
    seating: fc.constantFrom('fixed-fixed', 'fixed-pivoted', 'pivoted-pivoted', 'fixed-free'),
    criterion: fc.constantFrom('gerber', 'goodman', 'sines'),
    peened: fc.boolean(),
    ends: fc.constantFrom('squared-ground', 'plain'),
    solidSafe: fc.boolean(),
    cycles: fc.constantFrom(undefined, 1e6),
  })
  .map((r) => ({
    units: 'si',
    material: r.material,
    ends: r.ends,
    seating: r.seating,
    fatigue_criterion: r.criterion,
    peened: r.peened,
    load: { force: r.force, length: r.length },
    operating_length: r.length * (1 - r.stroke),
    ...(r.rise !== null ? { operating_force: r.force * r.rise, load_tolerance: r.tolerance } : {}),
    envelope: { max_outer_diameter: 30, min_inner_diameter: 3, max_free_length: r.length * 3 },
    solid_safe: r.solidSafe,
    forcing_frequency: 20,
    ...(r.cycles ? { cycles: r.cycles } : {}),
  }));

const build = (doc: Record<string, unknown>) => buildSpringProblem(readRequirements(doc, catalog));

describe('spring problem', () => {
  it('every check declared monotone in the mean diameter is monotone', () => {
    fc.assert(
      fc.property(problemArb, fc.nat(), fc.nat(), (doc, a, b) => {
        const p = build(doc);
        const x = new Float64Array(4);
        x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
        x[1] = 0;
        x[2] = valueAt(p.variables[2], b % valueCount(p.variables[2]));
        const d = p.stock[x[0]].wireDiameter;
        const g = new Float64Array(CHECKS.length);
        const f = new Float64Array(p.objectiveNames.length);
        let prev: Float64Array | null = null;
        for (let c = 4; c <= 12; c += 0.25) {
          x[3] = c * d;
          p.evaluate(x, g, f);
          if (prev) {
            CHECKS.forEach((_, j) => {
              if (g[j] === -1 || prev![j] === -1) return;
              if (p.constraintTrend![j] === TREND.increasing) expect(g[j]).toBeGreaterThanOrEqual(prev![j] - 1e-12);
              if (p.constraintTrend![j] === TREND.decreasing) expect(g[j]).toBeLessThanOrEqual(prev![j] + 1e-12);
            });
          }
          prev = Float64Array.from(g);
        }
      }),
      { numRuns: 60, seed: 2 },
    );
  });

  it('bracket bounds never exceed the checks anywhere in the bracket', () => {
    fc.assert(
      fc.property(
        problemArb,
        fc.nat(),
        fc.nat(),
        fc.double({ min: 4, max: 11, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (doc, a, b, c0, w) => {
          const p = build(doc);
          const x = new Float64Array(4);
          x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
          x[2] = valueAt(p.variables[2], b % valueCount(p.variables[2]));
          const d = p.stock[x[0]].wireDiameter;
          const lo = c0 * d;
          const hi = lo * (1 + w);
          const lower = new Float64Array(CHECKS.length).fill(-Infinity);
          p.bracketBounds!(x, lo, hi, lower);
          const g = new Float64Array(CHECKS.length);
          const f = new Float64Array(p.objectiveNames.length);
          for (let t = 0; t <= 20; t++) {
            x[3] = lo + ((hi - lo) * t) / 20;
            p.evaluate(x, g, f);
            CHECKS.forEach((_, j) => {
              if (g[j] !== -1) expect(lower[j]).toBeLessThanOrEqual(g[j] + 1e-12);
            });
          }
        },
      ),
      { numRuns: 200, seed: 4 },
    );
  });
});

describe('spring problem: the objective ceiling', () => {
  it('past the ceiling of a bound, the ranked quantity is at least that bound, for every rank key (property)', () => {
    fc.assert(
      fc.property(
        problemArb,
        fc.constantFrom('mass', 'wire_volume', 'outer_diameter', 'free_length', 'safety_factor'),
        fc.nat(),
        fc.nat(),
        fc.nat(),
        fc.double({ min: 4, max: 12, noNaN: true }),
        fc.double({ min: 1e-9, max: 0.5, noNaN: true }),
        (doc, rank, a, e, b, c, over) => {
          const p = build({ ...doc, rank, ends: ['plain', 'squared-ground', 'plain-ground'], direct_shear_rate: true });
          const x = new Float64Array(4);
          x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
          x[1] = e % p.ends.length;
          x[2] = valueAt(p.variables[2], b % valueCount(p.variables[2]));
          x[3] = c * p.stock[x[0]].wireDiameter;
          const g = new Float64Array(CHECKS.length);
          const f = new Float64Array(p.objectiveNames.length);
          p.evaluate(x, g, f);
          // This point's value is below the bound f (1 + over): the ceiling must not fall short of it.
          expect(p.objectiveCeiling!(x, f[0] * (1 + over))).toBeGreaterThanOrEqual(x[3]);
          // And a bound at its value puts the ceiling at or below it, up to rounding (the ceiling is an
          // upper estimate for the free length, whose rate here carries the direct-shear term).
          if (rank === 'mass' || rank === 'wire_volume' || rank === 'outer_diameter')
            expect(p.objectiveCeiling!(x, f[0])).toBeLessThanOrEqual(x[3] * (1 + 1e-12));
        },
      ),
      { numRuns: 300, seed: 5 },
    );
  });
});

/** Every mean diameter of the index range (41 points) fails some check for this stock item, end type
 * and coil-count index. */
function expectNoFeasibleDiameter(p: ReturnType<typeof build>, item: number, e: number, n: number): void {
  const d = p.stock[item].wireDiameter;
  const g = new Float64Array(CHECKS.length);
  const f = new Float64Array(p.objectiveNames.length);
  const [cMin, cMax] = p.req.index;
  for (let t = 0; t <= 40; t++) {
    p.evaluate(Float64Array.of(item, e, valueAt(p.variables[2], n), d * (cMin + ((cMax - cMin) * t) / 40)), g, f);
    expect(Math.max(...g)).toBeGreaterThan(0);
  }
}

/** A run of coil counts from..to of one wire size and end type, picked by four numbers. */
function runOf(p: ReturnType<typeof build>, a: number, e0: number, n1: number, n2: number): { x: Float64Array; from: number; to: number } {
  const x = new Float64Array(4);
  x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
  x[1] = e0 % p.ends.length;
  const count = valueCount(p.variables[2]);
  return { x, from: Math.min(n1 % count, n2 % count), to: Math.max(n1 % count, n2 % count) };
}

describe('spring problem in the search', () => {
  it('a wire size the branch hint rules out has no feasible point anywhere under it (property)', () => {
    let ruledOut = 0;
    fc.assert(
      fc.property(problemArb, fc.nat(), fc.constantFrom(1, 2), fc.nat(), (doc, a, depth, e0) => {
        const p = build({ ...doc, ends: ['plain', 'squared-ground'] });
        const x = new Float64Array(4);
        x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
        x[1] = e0 % p.ends.length;
        const j = p.branchInfeasible!(x, depth);
        if (j < 0) return;
        ruledOut++;
        for (let e = 0; e < p.ends.length; e++) {
          if (depth >= 2 && e !== x[1]) continue;
          for (let n = 0; n < valueCount(p.variables[2]); n += 3) expectNoFeasibleDiameter(p, x[0], e, n);
        }
      }),
      { numRuns: 150, seed: 9 },
    );
    expect(ruledOut).toBeGreaterThan(10);
  });

  it('a run of coil counts the range hint rules out has no feasible point anywhere in it (property)', () => {
    let ruledOut = 0;
    fc.assert(
      fc.property(problemArb, fc.nat(), fc.nat(), fc.nat(), fc.nat(), (doc, a, e0, n1, n2) => {
        const p = build({ ...doc, ends: ['plain', 'squared-ground'] });
        const { x, from, to } = runOf(p, a, e0, n1, n2);
        const j = p.rangeInfeasible!(x, 2, from, to);
        if (j < 0) return;
        ruledOut++;
        for (let n = from; n <= to; n += Math.max(1, Math.floor((to - from) / 8))) expectNoFeasibleDiameter(p, x[0], x[1], n);
      }),
      { numRuns: 200, seed: 10 },
    );
    expect(ruledOut).toBeGreaterThan(20);
  });

  it('the run bound is a lower bound of the ranked quantity at every feasible point of its run, and Infinity only where none is (property)', () => {
    let bounded = 0;
    let empty = 0;
    fc.assert(
      fc.property(
        problemArb,
        fc.constantFrom('mass', 'wire_volume', 'outer_diameter', 'free_length'),
        fc.nat(),
        fc.nat(),
        fc.nat(),
        fc.nat(),
        (doc, rank, a, e0, n1, n2) => {
          const p = build({ ...doc, rank, ends: ['plain', 'squared-ground'] });
          const { x, from, to } = runOf(p, a, e0, n1, n2);
          const bound = p.rangeLowerBound!(x, 2, from, to);
          if (bound === Infinity) empty++;
          const d = p.stock[x[0]].wireDiameter;
          const g = new Float64Array(CHECKS.length);
          const f = new Float64Array(p.objectiveNames.length);
          const [cMin, cMax] = p.req.index;
          for (let n = from; n <= to; n += Math.max(1, Math.floor((to - from) / 6))) {
            x[2] = valueAt(p.variables[2], n);
            for (let t = 0; t <= 400; t++) {
              x[3] = d * (cMin + ((cMax - cMin) * t) / 400);
              p.evaluate(x, g, f);
              if (Math.max(...g) > 0) continue;
              bounded++;
              expect(bound).toBeLessThanOrEqual(f[0]);
            }
          }
        },
      ),
      { numRuns: 200, seed: 12 },
    );
    expect(bounded).toBeGreaterThan(100);
    expect(empty).toBeGreaterThan(20);
  });

  it('the interval bounds, the replayed brackets and the objective ceiling change nothing but the work: the same springs with and without them, for every rank key and per wire (property)', () => {
    fc.assert(
      fc.property(
        problemArb,
        fc.constantFrom('mass', 'wire_volume', 'outer_diameter', 'free_length'),
        fc.constantFrom(1, 5),
        fc.boolean(),
        (doc, rank, top, perWire) => {
          const p = build({ ...doc, coil_step: 0.5, rank, ends: ['plain', 'squared-ground'] });
          const opts = { top, bestPerValueOf: perWire ? 0 : undefined };
          const on = gridSearch(p, opts);
          const off = gridSearch(p, { ...opts, narrowing: false });
          const points = (r: ReturnType<typeof gridSearch>) => r.best.map((b) => [...Array.from(b.x), ...Array.from(b.f)]);
          expect(points(on)).toEqual(points(off));
          // (A search that finds nothing pays a second, full pass for its diagnostics.)
          if (on.best.length) expect(on.evaluations).toBeLessThanOrEqual(off.evaluations);
        },
      ),
      { numRuns: 25, seed: 11 },
    );
  });

  it('a reported spring never shows a positive check (the demo: its best springs sit exactly at the top of the load band)', () => {
    // With a feasibility tolerance of 1e-9, the lightest spring was reported with operating_force_max at +9.5e-10.
    const req = readRequirements(readInputFile('examples/washer-trigger.yaml'), catalog);
    const run = runDesign(req, { strategy: 'grid' });
    expect(run.candidates.length).toBeGreaterThan(0);
    for (const c of run.candidates) for (const v of c.checks) expect(v).toBeLessThanOrEqual(0);
  });
});
