// One renderer of a stock run for every spring kind: the rows' check lines (the judges of src/check/
// build them with numericLine, so a row of any kind has its checks, failures and smallest margin in
// the same shape) rendered as JSON (SI), text, CSV and the HTML section, with the comparison against
// the best custom spring. A kind gives only what is its own (StockView): its spring's figures and
// record, the columns of its shape, its wording and its cautions.
import { bandText, type WorkingBand } from '../check/band.js';
import type { GivenLine } from '../check/extension.js';
import { bandRecord, checkLineRecord, failureText, smallestMarginText } from '../check/report.js';
import { cautionText, cautionsOf, type CautionKind } from '../report/cautions.js';
import { toCsv } from '../report/csv.js';
import { htmlTable } from '../report/html/page.js';
import { esc } from '../report/html/svg.js';
import { SI_UNITS } from '../report/json.js';
import { table } from '../report/table.js';
import { formatQuantity, inUnit, sig, unitSymbol } from '../units/format.js';
import type { Kind } from '../units/kinds.js';
import { readableUnit, type UnitSystem } from '../units/systems.js';
import type { StockRankKey } from './shared.js';
import { failedByLines } from './shared.js';
import type { BadRow } from './table.js';
import { feasibleCountComplete } from '../report/feasibleCount.js';

/** A verdict of any kind: its check lines, the failing ones and the one with the smallest margin. */
export interface StockVerdict {
  readonly pass: boolean;
  readonly lines: GivenLine[];
  readonly failing: GivenLine[];
  readonly limiting: GivenLine | null;
}

/** One checked row of any kind. */
export interface StockRowResult<V extends StockVerdict = StockVerdict> {
  readonly row: { readonly line: number; readonly partNumber: string; readonly materialWord: string; readonly price?: number; readonly tableRate?: number };
  readonly pass: boolean;
  readonly violation: number;
  /** coilfront's rate, N/mm. */
  readonly rate: number;
  readonly rateDeviation: number | null;
  readonly beyondMakerLimits: readonly string[];
  readonly notes: string[];
  readonly verdict: V;
}

/** The best custom spring `design` finds for the same requirements, judged as a stock row is. */
export interface StockComparison<V extends StockVerdict> {
  /** The strategy the design ran and its count of feasible combinations. */
  strategy: string;
  feasible: number;
  /** Whether `feasible` counts every feasible combination (src/report/feasibleCount.ts). */
  feasibleComplete: boolean;
  custom: V | null;
  /** The working force design meets exactly (a stock row meets it within its band). */
  workingForce: number;
}

/** The comparison from a design run: its best candidate, judged as a stock row is by `judge`. */
export function comparison<
  Run extends { result: { strategy: 'grid' | 'genetic'; feasibleCells: number; prunedCells: number }; candidates: C[] },
  C,
  V extends StockVerdict,
>(run: Run, judge: (candidate: C) => V, workingForce: number): StockComparison<V> & { run: Run; candidate: C | null } {
  const candidate = run.candidates[0] ?? null;
  return {
    run,
    candidate,
    strategy: run.result.strategy,
    feasible: run.result.feasibleCells,
    feasibleComplete: feasibleCountComplete(run.result),
    custom: candidate ? judge(candidate) : null,
    workingForce,
  };
}

export interface StockRunOf<V extends StockVerdict, R extends StockRowResult<V>> {
  band: WorkingBand;
  table: { system: UnitSystem; total: number; layout: { ignored: string[] } };
  bad: BadRow[];
  rank: StockRankKey;
  rateDeviationLimit: number;
  results: R[];
  passing: R[];
  misses: R[];
  top: number;
  failedBy: Record<string, number>;
  compare: StockComparison<V> | null;
}

