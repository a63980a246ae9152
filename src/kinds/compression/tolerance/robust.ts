// Robust design over a collected feasible cloud: the best spring whose estimated yield reaches
// min_yield, confirmed by the Monte Carlo. The search proper will apply the same test per candidate in
// its hot loop; this exhaustive pass over every feasible point of the grid is the reference it must
// agree with, and what the figures of robustness (mass against yield) are measured with.
import type { Requirements } from '../requirements.js';
import { candidateAt, runDesign, type Candidate, type DesignRun } from '../design.js';
import { Objective } from '../objectives.js';
import type { ToleranceCatalog } from './catalog.js';
import { estimateYield, yieldScratch } from './estimate.js';
import { madeSpringChecks, madeSpringContext, yieldChecks, type MadeSpringContext } from './madeSpring.js';
import { Q, TOLERANCED, standardDeviations, type ToleranceRequest } from './model.js';
import type { MonteCarloOptions } from './monteCarlo.js';
import { designedTolerances, springYield, type SpringYield } from './springYield.js';

export interface RobustResult {
  /** The nominal design run (every feasible point collected). */
  run: DesignRun;
  /** Best feasible spring by the rank, and its yield. */
  nominal: { candidate: Candidate; yield: SpringYield } | null;
  /** Best spring whose estimated yield reaches min_yield, and its yield (Monte Carlo included). */
  robust: { candidate: Candidate; yield: SpringYield } | null;
  /** Feasible points looked at, and how many reached min_yield by the estimate. */
  feasible: number;
  robustCount: number;
}

/** The design run every robust choice is made from: grid strategy, every feasible point collected. */
export function collectingRun(req: Requirements): DesignRun {
  return runDesign(req, { strategy: 'grid', collectAll: true, everyFeasiblePoint: true });
}

/** Estimated yield of every feasible point of the run's cloud (in cloud order). */
export function cloudYields(run: DesignRun, catalog: ToleranceCatalog, request: ToleranceRequest): Float64Array {
  const { problem, req } = run;
  const cloud = run.result.cloud;
  const n = cloud ? cloud.size : 0;
  const out = new Float64Array(n);
  const include = yieldChecks(req);
  const scratch = yieldScratch(TOLERANCED.length);
  const q = new Float64Array(TOLERANCED.length);
  const contexts = new Map<string, MadeSpringContext>();
  for (let i = 0; i < n; i++) {
    const x = cloud!.x(i);
    const { item, geometry } = problem.decode(x);
    const key = `${x[0]}/${x[1]}`;
    let c = contexts.get(key);
    if (!c) contexts.set(key, (c = madeSpringContext(req, item.figures, geometry.ends)));
    const ctx = c;
    const sigma = standardDeviations(designedTolerances(catalog, request, { geometry, figures: item.figures, material: item.choice.material }, req));
    q[Q.wire_diameter] = geometry.wireDiameter;
    q[Q.mean_diameter] = geometry.meanDiameter;
    q[Q.shear_modulus] = item.figures.shearModulus;
    q[Q.active_coils] = geometry.activeCoils;
    q[Q.working_force] = req.workingForce;
    out[i] = estimateYield((qq, g) => madeSpringChecks(ctx, qq, g), q, sigma, include, scratch);
  }
  return out;
}

/** Index in the cloud of the best point whose estimated yield reaches minYield, or -1. */
export function bestReaching(run: DesignRun, yields: Float64Array, minYield: number): number {
  const cloud = run.result.cloud;
  let best = -1;
  let bestValue = Infinity;
  for (let i = 0; i < yields.length; i++) {
    if (!(yields[i] >= minYield)) continue;
    const value = cloud!.f(i)[Objective.rank];
    if (value < bestValue) {
      bestValue = value;
      best = i;
    }
  }
  return best;
}

/** Run the design collecting every feasible point, then keep the best whose estimated yield reaches
 * minYield; both it and the nominal best are confirmed by the Monte Carlo. */
export function robustDesign(
  req: Requirements,
  catalog: ToleranceCatalog,
  request: ToleranceRequest,
  minYield: number,
  opts: MonteCarloOptions = {},
): RobustResult {
  const run = collectingRun(req);
  const yields = cloudYields(run, catalog, request);
  const best = bestReaching(run, yields, minYield);
  const cloud = run.result.cloud;
  const withYield = (cand: Candidate) => ({
    candidate: cand,
    yield: springYield(catalog, request, { geometry: cand.geometry, figures: cand.item.figures, material: cand.item.choice.material }, req, opts),
  });
  const nominal = run.candidates.length ? withYield(run.candidates[0]) : null;
  const robust = best >= 0 ? withYield(candidateAt(run.problem, cloud!.x(best), Float64Array.from(cloud!.f(best)))) : null;
  return { run, nominal, robust, feasible: yields.length, robustCount: yields.filter((y) => y >= minYield).length };
}
