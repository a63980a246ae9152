// The checks a spring must pass to meet a set of requirements, named in the trade's words. The search
// evaluates them in its hot loop (problem.ts); `checkAnalysis` evaluates the same checks on a full
// single-spring analysis, so every spring the search reports can be re-verified independently.
import type { Requirements } from './requirements.js';
import type { MaterialFigures, SpringAnalysis } from './analysis.js';
import { COMPRESSION_CHECKS, Check, type CheckName } from './checks.js';

export const CHECKS = COMPRESSION_CHECKS.map((c) => c.name);
export type { CheckName };
/** Index of each check in g[] (the registry's `Check`). */
export const CHECK = Check;

export const CHECK_LABELS = Object.fromEntries(COMPRESSION_CHECKS.map((c) => [c.name, c.label])) as Record<CheckName, string>;

/** Which checks apply to these requirements. */
export function activeChecks(req: Requirements): boolean[] {
  return COMPRESSION_CHECKS.map((c) => c.active(req));
}

/** The shortest length in service: the operating length, or the working length when there is no stroke. */
export function shortestLength(req: Requirements): number {
  return req.operatingLength ?? req.workingLength;
}

/** Half-width of the operating-force band, relative. A zero load tolerance asks for one exact force,
 * which a computed spring can only meet to rounding: it is read as one part in 1e9 either side, far
 * inside any maker's tolerance, so that the search and this re-verification both see springs meet it. */
export function forceBand(req: Requirements): number {
  return Math.max(req.loadTolerance, 1e-9);
}

/** The material figures a spring is judged by under these requirements: a requirement-level
 * `allowable_stress` replaces the material's own, so the search, the safety-factor column, the notes
 * and the JSON all use the one allowable the search used. */
export function figuresUnder(req: Requirements, figures: MaterialFigures): MaterialFigures {
  return req.allowableStress === undefined ? figures : { ...figures, allowableStress: req.allowableStress };
}

/** Required static allowable and the factor applied to the stress. */
export function staticLimit(req: Requirements, allowable: number): { limit: number; factor: number } {
  return req.allowableStress !== undefined ? { limit: req.allowableStress, factor: 1 } : { limit: allowable, factor: req.safety.static };
}

/** Normalised check values (g <= 0 passes) computed from a full analysis; inactive checks are -1. */
export function checkAnalysis(a: SpringAnalysis, req: Requirements): Float64Array {
  const g = new Float64Array(CHECKS.length).fill(-1);
  const on = activeChecks(req);
  const geo = a.geometry;
  const Lmin = shortestLength(req);
  const set = (name: CheckName, v: number) => {
    if (on[CHECK[name]]) g[CHECK[name]] = v;
  };
  set('index_min', (req.index[0] - geo.springIndex) / req.index[0]);
  set('index_max', (geo.springIndex - req.index[1]) / req.index[1]);
  if (req.maxOuterDiameter !== undefined) {
    set('outer_diameter', (geo.outerDiameter - req.maxOuterDiameter) / req.maxOuterDiameter);
    set('outer_diameter_at_solid', (a.solid.outerDiameter - req.maxOuterDiameter) / req.maxOuterDiameter);
  }
  if (req.minInnerDiameter !== undefined) set('inner_diameter', (req.minInnerDiameter - geo.innerDiameter) / req.minInnerDiameter);
  if (req.maxFreeLength !== undefined) set('free_length', (geo.freeLength - req.maxFreeLength) / req.maxFreeLength);
  if (req.maxSolidLength !== undefined) set('solid_length', (geo.solidLength - req.maxSolidLength) / req.maxSolidLength);
  set('clash', (geo.solidLength + req.clashAllowance * (geo.freeLength - Lmin) - Lmin) / Lmin);
  set('coil_gaps', (a.clash.minGapSum - (Lmin - geo.solidLength)) / Math.max(a.clash.minGapSum, 1e-12));
  const { limit, factor } = staticLimit(req, a.material.allowableStress);
  const maxStress = Math.max(...a.points.map((p) => p.stress));
  set('static_stress', (maxStress * factor - limit) / limit);
  set('solid_stress', (a.solid.stress - limit) / limit);
  if (a.fatigue) set('fatigue', (req.safety.fatigue - a.fatigue.safetyFactor) / req.safety.fatigue);
  set('buckling', a.buckling.absolutelyStable ? -1 : (a.buckling.maxDeflection - a.buckling.criticalDeflection) / a.buckling.maxDeflection);
  if (req.forcingFrequency) set('surge', (req.safety.surge * req.forcingFrequency - a.surge.relevant) / (req.safety.surge * req.forcingFrequency));
  if (req.operatingForce !== undefined) {
    const F2 = a.points[a.points.length - 1].force;
    const band = forceBand(req);
    set('operating_force_min', (req.operatingForce * (1 - band) - F2) / req.operatingForce);
    set('operating_force_max', (F2 - req.operatingForce * (1 + band)) / req.operatingForce);
  }
  if (req.temperature !== undefined) set('temperature', (req.temperature - a.material.maxTemperature) / Math.max(Math.abs(a.material.maxTemperature), 1));
  // The yield is a property of the made population, not of this one spring: the search judges it by
  // its estimate and the reported springs are confirmed by the Monte Carlo (src/kinds/compression/tolerance/confirm.ts).
  // Here it stays -1 (not judged), so this re-verification is of the nominal spring's checks.
  return g;
}
