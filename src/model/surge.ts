// Surge (first natural) frequency of a helical compression spring, from the wave equation for the
// coil (Budynas and Nisbett, Shigley, eqs. 10-24 to 10-26; Wolford and Smith):
//   both ends on plates:  f = (1/2) sqrt(k / m_a);  one end free: f = (1/4) sqrt(k / m_a)
// with m_a the mass of the active coils, rho pi^2 d^2 D Na / 4.

/** How the spring's ends meet the surge wave: both on plates (the default), or one end free. A setting of
 * its own: the buckling seating says how the ends are held sideways, not whether one end floats axially. */
export const SURGE_ENDS = ['plates', 'one-free'] as const;
export type SurgeEnds = (typeof SURGE_ENDS)[number];

export function surgeEndsLabel(ends: SurgeEnds): string {
  return ends === 'one-free' ? 'one end free' : 'both ends on plates';
}

export function activeCoilMass(wireDiameter: number, meanDiameter: number, activeCoils: number, density: number): number {
  return ((Math.PI * Math.PI * wireDiameter * wireDiameter * meanDiameter * activeCoils) / 4) * 1e-9 * density;
}

/** rate in N/mm, mass in kg, frequency in Hz. */
export function surgeFrequency(rate: number, activeMass: number, oneEndFree: boolean): number {
  const f = Math.sqrt((rate * 1000) / activeMass);
  return oneEndFree ? f / 4 : f / 2;
}

/** The surge frequency written as c d / (D^2 Na) (without the direct-shear term): surgeFrequency of
 * springRate over activeCoilMass with G and rho factored out, for bounds that need it as a monomial.
 * G in MPa, density in kg/m^3, lengths in mm, c in Hz mm. */
export function surgeConstant(shearModulus: number, density: number, oneEndFree: boolean): number {
  return (oneEndFree ? 0.25 : 0.5) * Math.sqrt((4000 * shearModulus) / (8 * Math.PI * Math.PI * density * 1e-9));
}
