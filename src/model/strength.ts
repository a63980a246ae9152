// Minimum tensile strength of spring wire as a function of its diameter, and the torsional
// strengths derived from it.

/** Power law Sut = A / d^m (Budynas and Nisbett, Shigley, Table 10-4), A in MPa mm^m, d in mm. */
export function powerLawStrength(coefficient: number, exponent: number, wireDiameter: number): number {
  return coefficient / Math.pow(wireDiameter, exponent);
}

/** Log-log interpolation in a table of (diameter, strength), clamped at the ends. Diameters ascending. */
export function tabulatedStrength(diameters: ArrayLike<number>, strengths: ArrayLike<number>, wireDiameter: number): number {
  const n = diameters.length;
  if (wireDiameter <= diameters[0]) return strengths[0];
  if (wireDiameter >= diameters[n - 1]) return strengths[n - 1];
  let i = 1;
  while (diameters[i] < wireDiameter) i++;
  const t = Math.log(wireDiameter / diameters[i - 1]) / Math.log(diameters[i] / diameters[i - 1]);
  return Math.exp(Math.log(strengths[i - 1]) + t * Math.log(strengths[i] / strengths[i - 1]));
}

/** Torsional ultimate strength Ssu = 0.67 Sut (Budynas and Nisbett, Shigley, eq. 10-30). */
export function ultimateShearStrength(tensileStrength: number): number {
  return 0.67 * tensileStrength;
}

/** Static torsional allowable: a fraction of Sut by material class (Shigley Table 10-6). */
export function staticAllowable(tensileStrength: number, fraction: number): number {
  return fraction * tensileStrength;
}
