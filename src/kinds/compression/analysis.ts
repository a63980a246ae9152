// The full analysis of one helical compression spring: every figure a designer checks, composed from
// the pure functions of this folder. Inputs and outputs SI (mm, N, MPa, kg, Hz, degC). No I/O.
import { endConditionConstant, criticalDeflection, stableFreeLengthLimit, type Seating } from './buckling.js';
import { fractionalOverrun, minimumGapSum, solidOuterDiameter } from './clash.js';
import {
  INFINITE_LIFE_CYCLES,
  STATIC_SERVICE_CYCLES,
  alternatingStrength,
  cycleStresses,
  endurancePoint,
  fatigueSafetyFactor,
  type EndurancePoint,
  type EnduranceSource,
  type FatigueCriterion,
} from '../../model/fatigue.js';
import { helixAngle, inactiveCoils, pitch, solidLength, springMass, wireLength, wireVolume, type EndType } from './geometry.js';
import type { MaterialFigures, Warning } from '../../model/figures.js';
import { springRate } from '../../model/rate.js';
import { shearStress } from '../../model/stress.js';
import { stressFactor, type StressCorrection } from '../../model/stressFactor.js';
import { ultimateShearStrength } from '../../model/strength.js';
import { activeCoilMass, surgeFrequency, type SurgeEnds } from '../../model/surge.js';

export interface SpringGeometry {
  wireDiameter: number;
  meanDiameter: number;
  activeCoils: number;
  ends: EndType;
  freeLength: number;
}

export type { MaterialFigures, Warning };

export interface ServiceConditions {
  /** Lengths to evaluate, mm (each at or above solid). */
  lengths: number[];
  /** Load cycles; undefined: static service; Infinity: infinite life. */
  cycles?: number;
  peened: boolean;
  criterion: FatigueCriterion;
  correction: StressCorrection;
  directShear: boolean;
  seating: Seating;
  /** Surge boundary (default 'plates'); independent of the buckling seating. */
  surgeEnds?: SurgeEnds;
  temperature?: number;
  forcingFrequency?: number;
  /** Required fractional overrun to solid (robust linearity), 0.15 by default. */
  clashAllowance: number;
  /** Also apply EN 13906-1's minimum sum of coil gaps. */
  gapRule: boolean;
  /** Surge frequency must exceed the forcing frequency this many times. */
  surgeMargin: number;
}

export interface PointResult {
  length: number;
  deflection: number;
  force: number;
  stress: number;
  stressRatio: number;
}

export interface FatigueResult {
  life: 'infinite' | 'finite';
  cycles: number;
  minForce: number;
  maxForce: number;
  alternatingStress: number;
  meanStress: number;
  criterion: FatigueCriterion;
  /** The life curve at this life: repeated-stress strength S_sr and the point (S_sr/2, S_sr/2). */
  repeatedStrength: number;
  endurance: EndurancePoint;
  enduranceSource: EnduranceSource;
  ultimateShear: number;
  alternatingStrength: number;
  /** NaN when the cycle has no alternating stress. */
  safetyFactor: number;
}

export interface SpringAnalysis {
  geometry: {
    wireDiameter: number;
    meanDiameter: number;
    outerDiameter: number;
    innerDiameter: number;
    springIndex: number;
    activeCoils: number;
    totalCoils: number;
    ends: EndType;
    freeLength: number;
    solidLength: number;
    pitch: number;
    helixAngleDeg: number;
    wireLength: number;
    wireVolume: number;
    mass: number;
  };
  stressFactor: number;
  rate: number;
  material: MaterialFigures & { ultimateShear: number };
  points: PointResult[];
  solid: { force: number; stress: number; solidSafe: boolean; outerDiameter: number };
  staticSafetyFactor: number;
  fatigue: FatigueResult | null;
  buckling: {
    endConstant: number;
    absolutelyStable: boolean;
    stableFreeLengthLimit: number;
    criticalDeflection: number;
    maxDeflection: number;
    buckles: boolean;
  };
  /** Both surge frequencies, the boundary asked and its value (`relevant`, the one the surge check uses). */
  surge: { bothEndsOnPlates: number; oneEndFree: number; ends: SurgeEnds; relevant: number };
  clash: { shortestLength: number; overrun: number; required: number; gapSum: number; minGapSum: number; ok: boolean };
  warnings: Warning[];
}

