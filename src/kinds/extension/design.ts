// Requirements -> candidates -> evaluation -> filters -> ranking for extension springs, through the
// shared grid search; every reported spring is judged again by the single-spring analysis.
import type { Catalog } from '../../catalogs/types.js';
import { gridSearch } from '../../search/grid.js';
import type { SearchResult } from '../../search/result.js';
import { analyzeExtension, type ExtensionAnalysis, type ExtensionGeometry } from './analysis.js';
import { loadExtensionCatalog, type ExtensionCatalog } from './catalog.js';
import { EXTENSION_CHECKS, checkExtension } from './checks.js';
import { buildExtensionProblem, type ExtensionProblem, type ExtensionStock } from './problem.js';
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
    throw new Error(`a reported extension spring failed re-verification (${EXTENSION_CHECKS[worst]} by ${c.checks[worst].toExponential(2)}); please report this`);
  }
}

export interface ExtensionDesignOptions {
  /** Keep every feasible spring (for a frontier). */
  collectAll?: boolean;
  onProgress?: (done: number, total: number) => void;
  problem?: ExtensionProblem;
  document?: unknown;
}

export function designExtension(req: ExtensionRequirements, catalog: Catalog, opts: ExtensionDesignOptions = {}, ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials)): ExtensionDesignRun {
  const t0 = performance.now();
  const problem = opts.problem ?? buildExtensionProblem(req, catalog, ext);
  // One spring per stock item (material and wire size) when asked: the grid keeps the best of each value of variable 0.
  const result = gridSearch(problem, { top: req.top, collectAll: opts.collectAll, onProgress: opts.onProgress, bestPerValueOf: req.bestPerWire ? 0 : undefined });
  const candidates = result.best.map((b) => extensionCandidateAt(problem, b.x, b.f));
  candidates.forEach(assertExtensionVerified);
  return { req, problem, result, candidates, searchMs: performance.now() - t0, document: opts.document };
}
