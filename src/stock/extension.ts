// `stock` against extension requirements (`kind: extension`): every row of a table of extension
// springs through the same path as `check` (the row as a spring file read by the extension reader,
// then judgeExtension: the full analysis under the requirement's service, every extension check, the
// working-force band, the material and the loop type the requirement names), the passing rows ranked
// like design, the rows that fail closest, and the counts per check. A table of compression springs
// runs against a compression requirement (./run.ts); a row of the other kind is a bad row, named.
import type { Catalog } from '../catalogs/types.js';
import { workingBand, type WorkingBand } from '../check/band.js';
import { judgeExtension, type ExtensionVerdict } from '../check/extension.js';
import { isRecord } from '../units/fields.js';
import { EXTENSION_CAUTIONS } from '../kinds/extension/analysis.js';
import { loadExtensionCatalog } from '../kinds/extension/catalog.js';
import { EXTENSION_CHECK_LABELS } from '../kinds/extension/checks.js';
import { extensionRequirementsRecord, fatigueSafety, staticSafety } from '../kinds/extension/report.js';
import { readExtensionRequirements, type ExtensionRequirements } from '../kinds/extension/requirements.js';
import { readExtensionSpring, type ExtensionCase } from '../kinds/extension/springFile.js';
import { designExtension, type ExtensionCandidate, type ExtensionDesignRun } from '../kinds/extension/design.js';
import { formatQuantity, sig, unitSymbol } from '../units/format.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { DIAMETER_FIELDS, readHeader, type FieldType, type Layout } from './columns.js';
import { readMaterialMap, resolveMaterial, type MaterialMap } from './materialMap.js';
import { comparison, csvUnit, num, six, stockFigures, type StockComparison, type StockFigures, type StockView } from './render.js';
import { DEFAULT_RATE_DEVIATION, settleRows, type StockOptions, type StockRankKey } from './shared.js';
import { RowError, firstFilled, numberCell, quantityCell, rawRows, type BadRow } from './table.js';

/** The columns of a table of extension springs (a unit suffix as for compression tables). Lengths are
 * inside the loops, as in an extension spring file. */
export const EXTENSION_STOCK_FIELDS = {
  part_number: 'text',
  material: 'text',
  wire_diameter: 'length',
  outer_diameter: 'length',
  mean_diameter: 'length',
  inner_diameter: 'length',
  body_coils: 'count',
  initial_tension: 'force',
  loop: 'text',
  loop_length: 'length',
  free_length: 'length',
  rate: 'rate',
  max_load: 'force',
  max_extended_length: 'length',
  price: 'number',
  kind: 'text',
} as const satisfies Record<string, FieldType>;
export type ExtensionStockField = keyof typeof EXTENSION_STOCK_FIELDS;

const REQUIRED: readonly (ExtensionStockField | readonly ExtensionStockField[])[] = [
  'part_number',
  'material',
  'wire_diameter',
  DIAMETER_FIELDS,
  'body_coils',
  'initial_tension',
];

export const EXTENSION_STOCK_NOTE = 'Stock rows are judged as not shot-peened (a stock table has no column for it); lengths are inside the loops.';

export interface ExtensionStockRow {
  line: number;
  partNumber: string;
  materialWord: string;
  /** The row as an extension spring file (SI), as `check` and `analyze` read it. */
  springFile: Record<string, unknown>;
  /** The column each spring-file field came from, to name it in a message. */
  columnOf: Record<string, string>;
  tableRate?: number;
  maxLoad?: number;
  maxExtendedLength?: number;
  price?: number;
}

export interface ExtensionRowResult {
  row: ExtensionStockRow;
  verdict: ExtensionVerdict;
  pass: boolean;
  /** Sum of the positive check values (text checks count 1): how far the row is from passing. */
  violation: number;
  rankValue: number;
  /** coilfront's rate, N/mm. */
  rate: number;
  rateDeviation: number | null;
  /** The table's own limits (max_load, max_extended_length) that the requirement goes beyond. */
  beyondMakerLimits: string[];
  notes: string[];
  failingNames: string[];
}

export interface ExtensionStockRun {
  kind: 'extension';
  req: ExtensionRequirements;
  band: WorkingBand;
  table: { system: UnitSystem; total: number; layout: Layout<ExtensionStockField> };
  bad: BadRow[];
  rank: StockRankKey;
  rateDeviationLimit: number;
  results: ExtensionRowResult[];
  passing: ExtensionRowResult[];
  misses: ExtensionRowResult[];
  top: number;
  failedBy: Record<string, number>;
  compare: ExtensionComparison | null;
}

