// The end loops of an extension spring: where it usually breaks. Two points carry the peak stresses
// (Budynas and Nisbett, Shigley's Mechanical Engineering Design, sec. 10-11, eqs. 10-34 to 10-37):
//   A, bending in the plane of the loop:  sigma_A = F [ (K)_A 16 D / (pi d^3) + 4 / (pi d^2) ],
//      (K)_A = (4 C1^2 - C1 - 1) / (4 C1 (C1 - 1)),  C1 = 2 r1 / d, r1 the mean radius of the loop;
//   B, torsion where the wire bends from the body into the loop:  tau_B = (K)_B 8 F D / (pi d^3),
//      (K)_B = (4 C2 - 1) / (4 C2 - 4),  C2 = 2 r2 / d, r2 the radius of that bend.
// Units: N, mm, MPa.
import { shearStress } from '../../model/stress.js';

/** Curvature factor of the loop in bending at A (Shigley eq. 10-35). */
export function loopBendingFactor(loopIndex: number): number {
  const c = loopIndex;
  return (4 * c * c - c - 1) / (4 * c * (c - 1));
}

/** Curvature factor of the bend in torsion at B (Shigley eq. 10-37). It tends to 1 as the bend opens. */
export function loopTorsionFactor(bendIndex: number): number {
  return (4 * bendIndex - 1) / (4 * bendIndex - 4);
}

/** Bending plus direct tension at A (Shigley eq. 10-34). */
export function loopBendingStress(force: number, meanDiameter: number, wireDiameter: number, factorA: number): number {
  const d = wireDiameter;
  return force * ((factorA * 16 * meanDiameter) / (Math.PI * d * d * d) + 4 / (Math.PI * d * d));
}

/** Torsion at B (Shigley eq. 10-36): the body formula with (K)_B in place of the body's factor. */
export function loopTorsionStress(force: number, meanDiameter: number, wireDiameter: number, factorB: number): number {
  return shearStress(force, meanDiameter, wireDiameter, factorB);
}
