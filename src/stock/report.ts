// The outcome of `stock` for people (text), machines (JSON, SI) and spreadsheets (CSV: every row
// checked, units in the column names), rendered for either kind by the one renderer of ./render.ts:
// here what is compression's own (its spring's figures and record, its columns, its wording), and the
// dispatch on the run's kind.
import { givenSpringRecord } from '../check/report.js';
import { GIVEN_CHECK_LABELS, type Verdict } from '../check/judge.js';
import { requirementsRecord } from '../kinds/compression/report/designReport.js';
import { CHECK_LABELS, type CheckName } from '../kinds/compression/verify.js';
import { formatQuantity, sig, unitSymbol } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import type { AnyStockRun, RowResult, StockRun } from './run.js';
import { EXTENSION_STOCK_VIEW } from './extension.js';
import { renderStockCsv, renderStockJson, renderStockText, csvUnit, num, six, stockFigures, type StockFigures, type StockView } from './render.js';

export const STOCK_NOTE = 'Stock rows are judged as not shot-peened and without set removal (a stock table has no column for either).';

const figures = (v: Verdict): StockFigures =>
  stockFigures(v.spring.choice.material.id, v.analysis, v.analysis.staticSafetyFactor, v.analysis.fatigue ? v.analysis.fatigue.safetyFactor : null);

/** What a table of compression springs shows of its own. */
export const COMPRESSION_STOCK_VIEW: StockView<Verdict, RowResult, StockRun> = {
  jsonKind: {},
  title: 'Stock springs',
  note: STOCK_NOTE,
  makerLimitsNote: "marks a part that the stroke takes beyond the table's own max_deflection or max_load: ask the maker before using it there",
  requirementsRecord: (run) => requirementsRecord(run.req),
  heading: (run, system, tableLabel) => {
    const req = run.req;
    return (
      `Stock springs for ${formatQuantity(req.workingForce, 'force', system)} at ${formatQuantity(req.workingLength, 'length', system)}` +
      (req.operatingLength !== undefined
        ? `, stroke to ${formatQuantity(req.operatingLength, 'length', system)}${req.operatingForce !== undefined ? ` at ${formatQuantity(req.operatingForce, 'force', system)}` : ''}`
        : '') +
      `; table ${tableLabel} (plain numbers in ${run.table.system === 'us' ? 'in, lbf' : 'mm, N'})`
    );
  },
  figures,
  springRecord: givenSpringRecord,
  gridColumns: (system) => {
    const u = unitSymbol('length', system);
    const g = (r: RowResult) => r.verdict.analysis.geometry;
    return [
      { head: `ID ${u}`, cell: (r) => num(g(r).innerDiameter, 'length', system) },
      { head: `L0 ${u}`, cell: (r) => num(g(r).freeLength, 'length', system) },
      { head: `Ls ${u}`, cell: (r) => num(g(r).solidLength, 'length', system) },
      { head: 'Na', cell: (r) => sig(g(r).activeCoils, 4) },
      { head: 'ends', cell: (r) => g(r).ends },
    ];
  },
  csvShape: (system) => {
    const L = `_${csvUnit('length', system)}`;
    const g = (r: RowResult) => r.verdict.analysis.geometry;
    return [
      { head: 'ends', value: (r) => g(r).ends },
      { head: `wire_diameter${L}`, value: (r) => six(g(r).wireDiameter, 'length', system) },
      { head: `mean_diameter${L}`, value: (r) => six(g(r).meanDiameter, 'length', system) },
      { head: `outer_diameter${L}`, value: (r) => six(g(r).outerDiameter, 'length', system) },
      { head: `inner_diameter${L}`, value: (r) => six(g(r).innerDiameter, 'length', system) },
      { head: 'active_coils', value: (r) => g(r).activeCoils },
      { head: 'total_coils', value: (r) => g(r).totalCoils },
      { head: `free_length${L}`, value: (r) => six(g(r).freeLength, 'length', system) },
      { head: `solid_length${L}`, value: (r) => six(g(r).solidLength, 'length', system) },
    ];
  },
  csvStresses: (system) => [
    {
      head: `max_stress_${csvUnit('stress', system)}`,
      value: (r) =>
        six(
          r.verdict.analysis.points.reduce((m, p) => Math.max(m, p.stress), -Infinity),
          'stress',
          system,
        ),
    },
  ],
  label: (name) => CHECK_LABELS[name as CheckName] ?? GIVEN_CHECK_LABELS[name as keyof typeof GIVEN_CHECK_LABELS] ?? name,
};

export function stockJson(run: AnyStockRun): Record<string, unknown> {
  return run.kind === 'extension' ? renderStockJson(EXTENSION_STOCK_VIEW, run) : renderStockJson(COMPRESSION_STOCK_VIEW, run);
}

export function stockText(run: AnyStockRun, system: UnitSystem, tableLabel: string): string {
  return run.kind === 'extension'
    ? renderStockText(EXTENSION_STOCK_VIEW, run, system, tableLabel)
    : renderStockText(COMPRESSION_STOCK_VIEW, run, system, tableLabel);
}

/** Every checked row for a spreadsheet: passing rows in rank order, then the rest by how close they came. */
export function stockCsv(run: AnyStockRun, system: UnitSystem): string {
  return run.kind === 'extension' ? renderStockCsv(EXTENSION_STOCK_VIEW, run, system) : renderStockCsv(COMPRESSION_STOCK_VIEW, run, system);
}
