// Geometry of a close-wound extension spring with a loop at each end. Lengths in mm.
// The body is wound solid: its length is (Nb + 1) d. Each loop adds its inside height h, measured from
// the end of the body to the inside of the loop, so the free length inside the loops is
//   L0 = (Nb + 1) d + 2 h,
// which for standard full loops (h = the inner diameter D - d) is Shigley's L0 = (2C - 1 + Nb) d
// (Budynas and Nisbett, Shigley's Mechanical Engineering Design, eq. 10-39).
import { massOfVolume } from '../../model/mass.js';
import type { LoopRule } from './catalog.js';

/** Active coils: the body coils plus the deflection of the two loops, Na = Nb + G/E (Shigley eq. 10-40). */
export function extensionActiveCoils(bodyCoils: number, shearModulus: number, elasticModulus: number): number {
  return bodyCoils + shearModulus / elasticModulus;
}

export function bodyLength(wireDiameter: number, bodyCoils: number): number {
  return (bodyCoils + 1) * wireDiameter;
}

/** Inside height of one loop by its rule: the explicit loop length when given, else the rule's share of
 * the inner diameter. */
export function loopHeight(rule: LoopRule, wireDiameter: number, meanDiameter: number, loopLength?: number): number {
  return loopLength ?? rule.innerHeight * (meanDiameter - wireDiameter);
}

export function freeLengthInsideLoops(wireDiameter: number, bodyCoils: number, height: number): number {
  return bodyLength(wireDiameter, bodyCoils) + 2 * height;
}

/** Wire in one loop: the rule's share of a coil (a full loop is one coil of wire, common practice), plus
 * the straight reach by which an explicit or extended loop stands beyond the rule's own height. */
export function loopWireLength(rule: LoopRule, wireDiameter: number, meanDiameter: number, height: number): number {
  const reach = Math.max(0, height - rule.innerHeight * (meanDiameter - wireDiameter));
  return rule.wireCoils * Math.PI * meanDiameter + reach;
}

/** Wire length of body and both loops. */
export function extensionWireLength(bodyCoils: number, meanDiameter: number, loopWire: number): number {
  return Math.PI * meanDiameter * bodyCoils + 2 * loopWire;
}

/** Wire volume (mm^3) of a length of round wire. */
export function wireVolumeOfLength(wireDiameter: number, length: number): number {
  return (Math.PI * wireDiameter * wireDiameter * length) / 4;
}

export function extensionMass(wireDiameter: number, wireLength: number, density: number): number {
  return massOfVolume(wireVolumeOfLength(wireDiameter, wireLength), density);
}
