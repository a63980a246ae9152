// Extension-spring design as one instance of the general search problem. Variables: stock (a material
// and one of its wire sizes), body coils (stepped), mean diameter (continuous, solved per cell). For
// each point the free length and rate are fixed by the geometry, and the initial tension is what meets
// the working force exactly: Fi = F1 - k (L1 - L0). Everything per stock item is computed once into
// typed arrays; evaluate() allocates nothing.
import { inStrengthRange } from '../../catalogs/properties.js';
import type { Catalog } from '../../catalogs/types.js';
import { INFINITE_LIFE_CYCLES, endurancePoint, fullyReversedEndurance } from '../../model/fatigue.js';
import { springRate } from '../../model/rate.js';
import { shearStress } from '../../model/stress.js';
import { stressFactor } from '../../model/stressFactor.js';
import { ultimateShearStrength } from '../../model/strength.js';
import { activeCoilMass, surgeFrequency } from '../../model/surge.js';
import type { MaterialChoice } from '../../input/material.js';
import { TREND, valueCount, type Problem } from '../../search/problem.js';
import type { ExtensionGeometry, ExtensionService } from './analysis.js';
import { loadExtensionCatalog, type ExtensionCatalog } from './catalog.js';
import { EXTENSION_CHECKS, XC, activeExtensionChecks, extensionFatigueApplies, extensionService } from './checks.js';
import { loopLifeCurve, offsetAlternatingStrength } from './fatigue.js';
import { extensionMass, loopHeight, loopWireLength, wireVolumeOfLength } from './geometry.js';
import { initialTensionHalfWidth, initialTensionMiddle } from './initialTension.js';
import { loopBendingFactor, loopBendingStress, loopTorsionFactor } from './loops.js';
import { extensionMaterial, type ExtensionMaterial } from './material.js';
import type { ExtensionRequirements } from './requirements.js';

export const EXTENSION_OBJECTIVES = ['rank', 'mass', 'wire_volume', 'outer_diameter', 'free_length', 'neg_safety_factor', 'relative_cost'] as const;
export const XO = Object.fromEntries(EXTENSION_OBJECTIVES.map((o, i) => [o, i])) as Record<(typeof EXTENSION_OBJECTIVES)[number], number>;

export interface ExtensionStock {
  choice: MaterialChoice;
  wireDiameter: number;
  material: ExtensionMaterial;
}

export interface ExtensionProblem extends Problem {
  readonly req: ExtensionRequirements;
  readonly stock: ExtensionStock[];
  readonly active: boolean[];
  /** The spring a point stands for, as the single-spring analysis takes it. */
  decode(x: ArrayLike<number>): { item: ExtensionStock; geometry: ExtensionGeometry };
  service(): ExtensionService;
}

/** The combinations the grid visits: stock items (material and wire size) x body-coil counts. */
export function combinations(p: ExtensionProblem): number {
  return p.variables.reduce((n, v) => (v.kind === 'continuous' ? n : n * valueCount(v)), 1);
}

