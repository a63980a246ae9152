// Geometry of a helical compression spring by end type, after the end-type table of the spring
// handbooks (Associated Spring, Design Handbook; Budynas and Nisbett, Shigley's Mechanical
// Engineering Design, Table 10-1). All lengths in mm.
import { massOfVolume } from '../../model/mass.js';

export const END_TYPES = ['plain', 'plain-ground', 'squared', 'squared-ground'] as const;
export type EndType = (typeof END_TYPES)[number];

/** Inactive (dead) coils added to the active coils: Nt = Na + Q. */
export function inactiveCoils(ends: EndType): number {
  switch (ends) {
    case 'plain':
      return 0;
    case 'plain-ground':
      return 1;
    default:
      return 2;
  }
}

/** Solid length: d(Nt + 1) for unground ends, d Nt for ground ends. */
export function solidLength(wireDiameter: number, totalCoils: number, ends: EndType): number {
  const ground = ends === 'plain-ground' || ends === 'squared-ground';
  return wireDiameter * (ground ? totalCoils : totalCoils + 1);
}

/** Length taken by the ends beyond p * Na (free length = p * Na + endAllowance). */
function endAllowance(wireDiameter: number, pitch: number, ends: EndType): number {
  switch (ends) {
    case 'plain':
      return wireDiameter;
    case 'plain-ground':
      return pitch;
    case 'squared':
      return 3 * wireDiameter;
    case 'squared-ground':
      return 2 * wireDiameter;
  }
}

export function freeLengthFromPitch(pitch: number, activeCoils: number, wireDiameter: number, ends: EndType): number {
  return pitch * activeCoils + endAllowance(wireDiameter, pitch, ends);
}

/** Pitch of the active coils at free length. */
export function pitch(freeLength: number, activeCoils: number, wireDiameter: number, ends: EndType): number {
  switch (ends) {
    case 'plain':
      return (freeLength - wireDiameter) / activeCoils;
    case 'plain-ground':
      return freeLength / (activeCoils + 1);
    case 'squared':
      return (freeLength - 3 * wireDiameter) / activeCoils;
    case 'squared-ground':
      return (freeLength - 2 * wireDiameter) / activeCoils;
  }
}

/** Helix (pitch) angle of the active coils, radians. */
export function helixAngle(pitchValue: number, meanDiameter: number): number {
  return Math.atan(pitchValue / (Math.PI * meanDiameter));
}

/** Wire length of the coiled body, counting every coil as one turn of the mean circle (the usual
 * handbook approximation behind m = rho pi^2 d^2 D Nt / 4). */
export function wireLength(meanDiameter: number, totalCoils: number): number {
  return Math.PI * meanDiameter * totalCoils;
}

/** Wire volume in mm^3: pi^2 d^2 D Nt / 4. */
export function wireVolume(wireDiameter: number, meanDiameter: number, totalCoils: number): number {
  return (Math.PI * Math.PI * wireDiameter * wireDiameter * meanDiameter * totalCoils) / 4;
}

/** Mass in kg from the coil's dimensions and density (kg/m^3). */
export function springMass(wireDiameter: number, meanDiameter: number, totalCoils: number, density: number): number {
  return massOfVolume(wireVolume(wireDiameter, meanDiameter, totalCoils), density);
}
