// Material figures at a given wire diameter, read from a loaded catalog record.
import { powerLawStrength, tabulatedStrength } from '../model/strength.js';
import type { Material } from './types.js';

/** Minimum tensile strength (MPa) at wire diameter d (mm). Outside the sourced range the nearest
 * segment is extended; callers flag that through `inStrengthRange`. */
export function tensileStrength(material: Material, d: number): number {
  const s = material.strength;
  if (s.law === 'table') return tabulatedStrength(s.diameters, s.strengths, d);
  let seg = s.segments[0];
  for (const candidate of s.segments) {
    if (d >= candidate.minDiameter) seg = candidate;
  }
  return powerLawStrength(seg.coefficient, seg.exponent, d);
}

export function inStrengthRange(material: Material, d: number): boolean {
  return d >= material.minDiameter * (1 - 1e-9) && d <= material.maxDiameter * (1 + 1e-9);
}

export function moduliAt(material: Material, d: number): { elasticModulus: number; shearModulus: number } {
  for (const band of material.moduli.bands) {
    if (d <= band.maxDiameter * (1 + 1e-9)) return band;
  }
  return material.moduli.bands[material.moduli.bands.length - 1];
}
