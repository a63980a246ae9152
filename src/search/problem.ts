// The general optimisation problem the search strategies work on, after pymoo's split of Problem,
// Algorithm, Termination and Result. A problem declares its design variables, its constraints
// (g <= 0, normalised so that 0.1 means "10% past the limit") and its objectives (minimised), and
// evaluates a point in place: no allocation per candidate.

export type Variable =
  /** A list of allowed values (standard wire sizes, codes of catalog entries...). */
  | { kind: 'list'; name: string; values: readonly number[] }
  /** An integer or stepped range: min, min + step, ..., up to max. */
  | { kind: 'range'; name: string; min: number; max: number; step: number }
  /** A continuous range. The grid scans it at `resolution`; the variable marked `solve` is
   * instead bracketed by bisection on the constraints that are monotone in it. */
  | { kind: 'continuous'; name: string; min: number; max: number; resolution: number; solve?: boolean };

/** How a constraint or objective moves when the solved variable grows. */
export const TREND = { decreasing: -1, unknown: 0, increasing: 1 } as const;

export interface Problem {
  readonly name: string;
  readonly variables: readonly Variable[];
  readonly constraintNames: readonly string[];
  readonly objectiveNames: readonly string[];
  /** Per constraint, its trend in the solved variable (TREND values); a constant counts as increasing. */
  readonly constraintTrend?: Int8Array;
  /** Per objective, its trend in the solved variable. */
  readonly objectiveTrend?: Int8Array;
  /** Write constraints into g and objectives into f for the point x. */
  evaluate(x: Float64Array, g: Float64Array, f: Float64Array): void;
  /** Index of a list or range variable along which objective 0, taken at the solved variable's lowest
   * bound, never decreases (the mass of the thinnest coil grows with the coil count). When a cell is
   * pruned on that bound, the rest of this variable's values in the same branch are pruned with it. */
  readonly boundGrowsAlong?: number;
  /** Optionally, lower bounds on the constraints of unknown trend over a whole bracket [lo, hi] of the
   * solved variable (x holds the other values): written into out; -Infinity where there is none. A
   * bound above zero proves the bracket infeasible without scanning it. */
  bracketBounds?(x: Float64Array, lo: number, hi: number, out: Float64Array): void;
  /** Optionally, a pruning hint for a whole branch of the grid: the variables before `depth` are fixed
   * at their values in x, every later one ranges over all its values (the solved one over its whole
   * interval). Return the index of a constraint when no point of the branch can meet every
   * constraint (each point fails that one, or another that this bound leaves aside), else -1. It
   * lets the grid drop a whole wire size, say, before enumerating its coil counts. */
  branchInfeasible?(x: Float64Array, depth: number): number;
  /** Optionally, the same hint for a run of one variable's values: the variables before `variable`
   * fixed at x, `variable` over its values from index `from` to `to` (both included), every later one
   * over all its values. The grid rules out the stiffest and the softest coil counts of a wire by it
   * (a prefix and a suffix of the innermost variable's values) before it visits the rest. */
  rangeInfeasible?(x: Float64Array, variable: number, from: number, to: number): number;
  /** Optionally, a lower bound on objective 0 over the feasible points of a run of one variable's values
   * (fixed and free as for rangeInfeasible): Infinity when the run has no feasible point, -Infinity
   * when there is no bound. With it the genetic search draws its individuals only from runs the bounds
   * leave open and stops once its incumbent is proven within a tolerance of the optimum (runBounds.ts). */
  rangeLowerBound?(x: Float64Array, variable: number, from: number, to: number): number;
  /** Optionally, for objective 0 increasing in the solved variable: a value of the solved variable past
   * which objective 0 is at least `bound` for the other values in x (-Infinity when it is everywhere;
   * an upper estimate is fine, a lower one is not). It lets a cell stop short of the points that could
   * not beat the k-th best kept, or be skipped before any evaluation. */
  objectiveCeiling?(x: Float64Array, bound: number): number;
  /** Optionally narrow the solved variable's interval for the other values in x: write [lo, hi] into out. */
  solvedBounds?(x: Float64Array, out: Float64Array): void;
}

/** A constraint is met when g <= 0, exactly: the engine allows no tolerance, so that no point it
 * reports shows a positive check when the same check is computed again. */

export function valueCount(v: Variable): number {
  if (v.kind === 'list') return v.values.length;
  if (v.kind === 'range') return Math.floor((v.max - v.min) / v.step + 1e-9) + 1;
  return Math.floor((v.max - v.min) / v.resolution + 1e-9) + 1;
}

/** Value of a non-solved variable at index i of its grid. */
export function valueAt(v: Variable, i: number): number {
  if (v.kind === 'list') return v.values[i];
  if (v.kind === 'range') return v.min + i * v.step;
  return Math.min(v.max, v.min + i * v.resolution);
}

export function solvedIndex(p: Problem): number {
  return p.variables.findIndex((v) => v.kind === 'continuous' && v.solve === true);
}