/** The figures of a judged spring that every kind's tables show. */
export interface StockFigures {
  material: string;
  wireDiameter: number;
  meanDiameter: number;
  outerDiameter: number;
  freeLength: number;
  rate: number;
  /** At each length of the requirement, working first. */
  forces: number[];
  staticSafety: number;
  fatigueSafety: number | null;
  mass: number;
}

/** The figures from an analysis of either kind (both carry the geometry, the rate and the points). */
export function stockFigures(
  material: string,
  a: {
    geometry: { wireDiameter: number; meanDiameter: number; outerDiameter: number; freeLength: number; mass: number };
    rate: number;
    points: readonly { force: number }[];
  },
  staticSafety: number,
  fatigueSafety: number | null,
): StockFigures {
  const g = a.geometry;
  return {
    material,
    wireDiameter: g.wireDiameter,
    meanDiameter: g.meanDiameter,
    outerDiameter: g.outerDiameter,
    freeLength: g.freeLength,
    rate: a.rate,
    forces: a.points.map((p) => p.force),
    staticSafety,
    fatigueSafety,
    mass: g.mass,
  };
}

/** A figure in a unit system, to `digits` significant digits (tables). */
export const num = (v: number, kind: Kind, system: UnitSystem, digits = 4) => sig(inUnit(v, kind, system), digits);
/** A unit symbol as a CSV column name carries it (`rate_N_per_mm`). */
export const csvUnit = (k: Kind, system: UnitSystem) => unitSymbol(k, system).replace('/', '_per_').replace('^', '');
/** A figure in a unit system as CSV writes it: six significant digits. */
export const six = (v: number, k: Kind, system: UnitSystem) => Number(sig(inUnit(v, k, system), 6));

/** A column of the text and HTML tables. */
export interface GridColumn<R> {
  head: string;
  cell(r: R): string;
}

/** A column of the CSV. */
export interface CsvColumn<R> {
  head: string;
  value(r: R): number | string | null;
}

/** What one kind gives the renderer. */
export interface StockView<V extends StockVerdict, R extends StockRowResult<V>, Run extends StockRunOf<V, R>> {
  /** JSON keys after `units` (the extension kind says `kind: extension`). */
  readonly jsonKind: Record<string, unknown>;
  readonly cautions?: CautionKind;
  /** Heading of the HTML section. */
  readonly title: string;
  /** Written under every output (how stock rows are judged). */
  readonly note: string;
  /** What the ' !' after a part number means. */
  readonly makerLimitsNote: string;
  requirementsRecord(run: Run): Record<string, unknown>;
  /** The text's first line. */
  heading(run: Run, system: UnitSystem, tableLabel: string): string;
  figures(v: V): StockFigures;
  springRecord(v: V): Record<string, unknown>;
  /** The text and HTML columns of its own shape, between OD and the rate. */
  gridColumns(system: UnitSystem): GridColumn<R>[];
  /** The CSV columns of its own shape, after material; and its own figures after the forces. */
  csvShape(system: UnitSystem): CsvColumn<R>[];
  csvStresses(system: UnitSystem): CsvColumn<R>[];
  /** The check's label for the count of rows each check failed. */
  label(name: string): string;
}

type AnyView = StockView<StockVerdict, StockRowResult, StockRunOf<StockVerdict, StockRowResult>>;
type AnyRun = StockRunOf<StockVerdict, StockRowResult>;

const limitingRecord = (v: StockVerdict) => (v.limiting ? { name: v.limiting.name, margin: v.limiting.margin } : null);
// In the check's own unit where it has one (clash: mm of coil clearance), as the check command writes it.
const smallestMargin = (v: StockVerdict, system: UnitSystem) => smallestMarginText(v.limiting, system);

