// A lower bound on the lightest spring (or the smallest wire volume) from a linear programme in
// logarithmic variables u = ln d, v = ln D, w = ln Na, t = ln(Na + dead coils). Rate, stress, index,
// envelope (bore, rod, free length) and surge relations are monomials, hence linear in logs, once the
// terms that are not (the stress factor, 1 +- 1/C in the bore and rod limits, the dead coils) are
// replaced by their tangents in log space on the side that loosens the constraint (outer approximation
// of convex terms), and each strength law is taken per segment. Two checks are sums of two monomials
// (posynomials): the stress under the force at the shortest length, F1 + k y, and the clash with the
// free length L1 + F1 / k; the log of such a sum is convex in the log variables, and cut from outside
// by p a1 + (1 - p) a2 + H(p) <= ln(limit) for weights p (H the binary entropy). Every simplification
// loosens the constraints, so the LP optimum is a valid lower bound on every discrete spring the grid
// could find: the gap between the grid's best and this bound says how much any finer wire or coil
// choice could still gain.
import { strengthPiece, tensileStrength } from '../../catalogs/properties.js';
import type { Requirements } from './requirements.js';
import { inactiveCoils } from './geometry.js';
import { stressFactor } from '../../model/stressFactor.js';
import { directShearFactor } from '../../model/rate.js';
import { surgeConstant } from '../../model/surge.js';
import { minimiseLinear, type LinearRow } from '../../search/lp.js';
import { forceBand, shortestLength } from './verify.js';
import type { SpringProblem, StockItem } from './problem.js';

type V = 'u' | 'v' | 'w' | 't';

/** Points spread evenly in log space over [a, b], where tangents are taken. */
function logPoints(a: number, b: number, count = 8): number[] {
  if (!(b > a)) return [a];
  return Array.from({ length: count }, (_, i) => a * Math.pow(b / a, i / (count - 1)));
}

/** Weights of the two terms where a sum of two monomials is cut by p a1 + (1 - p) a2 + H(p) (see the
 * clash and stress rows). */
const ENTROPY_WEIGHTS = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
const binaryEntropy = (p: number) => -p * Math.log(p) - (1 - p) * Math.log(1 - p);

export interface LpBound {
  value: number | null;
  status: 'bound' | 'infeasible' | 'not-applicable';
  models: number;
}

/** Group stock items by material and strength segment: within a group, strength is one monomial in d. */
function groups(stock: StockItem[]): StockItem[][] {
  const out = new Map<string, StockItem[]>();
  for (const s of stock) {
    const piece = s.choice.tensileStrength !== undefined ? -1 : strengthPiece(s.choice.material, s.wireDiameter);
    const key = `${s.choice.material.id}#${piece}`;
    if (!out.has(key)) out.set(key, []);
    out.get(key)!.push(s);
  }
  return [...out.values()];
}

export interface LpOptions {
  /** The rows that couple the stress and the clash to the rate (default true). Off, the bound is the
   * looser one of before (for the benchmark's before and after). */
  couplings?: boolean;
}

