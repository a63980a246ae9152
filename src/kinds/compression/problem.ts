// The spring-design problem as one instance of the general search problem. Variables: stock (a
// material and one of its standard wire sizes), end type, active coils (stepped), mean diameter
// (continuous, solved per cell). The free length follows from the working load and the rate.
// Everything per stock item is computed once into typed arrays; evaluate() allocates nothing.
import { inStrengthRange } from '../../catalogs/properties.js';
import type { Requirements } from './requirements.js';
import { materialFigures, type MaterialChoice } from '../../input/material.js';
import type { MaterialFigures, ServiceConditions, SpringGeometry } from './analysis.js';
import { bucklingConstant1, bucklingConstant2, criticalDeflectionFrom, endConditionConstant } from './buckling.js';
import { minimumGapSum, solidOuterDiameter } from './clash.js';
import { INFINITE_LIFE_CYCLES, endurancePoint, fatigueSafetyFactorFrom, fullyReversedEndurance, type EndurancePoint } from '../../model/fatigue.js';
import { inactiveCoils, pitch, solidLength, wireVolume, type EndType } from './geometry.js';
import { massOfVolume } from '../../model/mass.js';
import { directShearFactor, springRate } from '../../model/rate.js';
import { shearStress } from '../../model/stress.js';
import { stressFactor } from '../../model/stressFactor.js';
import { ultimateShearStrength } from '../../model/strength.js';
import { activeCoilMass, surgeFrequency } from '../../model/surge.js';
import { TREND, type Problem } from '../../search/problem.js';
import { COMPRESSION_CHECKS, Check } from './checks.js';
import { OBJECTIVE_SLOTS, Objective, objectiveByKey } from './objectives.js';
import { CHECKS, activeChecks, figuresUnder, forceBand, shortestLength, staticLimit } from './verify.js';
import { loadToleranceCatalog, type ToleranceCatalog } from './tolerance/catalog.js';
import { inSearchYield } from './tolerance/inSearch.js';

/** See bracketBounds. */
const BOUND_EASE = 1 - 1e-12;

/** The least of D F1 + q / D^2 (the load arm of a stress under F1 + k y, with k D^3 at least q / y)
 * over [lo, hi]: at D = (2 q / F1)^(1/3), or the nearer end. */
function leastLoadArm(lo: number, hi: number, F1: number, q: number): number {
  const D = Math.min(hi, Math.max(lo, Math.cbrt((2 * q) / F1)));
  return D * F1 + q / (D * D);
}

export interface StockItem {
  choice: MaterialChoice;
  wireDiameter: number;
  figures: MaterialFigures;
}

export interface SpringProblem extends Problem {
  readonly req: Requirements;
  readonly stock: StockItem[];
  readonly ends: EndType[];
  readonly active: boolean[];
  /** Decode a point into the spring it stands for. */
  decode(x: ArrayLike<number>): { item: StockItem; geometry: SpringGeometry };
  service(): ServiceConditions;
}

export function springServiceConditions(req: Requirements): ServiceConditions {
  return {
    lengths: req.operatingLength !== undefined ? [req.workingLength, req.operatingLength] : [req.workingLength],
    cycles: req.cycles,
    peened: req.peened,
    criterion: req.criterion,
    correction: req.correction,
    directShear: req.directShear,
    seating: req.seating,
    surgeEnds: req.surgeEnds,
    temperature: req.temperature,
    forcingFrequency: req.forcingFrequency,
    clashAllowance: req.clashAllowance,
    gapRule: req.gapRule,
    surgeMargin: req.safety.surge,
  };
}

/** The problem of these requirements. With `min_yield`, the yield check reads the tolerance catalog
 * (the one beside the material catalog unless given). */
