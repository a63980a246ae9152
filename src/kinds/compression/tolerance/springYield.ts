// Yield of one designed compression spring: its tolerances, the first-order estimate the search can
// afford, and the Monte Carlo that re-analyses every sampled spring through the single-spring analysis
// and the requirement checks (the same path `analyze` and the re-verification take).
import type { Material } from '../../../catalogs/types.js';
import type { Requirements } from '../requirements.js';
import { analyzeSpring, type MaterialFigures, type SpringGeometry } from '../analysis.js';
import { springRate } from '../../../model/rate.js';
import { CHECKS, checkAnalysis, type CheckName } from '../verify.js';
import { springServiceConditions } from '../problem.js';
import type { ToleranceCatalog } from './catalog.js';
import { estimateYield, yieldScratch, type CheckEvaluator } from './estimate.js';
import { madeSpringChecks, madeSpringContext, yieldChecks } from './madeSpring.js';
import { Q, TOLERANCED, springTolerances, standardDeviations, type SpringTolerances, type ToleranceRequest } from './model.js';
import { monteCarloYield, type MonteCarloOptions, type YieldResult } from './monteCarlo.js';

/** The designed spring: its geometry (free length set by the working force) and material. */
export interface DesignedSpring {
  geometry: SpringGeometry;
  figures: MaterialFigures;
  material: Material;
}

/** [d, D, G, Na, F1] of the nominal spring, in the order of TOLERANCED. */
export function nominalQuantities(s: DesignedSpring, req: Requirements): Float64Array {
  const q = new Float64Array(TOLERANCED.length);
  q[Q.wire_diameter] = s.geometry.wireDiameter;
  q[Q.mean_diameter] = s.geometry.meanDiameter;
  q[Q.shear_modulus] = s.figures.shearModulus;
  q[Q.active_coils] = s.geometry.activeCoils;
  q[Q.working_force] = req.workingForce;
  return q;
}

/** The made spring q as a geometry and material: free length adjusted to its working force. */
export function madeSpring(s: DesignedSpring, req: Requirements, q: ArrayLike<number>): { geometry: SpringGeometry; figures: MaterialFigures } {
  const G = q[Q.shear_modulus];
  const d = q[Q.wire_diameter];
  const D = q[Q.mean_diameter];
  const Na = q[Q.active_coils];
  const k = springRate(G, d, D, Na, req.directShear);
  return {
    geometry: { wireDiameter: d, meanDiameter: D, activeCoils: Na, ends: s.geometry.ends, freeLength: req.workingLength + q[Q.working_force] / k },
    figures: { ...s.figures, shearModulus: G },
  };
}

/** Judge a made spring by the full analysis and checkAnalysis (allocates: for sampling and tests). */
export function analysisEvaluator(s: DesignedSpring, req: Requirements): CheckEvaluator {
  const service = springServiceConditions(req);
  return (q, g) => {
    if (!(q[Q.wire_diameter] > 0 && q[Q.mean_diameter] > q[Q.wire_diameter] && q[Q.shear_modulus] > 0 && q[Q.active_coils] > 0)) {
      g.fill(NaN);
      return;
    }
    const m = madeSpring(s, req, q);
    g.set(checkAnalysis(analyzeSpring(m.geometry, m.figures, service), req));
  };
}

/** Judge a made spring by the allocation-free evaluation (the search's speed). */
export function fastEvaluator(s: DesignedSpring, req: Requirements): CheckEvaluator {
  const c = madeSpringContext(req, s.figures, s.geometry.ends);
  return (q, g) => madeSpringChecks(c, q, g);
}

export function designedTolerances(catalog: ToleranceCatalog, request: ToleranceRequest, s: DesignedSpring, req: Requirements): SpringTolerances {
  return springTolerances(catalog, request, {
    material: s.material,
    wireDiameter: s.geometry.wireDiameter,
    meanDiameter: s.geometry.meanDiameter,
    activeCoils: s.geometry.activeCoils,
    shearModulus: s.figures.shearModulus,
    workingForce: req.workingForce,
    rate: springRate(s.figures.shearModulus, s.geometry.wireDiameter, s.geometry.meanDiameter, s.geometry.activeCoils, req.directShear),
  });
}

export interface SpringYield {
  tolerances: SpringTolerances;
  /** First-order estimate (product of the per-check probabilities). */
  estimate: number;
  /** Bonferroni lower bound of the estimate's probabilities. */
  estimateLowerBound: number;
  /** The check the estimate finds most likely to fail, or null. */
  estimateLimiting: CheckName | null;
  monteCarlo: YieldResult;
}

/** A reported spring's yield as the design carries it: the estimate, the Monte Carlo confirmation and
 * its verdict under min_yield (src/kinds/compression/tolerance/confirm.ts). */
export interface CandidateYield {
  tolerances: SpringTolerances;
  /** The in-search estimate (first-order reliability). */
  estimate: number;
  /** The check the estimate finds most likely to fail, or null. */
  estimateLimiting: CheckName | null;
  monteCarlo: YieldResult;
  /** The check that limits the yield: the one the sampled springs failed most often (else the estimate's). */
  limiting: CheckName | null;
  /** min_yield is set and the Monte Carlo yield is below it by more than its standard error (confirm.ts yieldShortfall). */
  refused: boolean;
}

/** Tolerances, estimate and Monte Carlo of one designed spring. */
export function springYield(
  catalog: ToleranceCatalog,
  request: ToleranceRequest,
  s: DesignedSpring,
  req: Requirements,
  opts: MonteCarloOptions = {},
): SpringYield {
  const tolerances = designedTolerances(catalog, request, s, req);
  const nominal = nominalQuantities(s, req);
  const sigma = standardDeviations(tolerances);
  const include = yieldChecks(req);
  const scratch = yieldScratch(TOLERANCED.length);
  const estimate = estimateYield(fastEvaluator(s, req), nominal, sigma, include, scratch);
  const monteCarlo = monteCarloYield(analysisEvaluator(s, req), nominal, sigma, include, { seed: opts.seed ?? req.seed, samples: opts.samples });
  return {
    tolerances,
    estimate,
    estimateLowerBound: scratch.lowerBound,
    estimateLimiting: scratch.limiting >= 0 && scratch.pass[scratch.limiting] < 1 ? CHECKS[scratch.limiting] : null,
    monteCarlo,
  };
}
