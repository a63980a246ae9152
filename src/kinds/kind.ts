// The spring-kind seam (issue 7). Every kind of spring (compression, extension, later conical) lives
// in its own folder behind this one interface; the commands and the library API dispatch on the
// `kind` field of a spring or requirements document through the registry in ./index.ts. Adding a
// kind is a new folder that exports one `SpringKind` plus one line in that registry.
//
// A kind owns what is particular to its springs: how a document of it reads, its analysis, its
// checks, objectives and output fields (each a registry: one definition per entry, read by the hot
// loop, the re-verification, the advice and every output format), its search problem, its report
// sections and drawing, and its cautions. Shared wire mechanics (stress factor, stress, rate,
// strength, fatigue criteria, surge) stay in src/model/ and are imported, never re-derived.
import type { Catalog } from '../catalogs/types.js';
import type { Problem } from '../search/problem.js';
import type { SearchResult } from '../search/result.js';
import type { Kind as UnitKind } from '../units/kinds.js';
import type { UnitSystem } from '../units/systems.js';
import type { FieldDefinition } from '../report/fields.js';

// An output field is defined by the renderer that reads it (src/report/fields.ts, below the kinds).
export type { FieldColumn, FieldDefinition, FieldValue } from '../report/fields.js';

/** How a check or objective moves when the solved variable grows (the values of TREND in
 * src/search/problem.ts): -1 decreasing, 0 unknown (scanned), 1 increasing. */
export type Trend = -1 | 0 | 1;

/** One check a spring must pass: defined once, read by the search (its index and trend), the
 * single-spring re-verification, the advice (what relaxes it) and every report (its label). */
export interface CheckDefinition<Req> {
  /** The name in JSON, CSV and the counts ("static_stress"). */
  readonly name: string;
  /** What a failure means, in the trade's words. */
  readonly label: string;
  /** Its trend in the kind's solved variable under these requirements. */
  trend(req: Req): Trend;
  /** Whether these requirements ask for it (an inactive check is -1 everywhere). */
  active(req: Req): boolean;
  /** The requirement paths (as `--set` takes them) whose relaxation eases it: the advice hook. */
  readonly relaxedBy: readonly string[];
}

/** One objective: what the search minimises, a rank key, a frontier axis, or several of those. The
 * search writes objective i of the registry into f[1 + i] (f[0] is the one ranked by), multiplied by
 * its sign: every kind's candidates carry that vector, and objectiveValue() reads it back. */
export interface ObjectiveDefinition {
  /** The key users give (`rank: mass`, `--x relative_cost`). */
  readonly key: string;
  readonly label: string;
  /** Unit kind of its value, or null for a plain number (a safety factor, a cost index). */
  readonly unit: UnitKind | 'volume' | null;
  /** The search minimises sign * value: -1 for a quantity that is better larger (a safety factor). */
  readonly sign: 1 | -1;
  /** Its trend in the solved variable, within a cell (0 when not monotone). */
  readonly trend: Trend;
  /** May rank the listed springs (`rank:`). */
  readonly rankable: boolean;
  /** May be an axis of the trade-off frontier. */
  readonly frontierAxis: boolean;
  /** Has a lower bound by the LP relaxation. */
  readonly lpBound: boolean;
}

/** The search problem of a kind: a general Problem (the engine knows nothing of springs) plus the
 * way back from a point to a spring, fully analysed and judged again by the single-spring analysis. */
export interface KindProblem<Req, Cand> extends Problem {
  readonly req: Req;
  /** The spring at point x with its full analysis and its checks re-computed from that analysis. */
  candidateAt(x: ArrayLike<number>, objectives: Float64Array): Cand;
}

/** What every designed spring carries: its objective vector, f[1 + i] for objective i (times its sign). */
export interface KindCandidate {
  readonly objectives: Float64Array;
}

/** What every design run holds, whatever the kind: its requirements, the engine's result (counts, cuts)
 * and the springs it lists, best first. */