/** The best custom spring beside the stock rows (--compare): the extension design run, its best
 * candidate, and that candidate judged as a stock row is (`custom`). */
export interface ExtensionComparison extends StockComparison<ExtensionVerdict> {
  run: ExtensionDesignRun;
  candidate: ExtensionCandidate | null;
}

interface RowContext {
  system: UnitSystem;
  materialMap: MaterialMap;
  catalog: Catalog;
}

function readRow(cells: string[], line: number, layout: Layout<ExtensionStockField>, o: RowContext): ExtensionStockRow {
  const cols = layout.columns;
  const cell = (f: ExtensionStockField): string | undefined => {
    const c = cols[f];
    const v = c ? (cells[c.index] ?? '').trim() : '';
    return v === '' ? undefined : v;
  };
  const need = (f: ExtensionStockField, what: string): string => {
    const v = cell(f);
    if (v === undefined) throw new RowError(cols[f]?.name ?? f, `${what} (the cell is empty)`);
    return v;
  };
  const partNumber = need('part_number', 'a part number');
  const kind = cell('kind');
  if (kind !== undefined && kind.toLowerCase() !== 'extension') {
    throw new RowError(
      cols.kind!.name,
      `extension (the requirements are for extension springs: check ${kind.toLowerCase() === 'compression' ? 'compression rows' : 'other rows'} against requirements of their own kind), got ${JSON.stringify(kind)}`,
    );
  }
  const materialWord = need('material', 'a material');
  const material = resolveMaterial(materialWord, o.materialMap, o.catalog);
  if (!material)
    throw new RowError(
      cols.material!.name,
      `a catalog material id or a word that the requirements' material_map maps to one, got ${JSON.stringify(materialWord)}`,
    );
  const q = (f: ExtensionStockField) => quantityCell(cell(f)!, cols[f]!, o.system, EXTENSION_STOCK_FIELDS[f] as 'length' | 'force' | 'rate');
  const diameter = firstFilled(DIAMETER_FIELDS, cols, cell, 'a coil diameter');
  need('wire_diameter', 'a wire diameter');
  need('body_coils', 'a body-coil count');
  const fi = need('initial_tension', 'an initial tension');
  const springFile: Record<string, unknown> = {
    kind: 'extension',
    units: 'si',
    material,
    wire_diameter: q('wire_diameter'),
    [diameter]: q(diameter),
    body_coils: numberCell(cell('body_coils')!, cols.body_coils!, { positive: true }),
    // A spring may be wound without initial tension: zero is a value, not an empty cell.
    initial_tension: Number(fi) === 0 ? 0 : q('initial_tension'),
    peened: false,
  };
  const columnOf: Record<string, string> = {};
  for (const f of ['material', 'wire_diameter', diameter, 'body_coils', 'initial_tension'] as ExtensionStockField[]) columnOf[f] = cols[f]!.name;
  for (const f of ['loop', 'loop_length', 'free_length'] as const) {
    if (cell(f) === undefined) continue;
    springFile[f] = f === 'loop' ? cell(f) : q(f);
    columnOf[f] = cols[f]!.name;
  }
  const row: ExtensionStockRow = { line, partNumber, materialWord, springFile, columnOf };
  if (cell('rate') !== undefined) row.tableRate = q('rate');
  if (cell('max_load') !== undefined) row.maxLoad = q('max_load');
  if (cell('max_extended_length') !== undefined) row.maxExtendedLength = q('max_extended_length');
  if (cell('price') !== undefined) row.price = numberCell(cell('price')!, cols.price!, { nonNegative: true });
  return row;
}

function rankValue(v: ExtensionVerdict, row: ExtensionStockRow, key: StockRankKey): number {
  const a = v.analysis;
  const g = a.geometry;
  switch (key) {
    case 'mass':
      return g.mass;
    case 'wire_volume':
      return g.wireVolume;
    case 'outer_diameter':
      return g.outerDiameter;
    case 'free_length':
      return g.freeLength;
    case 'safety_factor':
      return -Math.min(staticSafety(a), fatigueSafety(a) ?? Infinity);
    case 'price':
      return row.price ?? Infinity;
  }
}