export function rowRecord(view: AnyView, r: StockRowResult): Record<string, unknown> {
  const v = r.verdict;
  return {
    line: r.row.line,
    part_number: r.row.partNumber,
    material_word: r.row.materialWord,
    price: r.row.price ?? null,
    table_rate: r.row.tableRate ?? null,
    rate_deviation: r.rateDeviation,
    beyond_maker_limits: r.beyondMakerLimits,
    pass: v.pass,
    failing: v.failing.map((l) => ({ name: l.name, by: l.margin === null ? null : -l.margin })),
    limiting_check: limitingRecord(v),
    spring: view.springRecord(v),
    checks: v.lines.map(checkLineRecord),
    notes: r.notes,
  };
}

export function rateNotes<R extends StockRowResult>(run: StockRunOf<StockVerdict, R>): R[] {
  return run.results.filter((r) => r.rateDeviation !== null && Math.abs(r.rateDeviation) > run.rateDeviationLimit);
}

function compareRecord(view: AnyView, run: AnyRun): Record<string, unknown> | null {
  const c = run.compare;
  if (!c) return null;
  const best = run.passing[0];
  return {
    design_strategy: c.strategy,
    design_feasible: c.feasible,
    design_feasible_complete: c.feasibleComplete,
    best_custom: c.custom ? { ...view.springRecord(c.custom), limiting_check: limitingRecord(c.custom) } : null,
    best_stock: best
      ? {
          part_number: best.row.partNumber,
          line: best.row.line,
          price: best.row.price ?? null,
          ...view.springRecord(best.verdict),
          limiting_check: limitingRecord(best.verdict),
        }
      : null,
    stock_over_custom_mass: best && c.custom ? view.figures(best.verdict).mass / view.figures(c.custom).mass : null,
  };
}

export function renderStockJson(view: AnyView, run: AnyRun): Record<string, unknown> {
  return {
    units: SI_UNITS,
    ...view.jsonKind,
    requirements: view.requirementsRecord(run),
    working_band: bandRecord(run.band),
    table: {
      units: run.table.system,
      rows: run.table.total,
      checked: run.results.length,
      bad: run.bad.length,
      passing: run.passing.length,
      failing: run.results.length - run.passing.length,
      ignored_columns: run.table.layout.ignored,
    },
    rank: run.rank,
    passing: run.passing.slice(0, run.top).map((r) => rowRecord(view, r)),
    near_misses: run.misses.map((r) => rowRecord(view, r)),
    failed_by: run.failedBy,
    rate_deviation_limit: run.rateDeviationLimit,
    rate_notes: rateNotes(run).map((r) => ({
      line: r.row.line,
      part_number: r.row.partNumber,
      table_rate: r.row.tableRate,
      rate: r.rate,
      deviation: r.rateDeviation,
    })),
    bad_rows: run.bad.map((b) => ({ line: b.line, part_number: b.partNumber, field: b.field, message: b.message })),
    compare: compareRecord(view, run),
    notes: [view.note],
    cautions: cautionsOf(view.cautions),
  };
}

/** The columns shared by the text table and the HTML report: the row, the kind's shape, the figures
 * every kind has, the price and the smallest margin. */
export function stockGrid(view: AnyView, rows: StockRowResult[], system: UnitSystem, ranked: boolean): { header: string[]; cells: string[][] } {
  const u = (k: Kind) => unitSymbol(k, system);
  const figures = rows.map((r) => view.figures(r.verdict));
  // Masses in grams (ounces) when every spring listed is under 1 kg (1 lb).
  const mass = readableUnit(system, 'mass', Math.max(0, ...figures.map((f) => f.mass)));
  const own = view.gridColumns(system);
  const header = [
    ranked ? '#' : 'line',
    'part',
    'material',
    `d ${u('length')}`,
    `OD ${u('length')}`,
    ...own.map((c) => c.head),
    `k ${u('rate')}`,
    `forces ${u('force')}`,
    'SF static',
    'SF fatigue',
    `mass ${mass.symbol}`,
    'price',
    'smallest margin',
  ];
  const cells = rows.map((r, i) => {
    const f = figures[i];
    return [
      ranked ? String(i + 1) : String(r.row.line),
      r.row.partNumber + (r.beyondMakerLimits.length ? ' !' : ''),
      f.material,
      num(f.wireDiameter, 'length', system),
      num(f.outerDiameter, 'length', system),
      ...own.map((c) => c.cell(r)),
      num(f.rate, 'rate', system),
      f.forces.map((F) => num(F, 'force', system, 3)).join(' / '),
      sig(f.staticSafety, 3),
      f.fatigueSafety === null ? '-' : sig(f.fatigueSafety, 3),
      sig(mass.fromCore(f.mass), 3),
      r.row.price !== undefined ? sig(r.row.price, 4) : '-',
      smallestMargin(r.verdict, system),
    ];
  });
  return { header, cells };
}