export interface KindRun<Req = unknown, Cand = unknown> {
  readonly req: Req;
  readonly result: SearchResult;
  readonly candidates: readonly Cand[];
  /** How the listed springs were confirmed beyond the search, in words, when they were (compression
   * under min_yield: the seeded Monte Carlo): a sweep says it with its output. */
  readonly confirmation?: string;
}

/** The trade-off frontier of a kind on two of its frontier axes. */
export interface KindFrontier<Run = unknown, Cand = unknown> {
  /** The design run the frontier came from (its counts are the frontier's). */
  readonly run: Run;
  readonly x: string;
  readonly y: string;
  /** Every combination (grid) or the two-objective genetic search. */
  readonly strategy: 'grid' | 'genetic';
  /** Every feasible spring found, as (x, y) the way users read them (a safety factor as itself). */
  readonly cloud: readonly { x: number; y: number }[];
  /** The non-dominated springs, in order of x, each re-verified by the single-spring analysis. */
  readonly front: readonly Cand[];
}

/** A sweep as its report draws it: the varied requirement and the best spring at each value. */
export interface SweepSummary<Cand = unknown> {
  name: string;
  rows: { value: number; best: Cand | null }[];
}

/** How a kind's results are shown. HTML renderers may be loaded lazily (start-up time). */
export interface KindReport<Case, Analysis, Req, Run, Cand = unknown, Front = KindFrontier<Run, Cand>> {
  analysisText(c: Case, a: Analysis, system: UnitSystem): string;
  analysisJson(c: Case, a: Analysis): Record<string, unknown>;
  /** The single-spring HTML report, or undefined when the kind has none yet. */
  analysisHtml?(c: Case, a: Analysis, system: UnitSystem): Promise<string>;
  designText(run: Run, system: UnitSystem, showTiming: boolean): string;
  designJson(run: Run, showTiming: boolean): Record<string, unknown>;
  /** The design HTML report, or undefined when the kind has none yet. It draws the frontier it is
   * given (the mass / outer diameter one of the run when none is), never searching on its own account
   * beyond that, and the sweep when there is one. */
  designHtml?(run: Run, system: UnitSystem, shown?: { frontier?: Front; sweep?: SweepSummary<Cand> }): Promise<string>;
  /** One designed spring as JSON (SI): a row of `design --json`, `frontier --json` and `sweep --json`. */
  candidateJson(c: Cand): Record<string, unknown>;
  /** How a search went, as JSON (strategy, evaluations, cuts per check...). */
  countsJson(run: Run): Record<string, unknown>;
  /** The check that cut most in a run with no spring, in a few words (no further runs). */
  limitingText(run: Run): string;
  /** What every JSON record of the kind carries before its body (its kind, for any kind but the
   * default) and after it (its own caution): frontier and sweep records are framed by it, as the
   * kind's own design and analysis records are. */
  readonly jsonFrame: { readonly head: Readonly<Record<string, unknown>>; readonly tail: Readonly<Record<string, unknown>> };
  /** The specification sheet of one given spring (`analyze --spec`), or undefined when the kind writes its
   * sheet from a design only. Throws InputError (nothing written) when the spring cannot be specified. */
  analysisSpecSheet?(c: Case, a: Analysis, system: UnitSystem): Promise<string>;
  /** Write the specification sheet of the spring ranked `pick` (1 = best); false (nothing written) when there is none. */
  writeSpecSheet?(path: string, run: Run, system: UnitSystem, force: boolean, pick?: number): Promise<boolean>;
  /** The spring file (as `analyze` and `check` read it) of the spring ranked `pick`, at drawing
   * precision, with notes for stderr; null when there is no such spring. */
  springFile?(run: Run, pick: number): { text: string; notes: string[] } | null;
  /** How many springs the run lists (the range of --pick). */
  listed?(run: Run): number;
  /** Notes on how the requirements were read, for stderr ("judged as static service"). */
  requirementNotes(req: Req): string[];
}

export interface SearchRequest {
  strategy?: 'auto' | 'grid' | 'genetic';
  onProgress?: (done: number, total: number) => void;
}

export interface DesignRequest extends SearchRequest {
  /** The document the requirements were read from (overrides applied): the advice changes it by path. */
  document?: unknown;
}