function judgeRow(
  row: ExtensionStockRow,
  req: ExtensionRequirements,
  band: WorkingBand,
  loopStated: boolean,
  catalog: Catalog,
  rank: StockRankKey,
  rateLimit: number,
): ExtensionRowResult {
  let spring;
  try {
    spring = readExtensionSpring(row.springFile, catalog, loadExtensionCatalog(catalog.materials));
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    throw new RowError(row.columnOf[e.field] ?? e.field, e.expected);
  }
  const verdict = judgeExtension(spring, row.springFile, req, band, loopStated);
  const a = verdict.analysis;
  const notes = [...spring.notes];
  const rateDeviation = row.tableRate !== undefined ? (row.tableRate - a.rate) / a.rate : null;
  if (rateDeviation !== null && Math.abs(rateDeviation) > rateLimit)
    notes.push(`the table's rate differs from coilfront's by ${(rateDeviation * 100).toFixed(1)}% (more than ${(rateLimit * 100).toFixed(0)}%)`);
  const beyondMakerLimits: string[] = [];
  const longest = Math.max(req.operatingLength ?? req.workingLength, req.maxExtendedLength ?? 0);
  if (row.maxExtendedLength !== undefined && longest > row.maxExtendedLength) beyondMakerLimits.push('max_extended_length');
  if (row.maxLoad !== undefined && a.points.reduce((m, p) => Math.max(m, p.force), 0) > row.maxLoad) beyondMakerLimits.push('max_load');
  const violation = verdict.lines.reduce((s, l) => s + (Number.isFinite(l.g) && l.g > 0 ? l.g : 0), 0);
  return {
    row,
    verdict,
    pass: verdict.pass,
    violation,
    rankValue: rankValue(verdict, row, rank),
    rate: a.rate,
    rateDeviation,
    beyondMakerLimits,
    notes,
    failingNames: verdict.failing.map((l) => l.name),
  };
}

export function runExtensionStock(
  rawRequirements: unknown,
  input: string | Record<string, unknown>[],
  catalog: Catalog,
  o: StockOptions = {},
): ExtensionStockRun {
  const ext = loadExtensionCatalog(catalog.materials);
  const req = readExtensionRequirements(rawRequirements, catalog, ext);
  const label = o.label ?? 'stock table';
  const system = o.units ?? 'si';
  const bad: BadRow[] = [];
  const { header, rows: raw } = rawRows(input, label, bad);
  const layout = readHeader<ExtensionStockField>(header, label, system, EXTENSION_STOCK_FIELDS, REQUIRED);
  const context: RowContext = { system, materialMap: readMaterialMap(rawRequirements, catalog), catalog };
  const band = workingBand(req);
  const loopStated = isRecord(rawRequirements) && rawRequirements.loop !== undefined && rawRequirements.loop !== null;
  const rank = o.rank ?? req.rank;
  const rateLimit = o.rateDeviation ?? DEFAULT_RATE_DEVIATION;
  const results: ExtensionRowResult[] = [];
  for (const { cells, line } of raw) {
    try {
      results.push(judgeRow(readRow(cells, line, layout, context), req, band, loopStated, catalog, rank, rateLimit));
    } catch (e) {
      if (!(e instanceof RowError)) throw e;
      const pc = layout.columns.part_number;
      bad.push({ line, partNumber: pc ? (cells[pc.index] ?? '').trim() || null : null, field: e.field, message: `expected ${e.message}` });
    }
  }
  const { passing, misses, failedBy } = settleRows(results, bad, label, o.misses);
  let compare: ExtensionComparison | null = null;
  if (o.compare) {
    const run = designExtension(req, catalog, { strategy: o.strategy }, ext);
    compare = comparison(run, (c) => judgeExtension(customCase(c, run), {}, req, band, loopStated), req.workingForce);
  }
  return {
    kind: 'extension',
    req,
    band,
    table: { system, total: raw.length + bad.filter((b) => b.field === 'row').length, layout },
    bad,
    rank,
    rateDeviationLimit: rateLimit,
    results,
    passing,
    misses,
    top: o.top ?? req.top,
    failedBy,
    compare,
  };
}

/** The best custom spring as a given spring, as a spring file of it would read (the requirement's
 * peening: judged with an empty spring document). */
function customCase(c: ExtensionCandidate, run: ExtensionDesignRun): ExtensionCase {
  return {
    kind: 'extension',
    system: 'si',
    materialChoice: c.item.choice,
    material: c.item.material,
    geometry: c.geometry,
    service: run.problem.service(),
    notes: [],
  };
}

// ---- what the renderer (./render.ts) shows of an extension spring ----

const figures = (v: ExtensionVerdict): StockFigures =>
  stockFigures(v.spring.materialChoice.material.id, v.analysis, staticSafety(v.analysis), fatigueSafety(v.analysis));

