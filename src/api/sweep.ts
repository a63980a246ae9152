// `sweep` in the library: the design re-run for each value of one requirement (what a tighter
// envelope costs). Takes the plain object a requirements file holds and returns exactly what
// `coilfront sweep --json` prints. The document's `kind` picks the spring kind (src/kinds/index.ts):
// it reads each value's requirements, sizes the search and runs the design.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { blameOverride, parsePath, sweepValues, withValue } from '../input/overrides.js';
import { kindOf } from '../kinds/index.js';
import type { AnySpringKind, InUnits, KindRun } from '../kinds/kind.js';
import { cautionsOf } from '../report/cautions.js';
import { SI_UNITS, sanitize } from '../report/json.js';
import { feasibleCompleteRecord } from '../report/feasibleCount.js';
import type { StrategyChoice } from '../kinds/compression/design.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { withRequirementOptions, type Override, type RankedOptions } from './options.js';
import type { SweepResult } from './types.js';

/** The requirement to vary: "path=from:to:step" as `--vary` takes it, or its path and values. */
export type SweepVary = string | { path: string; values: readonly number[] };

export interface SweepOptions extends RankedOptions {
  vary: SweepVary;
}

export interface SweepRow<Run extends KindRun = KindRun> {
  value: number;
  run: Run;
  best: Run['candidates'][number] | null;
  limiting: string | null;
}

/** Every value's requirements, read (and checked) by the document's kind before any search runs. */
export interface SweepPlan {
  kind: AnySpringKind;
  catalog: Catalog;
  path: string[];
  values: number[];
  reqs: InUnits[];
  system: UnitSystem;
  /** Per value, the combinations its search covers (the grid visits each; the genetic search spends its
   * budget on them), and the strategy it runs. */
  combinations: number[];
  strategies: ('grid' | 'genetic')[];
}

/** The most values one sweep runs (as `--vary` allows). */
const MAX_VALUES = 1000;

function parseVary(vary: unknown, option: string): { path: string[]; values: number[] } {
  const relabel = (e: unknown) => (e instanceof InputError && e.field === '--vary' && option !== '--vary' ? new InputError(option, e.expected, e.got) : e);
  try {
    if (typeof vary === 'string') {
      const eq = vary.indexOf('=');
      if (eq <= 0) throw new InputError(option, 'path=from:to:step, such as envelope.max_outer_diameter=14:24:0.5', vary);
      return { path: parsePath(vary.slice(0, eq), option), values: sweepValues(vary.slice(eq + 1)) };
    }
    if (vary && typeof vary === 'object' && typeof (vary as { path?: unknown }).path === 'string' && Array.isArray((vary as { values?: unknown }).values)) {
      const { path, values } = vary as { path: string; values: unknown[] };
      if (values.length === 0 || values.length > MAX_VALUES || values.some((v) => typeof v !== 'number' || !Number.isFinite(v))) {
        throw new InputError(`${option}.values`, `a list of 1 to ${MAX_VALUES} finite numbers`, values);
      }
      return { path: parsePath(path, `${option}.path`), values: values as number[] };
    }
    throw new InputError(option, '"path=from:to:step" or { path, values }', vary);
  } catch (e) {
    throw relabel(e);
  }
}

/**
 * Read the requirements at every value of the sweep. A bad value is blamed on the vary option (with the
 * field and value), a bad override on its own option; each value's search is bounded as one design's.
 */
