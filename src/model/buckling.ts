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
    case 'fixed-fixed': return 0.5;
    case 'fixed-pivoted': return 0.707;
    case 'pivoted-pivoted': return 1;
    case 'fixed-free': return 2;
  }
}

/** Longest free length that is absolutely stable: L0 < pi D / alpha * sqrt(2(E-G)/(2G+E)). */
export function stableFreeLengthLimit(meanDiameter: number, elasticModulus: number, shearModulus: number, alpha: number): number {
  const c2 = (2 * Math.PI * Math.PI * (elasticModulus - shearModulus)) / (2 * shearModulus + elasticModulus);
  return (meanDiameter / alpha) * Math.sqrt(c2);
}

/** Critical deflection in mm, or NaN when the spring is absolutely stable. */
export function criticalDeflection(freeLength: number, meanDiameter: number, elasticModulus: number, shearModulus: number, alpha: number): number {
  const c1 = elasticModulus / (2 * (elasticModulus - shearModulus));
  const c2 = (2 * Math.PI * Math.PI * (elasticModulus - shearModulus)) / (2 * shearModulus + elasticModulus);
  const lambda = (alpha * freeLength) / meanDiameter;
  const q = c2 / (lambda * lambda);
  if (q >= 1) return NaN;
  return freeLength * c1 * (1 - Math.sqrt(1 - q));
}
