// The manufacturing-tolerance catalog (catalogs/tolerances.yaml), loaded and validated. A malformed
// table is rejected with the file, the record and the field, as the material catalog is: a tolerance
// table with a hole or a row out of order would silently hand a spring the wrong spread.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse as parseYaml } from 'yaml';
import { CatalogError, catalogDirectory } from '../../../catalogs/load.js';
import { FAMILIES, type Family } from '../../../catalogs/types.js';
import { Fields } from '../../../units/fields.js';
import { InputError, parseQuantity } from '../../../units/parse.js';

export const GRADES = [1, 2, 3] as const;
export type ToleranceGrade = (typeof GRADES)[number];

export interface WireToleranceRow {
  maxDiameter: number;
  tolerance: number;
  source: string;
}
export interface WireToleranceTable {
  id: string;
  standards: string[];
  source: string;
  rows: WireToleranceRow[];
}

export interface CoilDiameterRow {
  maxMeanDiameter: number;
  /** By grade (index 0 = grade 1), by index column: +- mm. */
  grades: [number[], number[], number[]];
  source: string;
}

export interface CoilDiameterTable {
  standard: string;
  defaultGrade: ToleranceGrade;
  /** Upper ends of the index columns (the first starts at minIndex). */
  indexColumns: number[];
  minMeanDiameter: number;
  minIndex: number;
  rows: CoilDiameterRow[];
}

export interface ToleranceCatalog {
  wireDiameter: WireToleranceTable[];
  meanDiameter: CoilDiameterTable;
  shearModulus: { family: Family; tolerance: number; source: string }[];
  activeCoils: { tolerance: number; source: string };
  workingForce: { tolerance: number; source: string };
}

function within<T>(file: string, record: string, body: () => T): T {
  try {
    return body();
  } catch (e) {
    if (e instanceof InputError) throw new CatalogError(`${file}: ${record}: ${e.message}`);
    throw e;
  }
}

function source(f: Fields): string {
  const s = f.string('source');
  if (!s) throw new InputError(f.name('source'), 'the publication the value comes from, or "from memory" (the field is missing)');
  return s;
}

function ascending(values: number[], field: string): void {
  values.forEach((v, i) => {
    if (i > 0 && !(v > values[i - 1])) throw new InputError(`${field}[${i}]`, `a value above the one before (${values[i - 1]}): rows go in ascending order`, v);
  });
}

function fraction(f: Fields, key: string): number {
  const v = f.fraction(key);
  if (v === undefined) throw new InputError(f.name(key), 'a fraction (the field is missing)');
  if (!(v < 1)) throw new InputError(f.name(key), 'a fraction below 1', f.get(key));
  return v;
}

function readWireTables(list: unknown[], file: string): WireToleranceTable[] {
  return list.map((raw, t) =>
    within(file, `wire_diameter[${t}]`, () => {
      const f = Fields.of(raw, `wire_diameter[${t}]`, 'si');
      const id = f.string('id') ?? `table ${t}`;
      const standards = (f.list('standards') ?? []).map((s, i) => {
        if (typeof s !== 'string' || !s.trim()) throw new InputError(`${f.name('standards')}[${i}]`, "the start of a wire standard's name", s);
        return s.trim();
      });
      if (standards.length === 0) throw new InputError(f.name('standards'), 'a non-empty list of wire standards');
      const rowsRaw = f.list('rows');
      if (!rowsRaw || rowsRaw.length === 0) throw new InputError(f.name('rows'), 'a non-empty list of { max_diameter, tolerance, source }');
      const rows = rowsRaw.map((r, i) => {
        const g = Fields.of(r, `${f.name('rows')}[${i}]`, 'si');
        const maxDiameter = g.requiredQuantity('max_diameter', 'length', { positive: true });
        const tolerance = g.requiredQuantity('tolerance', 'length', { positive: true });
        if (tolerance > 0.1 * maxDiameter) throw new InputError(g.name('tolerance'), 'a tolerance under a tenth of the diameter', g.get('tolerance'));
        const row = { maxDiameter, tolerance, source: source(g) };
        g.rejectUnknown();
        return row;
      });
      ascending(
        rows.map((r) => r.maxDiameter),
        `${f.name('rows')}.max_diameter`,
      );
      // A larger wire never holds a tighter tolerance in any wire standard seen.
      rows.forEach((r, i) => {
        if (i > 0 && r.tolerance < rows[i - 1].tolerance)
          throw new InputError(`${f.name('rows')}[${i}].tolerance`, 'a tolerance at least that of the smaller sizes', r.tolerance);
      });
      const table = { id, standards, source: source(f), rows };
      f.rejectUnknown();
      return table;
    }),
  );
}

