// Checks on a material override that no single field can make alone: figures that contradict each other.
// For an isotropic metal E = 2G(1 + nu) with Poisson's ratio nu between 0 and 0.5, so E lies between 2G
// and 3G (spring steels: nu about 0.3, E/G about 2.6; common practice). Outside that the buckling
// formula, which uses E/G, computes from figures no wire has.
import { moduliAt, tensileStrength } from '../catalogs/properties.js';
import { formatQuantity } from '../units/format.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import type { MaterialChoice } from './material.js';

export function checkMaterialChoice(choice: MaterialChoice, field: string, system: UnitSystem, diameters?: number[]): void {
  const m = choice.material;
  if (choice.elasticModulus === undefined && choice.shearModulus === undefined && choice.allowableStress === undefined) return;
  for (const d of diameters ?? [m.minDiameter, m.maxDiameter]) {
    const moduli = moduliAt(m, d);
    const E = choice.elasticModulus ?? moduli.elasticModulus;
    const G = choice.shearModulus ?? moduli.shearModulus;
    if (!(E >= 2 * G && E <= 3 * G)) {
      const blame = choice.elasticModulus !== undefined ? 'elastic_modulus' : 'shear_modulus';
      throw new InputError(
        `${field}.${blame}`,
        `moduli with E between 2G and 3G (Poisson's ratio 0 to 0.5); here E = ${formatQuantity(E, 'stress', system)} and G = ${formatQuantity(G, 'stress', system)}`,
      );
    }
    if (choice.allowableStress !== undefined) {
      const sut = choice.tensileStrength ?? tensileStrength(m, d);
      if (choice.tensileStrength !== undefined && choice.allowableStress >= sut) {
        throw new InputError(
          `${field}.allowable_stress`,
          `a shear stress below the tensile strength ${formatQuantity(sut, 'stress', system)}`,
          formatQuantity(choice.allowableStress, 'stress', system),
        );
      }
    }
  }
}
