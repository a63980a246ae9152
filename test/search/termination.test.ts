// Termination of the genetic searches as its own object: the budget bounds the work, and a proven lower
// bound stops a run as soon as its incumbent reaches it. Properties of our own engine; the Sandgren
// problem is the published benchmark of bench/problems/sandgren.ts (Sandgren 1990), whose optimum the
// exhaustive grid gives here, so that the grid's best is a proven bound over the same space.
import { describe, expect, it } from 'vitest';
import { sandgrenProblem } from '../../bench/problems/sandgren.js';
import { geneticSearch } from '../../src/search/genetic.js';
import { gridSearch } from '../../src/search/grid.js';
import { reachesBound, termination } from '../../src/search/termination.js';

describe('termination', () => {
  it('fills in the defaults and never lets an undefined setting through', () => {
    const t = termination({ maxEvaluations: 1000, stallGenerations: undefined });
    expect(t).toEqual({ maxEvaluations: 1000, stallGenerations: 30, stallEvaluations: Infinity, lowerBound: null, boundTolerance: 1e-3 });
  });

  it('an incumbent reaches the bound within the relative tolerance, and only then', () => {
    const t = termination({ maxEvaluations: 1, lowerBound: 2, boundTolerance: 1e-3 });
    expect(reachesBound(t, 2.002)).toBe(true);
    expect(reachesBound(t, 2.0021)).toBe(false);
    expect(reachesBound(termination({ maxEvaluations: 1 }), 0)).toBe(false);
    expect(reachesBound(t, Infinity)).toBe(false);
  });

  it('the genetic search stops on a proven bound, spending less than its budget, at a point within the tolerance', () => {
    const p = sandgrenProblem();
    const optimum = gridSearch(p, { top: 1 }).best[0].f[0];
    for (const seed of [1, 2, 3]) {
      const free = geneticSearch(p, { seed, maxEvaluations: 40_000, top: 1 });
      const bounded = geneticSearch(p, {
        seed,
        maxEvaluations: 40_000,
        top: 1,
        termination: termination({ maxEvaluations: 40_000, lowerBound: optimum, boundTolerance: 1e-3 }),
      });
      if (bounded.stoppedBy === 'bound') {
        expect(bounded.best[0].f[0]).toBeLessThanOrEqual(optimum * (1 + 1e-3));
        expect(bounded.evaluations).toBeLessThan(free.evaluations);
      }
      expect(bounded.evaluations).toBeLessThanOrEqual(40_000);
    }
    const stops = [1, 2, 3].map(
      (seed) => geneticSearch(p, { seed, maxEvaluations: 40_000, top: 1, termination: termination({ maxEvaluations: 40_000, lowerBound: optimum }) }).stoppedBy,
    );
    expect(stops.filter((r) => r === 'bound').length).toBeGreaterThanOrEqual(2);
  });

  it('a bound below every feasible point never stops a run early: the run is the one without it', () => {
    const p = sandgrenProblem();
    const optimum = gridSearch(p, { top: 1 }).best[0].f[0];
    const free = geneticSearch(p, { seed: 7, maxEvaluations: 20_000, top: 3 });
    const low = geneticSearch(p, { seed: 7, maxEvaluations: 20_000, top: 3, termination: termination({ maxEvaluations: 20_000, lowerBound: optimum * 0.9 }) });
    expect(low.stoppedBy).not.toBe('bound');
    expect(low.evaluations).toBe(free.evaluations);
    expect(low.best.map((b) => Array.from(b.f))).toEqual(free.best.map((b) => Array.from(b.f)));
  });
});

describe('termination on a stall', () => {
  it('a run that goes stallEvaluations without a better incumbent stops, and what it reports is what it had found', () => {
    const p = sandgrenProblem();
    for (const seed of [1, 2]) {
      const free = geneticSearch(p, { seed, maxEvaluations: 40_000, top: 1 });
      const stalled = geneticSearch(p, { seed, maxEvaluations: 40_000, top: 1, termination: termination({ maxEvaluations: 40_000, stallEvaluations: 2_000 }) });
      expect(stalled.stoppedBy).toBe('stall');
      expect(stalled.evaluations).toBeLessThan(free.evaluations);
      // It stopped no later than stallEvaluations (plus the cell in hand and the final re-solve) after its best.
      expect(stalled.evaluations - stalled.evaluationsToBest!).toBeLessThan(2_000 + 1_000);
      expect(stalled.best[0].f[0]).toBeGreaterThanOrEqual(free.best[0].f[0] * (1 - 1e-9));
    }
  });
});
