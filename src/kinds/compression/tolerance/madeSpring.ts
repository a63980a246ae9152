// The requirement checks of one made compression spring, as fast as the search's own evaluation: the
// wire diameter, mean diameter, shear modulus, active coils and working force are given as they came
// out of the coiler, and the free length is where the maker set it to meet that working force at the
// working length. Same normalised values as checkAnalysis (g <= 0 passes), written into a caller's
// array: nothing is allocated, so the search can call it many times per candidate.
import type { Requirements } from '../requirements.js';
import type { MaterialFigures } from '../analysis.js';
import { bucklingConstant1, bucklingConstant2, criticalDeflectionFrom, endConditionConstant } from '../buckling.js';
import { minimumGapSum, solidOuterDiameter } from '../clash.js';
import { INFINITE_LIFE_CYCLES, endurancePoint, fullyReversedEndurance, fatigueSafetyFactorFrom, type EndurancePoint } from '../../../model/fatigue.js';
import { inactiveCoils, pitch, solidLength, type EndType } from '../geometry.js';
import { springRate } from '../../../model/rate.js';
import { shearStress } from '../../../model/stress.js';
import { stressFactor, type StressCorrection } from '../../../model/stressFactor.js';
import { ultimateShearStrength } from '../../../model/strength.js';
import { activeCoilMass, surgeFrequency } from '../../../model/surge.js';
import { CHECK, CHECKS, activeChecks, forceBand, shortestLength, staticLimit } from '../verify.js';
import { Q } from './model.js';

/** Everything about one stock item, end type and requirement set that a made spring does not change. */
export interface MadeSpringContext {
  readonly active: Uint8Array;
  readonly ends: EndType;
  readonly inactive: number;
  readonly workingLength: number;
  readonly shortest: number;
  readonly travel: number;
  readonly operatingForce: number;
  readonly loadTolerance: number;
  readonly correction: StressCorrection;
  readonly directShear: boolean;
  readonly staticFactor: number;
  readonly limit: number;
  readonly ultimateShear: number;
  readonly endurance: EndurancePoint;
  readonly fullyReversed: number;
  readonly criterion: Requirements['criterion'];
  readonly fatigueTarget: number;
  readonly elasticModulus: number;
  readonly density: number;
  readonly alpha: number;
  readonly oneEndFree: boolean;
  readonly surgeNeed: number;
  readonly index: readonly [number, number];
  readonly maxOuterDiameter: number;
  readonly minInnerDiameter: number;
  readonly maxFreeLength: number;
  readonly maxSolidLength: number;
  readonly clashAllowance: number;
  readonly temperatureExcess: number;
}

export function madeSpringContext(req: Requirements, figures: MaterialFigures, ends: EndType): MadeSpringContext {
  const ultimateShear = ultimateShearStrength(figures.tensileStrength);
  const { point } = endurancePoint(
    req.cycles ?? INFINITE_LIFE_CYCLES,
    req.peened,
    figures.zimmerli,
    figures.finiteLife,
    figures.tensileStrength,
    req.criterion,
  );
  const { limit, factor } = staticLimit(req, figures.allowableStress);
  return {
    active: Uint8Array.from(activeChecks(req).map((a) => (a ? 1 : 0))),
    ends,
    inactive: inactiveCoils(ends),
    workingLength: req.workingLength,
    shortest: shortestLength(req),
    travel: req.workingLength - shortestLength(req),
    operatingForce: req.operatingForce ?? 0,
    loadTolerance: forceBand(req),
    correction: req.correction,
    directShear: req.directShear,
    staticFactor: factor,
    limit,
    ultimateShear,
    endurance: point,
    fullyReversed: fullyReversedEndurance(point, ultimateShear, req.criterion),
    criterion: req.criterion,
    fatigueTarget: req.safety.fatigue,
    elasticModulus: figures.elasticModulus,
    density: figures.density,
    alpha: endConditionConstant(req.seating),
    oneEndFree: req.seating === 'fixed-free',
    surgeNeed: req.forcingFrequency ? req.safety.surge * req.forcingFrequency : 0,
    index: req.index,
    maxOuterDiameter: req.maxOuterDiameter ?? Infinity,
    minInnerDiameter: req.minInnerDiameter ?? 0,
    maxFreeLength: req.maxFreeLength ?? Infinity,
    maxSolidLength: req.maxSolidLength ?? Infinity,
    clashAllowance: req.clashAllowance,
    temperatureExcess: req.temperature !== undefined ? (req.temperature - figures.maxTemperature) / Math.max(Math.abs(figures.maxTemperature), 1) : -1,
  };
}

