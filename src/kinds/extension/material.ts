// The figures of a material as an extension spring uses them: the shared figures at the wire diameter,
// the three static allowables of catalogs/extension.yaml and the loops' fatigue fractions.
import type { MaterialFigures } from '../../model/figures.js';
import type { FiniteLifeTable } from '../../model/fatigue.js';
import { materialFigures, type MaterialChoice } from '../../input/material.js';
import { allowablesFor, type ExtensionCatalog } from './catalog.js';

export interface ExtensionMaterial {
  /** The shared figures (strength, moduli, density, body fatigue data). */
  figures: MaterialFigures;
  /** Static allowables, MPa: body torsion, loop torsion at B, loop bending at A. */
  allowables: { bodyTorsion: number; loopTorsion: number; loopBending: number };
  allowableSource: string;
  loopFatigue: { loopTorsion: FiniteLifeTable; loopBending: FiniteLifeTable; source: string };
  /** The loops' fatigue table is published for these materials only. */
  loopFatigueStated: boolean;
}

/** A user's `allowable_stress` replaces the body's allowable; the loops keep their published fractions. */
export function extensionMaterial(choice: MaterialChoice, wireDiameter: number, catalog: ExtensionCatalog): ExtensionMaterial {
  const figures = materialFigures(choice, wireDiameter, false);
  const a = allowablesFor(catalog, choice.material);
  const sut = figures.tensileStrength;
  return {
    figures,
    allowables: { bodyTorsion: choice.allowableStress ?? a.bodyTorsion * sut, loopTorsion: a.loopTorsion * sut, loopBending: a.loopBending * sut },
    allowableSource: a.source,
    loopFatigue: { loopTorsion: catalog.loopFatigue.loopTorsion, loopBending: catalog.loopFatigue.loopBending, source: catalog.loopFatigue.source },
    loopFatigueStated: catalog.loopFatigue.statedFor.includes(choice.material.id),
  };
}