function springRecord(v: ExtensionVerdict): Record<string, unknown> {
  const a = v.analysis;
  const g = a.geometry;
  const m = v.spring.materialChoice.material;
  return {
    material: m.id,
    material_name: m.name,
    loop: g.loop,
    wire_diameter: g.wireDiameter,
    mean_diameter: g.meanDiameter,
    outer_diameter: g.outerDiameter,
    spring_index: g.springIndex,
    body_coils: g.bodyCoils,
    active_coils: g.activeCoils,
    free_length: g.freeLength,
    initial_tension: a.initialTension.force,
    initial_tension_stress: a.initialTension.stress,
    initial_tension_band: a.initialTension.position,
    rate: a.rate,
    mass: g.mass,
    static_safety_factor: staticSafety(a),
    fatigue_safety_factor: fatigueSafety(a),
    points: a.points.map((p) => ({
      length: p.length,
      force: p.force,
      body_stress: p.bodyStress,
      loop_bending_stress: p.loopBendingStress,
      loop_torsion_stress: p.loopTorsionStress,
    })),
  };
}

/** What a table of extension springs shows of its own. */
export const EXTENSION_STOCK_VIEW: StockView<ExtensionVerdict, ExtensionRowResult, ExtensionStockRun> = {
  jsonKind: { kind: 'extension' },
  cautions: EXTENSION_CAUTIONS,
  title: 'Stock extension springs',
  note: EXTENSION_STOCK_NOTE,
  makerLimitsNote: "marks a part that the requirement takes beyond the table's own max_extended_length or max_load: ask the maker before using it there",
  requirementsRecord: (run) => extensionRequirementsRecord(run.req),
  heading: (run, system, tableLabel) => {
    const req = run.req;
    const F = (v: number) => formatQuantity(v, 'force', system);
    const L = (v: number) => formatQuantity(v, 'length', system);
    return (
      `Stock extension springs for ${F(req.workingForce)} at ${L(req.workingLength)} inside the loops` +
      (req.operatingLength !== undefined
        ? `, stretched to ${L(req.operatingLength)}${req.operatingForce !== undefined ? ` at ${F(req.operatingForce)}` : ''}`
        : '') +
      `; table ${tableLabel} (plain numbers in ${run.table.system === 'us' ? 'in, lbf' : 'mm, N'})`
    );
  },
  figures,
  springRecord,
  gridColumns: (system) => {
    const g = (r: ExtensionRowResult) => r.verdict.analysis.geometry;
    const it = (r: ExtensionRowResult) => r.verdict.analysis.initialTension;
    return [
      { head: 'Nb', cell: (r) => sig(g(r).bodyCoils, 4) },
      { head: 'loop', cell: (r) => g(r).loop },
      { head: `L0 ${unitSymbol('length', system)}`, cell: (r) => num(g(r).freeLength, 'length', system) },
      { head: `Fi ${unitSymbol('force', system)}`, cell: (r) => num(it(r).force, 'force', system, 3) },
      { head: 'Fi band', cell: (r) => it(r).position },
    ];
  },
  csvShape: (system) => {
    const L = `_${csvUnit('length', system)}`;
    const g = (r: ExtensionRowResult) => r.verdict.analysis.geometry;
    const it = (r: ExtensionRowResult) => r.verdict.analysis.initialTension;
    return [
      { head: 'loop', value: (r) => g(r).loop },
      { head: `wire_diameter${L}`, value: (r) => six(g(r).wireDiameter, 'length', system) },
      { head: `mean_diameter${L}`, value: (r) => six(g(r).meanDiameter, 'length', system) },
      { head: `outer_diameter${L}`, value: (r) => six(g(r).outerDiameter, 'length', system) },
      { head: 'body_coils', value: (r) => g(r).bodyCoils },
      { head: 'active_coils', value: (r) => g(r).activeCoils },
      { head: `free_length${L}`, value: (r) => six(g(r).freeLength, 'length', system) },
      { head: `initial_tension_${csvUnit('force', system)}`, value: (r) => six(it(r).force, 'force', system) },
      { head: 'initial_tension_band', value: (r) => it(r).position },
    ];
  },
  csvStresses: () => [],
  label: (name) =>
    EXTENSION_CHECK_LABELS[name as keyof typeof EXTENSION_CHECK_LABELS] ??
    (name.startsWith('working_force') ? `working force ${name.endsWith('min') ? 'below' : 'above'} its band` : name),
};
