// The general engine on small problems of our own (each check is a property of the engine, no outside
// values): bracketing, scanning, pruning, archives, Pareto fronts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sandgrenProblem } from '../../bench/problems/sandgren.js';
import { TopK } from '../../src/search/archive.js';
import { CellMode, makeWorkspace, solveCell } from '../../src/search/cell.js';
import { gridSearch } from '../../src/search/grid.js';
import { dominates, paretoFront2 } from '../../src/search/pareto.js';
import { TREND, type Problem } from '../../src/search/problem.js';

/** Minimise c * (x + a) over integer c in 1..5 and continuous x in [0, 10], with x >= lo (decreasing
 * constraint), x <= hi (increasing) and a band (x - 4)^2 >= 1 of unknown trend. */
function toy(lo: number, hi: number): Problem {
  return {
    name: 'toy',
    variables: [
      { kind: 'range', name: 'c', min: 1, max: 5, step: 1 },
      { kind: 'continuous', name: 'x', min: 0, max: 10, resolution: 0.01, solve: true },
    ],
    constraintNames: ['low', 'high', 'band'],
    objectiveNames: ['f'],
    constraintTrend: Int8Array.from([TREND.decreasing, TREND.increasing, TREND.unknown]),
    objectiveTrend: Int8Array.from([TREND.increasing]),
    evaluate(x, g, f) {
      g[0] = (lo - x[1]) / 10;
      g[1] = (x[1] - hi) / 10;
      g[2] = 1 - (x[1] - 4) ** 2;
      f[0] = x[0] * (x[1] + 1);
    },
  };
}

/** Minimise x over x in [0, 10] at `resolution`, feasible where a band check of unknown trend holds:
 * |x - centre| >= half (with bracket bounds on it, exact over any interval), and x >= lo. */
function banded(centre: number, half: number, lo: number, resolution: number, withBounds = true): Problem {
  const p: Problem = {
    name: 'band',
    variables: [
      { kind: 'range', name: 'c', min: 1, max: 2, step: 1 },
      { kind: 'continuous', name: 'x', min: 0, max: 10, resolution, solve: true },
    ],
    constraintNames: ['low', 'band'],
    objectiveNames: ['f'],
    constraintTrend: Int8Array.from([TREND.decreasing, TREND.unknown]),
    objectiveTrend: Int8Array.from([TREND.increasing]),
    evaluate(x, g, f) {
      g[0] = (lo - x[1]) / 10;
      g[1] = (half - Math.abs(x[1] - centre)) / half;
      f[0] = x[0] * (x[1] + 1);
    },
  };
  if (withBounds) {
    // The distance to the centre over [a, b] is largest at one of its ends: the check is least there.
    p.bracketBounds = (_x, a, b, out) => {
      out[1] = (half - Math.max(Math.abs(a - centre), Math.abs(b - centre))) / half;
    };
  }
  return p;
}

/** Minimise c (x + 1) over c in 1..5 and x in [0, 10]: x must reach lo c / 3 (a decreasing check of
 * the given shape: linear, falling as 1 / x^3, or either held at -1 where it no longer binds, as an
 * inactive check is), stay out of the band |x - centre| < half (unknown trend) and below 9.5. With
 * `ceiling`, the problem says where c (x + 1) reaches a bound. */
function shaped(lo: number, shape: 'linear' | 'cubic' | 'floored', centre: number, half: number, ceiling: boolean): Problem {
  const p: Problem = {
    name: 'shaped',
    variables: [
      { kind: 'range', name: 'c', min: 1, max: 5, step: 1 },
      { kind: 'continuous', name: 'x', min: 0.1, max: 10, resolution: 0.01, solve: true },
    ],
    constraintNames: ['reach', 'inactive', 'room', 'band'],
    objectiveNames: ['f'],
    constraintTrend: Int8Array.from([TREND.decreasing, TREND.decreasing, TREND.increasing, TREND.unknown]),
    objectiveTrend: Int8Array.from([TREND.increasing]),
    evaluate(x, g, f) {
      const need = (lo * x[0]) / 3;
      const v = shape === 'cubic' ? (need / x[1]) ** 3 - 1 : (need - x[1]) / 10;
      g[0] = shape === 'floored' ? Math.max(-0.05, v) : v;
      g[1] = -1;
      g[2] = (x[1] - 9.5) / 10;
      g[3] = (half - Math.abs(x[1] - centre)) / half;
      f[0] = x[0] * (x[1] + 1);
    },
  };
  if (ceiling) {
    p.objectiveCeiling = (x, bound) => bound / x[0] - 1;
    // Values from..to of c need x at least lo c_from / 3, which the room check (x <= 9.5) may forbid.
    p.rangeInfeasible = (_x, v, from) => (v === 0 && (lo * (from + 1)) / 3 > 9.5 && shape !== 'floored' ? 0 : -1);
  }
  return p;
}

