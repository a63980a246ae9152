// A material as the user names it: a catalog id, or an override object { like: <id>, ... } whose
// figures replace the catalog's. Resolved to the numbers the model needs at a given wire diameter.
import { findMaterial } from '../catalogs/load.js';
import { inStrengthRange, moduliAt, tensileStrength } from '../catalogs/properties.js';
import type { Catalog, Material } from '../catalogs/types.js';
import type { MaterialFigures } from '../model/figures.js';
import { staticAllowable } from '../model/strength.js';
import { InputError } from '../units/parse.js';
import { formatQuantity } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import { Fields, isRecord } from '../units/fields.js';

/** Which tensile strength the figures use: the published law of the catalog (default), or the wire
 * standard's tabulated minimum where the catalog holds one. */
export const STRENGTH_BASES = ['law', 'minimum'] as const;
export type StrengthBasis = (typeof STRENGTH_BASES)[number];

export interface MaterialChoice {
  /** The catalog record; with strength basis 'minimum' its strength law is the tabulated minimum. */
  material: Material;
  /** 'law' when absent. */
  strengthBasis?: StrengthBasis;
  shearModulus?: number;
  elasticModulus?: number;
  density?: number;
  tensileStrength?: number;
  allowableStress?: number;
}

export function lookupMaterial(catalog: Catalog, id: unknown, field: string): Material {
  const known = catalog.materials.map((m) => m.id).join(' | ');
  if (typeof id !== 'string') throw new InputError(field, `a material id (${known})`, id);
  const m = findMaterial(catalog, id);
  if (!m) throw new InputError(field, `a known material (${known})`, id);
  return m;
}

export function parseMaterialChoice(raw: unknown, system: UnitSystem, catalog: Catalog, field: string): MaterialChoice {
  if (!isRecord(raw)) return { material: lookupMaterial(catalog, raw, field) };
  const f = Fields.of(raw, field, system);
  const choice: MaterialChoice = {
    material: lookupMaterial(catalog, f.require('like', 'the catalog material this one is like'), f.name('like')),
    shearModulus: f.quantity('shear_modulus', 'stress', { positive: true }),
    elasticModulus: f.quantity('elastic_modulus', 'stress', { positive: true }),
    density: f.quantity('density', 'density', { positive: true }),
    tensileStrength: f.quantity('tensile_strength', 'stress', { positive: true }),
    allowableStress: f.quantity('allowable_stress', 'stress', { positive: true }),
  };
  f.rejectUnknown();
  return choice;
}

/**
 * Apply a strength basis to chosen materials. 'minimum' swaps each record's strength law for the
 * tabulated minimum of its standard (ASTM A228 for music wire; EN 10270-1 DM, whose law already is
 * the lower bound), so that every figure, range check and bound reads that one law. A material with
 * no tabulated minimum is an input error naming the field: the tool never silently keeps the law.
 */
export function applyStrengthBasis(choices: MaterialChoice[], basis: StrengthBasis, field: string, catalog?: Catalog): MaterialChoice[] {
  if (basis === 'law') return choices.map((c) => ({ ...c, strengthBasis: 'law' }));
  return choices.map((c) => {
    const m = c.material;
    const min = m.minimumStrength;
    if (!min) {
      const having = (catalog?.materials ?? []).filter((x) => x.minimumStrength).map((x) => x.id);
      throw new InputError(
        field,
        `"law" for ${m.id}, which has only its published law (strength_basis: minimum needs the tabulated minimum tensile strength of the wire's standard; the catalog holds one for ${having.length ? having.join(', ') : 'some materials'}: choose those materials, or keep the law)`,
        basis,
      );
    }
    return { ...c, strengthBasis: 'minimum', material: { ...m, strength: min.law, minDiameter: min.minDiameter, maxDiameter: min.maxDiameter } };
  });
}

/** One line for a search's outputs: the basis and, per material, its source. */
export function strengthBasisSummary(choices: MaterialChoice[]): string {
  const basis = choices.some((c) => c.strengthBasis === 'minimum') ? 'tabulated minimum (strength_basis: minimum)' : 'published law (strength_basis: law)';
  const sources = [...new Map(choices.map((c) => [c.material.id, strengthBasisOf(c).source])).entries()].map(([id, s]) => `${id}: ${s}`);
  return `tensile strength: ${basis}; ${sources.join('; ')}`;
}

/** The strength the figures use and where it comes from, as the outputs state it. */
export function strengthBasisOf(choice: MaterialChoice): { basis: StrengthBasis | 'given'; source: string } {
  if (choice.tensileStrength !== undefined) return { basis: 'given', source: 'tensile_strength given in the input' };
  return { basis: choice.strengthBasis ?? 'law', source: choice.material.strength.source };
}

/**
 * Where the published law is shown and the catalog also holds the standard's tabulated minimum: how far
 * the law runs above that minimum at wire diameter d (a fraction), and the minimum's source.
 */
export function lawAboveMinimum(choice: MaterialChoice, d: number): { minimum: number; excess: number; source: string } | undefined {
  const m = choice.material;
  const min = m.minimumStrength;
  if (!min || choice.tensileStrength !== undefined || (choice.strengthBasis ?? 'law') !== 'law' || min.isTheLaw) return undefined;
  if (d < min.minDiameter * (1 - 1e-9) || d > min.maxDiameter * (1 + 1e-9)) return undefined;
  const minimum = tensileStrength({ ...m, strength: min.law }, d);
  return { minimum, excess: tensileStrength(m, d) / minimum - 1, source: min.law.source };
}

/** The model's material figures at wire diameter d (mm). */
export function materialFigures(choice: MaterialChoice, d: number, setRemoved: boolean): MaterialFigures {
  const m = choice.material;
  const moduli = moduliAt(m, d);
  const sut = choice.tensileStrength ?? tensileStrength(m, d);
  const fraction = setRemoved ? m.allowable.staticSetRemoved : m.allowable.static;
  return {
    tensileStrength: sut,
    allowableStress: choice.allowableStress ?? staticAllowable(sut, fraction),
    shearModulus: choice.shearModulus ?? moduli.shearModulus,
    elasticModulus: choice.elasticModulus ?? moduli.elasticModulus,
    density: choice.density ?? m.density.value,
    zimmerli: m.fatigue.zimmerli,
    finiteLife: m.fatigue.table,
    maxTemperature: m.maxTemperature.value,
  };
}

/** The note on a wire outside the diameters its material's strength is sourced for, in the unit system
 * of the file that gave the wire (a US spring file reads inches). An existing spring is analysed with it:
 * a warning, not a refusal (a requirements file's wire_sizes are refused instead: readers.ts). */
export function strengthRangeNote(choice: MaterialChoice, d: number, system: UnitSystem = 'si'): string | undefined {
  if (choice.tensileStrength !== undefined || inStrengthRange(choice.material, d)) return undefined;
  const L = (v: number) => formatQuantity(v, 'length', system);
  return `wire diameter ${L(d)} is outside the sourced strength range of ${choice.material.id} (${L(choice.material.minDiameter)} to ${L(choice.material.maxDiameter)}): the strength law is extrapolated`;
}
