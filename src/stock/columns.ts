// The columns of a stock table. A column name may carry its unit as a suffix (wire_diameter_mm,
// free_length_in, rate_N_per_mm, rate_lbf_per_in, max_load_lbf); a plain name takes the table's unit
// system. Names are compared in lower case with spaces as underscores.
import { InputError } from '../units/parse.js';
import { lookupUnit, toCore, type Kind } from '../units/kinds.js';
import { displayUnit, type UnitSystem } from '../units/systems.js';

export type FieldType = 'text' | 'count' | 'number' | Extract<Kind, 'length' | 'force' | 'rate'>;

export const STOCK_FIELDS = {
  part_number: 'text',
  material: 'text',
  wire_diameter: 'length',
  outer_diameter: 'length',
  mean_diameter: 'length',
  inner_diameter: 'length',
  free_length: 'length',
  total_coils: 'count',
  active_coils: 'count',
  ends: 'text',
  rate: 'rate',
  solid_length: 'length',
  max_deflection: 'length',
  max_load: 'force',
  price: 'number',
  kind: 'text',
} as const satisfies Record<string, FieldType>;
export type StockField = keyof typeof STOCK_FIELDS;

/** Unit suffixes of column names (lower case), longest first so that _n_per_mm is not read as _mm. */
const SUFFIXES: [string, string][] = [
  ['_lbf_per_in', 'lbf/in'],
  ['_n_per_mm', 'N/mm'],
  ['_lbf', 'lbf'],
  ['_mm', 'mm'],
  ['_in', 'in'],
  ['_n', 'N'],
];

export const DIAMETER_FIELDS = ['outer_diameter', 'mean_diameter', 'inner_diameter'] as const;
export const COIL_FIELDS = ['active_coils', 'total_coils'] as const;
const REQUIRED: (StockField | readonly StockField[])[] = ['part_number', 'material', 'wire_diameter', DIAMETER_FIELDS, 'free_length', COIL_FIELDS, 'ends'];

export interface Column<F extends string = StockField> {
  /** The header as written. */
  name: string;
  index: number;
  field: F;
  /** The unit its name carries (a unit symbol), or null: the table's system. */
  unit: string | null;
  /** Factor from the column's unit to SI (mm, N, N/mm): set by readHeader from the suffix or the table's system. */
  toSI: number;
}

export interface Layout<F extends string = StockField> {
  columns: Partial<Record<F, Column<F>>>;
  /** Headers that are not stock fields: read past, and said so once. */
  ignored: string[];
}

export function normaliseHeader(h: string): string {
  return h
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
}

/** Map a header row to the stock fields (of compression springs unless given); a table without a
 * required column is bad input as a whole. */
export function readHeader<F extends string = StockField>(
  header: string[],
  label: string,
  system: UnitSystem,
  fields: Record<F, FieldType> = STOCK_FIELDS as unknown as Record<F, FieldType>,
  required: readonly (F | readonly F[])[] = REQUIRED as unknown as readonly (F | readonly F[])[],
): Layout<F> {
  const columns: Partial<Record<F, Column<F>>> = {};
  const ignored: string[] = [];
  header.forEach((name, index) => {
    const h = normaliseHeader(name);
    let field: string = h;
    let unit: string | null = null;
    if (!(h in fields)) {
      const suffix = SUFFIXES.find(([s]) => h.endsWith(s) && h.slice(0, -s.length) in fields);
      if (suffix) {
        field = h.slice(0, -suffix[0].length);
        unit = suffix[1];
      }
    }
    if (!(field in fields)) {
      if (h !== '') ignored.push(name.trim());
      return;
    }
    const f = field as F;
    const type = fields[f];
    if (unit !== null && lookupUnit(unit)?.kind !== type) {
      throw new InputError(
        `${label}: column "${name.trim()}"`,
        `a unit that fits ${f} (${type === 'count' || type === 'number' || type === 'text' ? 'no unit' : `a ${type}`}), not ${unit}`,
      );
    }
    if (columns[f]) throw new InputError(`${label}: column "${name.trim()}"`, `each field in one column (${f} is also in column "${columns[f]!.name}")`);
    const toSI =
      type === 'length' || type === 'force' || type === 'rate' ? (unit !== null ? toCore(1, lookupUnit(unit)!) : displayUnit(system, type).toCore(1)) : 1;
    columns[f] = { name: name.trim(), index, field: f, unit, toSI };
  });
  for (const need of required) {
    const options: readonly F[] = typeof need === 'string' ? [need as F] : (need as readonly F[]);
    if (!options.some((o) => columns[o])) {
      throw new InputError(
        `${label}: header`,
        `a column ${options.join(' or ')} (with an optional unit suffix such as _mm or _in); the header has: ${header.map((h) => h.trim()).join(', ')}`,
      );
    }
  }
  return { columns, ignored };
}
