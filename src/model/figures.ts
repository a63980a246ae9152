// What the wire mechanics of every spring kind read about a material at one wire diameter, and the
// shape of a warning any analysis gives.
import type { FiniteLifeTable } from './fatigue.js';

/** Material figures at this wire diameter. */
export interface MaterialFigures {
  tensileStrength: number;
  /** Static torsional allowable (MPa), already chosen with or without set removal. */
  allowableStress: number;
  shearModulus: number;
  elasticModulus: number;
  density: number;
  /** Zimmerli's data apply (spring steels); otherwise the 1e7 row of the finite-life table is the endurance. */
  zimmerli: boolean;
  finiteLife: FiniteLifeTable;
  maxTemperature: number;
}

/** A rule of thumb an analysis flags (a code for machines, a sentence for people). */
export interface Warning {
  code: string;
  message: string;
}
