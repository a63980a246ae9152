// A lower bound on the lightest spring (or the smallest wire volume) from a linear programme in
// logarithmic variables u = ln d, v = ln D, w = ln Na. Rate, stress, index, envelope and surge
// relations are monomials, hence linear in logs, once the stress factor is bounded below by its
// value at the largest index, the dead coils are dropped (Nt >= Na), and each strength law is taken
// per segment. Every simplification loosens the constraints, so the LP optimum is a valid lower bound
// on every discrete spring the grid could find: the gap between the grid's best and this bound says
// how much any finer wire or coil choice could still gain.
import { tensileStrength } from '../catalogs/properties.js';
import type { Requirements } from '../input/requirements.js';
import { bergstrasserFactor, wahlFactor } from '../model/stressFactor.js';
import { minimiseLinear, type LinearRow } from '../search/lp.js';
import { shortestLength } from './checks.js';
import type { SpringProblem, StockItem } from './problem.js';

type V = 'u' | 'v' | 'w';

export interface LpBound { value: number | null; status: 'bound' | 'infeasible' | 'not-applicable'; models: number }

/** Group stock items by material and strength segment: within a group, strength is one monomial in d. */
function groups(stock: StockItem[]): StockItem[][] {
  const out = new Map<string, StockItem[]>();
  for (const s of stock) {
    const law = s.choice.material.strength;
    let seg = 0;
    if (s.choice.tensileStrength !== undefined) seg = -1;
    else if (law.law === 'power') law.segments.forEach((g, i) => { if (s.wireDiameter >= g.minDiameter) seg = i; });
    else seg = law.diameters.findIndex((dd, i) => i === law.diameters.length - 1 || s.wireDiameter < law.diameters[i + 1]);
    const key = `${s.choice.material.id}#${seg}`;
    if (!out.has(key)) out.set(key, []);
    out.get(key)!.push(s);
  }
  return [...out.values()];
}

export function lpLowerBound(problem: SpringProblem): LpBound {
  const req: Requirements = problem.req;
  if (req.rank !== 'mass' && req.rank !== 'wire_volume') return { value: null, status: 'not-applicable', models: 0 };
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
    if (req.maxOuterDiameter !== undefined) rows.push({ coefficients: { v: 1 }, max: Math.log(req.maxOuterDiameter - dLo) });
    if (req.minInnerDiameter !== undefined) rows.push({ coefficients: { v: 1 }, min: Math.log(req.minInnerDiameter + dLo) });
    // Static stress at the largest force: K(Cmax) 8 F D / (pi d^3) * n <= allowable(d).
    const Kmin = req.correction === 'wahl' ? wahlFactor(req.index[1]) : bergstrasserFactor(req.index[1]);
    const Flow = req.operatingForce !== undefined ? req.operatingForce * (1 - req.loadTolerance) : req.workingForce;
    const n = req.allowableStress !== undefined ? 1 : req.safety.static;
    const lever = Math.log((Kmin * 8 * Flow * n) / Math.PI);
    if (req.allowableStress !== undefined) {
      rows.push({ coefficients: { v: 1, u: -3 }, max: Math.log(req.allowableStress) - lever });
    } else {
      // allowable = fraction * Sut(d); within the group Sut = A d^-m exactly (power law) or is bounded
      // above by its value at the group's smallest diameter (tables fall with diameter).
      const s0 = group[0];
      const fraction = s0.figures.allowableStress / s0.figures.tensileStrength;
      const law = s0.choice.material.strength;
      const seg = law.law === 'power' && s0.choice.tensileStrength === undefined ? law.segments.find((g) => dLo >= g.minDiameter - 1e-12 && dLo <= g.maxDiameter + 1e-12) : undefined;
      if (seg) {
        rows.push({ coefficients: { v: 1, u: -3 + seg.exponent }, max: Math.log(fraction * seg.coefficient) - lever });
      } else {
        const sutMax = Math.max(...group.map((s) => s.choice.tensileStrength ?? tensileStrength(s.choice.material, s.wireDiameter)));
        rows.push({ coefficients: { v: 1, u: -3 }, max: Math.log(fraction * sutMax) - lever });
      }
    }
    // Rate: k = G d^4 / (8 D^3 Na), in [k_lo, k_hi] when the operating force is given; the free-length
    // limit asks k >= F1 / (L0max - L1).
    const shear = req.directShear ? 1 + 1 / (2 * req.index[0] * req.index[0]) : 1;
    let kLo = 0;
    if (req.operatingForce !== undefined && req.operatingLength !== undefined) {
      const travel = req.workingLength - req.operatingLength;
      kLo = (req.operatingForce * (1 - req.loadTolerance) - req.workingForce) / travel;
      const kHi = (req.operatingForce * (1 + req.loadTolerance) - req.workingForce) / travel;
      rows.push({ coefficients: { u: 4, v: -3, w: -1 }, max: Math.log((8 * kHi * shear) / Gmin) });
    }
    if (req.maxFreeLength !== undefined) kLo = Math.max(kLo, req.workingForce / (req.maxFreeLength - req.workingLength));
    if (kLo > 0) rows.push({ coefficients: { u: 4, v: -3, w: -1 }, min: Math.log((8 * kLo) / Gmax) });
    // Solid: d Na <= Ls <= shortest length (and the solid-length limit).
    rows.push({ coefficients: { u: 1, w: 1 }, max: Math.log(Math.min(shortestLength(req), req.maxSolidLength ?? Infinity)) });
    // Surge: f = c d / (D^2 Na) >= margin * forcing.
    if (req.forcingFrequency) {
      const c = (req.seating === 'fixed-free' ? 0.25 : 0.5) * Math.sqrt((4000 * Gmax) / (8 * Math.PI * Math.PI * rhoMin * 1e-9));
      rows.push({ coefficients: { u: 1, v: -2, w: -1 }, min: Math.log((req.safety.surge * req.forcingFrequency) / c) });
    }
    models++;
    const r = minimiseLinear<V>(['u', 'v', 'w'], { u: 2, v: 1, w: 1 }, rows);
    if (r.status !== 'optimal') continue;
    const scale = (Math.PI * Math.PI) / 4 * (req.rank === 'mass' ? rhoMin * 1e-9 : 1);
    best = Math.min(best, scale * Math.exp(r.objective));
  }
  if (!Number.isFinite(best)) return { value: null, status: 'infeasible', models };
  return { value: best, status: 'bound', models };
}
