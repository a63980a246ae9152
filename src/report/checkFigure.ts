// A check's figure as people read it, for every kind and every output (check, stock, design's
// nearest misses): the spring's value against its limit, the margin between them in the figure's own
// unit, and how far a failing one misses. Below the kinds, so a kind's own reports write a miss in
// the same words and unit as the check command does.
import { formatQuantity, sig } from '../units/format.js';
import type { Kind } from '../units/kinds.js';
import type { UnitSystem } from '../units/systems.js';

/** How a value is written: a quantity kind, a plain number, a percentage, or words. */
export type ValueKind = Kind | 'number' | 'percent' | 'text';

/** The spring's figure against its limit, as a check does (SI; text for the categorical checks). */
export interface CheckFigure {
  value: number | string | null;
  limit: number | string | null;
  relation: '<=' | '>=' | '<' | 'in';
  kind: ValueKind;
  note?: string;
  /** The margin reads in the check's own unit (spareOf: so many mm of coil clearance), not as a share:
   * for checks whose normalised value is not a share of the limit (clash, buckling). */
  unitMargin?: boolean;
}

/** The distance from the figure to its limit in the figure's own unit, positive inside; null when either is missing. */
export function spareOf(l: Pick<CheckFigure, 'value' | 'limit' | 'relation'>): number | null {
  if (typeof l.value !== 'number' || typeof l.limit !== 'number') return null;
  return l.relation === '>=' ? l.value - l.limit : l.limit - l.value;
}

const isQuantity = (k: ValueKind): k is Kind => k !== 'number' && k !== 'percent' && k !== 'text';

/** How far a failing figure misses, as every output writes it: "by 0.0500 mm" in the check's own unit
 * (clash, buckling), else "by 2.5%" of the limit (`margin`: minus the normalised check value); null
 * for a categorical check. */
export function shortfallText(l: CheckFigure & { margin: number | null }, system: UnitSystem): string | null {
  const spare = l.unitMargin ? spareOf(l) : null;
  if (spare !== null && isQuantity(l.kind)) return `by ${formatQuantity(-spare, l.kind, system, 4)}`;
  return l.margin === null ? null : `by ${sig(-l.margin * 100, 3)}%`;
}
