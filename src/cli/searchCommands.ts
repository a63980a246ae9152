// `coilfront design`, `frontier` and `sweep`: thin commands over the library API (src/api/), which
// dispatches on the spring kinds (src/kinds/): read the file, apply the command-line overrides, call
// the API's reading and running steps, render.
import type { Command } from 'commander';
import { Option } from 'commander';
import { readInputFile } from '../input/document.js';
import { ENVELOPE_SHORTHANDS, parseAssignment, parsePath, sweepValues, withValue } from '../input/overrides.js';
import { RANK_KEYS, type Requirements } from '../kinds/compression/requirements.js';
import { toJson } from '../report/json.js';
import { writeOutputFile } from '../report/writeFile.js';
import { cautionText } from '../report/cautions.js';
import type { Candidate, StrategyChoice } from '../kinds/compression/design.js';
import { FRONTIER_KEYS, reportFrontier, type FrontierKey } from '../kinds/compression/frontier.js';
import { designResult, planCompression, planDesign, runPlan } from '../api/design.js';
import { frontierOfPlan, frontierResult } from '../api/frontier.js';
import { blamed } from '../api/options.js';
import { kindOf } from '../kinds/index.js';
import { planSweep, runSweepPlan, sweepResult, type SweepRow } from '../api/sweep.js';
// The HTML report and CSV writers load only when a command writes them (start-up time: issue 10).
const htmlReport = () => import('../report/html/designHtml.js');
const csv = () => import('../report/csv.js');
import { fieldColumns, fieldNotes, fieldRow } from '../report/fields.js';
import { compression } from '../kinds/compression/index.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { checkOutputPaths, EXIT, type Io } from './io.js';
// frontier and sweep of extension springs (analyze and design dispatch through the kind registry).
import { extensionFrontier, extensionSweep, isExtension } from './extension.js';
import { unitsOption } from './options.js';

export interface CommonOptions {
  json?: boolean; units?: UnitSystem; set?: string[]; strategy?: StrategyChoice; seed?: string; top?: string; rank?: string;
  maxOd?: string; minId?: string; maxFreeLength?: string; maxSolidLength?: string; report?: string; force?: boolean; perWire?: boolean; variants?: boolean; timing?: boolean;
}

function collect(value: string, previous: string[] = []): string[] {
  return [...previous, value];
}

/** --set and the envelope shorthands; `check` and `stock` share them. */
export function addOverrideOptions(cmd: Command): Command {
  cmd.option('--set <path=value>', 'override a requirement, e.g. envelope.max_outer_diameter=18 (repeatable)', collect);
  for (const [flags, , path] of ENVELOPE_SHORTHANDS) cmd.option(flags, `shorthand for --set ${path}=<value>`);
  return cmd;
}

/** The options every search command takes. `ranked: false` (frontier, which lists the whole front) keeps
 * --top, --rank and --per-wire out of its help; given anyway, they are refused by name. */
function addCommon(cmd: Command, ranked = true): Command {
  cmd
    .option('--json', 'machine-readable output on stdout (always SI units)')
    .addOption(unitsOption());
  const hide = (o: Option) => (ranked ? o : o.hideHelp());
  addOverrideOptions(cmd)
    .addOption(new Option('--strategy <name>', 'search strategy').choices(['auto', 'grid', 'genetic']).default('auto'))
    .option('--seed <n>', 'random seed for the genetic strategy (overrides the file)')
    .addOption(hide(new Option('--top <n>', 'how many candidates to list (overrides the file)')))
    .addOption(hide(new Option('--rank <key>', 'ranking objective (overrides the file)').choices([...RANK_KEYS])))
    .addOption(hide(new Option('--variants', 'list every feasible spring (each coil count of a wire) instead of the best of each material, wire size and end type (overrides the file\'s variants)')))
    .addOption(new Option('--per-wire', 'the best spring of each material, wire size and end type: the default (overrides the file\'s variants)').hideHelp())
    .option('--timing', 'also report the search time (which makes the output differ from run to run)');
  return cmd;
}

interface Override { path: string[]; option: string }

/** The raw requirements document with every command-line override applied. */
export function rawWithOverrides(file: string, opts: CommonOptions): unknown {
  return tracedOverrides(file, opts).doc;
}

