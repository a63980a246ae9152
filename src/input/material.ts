// A material as the user names it: a catalog id, or an override object { like: <id>, ... } whose
// figures replace the catalog's. Resolved to the numbers the model needs at a given wire diameter.
import { findMaterial } from '../catalogs/load.js';
import { inStrengthRange, moduliAt, tensileStrength } from '../catalogs/properties.js';
import type { Catalog, Material } from '../catalogs/types.js';
import type { MaterialFigures } from '../model/analysis.js';
import { staticAllowable } from '../model/strength.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { Fields, isRecord } from './fields.js';

export interface MaterialChoice {
  material: Material;
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

export function strengthRangeNote(choice: MaterialChoice, d: number): string | undefined {
  if (choice.tensileStrength !== undefined || inStrengthRange(choice.material, d)) return undefined;
  return `wire diameter ${d.toPrecision(3)} mm is outside the sourced strength range of ${choice.material.id} (${choice.material.minDiameter} to ${choice.material.maxDiameter} mm): the strength law is extrapolated`;
}
