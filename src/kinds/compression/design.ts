// Requirements -> candidates -> evaluation -> filters -> ranking: one design run, whichever strategy.
import { LIMITS } from '../../input/limits.js';
import { gridWorkError, type Requirements } from './requirements.js';
import { analyzeSpring, type SpringAnalysis, type SpringGeometry } from './analysis.js';
import { geneticSearch } from '../../search/genetic.js';
import { termination, type Termination } from '../../search/termination.js';
import { gridSearch } from '../../search/grid.js';
import { valueCount } from '../../search/problem.js';
import type { SearchResult } from '../../search/result.js';
import { bestPerGroup } from './variants.js';
import { CHECKS, activeChecks, checkAnalysis } from './verify.js';
import { Objective } from './objectives.js';
import { lpLowerBound, type LpBound } from './lpBound.js';
import { buildSpringProblem, type SpringProblem, type StockItem } from './problem.js';
import type { CandidateYield } from './tolerance/springYield.js';

export type StrategyChoice = 'auto' | 'grid' | 'genetic';

export interface DesignOptions {
  strategy?: StrategyChoice;
  /** Keep every feasible spring (one per cell at its smallest feasible diameter) for the frontier. */
  collectAll?: boolean;
  /** With collectAll, every feasible diameter step of each cell too (for non-monotone objectives). */
  everyFeasiblePoint?: boolean;
  /** Budget of the genetic search, in evaluations (default LIMITS.geneticEvaluations). */
  maxEvaluations?: number;
  /** What forces the grid when the caller does (for the refusal of one too large). */
  gridReason?: string;
  onProgress?: (done: number, total: number) => void;
  /** The problem, when the caller has built it already. */
  problem?: SpringProblem;
  /** The requirements document req was read from (overrides applied): the advice of an infeasible
   * run changes it by path, as `--set` does. */
  document?: unknown;
  /** Skip the LP bound (a feasibility probe needs no bound). */
  skipBound?: boolean;
}

export interface Candidate {
  /** In the grouped list: how many feasible springs (coil counts) of its material, wire size and end type this one stands for. */
  variants?: number;
  /** Its yield at the tolerances, attached for output where the run was confirmed (run.yields). */
  yield?: CandidateYield;
  item: StockItem;
  geometry: SpringGeometry;
  analysis: SpringAnalysis;
  checks: Float64Array;
  objectives: Float64Array;
}

export interface DesignRun {
  req: Requirements;
  problem: SpringProblem;
  result: SearchResult;
  candidates: Candidate[];
  lp: LpBound;
  /** (best - bound) / best, when both exist. */
  gap: number | null;
  cells: number;
  searchMs: number;
  document?: unknown;
  /** The list holds the best spring of each material, wire size and end type (candidates carry `variants`). */
  grouped?: boolean;
  /** Per candidate, its yield at the tolerances (set by confirmRun: the design command and API). */
  yields?: CandidateYield[];
  /** Springs the estimate admitted under min_yield that the Monte Carlo refused. */
  refused?: { candidate: Candidate; yield: CandidateYield }[];
  /** Set where the list was confirmed beyond the search (confirmBest): said with a sweep's output. */
  confirmation?: string;
}

/** Grid cells of the problem: stock x end types x coil counts. */
export function cellCount(p: SpringProblem): number {
  return p.variables.filter((v) => v.kind !== 'continuous').reduce((a, v) => a * valueCount(v), 1);
}

/** Build the full analysis of the spring at point x, the same way `analyze` would. */
export function candidateAt(problem: SpringProblem, x: ArrayLike<number>, objectives: Float64Array): Candidate {
  const { item, geometry } = problem.decode(x);
  const analysis = analyzeSpring(geometry, item.figures, problem.service());
  return { item, geometry, analysis, checks: checkAnalysis(analysis, problem.req), objectives };
}

/** Every reported spring is judged again by the full single-spring analysis; a disagreement is a
 * defect of ours, and no spring that fails it is ever printed. */
export function assertVerified(c: Candidate): void {
  const worst = Math.max(...c.checks);
  if (worst > 1e-6)
    throw new Error(`a reported spring failed re-verification (${CHECKS[c.checks.indexOf(worst)]} by ${worst.toExponential(2)}); please report this`);
}

/** Above this many combinations the automatic choice is the genetic search: the grid's own limit. */
export const AUTO_GRID_CELL_LIMIT = LIMITS.gridCombinations;

/** The strategy that will run: the grid visits every combination, so its work is the number of
 * combinations and a grid too large is refused (naming the settings that size it); the genetic search's
 * work is its evaluation budget, whatever the size of the space. */
