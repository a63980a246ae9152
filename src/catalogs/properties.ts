// Material figures at a given wire diameter, read from a loaded catalog record.
import { powerLawStrength, tabulatedStrength } from '../model/strength.js';
import type { Material } from './types.js';

/** The piece of the strength law that holds at wire diameter d: the power-law segment (the last one
 * starting at or below d; the first below its range), or the table interval d falls in. */
export function strengthPiece(material: Material, d: number): number {
  const s = material.strength;
  if (s.law === 'table') return s.diameters.findIndex((_, i) => i === s.diameters.length - 1 || d < s.diameters[i + 1]);
  let piece = 0;
  s.segments.forEach((seg, i) => { if (d >= seg.minDiameter) piece = i; });
  return piece;
}

/** Minimum tensile strength (MPa) at wire diameter d (mm). Outside the sourced range the nearest
 * segment is extended; callers flag that through `inStrengthRange`. */
export function tensileStrength(material: Material, d: number): number {
  const s = material.strength;
  if (s.law === 'table') return tabulatedStrength(s.diameters, s.strengths, d);
  const seg = s.segments[strengthPiece(material, d)];
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
