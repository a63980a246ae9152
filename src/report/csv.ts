// CSV output through csv-stringify: one row per spring, units in the column names.
import { stringify } from 'csv-stringify/sync';

export function toCsv(header: string[], rows: (string | number | null)[][]): string {
  const clean = rows.map((r) => r.map((v) => (typeof v === 'number' && !Number.isFinite(v) ? '' : v)));
  return stringify([header, ...clean]);
}
