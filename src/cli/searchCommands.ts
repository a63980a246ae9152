// `coilfront design` and what every search command shares (`frontier` in ./frontier.ts, `sweep` in
// ./sweep.ts): thin commands over the library API (src/api/), which dispatches on the spring kinds
// (src/kinds/): read the file, apply the command-line overrides, call the API's reading and running
// steps, render.
import type { Command } from 'commander';
import { Option } from 'commander';
import { readInputFile } from '../input/document.js';
import { ENVELOPE_SHORTHANDS, parseAssignment, withValue } from '../input/overrides.js';
import { RANK_KEYS } from '../kinds/compression/requirements.js';
import { toJson } from '../report/json.js';
import { writeOutputFile } from '../report/writeFile.js';
import { cautionText } from '../report/cautions.js';
import type { StrategyChoice } from '../kinds/compression/design.js';
import { designResult, planDesign, runPlan } from '../api/design.js';
import { blamed } from '../api/options.js';
import { kindOf } from '../kinds/index.js';
import type { AnySpringKind } from '../kinds/kind.js';
import { fieldNotes } from '../report/fields.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { checkOutputPaths, EXIT, type Io } from './io.js';
import { unitsOption } from './options.js';

export interface CommonOptions {
  json?: boolean;
  units?: UnitSystem;
  set?: string[];
  strategy?: StrategyChoice;
  seed?: string;
  top?: string;
  rank?: string;
  maxOd?: string;
  minId?: string;
  maxFreeLength?: string;
  maxSolidLength?: string;
  report?: string;
  force?: boolean;
  perWire?: boolean;
  variants?: boolean;
  timing?: boolean;
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
export function addCommon(cmd: Command, ranked = true): Command {
  cmd.option('--json', 'machine-readable output on stdout (always SI units)').addOption(unitsOption());
  const hide = (o: Option) => (ranked ? o : o.hideHelp());
  addOverrideOptions(cmd)
    .addOption(new Option('--strategy <name>', 'search strategy').choices(['auto', 'grid', 'genetic']).default('auto'))
    .option('--seed <n>', "random seed of the genetic strategy and of the yield's Monte Carlo (overrides the file)")
    .addOption(hide(new Option('--top <n>', 'how many candidates to list (overrides the file)')))
    .addOption(hide(new Option('--rank <key>', 'ranking objective (overrides the file)').choices([...RANK_KEYS])))
    .addOption(
      hide(
        new Option(
          '--variants',
          "list every feasible spring (each coil count of a wire) instead of the best of each material, wire size and end type (overrides the file's variants)",
        ),
      ),
    )
    .addOption(new Option('--per-wire', "the best spring of each material, wire size and end type: the default (overrides the file's variants)").hideHelp())
    .option('--timing', 'also report the search time (which makes the output differ from run to run)');
  return cmd;
}

export interface Override {
  path: string[];
  option: string;
}

/** The raw requirements document with every command-line override applied. */
export function rawWithOverrides(file: string, opts: CommonOptions): unknown {
  return tracedOverrides(file, opts).doc;
}

/** The same, and where each override came from (to blame a bad one on its option). */
export function tracedOverrides(file: string, opts: CommonOptions): { doc: unknown; overrides: Override[] } {
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
export function planOf<P>(traced: { doc: unknown; overrides: Override[] }, plan: (doc: unknown) => P): P {
  return blamed(() => plan(traced.doc), traced.overrides);
}

/** What a command prints on stderr about how the kind read the requirements (as `analyze` notes them). */
export function requirementNotes(kind: AnySpringKind, req: unknown, io: Io): void {
  for (const note of kind.report.requirementNotes(req)) io.stderr(`coilfront: note: ${note}\n`);
}

/** What goes on stderr after a CSV of springs: what its less obvious columns mean (relative_cost),
 * then the cautions, the general ones and the kind's own. */
export function cautionsOf(kind: AnySpringKind): string {
  return (
    fieldNotes(kind.fields)
      .map((n) => `coilfront: ${n}\n`)
      .join('') +
    cautionText(kind) +
    '\n'
  );
}

export function progress(io: Io, label: string): ((done: number, total: number) => void) | undefined {
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

interface DesignOptions extends CommonOptions {
  spec?: string;
  springFile?: string;
  pick?: string;
}

/** --pick: the rank of the spring --spec and --spring-file write (1, the best, when not given). */
function readPick(opts: DesignOptions): number {
  if (opts.pick === undefined) return 1;
  if (!opts.spec && !opts.springFile) throw new InputError('--pick', 'used with --spring-file or --spec (it chooses the spring they write)', opts.pick);
  const n = Number(opts.pick.trim());
  if (!(Number.isInteger(n) && n >= 1 && n <= 1000)) throw new InputError('--pick', 'a whole number from 1 (the best spring) to the number listed', opts.pick);
  return n;
}

/** The list settings every kind's requirements carry. */
interface ListSettings {
  top?: number;
  bestPerWire?: boolean;
}

/** Why the list of springs --pick chooses from ends where it does, and what lists more: --top only
 * when the list is full; a list of the best of each wire (per wire) ends with its wires, and --variants
 * lists every feasible spring; else every spring the search kept is listed. */
function pickRange(req: ListSettings, listed: number): string {
  if (req.top !== undefined && listed >= req.top) return 'the springs listed; --top lists more';
  if (req.bestPerWire) return 'the springs listed, the best of each material, wire size and end type; --variants lists every feasible spring';
  return 'every feasible spring the search found is listed';
}

async function designCommand(file: string, opts: DesignOptions, io: Io): Promise<number> {
  checkOutputPaths(
    [
      { option: '--report', path: opts.report },
      { option: '--spec', path: opts.spec },
      { option: '--spring-file', path: opts.springFile },
    ],
    !!opts.force,
    [file],
  );
  const pick = readPick(opts);
  // The document's `kind` picks the spring kind (src/kinds/index.ts); no kind is compression.
  const traced = tracedOverrides(file, opts);
  const kind = kindOf(traced.doc);
  // Refused before anything runs or is written (the report would be written first).
  if (opts.spec && !kind.report.writeSpecSheet)
    throw new InputError('--spec', `a kind that has a specification sheet (the ${kind.label} sheet is not built yet)`);
  const plan = planOf(traced, planDesign);
  const req = plan.req;
  requirementNotes(kind, req, io);
  const run = runPlan(plan, { strategy: opts.strategy, onProgress: progress(io, 'searching') });
  const system = opts.units ?? req.system;
  // Everything that could refuse an output is settled before the first file is written.
  const listed = kind.report.listed ? kind.report.listed(run) : 0;
  if ((opts.spec || opts.springFile) && listed > 0 && pick > listed) {
    throw new InputError('--pick', `a rank from 1 to ${listed} (${pickRange(req as ListSettings, listed)})`, String(pick));
  }
  if (opts.springFile && !kind.report.springFile)
    throw new InputError('--spring-file', `a kind that exports spring files (the ${kind.label} export is not built yet)`);
  if (opts.report) {
    if (!kind.report.designHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
    writeOutputFile(opts.report, await kind.report.designHtml(run, system), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.spec) {
    if (!kind.report.writeSpecSheet) throw new InputError('--spec', `a kind that has a specification sheet (the ${kind.label} sheet is not built yet)`);
    if (await kind.report.writeSpecSheet(opts.spec, run, system, !!opts.force, pick))
      io.stderr(`coilfront: specification sheet of spring ${pick} written to ${opts.spec}\n`);
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

export function registerSearchCommands(program: Command, io: Io, setCode: (c: number) => void): void {
  addCommon(
    program
      .command('design')
      .description('search every standard wire size, coil count and end type for the springs that meet the requirements, best first')
      .argument('<requirements-file>', 'YAML or JSON requirements file (see README)'),
  )
    .option('--report <file.html>', 'also write a self-contained HTML design report')
    .option('--spec <file.html>', "also write the chosen spring's one-page specification sheet (as drawn, at the tolerance grade, 2 unless given)")
    .option(
      '--spring-file <file.yaml>',
      "also write the chosen spring as a spring file (as `analyze` and `check` read it), at drawing precision, with the requirement's service conditions (compression springs; not yet for kind: extension)",
    )
    .option('--pick <n>', 'the rank of the spring --spec and --spring-file write (default 1, the best)')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: DesignOptions) => setCode(await designCommand(file, opts, io)));
}
