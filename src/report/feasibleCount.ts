// What a count of feasible combinations means. A grid that judged every combination counts them all;
// a search that skipped combinations (their lightest possible spring could not make the list, so they
// were never evaluated) or a genetic search (which evaluates the combinations it draws) counts only
// those it evaluated. That count depends on how soon the list filled, not on how hard the requirements
// are: a longer life can show more. Every output that prints the count says which it is.
import type { SearchResult } from '../search/result.js';

type Counts = Pick<SearchResult, 'strategy' | 'feasibleCells' | 'prunedCells'>;

/** Whether the feasible count is the number of feasible combinations of the whole space. */
export function feasibleCountComplete(r: Counts): boolean {
  return r.strategy === 'grid' && r.prunedCells === 0;
}

/** The JSON keys that go with `feasible` (its siblings `pruned` and `cells` stay where they were). */
export function feasibleCompleteRecord(r: Counts): { feasible_complete: boolean } {
  return { feasible_complete: feasibleCountComplete(r) };
}

/** The text line of the counts: "Feasible combinations: 20." when complete, else labelled for what it
 * is, with the skipped count and why they were skipped (`skippedBecause`, e.g. "their lightest possible
 * spring could not enter the top 5"). */
export function feasibleCountText(r: Counts, skippedBecause: string): string {
  if (feasibleCountComplete(r)) return `Feasible combinations: ${r.feasibleCells}.`;
  const skipped = r.prunedCells ? `; ${r.prunedCells} skipped unevaluated because ${skippedBecause}` : '';
  const among = r.strategy === 'genetic' ? 'the combinations the genetic search evaluated' : 'the combinations evaluated';
  return `Feasible among ${among}: ${r.feasibleCells}${skipped} (so not the count of every feasible spring).`;
}

/** The HTML counts table's row of the same figure. */
export function feasibleCountLabel(r: Counts): string {
  return feasibleCountComplete(r) ? 'feasible combinations' : 'feasible among the combinations evaluated';
}

/** Said under a sweep's CSV when a row's count is not the whole space's. */
export const SWEEP_COUNT_NOTE =
  'feasible_evaluated counts the feasible combinations among those each run evaluated; the skipped ones (their lightest possible spring could not make the list) and, in a genetic search, those never drawn were not judged: rows are not comparable by it, and a row with more is not an easier requirement';