/** The same, and where each override came from (to blame a bad one on its option). */
function tracedOverrides(file: string, opts: CommonOptions): { doc: unknown; overrides: Override[] } {
  let doc = readInputFile(file);
  const overrides: Override[] = [];
  const apply = (option: string, text: string) => {
    const { path, value } = parseAssignment(text, option);
    doc = withValue(doc, path, value);
    overrides.push({ path, option });
  };
  for (const [flags, key, path] of ENVELOPE_SHORTHANDS) {
    const v = (opts as Record<string, unknown>)[key];
    if (typeof v === 'string') apply(flags.split(' ')[0], `${path}=${v}`);
  }
  for (const s of opts.set ?? []) apply('--set', s);
  if (opts.seed !== undefined) apply('--seed', `seed=${JSON.stringify(opts.seed)}`);
  if (opts.top !== undefined) apply('--top', `top=${JSON.stringify(opts.top)}`);
  if (opts.rank !== undefined) apply('--rank', `rank=${opts.rank}`);
  if (opts.perWire) apply('--per-wire', 'best_per_wire=true');
  if (opts.variants) apply('--variants', 'best_per_wire=false');
  return { doc, overrides };
}

/** The plan of a command: its document with the overrides, read by the API; a bad override is blamed on its option. */
function planOf<P>(traced: { doc: unknown; overrides: Override[] }, plan: (doc: unknown) => P): P {
  return blamed(() => plan(traced.doc), traced.overrides);
}

/** What a command prints on stderr about how it read the requirements (as `analyze` notes them). */
function requirementNotes(req: Requirements, io: Io): void {
  for (const note of compression.report.requirementNotes(req)) io.stderr(`coilfront: note: ${note}\n`);
}

function progress(io: Io, label: string): ((done: number, total: number) => void) | undefined {
  if (!io.interactive) return undefined;
  let last = -1;
  return (done, total) => {
    const pct = Math.floor((100 * done) / Math.max(1, total));
    if (pct === last) return;
    last = pct;
    const bar = '#'.repeat(Math.floor(pct / 4)).padEnd(25, ' ');
    io.stderr(`\r${label} [${bar}] ${pct}%${pct >= 100 ? '\r' + ' '.repeat(50) + '\r' : ''}`);
  };
}

interface DesignOptions extends CommonOptions { spec?: string; springFile?: string; pick?: string }

/** --pick: the rank of the spring --spec and --spring-file write (1, the best, when not given). */
function readPick(opts: DesignOptions): number {
  if (opts.pick === undefined) return 1;
  if (!opts.spec && !opts.springFile) throw new InputError('--pick', 'used with --spring-file or --spec (it chooses the spring they write)', opts.pick);
  const n = Number(opts.pick.trim());
  if (!(Number.isInteger(n) && n >= 1 && n <= 1000)) throw new InputError('--pick', 'a whole number from 1 (the best spring) to the number listed', opts.pick);
  return n;
}

