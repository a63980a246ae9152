// What a search strategy returns: the best points, the optional cloud of feasible points, and the
// counts that explain the outcome (what each check cut, what to relax, the nearest misses).
import type { PointBuffer } from './archive.js';

export interface Point { x: Float64Array; f: Float64Array }
export interface Miss { x: Float64Array; g: Float64Array; f: Float64Array; violation: number }

export interface SearchResult {
  strategy: 'grid' | 'genetic';
  best: Point[];
  cloud: PointBuffer | null;
  evaluations: number;
  cells: number;
  feasibleCells: number;
  prunedCells: number;
  /** Per constraint name: cells cut by it. */
  cutBy: Record<string, number>;
  /** Per constraint name: the least violation seen where it alone failed (Infinity: never alone). */
  soleViolation: Record<string, number>;
  nearestMisses: Miss[];
}