/** Spring cases and requirements say which unit system their file was written in (the default of output). */
export interface InUnits {
  readonly system: UnitSystem;
}

export interface SpringKind<
  Case extends InUnits = InUnits,
  Analysis = unknown,
  Req extends InUnits = InUnits,
  Run extends KindRun<Req, Cand> = KindRun<Req, never>,
  Cand extends KindCandidate = KindCandidate,
  Front extends KindFrontier<Run, Cand> = KindFrontier<Run, Cand>,
> {
  /** The value of the `kind` field ('compression', 'extension'). */
  readonly id: string;
  /** In words, for headings ("helical compression spring"). */
  readonly label: string;
  /** A spring document (raw YAML/JSON value) -> the case to analyse. Throws InputError naming the field. */
  readSpring(raw: unknown, catalog: Catalog): Case;
  /** The full single-spring analysis. */
  analyse(c: Case): Analysis;
  /** A requirements document -> requirements. Throws InputError naming the field. */
  readRequirements(raw: unknown, catalog: Catalog): Req;
  /** The search problem of these requirements. */
  buildProblem(req: Req, catalog: Catalog): KindProblem<Req, Cand>;
  /** Requirements -> candidates -> evaluation -> filters -> ranking, every reported spring re-verified. */
  design(req: Req, catalog: Catalog, request?: DesignRequest): Run;
  /** The search alone, each spring re-verified, without what only a listed design adds (the advice,
   * compression's per-spring yield confirmation, which costs some 25 searches): a sweep's run per value. */
  search(req: Req, catalog: Catalog, request?: SearchRequest): Run;
  /** The strategy a search of these requirements would run, refusing (InputError, naming the setting)
   * a grid too large as design refuses it: a sweep checks every value by it before any search runs. */
  strategyFor(req: Req, catalog: Catalog, strategy?: SearchRequest['strategy']): 'grid' | 'genetic';
  /** Whether a design run found any spring (the exit code of `design`). */
  found(run: Run): boolean;
  /** The trade-off frontier on two of the kind's frontier axes (x and y are keys of its objectives
   * marked frontierAxis, checked by the caller: frontierAxis()), every spring on it re-verified. */
  frontier(req: Req, catalog: Catalog, x: string, y: string, request?: SearchRequest): Front;
  /** The combinations a design of these requirements would visit: a sweep's runs together are
   * bounded like one search. */
  searchSize(req: Req, catalog: Catalog): number;
  readonly checks: readonly CheckDefinition<Req>[];
  readonly objectives: readonly ObjectiveDefinition[];
  readonly fields: readonly FieldDefinition<Cand>[];
  readonly report: KindReport<Case, Analysis, Req, Run, Cand, Front>;
  /** The kind's own cautions, printed after the general ones (src/report/cautions.ts). */
  readonly cautions: readonly string[];
}

/** A kind with its types erased, as the registry holds it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnySpringKind = SpringKind<any, any, any, any, any, any>;

/** The value of objective `key` of a designed spring as users read it (a safety factor as itself, not
 * negated): f[1 + i] times the sign of objective i. */
export function objectiveValue(objectives: readonly ObjectiveDefinition[], c: KindCandidate, key: string): number {
  const i = objectives.findIndex((o) => o.key === key);
  if (i < 0) throw new Error(`objectiveValue: no objective ${key}; please report this`);
  return objectives[i].sign * c.objectives[1 + i];
}

/** The keys a kind offers as frontier axes, in registry order. */
export function frontierAxes(kind: Pick<AnySpringKind, 'objectives'>): string[] {
  return kind.objectives.filter((o) => o.frontierAxis).map((o) => o.key);
}

/** Index constants of a registry, `{ clash: 6, ... }`, for the hot loop: a frozen object of numbers
 * (a property load V8 folds to a constant), never a Map lookup. */
export function indexOf<const N extends string>(names: readonly N[]): { readonly [K in N]: number } {
  const out = {} as { [K in N]: number };
  names.forEach((n, i) => {
    out[n] = i;
  });
  return Object.freeze(out);
}
