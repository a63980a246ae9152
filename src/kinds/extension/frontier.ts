// The trade-off frontier of extension springs: every feasible spring of the grid (one per material, wire
// and body-coil count at its smallest feasible mean diameter, or sampled along it when a safety factor
// is an axis) and its Pareto set on two objectives, every spring of the set re-verified by the analysis.
import type { Catalog } from '../../catalogs/types.js';
import { LIMITS } from '../../input/limits.js';
import { geneticFront } from '../../search/geneticFront.js';
import { gridSearch } from '../../search/grid.js';
import { paretoFront2 } from '../../search/pareto.js';
import type { Kind } from '../../units/kinds.js';
import { loadExtensionCatalog, type ExtensionCatalog } from './catalog.js';
import {
  assertExtensionVerified,
  chooseExtensionStrategy,
  designExtension,
  extensionCandidateAt,
  type ExtensionCandidate,
  type ExtensionDesignRun,
} from './design.js';
import { XO, buildExtensionProblem, combinations, type ExtensionProblem } from './problem.js';
import type { SearchRequest } from '../kind.js';
import type { ExtensionRequirements } from './requirements.js';

export const EXTENSION_FRONTIER_KEYS = {
  mass: { objective: XO.mass, sign: 1, kind: 'mass' as Kind | null, label: 'mass' },
  wire_volume: { objective: XO.wire_volume, sign: 1, kind: null, label: 'wire volume (mm^3)' },
  outer_diameter: { objective: XO.outer_diameter, sign: 1, kind: 'length', label: 'outer diameter' },
  free_length: { objective: XO.free_length, sign: 1, kind: 'length', label: 'free length inside the loops' },
  relative_cost: { objective: XO.relative_cost, sign: 1, kind: null, label: 'relative cost (mass x cost factor)' },
  safety_factor: { objective: XO.neg_safety_factor, sign: -1, kind: null, label: 'safety factor (lowest of body, loops, static and fatigue)' },
} as const satisfies Record<string, { objective: number; sign: 1 | -1; kind: Kind | null; label: string }>;
export type ExtensionFrontierKey = keyof typeof EXTENSION_FRONTIER_KEYS;

export interface ExtensionFrontier {
  run: ExtensionDesignRun;
  x: ExtensionFrontierKey;
  y: ExtensionFrontierKey;
  /** Every combination (grid) or the two-objective genetic search. */
  strategy: 'grid' | 'genetic';
  cloud: { x: number; y: number }[];
  front: ExtensionCandidate[];
}

/** The value of a frontier key of a designed spring (a safety factor as itself, not negated). */
export function frontierValue(c: ExtensionCandidate, k: ExtensionFrontierKey): number {
  const def = EXTENSION_FRONTIER_KEYS[k];
  return def.sign * c.objectives[def.objective];
}

export function computeExtensionFrontier(
  req: ExtensionRequirements,
  catalog: Catalog,
  x: ExtensionFrontierKey,
  y: ExtensionFrontierKey,
  onProgress?: (done: number, total: number) => void,
  built?: ExtensionProblem,
  ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials),
  strategy: SearchRequest['strategy'] = 'auto',
): ExtensionFrontier {
  const t0 = performance.now();
  const problem = built ?? buildExtensionProblem(req, catalog, ext);
  // Mass, volume, outer diameter, free length and cost grow with the mean diameter within a cell (a loop's
  // wire grows with it faster than its reach shrinks: problem.ts), so a cell's first feasible diameter
  // dominates the rest; a safety factor does not, so then every feasible step is kept, and only the grid
  // samples it.
  const everyFeasiblePoint = EXTENSION_FRONTIER_KEYS[x].sign < 0 || EXTENSION_FRONTIER_KEYS[y].sign < 0 || problem.objectiveTrend?.[0] !== 1;
  const genetic =
    !everyFeasiblePoint && problem.stock.length > 0 && (strategy === 'genetic' || (strategy === 'auto' && combinations(problem) > LIMITS.gridCombinations));
  if (genetic) return geneticExtensionFrontier(req, catalog, problem, x, y, ext);
  chooseExtensionStrategy(req, problem, {
    strategy: 'grid',
    gridReason: strategy === 'grid' ? 'asked for by --strategy grid' : 'a safety-factor axis needs every combination',
  });
  const result = gridSearch(problem, { top: req.top, collectAll: true, everyFeasiblePoint, onProgress });
  const candidates = result.best.map((b) => extensionCandidateAt(problem, b.x, b.f));
  candidates.forEach(assertExtensionVerified);
  const run: ExtensionDesignRun = { req, problem, result, candidates, searchMs: performance.now() - t0 };
  const buf = result.cloud!;
  const ox = EXTENSION_FRONTIER_KEYS[x].objective;
  const oy = EXTENSION_FRONTIER_KEYS[y].objective;
  const xs = new Float64Array(buf.size);
  const ys = new Float64Array(buf.size);
  for (let i = 0; i < buf.size; i++) {
    const f = buf.f(i);
    xs[i] = f[ox];
    ys[i] = f[oy];
  }
  const front = paretoFront2(xs, ys).map((i) => extensionCandidateAt(problem, buf.x(i), Float64Array.from(buf.f(i))));
  front.forEach(assertExtensionVerified);
  const cloud = Array.from(xs, (v, i) => ({ x: EXTENSION_FRONTIER_KEYS[x].sign * v, y: EXTENSION_FRONTIER_KEYS[y].sign * ys[i] }));
  return { run, x, y, strategy: 'grid', cloud, front };
}

/** The front from the two-objective genetic search (the engine's, as for compression springs), for
 * spaces too large to enumerate; the run beside it is the single-objective genetic design. */
function geneticExtensionFrontier(
  req: ExtensionRequirements,
  catalog: Catalog,
  problem: ExtensionProblem,
  x: ExtensionFrontierKey,
  y: ExtensionFrontierKey,
  ext: ExtensionCatalog,
): ExtensionFrontier {
  const run = designExtension(req, catalog, { strategy: 'genetic', problem }, ext);
  const ox = EXTENSION_FRONTIER_KEYS[x].objective;
  const oy = EXTENSION_FRONTIER_KEYS[y].objective;
  const r = geneticFront(problem, { seed: req.seed, objectives: [ox, oy], maxEvaluations: 2 * LIMITS.geneticEvaluations });
  const front = paretoFront2(
    r.best.map((p) => p.f[ox]),
    r.best.map((p) => p.f[oy]),
  ).map((i) => extensionCandidateAt(problem, r.best[i].x, r.best[i].f));
  front.forEach(assertExtensionVerified);
  const all = r.cloud!;
  const cloud = Array.from({ length: all.size }, (_, i) => ({
    x: EXTENSION_FRONTIER_KEYS[x].sign * all.f(i)[ox],
    y: EXTENSION_FRONTIER_KEYS[y].sign * all.f(i)[oy],
  }));
  return { run, x, y, strategy: 'genetic', cloud, front };
}

/** The frontier a design report draws beside a run: mass against outer diameter over the run's own
 * problem; null when the run found no spring. The caller computes it, so the report never searches. */
export function extensionReportFrontier(run: ExtensionDesignRun, catalog: Catalog): ExtensionFrontier | null {
  return run.candidates.length ? computeExtensionFrontier(run.req, catalog, 'mass', 'outer_diameter', undefined, run.problem) : null;
}