export function missText(r: StockRowResult, system: UnitSystem): string {
  return `${r.row.partNumber} (line ${r.row.line}) fails ${r.verdict.failing.map((l) => failureText(l, system)).join('; ')}`;
}

/** Stock against custom, side by side: mass, outer diameter, free length, margins. */
export function compareRows(view: AnyView, run: AnyRun, system: UnitSystem): string[][] | null {
  const c = run.compare;
  if (!c) return null;
  const best = run.passing[0];
  const col = (v: StockVerdict | null | undefined, name: string): string[] => {
    if (!v) return [name, '-', '-', '-', '-', '-', '-', '-', '-'];
    const f = view.figures(v);
    return [
      name,
      f.material,
      formatQuantity(f.mass, 'mass', system, 3),
      formatQuantity(f.outerDiameter, 'length', system),
      formatQuantity(f.freeLength, 'length', system),
      formatQuantity(f.rate, 'rate', system),
      sig(f.staticSafety, 3),
      f.fatigueSafety === null ? '-' : sig(f.fatigueSafety, 3),
      smallestMargin(v, system),
    ];
  };
  return [
    ['', 'material', 'mass', 'outer diameter', 'free length', 'rate', 'SF static', 'SF fatigue', 'smallest margin'],
    col(c.custom, 'best custom (design #1)'),
    col(best?.verdict, best ? `best stock: ${best.row.partNumber}` : 'best stock: none passes'),
  ];
}

export function compareSummary(view: AnyView, run: AnyRun): string {
  const c = run.compare!;
  const best = run.passing[0];
  if (!c.custom) return 'design finds no custom spring that meets every requirement.';
  if (!best) return 'No stock row passes: the custom spring is the only option.';
  const stock = view.figures(best.verdict);
  const ratio = stock.mass / view.figures(c.custom).mass;
  const why =
    ratio < 1
      ? ` It is lighter because it works at ${sig(stock.forces[0], 4)} N at the working length, inside the working-force band, where design meets ${sig(c.workingForce, 4)} N exactly.`
      : '';
  return `The best stock spring (${best.row.partNumber}) is ${sig(Math.abs(ratio - 1) * 100, 3)}% ${ratio >= 1 ? 'heavier' : 'lighter'} than the best custom spring; it ships from stock with no tooling.${why}`;
}

