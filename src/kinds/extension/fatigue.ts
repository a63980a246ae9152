// Fatigue of an extension spring. The initial tension puts a stress in the wire before any extension,
// so when the working load grows the stress point moves along a load line that starts at the
// initial-tension stress (tau_m = tau_i, tau_a = 0), not at the origin (Budynas and Nisbett, Shigley's
// Mechanical Engineering Design, sec. 10-11, Example 10-8): slope r = tau_a / (tau_m - tau_i).
// The strength is where that line meets the criterion through the endurance point:
//   Goodman  Sa / Se + (s_i + Sa / r) / Su = 1          =>  Sa = r Se (Su - s_i) / (r Su + Se)
//   Gerber   Sa / Se + ((s_i + Sa / r) / Su)^2 = 1      (a quadratic in Sa, solved below)
//   Sines    Sa = the endurance point's alternating strength (mean stress has no effect)
// With s_i = 0 these are the shared model's load-line formulas (src/model/fatigue.ts).
// The same applies at the loops: torsion at B against Ssu, bending at A against Sut with the
// endurance converted from torsion by distortion energy, Se = Sse / 0.577 (Shigley Example 10-8).
import { lifeCurve, type FatigueCriterion, type FiniteLifeTable, type LifeCurvePoint } from '../../model/fatigue.js';
import { ultimateShearStrength } from '../../model/strength.js';

/** Von Mises: a torsional strength is 0.577 of the tensile one (Shigley Example 10-8 uses 0.577). */
export const TORSION_TO_TENSION = 0.577;

/**
 * Alternating strength on the load line of slope r that starts at the initial stress s_i.
 * `sse`: fully reversed endurance for the criterion; `sinesAlternating`: the endurance point's
 * alternating strength; `ultimate`: Ssu for torsion, Sut for bending.
 */
export function offsetAlternatingStrength(
  slope: number,
  initialStress: number,
  sse: number,
  sinesAlternating: number,
  ultimate: number,
  criterion: FatigueCriterion,
): number {
  if (criterion === 'sines') return sinesAlternating;
  const q = initialStress / ultimate;
  if (!(q < 1)) return 0;
  if (!(slope < 1e12)) return criterion === 'goodman' ? sse * (1 - q) : sse * (1 - q * q);
  if (criterion === 'goodman') return (slope * sse * (ultimate - initialStress)) / (slope * ultimate + sse);
  // Gerber: a Sa^2 + b Sa + c = 0 with a = 1/(r Su)^2, b = 2 s_i/(r Su^2) + 1/Se, c = (s_i/Su)^2 - 1 < 0;
  // the positive root written without cancellation.
  const a = 1 / (slope * slope * ultimate * ultimate);
  const b = (2 * initialStress) / (slope * ultimate * ultimate) + 1 / sse;
  const c = q * q - 1;
  return (-2 * c) / (b + Math.sqrt(b * b - 4 * a * c));
}

export interface CycleOnLine {
  initialStress: number;
  minStress: number;
  maxStress: number;
  alternatingStress: number;
  meanStress: number;
  /** tau_a / (tau_m - tau_i); Infinity when the mean stress sits at the initial stress. */
  slope: number;
}

/** The stress cycle between two stresses and its load line from the initial stress. */
export function cycleOnLine(initialStress: number, minStress: number, maxStress: number): CycleOnLine {
  const alternatingStress = (maxStress - minStress) / 2;
  const meanStress = (maxStress + minStress) / 2;
  const rise = meanStress - initialStress;
  return { initialStress, minStress, maxStress, alternatingStress, meanStress, slope: rise > 0 ? alternatingStress / rise : Infinity };
}

/** Safety factor along the load line: strength over the alternating stress; NaN without alternation. */
export function offsetFatigueSafety(cycle: CycleOnLine, sse: number, sinesAlternating: number, ultimate: number, criterion: FatigueCriterion): number {
  if (!(cycle.alternatingStress > 0)) return NaN;
  return offsetAlternatingStrength(cycle.slope, cycle.initialStress, sse, sinesAlternating, ultimate, criterion) / cycle.alternatingStress;
}

/**
 * Yield along the same load line (Shigley Example 10-8, coil yielding): the line from the initial stress
 * meets tau_a + tau_m = S_y at Sa = r (S_y - s_i) / (r + 1), so n = (S_y - s_i) / (s_max - s_i).
 */
export function yieldAlongLoadLine(cycle: CycleOnLine, yieldStrength: number): number {
  const rise = cycle.maxStress - cycle.initialStress;
  return rise > 0 ? (yieldStrength - cycle.initialStress) / rise : NaN;
}

/**
 * The life curve of a loop, built like the body's (src/model/fatigue.ts, lifeCurve): the loop's
 * repeated-stress fractions (unpeened: peening does not reach into the bends) down to a knee at 1e7
 * cycles that is the lower of the table's 1e7 value and Zimmerli's unpeened data. At B (torsion) that is
 * the body's curve with the loop's table. At A (bending) the torsional strengths are carried to tension by
 * distortion energy, S = S_s / 0.577 (Shigley Example 10-8): the curve is computed on the torsional scale
 * (Sut taken as 0.577 Sut, so the table's bending fractions become torsional strengths) and scaled back;
 * its ultimate is then Sut.
 */
export function loopLifeCurve(
  cycles: number,
  zimmerli: boolean,
  table: FiniteLifeTable,
  tensileStrength: number,
  bending: boolean,
  criterion: FatigueCriterion,
): LifeCurvePoint {
  const ssu = ultimateShearStrength(tensileStrength);
  if (!bending) return lifeCurve(cycles, false, zimmerli, table, tensileStrength, ssu, criterion);
  const c = lifeCurve(cycles, false, zimmerli, table, TORSION_TO_TENSION * tensileStrength, ssu, criterion);
  const s = c.repeatedStrength / TORSION_TO_TENSION;
  return { repeatedStrength: s, point: { alternating: s / 2, mean: s / 2 }, source: c.source };
}
