// Spring rate of a helical compression spring, from Castigliano's theorem on the torsional strain
// energy of the wire: k = G d^4 / (8 D^3 Na). With the direct-shear energy included the
// denominator gains the factor (1 + 1/(2C^2)) (Budynas and Nisbett, Shigley, eq. 10-8 derivation).
// Units: G in MPa, lengths in mm, k in N/mm.

export function springRate(shearModulus: number, wireDiameter: number, meanDiameter: number, activeCoils: number, directShear = false): number {
  const d2 = wireDiameter * wireDiameter;
  const k = (shearModulus * d2 * d2) / (8 * meanDiameter * meanDiameter * meanDiameter * activeCoils);
  if (!directShear) return k;
  return k / directShearFactor(meanDiameter / wireDiameter);
}

/** The factor (1 + 1/(2C^2)) by which the direct-shear energy divides the rate at spring index C. */
export function directShearFactor(index: number): number {
  return 1 + 1 / (2 * index * index);
}

/** Active coils that give rate k: the inverse of springRate without the direct-shear term. */
export function activeCoilsForRate(shearModulus: number, wireDiameter: number, meanDiameter: number, rate: number): number {
  const d2 = wireDiameter * wireDiameter;
  return (shearModulus * d2 * d2) / (8 * meanDiameter * meanDiameter * meanDiameter * rate);
}
