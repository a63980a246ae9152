// Curvature (stress-correction) factors for round-wire helical springs in torsion.
// Both account for direct shear and the stress concentration on the inside of the coil.

/** Wahl (1929): K_W = (4C - 1)/(4C - 4) + 0.615/C. */
export function wahlFactor(springIndex: number): number {
  const c = springIndex;
  return (4 * c - 1) / (4 * c - 4) + 0.615 / c;
}

/** Bergstrasser: K_B = (4C + 2)/(4C - 3); the same as EN 13906-1's k = (w + 0.5)/(w - 0.75). */
export function bergstrasserFactor(springIndex: number): number {
  const c = springIndex;
  return (4 * c + 2) / (4 * c - 3);
}

export type StressCorrection = 'bergstrasser' | 'wahl';

export function stressFactor(springIndex: number, correction: StressCorrection): number {
  return correction === 'wahl' ? wahlFactor(springIndex) : bergstrasserFactor(springIndex);
}
