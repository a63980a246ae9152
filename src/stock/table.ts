// Reading a stock table (CSV through csv-parse, or the same rows as plain objects) into spring files,
// one per row, in SI. A bad row never stops the run: it is set aside with its line number, the column
// and what was expected, and counted.
import { parse } from 'csv-parse/sync';
import type { Catalog } from '../catalogs/types.js';
import { END_TYPES, type EndType } from '../kinds/compression/geometry.js';
import { checkRange, InputError, parseNumber, parseQuantity } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { COIL_FIELDS, DIAMETER_FIELDS, STOCK_FIELDS, readHeader, type Column, type Layout, type StockField } from './columns.js';
import { resolveMaterial, type MaterialMap } from './materialMap.js';

export interface StockRow {
  line: number;
  partNumber: string;
  /** The material as the table writes it, and the catalog id it stands for. */
  materialWord: string;
  material: string;
  /** SI (mm). */
  wireDiameter: number;
  /** The coil diameter the row gives (the first of outer, mean, inner that it fills), mm. */
  diameter: { field: (typeof DIAMETER_FIELDS)[number]; value: number };
  coils: { field: (typeof COIL_FIELDS)[number]; value: number };
  ends: EndType;
  freeLength: number;
  /** The column each spring-file field came from, to name it in a message. */
  columnOf: Record<string, string>;
  tableRate?: number;
  tableSolidLength?: number;
  maxDeflection?: number;
  maxLoad?: number;
  price?: number;
}

export interface BadRow {
  line: number;
  partNumber: string | null;
  field: string;
  message: string;
}

export interface StockTable {
  rows: StockRow[];
  bad: BadRow[];
  layout: Layout;
  /** The unit system of plain numbers. */
  system: UnitSystem;
  /** Data rows in the table (good and bad). */
  total: number;
}

export interface TableOptions {
  system: UnitSystem;
  materialMap: MaterialMap;
  catalog: Catalog;
  label: string;
}

/** A row's mistake: the column (as the table names it) and what was expected. Not an Error: a table
 * may hold thousands of bad rows, and a stack trace per row is wasted work. */
export class RowError {
  constructor(
    readonly field: string,
    readonly message: string,
  ) {}
}

// End types as stock tables write them: the trade's words for the four kinds (closed = squared).
const END_WORDS: Record<string, EndType> = {
  plain: 'plain',
  open: 'plain',
  'plain-ground': 'plain-ground',
  'open-ground': 'plain-ground',
  squared: 'squared',
  closed: 'squared',
  'squared-ground': 'squared-ground',
  'closed-ground': 'squared-ground',
};

const endWordCache = new Map<string, EndType | undefined>();

export function endType(word: string): EndType | undefined {
  if (endWordCache.has(word)) return endWordCache.get(word);
  const t = END_WORDS[normaliseEndWord(word)];
  if (endWordCache.size < 1000) endWordCache.set(word, t);
  return t;
}

function normaliseEndWord(word: string): string {
  return word
    .trim()
    .toLowerCase()
    .replace(/\s*(&|\band\b|\+)\s*/g, '-')
    .replace(/[\s_,/]+/g, '-')
    .replace(/-+/g, '-')
    .replace(/^-|-$/g, '');
}

const PLAIN_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;

/** A quantity cell in SI: a plain number in the column's unit, or a number with its own unit. */
export function quantityCell(
  cell: string,
  col: Column<string>,
  system: UnitSystem,
  kind: 'length' | 'force' | 'rate' = STOCK_FIELDS[col.field as StockField] as 'length' | 'force' | 'rate',
): number {
  let v: number;
  try {
    // A plain number is in the column's unit; either way the value passes the limits a spring file's does.
    if (PLAIN_NUMBER.test(cell)) checkRange((v = Number(cell) * col.toSI), kind, system, col.name, cell);
    else v = parseQuantity(cell, kind, system, col.name);
  } catch (e) {
    throw new RowError(col.name, (e as InputError).expected + `, got ${JSON.stringify(cell)}`);
  }
  if (!(v > 0)) throw new RowError(col.name, `a positive ${kind === 'rate' ? 'spring rate' : kind}, got ${JSON.stringify(cell)}`);
  return v;
}

export function numberCell(cell: string, col: Column<string>, rule: { positive?: boolean; nonNegative?: boolean }): number {
  try {
    return parseNumber(cell, col.name, rule);
  } catch (e) {
    throw new RowError(col.name, `${(e as InputError).expected}, got ${JSON.stringify(cell)}`);
  }
}

/** One data row into a spring file and the table's own figures. */
/** The first of a row's alternative columns (a coil diameter given as mean, outer or inner; a coil count as
 * active or total) that holds a value; a row with all of them empty names every such column it has. */
export function firstFilled<F extends string>(
  fields: readonly F[],
  cols: Partial<Record<F, { name: string }>>,
  cell: (f: F) => string | undefined,
  what: string,
): F {
  const found = fields.find((f) => cell(f) !== undefined);
  if (found === undefined)
    throw new RowError(
      fields
        .filter((f) => cols[f])
        .map((f) => cols[f]!.name)
        .join(' | '),
      `${what} (the cells are empty)`,
    );
  return found;
}