export function renderStockText(view: AnyView, run: AnyRun, system: UnitSystem, tableLabel: string): string {
  const out: string[] = [];
  out.push(view.heading(run, system, tableLabel));
  out.push(`Working force band: ${bandText(run.band, system)}`);
  out.push(
    `Table: ${run.table.total} rows, ${run.results.length} checked, ${run.bad.length} bad${run.bad.length ? ' (each on stderr with its line and column)' : ''}; ${run.passing.length} pass every check${run.passing.length ? `, ranked by ${run.rank.replace('_', ' ')}` : ''}.`,
  );
  out.push('');
  if (run.passing.length) {
    const shown = run.passing.slice(0, run.top);
    const t = stockGrid(view, shown, system, true);
    out.push(table([t.header, ...t.cells]));
    if (run.passing.length > shown.length) out.push(`  ... and ${run.passing.length - shown.length} more (--top)`);
  } else {
    out.push('No row passes every check.');
  }
  if (run.misses.length) {
    out.push('');
    out.push('Best near misses (least total violation) and what they fail, by how much:');
    const t = stockGrid(view, run.misses, system, false);
    out.push(table([t.header, ...t.cells]));
    for (const r of run.misses) out.push(`  - ${missText(r, system)}`);
  }
  if ([...run.passing.slice(0, run.top), ...run.misses].some((r) => r.beyondMakerLimits.length)) out.push(`  ! ${view.makerLimitsNote}`);
  out.push(...failedByLines(run.failedBy, view.label));
  const rates = rateNotes(run);
  if (rates.length) {
    out.push('');
    out.push(
      `The table's rate differs from coilfront's k = G d^4 / (8 D^3 Na) by more than ${sig(run.rateDeviationLimit * 100, 3)}% on ${rates.length} row${rates.length === 1 ? '' : 's'} (a catalogue rate is a nominal with its own tolerance; the checks use coilfront's):`,
    );
    const u = unitSymbol('rate', system);
    out.push(
      table([
        ['line', 'part', `table k ${u}`, `coilfront k ${u}`, 'difference'],
        ...rates
          .slice(0, 20)
          .map((r) => [
            String(r.row.line),
            r.row.partNumber,
            num(r.row.tableRate!, 'rate', system),
            num(r.rate, 'rate', system),
            `${r.rateDeviation! >= 0 ? '+' : ''}${sig(r.rateDeviation! * 100, 3)}%`,
          ]),
      ]),
    );
    if (rates.length > 20) out.push(`  ... and ${rates.length - 20} more (all in --json and the CSV)`);
  }
  if (run.compare) {
    out.push('');
    out.push('Stock against custom (--compare: the best spring `design` finds for the same requirements):');
    out.push(table(compareRows(view, run, system)!));
    out.push(`  ${compareSummary(view, run)}`);
  }
  out.push('');
  out.push('Notes:');
  out.push(`  ! ${view.note}`);
  if (run.table.layout.ignored.length) out.push(`  ! columns read past (not stock fields): ${run.table.layout.ignored.join(', ')}`);
  for (const r of run.passing.slice(0, run.top)) for (const n of r.notes.filter((x) => !/table's rate/.test(x))) out.push(`  ! ${r.row.partNumber}: ${n}`);
  out.push('');
  out.push(cautionText(view.cautions));
  return out.join('\n') + '\n';
}

/** Every checked row for a spreadsheet: passing rows in rank order, then the rest by how close they came. */
export function renderStockCsv(view: AnyView, run: AnyRun, system: UnitSystem): string {
  const s = (k: Kind) => csvUnit(k, system);
  const f = (r: StockRowResult) => view.figures(r.verdict);
  const columns: CsvColumn<StockRowResult>[] = [
    ...view.csvShape(system),
    { head: `rate_${s('rate')}`, value: (r) => six(f(r).rate, 'rate', system) },
    { head: `table_rate_${s('rate')}`, value: (r) => (r.row.tableRate !== undefined ? six(r.row.tableRate, 'rate', system) : null) },
    { head: `working_force_${s('force')}`, value: (r) => six(f(r).forces[0], 'force', system) },
    { head: `operating_force_${s('force')}`, value: (r) => (f(r).forces.length > 1 ? six(f(r).forces[f(r).forces.length - 1], 'force', system) : null) },
    ...view.csvStresses(system),
    { head: 'static_safety_factor', value: (r) => Number(sig(f(r).staticSafety, 5)) },
    { head: 'fatigue_safety_factor', value: (r) => (f(r).fatigueSafety === null ? null : Number(sig(f(r).fatigueSafety!, 5))) },
    { head: `mass_${s('mass')}`, value: (r) => six(f(r).mass, 'mass', system) },
  ];
  const header = [
    'rank',
    'verdict',
    'line',
    'part_number',
    'material',
    ...columns.map((c) => c.head),
    'price',
    'limiting_check',
    'smallest_margin',
    'failing_checks',
  ];
  const failing = run.results.filter((r) => !r.pass).sort((a, b) => a.violation - b.violation || a.row.line - b.row.line);
  const rows = [...run.passing, ...failing].map((r, i) => {
    const v = r.verdict;
    return [
      v.pass ? i + 1 : null,
      v.pass ? 'pass' : 'fail',
      r.row.line,
      r.row.partNumber,
      f(r).material,
      ...columns.map((c) => c.value(r)),
      r.row.price ?? null,
      v.limiting?.name ?? null,
      v.limiting?.margin !== undefined && v.limiting.margin !== null ? Number(sig(v.limiting.margin, 5)) : null,
      v.failing.map((l) => (l.margin === null ? l.name : `${l.name} ${sig(-l.margin * 100, 3)}%`)).join('; '),
    ];
  });
  return toCsv(header, rows);
}

/** The stock section of an HTML report. */
export function renderStockSection(view: AnyView, run: AnyRun, system: UnitSystem, tableLabel: string): string[] {
  const out: string[] = [];
  out.push(`<h2>${esc(view.title)}</h2>`);
  out.push(
    htmlTable(
      ['item', 'value'],
      [
        ['table', tableLabel],
        ['rows', `${run.table.total} (${run.results.length} checked, ${run.bad.length} bad)`],
        ['working force band', bandText(run.band, system)],
        ['pass every check', `${run.passing.length}${run.passing.length ? `, ranked by ${run.rank.replace('_', ' ')}` : ''}`],
      ],
      { cls: 'kv' },
    ),
  );
  if (run.passing.length) {
    const t = stockGrid(view, run.passing.slice(0, run.top), system, true);
    out.push(htmlTable(t.header, t.cells, { bestFirst: true }));
  } else out.push('<p>No row passes every check.</p>');
  if (run.misses.length) {
    out.push('<h2>Best near misses</h2>');
    const t = stockGrid(view, run.misses, system, false);
    out.push(htmlTable(t.header, t.cells));
    out.push(`<ul>${run.misses.map((r) => `<li>${esc(missText(r, system))}</li>`).join('')}</ul>`);
  }
  const cut = Object.entries(run.failedBy).sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]));
  if (cut.length)
    out.push(
      htmlTable(
        ['check', 'rows failing it'],
        cut.map(([n, c]) => [n, String(c)]),
        { cls: 'kv' },
      ),
    );
  const rates = rateNotes(run);
  if (rates.length) {
    out.push(
      `<p>The table's rate differs from coilfront's by more than ${sig(run.rateDeviationLimit * 100, 3)}% on ${rates.length} rows (a catalogue rate is a nominal with its own tolerance; the checks use coilfront's): ${esc(
        rates
          .slice(0, 12)
          .map((r) => `${r.row.partNumber} ${r.rateDeviation! >= 0 ? '+' : ''}${sig(r.rateDeviation! * 100, 3)}%`)
          .join(', '),
      )}${rates.length > 12 ? ', ...' : ''}.</p>`,
    );
  }
  if (run.bad.length) {
    out.push('<h2>Bad rows (skipped)</h2>');
    out.push(
      htmlTable(
        ['line', 'part', 'column', 'what was expected'],
        run.bad.slice(0, 50).map((b) => [String(b.line), b.partNumber ?? '-', b.field, b.message]),
      ),
    );
  }
  const rows = compareRows(view, run, system);
  if (rows) {
    out.push('<h2>Stock against custom</h2>');
    out.push(htmlTable(rows[0], rows.slice(1), { cls: '' }));
    out.push(`<p>${esc(compareSummary(view, run))}</p>`);
  }
  out.push(`<p>${esc(view.note)}</p>`);
  return out;
}