describe('grid and cell solver', () => {
  it('brackets to the exact boundary of the monotone checks', () => {
    const r = gridSearch(toy(2.345678, 9), { top: 1 });
    expect(r.best[0].x[0]).toBe(1);
    expect(r.best[0].x[1]).toBeCloseTo(2.345678, 7);
  });
  it('a reported point never shows a positive check: feasibility is g <= 0 exactly, with no tolerance', () => {
    // With a tolerance of 1e-9 on the normalised check, the bracket stopped 1e-8 below the limit here.
    const p = toy(2.345678, 9);
    const r = gridSearch(p, { top: 3 });
    const g = new Float64Array(3);
    for (const b of r.best) {
      p.evaluate(b.x, g, new Float64Array(1));
      for (const v of g) expect(v).toBeLessThanOrEqual(0);
    }
  });
  it('interval bounds rule out parts of the scan and change nothing but the work (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 9.5, noNaN: true }),
        fc.double({ min: 0.01, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.constantFrom(0.01, 0.003, 0.001),
        (centre, half, lo, res) => {
          const withBounds = gridSearch(banded(centre, half, lo, res), { top: 2 });
          const plain = gridSearch(banded(centre, half, lo, res, false), { top: 2 });
          const off = gridSearch(banded(centre, half, lo, res), { top: 2, narrowing: false });
          expect(withBounds.best.map((b) => Array.from(b.x))).toEqual(plain.best.map((b) => Array.from(b.x)));
          expect(off.best.map((b) => Array.from(b.x))).toEqual(plain.best.map((b) => Array.from(b.x)));
          // Only points a plain scan would reach are evaluated.
          expect(withBounds.evaluations).toBeLessThanOrEqual(plain.evaluations);
        },
      ),
      { numRuns: 200, seed: 7 },
    );
  });
  it('the boundary of the decreasing checks, bracketed and then replayed, is the one plain bisection finds; the objective ceiling stops a cell where it can no longer win, the range hint rules out the largest c; none changes anything but the work (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 20, noNaN: true }),
        fc.constantFrom('linear', 'cubic', 'floored') as fc.Arbitrary<'linear' | 'cubic' | 'floored'>,
        fc.double({ min: 0.5, max: 9.5, noNaN: true }),
        fc.double({ min: 0.01, max: 3, noNaN: true }),
        fc.integer({ min: 1, max: 4 }),
        (lo, shape, centre, half, top) => {
          const plain = gridSearch(shaped(lo, shape, centre, half, false), { top, narrowing: false });
          const replayed = gridSearch(shaped(lo, shape, centre, half, false), { top });
          const capped = gridSearch(shaped(lo, shape, centre, half, true), { top });
          const points = (r: ReturnType<typeof gridSearch>) => r.best.map((b) => [...Array.from(b.x), ...Array.from(b.f)]);
          expect(points(replayed)).toEqual(points(plain));
          expect(points(capped)).toEqual(points(plain));
          expect(capped.evaluations).toBeLessThanOrEqual(replayed.evaluations);
        },
      ),
      { numRuns: 300, seed: 12 },
    );
  });
  it('the replayed bracket of the decreasing checks costs fewer evaluations than plain bisection over many cells, and never many more in one', () => {
    let plainWork = 0;
    let replayedWork = 0;
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 9, noNaN: true }),
        fc.constantFrom('linear', 'cubic', 'floored') as fc.Arbitrary<'linear' | 'cubic' | 'floored'>,
        fc.integer({ min: 1, max: 5 }),
        (lo, shape, c) => {
          // No band (half 0): the cell's answer is the boundary itself.
          const p = shaped(lo, shape, 5, 1e-9, false);
          const solve = (replay: boolean) => {
            const ws = makeWorkspace(p);
            ws.replay = replay;
            const x = Float64Array.of(c, 0);
            const r = solveCell(p, 1, x, ws, CellMode.First, null, null);
            return { r, x: x[1], evaluations: ws.stats.evaluations };
          };
          const plain = solve(false);
          const replayed = solve(true);
          expect(replayed.r).toBe(plain.r);
          expect(replayed.x).toBe(plain.x);
          expect(replayed.evaluations).toBeLessThanOrEqual(plain.evaluations + 4);
          plainWork += plain.evaluations;
          replayedWork += replayed.evaluations;
        },
      ),
      { numRuns: 300, seed: 13 },
    );
    // A probe that misses can cost an evaluation more than bisection in a cell; over many, far fewer.
    // (Each cell also refines its answer to full precision, the same work in both.)
    expect(replayedWork).toBeLessThan(0.85 * plainWork);
  });
  it('with interval bounds, the work grows with the logarithm of the resolution, not linearly', () => {
    const work = (res: number) => {
      const r = gridSearch(banded(5, 2, 3.5, res), { top: 1 });
      return r.evaluations + (r.boundCalls ?? 0);
    };
    const coarse = work(0.01);
    expect(work(0.0001) / coarse).toBeLessThan(2);
    // Without bounds the scan walks the band at the resolution: 100 times finer, about 100 times the work.
    const plain = (res: number) => gridSearch(banded(5, 2, 3.5, res, false), { top: 1 }).evaluations;
    expect(plain(0.0001) / plain(0.01)).toBeGreaterThan(50);
  });
  it('scans past a band of unknown trend to the first feasible step', () => {
    const r = gridSearch(toy(3.5, 9), { top: 1 });
    // (x - 4)^2 >= 1 fails on (3, 5): the first feasible step from 3.5 is 5.
    expect(r.best[0].x[1]).toBeGreaterThanOrEqual(5);
    expect(r.best[0].x[1]).toBeLessThan(5.01);
  });
  it('reports an empty bracket as infeasible and counts what cut it', () => {
    const r = gridSearch(toy(6, 5), { top: 1 });
    expect(r.best).toHaveLength(0);
    expect(r.cutBy.low + r.cutBy.high).toBe(5);
  });
  it('branch pruning along the coil count changes nothing but the work (Sandgren problem)', () => {
    const withCut = gridSearch(sandgrenProblem(), { top: 5 });
    const without = gridSearch({ ...sandgrenProblem(), boundGrowsAlong: undefined }, { top: 5 });
    expect(withCut.best.map((b) => b.f[0])).toEqual(without.best.map((b) => b.f[0]));
    expect(withCut.evaluations).toBeLessThan(without.evaluations);
  });
});

