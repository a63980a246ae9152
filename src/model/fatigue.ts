// Fatigue of helical compression springs in torsion. Stresses in MPa.
//
// Endurance point: Zimmerli (1957), valid for every spring steel under 10 mm wire:
//   unpeened Ssa = 241 MPa at Ssm = 379 MPa; shot-peened Ssa = 398 MPa at Ssm = 534 MPa.
// Criteria through that point and the torsional ultimate Ssu (Budynas and Nisbett, Shigley,
// eqs. 10-28 to 10-31): Gerber, Goodman, and Sines (the mean stress has no effect).
// Finite life (1e4 to 1e7 cycles): the repeated-stress (zero-to-maximum) strength S_sr as a fraction
// of Sut for 1e5, 1e6 and 1e7 cycles (Shigley Table 10-8, after Associated Spring), interpolated
// linearly in log10(cycles); under 1e5 cycles the 1e5 value is kept (conservative, no
// extrapolation). The point (S_sr/2, S_sr/2) then takes the place of Zimmerli's point.

export type FatigueCriterion = 'gerber' | 'goodman' | 'sines';
export const FATIGUE_CRITERIA: readonly FatigueCriterion[] = ['gerber', 'goodman', 'sines'];

/** Repeated-stress fractions of Sut at 1e5, 1e6, 1e7 cycles, unpeened and peened. */
export interface FiniteLifeTable { unpeened: readonly [number, number, number]; peened: readonly [number, number, number] }

export interface EndurancePoint { alternating: number; mean: number }

export const ZIMMERLI_UNPEENED: EndurancePoint = { alternating: 241, mean: 379 };
export const ZIMMERLI_PEENED: EndurancePoint = { alternating: 398, mean: 534 };

export function zimmerliPoint(peened: boolean): EndurancePoint {
  return peened ? ZIMMERLI_PEENED : ZIMMERLI_UNPEENED;
}

/** Cycles at or above this count are infinite life. */
export const INFINITE_LIFE_CYCLES = 1e7;
/** Below this count the service is static. */
export const STATIC_SERVICE_CYCLES = 1e4;

/** Fraction of Sut for the repeated-stress strength at `cycles` (1e4..1e7). */
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

/** Endurance limit at zero mean stress implied by the criterion through point (Ssa, Ssm). */
export function fullyReversedEndurance(point: EndurancePoint, ultimateShear: number, criterion: FatigueCriterion): number {
  const q = point.mean / ultimateShear;
  if (criterion === 'gerber') return point.alternating / (1 - q * q);
  if (criterion === 'goodman') return point.alternating / (1 - q);
  return point.alternating;
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
export function fatigueSafetyFactorFrom(alternating: number, mean: number, point: EndurancePoint, ultimateShear: number, sse: number, criterion: FatigueCriterion): number {
  if (!(alternating > 0)) return NaN;
  const slope = mean > 0 ? alternating / mean : Infinity;
  return alternatingStrengthFrom(slope, point, ultimateShear, sse, criterion) / alternating;
}

/**
 * The endurance point for a service life: Zimmerli's for infinite life in steels, otherwise the
 * repeated-stress strength of the finite-life table at min(cycles, 1e7).
 */
export function endurancePoint(cycles: number, peened: boolean, zimmerli: boolean, table: FiniteLifeTable, tensileStrength: number): { point: EndurancePoint; source: 'zimmerli' | 'finite-life-table' } {
  if (cycles >= INFINITE_LIFE_CYCLES && zimmerli) return { point: zimmerliPoint(peened), source: 'zimmerli' };
  const fraction = repeatedStressFraction(table, Math.min(cycles, INFINITE_LIFE_CYCLES), peened);
  return { point: finiteLifePoint(tensileStrength, fraction), source: 'finite-life-table' };
}
