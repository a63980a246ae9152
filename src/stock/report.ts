// The outcome of `stock` for people (text), machines (JSON, SI) and spreadsheets (CSV: every row
// checked, units in the column names): the passing rows ranked, the near misses and what they fail by
// how much, the rows each check cut, the table's rates beside coilfront's, the bad rows, and with
// --compare the best custom spring beside the best stock one.
import { bandText } from '../check/band.js';
import { bandRecord, checkLineRecord, failingRecord, failureText, givenSpringRecord, writeMargin } from '../check/report.js';
import { GIVEN_CHECK_LABELS, type Verdict } from '../check/judge.js';
import { cautionText, cautionsOf } from '../report/cautions.js';
import { toCsv } from '../report/csv.js';
import { requirementsRecord } from '../kinds/compression/report/designReport.js';
import { SI_UNITS } from '../report/json.js';
import { table } from '../report/table.js';
import { CHECK_LABELS, type CheckName } from '../kinds/compression/verify.js';
import { formatQuantity, inUnit, sig, unitSymbol } from '../units/format.js';
import type { Kind } from '../units/kinds.js';
import { readableUnit, type UnitSystem } from '../units/systems.js';
import type { AnyStockRun, RowResult, StockRun } from './run.js';
import { extensionStockCsv, extensionStockJson, extensionStockText } from './extension.js';
import { failedByLines } from './shared.js';

export const STOCK_NOTE = 'Stock rows are judged as not shot-peened and without set removal (a stock table has no column for either).';

const label = (name: string) => CHECK_LABELS[name as CheckName] ?? GIVEN_CHECK_LABELS[name as keyof typeof GIVEN_CHECK_LABELS] ?? name;

export function rowRecord(r: RowResult): Record<string, unknown> {
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
    failing: failingRecord(v),
    limiting_check: v.limiting ? { name: v.limiting.name, margin: v.limiting.margin } : null,
    spring: givenSpringRecord(v),
    checks: v.lines.map(checkLineRecord),
    notes: r.notes,
  };
}

function rateNotes(run: StockRun): RowResult[] {
  return run.results.filter((r) => r.rateDeviation !== null && Math.abs(r.rateDeviation) > run.rateDeviationLimit);
}

export function compareRecord(run: StockRun): Record<string, unknown> | null {
  const c = run.compare;
  if (!c) return null;
  const best = run.passing[0];
  const custom =
    c.custom && c.verdict
      ? { ...givenSpringRecord(c.verdict), limiting_check: c.verdict.limiting ? { name: c.verdict.limiting.name, margin: c.verdict.limiting.margin } : null }
      : null;
  const stock = best
    ? {
        part_number: best.row.partNumber,
        line: best.row.line,
        price: best.row.price ?? null,
        ...givenSpringRecord(best.verdict),
        limiting_check: best.verdict.limiting ? { name: best.verdict.limiting.name, margin: best.verdict.limiting.margin } : null,
      }
    : null;
  return {
    design_strategy: c.run.result.strategy,
    design_feasible: c.run.result.feasibleCells,
    best_custom: custom,
    best_stock: stock,
    stock_over_custom_mass: best && c.custom ? best.verdict.analysis.geometry.mass / c.custom.analysis.geometry.mass : null,
  };
}

export function stockJson(run: AnyStockRun): Record<string, unknown> {
  if (run.kind === 'extension') return extensionStockJson(run);
  return {
    units: SI_UNITS,
    requirements: requirementsRecord(run.req),
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
    passing: run.passing.slice(0, run.top).map(rowRecord),
    near_misses: run.misses.map(rowRecord),
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
    compare: compareRecord(run),
    notes: [STOCK_NOTE],
    cautions: cautionsOf(),
  };
}

const num = (v: number, kind: Kind, system: UnitSystem, digits = 4) => sig(inUnit(v, kind, system), digits);