export function planSweep(
  document: unknown,
  vary: SweepVary,
  overrides: readonly Override[] = [],
  option = 'options.vary',
  catalog: Catalog = loadCatalog(),
  strategy?: StrategyChoice,
): SweepPlan {
  const { path, values } = parseVary(vary, option);
  const kind = kindOf(document);
  const reqs: InUnits[] = values.map((value) => {
    try {
      return kind.readRequirements(withValue(document, path, value), catalog);
    } catch (e) {
      const byVary = blameOverride(e, [{ path, option }]);
      if (byVary !== e && e instanceof InputError) throw new InputError(`${option} ${e.field}=${value}`, e.expected);
      throw blameOverride(e, overrides);
    }
  });
  // Each value's search is bounded as design bounds one (LIMITS.gridCombinations): the kind refuses a
  // grid too large, naming the setting and offering the genetic search where it applies, and the
  // automatic choice takes the genetic search past it, whose work is its evaluation budget. The
  // refusal comes before any search runs, and names the value.
  const name = path.join('.');
  const strategies = reqs.map((r, i) => {
    try {
      return kind.strategyFor(r, catalog, strategy);
    } catch (e) {
      if (e instanceof InputError) throw new InputError(`${option} ${name}=${values[i]}`, `each value's search within what one design allows (${e.message})`);
      throw e;
    }
  });
  const combinations = reqs.map((r) => kind.searchSize(r, catalog));
  return { kind, catalog, path, values, reqs, system: reqs.length ? reqs[reqs.length - 1].system : 'si', combinations, strategies };
}

/** The combinations of the whole sweep, over all its values, and of its largest value. */
export function sweepWork(plan: Pick<SweepPlan, 'combinations'>): { total: number; largest: number } {
  return { total: plan.combinations.reduce((a, b) => a + b, 0), largest: Math.max(0, ...plan.combinations) };
}

/** One design per value, in order; onStep after each. */
export function runSweepPlan(plan: SweepPlan, options: { strategy?: StrategyChoice; onStep?: (done: number, total: number) => void } = {}): SweepRow[] {
  return plan.reqs.map((req, i) => {
    const run = plan.kind.search(req, plan.catalog, { strategy: options.strategy }) as KindRun;
    options.onStep?.(i + 1, plan.reqs.length);
    return { value: plan.values[i], run, best: run.candidates[0] ?? null, limiting: run.candidates.length ? null : plan.kind.report.limitingText(run) };
  });
}

/** How the rows' springs were confirmed beyond the search, when they were (the kind's own words). */
export function sweepConfirmation(rows: readonly SweepRow[]): string | null {
  return rows.find((r) => r.run.confirmation !== undefined)?.run.confirmation ?? null;
}

/** The JSON record of a sweep, as `sweep --json` prints it: framed by the kind (jsonFrame). */
export function sweepResult(kind: AnySpringKind, path: readonly string[], rows: readonly SweepRow[], plan?: Pick<SweepPlan, 'combinations'>): SweepResult {
  const name = path.join('.');
  const work = plan ? sweepWork(plan) : null;
  return sanitize({
    units: SI_UNITS,
    ...kind.report.jsonFrame.head,
    vary: name,
    note: `${name} values are as given on the command line, in the file's unit system`,
    ...(work ? { combinations: { total: work.total, largest_value: work.largest } } : {}),
    ...(sweepConfirmation(rows) !== null ? { confirmation: sweepConfirmation(rows) } : {}),
    rows: rows.map((r) => ({
      value: r.value,
      feasible: r.run.result.feasibleCells,
      pruned: r.run.result.prunedCells,
      ...feasibleCompleteRecord(r.run.result),
      best: r.best ? kind.report.candidateJson(r.best) : null,
      limiting_check: r.limiting,
    })),
    ...kind.report.jsonFrame.tail,
    cautions: cautionsOf(kind),
  }) as SweepResult;
}

export function sweep(requirements: unknown, options: SweepOptions): SweepResult {
  const o: Partial<SweepOptions> = options ?? {};
  const { document, overrides } = withRequirementOptions(requirements, o);
  const plan = planSweep(document, o.vary as SweepVary, overrides, 'options.vary', o.catalog, o.strategy);
  return sweepResult(plan.kind, plan.path, runSweepPlan(plan, { strategy: o.strategy, onStep: o.onProgress }), plan);
}