describe('archives and fronts (property)', () => {
  it('TopK.offerOnce keeps a point once, at its better value, and the list sorted', () => {
    const top = new TopK(3, 2, 1);
    const same = (a: Float64Array, b: Float64Array) => a[0] === b[0];
    top.offerOnce(Float64Array.of(1, 0), Float64Array.of(5), same);
    top.offerOnce(Float64Array.of(2, 0), Float64Array.of(4), same);
    expect(top.offerOnce(Float64Array.of(1, 9), Float64Array.of(6), same)).toBe(false);
    expect(top.offerOnce(Float64Array.of(1, 7), Float64Array.of(3), same)).toBe(true);
    top.offerOnce(Float64Array.of(3, 0), Float64Array.of(8), same);
    expect(top.size).toBe(3);
    expect([0, 1, 2].map((i) => [top.x(i)[0], top.x(i)[1], top.f(i)[0]])).toEqual([
      [1, 7, 3],
      [2, 0, 4],
      [3, 0, 8],
    ]);
  });

  it('TopK keeps the k smallest, sorted', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { maxLength: 200 }), fc.integer({ min: 1, max: 20 }), (vals, k) => {
        const t = new TopK(k, 1, 1);
        for (const v of vals) t.offer(Float64Array.of(v), Float64Array.of(v));
        const want = [...vals].sort((a, b) => a - b).slice(0, k);
        expect(Array.from({ length: t.size }, (_, i) => t.f(i)[0])).toEqual(want);
      }),
    );
  });
  it('paretoFront2 returns exactly the non-dominated points', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 50 }), fc.integer({ min: 0, max: 50 })), { minLength: 1, maxLength: 120 }), (pts) => {
        const xs = pts.map((p) => p[0]);
        const ys = pts.map((p) => p[1]);
        const front = new Set(paretoFront2(xs, ys));
        pts.forEach((p, i) => {
          const dominated = pts.some((q) => dominates(q[0], q[1], p[0], p[1]));
          const duplicateKept = [...front].some((j) => xs[j] === p[0] && ys[j] === p[1]);
          if (front.has(i)) expect(dominated).toBe(false);
          else expect(dominated || duplicateKept).toBe(true);
        });
      }),
    );
  });
});