/** The columns shared by the text table and the HTML report. */
export function stockGrid(rows: RowResult[], system: UnitSystem, ranked: boolean): { header: string[]; cells: string[][] } {
  const u = (k: Kind) => unitSymbol(k, system);
  // Masses in grams when every spring listed is under 1 kg (SI).
  const mass = readableUnit(system, 'mass', Math.max(0, ...rows.map((r) => r.verdict.analysis.geometry.mass)));
  const header = [
    ranked ? '#' : 'line',
    'part',
    'material',
    `d ${u('length')}`,
    `OD ${u('length')}`,
    `ID ${u('length')}`,
    `L0 ${u('length')}`,
    `Ls ${u('length')}`,
    'Na',
    'ends',
    `k ${u('rate')}`,
    `forces ${u('force')}`,
    'SF static',
    'SF fatigue',
    `mass ${mass.symbol}`,
    'price',
    'smallest margin',
  ];
  const cells = rows.map((r, i) => {
    const a = r.verdict.analysis;
    const g = a.geometry;
    const flag = r.beyondMakerLimits.length ? ' !' : '';
    return [
      ranked ? String(i + 1) : String(r.row.line),
      r.row.partNumber + flag,
      r.verdict.spring.choice.material.id,
      num(g.wireDiameter, 'length', system),
      num(g.outerDiameter, 'length', system),
      num(g.innerDiameter, 'length', system),
      num(g.freeLength, 'length', system),
      num(g.solidLength, 'length', system),
      sig(g.activeCoils, 4),
      g.ends,
      num(a.rate, 'rate', system),
      a.points.map((p) => num(p.force, 'force', system, 3)).join(' / '),
      sig(a.staticSafetyFactor, 3),
      a.fatigue ? sig(a.fatigue.safetyFactor, 3) : '-',
      sig(mass.fromCore(g.mass), 3),
      r.row.price !== undefined ? sig(r.row.price, 4) : '-',
      r.verdict.limiting ? `${r.verdict.limiting.name} ${writeMargin(r.verdict.limiting.margin)}` : '-',
    ];
  });
  return { header, cells };
}

export function missText(r: RowResult, system: UnitSystem): string {
  return `${r.row.partNumber} (line ${r.row.line}) fails ${r.verdict.failing.map((l) => failureText(l, system)).join('; ')}`;
}

/** Stock against custom, side by side: mass, outer diameter, free length, margins. */
export function compareRows(run: StockRun, system: UnitSystem): string[][] | null {
  const c = run.compare;
  if (!c) return null;
  const best = run.passing[0];
  const col = (v: Verdict | null | undefined, name: string): string[] => {
    if (!v) return [name, '-', '-', '-', '-', '-', '-', '-', '-'];
    const g = v.analysis.geometry;
    return [
      name,
      v.spring.choice.material.id,
      formatQuantity(g.mass, 'mass', system, 3),
      formatQuantity(g.outerDiameter, 'length', system),
      formatQuantity(g.freeLength, 'length', system),
      formatQuantity(v.analysis.rate, 'rate', system),
      sig(v.analysis.staticSafetyFactor, 3),
      v.analysis.fatigue ? sig(v.analysis.fatigue.safetyFactor, 3) : '-',
      v.limiting ? `${v.limiting.name} ${writeMargin(v.limiting.margin)}` : '-',
    ];
  };
  return [
    ['', 'material', 'mass', 'outer diameter', 'free length', 'rate', 'SF static', 'SF fatigue', 'smallest margin'],
    col(c.verdict, 'best custom (design #1)'),
    col(best?.verdict, best ? `best stock: ${best.row.partNumber}` : 'best stock: none passes'),
  ];
}

export function compareSummary(run: StockRun): string {
  const c = run.compare!;
  const best = run.passing[0];
  if (!c.custom) return 'design finds no custom spring that meets every requirement.';
  if (!best) return 'No stock row passes: the custom spring is the only option.';
  const ratio = best.verdict.analysis.geometry.mass / c.custom.analysis.geometry.mass;
  const F = best.verdict.analysis.points[0].force;
  const why =
    ratio < 1
      ? ` It is lighter because it works at ${sig(F, 4)} N at the working length, inside the working-force band, where design meets ${sig(run.req.workingForce, 4)} N exactly.`
      : '';
  return `The best stock spring (${best.row.partNumber}) is ${sig(Math.abs(ratio - 1) * 100, 3)}% ${ratio >= 1 ? 'heavier' : 'lighter'} than the best custom spring; it ships from stock with no tooling.${why}`;
}