/** Check values of the made spring q = [d, D, G, Na, F1] (see TOLERANCED), into g (CHECKS order). */
export function madeSpringChecks(c: MadeSpringContext, q: ArrayLike<number>, g: Float64Array): void {
  const d = q[Q.wire_diameter];
  const D = q[Q.mean_diameter];
  const G = q[Q.shear_modulus];
  const Na = q[Q.active_coils];
  const F1 = q[Q.working_force];
  const on = c.active;
  const C = D / d;
  const K = stressFactor(C, c.correction);
  const k = springRate(G, d, D, Na, c.directShear);
  const L0 = c.workingLength + F1 / k;
  const Ls = solidLength(d, Na + c.inactive, c.ends);
  const Lmin = c.shortest;
  const F2 = F1 + k * c.travel;
  const tauMax = shearStress(F2, D, d, K);
  g.fill(-1);
  g[CHECK.index_min] = (c.index[0] - C) / c.index[0];
  g[CHECK.index_max] = (C - c.index[1]) / c.index[1];
  if (on[CHECK.outer_diameter] === 1) g[CHECK.outer_diameter] = (D + d - c.maxOuterDiameter) / c.maxOuterDiameter;
  if (on[CHECK.inner_diameter] === 1) g[CHECK.inner_diameter] = (c.minInnerDiameter - (D - d)) / c.minInnerDiameter;
  if (on[CHECK.free_length] === 1) g[CHECK.free_length] = (L0 - c.maxFreeLength) / c.maxFreeLength;
  if (on[CHECK.solid_length] === 1) g[CHECK.solid_length] = (Ls - c.maxSolidLength) / c.maxSolidLength;
  g[CHECK.clash] = (Ls + c.clashAllowance * (L0 - Lmin) - Lmin) / Lmin;
  if (on[CHECK.coil_gaps] === 1) {
    const minGap = minimumGapSum(D, d, Na);
    g[CHECK.coil_gaps] = (minGap - (Lmin - Ls)) / Math.max(minGap, 1e-12);
  }
  if (on[CHECK.outer_diameter_at_solid] === 1)
    g[CHECK.outer_diameter_at_solid] = (solidOuterDiameter(D, d, pitch(L0, Na, d, c.ends)) - c.maxOuterDiameter) / c.maxOuterDiameter;
  g[CHECK.static_stress] = (tauMax * c.staticFactor - c.limit) / c.limit;
  if (on[CHECK.solid_stress] === 1) g[CHECK.solid_stress] = (shearStress(k * (L0 - Ls), D, d, K) - c.limit) / c.limit;
  if (on[CHECK.fatigue] === 1) {
    const tauMin = shearStress(F1, D, d, K);
    const nf = fatigueSafetyFactorFrom(0.5 * (tauMax - tauMin), 0.5 * (tauMax + tauMin), c.endurance, c.ultimateShear, c.fullyReversed, c.criterion);
    g[CHECK.fatigue] = (c.fatigueTarget - nf) / c.fatigueTarget;
  }
  if (on[CHECK.buckling] === 1) {
    const ymax = L0 - Lmin;
    const ycr = criticalDeflectionFrom(L0, D, bucklingConstant1(c.elasticModulus, G), bucklingConstant2(c.elasticModulus, G), c.alpha);
    g[CHECK.buckling] = ycr === ycr ? (ymax - ycr) / ymax : -1;
  }
  if (on[CHECK.surge] === 1) g[CHECK.surge] = (c.surgeNeed - surgeFrequency(k, activeCoilMass(d, D, Na, c.density), c.oneEndFree)) / c.surgeNeed;
  if (on[CHECK.operating_force_min] === 1) {
    g[CHECK.operating_force_min] = (c.operatingForce * (1 - c.loadTolerance) - F2) / c.operatingForce;
    g[CHECK.operating_force_max] = (F2 - c.operatingForce * (1 + c.loadTolerance)) / c.operatingForce;
  }
  if (on[CHECK.temperature] === 1) g[CHECK.temperature] = c.temperatureExcess;
}

/** The checks that judge a made spring. The index range is left out: it is a rule for the drawing
 * (how well the wire coils), not a property a made spring is inspected for, and the search already
 * holds the nominal spring to it. */
export function yieldChecks(req: Requirements): Uint8Array {
  const on = activeChecks(req);
  return Uint8Array.from(CHECKS.map((name, i) => (on[i] && name !== 'index_min' && name !== 'index_max' ? 1 : 0)));
}
