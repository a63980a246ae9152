// What a stock run of any kind shares: its options, the rank keys, and how checked rows are settled into
// the passing ones (ranked) and the near misses (least total violation first), with the counts per check.
import type { RankKey } from '../kinds/compression/requirements.js';
import type { StrategyChoice } from '../kinds/compression/design.js';
import { table } from '../report/table.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import type { BadRow } from './table.js';

export const STOCK_RANK_KEYS = ['mass', 'wire_volume', 'outer_diameter', 'free_length', 'safety_factor', 'price'] as const;
export type StockRankKey = RankKey | 'price';

/** A table's rate is a nominal with its own tolerance: beyond this fraction from coilfront's rate, say so. */
export const DEFAULT_RATE_DEVIATION = 0.1;

export interface StockOptions {
  /** Unit system of the table's plain numbers (SI by default). */
  units?: UnitSystem;
  rank?: StockRankKey;
  /** Passing rows to list (default: the requirement's `top`). */
  top?: number;
  /** Near misses to list. */
  misses?: number;
  rateDeviation?: number;
  compare?: boolean;
  strategy?: StrategyChoice;
  /** Name of the table in messages. */
  label?: string;
}

interface Checked {
  readonly pass: boolean;
  readonly rankValue: number;
  readonly violation: number;
  readonly row: { readonly line: number };
  readonly failingNames: readonly string[];
}

/** The bad rows in line order; the passing rows ranked (ties by line), the near misses by least total
 * violation, the rows each check failed. A table with no usable row is bad input as a whole. */
export function settleRows<R extends Checked>(
  results: R[],
  bad: BadRow[],
  label: string,
  misses = 5,
): { passing: R[]; misses: R[]; failedBy: Record<string, number> } {
  bad.sort((a, b) => a.line - b.line);
  if (results.length === 0) {
    const first = bad
      .slice(0, 3)
      .map((b) => `line ${b.line}, ${b.field}: ${b.message}`)
      .join('; ');
    throw new InputError(label, `at least one usable row; all ${bad.length} data rows are bad (${first}${bad.length > 3 ? '; ...' : ''})`);
  }
  const failedBy: Record<string, number> = {};
  for (const r of results) for (const name of r.failingNames) failedBy[name] = (failedBy[name] ?? 0) + 1;
  return {
    passing: results.filter((r) => r.pass).sort((a, b) => a.rankValue - b.rankValue || a.row.line - b.row.line),
    misses: results
      .filter((r) => !r.pass)
      .sort((a, b) => a.violation - b.violation || a.row.line - b.row.line)
      .slice(0, misses),
    failedBy,
  };
}

/** The text block of the rows each check failed, most first, with each check's label. */
export function failedByLines(failedBy: Record<string, number>, label: (name: string) => string): string[] {
  const cut = Object.entries(failedBy).sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]));
  return cut.length ? ['', 'Rows failing each check (a row may fail several):', table(cut.map(([name, n]) => [name, String(n), label(name)]))] : [];
}