export function lpLowerBound(problem: SpringProblem, options: LpOptions = {}): LpBound {
  const couplings = options.couplings ?? true;
  const req: Requirements = problem.req;
  if (req.rank !== 'mass' && req.rank !== 'wire_volume') return { value: null, status: 'not-applicable', models: 0 };
  // Dead coils: the least any allowed end type adds to Na in the mass (Q) and in the solid length (Qs).
  const Q = Math.min(...req.ends.map(inactiveCoils));
  const Qs = Math.min(...req.ends.map((e) => inactiveCoils(e) + (e === 'plain-ground' || e === 'squared-ground' ? 0 : 1)));
  const coilPoints = logPoints(req.activeCoils[0], req.activeCoils[1]);
  const indexPoints = logPoints(req.index[0], req.index[1]);
  const stressFactorOf = (c: number) => stressFactor(c, req.correction);
  let best = Infinity;
  let models = 0;
  for (const group of groups(problem.stock)) {
    const ds = group.map((s) => s.wireDiameter);
    const dLo = Math.min(...ds);
    const dHi = Math.max(...ds);
    const Gmax = Math.max(...group.map((s) => s.figures.shearModulus));
    const Gmin = Math.min(...group.map((s) => s.figures.shearModulus));
    const rhoMin = Math.min(...group.map((s) => s.figures.density));
    const rows: LinearRow<V>[] = [
      { coefficients: { u: 1 }, min: Math.log(dLo), max: Math.log(dHi) },
      { coefficients: { w: 1 }, min: Math.log(req.activeCoils[0]), max: Math.log(req.activeCoils[1]) },
      { coefficients: { v: 1, u: -1 }, min: Math.log(req.index[0]), max: Math.log(req.index[1]) },
    ];
    // t >= ln(Na + Q): ln(e^w + Q) is convex in w, so its tangents lie below it and t above them all.
    for (const n0 of coilPoints) {
      const slope = n0 / (n0 + Q);
      rows.push({ coefficients: { t: 1, w: -slope }, min: Math.log(n0 + Q) - slope * Math.log(n0) });
    }
    // Bore: D (1 + 1/C) <= ODmax; ln(1 + 1/C) is convex in ln C, its tangents are below it.
    if (req.maxOuterDiameter !== undefined) {
      for (const c0 of indexPoints) {
        const h = Math.log(1 + 1 / c0);
        const dh = -1 / (1 + c0);
        rows.push({ coefficients: { v: 1 + dh, u: -dh }, max: Math.log(req.maxOuterDiameter) - h + dh * Math.log(c0) });
      }
    }
    // Rod: D (1 - 1/C) >= IDmin; ln(1 - 1/C) is concave in ln C, its tangents are above it.
    if (req.minInnerDiameter !== undefined) {
      for (const c0 of indexPoints) {
        if (c0 <= 1) continue;
        const g = Math.log(1 - 1 / c0);
        const dg = 1 / (c0 - 1);
        rows.push({ coefficients: { v: 1 + dg, u: -dg }, min: Math.log(req.minInnerDiameter) - g + dg * Math.log(c0) });
      }
    }
    // Static stress at the largest force: K(C) 8 F D / (pi d^3) * n <= allowable(d). ln K is convex in
    // ln C for both stress factors over the index range, so each tangent is a lower bound on it.
    const Flow = req.operatingForce !== undefined ? req.operatingForce * (1 - forceBand(req)) : req.workingForce;
    const n = req.allowableStress !== undefined ? 1 : req.safety.static;
    const lever = Math.log((8 * Flow * n) / Math.PI);
    const s0 = group[0];
    const law = s0.choice.material.strength;
    // The group shares one strength piece (groups()), so its power-law segment is the one at dLo.
    const seg =
      req.allowableStress === undefined && law.law === 'power' && s0.choice.tensileStrength === undefined
        ? law.segments[strengthPiece(s0.choice.material, dLo)]
        : undefined;
    const fraction = s0.figures.allowableStress / s0.figures.tensileStrength;
    // Allowable as A' d^-m: exact for a power-law segment; otherwise bounded above by its largest value.
    const allowCoefficient =
      req.allowableStress ??
      (seg
        ? fraction * seg.coefficient
        : fraction * Math.max(...group.map((s) => s.choice.tensileStrength ?? tensileStrength(s.choice.material, s.wireDiameter))));
    const allowExponent = seg ? seg.exponent : 0;
    for (const c0 of indexPoints) {
      const k0 = Math.log(stressFactorOf(c0));
      const h = 1e-6 * c0;
      const slope = (Math.log(stressFactorOf(c0 + h)) - Math.log(stressFactorOf(c0 - h))) / (Math.log(c0 + h) - Math.log(c0 - h));
      // k0 + slope (v - u - ln c0) + lever + v - 3u <= ln A' - m u
      rows.push({ coefficients: { v: 1 + slope, u: -3 - slope + allowExponent }, max: Math.log(allowCoefficient) - lever - k0 + slope * Math.log(c0) });
    }
    // The same stress under the force the spring gives at the shortest length, F1 + k y (y the travel
    // from L1): K 8 D (F1 + k y) n / (pi d^3), with k at least Gmin d^4 / (8 D^3 Na s) (s the
    // direct-shear softening at its largest), is at least the sum of two monomials times K, which
    // couples the stress to the rate (the row above takes the least force of the band whatever the
    // rate). Its log is at least p a1 + (1 - p) a2 + H(p) + ln K for every weight p (LSE is convex, H
    // the binary entropy) and ln K at least its tangent: each row is implied by the true check.
    const shear = req.directShear ? directShearFactor(req.index[0]) : 1;
    const travel = req.workingLength - shortestLength(req);
    if (couplings && travel > 0) {
      const a1 = Math.log((8 * req.workingForce * n) / Math.PI);
      const a2 = Math.log((n * travel * Gmin) / (Math.PI * shear));
      for (const c0 of indexPoints) {
        const k0 = Math.log(stressFactorOf(c0));
        const h = 1e-6 * c0;
        const slope = (Math.log(stressFactorOf(c0 + h)) - Math.log(stressFactorOf(c0 - h))) / (Math.log(c0 + h) - Math.log(c0 - h));
        for (const p of ENTROPY_WEIGHTS) {
          rows.push({
            coefficients: { v: p - 2 * (1 - p) + slope, u: -3 * p + (1 - p) - slope + allowExponent, w: -(1 - p) },
            max: Math.log(allowCoefficient) - binaryEntropy(p) - p * a1 - (1 - p) * a2 - k0 + slope * Math.log(c0),
          });
        }
      }
    }
    // Rate: k = G d^4 / (8 D^3 Na), in [k_lo, k_hi] when the operating force is given; the free-length
    // limit asks k >= F1 / (L0max - L1).
    let kLo = 0;
    let kHi = Infinity;
    if (req.operatingForce !== undefined && req.operatingLength !== undefined) {
      const travel = req.workingLength - req.operatingLength;
      kLo = (req.operatingForce * (1 - forceBand(req)) - req.workingForce) / travel;
      kHi = (req.operatingForce * (1 + forceBand(req)) - req.workingForce) / travel;
      rows.push({ coefficients: { u: 4, v: -3, w: -1 }, max: Math.log((8 * kHi * shear) / Gmin) });
    }
    if (req.maxFreeLength !== undefined) kLo = Math.max(kLo, req.workingForce / (req.maxFreeLength - req.workingLength));
    if (kLo > 0) rows.push({ coefficients: { u: 4, v: -3, w: -1 }, min: Math.log((8 * kLo) / Gmax) });
    // Solid: d (Na + Qs) <= Ls, and the clash allowance asks Ls + xi (L0 - Lmin) <= Lmin, where the free
    // length L0 = L1 + F1 / k is at least L1 + F1 / k_hi (the top of the load band caps the rate), so
    // Ls <= Lmin - xi (L0least - Lmin) (and the solid-length limit). Tangents of the convex
    // ln(e^w + Qs) from below make each row implied by the true one.
    const Lmin = shortestLength(req);
    const xi = req.clashAllowance;
    const L0least = couplings ? req.workingLength + req.workingForce / kHi : req.workingLength;
    const room = Math.min(Lmin - xi * (L0least - Lmin), req.maxSolidLength ?? Infinity);
    if (!(room > 0)) return { value: null, status: 'infeasible', models };
    const solidRoom = Math.log(room);
    for (const n0 of coilPoints) {
      const slope = n0 / (n0 + Qs);
      rows.push({ coefficients: { u: 1, w: slope }, max: solidRoom - Math.log(n0 + Qs) + slope * Math.log(n0) });
    }
    // The same clash with the free length as it is: d (Na + Qs) + xi F1 8 D^3 Na / (G d^4) <= Lmin -
    // xi (L1 - Lmin) (the rate at its stiffest for the material group and without the direct-shear
    // softening, so the left side is at its least). A sum of two monomials: its log, LSE(a1, a2), is
    // convex in the log variables and at least p a1 + (1 - p) a2 + H(p) for every weight p in [0, 1]
    // (H the binary entropy), so each such row is implied by the true constraint; a1 = u + ln(Na + Qs)
    // is replaced by its tangents in w from below, as above.
    const clashRoom = Lmin - xi * (req.workingLength - Lmin);
    if (couplings && xi > 0 && clashRoom > 0) {
      const lnTerm = Math.log((8 * xi * req.workingForce) / Gmax);
      for (const p of ENTROPY_WEIGHTS) {
        const entropy = binaryEntropy(p);
        for (const n0 of coilPoints) {
          const slope = n0 / (n0 + Qs);
          rows.push({
            coefficients: { u: p - 4 * (1 - p), w: p * slope + (1 - p), v: 3 * (1 - p) },
            max: Math.log(clashRoom) - entropy - p * (Math.log(n0 + Qs) - slope * Math.log(n0)) - (1 - p) * lnTerm,
          });
        }
      }
    }
    // Surge: f = c d / (D^2 Na) >= margin * forcing.
    if (req.forcingFrequency) {
      const c = surgeConstant(Gmax, rhoMin, req.surgeEnds === 'one-free');
      rows.push({ coefficients: { u: 1, v: -2, w: -1 }, min: Math.log((req.safety.surge * req.forcingFrequency) / c) });
    }
    models++;
    // Mass >= rho pi^2 d^2 D (Na + Q) / 4: minimise 2u + v + t.
    const r = minimiseLinear<V>(['u', 'v', 'w', 't'], { u: 2, v: 1, t: 1 }, rows);
    if (r.status !== 'optimal') continue;
    const scale = ((Math.PI * Math.PI) / 4) * (req.rank === 'mass' ? rhoMin * 1e-9 : 1);
    // Eased by a part in 1e7: where the relaxation is exact (its optimum a spring the grid can reach),
    // the solver's rounding could otherwise put the bound a hair above that spring.
    best = Math.min(best, scale * Math.exp(r.objective) * (1 - 1e-7));
  }
  if (!Number.isFinite(best)) return { value: null, status: 'infeasible', models };
  return { value: best, status: 'bound', models };
}
