// source: none needed (properties of our own engine on a problem made up for the test).
// The two-objective genetic search returns the same result type as every other strategy: its front
// as the best list, the feasible cells it met as the cloud, and the counts, cuts, misses and stop
// reason that the grid and the single-objective search report.
import { describe, expect, it } from 'vitest';
import { geneticFront } from '../../src/search/geneticFront.js';
import type { Problem } from '../../src/search/problem.js';

/** Two integer variables and one solved one: a thinner "wire" a needs a wider y to carry the load
 * (g0 decreasing in y), more "coils" b allow a wider y (g1 increasing); cost (mostly a) against bulk
 * (mostly y): a thin wire is cheap and bulky. */
function twoObjectiveProblem(): Problem {
  return {
    name: 'two-objective test problem',
    variables: [
      { kind: 'list', name: 'a', values: Array.from({ length: 20 }, (_, i) => i + 1) },
      { kind: 'range', name: 'b', min: 1, max: 30, step: 1 },
      { kind: 'continuous', name: 'y', min: 0.5, max: 10, resolution: 0.01, solve: true },
    ],
    constraintNames: ['load', 'room'],
    objectiveNames: ['cost', 'bulk'],
    constraintTrend: Int8Array.of(-1, 1),
    objectiveTrend: Int8Array.of(1, 0),
    evaluate(x, g, f) {
      const [a, b, y] = x;
      g[0] = (5 - 0.3 * a * y) / 5;
      g[1] = (y - 0.5 * b) / 10;
      f[0] = a + 0.01 * y;
      f[1] = y + 0.01 * b;
    },
  };
}

describe('two-objective genetic search', () => {
  const p = twoObjectiveProblem();
  const run = () => geneticFront(p, { seed: 3, objectives: [0, 1], maxEvaluations: 20_000, populationSize: 20 });

  it('returns the common result: strategy, stop reason, counts and cuts keyed by check name', () => {
    const r = run();
    expect(r.strategy).toBe('genetic');
    expect(['budget', 'exhausted']).toContain(r.stoppedBy);
    expect(r.evaluations).toBeGreaterThan(0);
    expect(r.cells).toBeGreaterThan(0);
    expect(Object.keys(r.cutBy)).toEqual(p.constraintNames);
    // Every combination it met is either feasible or cut by one check.
    expect(Object.values(r.cutBy).reduce((a, b) => a + b, 0) + r.feasibleCells).toBe(r.cells);
    expect(r.cloud!.size).toBe(r.feasibleCells);
  });

  it('its best list is a front: feasible points, none dominating another, in the order of the first objective', () => {
    const r = run();
    expect(r.best.length).toBeGreaterThan(2);
    const g = new Float64Array(2);
    const f = new Float64Array(2);
    for (const q of r.best) {
      p.evaluate(q.x, g, f);
      expect(Math.max(...g)).toBeLessThanOrEqual(0);
      expect(Array.from(f)).toEqual(Array.from(q.f));
    }
    for (let i = 1; i < r.best.length; i++) expect(r.best[i].f[0]).toBeGreaterThanOrEqual(r.best[i - 1].f[0]);
    for (const u of r.best)
      for (const v of r.best) {
        if (u !== v) expect(u.f[0] <= v.f[0] && u.f[1] <= v.f[1] && (u.f[0] < v.f[0] || u.f[1] < v.f[1])).toBe(false);
      }
  });

  it('the same seed gives the same result', () => {
    const a = run();
    const b = run();
    expect(a.best.map((q) => Array.from(q.f))).toEqual(b.best.map((q) => Array.from(q.f)));
    expect(a.evaluations).toBe(b.evaluations);
  });
});
