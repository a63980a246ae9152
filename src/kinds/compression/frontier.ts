// The trade-off frontier: every feasible spring (one per combination at its smallest feasible mean
// diameter, or sampled along it for a safety factor) and its Pareto set on two objectives.
import type { Requirements } from './requirements.js';
import { paretoFront2 } from '../../search/pareto.js';
import { geneticFront } from '../../search/geneticFront.js';
import { AUTO_GRID_CELL_LIMIT, assertVerified, candidateAt, cellCount, runDesign, type Candidate, type DesignRun, type StrategyChoice } from './design.js';
import { buildSpringProblem, type SpringProblem } from './problem.js';
import { COMPRESSION_OBJECTIVES, Objective, type FrontierKey } from './objectives.js';
import type { Kind } from '../../units/kinds.js';

export interface FrontierAxis {
  objective: number;
  sign: 1 | -1;
  kind: Kind | null;
  label: string;
}

/** The frontier axes, from the objectives registry: the slot in f, the sign it is stored with, the
 * unit kind (null for a plain number) and the label. */
export const FRONTIER_KEYS = Object.fromEntries(
  COMPRESSION_OBJECTIVES.filter((o) => o.frontierAxis).map((o) => [o.key, { objective: Objective[o.key], sign: o.sign, kind: o.unit, label: o.label }]),
) as Record<FrontierKey, FrontierAxis>;
export type { FrontierKey };

export interface Frontier {
  run: DesignRun;
  x: FrontierKey;
  y: FrontierKey;
  strategy: 'grid' | 'genetic';
  cloud: { x: number; y: number }[];
  front: Candidate[];
}

export function computeFrontier(
  req: Requirements,
  x: FrontierKey,
  y: FrontierKey,
  onProgress?: (d: number, t: number) => void,
  strategy: StrategyChoice = 'auto',
  built?: SpringProblem,
): Frontier {
  // Mass, volume, diameter, free length and cost all grow with the mean diameter within a cell, so the
  // cell's first feasible diameter dominates the rest; a safety factor does not, so then every step counts
  // and only the grid samples it.
  const everyFeasiblePoint = FRONTIER_KEYS[x].sign < 0 || FRONTIER_KEYS[y].sign < 0;
  const problem = built ?? buildSpringProblem(req);
  const genetic = !everyFeasiblePoint && (strategy === 'genetic' || (strategy === 'auto' && cellCount(problem) > AUTO_GRID_CELL_LIMIT));
  if (genetic) return geneticFrontier(req, problem, x, y);
  const run = runDesign(req, {
    strategy: 'grid',
    collectAll: true,
    everyFeasiblePoint,
    onProgress,
    problem,
    gridReason: strategy === 'grid' ? 'asked for by --strategy grid' : 'a safety-factor axis needs every combination',
  });
  const cloudBuf = run.result.cloud!;
  const xs = new Float64Array(cloudBuf.size);
  const ys = new Float64Array(cloudBuf.size);
  for (let i = 0; i < cloudBuf.size; i++) {
    const f = cloudBuf.f(i);
    xs[i] = f[FRONTIER_KEYS[x].objective];
    ys[i] = f[FRONTIER_KEYS[y].objective];
  }
  const front = paretoFront2(xs, ys).map((i) => candidateAt(run.problem, cloudBuf.x(i), Float64Array.from(cloudBuf.f(i))));
  front.forEach(assertVerified);
  const cloud = Array.from(xs, (v, i) => ({ x: FRONTIER_KEYS[x].sign * v, y: FRONTIER_KEYS[y].sign * ys[i] }));
  return { run, x, y, strategy: 'grid', cloud, front };
}

/** The front from the two-objective genetic search, for spaces too large to enumerate. */
function geneticFrontier(req: Requirements, problem: SpringProblem, x: FrontierKey, y: FrontierKey): Frontier {
  const run = runDesign(req, { strategy: 'genetic', maxEvaluations: 500_000, problem });
  const ox = FRONTIER_KEYS[x].objective;
  const oy = FRONTIER_KEYS[y].objective;
  const r = geneticFront(run.problem, { seed: req.seed, objectives: [ox, oy], maxEvaluations: 1_000_000 });
  const front = paretoFront2(
    r.best.map((p) => p.f[ox]),
    r.best.map((p) => p.f[oy]),
  ).map((i) => candidateAt(run.problem, r.best[i].x, r.best[i].f));
  front.forEach(assertVerified);
  const all = r.cloud!;
  const cloud = Array.from({ length: all.size }, (_, i) => ({ x: FRONTIER_KEYS[x].sign * all.f(i)[ox], y: FRONTIER_KEYS[y].sign * all.f(i)[oy] }));
  return { run, x, y, strategy: 'genetic', cloud, front };
}

/** The frontier a design report draws beside a run: mass against outer diameter over the run's own
 * problem; null when the run found no spring. The caller computes it, so the report never searches. */
export function reportFrontier(run: DesignRun): Frontier | null {
  return run.candidates.length ? computeFrontier(run.req, 'mass', 'outer_diameter', undefined, 'auto', run.problem) : null;
}
