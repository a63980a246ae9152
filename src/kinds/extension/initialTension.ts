// Initial tension: the force wound into the closed coils, which the spring carries before it starts to
// extend. Its stress tau_i = K 8 Fi D / (pi d^3) has a preferred range that falls with the index
// (Budynas and Nisbett, Shigley's Mechanical Engineering Design, eq. 10-41, after spring makers' data):
//   tau_i = 33500 / exp(0.105 C) +- 1000 (4 - (C - 3) / 6.5)   psi.
// Above the band a coiler can hardly wind it; below it the initial tension is hard to hold to tolerance.
import { PSI_MPA } from '../../units/kinds.js';

export interface InitialTensionBand {
  low: number;
  middle: number;
  high: number;
}

/** The middle of the preferred range of tau_i (MPa) at spring index C. */
export function initialTensionMiddle(springIndex: number): number {
  return (33500 / Math.exp(0.105 * springIndex)) * PSI_MPA;
}

/** Half the width of the preferred range (MPa); it narrows as the index grows. */
export function initialTensionHalfWidth(springIndex: number): number {
  return Math.max(0, 1000 * (4 - (springIndex - 3) / 6.5)) * PSI_MPA;
}

/** The preferred range of tau_i (MPa) at spring index C. */
export function initialTensionBand(springIndex: number): InitialTensionBand {
  const middle = initialTensionMiddle(springIndex);
  const half = initialTensionHalfWidth(springIndex);
  return { low: middle - half, middle, high: middle + half };
}

export type InitialTensionPosition = 'inside' | 'above' | 'below';

export function initialTensionPosition(stress: number, band: InitialTensionBand): InitialTensionPosition {
  if (stress > band.high) return 'above';
  if (stress < band.low) return 'below';
  return 'inside';
}

/**
 * The range a design may use. `preferred`: the band. `makeable`: from zero up to the band's top: a
 * spring below the band can be wound, only its initial tension is hard to hold (Shigley's reading of
 * the band); above it the coiler cannot wind it.
 */
export type InitialTensionRange = 'preferred' | 'makeable';
export const INITIAL_TENSION_RANGES: readonly InitialTensionRange[] = ['preferred', 'makeable'];