export function stockText(run: AnyStockRun, system: UnitSystem, tableLabel: string): string {
  if (run.kind === 'extension') return extensionStockText(run, system, tableLabel);
  const req = run.req;
  const out: string[] = [];
  out.push(
    `Stock springs for ${formatQuantity(req.workingForce, 'force', system)} at ${formatQuantity(req.workingLength, 'length', system)}` +
      (req.operatingLength !== undefined
        ? `, stroke to ${formatQuantity(req.operatingLength, 'length', system)}${req.operatingForce !== undefined ? ` at ${formatQuantity(req.operatingForce, 'force', system)}` : ''}`
        : '') +
      `; table ${tableLabel} (plain numbers in ${run.table.system === 'us' ? 'in, lbf' : 'mm, N'})`,
  );
  out.push(`Working force band: ${bandText(run.band, system)}`);
  out.push(
    `Table: ${run.table.total} rows, ${run.results.length} checked, ${run.bad.length} bad${run.bad.length ? ' (each on stderr with its line and column)' : ''}; ${run.passing.length} pass every check${run.passing.length ? `, ranked by ${run.rank.replace('_', ' ')}` : ''}.`,
  );
  out.push('');
  if (run.passing.length) {
    const shown = run.passing.slice(0, run.top);
    const t = stockGrid(shown, system, true);
    out.push(table([t.header, ...t.cells]));
    if (run.passing.length > shown.length) out.push(`  ... and ${run.passing.length - shown.length} more (--top)`);
  } else {
    out.push('No row passes every check.');
  }
  if (run.misses.length) {
    out.push('');
    out.push('Best near misses (least total violation) and what they fail, by how much:');
    const t = stockGrid(run.misses, system, false);
    out.push(table([t.header, ...t.cells]));
    for (const r of run.misses) out.push(`  - ${missText(r, system)}`);
  }
  if ([...run.passing.slice(0, run.top), ...run.misses].some((r) => r.beyondMakerLimits.length)) {
    out.push("  ! marks a part that the stroke takes beyond the table's own max_deflection or max_load: ask the maker before using it there");
  }
  out.push(...failedByLines(run.failedBy, label));
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
    out.push(table(compareRows(run, system)!));
    out.push(`  ${compareSummary(run)}`);
  }
  out.push('');
  out.push('Notes:');
  out.push(`  ! ${STOCK_NOTE}`);
  if (run.table.layout.ignored.length) out.push(`  ! columns read past (not stock fields): ${run.table.layout.ignored.join(', ')}`);
  const rowNotes = run.passing.slice(0, run.top).flatMap((r) => r.notes.filter((n) => !/table's rate/.test(n)).map((n) => `${r.row.partNumber}: ${n}`));
  for (const n of rowNotes) out.push(`  ! ${n}`);
  out.push('');
  out.push(cautionText());
  return out.join('\n') + '\n';
}

/** Every checked row for a spreadsheet: passing rows in rank order, then the rest by how close they came. */
export function stockCsv(run: AnyStockRun, system: UnitSystem): string {
  if (run.kind === 'extension') return extensionStockCsv(run, system);
  const s = (k: Kind) => {
    const sym = unitSymbol(k, system);
    return sym.replace('/', '_per_').replace('^', '');
  };
  const header = [
    'rank',
    'verdict',
    'line',
    'part_number',
    'material',
    'ends',
    `wire_diameter_${s('length')}`,
    `mean_diameter_${s('length')}`,
    `outer_diameter_${s('length')}`,
    `inner_diameter_${s('length')}`,
    'active_coils',
    'total_coils',
    `free_length_${s('length')}`,
    `solid_length_${s('length')}`,
    `rate_${s('rate')}`,
    `table_rate_${s('rate')}`,
    `working_force_${s('force')}`,
    `operating_force_${s('force')}`,
    `max_stress_${s('stress')}`,
    'static_safety_factor',
    'fatigue_safety_factor',
    `mass_${s('mass')}`,
    'price',
    'limiting_check',
    'smallest_margin',
    'failing_checks',
  ];
  const failing = run.results.filter((r) => !r.pass).sort((a, b) => a.violation - b.violation || a.row.line - b.row.line);
  const L = (v: number) => Number(sig(inUnit(v, 'length', system), 6));
  const rows = [...run.passing, ...failing].map((r, i) => {
    const a = r.verdict.analysis;
    const g = a.geometry;
    const last = a.points[a.points.length - 1];
    return [
      r.verdict.pass ? i + 1 : null,
      r.verdict.pass ? 'pass' : 'fail',
      r.row.line,
      r.row.partNumber,
      r.verdict.spring.choice.material.id,
      g.ends,
      L(g.wireDiameter),
      L(g.meanDiameter),
      L(g.outerDiameter),
      L(g.innerDiameter),
      g.activeCoils,
      g.totalCoils,
      L(g.freeLength),
      L(g.solidLength),
      Number(sig(inUnit(a.rate, 'rate', system), 6)),
      r.row.tableRate !== undefined ? Number(sig(inUnit(r.row.tableRate, 'rate', system), 6)) : null,
      Number(sig(inUnit(a.points[0].force, 'force', system), 6)),
      a.points.length > 1 ? Number(sig(inUnit(last.force, 'force', system), 6)) : null,
      Number(
        sig(
          inUnit(
            a.points.reduce((m, p) => Math.max(m, p.stress), -Infinity),
            'stress',
            system,
          ),
          6,
        ),
      ),
      Number(sig(a.staticSafetyFactor, 5)),
      a.fatigue ? Number(sig(a.fatigue.safetyFactor, 5)) : null,
      Number(sig(inUnit(g.mass, 'mass', system), 6)),
      r.row.price ?? null,
      r.verdict.limiting?.name ?? null,
      r.verdict.limiting?.margin !== undefined && r.verdict.limiting.margin !== null ? Number(sig(r.verdict.limiting.margin, 5)) : null,
      r.verdict.failing.map((l) => (l.margin === null ? l.name : `${l.name} ${sig(-l.margin * 100, 3)}%`)).join('; '),
    ];
  });
  return toCsv(header, rows);
}
