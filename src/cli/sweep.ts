// `coilfront sweep`: the design re-run for each value of one requirement (what a tighter envelope
// costs), thin over the library API (src/api/sweep.ts). The document's `kind` picks the spring kind;
// its fields give the CSV columns.
import type { Command } from 'commander';
import { planSweep, runSweepPlan, sweepConfirmation, sweepResult, sweepWork, type SweepPlan } from '../api/sweep.js';
import { withValue } from '../input/overrides.js';
import type { Kind } from '../units/kinds.js';
import { displayUnit, outputUnit, type UnitSystem } from '../units/systems.js';
import { fieldColumns, fieldRow, presentFields } from '../report/fields.js';
import { toJson } from '../report/json.js';
import { feasibleCountComplete, SWEEP_COUNT_NOTE } from '../report/feasibleCount.js';
import { writeOutputFile } from '../report/writeFile.js';
import { InputError } from '../units/parse.js';
import { checkOutputPaths, EXIT, type Io } from './io.js';
import { addCommon, cautionsOf, tracedOverrides, type CommonOptions } from './searchCommands.js';

// The CSV writer loads only when a command writes it (start-up time: issue 10).
const csv = () => import('../report/csv.js');

interface SweepOptions extends CommonOptions {
  vary: string;
  output?: string;
}

/** The quantities a varied requirement may be, tried in turn (see variedUnit). */
const QUANTITY_KINDS: readonly Kind[] = ['length', 'force', 'stress', 'temperature', 'frequency', 'rate', 'density', 'mass', 'volume'];

/**
 * What the varied requirement's values are, as the kind's own reader takes them: the quantity whose
 * unit it accepts written after the first value ("14 mm" for a diameter), a fraction where it takes a
 * percentage (load_tolerance), else a bare number (cycles, counts). The reader is the only place that
 * knows each field's kind, so it is asked rather than a second list kept. The CSV's first column then
 * reads in its own unit, in the chosen system (values are given in the file's).
 */
function variedUnit(plan: SweepPlan, doc: unknown): { header(name: string, system: UnitSystem): string; value(v: number, system: UnitSystem): number } {
  const first = plan.values[0];
  const accepts = (raw: string): boolean => {
    try {
      plan.kind.readRequirements(withValue(doc, plan.path, raw), plan.catalog);
      return true;
    } catch {
      return false;
    }
  };
  const kind = QUANTITY_KINDS.find((k) => accepts(`${first} ${displayUnit(plan.system, k).symbol}`));
  if (kind !== undefined) {
    const given = displayUnit(plan.system, kind);
    return {
      header: (name, system) => `${name} (${outputUnit(system, kind).symbol})`,
      value: (v, system) => {
        const shown = outputUnit(system, kind);
        return shown === given ? v : Number(shown.fromCore(given.toCore(v)).toPrecision(6));
      },
    };
  }
  const fraction = accepts(`${first * 100}%`);
  return { header: (name) => (fraction ? `${name} (fraction)` : name), value: (v) => v };
}

async function sweepCommand(file: string, opts: SweepOptions, io: Io): Promise<number> {
  checkOutputPaths(
    [
      { option: '--output', path: opts.output },
      { option: '--report', path: opts.report },
    ],
    !!opts.force,
    [file],
  );
  const { doc, overrides } = tracedOverrides(file, opts);
  const plan = planSweep(doc, opts.vary, overrides, '--vary', undefined, opts.strategy);
  const kind = plan.kind;
  const rows = runSweepPlan(plan, { strategy: opts.strategy, onStep: io.interactive ? (done, total) => io.stderr(`\rsweep ${done}/${total}`) : undefined });
  if (io.interactive) io.stderr('\r' + ' '.repeat(30) + '\r');
  const system = opts.units ?? plan.system;
  const name = plan.path.join('.');
  const varied = variedUnit(plan, doc);
  if (opts.json) {
    io.stdout(toJson(sweepResult(kind, plan.path, rows, plan)) + '\n');
  } else {
    const fields = presentFields(
      kind.fields,
      rows.flatMap((r) => (r.best ? [r.best] : [])),
    );
    const columns = fieldColumns(fields, system);
    const text = (await csv()).toCsv(
      [varied.header(name, system), 'feasible_evaluated', 'skipped', ...columns, 'limiting_check'],
      rows.map((r) => [
        varied.value(r.value, system),
        r.run.result.feasibleCells,
        r.run.result.prunedCells,
        ...(r.best ? fieldRow(fields, r.best, system) : columns.map((_, i) => (i === 0 ? 'none' : null))),
        r.limiting,
      ]),
    );
    if (opts.output) {
      writeOutputFile(opts.output, text, !!opts.force, '--output');
      io.stderr(`coilfront: ${rows.length} runs of ${name} (${sweepWork(plan).total.toLocaleString('en-US')} combinations in all) written to ${opts.output}\n`);
    } else io.stdout(text);
  }
  if (opts.report) {
    if (!kind.report.designHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
    const shown = rows.find((r) => r.best)?.run ?? rows[0].run;
    writeOutputFile(opts.report, await kind.report.designHtml(shown, system, { sweep: { name, rows } }), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  const confirmation = sweepConfirmation(rows);
  if (!opts.json && confirmation) io.stderr(`coilfront: ${confirmation}\n`);
  if (!opts.json && rows.some((r) => !feasibleCountComplete(r.run.result))) io.stderr(`coilfront: ${SWEEP_COUNT_NOTE}\n`);
  if (!opts.json) io.stderr(cautionsOf(kind));
  return rows.some((r) => r.best) ? EXIT.ok : EXIT.infeasible;
}

export function registerSweepCommand(program: Command, io: Io, setCode: (c: number) => void): void {
  addCommon(
    program
      .command('sweep')
      .description('re-run the design for each value of one requirement: what a tighter envelope costs')
      .argument('<requirements-file>', 'YAML or JSON requirements file'),
  )
    .requiredOption('--vary <path=from:to:step>', 'the requirement to vary, e.g. envelope.max_outer_diameter=14:24:0.5')
    .option('-o, --output <file.csv>', 'write the CSV here instead of stdout')
    .option('--report <file.html>', 'also write a self-contained HTML report with the sweep plot')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: SweepOptions) => setCode(await sweepCommand(file, opts, io)));
}
