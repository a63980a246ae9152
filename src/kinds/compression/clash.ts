// Clearance to solid and coil growth. Lengths in mm.

/** Robust linearity (Budynas and Nisbett, Shigley, eq. 10-18): F_solid >= (1 + xi) F_max, xi = 0.15
 * common practice. Returns the fractional overrun (F_solid / F_max - 1). */
export function fractionalOverrun(solidForce: number, maxForce: number): number {
  return solidForce / maxForce - 1;
}

/** Minimum sum of coil gaps at the shortest working length, EN 13906-1 (static loading; from memory):
 * Sa = (0.0015 D^2 / d + 0.1 d) Na. Spring makers take about 1.5 times this for dynamic loading. */
export function minimumGapSum(meanDiameter: number, wireDiameter: number, activeCoils: number): number {
  return ((0.0015 * meanDiameter * meanDiameter) / wireDiameter + 0.1 * wireDiameter) * activeCoils;
}

/** Outer diameter when compressed solid (Associated Spring, Design Handbook):
 * OD_s = sqrt(D^2 + (p^2 - d^2)/pi^2) + d. */
export function solidOuterDiameter(meanDiameter: number, wireDiameter: number, pitchValue: number): number {
  const grow = Math.max(0, pitchValue * pitchValue - wireDiameter * wireDiameter) / (Math.PI * Math.PI);
  return Math.sqrt(meanDiameter * meanDiameter + grow) + wireDiameter;
}
