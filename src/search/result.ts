// What a search strategy returns: the best points, the optional cloud of feasible points, and the
// counts that explain the outcome (what each check cut, what to relax, the nearest misses).
import type { PointBuffer, TopK } from './archive.js';
import type { CellWorkspace } from './cell.js';
import type { NearestMisses } from './misses.js';
import type { Problem } from './problem.js';
import type { StopReason } from './termination.js';

export interface Point {
  x: Float64Array;
  f: Float64Array;
}
export interface Miss {
  x: Float64Array;
  g: Float64Array;
  f: Float64Array;
  violation: number;
}

export interface SearchResult {
  strategy: 'grid' | 'genetic';
  /** Why the run stopped (the grid always completes). */
  stoppedBy: StopReason;
  /** The best points, best first; for a two-objective search, the non-dominated points in the order
   * of the first objective. */
  best: Point[];
  cloud: PointBuffer | null;
  evaluations: number;
  /** Evaluations spent when the best objective value of the run was first met (genetic search). */
  evaluationsToBest?: number;
  /** Calls of the problem's bounds: bracket bounds, branch and range hints (each costs about one evaluation). */
  boundCalls?: number;
  cells: number;
  feasibleCells: number;
  prunedCells: number;
  /** Per constraint name: cells cut by it. */
  cutBy: Record<string, number>;
  /** Per constraint name: the least violation seen where it alone failed (Infinity: never alone). */
  soleViolation: Record<string, number>;
  nearestMisses: Miss[];
}

/** Gather a strategy's stores into its result, with counts keyed by constraint name. `top` is the
 * ranked store, or the points themselves in their order (a two-objective front). */
export function packResult(
  strategy: SearchResult['strategy'],
  p: Problem,
  top: TopK | Point[],
  cloud: PointBuffer | null,
  ws: CellWorkspace,
  counts: { cells: number; feasible: number; pruned: number },
  misses: NearestMisses,
  stoppedBy: StopReason = 'complete',
): SearchResult {
  const cutBy: Record<string, number> = {};
  const sole: Record<string, number> = {};
  p.constraintNames.forEach((name, j) => {
    cutBy[name] = ws.stats.cutBy[j];
    sole[name] = ws.stats.soleViolation[j];
  });
  const best: Point[] = [];
  if (Array.isArray(top)) for (const q of top) best.push({ x: Float64Array.from(q.x), f: Float64Array.from(q.f) });
  else for (let i = 0; i < top.size; i++) best.push({ x: Float64Array.from(top.x(i)), f: Float64Array.from(top.f(i)) });
  return {
    strategy,
    stoppedBy,
    best,
    cloud,
    evaluations: ws.stats.evaluations,
    boundCalls: ws.stats.boundCalls,
    cells: counts.cells,
    feasibleCells: counts.feasible,
    prunedCells: counts.pruned,
    cutBy,
    soleViolation: sole,
    nearestMisses: misses.items,
  };
}
