// Requirements -> candidates -> evaluation -> filters -> ranking for extension springs, through the
// shared grid search; every reported spring is judged again by the single-spring analysis.
import type { Catalog } from '../../catalogs/types.js';
import { LIMITS } from '../../input/limits.js';
import { geneticSearch } from '../../search/genetic.js';
import { gridSearch } from '../../search/grid.js';
import type { SearchResult } from '../../search/result.js';
import { termination, type Termination } from '../../search/termination.js';
import { InputError } from '../../units/parse.js';
import type { SearchRequest } from '../kind.js';
import { analyzeExtension, type ExtensionAnalysis, type ExtensionGeometry } from './analysis.js';
import { loadExtensionCatalog, type ExtensionCatalog } from './catalog.js';
import { EXTENSION_CHECKS, checkExtension } from './checks.js';
import { buildExtensionProblem, combinations, type ExtensionProblem, type ExtensionStock } from './problem.js';
import type { ExtensionRequirements } from './requirements.js';

export interface ExtensionCandidate {
  item: ExtensionStock;
  geometry: ExtensionGeometry;
  analysis: ExtensionAnalysis;
  checks: Float64Array;
  objectives: Float64Array;
}

export interface ExtensionDesignRun {
  req: ExtensionRequirements;
  problem: ExtensionProblem;
  result: SearchResult;
  candidates: ExtensionCandidate[];
  /** Wall-clock time of the search, ms (shown only when asked: it differs from run to run). */
  searchMs: number;
  /** The requirements document (overrides applied), when known: the relax advice changes it by path. */
  document?: unknown;
}

/** A reported spring may miss a check by no more than this (normalised): rounding, not a failure. */
export const REVERIFY_TOLERANCE = 1e-6;

/** The full analysis of the spring at point x, as a spring file of it would give. */
export function extensionCandidateAt(problem: ExtensionProblem, x: ArrayLike<number>, objectives: Float64Array): ExtensionCandidate {
  const { item, geometry } = problem.decode(x);
  const analysis = analyzeExtension(geometry, item.material, problem.service());
  return { item, geometry, analysis, checks: checkExtension(analysis, problem.req), objectives };
}

/** A disagreement between the search and the analysis is a defect of ours: never print such a spring. */
export function assertExtensionVerified(c: ExtensionCandidate): void {
  let worst = 0;
  for (let j = 1; j < c.checks.length; j++) if (c.checks[j] > c.checks[worst]) worst = j;
  if (c.checks[worst] > REVERIFY_TOLERANCE) {
    throw new Error(
      `a reported extension spring failed re-verification (${EXTENSION_CHECKS[worst]} by ${c.checks[worst].toExponential(2)}); please report this`,
    );
  }
}

export interface ExtensionDesignOptions {
  /** Keep every feasible spring (for a frontier). */
  collectAll?: boolean;
  onProgress?: (done: number, total: number) => void;
  problem?: ExtensionProblem;
  document?: unknown;
  /** 'auto' (the default): the grid up to LIMITS.gridCombinations, the genetic search above. */
  strategy?: SearchRequest['strategy'];
  /** What asked for a grid, for the refusal of one too large ("a frontier maps every combination"). */
  gridReason?: string;
  /** The genetic search's evaluation budget (default LIMITS.geneticEvaluations). */
  maxEvaluations?: number;
}

/** The strategy that will run. The grid visits every combination, so a grid too large is refused naming
 * the settings that size it; the genetic search's work is its budget, whatever the size of the space.
 * The best spring per wire size needs every wire looked at: that is the grid's job. */
export function chooseExtensionStrategy(
  req: ExtensionRequirements,
  problem: ExtensionProblem,
  opts: Pick<ExtensionDesignOptions, 'strategy' | 'gridReason' | 'collectAll'> = {},
): 'grid' | 'genetic' {
  const cells = combinations(problem);
  const grid =
    problem.stock.length === 0 ||
    req.bestPerWire ||
    !!opts.collectAll ||
    opts.strategy === 'grid' ||
    (opts.strategy !== 'genetic' && cells <= LIMITS.gridCombinations);
  if (grid && cells > LIMITS.gridCombinations) {
    const why =
      opts.gridReason ??
      (req.bestPerWire
        ? 'best_per_wire looks at every wire size'
        : opts.strategy === 'grid'
          ? 'asked for by --strategy grid'
          : 'this command looks at every combination');
    const coilCounts = Math.round(cells / Math.max(1, problem.stock.length));
    throw new InputError(
      'coil_step',
      `a grid search (${why}) of at most ${LIMITS.gridCombinations.toLocaleString('en-US')} combinations; this one has ${cells.toLocaleString('en-US')} ` +
        `(${problem.stock.length} material wire sizes x ${coilCounts} body-coil counts): use a larger coil_step, a narrower body_coils, or fewer materials or wire_sizes` +
        (opts.strategy === 'grid' ? ', or --strategy auto (the genetic search takes spaces this large)' : ''),
      req.coilStep,
    );
  }
  return grid ? 'grid' : 'genetic';
}

/** When the genetic search stops: its budget spent, or 60% of it spent without a better incumbent (the
 * rule of compression design, src/kinds/compression/design.ts; extension springs have no LP bound). */
export function extensionTermination(maxEvaluations: number): Termination {
  return termination({ maxEvaluations, stallEvaluations: 0.6 * maxEvaluations });
}

export function designExtension(
  req: ExtensionRequirements,
  catalog: Catalog,
  opts: ExtensionDesignOptions = {},
  ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials),
): ExtensionDesignRun {
  const t0 = performance.now();
  const problem = opts.problem ?? buildExtensionProblem(req, catalog, ext);
  // One spring per stock item (material and wire size) when asked: the grid keeps the best of each value of variable 0.
  const result =
    chooseExtensionStrategy(req, problem, opts) === 'grid'
      ? gridSearch(problem, { top: req.top, collectAll: opts.collectAll, onProgress: opts.onProgress, bestPerValueOf: req.bestPerWire ? 0 : undefined })
      : geneticSearch(problem, {
          seed: req.seed,
          maxEvaluations: 0,
          top: req.top,
          termination: extensionTermination(opts.maxEvaluations ?? LIMITS.geneticEvaluations),
        });
  const candidates = result.best.map((b) => extensionCandidateAt(problem, b.x, b.f));
  candidates.forEach(assertExtensionVerified);
  return { req, problem, result, candidates, searchMs: performance.now() - t0, document: opts.document };
}