async function designCommand(file: string, opts: DesignOptions, io: Io): Promise<number> {
  checkOutputPaths([{ option: '--report', path: opts.report }, { option: '--spec', path: opts.spec }, { option: '--spring-file', path: opts.springFile }], !!opts.force, [file]);
  const pick = readPick(opts);
  // The document's `kind` picks the spring kind (src/kinds/index.ts); no kind is compression.
  const traced = tracedOverrides(file, opts);
  const kind = kindOf(traced.doc);
  // Refused before anything runs or is written (the report would be written first).
  if (opts.spec && !kind.report.writeSpecSheet) throw new InputError('--spec', `a kind that has a specification sheet (the ${kind.label} sheet is not built yet)`);
  const plan = planOf(traced, planDesign);
  const req = plan.req;
  for (const note of kind.report.requirementNotes(req)) io.stderr(`coilfront: note: ${note}\n`);
  const run = runPlan(plan, { strategy: opts.strategy, onProgress: progress(io, 'searching') });
  const system = opts.units ?? req.system;
  // Everything that could refuse an output is settled before the first file is written.
  const listed = kind.report.listed ? kind.report.listed(run) : 0;
  if ((opts.spec || opts.springFile) && listed > 0 && pick > listed) {
    throw new InputError('--pick', `a rank from 1 to ${listed} (the springs listed; --top lists more)`, String(pick));
  }
  if (opts.springFile && !kind.report.springFile) throw new InputError('--spring-file', `a kind that exports spring files (the ${kind.label} export is not built yet)`);
  if (opts.report) {
    if (!kind.report.designHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
    writeOutputFile(opts.report, await kind.report.designHtml(run, system), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.spec) {
    if (!kind.report.writeSpecSheet) throw new InputError('--spec', `a kind that has a specification sheet (the ${kind.label} sheet is not built yet)`);
    if (await kind.report.writeSpecSheet(opts.spec, run, system, !!opts.force, pick)) io.stderr(`coilfront: specification sheet of spring ${pick} written to ${opts.spec}\n`);
    else io.stderr('coilfront: no spring to specify: no specification sheet written\n');
  }
  if (opts.springFile) {
    const out = kind.report.springFile!(run, pick);
    if (out) {
      writeOutputFile(opts.springFile, out.text, !!opts.force, '--spring-file');
      for (const note of out.notes) io.stderr(`coilfront: note: ${note}\n`);
      io.stderr(`coilfront: spring ${pick} written to ${opts.springFile} at drawing precision (coilfront analyze or check reads it)\n`);
    } else io.stderr('coilfront: no spring to export: no spring file written\n');
  }
  if (opts.json) io.stdout(toJson(designResult(plan, run, !!opts.timing)) + '\n');
  else io.stdout(kind.report.designText(run, system, !!opts.timing));
  if (!kind.found(run)) {
    if (opts.json) io.stderr('coilfront: no spring meets every requirement (see "infeasible" in the JSON)\n');
    return EXIT.infeasible;
  }
  return EXIT.ok;
}

/** Column names and rows of springs for CSV, in the chosen unit system with units in the names:
 * rendered from the compression fields registry. */
export function springColumns(system: UnitSystem): string[] {
  return fieldColumns(compression.fields, system);
}

/** What the CSV's less obvious columns mean (relative_cost), for stderr beside the cautions. */
function csvNotes(): string {
  return fieldNotes(compression.fields).map((n) => `coilfront: ${n}\n`).join('');
}

export function springRow(c: Candidate, system: UnitSystem): (string | number | null)[] {
  return fieldRow(compression.fields, c, system);
}

interface FrontierOptions extends CommonOptions { x: FrontierKey; y: FrontierKey; output?: string }

async function frontierCommand(file: string, opts: FrontierOptions, io: Io): Promise<number> {
  if (opts.x === opts.y) throw new InputError('--y', 'an objective other than --x');
  // The frontier is every non-dominated spring: a count, a ranking or one-per-wire would cut it silently.
  for (const [option, given] of [['--top', opts.top !== undefined], ['--rank', opts.rank !== undefined], ['--per-wire', !!opts.perWire], ['--variants', !!opts.variants]] as const) {
    if (given) throw new InputError(option, `an option of design or sweep (frontier lists every spring on the ${opts.x} / ${opts.y} frontier; choose the axes with --x and --y)`);
  }
  checkOutputPaths([{ option: '--output', path: opts.output }, { option: '--report', path: opts.report }], !!opts.force, [file]);
  const traced = tracedOverrides(file, opts);
  if (isExtension(traced.doc)) return extensionFrontier(traced.doc, traced.overrides, opts, io);
  const plan = planOf(traced, planCompression);
  requirementNotes(plan.req, io);
  const system = opts.units ?? plan.req.system;
  const fr = frontierOfPlan(plan, opts.x, opts.y, { strategy: opts.strategy, onProgress: progress(io, 'mapping') });
  if (opts.json) {
    io.stdout(toJson(frontierResult(fr)) + '\n');
  } else {
    const csvText = (await csv()).toCsv(['rank', ...springColumns(system)], fr.front.map((c, i) => [i + 1, ...springRow(c, system)]));
    if (opts.output) {
      writeOutputFile(opts.output, csvText, !!opts.force, '--output');
      io.stderr(`coilfront: ${fr.front.length} springs on the ${opts.x} / ${opts.y} frontier (of ${fr.cloud.length} feasible) written to ${opts.output}\n`);
    } else io.stdout(csvText);
  }
  if (opts.report) {
    (await htmlReport()).writeDesignReport(opts.report, fr.run, system, !!opts.force, fr);
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (!opts.json) io.stderr(csvNotes() + cautionText() + '\n');
  return fr.front.length ? EXIT.ok : EXIT.infeasible;
}

interface SweepOptions extends CommonOptions { vary: string; output?: string }

/** --vary path=from:to:step. */
function parseVary(vary: string): { path: string[]; values: number[] } {
  const eq = vary.indexOf('=');
  if (eq <= 0) throw new InputError('--vary', 'path=from:to:step, such as envelope.max_outer_diameter=14:24:0.5', vary);
  return { path: parsePath(vary.slice(0, eq), '--vary'), values: sweepValues(vary.slice(eq + 1)) };
}

export function runSweep(file: string, opts: CommonOptions, vary: string, io: Io | null): { path: string[]; rows: SweepRow[]; system: UnitSystem } {
  const { doc, overrides } = tracedOverrides(file, opts);
  const plan = planSweep(doc, vary, overrides, '--vary');
  const rows = runSweepPlan(plan, { strategy: opts.strategy, onStep: io?.interactive ? (done, total) => io.stderr(`\rsweep ${done}/${total}`) : undefined });
  if (io?.interactive) io.stderr('\r' + ' '.repeat(30) + '\r');
  return { path: plan.path, rows, system: plan.system };
}

async function sweepCommand(file: string, opts: SweepOptions, io: Io): Promise<number> {
  checkOutputPaths([{ option: '--output', path: opts.output }, { option: '--report', path: opts.report }], !!opts.force, [file]);
  const traced = tracedOverrides(file, opts);
  if (isExtension(traced.doc)) {
    const { path, values } = parseVary(opts.vary);
    return extensionSweep(traced.doc, traced.overrides, path, values, opts, io);
  }
  const { path, rows, system: fileSystem } = runSweep(file, opts, opts.vary, io);
  const system = opts.units ?? fileSystem;
  const name = path.join('.');
  if (opts.json) {
    io.stdout(toJson(sweepResult(path, rows)) + '\n');
  } else {
    const csvText = (await csv()).toCsv([`${name} (${fileSystem === 'us' ? 'in/lbf/psi' : 'mm/N/MPa'})`, 'feasible_combinations', ...springColumns(system), 'limiting_check'],
      rows.map((r) => [r.value, r.run.result.feasibleCells, ...(r.best ? springRow(r.best, system) : springColumns(system).map((_, i) => (i === 0 ? 'none' : null))), r.limiting]));
    if (opts.output) {
      writeOutputFile(opts.output, csvText, !!opts.force, '--output');
      io.stderr(`coilfront: ${rows.length} runs of ${name} written to ${opts.output}\n`);
    } else io.stdout(csvText);
  }
  if (opts.report) {
    const shown = rows.find((r) => r.best)?.run ?? rows[0].run;
    (await htmlReport()).writeDesignReport(opts.report, shown, system, !!opts.force, reportFrontier(shown), { name, rows });
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (!opts.json) io.stderr(csvNotes() + cautionText() + '\n');
  return rows.some((r) => r.best) ? EXIT.ok : EXIT.infeasible;
}

export function registerSearchCommands(program: Command, io: Io, setCode: (c: number) => void): void {
  addCommon(program.command('design')
    .description('search every standard wire size, coil count and end type for the springs that meet the requirements, best first')
    .argument('<requirements-file>', 'YAML or JSON requirements file (see README)'))
    .option('--report <file.html>', 'also write a self-contained HTML design report')
    .option('--spec <file.html>', 'also write the chosen spring\'s one-page specification sheet (as drawn, at the tolerance grade, 2 unless given)')
    .option('--spring-file <file.yaml>', 'also write the chosen spring as a spring file (as `analyze` and `check` read it), at drawing precision, with the requirement\'s service conditions')
    .option('--pick <n>', 'the rank of the spring --spec and --spring-file write (default 1, the best)')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: DesignOptions) => setCode(await designCommand(file, opts, io)));

  const keys = Object.keys(FRONTIER_KEYS);
  addCommon(program.command('frontier')
    .description('the Pareto set of all feasible springs on two objectives, as CSV')
    .argument('<requirements-file>', 'YAML or JSON requirements file'), false)
    .addOption(new Option('--x <key>', 'objective on the x axis').choices(keys).default('mass'))
    .addOption(new Option('--y <key>', 'objective on the y axis').choices(keys).default('outer_diameter'))
    .option('-o, --output <file.csv>', 'write the CSV here instead of stdout')
    .option('--report <file.html>', 'also write a self-contained HTML report with the frontier plot')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: FrontierOptions) => setCode(await frontierCommand(file, opts, io)));

  addCommon(program.command('sweep')
    .description('re-run the design for each value of one requirement: what a tighter envelope costs')
    .argument('<requirements-file>', 'YAML or JSON requirements file'))
    .requiredOption('--vary <path=from:to:step>', 'the requirement to vary, e.g. envelope.max_outer_diameter=14:24:0.5')
    .option('-o, --output <file.csv>', 'write the CSV here instead of stdout')
    .option('--report <file.html>', 'also write a self-contained HTML report with the sweep plot')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: SweepOptions) => setCode(await sweepCommand(file, opts, io)));
}