export function buildSpringProblem(req: Requirements, tolerances?: ToleranceCatalog): SpringProblem {
  const stock: StockItem[] = [];
  for (const choice of req.materials) {
    for (const d of req.wireSizes(choice)) {
      if (choice.tensileStrength === undefined && !inStrengthRange(choice.material, d)) continue;
      if (req.maxOuterDiameter !== undefined && d * (req.index[0] + 1) > req.maxOuterDiameter) continue;
      stock.push({ choice, wireDiameter: d, figures: figuresUnder(req, materialFigures(choice, d, req.setRemoved)) });
    }
  }
  const n = stock.length;
  const sd = new Float64Array(n);
  const sG = new Float64Array(n);
  const sE = new Float64Array(n);
  const sRho = new Float64Array(n);
  const sLimit = new Float64Array(n);
  const sSsu = new Float64Array(n);
  const sTmax = new Float64Array(n);
  const sCost = new Float64Array(n);
  const sC1 = new Float64Array(n);
  const sC2 = new Float64Array(n);
  const sSse = new Float64Array(n);
  const sPoint: EndurancePoint[] = [];
  stock.forEach((s, i) => {
    sd[i] = s.wireDiameter;
    sG[i] = s.figures.shearModulus;
    sE[i] = s.figures.elasticModulus;
    sRho[i] = s.figures.density;
    sLimit[i] = staticLimit(req, s.figures.allowableStress).limit;
    sSsu[i] = ultimateShearStrength(s.figures.tensileStrength);
    sTmax[i] = s.figures.maxTemperature;
    sCost[i] = s.choice.material.relativeCost.value;
    const { point } = endurancePoint(
      req.cycles ?? INFINITE_LIFE_CYCLES,
      req.peened,
      s.figures.zimmerli,
      s.figures.finiteLife,
      s.figures.tensileStrength,
      req.criterion,
    );
    sPoint.push(point);
    sSse[i] = fullyReversedEndurance(point, sSsu[i], req.criterion);
    sC1[i] = bucklingConstant1(sE[i], sG[i]);
    sC2[i] = bucklingConstant2(sE[i], sG[i]);
  });
  const ends = req.ends;
  const endQ = Int32Array.from(ends.map(inactiveCoils));
  const active = activeChecks(req);
  const activeMask = Uint8Array.from(active.map((a) => (a ? 1 : 0)));

  const F1 = req.workingForce;
  const L1 = req.workingLength;
  const Lmin = shortestLength(req);
  const travel = L1 - Lmin;
  const F2req = req.operatingForce ?? 0;
  const tol = forceBand(req);
  const correction = req.correction;
  const staticFactor = staticLimit(req, 1).factor;
  const alpha = endConditionConstant(req.seating);
  const oneEndFree = req.surgeEnds === 'one-free';
  const surgeNeed = req.forcingFrequency ? req.safety.surge * req.forcingFrequency : 0;
  const Cmin = req.index[0];
  const Cmax = req.index[1];
  const ODmax = req.maxOuterDiameter ?? Infinity;
  const IDmin = req.minInnerDiameter ?? 0;
  const L0max = req.maxFreeLength ?? Infinity;
  const Lsmax = req.maxSolidLength ?? Infinity;
  const xi = req.clashAllowance;
  const nfTarget = req.safety.fatigue;
  const invCmin = 1 / Cmin;
  const invCmax = 1 / Cmax;
  const invODmax = 1 / ODmax;
  const invIDmin = 1 / IDmin;
  const invL0max = 1 / L0max;
  const invLsmax = 1 / Lsmax;
  const invLmin = 1 / Lmin;
  const invF2req = 1 / F2req;
  const invNfTarget = 1 / nfTarget;
  const sInvLimit = Float64Array.from(sLimit, (v) => 1 / v);
  const temperature = req.temperature ?? -Infinity;
  const rankObjective = Objective[req.rank];
  const criterion = req.criterion;
  const directShear = req.directShear;
  // min_yield: the estimated yield of the made springs, worked out only for a candidate that passes
  // every other check (the estimate costs some fifty check evaluations).
  const yieldOf = req.minYield !== undefined ? inSearchYield(req, stock, ends, tolerances ?? loadToleranceCatalog()) : null;
  const minYield = req.minYield ?? 1;
  const YIELD = Check.yield;

  const NaFewest = req.activeCoils[0];
  const NaMost = req.activeCoils[1];
  const dMin = sd.length ? Math.min(...sd) : 1;
  const dMax = sd.length ? Math.max(...sd) : 1;

  // A whole wire size (ends eFrom..eTo, coil counts NaLo..NaHi) before any coil count is tried. Only
  // the mean diameters that the index, bore and rod allow need be considered (every other point fails
  // one of those); over them and those coil counts, the rate lies between its values at (Dhi, NaHi)
  // and (Dlo, NaLo), and each check below is bounded from those.
  // With `rateWindow` (the run bounds of rangeLowerBound), the diameters are narrowed further by the
  // window of rates the load band and the free-length limit leave (rateWindowOf): the grid's own hints
  // leave that out, so that what they cut, and the counts that say so, stay as they were.
  function branchCut(i: number, eFrom: number, eTo: number, NaLo: number, NaHi: number, rateWindow = false): number {
    const d = sd[i];
    if (activeMask[Check.temperature] === 1 && temperature > sTmax[i]) return Check.temperature;
    let Dlo = Cmin * d;
    let Dhi = Cmax * d;
    if (activeMask[Check.outer_diameter] === 1) Dhi = Math.min(Dhi, ODmax - d);
    if (activeMask[Check.inner_diameter] === 1) Dlo = Math.max(Dlo, IDmin + d);
    if (rateWindow) {
      rateWindowOf(i, NaLo, NaHi, runD);
      if (runD[0] > Dlo) Dlo = runD[0];
      if (runD[1] < Dhi) Dhi = runD[1];
      if (Dlo > Dhi * (1 + 1e-12)) return runD[0] > Cmin * d ? Check.operating_force_max : Check.free_length;
    }
    if (Dlo > Dhi * (1 + 1e-12))
      return ODmax - d < Cmin * d || activeMask[Check.inner_diameter] === 0
        ? Check.outer_diameter
        : IDmin + d > Cmax * d
          ? Check.inner_diameter
          : Check.outer_diameter;
    const kMax = springRate(sG[i], d, Dlo, NaLo, directShear);
    const kMin = springRate(sG[i], d, Dhi, NaHi, directShear);
    let LsMin = Infinity;
    for (let e = eFrom; e <= eTo; e++) LsMin = Math.min(LsMin, solidLength(d, NaLo + endQ[e], ends[e]));
    const L0min = L1 + F1 / kMax;
    if (activeMask[Check.free_length] === 1 && L0min > L0max) return Check.free_length;
    if (activeMask[Check.solid_length] === 1 && LsMin > Lsmax) return Check.solid_length;
    if (LsMin + xi * (L0min - Lmin) > Lmin) return Check.clash;
    const F2lo = F1 + kMin * travel;
    const F2hi = F1 + kMax * travel;
    if (activeMask[Check.operating_force_min] === 1) {
      if (F2hi < F2req * (1 - tol)) return Check.operating_force_min;
      if (F2lo > F2req * (1 + tol)) return Check.operating_force_max;
    }
    // A feasible point carries at least the lower end of the operating band.
    const F2least = activeMask[Check.operating_force_min] === 1 ? Math.max(F2lo, F2req * (1 - tol)) : F2lo;
    const Kmin = stressFactor(Dhi / d, correction);
    const limit = sLimit[i];
    // The least stress, as bracketBounds bounds it over [Dlo, Dhi] at the softest coil count.
    const d2 = d * d;
    const KDleast = Dlo >= 1.9 * d ? stressFactor(Dlo / d, correction) * Dlo : Kmin * Dlo;
    const q = (travel * sG[i] * d2 * d2) / (8 * NaHi * (directShear ? 1 + d2 / (2 * Dlo * Dlo) : 1));
    const tauLeast = (8 / (Math.PI * d2 * d)) * Math.max(KDleast * F2least, Kmin * leastLoadArm(Dlo, Dhi, F1, travel >= 0 ? q : 0)) * BOUND_EASE;
    if (tauLeast * staticFactor > limit) return Check.static_stress;
    if (activeMask[Check.fatigue] === 1 && F2least > F1) {
      const tauMin = shearStress(F1, Dlo, d, Kmin);
      const tauMax = shearStress(F2least, Dlo, d, Kmin);
      const nf = fatigueSafetyFactorFrom(0.5 * shearStress(F2least - F1, Dlo, d, Kmin), 0.5 * (tauMax + tauMin), sPoint[i], sSsu[i], sSse[i], criterion);
      if (nf < nfTarget) return Check.fatigue;
    }
    if (surgeNeed > 0 && surgeFrequency(kMax, activeCoilMass(d, Dlo, NaLo, sRho[i]), oneEndFree) < surgeNeed) return Check.surge;
    return -1;
  }

  // The rates a feasible spring may have: at most kStiffest (the top of the load band), at least
  // kSoftest (the bottom of the band, and the free-length limit: L1 + F1 / k <= L0max).
  const kStiffest = activeMask[Check.operating_force_min] === 1 && travel > 0 ? (F2req * (1 + tol) - F1) / travel : Infinity;
  const kSoftest = Math.max(
    activeMask[Check.operating_force_min] === 1 && travel > 0 ? (F2req * (1 - tol) - F1) / travel : 0,
    activeMask[Check.free_length] === 1 ? (L0max > L1 ? F1 / (L0max - L1) : Infinity) : 0,
  );
  // The direct-shear term softens a spring by at most its factor at the smallest index.
  const softening = directShear ? directShearFactor(Cmin) : 1;
  const runD = new Float64Array(2);
  /** The mean diameters [out[0], out[1]] that the rate window leaves for wire i and coil counts
   * NaLo..NaHi: G d^4 / (8 D^3 Na s) <= kStiffest with s at most `softening` and Na at most NaHi
   * bounds D from below; G d^4 / (8 D^3 Na) >= kSoftest with Na at least NaLo bounds it from above
   * (each eased by a part in 1e12 outwards). */
  function rateWindowOf(i: number, NaLo: number, NaHi: number, out: Float64Array): void {
    const d = sd[i];
    const d4G = d * d * d * d * sG[i];
    out[0] = kStiffest <= 0 ? Infinity : kStiffest < Infinity ? Math.cbrt(d4G / (8 * NaHi * softening * kStiffest)) * BOUND_EASE : 0;
    out[1] = kSoftest === Infinity ? -Infinity : kSoftest > 0 ? Math.cbrt(d4G / (8 * NaLo * kSoftest)) / BOUND_EASE : Infinity;
  }
  const rankKey = req.rank;

  const problem: SpringProblem = {
    name: 'helical compression spring',
    req,
    stock,
    ends,
    active,
    variables: [
      { kind: 'list', name: 'stock', values: stock.map((_, i) => i) },
      { kind: 'list', name: 'ends', values: ends.map((_, i) => i) },
      { kind: 'range', name: 'active_coils', min: req.activeCoils[0], max: req.activeCoils[1], step: req.coilStep },
      { kind: 'continuous', name: 'mean_diameter', min: Cmin * dMin, max: Cmax * dMax, resolution: req.diameterResolution, solve: true },
    ],
    // Mass, volume, outer diameter and free length at the smallest allowed diameter grow with the coil count.
    boundGrowsAlong: req.rank === 'safety_factor' ? undefined : 2,
    constraintNames: CHECKS,
    objectiveNames: OBJECTIVE_SLOTS,
    // Trends in the mean diameter, from the checks registry.
    constraintTrend: Int8Array.from(COMPRESSION_CHECKS.map((c) => c.trend(req))),
    // The ranked objective's trend comes from the registry; the others are only carried along.
    objectiveTrend: Int8Array.from(OBJECTIVE_SLOTS.map((_, i) => (i === 0 ? objectiveByKey(req.rank).trend : TREND.unknown))),

    // The ranked quantity grows with the mean diameter; past the diameter where it reaches `bound`, no
    // spring of the cell can be ranked above a spring already kept. Mass, volume and outer diameter
    // are linear in D; the free length L1 + F1 / k grows at least as fast as with the plain rate
    // (the direct-shear term only softens the spring), whose cube root bounds D from above.
    objectiveCeiling(x, bound) {
      const i = x[0];
      const d = sd[i];
      const Nt = x[2] + endQ[x[1]];
      switch (req.rank) {
        case 'mass':
          return bound / massOfVolume(wireVolume(d, 1, Nt), sRho[i]);
        case 'wire_volume':
          return bound / wireVolume(d, 1, Nt);
        case 'outer_diameter':
          return bound - d;
        case 'free_length':
          return bound > L1 ? Math.cbrt(((bound - L1) * sG[i] * d * d * d * d) / (8 * F1 * x[2])) : -Infinity;
        default:
          return Infinity;
      }
    },

    // The index bounds clip the diameter interval directly. The bore and rod limits are left to the
    // bisection so that the points just past them are evaluated: they tell what relaxing them would buy.
    solvedBounds(x, out) {
      const d = sd[x[0]];
      out[0] = Math.max(out[0], Cmin * d);
      out[1] = Math.min(out[1], Cmax * d);
    },

    // A whole wire size (depth 1), or a wire size with one end type (depth 2), before any coil count
    // is tried: branchCut over every coil count.
    branchInfeasible(x, depth) {
      return depth >= 2 ? branchCut(x[0], x[1], x[1], NaFewest, NaMost) : branchCut(x[0], 0, ends.length - 1, NaFewest, NaMost);
    },

    // The coil counts from..to of one wire size and end type: the same bounds between their rates.
    rangeInfeasible(x, variable, from, to) {
      return variable === 2 ? branchCut(x[0], x[1], x[1], NaFewest + from * req.coilStep, NaFewest + to * req.coilStep) : -1;
    },

    // The least of the ranked quantity over coil counts from..to of one wire size and end type: every
    // one the registry ranks on (but the safety factors) grows with the mean diameter and the coil
    // count, so its value at the smallest diameter the index, rod and rate window allow and the
    // fewest coils bounds it; Infinity when the run's bounds leave no feasible point (branchCut with
    // the rate window).
    rangeLowerBound(x, variable, from, to) {
      if (variable !== 2) return -Infinity;
      const i = x[0];
      const e = x[1];
      const NaLo = NaFewest + from * req.coilStep;
      const NaHi = NaFewest + to * req.coilStep;
      if (branchCut(i, e, e, NaLo, NaHi, true) >= 0) return Infinity;
      const d = sd[i];
      let D = Cmin * d;
      if (activeMask[Check.inner_diameter] === 1) D = Math.max(D, IDmin + d);
      D = Math.max(D, runD[0]);
      const volume = wireVolume(d, D, NaLo + endQ[e]) * BOUND_EASE;
      switch (rankKey) {
        case 'mass':
          return massOfVolume(volume, sRho[i]);
        case 'wire_volume':
          return volume;
        case 'outer_diameter':
          return (D + d) * BOUND_EASE;
        case 'free_length': {
          // L1 + F1 / k with k at most its value at the smallest diameter and fewest coils, and at most kStiffest.
          const k = Math.min(springRate(sG[i], d, D, NaLo, false), kStiffest);
          return (L1 + F1 / k) * BOUND_EASE;
        }
        default:
          return -Infinity;
      }
    },

    // Over a bracket [lo, hi] of mean diameters the rate is at least k(hi), so every force is at least
    // its value there. A stress is 8 K D F / (pi d^3) with F = F1 + k y. Two lower bounds, the larger
    // kept: (1) its part under the constant force, K D F1, grows with D (K C rises with C above 1.9,
    // for both corrections), so it is least at lo; its part under a deflection y, K D k y, falls as D
    // grows (k D falls as 1 / D^2), so it is least at hi; each part at its own least bounds the sum
    // (below C = 1.9, K(hi) lo stands in for the first part's least). (2) K is least at hi, and
    // D F1 + D k y is at least D F1 + Q / D^2 (Q = y G d^4 / (8 Na), less the direct-shear softening
    // at its largest, at lo), whose least over the bracket is at D = (2 Q / F1)^(1/3) or the nearer end.
    // The first is tight on a narrow bracket, the second on a wide one. One bound can rule out a whole
    // bracket without scanning it.
    bracketBounds(x, lo, hi, out) {
      const i = x[0];
      const e = x[1];
      const Na = x[2];
      const d = sd[i];
      const kMin = springRate(sG[i], d, hi, Na, directShear);
      const Khi = stressFactor(hi / d, correction);
      const toStress = 8 / (Math.PI * d * d * d);
      // Least of K D over the bracket, and least of K D k per unit deflection.
      const KDleast = lo >= 1.9 * d ? stressFactor(lo / d, correction) * lo : Khi * lo;
      const KDkLeast = Khi * hi * kMin;
      // Eased by a part in 1e12: computed another way than evaluate() computes the check, the bound must
      // not pass the check's own value by a rounding at a bracket's end.
      const tauF1 = toStress * KDleast * F1 * BOUND_EASE;
      const tauPerDeflection = toStress * KDkLeast * BOUND_EASE;
      const d2 = d * d;
      const qPerDeflection = (sG[i] * d2 * d2) / (8 * Na * (directShear ? 1 + d2 / (2 * lo * lo) : 1));
      const KhiEased = toStress * Khi * BOUND_EASE;
      const limit = sLimit[i];
      const invLimit = sInvLimit[i];
      if (travel >= 0) {
        const least = Math.max(tauF1 + tauPerDeflection * travel, KhiEased * leastLoadArm(lo, hi, F1, qPerDeflection * travel));
        out[Check.static_stress] = (least * staticFactor - limit) * invLimit;
      }
      if (activeMask[Check.solid_stress] === 1) {
        // The solid force F1 + k (L1 - Ls) is least at the softest rate. (With L1 < Ls the coils would
        // be solid before the working length: no bound is offered, the clash check rules that out.)
        const room = L1 - solidLength(d, Na + endQ[e], ends[e]);
        if (room >= 0)
          out[Check.solid_stress] = (Math.max(tauF1 + tauPerDeflection * room, KhiEased * leastLoadArm(lo, hi, F1, qPerDeflection * room)) - limit) * invLimit;
      }
      if (activeMask[Check.fatigue] === 1 && travel > 0) {
        // Every criterion's safety factor falls as the alternating or the mean stress rises (the load
        // point moves outwards from the origin), so the least stresses over the bracket give the
        // largest safety factor it can reach.
        // The mean stress is the stress under F1 + k travel / 2.
        const alt = 0.5 * tauPerDeflection * travel;
        const mean = Math.max(tauF1 + alt, KhiEased * leastLoadArm(lo, hi, F1, qPerDeflection * 0.5 * travel));
        const nf = fatigueSafetyFactorFrom(alt, mean, sPoint[i], sSsu[i], sSse[i], criterion);
        if (nf === nf) out[Check.fatigue] = (nfTarget - nf) * invNfTarget;
      }
      if (activeMask[Check.buckling] === 1) {
        // The free length grows with D; the critical share of it, C1 (1 - sqrt(1 - C2 / lambda^2)),
        // grows as the slenderness lambda = alpha L0 / D falls, and L0 / (L0 - Lmin) falls as L0
        // grows: take the least slenderness and the shortest free length of the bracket.
        const L0lo = L1 + F1 / springRate(sG[i], d, lo, Na, directShear);
        const lambda = (alpha * L0lo) / hi;
        const q = sC2[i] / (lambda * lambda);
        if (q < 1) out[Check.buckling] = 1 - (sC1[i] * (1 - Math.sqrt(1 - q)) * L0lo) / (L0lo - Lmin);
      }
    },

    evaluate(x, g, f) {
      const i = x[0];
      const e = x[1];
      const Na = x[2];
      const D = x[3];
      const d = sd[i];
      const endType = ends[e];
      const C = D / d;
      const K = stressFactor(C, correction);
      const k = springRate(sG[i], d, D, Na, directShear);
      const L0 = L1 + F1 / k;
      const Nt = Na + endQ[e];
      const Ls = solidLength(d, Nt, endType);
      const F2 = F1 + k * travel;
      const limit = sLimit[i];
      const tauMax = shearStress(F2, D, d, K);

      // Checks that do not apply stay at -1 and cost nothing.
      // Normalised by the limit; reciprocals are held outside the loop (a multiply is cheaper).
      g[Check.index_min] = (Cmin - C) * invCmin;
      g[Check.index_max] = (C - Cmax) * invCmax;
      g[Check.outer_diameter] = activeMask[Check.outer_diameter] === 1 ? (D + d - ODmax) * invODmax : -1;
      g[Check.inner_diameter] = activeMask[Check.inner_diameter] === 1 ? (IDmin - (D - d)) * invIDmin : -1;
      g[Check.free_length] = activeMask[Check.free_length] === 1 ? (L0 - L0max) * invL0max : -1;
      g[Check.solid_length] = activeMask[Check.solid_length] === 1 ? (Ls - Lsmax) * invLsmax : -1;
      g[Check.clash] = (Ls + xi * (L0 - Lmin) - Lmin) * invLmin;
      if (activeMask[Check.coil_gaps] === 1) {
        const minGap = minimumGapSum(D, d, Na);
        g[Check.coil_gaps] = (minGap - (Lmin - Ls)) / minGap;
      } else g[Check.coil_gaps] = -1;
      g[Check.outer_diameter_at_solid] =
        activeMask[Check.outer_diameter_at_solid] === 1 ? (solidOuterDiameter(D, d, pitch(L0, Na, d, endType)) - ODmax) * invODmax : -1;
      const staticSafety = limit / tauMax;
      const invLimit = sInvLimit[i];
      g[Check.static_stress] = (tauMax * staticFactor - limit) * invLimit;
      g[Check.solid_stress] = activeMask[Check.solid_stress] === 1 ? (shearStress(k * (L0 - Ls), D, d, K) - limit) * invLimit : -1;
      let fatigueSafety = NaN;
      if (activeMask[Check.fatigue] === 1) {
        const tauMin = shearStress(F1, D, d, K);
        const alt = 0.5 * (tauMax - tauMin);
        const mean = 0.5 * (tauMax + tauMin);
        fatigueSafety = fatigueSafetyFactorFrom(alt, mean, sPoint[i], sSsu[i], sSse[i], criterion);
        g[Check.fatigue] = (nfTarget - fatigueSafety) * invNfTarget;
      } else g[Check.fatigue] = -1;
      if (activeMask[Check.buckling] === 1) {
        const ymax = L0 - Lmin;
        const ycr = criticalDeflectionFrom(L0, D, sC1[i], sC2[i], alpha);
        g[Check.buckling] = ycr === ycr ? (ymax - ycr) / ymax : -1;
      } else g[Check.buckling] = -1;
      g[Check.surge] = surgeNeed > 0 ? (surgeNeed - surgeFrequency(k, activeCoilMass(d, D, Na, sRho[i]), oneEndFree)) / surgeNeed : -1;
      if (activeMask[Check.operating_force_min] === 1) {
        g[Check.operating_force_min] = (F2req * (1 - tol) - F2) * invF2req;
        g[Check.operating_force_max] = (F2 - F2req * (1 + tol)) * invF2req;
      } else {
        g[Check.operating_force_min] = -1;
        g[Check.operating_force_max] = -1;
      }
      g[Check.temperature] = activeMask[Check.temperature] === 1 ? (temperature - sTmax[i]) / Math.max(Math.abs(sTmax[i]), 1) : -1;
      g[YIELD] = -1;
      if (yieldOf !== null) {
        let nominalPasses = true;
        for (let j = 0; j < YIELD; j++)
          if (!(g[j] <= 0)) {
            nominalPasses = false;
            break;
          }
        // A nominal failure is the verdict already: the yield is left unjudged (-1) there.
        if (nominalPasses) {
          const y = yieldOf.estimate(i, e, D, Na);
          g[YIELD] = y === y ? (minYield - y) / minYield : 1;
        }
      }

      const volume = wireVolume(d, D, Nt);
      const mass = massOfVolume(volume, sRho[i]);
      f[Objective.mass] = mass;
      f[Objective.wire_volume] = volume;
      f[Objective.outer_diameter] = D + d;
      f[Objective.free_length] = L0;
      const sf = fatigueSafety === fatigueSafety && fatigueSafety < staticSafety ? fatigueSafety : staticSafety;
      f[Objective.safety_factor] = -sf;
      f[Objective.static_safety] = -staticSafety;
      f[Objective.fatigue_safety] = fatigueSafety === fatigueSafety ? -fatigueSafety : 0;
      f[Objective.relative_cost] = mass * sCost[i];
      f[Objective.rank] = f[rankObjective];
    },

    decode(x) {
      const item = stock[x[0]];
      return {
        item,
        geometry: {
          wireDiameter: item.wireDiameter,
          meanDiameter: x[3],
          activeCoils: x[2],
          ends: ends[x[1]],
          freeLength: L1 + F1 / springRate(item.figures.shearModulus, item.wireDiameter, x[3], x[2], directShear),
        },
      };
    },
    service: () => springServiceConditions(req),
  };
  return problem;
}