export function analyzeSpring(g: SpringGeometry, m: MaterialFigures, s: ServiceConditions): SpringAnalysis {
  const d = g.wireDiameter;
  const D = g.meanDiameter;
  const C = D / d;
  const K = stressFactor(C, s.correction);
  const Nt = g.activeCoils + inactiveCoils(g.ends);
  const Ls = solidLength(d, Nt, g.ends);
  const p = pitch(g.freeLength, g.activeCoils, d, g.ends);
  const k = springRate(m.shearModulus, d, D, g.activeCoils, s.directShear);
  const ultimateShear = ultimateShearStrength(m.tensileStrength);
  const points = s.lengths.map((length) => {
    const deflection = g.freeLength - length;
    const force = k * deflection;
    const stress = shearStress(force, D, d, K);
    return { length, deflection, force, stress, stressRatio: stress / m.allowableStress };
  });
  const solidForce = k * (g.freeLength - Ls);
  const solidStress = shearStress(solidForce, D, d, K);
  const maxStress = points.reduce((a, pt) => Math.max(a, pt.stress), 0);
  const staticSafetyFactor = maxStress > 0 ? m.allowableStress / maxStress : NaN;
  const forces = points.map((pt) => pt.force);
  const minForce = forces.length ? Math.min(...forces) : 0;
  const maxForce = forces.length ? Math.max(...forces) : 0;
  const shortest = s.lengths.length ? Math.min(...s.lengths) : g.freeLength;

  let fatigue: FatigueResult | null = null;
  if (s.cycles !== undefined && s.cycles >= STATIC_SERVICE_CYCLES && points.length >= 1) {
    const infinite = s.cycles >= INFINITE_LIFE_CYCLES;
    const cyc = cycleStresses(shearStress(minForce, D, d, K), shearStress(maxForce, D, d, K));
    const {
      point: endurance,
      source: enduranceSource,
      repeatedStrength,
    } = endurancePoint(s.cycles, s.peened, m.zimmerli, m.finiteLife, m.tensileStrength, s.criterion);
    const slope = cyc.mean > 0 ? cyc.alternating / cyc.mean : Infinity;
    fatigue = {
      life: infinite ? 'infinite' : 'finite',
      cycles: s.cycles,
      minForce,
      maxForce,
      alternatingStress: cyc.alternating,
      meanStress: cyc.mean,
      criterion: s.criterion,
      repeatedStrength,
      endurance,
      enduranceSource,
      ultimateShear,
      alternatingStrength: alternatingStrength(slope, endurance, ultimateShear, s.criterion),
      safetyFactor: fatigueSafetyFactor(cyc.alternating, cyc.mean, endurance, ultimateShear, s.criterion),
    };
  }

  const alpha = endConditionConstant(s.seating);
  const ycr = criticalDeflection(g.freeLength, D, m.elasticModulus, m.shearModulus, alpha);
  const maxDeflection = g.freeLength - shortest;
  const absolutelyStable = Number.isNaN(ycr);
  const buckles = !absolutelyStable && maxDeflection >= ycr;

  const activeMass = activeCoilMass(d, D, g.activeCoils, m.density);
  const fPlates = surgeFrequency(k, activeMass, false);
  const fFree = surgeFrequency(k, activeMass, true);
  const surgeEnds = s.surgeEnds ?? 'plates';
  const fRelevant = surgeEnds === 'one-free' ? fFree : fPlates;

  const overrun = maxForce > 0 ? fractionalOverrun(solidForce, maxForce) : Infinity;
  const gapSum = shortest - Ls;
  const minGap = minimumGapSum(D, d, g.activeCoils);
  const clashOk = overrun >= s.clashAllowance - 1e-12 && (!s.gapRule || gapSum >= minGap - 1e-12);

  const analysis: SpringAnalysis = {
    geometry: {
      wireDiameter: d,
      meanDiameter: D,
      outerDiameter: D + d,
      innerDiameter: D - d,
      springIndex: C,
      activeCoils: g.activeCoils,
      totalCoils: Nt,
      ends: g.ends,
      freeLength: g.freeLength,
      solidLength: Ls,
      pitch: p,
      helixAngleDeg: (helixAngle(p, D) * 180) / Math.PI,
      wireLength: wireLength(D, Nt),
      wireVolume: wireVolume(d, D, Nt),
      mass: springMass(d, D, Nt, m.density),
    },
    stressFactor: K,
    rate: k,
    material: { ...m, ultimateShear },
    points,
    solid: { force: solidForce, stress: solidStress, solidSafe: solidStress <= m.allowableStress, outerDiameter: solidOuterDiameter(D, d, p) },
    staticSafetyFactor,
    fatigue,
    buckling: {
      endConstant: alpha,
      absolutelyStable,
      stableFreeLengthLimit: stableFreeLengthLimit(D, m.elasticModulus, m.shearModulus, alpha),
      criticalDeflection: ycr,
      maxDeflection,
      buckles,
    },
    surge: { bothEndsOnPlates: fPlates, oneEndFree: fFree, ends: surgeEnds, relevant: fRelevant },
    clash: { shortestLength: shortest, overrun: Number.isFinite(overrun) ? overrun : NaN, required: s.clashAllowance, gapSum, minGapSum: minGap, ok: clashOk },
    warnings: [],
  };
  analysis.warnings = rulesOfThumb(analysis, s);
  return analysis;
}

