// `coilfront sweep`: the design re-run for each value of one requirement (what a tighter envelope
// costs), thin over the library API (src/api/sweep.ts). The document's `kind` picks the spring kind;
// its fields give the CSV columns.
import type { Command } from 'commander';
import { planSweep, runSweepPlan, sweepConfirmation, sweepResult, sweepWork } from '../api/sweep.js';
import { fieldColumns, fieldRow, presentFields } from '../report/fields.js';
import { toJson } from '../report/json.js';
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
  if (opts.json) {
    io.stdout(toJson(sweepResult(kind, plan.path, rows, plan)) + '\n');
  } else {
    const fields = presentFields(
      kind.fields,
      rows.flatMap((r) => (r.best ? [r.best] : [])),
    );
    const columns = fieldColumns(fields, system);
    const text = (await csv()).toCsv(
      [`${name} (${plan.system === 'us' ? 'in/lbf/psi' : 'mm/N/MPa'})`, 'feasible_combinations', ...columns, 'limiting_check'],
      rows.map((r) => [
        r.value,
        r.run.result.feasibleCells,
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
