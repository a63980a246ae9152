// Output fields rendered for people and machines, from a spring kind's fields registry
// (src/kinds/<kind>/fields.ts): CSV columns (names carry their unit symbol, `wire_diameter_mm`; values rounded
// to the field's significant digits, 0: written as they are), the JSON record (SI, full precision)
// and the ranked table's header and cells (text and HTML) in a unit system.
import type { Kind as UnitKind } from '../units/kinds.js';
import { inUnit, sig, unitSymbol } from '../units/format.js';
import { readableUnit, type DisplayUnit, type UnitSystem } from '../units/systems.js';

// What an output field is, defined beside its renderer and below the kinds (src/kinds/kind.ts
// re-exports it for the kinds' registries).

/** A value of an output field; null where it does not apply (never NaN or undefined in output). */
export type FieldValue = number | string | null;

/** One column of candidate output, from which JSON, CSV, the text table and the HTML table are
 * rendered. */
export interface FieldDefinition<Cand> {
  /** Name in JSON and (with its unit symbol) in CSV. */
  readonly name: string;
  readonly unit: UnitKind | 'volume' | null;
  /** Significant digits in CSV (tables round for reading, CSV keeps precision). */
  readonly digits: number;
  read(c: Cand): FieldValue;
  /** The JSON value where it is not read(c): a list or a record (points, checks), a flag. */
  json?(c: Cand): unknown;
  /** Whether this candidate carries the field at all (a yield only where the run was confirmed): when
   * not, JSON leaves the key out and a table shows '-' (the column only where some row carries it). */
  present?(c: Cand): boolean;
  /** Its column in the ranked text and HTML tables. */
  readonly column?: FieldColumn<Cand>;
  /** What the figure means where its name does not say (relative_cost): printed where it appears. */
  readonly note?: string;
}

export interface FieldColumn<Cand> {
  /** The heading; the unit symbol follows it for a field with a unit ("d mm"). */
  readonly head: string;
  /** Significant digits shown (0: written as it is). */
  readonly digits: number;
  /** The cell where it is not the rounded figure ("20.0 / 33.6", a percentage). */
  cell?(c: Cand, system: UnitSystem): string;
}

/** The fields some of the candidates carry: a field with `present` is left out when none does (the
 * confirmed yield of a sweep's rows, say), so that a CSV has no column empty by construction. */
export function presentFields<C>(fields: readonly FieldDefinition<C>[], cands: readonly C[]): FieldDefinition<C>[] {
  return fields.filter((f) => !f.present || cands.some((c) => f.present!(c)));
}

export function fieldColumns<C>(fields: readonly FieldDefinition<C>[], system: UnitSystem): string[] {
  return fields.map((f) => (f.unit && f.unit !== 'volume' ? `${f.name}_${unitSymbol(f.unit, system)}` : f.name));
}

export function fieldRow<C>(fields: readonly FieldDefinition<C>[], c: C, system: UnitSystem): FieldValue[] {
  return fields.map((f) => {
    const v = f.read(c);
    if (typeof v !== 'number') return v;
    if (!Number.isFinite(v)) return null;
    const shown = f.unit && f.unit !== 'volume' ? inUnit(v, f.unit, system) : v;
    return f.digits > 0 ? Number(sig(shown, f.digits)) : shown;
  });
}

/** The notes of the fields that carry one (`name: what it means`), for a footer beside the output. */
export function fieldNotes<C>(fields: readonly FieldDefinition<C>[]): string[] {
  return fields.filter((f) => f.note).map((f) => `${f.name}: ${f.note}`);
}

/** The JSON record of one candidate (SI): every field it carries, in the list's order. */
export function fieldRecord<C>(fields: readonly FieldDefinition<C>[], c: C): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of fields) {
    if (f.present && !f.present(c)) continue;
    out[f.name] = f.json ? f.json(c) : f.read(c);
  }
  return out;
}

/** The ranked table (text and HTML): a rank column, then each field with a column that some row
 * carries; '-' where a figure does not apply. */
export function fieldGrid<C>(fields: readonly FieldDefinition<C>[], cands: readonly C[], system: UnitSystem): { header: string[]; rows: string[][] } {
  const shown = fields.filter((f) => f.column && (!f.present || cands.some((c) => f.present!(c))));
  // A column's unit follows its largest figure (grams for springs under 1 kg).
  const units = shown.map((f) => (f.unit ? readableUnit(system, f.unit, largest(f, cands)) : null));
  const header = ['#', ...shown.map((f, j) => (units[j] ? `${f.column!.head} ${units[j]!.symbol}` : f.column!.head))];
  const rows = cands.map((c, i) => [String(i + 1), ...shown.map((f, j) => fieldCell(f, c, system, units[j]))]);
  return { header, rows };
}

function largest<C>(f: FieldDefinition<C>, cands: readonly C[]): number {
  let m = 0;
  for (const c of cands) {
    const v = f.read(c);
    if (typeof v === 'number' && Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  }
  return m;
}

function fieldCell<C>(f: FieldDefinition<C>, c: C, system: UnitSystem, unit: DisplayUnit | null): string {
  const col = f.column!;
  if (f.present && !f.present(c)) return '-';
  if (col.cell) return col.cell(c, system);
  const v = f.read(c);
  if (v === null) return '-';
  if (typeof v === 'string') return v;
  if (col.digits === 0) return String(v);
  return sig(unit ? unit.fromCore(v) : v, col.digits);
}
