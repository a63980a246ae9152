// The table's own material words and the catalog ids they stand for: a stock table says "302 SS" or
// "Music wire", the catalog says stainless-302 and music-wire. `material_map` in the requirements
// maps one to the other; a word that is a catalog id needs no entry.
import type { Catalog } from '../catalogs/types.js';
import { isRecord } from '../units/fields.js';
import { lookupMaterial } from '../input/material.js';
import { InputError } from '../units/parse.js';

export type MaterialMap = Map<string, string>;

export function materialKey(word: string): string {
  return word.trim().toLowerCase().replace(/\s+/g, ' ');
}

/** Read `material_map` from a requirements document (absent: an empty map). */
export function readMaterialMap(rawRequirements: unknown, catalog: Catalog): MaterialMap {
  const map: MaterialMap = new Map();
  const raw = isRecord(rawRequirements) ? rawRequirements.material_map : undefined;
  if (raw === undefined || raw === null) return map;
  if (!isRecord(raw))
    throw new InputError('material_map', 'a mapping from the table\'s material words to catalog ids, such as { "302 SS": stainless-302 }', raw);
  for (const [word, id] of Object.entries(raw)) {
    const key = materialKey(word);
    if (map.has(key)) throw new InputError(`material_map.${word}`, 'each material word once (it differs from another only in case or spaces)');
    map.set(key, lookupMaterial(catalog, id, `material_map.${word}`).id);
  }
  return map;
}

/** The catalog id of a table's material word, or undefined when neither the map nor the catalog knows it. */
export function resolveMaterial(word: string, map: MaterialMap, catalog: Catalog): string | undefined {
  const key = materialKey(word);
  return map.get(key) ?? catalog.materials.find((m) => m.id === key)?.id;
}
