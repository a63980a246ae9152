// Buckling of helical compression springs: critical deflection after the classical column analysis
// of Haringx as written in Budynas and Nisbett, Shigley, eqs. 10-10 to 10-13 (the same relation
// appears in EN 13906-1 and DIN 2089 with a seating coefficient nu = alpha).
//   C1 = E / (2 (E - G)),  C2 = 2 pi^2 (E - G) / (2 G + E),  lambda = alpha L0 / D
//   y_cr = L0 C1 [1 - sqrt(1 - C2 / lambda^2)]; absolutely stable when C2 / lambda^2 >= 1.

export const SEATINGS = ['fixed-fixed', 'fixed-pivoted', 'pivoted-pivoted', 'fixed-free'] as const;
export type Seating = (typeof SEATINGS)[number];

/** End-condition constant alpha (Shigley Table 10-2). */
export function endConditionConstant(seating: Seating): number {
  switch (seating) {
    case 'fixed-fixed':
      return 0.5;
    case 'fixed-pivoted':
      return 0.707;
    case 'pivoted-pivoted':
      return 1;
    case 'fixed-free':
      return 2;
  }
}

/** Longest free length that is absolutely stable: L0 < pi D / alpha * sqrt(2(E-G)/(2G+E)). */
export function stableFreeLengthLimit(meanDiameter: number, elasticModulus: number, shearModulus: number, alpha: number): number {
  return (meanDiameter / alpha) * Math.sqrt(bucklingConstant2(elasticModulus, shearModulus));
}

/** The elastic constants C1 = E / (2(E - G)) and C2 = 2 pi^2 (E - G)/(2G + E) of the material. */
export function bucklingConstant1(elasticModulus: number, shearModulus: number): number {
  return elasticModulus / (2 * (elasticModulus - shearModulus));
}

export function bucklingConstant2(elasticModulus: number, shearModulus: number): number {
  return (2 * Math.PI * Math.PI * (elasticModulus - shearModulus)) / (2 * shearModulus + elasticModulus);
}

/** Critical deflection from the material's constants (for loops that hold them per material). */
export function criticalDeflectionFrom(freeLength: number, meanDiameter: number, c1: number, c2: number, alpha: number): number {
  const lambda = (alpha * freeLength) / meanDiameter;
  const q = c2 / (lambda * lambda);
  if (q >= 1) return NaN;
  return freeLength * c1 * (1 - Math.sqrt(1 - q));
}

/** Critical deflection in mm, or NaN when the spring is absolutely stable. */
export function criticalDeflection(freeLength: number, meanDiameter: number, elasticModulus: number, shearModulus: number, alpha: number): number {
  return criticalDeflectionFrom(
    freeLength,
    meanDiameter,
    bucklingConstant1(elasticModulus, shearModulus),
    bucklingConstant2(elasticModulus, shearModulus),
    alpha,
  );
}
