// The checks an extension spring must pass to meet its requirements, named in the trade's words. The
// search evaluates them in its hot loop (problem.ts); `checkExtension` evaluates the same checks on a
// full single-spring analysis, so every spring the search reports is re-verified independently.
import { STATIC_SERVICE_CYCLES } from '../../model/fatigue.js';
import { EXTENSION_SITES, stressPerNewton, type ExtensionAnalysis, type ExtensionService } from './analysis.js';
import { initialTensionHalfWidth, initialTensionMiddle } from './initialTension.js';
import type { ExtensionRequirements } from './requirements.js';

export const EXTENSION_CHECKS = [
  'index_min',
  'index_max',
  'outer_diameter',
  'free_length',
  'working_extension',
  'initial_tension_min',
  'initial_tension_max',
  'body_stress',
  'loop_bending_stress',
  'loop_torsion_stress',
  'body_fatigue',
  'loop_bending_fatigue',
  'loop_torsion_fatigue',
  'operating_force_min',
  'operating_force_max',
  'extended_stress',
  'surge',
  'temperature',
] as const;
export type ExtensionCheck = (typeof EXTENSION_CHECKS)[number];
export const XC = Object.fromEntries(EXTENSION_CHECKS.map((c, i) => [c, i])) as Record<ExtensionCheck, number>;

export const EXTENSION_CHECK_LABELS: Record<ExtensionCheck, string> = {
  index_min: 'spring index below the lower bound',
  index_max: 'spring index above the upper bound',
  outer_diameter: 'outer diameter too large for the bore',
  free_length: 'free length inside the loops above the limit',
  working_extension: 'free length beyond the working length (the spring would not be stretched there)',
  initial_tension_min: 'initial tension below its range (hard to hold to tolerance)',
  initial_tension_max: 'initial tension above its range (hard to wind)',
  body_stress: 'body stress above the static allowable (with its safety factor)',
  loop_bending_stress: 'loop bending stress at A above the static allowable (with its safety factor)',
  loop_torsion_stress: 'loop torsion stress at B above the static allowable (with its safety factor)',
  body_fatigue: 'body fatigue safety factor below the target',
  loop_bending_fatigue: 'loop bending (A) fatigue safety factor below the target',
  loop_torsion_fatigue: 'loop torsion (B) fatigue safety factor below the target',
  operating_force_min: 'operating force too low (rate too soft)',
  operating_force_max: 'operating force too high (rate too stiff)',
  extended_stress: 'takes a set when stretched to the largest extended length',
  surge: 'surge frequency too close to the forcing frequency',
  temperature: "service temperature above the material's maximum",
};

// What eases each check: the changes the advice (relax.ts) tries for it, by the name it gives them (the
// `--set` path, with the direction where a path moves both ways). The advice tries only the changes
// named here for the checks that cut, and says which of those each change eases. A stronger material
// or more room for the wire (a larger bore) eases the stresses; the working load itself is the job,
// never advised away, nor is a safety factor.
const stresses = ['operating_length', 'operating_force (lower)', 'envelope.max_outer_diameter', 'body_coils (higher)', 'material'] as const;
const fatigue = ['cycles', 'operating_length', 'operating_force (lower)', 'envelope.max_outer_diameter', 'material'] as const;
export const EXTENSION_RELAXED_BY: Record<ExtensionCheck, readonly string[]> = {
  index_min: ['index (lower)'],
  index_max: ['index (higher)'],
  outer_diameter: ['envelope.max_outer_diameter'],
  free_length: ['envelope.max_free_length', 'body_coils (lower)'],
  working_extension: ['body_coils (lower)'],
  // Fi = F1 - k (L1 - L0): a softer spring (more coils, a smaller rise to the operating force) needs more of it.
  initial_tension_min: ['initial_tension_range', 'body_coils (higher)', 'operating_force (lower)', 'load_tolerance'],
  initial_tension_max: ['body_coils (lower)', 'operating_force (higher)', 'load_tolerance'],
  body_stress: stresses,
  loop_bending_stress: stresses,
  loop_torsion_stress: stresses,
  body_fatigue: fatigue,
  loop_bending_fatigue: fatigue,
  loop_torsion_fatigue: fatigue,
  operating_force_min: ['operating_force (lower)', 'load_tolerance', 'body_coils (lower)'],
  operating_force_max: ['operating_force (higher)', 'load_tolerance', 'body_coils (higher)'],
  extended_stress: ['envelope.max_extended_length', 'material'],
  // Fewer coils raise the surge frequency (f ~ d / (D^2 Na)).
  surge: ['body_coils (lower)', 'envelope.max_outer_diameter'],
  temperature: ['material'],
};

/** The checks a change eases (a relaxedBy entry), in registry order. */
export function extensionEasedBy(change: string): ExtensionCheck[] {
  return EXTENSION_CHECKS.filter((c) => EXTENSION_RELAXED_BY[c].includes(change));
}

export function extensionFatigueApplies(req: ExtensionRequirements): boolean {
  return req.cycles !== undefined && req.cycles >= STATIC_SERVICE_CYCLES && req.operatingLength !== undefined;
}

