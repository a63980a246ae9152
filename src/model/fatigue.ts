// Fatigue of helical compression springs in torsion. Stresses in MPa.
//
// Criteria (Budynas and Nisbett, Shigley's Mechanical Engineering Design, eqs. 10-28 to 10-31): Gerber,
// Goodman, and Sines (the mean stress has no effect), each a line through an endurance point and, for
// Gerber and Goodman, the torsional ultimate Ssu.
//
// The life curve. Two published data sets meet at about 1e7 cycles, and on their own they disagree
// (a longer life could pass more easily than a shorter one). coilfront joins them into one continuous,
// non-increasing curve of the repeated-stress (zero-to-maximum) strength S_sr per material, wire size,
// surface and criterion:
// - Finite life: S_sr as a fraction of Sut at 1e5, 1e6 and 1e7 cycles, the compression-spring cyclic
//   table of the Associated Spring design handbook as reprinted in machine-design texts (from memory),
//   interpolated linearly in log10(cycles); under 1e5 cycles the 1e5 value is kept (no extrapolation).
// - Endurance (infinite life): for spring steels Zimmerli (1957), "Permissible stress range for small
//   helical springs", valid for every spring steel under 10 mm wire: unpeened Ssa = 241 MPa at
//   Ssm = 379 MPa, shot-peened Ssa = 398 MPa at Ssm = 534 MPa. It is carried to the repeated-stress
//   load line by the chosen criterion, so that both data sets are compared as one quantity.
// - The knee at 1e7 cycles is the LOWER of the table's 1e7 value and Zimmerli's (a lower envelope of the
//   two sources: neither is allowed to make a longer life easier); from 1e6 to 1e7 the curve runs
//   linearly in log10(cycles) from the table's 1e6 value to the knee; at and beyond 1e7 it stays at
//   the knee. The table is non-increasing (checked when the catalog loads) and the knee is at most the
//   table's 1e7 value, so the whole curve is non-increasing and continuous (common practice: take the
//   lower published strength where two sources overlap).
// - Materials for which Zimmerli's data do not apply (austenitic stainless and copper alloys: his tests
//   were on spring steels) take the endurance from the table's 1e7 row, the published fraction for
//   their class.
// At every life the endurance point is (S_sr/2, S_sr/2): the criterion line through it is the line
// through the governing published point.

import { ultimateShearStrength } from './strength.js';

export type FatigueCriterion = 'gerber' | 'goodman' | 'sines';
export const FATIGUE_CRITERIA: readonly FatigueCriterion[] = ['gerber', 'goodman', 'sines'];

/** Repeated-stress fractions of Sut at 1e5, 1e6, 1e7 cycles, unpeened and peened. */
export interface FiniteLifeTable {
  unpeened: readonly [number, number, number];
  peened: readonly [number, number, number];
}

export interface EndurancePoint {
  alternating: number;
  mean: number;
}

export const ZIMMERLI_UNPEENED: EndurancePoint = { alternating: 241, mean: 379 };
export const ZIMMERLI_PEENED: EndurancePoint = { alternating: 398, mean: 534 };

export function zimmerliPoint(peened: boolean): EndurancePoint {
  return peened ? ZIMMERLI_PEENED : ZIMMERLI_UNPEENED;
}

/** Cycles at or above this count are infinite life. */
export const INFINITE_LIFE_CYCLES = 1e7;
/** Below this count the service is static. */
export const STATIC_SERVICE_CYCLES = 1e4;

/** Fraction of Sut for the repeated-stress strength at `cycles` in the finite-life table alone (1e5..1e7,
 * held outside). The life curve (`lifeCurve`) is what the checks use. */
export function repeatedStressFraction(table: FiniteLifeTable, cycles: number, peened: boolean): number {
  const f = peened ? table.peened : table.unpeened;
  const e = Math.log10(Math.max(1e5, Math.min(1e7, cycles)));
  if (e <= 6) return f[0] + (f[1] - f[0]) * (e - 5);
  return f[1] + (f[2] - f[1]) * (e - 6);
}

/** Endurance point for a finite life: zero-to-maximum strength S_sr split into equal parts. */
export function finiteLifePoint(tensileStrength: number, fraction: number): EndurancePoint {
  const half = (fraction * tensileStrength) / 2;
  return { alternating: half, mean: half };
}

/**
 * The repeated-stress strength (zero to maximum) equivalent to an endurance point under a criterion:
 * twice the alternating strength on the load line tau_a = tau_m. NaN when the point lies at or beyond
 * the torsional ultimate (the criterion line does not exist).
 */
export function repeatedStressEquivalent(point: EndurancePoint, ultimateShear: number, criterion: FatigueCriterion): number {
  if (criterion !== 'sines' && !(point.mean < ultimateShear)) return NaN;
  return 2 * alternatingStrength(1, point, ultimateShear, criterion);
}

/** Which published data govern the curve at a given life. */
export type EnduranceSource = 'finite-life-table' | 'zimmerli' | 'finite-life-table-to-zimmerli';

export interface LifeCurvePoint {
  /** Repeated-stress (zero-to-maximum) torsional strength S_sr, MPa. */
  repeatedStrength: number;
  /** The endurance point (S_sr/2, S_sr/2) the criterion line passes through. */
  point: EndurancePoint;
  source: EnduranceSource;
}

/**
 * The life curve of one material at one wire size (see the file comment): S_sr at `cycles` (1e4 and
 * up; Infinity is infinite life). `ultimateShear` is Ssu = 0.67 Sut.
 */