function readCoilTable(raw: unknown, file: string): CoilDiameterTable {
  return within(file, 'mean_diameter', () => {
    const f = Fields.of(raw, 'mean_diameter', 'si');
    const standard = f.string('standard') ?? '';
    const defaultGrade = f.number('default_grade', { integer: true, min: 1, max: 3 }) as ToleranceGrade | undefined;
    const indexColumns = (f.list('index_columns') ?? []).map((v, i) => {
      if (typeof v !== 'number' || !(v > 1)) throw new InputError(`${f.name('index_columns')}[${i}]`, 'a spring index above 1', v);
      return v;
    });
    if (indexColumns.length === 0) throw new InputError(f.name('index_columns'), "a non-empty list of the index columns' upper ends");
    ascending(indexColumns, f.name('index_columns'));
    const minMeanDiameter = f.requiredQuantity('min_mean_diameter', 'length', { positive: true });
    const minIndex = f.number('min_index', { positive: true }) ?? NaN;
    if (!(minIndex < indexColumns[0])) throw new InputError(f.name('min_index'), "a spring index below the first column's upper end", f.get('min_index'));
    const rowsRaw = f.list('rows');
    if (!rowsRaw || rowsRaw.length === 0) throw new InputError(f.name('rows'), 'a non-empty list of rows');
    const rows = rowsRaw.map((r, i): CoilDiameterRow => {
      const g = Fields.of(r, `${f.name('rows')}[${i}]`, 'si');
      const maxMeanDiameter = g.requiredQuantity('max_mean_diameter', 'length', { positive: true });
      const grades = GRADES.map((grade) => {
        const key = `grade_${grade}`;
        const list = g.list(key);
        if (!list || list.length !== indexColumns.length)
          throw new InputError(g.name(key), `a list of ${indexColumns.length} tolerances (one per index column)`, g.get(key));
        return list.map((v, j) => parseQuantity(v, 'length', 'si', `${g.name(key)}[${j}]`, { positive: true }));
      }) as [number[], number[], number[]];
      // The table's own logic: a finer grade is never looser, a slenderer coil (larger index) never tighter.
      grades.forEach((cols, k) =>
        cols.forEach((v, j) => {
          if (j > 0 && v < cols[j - 1]) throw new InputError(`${g.name(`grade_${k + 1}`)}[${j}]`, 'a tolerance at least that of the smaller index', v);
          if (k > 0 && v < grades[k - 1][j]) throw new InputError(`${g.name(`grade_${k + 1}`)}[${j}]`, `a tolerance at least grade ${k}'s`, v);
        }),
      );
      const row = { maxMeanDiameter, grades, source: source(g) };
      g.rejectUnknown();
      return row;
    });
    ascending(
      rows.map((r) => r.maxMeanDiameter),
      `${f.name('rows')}.max_mean_diameter`,
    );
    rows.forEach((r, i) => {
      if (i === 0) return;
      r.grades.forEach((cols, k) =>
        cols.forEach((v, j) => {
          if (v < rows[i - 1].grades[k][j])
            throw new InputError(`${f.name('rows')}[${i}].grade_${k + 1}[${j}]`, 'a tolerance at least that of the smaller diameters', v);
        }),
      );
    });
    f.rejectUnknown();
    return { standard, defaultGrade: defaultGrade ?? 2, indexColumns, minMeanDiameter, minIndex, rows };
  });
}