function readRow(cells: string[], line: number, layout: Layout, o: TableOptions): StockRow {
  const cols = layout.columns;
  const cell = (f: StockField): string | undefined => {
    const c = cols[f];
    if (!c) return undefined;
    const v = (cells[c.index] ?? '').trim();
    return v === '' ? undefined : v;
  };
  const need = (f: StockField, what: string): string => {
    const v = cell(f);
    if (v === undefined) throw new RowError(cols[f]?.name ?? f, `${what} (the cell is empty)`);
    return v;
  };
  const partNumber = need('part_number', 'a part number');
  const kind = cell('kind');
  if (kind !== undefined) {
    const k = kind.toLowerCase();
    if (k === 'extension')
      throw new RowError(
        cols.kind!.name,
        'compression (the requirements are for compression springs: run the extension rows against an extension requirements file, kind: extension)',
      );
    if (k !== 'compression') throw new RowError(cols.kind!.name, `compression or extension, got ${JSON.stringify(kind)}`);
  }
  const materialWord = need('material', 'a material');
  const material = resolveMaterial(materialWord, o.materialMap, o.catalog);
  if (!material)
    throw new RowError(
      cols.material!.name,
      `a catalog material id or a word that the requirements' material_map maps to one, got ${JSON.stringify(materialWord)}`,
    );
  const endsWord = need('ends', `an end type (${END_TYPES.join(' | ')}, or closed / closed and ground / open / open ground)`);
  const ends = endType(endsWord);
  if (!ends)
    throw new RowError(
      cols.ends!.name,
      `an end type (${END_TYPES.join(' | ')}, or closed / closed and ground / open / open ground), got ${JSON.stringify(endsWord)}`,
    );
  const q = (f: StockField) => quantityCell(cell(f)!, cols[f]!, o.system);
  const diameter = firstFilled(DIAMETER_FIELDS, cols, cell, 'a coil diameter');
  const coils = firstFilled(COIL_FIELDS, cols, cell, 'a coil count');
  need('wire_diameter', 'a wire diameter');
  need('free_length', 'a free length');
  const columnOf: Record<string, string> = {};
  for (const f of ['material', 'wire_diameter', diameter, coils, 'ends', 'free_length'] as StockField[]) columnOf[f] = cols[f]!.name;
  const row: StockRow = {
    line,
    partNumber,
    materialWord,
    material,
    wireDiameter: q('wire_diameter'),
    diameter: { field: diameter, value: q(diameter) },
    coils: { field: coils, value: numberCell(cell(coils)!, cols[coils]!, { positive: true }) },
    ends,
    freeLength: q('free_length'),
    columnOf,
  };
  if (cell('rate') !== undefined) row.tableRate = q('rate');
  if (cell('solid_length') !== undefined) row.tableSolidLength = q('solid_length');
  if (cell('max_deflection') !== undefined) row.maxDeflection = q('max_deflection');
  if (cell('max_load') !== undefined) row.maxLoad = q('max_load');
  if (cell('price') !== undefined) row.price = numberCell(cell('price')!, cols.price!, { nonNegative: true });
  return row;
}

/** The row as a spring file (SI), as `check` and `analyze` read it. A table has no column for shot
 * peening or set removal: a stock spring is judged without either. */
export function rowSpringFile(row: StockRow): Record<string, unknown> {
  return {
    units: 'si',
    material: row.material,
    wire_diameter: row.wireDiameter,
    [row.diameter.field]: row.diameter.value,
    [row.coils.field]: row.coils.value,
    ends: row.ends,
    free_length: row.freeLength,
    peened: false,
    set_removed: false,
  };
}

/** Header and data rows with their line numbers, from CSV text or from plain records. */
export function rawRows(
  input: string | Record<string, unknown>[],
  label: string,
  bad: BadRow[],
): { header: string[]; rows: { cells: string[]; line: number }[] } {
  if (typeof input !== 'string') {
    const header: string[] = [];
    for (const r of input) for (const k of Object.keys(r)) if (!header.includes(k)) header.push(k);
    const text = (v: unknown) => (v === undefined || v === null ? '' : String(v));
    return { header, rows: input.map((r, i) => ({ cells: header.map((h) => text(r[h])), line: i + 2 })) };
  }
  let records: string[][];
  const lines: number[] = [];
  try {
    records = parse(input, {
      comment: '#',
      skip_empty_lines: true,
      relax_column_count: true,
      bom: true,
      // The line a record starts on (context.lines is where it ends; quoted fields may span lines).
      on_record: (record: string[], context) => {
        lines.push(context.lines - record.reduce((n, c) => n + (c.includes('\n') ? c.split('\n').length - 1 : 0), 0));
        return record;
      },
      skip_records_with_error: true,
      on_skip: (err) => {
        if (err)
          bad.push({
            line: (err as { lines?: number }).lines ?? 0,
            partNumber: null,
            field: 'row',
            message: `well-formed CSV (${err.message.replace(/^Invalid (Record|Closing Quote|Opening Quote): /, '')})`,
          });
      },
    });
  } catch (e) {
    throw new InputError(label, 'a CSV table with a header row', (e as Error).message);
  }
  if (records.length === 0) throw new InputError(label, 'a CSV table with a header row and at least one data row (the file has no rows)');
  return { header: records[0], rows: records.slice(1).map((cells, i) => ({ cells, line: lines[i + 1] })) };
}

export function readStockTable(input: string | Record<string, unknown>[], o: TableOptions): StockTable {
  const bad: BadRow[] = [];
  const { header, rows: raw } = rawRows(input, o.label, bad);
  const layout = readHeader(header, o.label, o.system);
  const rows: StockRow[] = [];
  for (const { cells, line } of raw) {
    try {
      rows.push(readRow(cells, line, layout, o));
    } catch (e) {
      if (!(e instanceof RowError)) throw e;
      const pc = layout.columns.part_number;
      const part = pc ? (cells[pc.index] ?? '').trim() || null : null;
      bad.push({ line, partNumber: part, field: e.field, message: `expected ${e.message}` });
    }
  }
  bad.sort((a, b) => a.line - b.line);
  return { rows, bad, layout, system: o.system, total: raw.length + bad.filter((b) => b.field === 'row').length };
}