export function lifeCurve(
  cycles: number,
  peened: boolean,
  zimmerli: boolean,
  table: FiniteLifeTable,
  tensileStrength: number,
  ultimateShear: number,
  criterion: FatigueCriterion,
): LifeCurvePoint {
  const f = peened ? table.peened : table.unpeened;
  const t6 = f[1] * tensileStrength;
  const t7 = f[2] * tensileStrength;
  const z = zimmerli ? repeatedStressEquivalent(zimmerliPoint(peened), ultimateShear, criterion) : NaN;
  const zimmerliGoverns = z < t7;
  const knee = zimmerliGoverns ? z : t7;
  const e = Math.log10(Math.max(1e5, Math.min(INFINITE_LIFE_CYCLES, cycles)));
  let s: number;
  let source: EnduranceSource = 'finite-life-table';
  if (e <= 6) {
    s = f[0] * tensileStrength + (t6 - f[0] * tensileStrength) * (e - 5);
  } else {
    s = t6 + (knee - t6) * (e - 6);
    if (zimmerliGoverns) source = e >= 7 ? 'zimmerli' : 'finite-life-table-to-zimmerli';
  }
  return { repeatedStrength: s, point: { alternating: s / 2, mean: s / 2 }, source };
}

/** How the text and the plots name the governing data. */
export function enduranceSourceLabel(source: EnduranceSource, peened: boolean): string {
  const z = `Zimmerli ${peened ? 'shot-peened' : 'unpeened'}`;
  if (source === 'zimmerli') return z;
  if (source === 'finite-life-table-to-zimmerli') return `finite-life table at 1e6 to ${z} at 1e7`;
  return 'finite-life table';
}

/** Endurance limit at zero mean stress implied by the criterion through point (Ssa, Ssm). */
export function fullyReversedEndurance(point: EndurancePoint, ultimateShear: number, criterion: FatigueCriterion): number {
  const q = point.mean / ultimateShear;
  if (criterion === 'gerber') return point.alternating / (1 - q * q);
  if (criterion === 'goodman') return point.alternating / (1 - q);
  return point.alternating;
}

/**
 * The criterion line itself: the alternating stress it allows at mean stress `mean`, given the fully
 * reversed endurance Sse (Shigley eqs. 10-28 to 10-30): Goodman Sse (1 - tau_m / Ssu), Gerber
 * Sse (1 - (tau_m / Ssu)^2), Sines the endurance point's alternating stress whatever the mean. Negative
 * past Ssu: the caller clips where it draws.
 */
export function criterionLimit(mean: number, point: EndurancePoint, ultimateShear: number, sse: number, criterion: FatigueCriterion): number {
  if (criterion === 'sines') return point.alternating;
  if (criterion === 'goodman') return sse * (1 - mean / ultimateShear);
  return sse * (1 - (mean / ultimateShear) ** 2);
}

/**
 * Alternating-stress strength on the load line of slope r = tau_a / tau_m from the origin.
 * r = Infinity (no mean stress) gives the fully reversed endurance.
 */
export function alternatingStrength(slope: number, point: EndurancePoint, ultimateShear: number, criterion: FatigueCriterion): number {
  return alternatingStrengthFrom(slope, point, ultimateShear, fullyReversedEndurance(point, ultimateShear, criterion), criterion);
}

/** The same with the fully reversed endurance Sse given (for loops that hold it per material). */
export function alternatingStrengthFrom(slope: number, point: EndurancePoint, ultimateShear: number, sse: number, criterion: FatigueCriterion): number {
  if (criterion === 'sines') return point.alternating;
  if (!(slope < 1e12)) return sse;
  if (criterion === 'goodman') return (slope * sse * ultimateShear) / (slope * ultimateShear + sse);
  // Gerber: Ssa = r^2 Ssu^2 / (2 Sse) * (-1 + sqrt(1 + (2 Sse / (r Ssu))^2)), written to avoid cancellation.
  const t = (2 * sse) / (slope * ultimateShear);
  const root = Math.sqrt(1 + t * t);
  return ((slope * slope * ultimateShear * ultimateShear) / (2 * sse)) * ((t * t) / (1 + root));
}

/** Alternating and mean stress of the cycle between two stresses. */
export function cycleStresses(minStress: number, maxStress: number): EndurancePoint {
  return { alternating: (maxStress - minStress) / 2, mean: (maxStress + minStress) / 2 };
}

/** Fatigue safety factor n_f = Ssa(limit) / tau_a; NaN when there is no alternating stress. */
export function fatigueSafetyFactor(alternating: number, mean: number, point: EndurancePoint, ultimateShear: number, criterion: FatigueCriterion): number {
  return fatigueSafetyFactorFrom(alternating, mean, point, ultimateShear, fullyReversedEndurance(point, ultimateShear, criterion), criterion);
}

/** The same with the fully reversed endurance Sse given. */
export function fatigueSafetyFactorFrom(
  alternating: number,
  mean: number,
  point: EndurancePoint,
  ultimateShear: number,
  sse: number,
  criterion: FatigueCriterion,
): number {
  if (!(alternating > 0)) return NaN;
  const slope = mean > 0 ? alternating / mean : Infinity;
  return alternatingStrengthFrom(slope, point, ultimateShear, sse, criterion) / alternating;
}

/** The endurance point for a service life: the life curve at `cycles` (Infinity for infinite life). */
export function endurancePoint(
  cycles: number,
  peened: boolean,
  zimmerli: boolean,
  table: FiniteLifeTable,
  tensileStrength: number,
  criterion: FatigueCriterion,
): LifeCurvePoint {
  return lifeCurve(cycles, peened, zimmerli, table, tensileStrength, ultimateShearStrength(tensileStrength), criterion);
}