export function parseToleranceCatalog(doc: unknown, file: string): ToleranceCatalog {
  const top = within(file, '(top level)', () => Fields.of(doc, '', 'si'));
  const wireList = within(file, '(top level)', () => top.list('wire_diameter'));
  if (!wireList || wireList.length === 0) throw new CatalogError(`${file}: wire_diameter: expected a non-empty list of tables`);
  const wireDiameter = readWireTables(wireList, file);
  const meanDiameter = readCoilTable(top.get('mean_diameter'), file);
  const shearModulus = within(file, 'shear_modulus', () => {
    const list = top.list('shear_modulus') ?? [];
    const rows = list.map((raw, i) => {
      const g = Fields.of(raw, `shear_modulus[${i}]`, 'si');
      const family = g.choice('family', FAMILIES);
      if (!family) throw new InputError(g.name('family'), `one of ${FAMILIES.join(' | ')} (the field is missing)`);
      const row = { family, tolerance: fraction(g, 'tolerance'), source: source(g) };
      g.rejectUnknown();
      return row;
    });
    const missing = FAMILIES.filter((fam) => !rows.some((r) => r.family === fam));
    if (missing.length) throw new InputError('shear_modulus', `a row for every material family (missing: ${missing.join(', ')})`);
    return rows;
  });
  const single = (key: string, read: (g: Fields) => number) =>
    within(file, key, () => {
      const g = Fields.of(top.get(key), key, 'si');
      const out = { tolerance: read(g), source: source(g) };
      g.rejectUnknown();
      return out;
    });
  const activeCoils = single('active_coils', (g) => g.number('tolerance', { nonNegative: true, max: 2 }) ?? NaN);
  if (Number.isNaN(activeCoils.tolerance)) throw new CatalogError(`${file}: active_coils: tolerance: expected a number of coils (the field is missing)`);
  const workingForce = single('working_force', (g) => fraction(g, 'tolerance'));
  within(file, '(top level)', () => top.rejectUnknown());
  return { wireDiameter, meanDiameter, shearModulus, activeCoils, workingForce };
}

let cached: ToleranceCatalog | undefined;

/** The file the build writes beside this module and beside the CLI bundle (scripts/build.mjs): the
 * catalog already read and validated, as JSON, so that showing a design's yields pays neither the
 * YAML parser nor the validation (about 15 ms of a cold run). Running from source there is none. */
export const PREBUILT_TOLERANCE_CATALOG = 'tolerance-catalog.json';

function readPrebuilt(): ToleranceCatalog | undefined {
  const file = fileURLToPath(new URL(PREBUILT_TOLERANCE_CATALOG, import.meta.url));
  return existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as ToleranceCatalog) : undefined;
}

/** Read and validate tolerances.yaml of a folder: the source of truth, and the one validator (the
 * build runs it to write the pre-validated JSON). */
export function loadToleranceCatalogFromYaml(directory: string): ToleranceCatalog {
  const file = join(directory, 'tolerances.yaml');
  let doc: unknown;
  try {
    doc = parseYaml(readFileSync(file, 'utf8'));
  } catch (e) {
    throw new CatalogError(`${file}: not readable as YAML (${(e as Error).message.split('\n')[0]})`);
  }
  return parseToleranceCatalog(doc, file);
}

/** The tolerance catalog beside the material catalog, read once: the build's pre-validated JSON when
 * there is one, else the YAML; a given folder's YAML is read every time. */
export function loadToleranceCatalog(directory?: string): ToleranceCatalog {
  if (directory !== undefined) return loadToleranceCatalogFromYaml(directory);
  cached ??= readPrebuilt() ?? loadToleranceCatalogFromYaml(catalogDirectory());
  return cached;
}