/** Which checks apply to these requirements. */
export function activeExtensionChecks(req: ExtensionRequirements): boolean[] {
  const fatigue = extensionFatigueApplies(req);
  const on: Record<ExtensionCheck, boolean> = {
    index_min: true,
    index_max: true,
    outer_diameter: req.maxOuterDiameter !== undefined,
    free_length: req.maxFreeLength !== undefined,
    working_extension: true,
    initial_tension_min: true,
    initial_tension_max: true,
    body_stress: true,
    loop_bending_stress: true,
    loop_torsion_stress: true,
    body_fatigue: fatigue,
    loop_bending_fatigue: fatigue,
    loop_torsion_fatigue: fatigue,
    operating_force_min: req.operatingForce !== undefined,
    operating_force_max: req.operatingForce !== undefined,
    extended_stress: req.maxExtendedLength !== undefined,
    surge: req.forcingFrequency !== undefined && req.forcingFrequency > 0,
    temperature: req.temperature !== undefined,
  };
  return EXTENSION_CHECKS.map((c) => on[c]);
}

/** How the spring is used, as the single-spring analysis takes it. */
export function extensionService(req: ExtensionRequirements): ExtensionService {
  return {
    lengths: req.operatingLength !== undefined ? [req.workingLength, req.operatingLength] : [req.workingLength],
    cycles: req.cycles,
    peened: req.peened,
    criterion: req.criterion,
    correction: req.correction,
    temperature: req.temperature,
    forcingFrequency: req.forcingFrequency,
    surgeMargin: req.safety.surge,
  };
}

/** Normalised check values (g <= 0 passes) from a full analysis; inactive checks are -1. */
export function checkExtension(a: ExtensionAnalysis, req: ExtensionRequirements): Float64Array {
  const g = new Float64Array(EXTENSION_CHECKS.length).fill(-1);
  const on = activeExtensionChecks(req);
  const set = (name: ExtensionCheck, v: number) => {
    if (on[XC[name]]) g[XC[name]] = v;
  };
  const geo = a.geometry;
  const C = geo.springIndex;
  set('index_min', (req.index[0] - C) / req.index[0]);
  set('index_max', (C - req.index[1]) / req.index[1]);
  if (req.maxOuterDiameter !== undefined) set('outer_diameter', (geo.outerDiameter - req.maxOuterDiameter) / req.maxOuterDiameter);
  if (req.maxFreeLength !== undefined) set('free_length', (geo.freeLength - req.maxFreeLength) / req.maxFreeLength);
  set('working_extension', (geo.freeLength - req.workingLength) / req.workingLength);
  // The range is read off the same two functions the search uses.
  const mid = initialTensionMiddle(C);
  const half = initialTensionHalfWidth(C);
  const low = req.initialTensionRange === 'preferred' ? mid - half : 0;
  set('initial_tension_min', (low - a.initialTension.stress) / mid);
  set('initial_tension_max', (a.initialTension.stress - (mid + half)) / mid);
  const allow = a.material.allowables;
  const last = a.points.reduce((m, p) => (p.force > m.force ? p : m), a.points[0]);
  const sf = req.safety.static;
  set('body_stress', (last.bodyStress * sf - allow.bodyTorsion) / allow.bodyTorsion);
  set('loop_bending_stress', (last.loopBendingStress * sf - allow.loopBending) / allow.loopBending);
  set('loop_torsion_stress', (last.loopTorsionStress * sf - allow.loopTorsion) / allow.loopTorsion);
  if (a.fatigue) {
    const t = req.safety.fatigue;
    const nf = (v: number) => (Number.isNaN(v) ? -1 : (t - v) / t);
    set('body_fatigue', nf(a.fatigue.body.safetyFactor));
    set('loop_bending_fatigue', nf(a.fatigue.loopBending.safetyFactor));
    set('loop_torsion_fatigue', nf(a.fatigue.loopTorsion.safetyFactor));
  }
  if (req.operatingForce !== undefined) {
    const F2 = a.points[a.points.length - 1].force;
    set('operating_force_min', (req.operatingForce * (1 - req.loadTolerance) - F2) / req.operatingForce);
    set('operating_force_max', (F2 - req.operatingForce * (1 + req.loadTolerance)) / req.operatingForce);
  }
  if (req.maxExtendedLength !== undefined) {
    const per = stressPerNewton(geo.wireDiameter, geo.meanDiameter, a.factors.body, a.factors.loopBending, a.factors.loopTorsion);
    const F = a.initialTension.force + a.rate * (req.maxExtendedLength - geo.freeLength);
    const over = {
      body: (per.body * F) / allow.bodyTorsion,
      loopBending: (per.loopBending * F) / allow.loopBending,
      loopTorsion: (per.loopTorsion * F) / allow.loopTorsion,
    };
    set('extended_stress', Math.max(...EXTENSION_SITES.map((s) => over[s])) - 1);
  }
  if (req.forcingFrequency) set('surge', (req.safety.surge * req.forcingFrequency - a.surge.frequency) / (req.safety.surge * req.forcingFrequency));
  if (req.temperature !== undefined)
    set('temperature', (req.temperature - a.material.figures.maxTemperature) / Math.max(Math.abs(a.material.figures.maxTemperature), 1));
  return g;
}