/** How warnings write quantities; SI by default, the report's system when it rewrites them. */
export interface QuantityWriter {
  stress(v: number): string;
  length(v: number): string;
  temperature(v: number): string;
}

const SI_WRITER: QuantityWriter = {
  stress: (v) => `${Number(v.toPrecision(4))} MPa`,
  length: (v) => `${Number(v.toPrecision(4))} mm`,
  temperature: (v) => `${Number(v.toPrecision(4))} degC`,
};

/** The rules of thumb a designer checks by habit; each broken one becomes a warning. */
export function rulesOfThumb(a: SpringAnalysis, s: ServiceConditions, q: QuantityWriter = SI_WRITER): Warning[] {
  const w: Warning[] = [];
  const f = (v: number, n = 4) => Number(v.toPrecision(n)).toString();
  const C = a.geometry.springIndex;
  if (C < 4 || C > 12)
    w.push({
      code: 'index',
      message: `spring index ${f(C)} is outside 4 to 12 (common practice): ${C < 4 ? 'hard to coil, high curvature stress' : 'prone to tangling and buckling, poor tolerances'}`,
    });
  if (a.geometry.activeCoils < 3)
    w.push({ code: 'few-coils', message: `${f(a.geometry.activeCoils)} active coils: fewer than 3 makes the rate sensitive to end seating (common practice)` });
  if (Number.isFinite(a.staticSafetyFactor) && a.staticSafetyFactor < 1)
    w.push({
      code: 'overstress',
      message: `stress at the shortest evaluated length is ${f(1 / a.staticSafetyFactor)} times the static allowable: the spring will take a set`,
    });
  if (!a.solid.solidSafe)
    w.push({
      code: 'not-solid-safe',
      message: `stress at solid (${q.stress(a.solid.stress)}) exceeds the allowable (${q.stress(a.material.allowableStress)}): the spring takes a set if closed solid`,
    });
  if (a.fatigue && Number.isFinite(a.fatigue.safetyFactor) && a.fatigue.safetyFactor < 1)
    w.push({
      code: 'fatigue',
      message: `fatigue safety factor ${f(a.fatigue.safetyFactor)} is below 1: expect failure before ${a.fatigue.life === 'infinite' ? 'infinite life' : `${a.fatigue.cycles.toExponential(0)} cycles`}`,
    });
  if (a.fatigue && !a.material.zimmerli && a.fatigue.life === 'infinite')
    w.push({
      code: 'endurance-data',
      message: "Zimmerli's endurance data are for spring steels: for this material the endurance is the 1e7-cycle row of the finite-life table",
    });
  if (a.buckling.buckles)
    w.push({
      code: 'buckling',
      message: `deflection ${q.length(a.buckling.maxDeflection)} reaches the critical buckling deflection ${q.length(a.buckling.criticalDeflection)}: guide it on a rod or in a bore, or change seating or proportions`,
    });
  if (s.forcingFrequency && s.forcingFrequency > 0 && a.surge.relevant < s.surgeMargin * s.forcingFrequency)
    w.push({
      code: 'surge',
      message: `surge frequency ${f(a.surge.relevant)} Hz is less than ${s.surgeMargin} times the forcing frequency ${f(s.forcingFrequency)} Hz (common practice)`,
    });
  if (a.points.length && !a.clash.ok)
    w.push({
      code: 'clash',
      message: `only ${f(a.clash.overrun * 100)}% force overrun to solid at the shortest length; at least ${f(s.clashAllowance * 100)}% is asked${s.gapRule ? ` and a coil-gap sum of ${q.length(a.clash.minGapSum)} (EN 13906-1)` : ''}`,
    });
  if (s.temperature !== undefined && s.temperature > a.material.maxTemperature)
    w.push({
      code: 'temperature',
      message: `service temperature ${q.temperature(s.temperature)} exceeds the material's maximum ${q.temperature(a.material.maxTemperature)}: expect relaxation`,
    });
  if (a.geometry.helixAngleDeg > 12)
    w.push({
      code: 'pitch-angle',
      message: `pitch angle ${f(a.geometry.helixAngleDeg)} degrees exceeds 12: the stress and rate formulas lose accuracy (common practice)`,
    });
  return w;
}
