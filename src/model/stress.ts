// Corrected torsional shear stress in the wire: tau = K * 8 F D / (pi d^3), with K the
// Bergstrasser or Wahl factor (see stressFactor.ts). Units: N, mm, MPa.

export function shearStress(force: number, meanDiameter: number, wireDiameter: number, factor: number): number {
  return (factor * 8 * force * meanDiameter) / (Math.PI * wireDiameter * wireDiameter * wireDiameter);
}