export function chooseStrategy(req: Requirements, problem: SpringProblem, opts: Pick<DesignOptions, 'strategy' | 'gridReason'>): 'grid' | 'genetic' {
  const cells = cellCount(problem);
  // The best spring of each material, wire size and end type needs every cell looked at: that is the
  // grid's job (an explicit --strategy genetic lists the best springs it finds instead).
  // Past the grid's size the default grouped list gives way to the genetic search (its best springs
  // listed as found); a grouped list asked for in so many words (--per-wire) forces the grid.
  const grouping = req.bestPerWire && opts.strategy !== 'genetic';
  const forced = opts.strategy === 'grid' || (grouping && req.bestPerWireAsked === true);
  const strategy = opts.strategy === 'genetic' || (!forced && cells > AUTO_GRID_CELL_LIMIT) ? 'genetic' : 'grid';
  if (strategy === 'grid' && cells > LIMITS.gridCombinations) {
    const why =
      opts.gridReason ??
      (grouping
        ? 'the best spring of each material, wire size and end type needs every combination looked at (--variants or --strategy genetic lists the best found instead)'
        : opts.strategy === 'grid'
          ? 'asked for by --strategy grid'
          : 'this command looks at every combination');
    const sizes = problem.stock.length;
    const refusal = gridWorkError(req, why, { sizes, coilCounts: Math.round(cells / Math.max(1, sizes * req.ends.length)), combinations: cells });
    if (refusal) throw refusal;
  }
  return strategy;
}

export function runDesign(req: Requirements, opts: DesignOptions = {}): DesignRun {
  const problem = opts.problem ?? buildSpringProblem(req);
  const cells = cellCount(problem);
  const strategy = chooseStrategy(req, problem, opts);
  // A genetic search lists its best springs as found (grouping needs every cell looked at).
  const grouped = req.bestPerWire && !opts.collectAll && strategy === 'grid';
  // The LP bound comes first: the genetic search stops once its incumbent reaches it.
  const lp: LpBound = opts.skipBound ? { value: null, status: 'not-applicable', models: 0 } : lpLowerBound(problem);
  // process.hrtime, not performance.now: the global `performance` loads perf_hooks on first use, about
  // 1% of a bare node start that every design run would pay for one timing.
  const t0 = process.hrtime.bigint();
  const result =
    problem.stock.length === 0
      ? emptyResult()
      : strategy === 'grid'
        ? gridSearch(problem, {
            top: req.top,
            collectAll: opts.collectAll || grouped,
            everyFeasiblePoint: opts.everyFeasiblePoint,
            maxScanPoints: 40,
            onProgress: opts.onProgress,
          })
        : geneticSearch(problem, {
            seed: req.seed,
            maxEvaluations: 0,
            top: req.top,
            termination: geneticTermination(opts.maxEvaluations ?? LIMITS.geneticEvaluations, lp.value),
          });
  const searchMs = Number(process.hrtime.bigint() - t0) / 1e6;
  // Grouped: the best of each material, wire size and end type, each with the count of feasible springs
  // (coil counts) it stands for; the cloud is dropped again (nobody asked for it).
  const groups = grouped && result.cloud ? bestPerGroup(result.cloud, req.top) : null;
  if (groups) {
    result.best = groups.map((g) => g.best);
    result.cloud = null;
  }
  const candidates = result.best.map((b, i) => ({ ...candidateAt(problem, b.x, b.f), ...(groups ? { variants: groups[i].feasible } : {}) }));
  candidates.forEach(assertVerified);
  const bestValue = candidates.length
    ? req.rank === 'mass'
      ? candidates[0].objectives[Objective.mass]
      : candidates[0].objectives[Objective.wire_volume]
    : NaN;
  const gap = lp.value !== null && Number.isFinite(bestValue) ? (bestValue - lp.value) / bestValue : null;
  return { req, problem, result, candidates, lp, gap, cells, searchMs, document: opts.document, grouped: groups !== null };
}

/** When the genetic search of a design stops: its budget spent; 60% of its budget spent without a
 * better incumbent; or its incumbent proven within 0.1% of the optimum, by the LP bound or by the
 * problem's run bounds (src/search/runBounds.ts: on the every-material, every-end-type, coil_step 0.01
 * space every seed stops so, at about a tenth of the budget: bench/results.md). */
export function geneticTermination(maxEvaluations: number, lowerBound: number | null): Termination {
  return termination({ maxEvaluations, stallEvaluations: 0.6 * maxEvaluations, lowerBound });
}

/** Budget of a genetic feasibility probe, in evaluations (the grid needs none). */
export const PROBE_EVALUATIONS = 100_000;

/** Whether any spring meets these requirements: one design run kept to the essentials (top 1, no
 * bound, not per wire). The grid's answer depends on neither top nor per-wire ranking. */
export function admitsSpring(req: Requirements): boolean {
  return runDesign({ ...req, top: 1, bestPerWire: false }, { skipBound: true, maxEvaluations: PROBE_EVALUATIONS }).candidates.length > 0;
}

function emptyResult(): SearchResult {
  const zeros = Object.fromEntries(CHECKS.map((c) => [c, 0]));
  const inf = Object.fromEntries(CHECKS.map((c) => [c, Infinity]));
  return {
    strategy: 'grid',
    stoppedBy: 'complete',
    best: [],
    cloud: null,
    evaluations: 0,
    cells: 0,
    feasibleCells: 0,
    prunedCells: 0,
    cutBy: zeros,
    soleViolation: inf,
    nearestMisses: [],
  };
}

/** Checks that apply, in report order. */
export function reportedChecks(req: Requirements): string[] {
  const on = activeChecks(req);
  return CHECKS.filter((_, i) => on[i]);
}