export function buildExtensionProblem(
  req: ExtensionRequirements,
  catalog: Catalog,
  ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials),
): ExtensionProblem {
  const stock: ExtensionStock[] = [];
  for (const choice of req.materials) {
    for (const d of req.wireSizes(choice)) {
      if (choice.tensileStrength === undefined && !inStrengthRange(choice.material, d)) continue;
      if (req.maxOuterDiameter !== undefined && d * (req.index[0] + 1) > req.maxOuterDiameter) continue;
      stock.push({ choice, wireDiameter: d, material: extensionMaterial(choice, d, ext) });
    }
  }
  const n = stock.length;
  const arr = () => new Float64Array(n);
  const sd = arr();
  const sG = arr();
  const sGE = arr();
  const sRho = arr();
  const sCost = arr();
  const sTmax = arr();
  const sAllowBody = arr();
  const sAllowA = arr();
  const sAllowB = arr();
  const sSut = arr();
  const sSsu = arr();
  const sBodySse = arr();
  const sBodySines = arr();
  // Loops: their points on their own life curves (bending at A against Sut, torsion at B against Ssu).
  const sASse = arr();
  const sASines = arr();
  const sBSse = arr();
  const sBSines = arr();
  const cycles = req.cycles ?? INFINITE_LIFE_CYCLES;
  const criterion = req.criterion;
  stock.forEach((s, i) => {
    const f = s.material.figures;
    sd[i] = s.wireDiameter;
    sG[i] = f.shearModulus;
    sGE[i] = f.shearModulus / f.elasticModulus;
    sRho[i] = f.density;
    sCost[i] = s.choice.material.relativeCost.value;
    sTmax[i] = f.maxTemperature;
    sAllowBody[i] = s.material.allowables.bodyTorsion;
    sAllowA[i] = s.material.allowables.loopBending;
    sAllowB[i] = s.material.allowables.loopTorsion;
    sSut[i] = f.tensileStrength;
    sSsu[i] = ultimateShearStrength(f.tensileStrength);
    const body = endurancePoint(cycles, req.peened, f.zimmerli, f.finiteLife, f.tensileStrength, criterion).point;
    sBodySse[i] = fullyReversedEndurance(body, sSsu[i], criterion);
    sBodySines[i] = body.alternating;
    const a = loopLifeCurve(cycles, f.zimmerli, s.material.loopFatigue.loopBending, sSut[i], true, criterion).point;
    const b = loopLifeCurve(cycles, f.zimmerli, s.material.loopFatigue.loopTorsion, sSut[i], false, criterion).point;
    sASse[i] = fullyReversedEndurance(a, sSut[i], criterion);
    sASines[i] = a.alternating;
    sBSse[i] = fullyReversedEndurance(b, sSsu[i], criterion);
    sBSines[i] = b.alternating;
  });

  const active = activeExtensionChecks(req);
  const on = Uint8Array.from(active.map((a) => (a ? 1 : 0)));
  const rule = req.loop;
  const explicitLoop = req.loopLength;
  const F1 = req.workingForce;
  const L1 = req.workingLength;
  const L2 = req.operatingLength ?? L1;
  const travel = L2 - L1;
  const noStroke = req.operatingLength === undefined;
  const F2req = req.operatingForce ?? 0;
  const invF2req = 1 / F2req;
  const tol = req.loadTolerance;
  const Lx = req.maxExtendedLength ?? L2;
  const Cmin = req.index[0];
  const Cmax = req.index[1];
  const ODmax = req.maxOuterDiameter ?? Infinity;
  const L0max = req.maxFreeLength ?? Infinity;
  const preferred = req.initialTensionRange === 'preferred';
  const KB = loopTorsionFactor(req.bendIndex);
  const sf = req.safety.static;
  const nfTarget = req.safety.fatigue;
  const fatigueOn = extensionFatigueApplies(req);
  const surgeNeed = req.forcingFrequency ? req.safety.surge * req.forcingFrequency : 0;
  const temperature = req.temperature ?? -Infinity;
  const correction = req.correction;
  const rankObjective = XO[req.rank === 'safety_factor' ? 'neg_safety_factor' : req.rank];

  /** Fatigue safety on the load line from the initial stress: per-newton stress c, forces Fi <= Fmin <= Fmax. */
  const nfAt = (c: number, Fi: number, Fmin: number, Fmax: number, sse: number, sines: number, ult: number): number => {
    const alt = 0.5 * c * (Fmax - Fmin);
    if (!(alt > 0)) return NaN;
    const si = c * Fi;
    const rise = 0.5 * c * (Fmax + Fmin) - si;
    return offsetAlternatingStrength(rise > 0 ? alt / rise : Infinity, si, sse, sines, ult, criterion) / alt;
  };

  const inc = TREND.increasing;
  const dec = TREND.decreasing;
  const unk = TREND.unknown;
  // Trends in the mean diameter D with the wire and coil count fixed. The rate falls as D^-3 and the free
  // length grows with the loops, so the operating force falls; the stresses mix a longer lever with that
  // softer rate and are monotone only when the force is fixed (no stroke). The initial tension
  // (F1 - k (L1 - L0)) and its band move both ways: those are scanned.
  const trends: Record<(typeof EXTENSION_CHECKS)[number], number> = {
    index_min: dec,
    index_max: inc,
    outer_diameter: inc,
    free_length: inc,
    working_extension: inc,
    initial_tension_min: unk,
    initial_tension_max: unk,
    // (K)_A C = (4C^2 - C - 1) / (4 (C - 1)) grows for C above 1.71, which the index bound ensures.
    body_stress: noStroke ? inc : unk,
    loop_bending_stress: noStroke ? inc : unk,
    loop_torsion_stress: noStroke ? inc : unk,
    body_fatigue: unk,
    loop_bending_fatigue: unk,
    loop_torsion_fatigue: unk,
    operating_force_min: inc,
    operating_force_max: dec,
    extended_stress: unk,
    surge: inc,
    temperature: inc,
  };
  // Mass grows with D when a loop's wire (wire_coils pi D) grows faster than its reach shrinks.
  const massInc = rule.wireCoils * Math.PI >= rule.innerHeight;
  const objectiveInc = req.rank === 'safety_factor' ? false : req.rank === 'mass' || req.rank === 'wire_volume' ? massInc : true;
  const bodyCoilsMost = req.bodyCoils[0] + Math.floor((req.bodyCoils[1] - req.bodyCoils[0]) / req.coilStep + 1e-9) * req.coilStep;
  const dMin = n ? Math.min(...sd) : 1;
  const dMax = n ? Math.max(...sd) : 1;

  const problem: ExtensionProblem = {
    name: 'helical extension spring',
    req,
    stock,
    active,
    variables: [
      { kind: 'list', name: 'stock', values: stock.map((_, i) => i) },
      { kind: 'range', name: 'body_coils', min: req.bodyCoils[0], max: req.bodyCoils[1], step: req.coilStep },
      { kind: 'continuous', name: 'mean_diameter', min: Cmin * dMin, max: Cmax * dMax, resolution: req.diameterResolution, solve: true },
    ],
    // Mass, volume, outer diameter and free length at the smallest allowed diameter never fall as coils are added.
    boundGrowsAlong: objectiveInc ? 1 : undefined,
    constraintNames: EXTENSION_CHECKS,
    objectiveNames: EXTENSION_OBJECTIVES,
    constraintTrend: Int8Array.from(EXTENSION_CHECKS.map((c) => trends[c])),
    objectiveTrend: Int8Array.from(EXTENSION_OBJECTIVES.map((_, i) => (i === 0 && objectiveInc ? inc : unk))),

    solvedBounds(x, out) {
      const d = sd[x[0]];
      out[0] = Math.max(out[0], Cmin * d);
      out[1] = Math.min(out[1], Cmax * d);
    },

    // Over a bracket [lo, hi] of mean diameters the rate is at least k(hi), so every force past the working
    // length is at least its value there, the lever at least lo, and the curvature factors at least their
    // values at hi (both fall with the index): the stresses cannot fall below that.
    bracketBounds(x, lo, hi, out) {
      const i = x[0];
      const d = sd[i];
      const kMin = springRate(sG[i], d, hi, x[1] + sGE[i]);
      const K = stressFactor(hi / d, correction);
      const KA = loopBendingFactor(hi / d);
      const F = F1 + kMin * travel;
      out[XC.body_stress] = (shearStress(F, lo, d, K) * sf - sAllowBody[i]) / sAllowBody[i];
      out[XC.loop_bending_stress] = (loopBendingStress(F, lo, d, KA) * sf - sAllowA[i]) / sAllowA[i];
      out[XC.loop_torsion_stress] = (shearStress(F, lo, d, KB) * sf - sAllowB[i]) / sAllowB[i];
      if (on[XC.extended_stress] === 1) {
        const Fx = F1 + kMin * (Lx - L1);
        out[XC.extended_stress] =
          Math.max(shearStress(Fx, lo, d, K) / sAllowBody[i], loopBendingStress(Fx, lo, d, KA) / sAllowA[i], shearStress(Fx, lo, d, KB) / sAllowB[i]) - 1;
      }
    },

    // A whole wire size (depth 1) or one coil count of it (depth 2) ruled out at once: over the branch the
    // diameter runs from Cmin d to the smaller of Cmax d and the bore, the rate from its softest (widest
    // coil, most coils) to its stiffest, and every bound below holds for every point of that range.
    branchInfeasible(x, depth) {
      const i = x[0];
      const d = sd[i];
      if (on[XC.temperature] === 1 && temperature > sTmax[i]) return XC.temperature;
      const Dlo = Cmin * d;
      const Dhi = Math.min(Cmax * d, ODmax - d);
      if (Dlo > Dhi) return XC.outer_diameter;
      const NbFewest = depth >= 2 ? x[1] : req.bodyCoils[0];
      const NbMost = depth >= 2 ? x[1] : bodyCoilsMost;
      // The free length grows with the coil count and (through the loops) with the diameter.
      const L0least = (NbFewest + 1) * d + 2 * loopHeight(rule, d, Dlo, explicitLoop);
      if (on[XC.free_length] === 1 && L0least > L0max) return XC.free_length;
      if (L0least > L1) return XC.working_extension;
      const kMax = springRate(sG[i], d, Dlo, NbFewest + sGE[i]);
      const kMin = springRate(sG[i], d, Dhi, NbMost + sGE[i]);
      if (on[XC.operating_force_min] === 1) {
        if (F1 + kMax * travel < F2req * (1 - tol)) return XC.operating_force_min;
        if (F1 + kMin * travel > F2req * (1 + tol)) return XC.operating_force_max;
      }
      // A point that meets the operating band carries at least its lower end; the lever is at least Dlo and
      // the curvature factors at least their values at Dhi.
      const Fleast = on[XC.operating_force_min] === 1 ? Math.max(F1 + kMin * travel, F2req * (1 - tol)) : F1 + kMin * travel;
      // The worst of the three is named: usually a loop, which is what the advice should point at.
      const rBody = (shearStress(Fleast, Dlo, d, stressFactor(Dhi / d, correction)) * sf) / sAllowBody[i];
      const rA = (loopBendingStress(Fleast, Dlo, d, loopBendingFactor(Dhi / d)) * sf) / sAllowA[i];
      const rB = (shearStress(Fleast, Dlo, d, KB) * sf) / sAllowB[i];
      const worst = rA >= rB && rA >= rBody ? XC.loop_bending_stress : rB >= rBody ? XC.loop_torsion_stress : XC.body_stress;
      return Math.max(rBody, rA, rB) > 1 ? worst : -1;
    },

    evaluate(x, g, f) {
      const i = x[0];
      const Nb = x[1];
      const D = x[2];
      const d = sd[i];
      const C = D / d;
      const K = stressFactor(C, correction);
      const KA = loopBendingFactor(C);
      const k = springRate(sG[i], d, D, Nb + sGE[i]);
      const h = loopHeight(rule, d, D, explicitLoop);
      const L0 = (Nb + 1) * d + 2 * h;
      const Fi = F1 - k * (L1 - L0);
      const F2 = F1 + k * travel;
      const cBody = shearStress(1, D, d, K);
      const cA = loopBendingStress(1, D, d, KA);
      const cB = shearStress(1, D, d, KB);
      const tauI = cBody * Fi;
      const mid = initialTensionMiddle(C);
      const half = initialTensionHalfWidth(C);

      g[0] = (Cmin - C) / Cmin;
      g[1] = (C - Cmax) / Cmax;
      g[2] = on[2] === 1 ? (D + d - ODmax) / ODmax : -1;
      g[3] = on[3] === 1 ? (L0 - L0max) / L0max : -1;
      g[4] = (L0 - L1) / L1;
      g[5] = ((preferred ? mid - half : 0) - tauI) / mid;
      g[6] = (tauI - (mid + half)) / mid;
      const nBody = sAllowBody[i] / (cBody * F2);
      const nA = sAllowA[i] / (cA * F2);
      const nB = sAllowB[i] / (cB * F2);
      g[7] = (cBody * F2 * sf - sAllowBody[i]) / sAllowBody[i];
      g[8] = (cA * F2 * sf - sAllowA[i]) / sAllowA[i];
      g[9] = (cB * F2 * sf - sAllowB[i]) / sAllowB[i];
      let nMin = nBody < nA ? (nBody < nB ? nBody : nB) : nA < nB ? nA : nB;
      if (fatigueOn) {
        const fb = nfAt(cBody, Fi, F1, F2, sBodySse[i], sBodySines[i], sSsu[i]);
        const fa = nfAt(cA, Fi, F1, F2, sASse[i], sASines[i], sSut[i]);
        const ft = nfAt(cB, Fi, F1, F2, sBSse[i], sBSines[i], sSsu[i]);
        g[10] = fb === fb ? (nfTarget - fb) / nfTarget : -1;
        g[11] = fa === fa ? (nfTarget - fa) / nfTarget : -1;
        g[12] = ft === ft ? (nfTarget - ft) / nfTarget : -1;
        if (fb < nMin) nMin = fb;
        if (fa < nMin) nMin = fa;
        if (ft < nMin) nMin = ft;
      } else {
        g[10] = -1;
        g[11] = -1;
        g[12] = -1;
      }
      if (on[13] === 1) {
        g[13] = (F2req * (1 - tol) - F2) * invF2req;
        g[14] = (F2 - F2req * (1 + tol)) * invF2req;
      } else {
        g[13] = -1;
        g[14] = -1;
      }
      if (on[15] === 1) {
        const Fx = F1 + k * (Lx - L1);
        const rb = (cBody * Fx) / sAllowBody[i];
        const ra = (cA * Fx) / sAllowA[i];
        const rt = (cB * Fx) / sAllowB[i];
        g[15] = (rb > ra ? (rb > rt ? rb : rt) : ra > rt ? ra : rt) - 1;
      } else g[15] = -1;
      g[16] = surgeNeed > 0 ? (surgeNeed - surgeFrequency(k, activeCoilMass(d, D, Nb + sGE[i], sRho[i]), false)) / surgeNeed : -1;
      g[17] = on[17] === 1 ? (temperature - sTmax[i]) / Math.max(Math.abs(sTmax[i]), 1) : -1;

      const wire = Math.PI * D * Nb + 2 * loopWireLength(rule, d, D, h);
      const mass = extensionMass(d, wire, sRho[i]);
      f[1] = mass;
      f[2] = wireVolumeOfLength(d, wire);
      f[3] = D + d;
      f[4] = L0;
      f[5] = -nMin;
      f[6] = mass * sCost[i];
      f[0] = f[rankObjective];
    },

    decode(x) {
      const item = stock[x[0]];
      const d = item.wireDiameter;
      const D = x[2];
      const Nb = x[1];
      const f = item.material.figures;
      const h = loopHeight(rule, d, D, explicitLoop);
      const k = springRate(f.shearModulus, d, D, Nb + f.shearModulus / f.elasticModulus);
      const L0 = (Nb + 1) * d + 2 * h;
      return {
        item,
        geometry: {
          wireDiameter: d,
          meanDiameter: D,
          bodyCoils: Nb,
          loop: rule,
          loopHeight: h,
          loopRadius: D / 2,
          bendRadius: (req.bendIndex * d) / 2,
          initialTension: F1 - k * (L1 - L0),
        },
      };
    },
    service: () => extensionService(req),
  };
  return problem;
}
