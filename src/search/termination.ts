// When a search stops, as its own small object (after pymoo's Termination): a budget of problem
// evaluations, a number of generations without a better incumbent, and a proven lower bound on the
// objective that, once the incumbent reaches it, makes further search pointless.

export interface Termination {
  /** Problem evaluations the run may spend, its final re-solve included (bisection steps count). */
  maxEvaluations: number;
  /** Generations in a row without a better incumbent that end a round of generations. */
  stallGenerations: number;
  /** Evaluations spent without a better incumbent (once there is one) that end the run. */
  stallEvaluations: number;
  /** A proven lower bound on objective 0 over the whole space (an LP relaxation, say), or null. */
  lowerBound: number | null;
  /** Relative distance above lowerBound within which the incumbent counts as optimal. */
  boundTolerance: number;
}

/** Why a run stopped: it spent its budget, went stallEvaluations without a better incumbent, ran out of new combinations to look at, reached the proven
 * bound, or (the grid) visited every combination. */
export type StopReason = 'budget' | 'stall' | 'exhausted' | 'bound' | 'complete';

export function termination(t: Partial<Termination> & { maxEvaluations: number }): Termination {
  return {
    maxEvaluations: t.maxEvaluations,
    stallGenerations: t.stallGenerations ?? 30,
    stallEvaluations: t.stallEvaluations ?? Infinity,
    lowerBound: t.lowerBound ?? null,
    boundTolerance: t.boundTolerance ?? 1e-3,
  };
}

/** Whether an incumbent of objective value f is proven within the tolerance of the optimum. */
export function reachesBound(t: Termination, f: number): boolean {
  if (t.lowerBound === null || !Number.isFinite(t.lowerBound) || !Number.isFinite(f)) return false;
  return f <= t.lowerBound + t.boundTolerance * Math.abs(t.lowerBound);
}
