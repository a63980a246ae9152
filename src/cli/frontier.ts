// `coilfront frontier`: the Pareto set of every feasible spring on two objectives, thin over the
// library API (src/api/frontier.ts). The document's `kind` picks the spring kind; its objectives say
// which axes there are, its fields which CSV columns.
import type { Command } from 'commander';
import { Option } from 'commander';
import { frontierAxis, frontierOfPlan, frontierResult } from '../api/frontier.js';
import { planDesign } from '../api/design.js';
import { KINDS, kindOf } from '../kinds/index.js';
import { frontierAxes, objectiveValue, type AnySpringKind, type KindCandidate, type ObjectiveDefinition } from '../kinds/kind.js';
import { fieldColumns, fieldRow, presentFields } from '../report/fields.js';
import { toJson } from '../report/json.js';
import { writeOutputFile } from '../report/writeFile.js';
import { inUnit, sig, unitSymbol } from '../units/format.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { checkOutputPaths, EXIT, type Io } from './io.js';
import { addCommon, cautionsOf, planOf, progress, requirementNotes, tracedOverrides, type CommonOptions } from './searchCommands.js';

// The CSV writer loads only when a command writes it (start-up time: issue 10).
const csv = () => import('../report/csv.js');

interface FrontierOptions extends CommonOptions {
  x: string;
  y: string;
  output?: string;
}

/**
 * The frontier's axes as CSV columns where no field gives them already (safety_factor, the lowest of
 * static and fatigue; wire_volume): the CSV shows both figures the frontier was drawn on, as the
 * objective the search ranked by, in the chosen units.
 */
function axisColumns(
  kind: AnySpringKind,
  fields: readonly { name: string }[],
  axes: readonly string[],
  system: UnitSystem,
): { head: string; value: (c: KindCandidate) => number | null }[] {
  return axes
    .filter((key) => !fields.some((f) => f.name === key || f.name.startsWith(`${key}_`)))
    .map((key) => {
      const unit = kind.objectives.find((o: ObjectiveDefinition) => o.key === key)?.unit ?? null;
      return {
        head: unit ? `${key}_${unitSymbol(unit, system)}` : key,
        value: (c) => {
          const v = objectiveValue(kind.objectives, c, key);
          return Number.isFinite(v) ? Number(sig(unit ? inUnit(v, unit, system) : v, 6)) : null;
        },
      };
    });
}

async function frontierCommand(file: string, opts: FrontierOptions, io: Io): Promise<number> {
  if (opts.x === opts.y) throw new InputError('--y', 'an objective other than --x');
  // The frontier is every non-dominated spring: a count, a ranking or one-per-wire would cut it silently.
  for (const [option, given] of [
    ['--top', opts.top !== undefined],
    ['--rank', opts.rank !== undefined],
    ['--per-wire', !!opts.perWire],
    ['--variants', !!opts.variants],
  ] as const) {
    if (given)
      throw new InputError(
        option,
        `an option of design or sweep (frontier lists every spring on the ${opts.x} / ${opts.y} frontier; choose the axes with --x and --y)`,
      );
  }
  checkOutputPaths(
    [
      { option: '--output', path: opts.output },
      { option: '--report', path: opts.report },
    ],
    !!opts.force,
    [file],
  );
  const traced = tracedOverrides(file, opts);
  const kind = kindOf(traced.doc);
  const x = frontierAxis(kind, opts.x, '--x', 'mass');
  const y = frontierAxis(kind, opts.y, '--y', 'outer_diameter');
  const plan = planOf(traced, planDesign);
  requirementNotes(kind, plan.req, io);
  const system = opts.units ?? plan.req.system;
  const fr = frontierOfPlan(plan, x, y, { strategy: opts.strategy, onProgress: progress(io, 'mapping') });
  if (opts.json) {
    io.stdout(toJson(frontierResult(kind, fr)) + '\n');
  } else {
    const fields = presentFields(kind.fields, fr.front);
    const axes = axisColumns(kind, fields, [x, y], system);
    const text = (await csv()).toCsv(
      ['rank', ...fieldColumns(fields, system), ...axes.map((a) => a.head)],
      fr.front.map((c, i) => [i + 1, ...fieldRow(fields, c, system), ...axes.map((a) => a.value(c as KindCandidate))]),
    );
    if (opts.output) {
      writeOutputFile(opts.output, text, !!opts.force, '--output');
      io.stderr(`coilfront: ${fr.front.length} springs on the ${x} / ${y} frontier (of ${fr.cloud.length} feasible) written to ${opts.output}\n`);
    } else io.stdout(text);
  }
  if (opts.report) {
    if (!kind.report.designHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
    writeOutputFile(opts.report, await kind.report.designHtml(fr.run, system, { frontier: fr }), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (!opts.json) io.stderr(cautionsOf(kind));
  return fr.front.length ? EXIT.ok : EXIT.infeasible;
}

export function registerFrontierCommand(program: Command, io: Io, setCode: (c: number) => void): void {
  // Every kind's axes (a kind refuses those it does not have, naming --x or --y).
  const keys = [...new Set(KINDS.flatMap(frontierAxes))];
  addCommon(
    program
      .command('frontier')
      .description('the Pareto set of all feasible springs on two objectives, as CSV')
      .argument('<requirements-file>', 'YAML or JSON requirements file'),
    false,
  )
    .addOption(new Option('--x <key>', 'objective on the x axis').choices(keys).default('mass'))
    .addOption(new Option('--y <key>', 'objective on the y axis').choices(keys).default('outer_diameter'))
    .option('-o, --output <file.csv>', 'write the CSV here instead of stdout')
    .option('--report <file.html>', 'also write a self-contained HTML report with the frontier plot')
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts: FrontierOptions) => setCode(await frontierCommand(file, opts, io)));
}
