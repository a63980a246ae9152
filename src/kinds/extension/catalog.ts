// catalogs/extension.yaml: the extension-spring data, validated when loaded. A malformed record is
// refused with a message naming the file, the record and the field, as for the material catalog.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse as parseYaml } from 'yaml';
import { CatalogError, catalogDirectory } from '../../catalogs/load.js';
import { FAMILIES, type Family, type Material } from '../../catalogs/types.js';
import type { FiniteLifeTable } from '../../model/fatigue.js';
import { Fields, isRecord } from '../../units/fields.js';
import { InputError } from '../../units/parse.js';

export interface StaticAllowables {
  id: string;
  families: Family[];
  /** Fractions of Sut. */
  bodyTorsion: number;
  loopTorsion: number;
  loopBending: number;
  source: string;
}

export interface LoopFatigue {
  /** Fractions of Sut at 1e5, 1e6, 1e7 cycles, unpeened (the same in the peened slot: no peened data). */
  loopTorsion: FiniteLifeTable;
  loopBending: FiniteLifeTable;
  statedFor: string[];
  source: string;
}

export interface LoopRule {
  id: string;
  /** Inside height of the loop as a fraction of the inner diameter. */
  innerHeight: number;
  /** Wire in the loop, in coils of the mean diameter. */
  wireCoils: number;
  needsLength: boolean;
  source: string;
}

export interface ExtensionCatalog {
  allowables: StaticAllowables[];
  loopFatigue: LoopFatigue;
  loopTypes: LoopRule[];
  bendIndex: { value: number; source: string };
}

const FILE = 'catalogs/extension.yaml';

function inRecord<T>(record: string, body: () => T): T {
  try {
    return body();
  } catch (e) {
    if (e instanceof InputError) throw new CatalogError(`${FILE}: record ${record}: ${e.message}`);
    throw e;
  }
}

function source(f: Fields): string {
  const s = f.string('source');
  if (!s) throw new InputError(f.name('source'), 'the publication the values come from (the field is missing)');
  return s;
}

function fraction(f: Fields, key: string, max = 1): number {
  const v = f.number(key, { positive: true, max });
  if (v === undefined) throw new InputError(f.name(key), 'a fraction of Sut (the field is missing)');
  return v;
}

function falling(f: Fields, key: string): FiniteLifeTable {
  const list = f.list(key);
  if (!list || list.length !== 3) throw new InputError(f.name(key), 'a list of three fractions (1e5, 1e6, 1e7 cycles)', f.get(key));
  const v = list.map((x, i) => {
    if (typeof x !== 'number' || !(x > 0 && x < 1)) throw new InputError(`${f.name(key)}[${i}]`, 'a fraction between 0 and 1', x);
    return x;
  });
  // A longer life is never easier.
  if (!(v[0] >= v[1] && v[1] >= v[2])) throw new InputError(f.name(key), 'fractions that do not rise with the cycle count', list);
  const t = [v[0], v[1], v[2]] as const;
  return { unpeened: t, peened: t };
}

export function parseExtensionCatalog(doc: unknown, materials: readonly Material[] = []): ExtensionCatalog {
  const top = inRecord('(top level)', () => Fields.of(doc, '', 'si'));
  const covered = new Map<Family, string>();
  const allowables = (inRecord('(top level)', () => top.list('static_allowables')) ?? []).map((raw, i) => {
    const label = isRecord(raw) && typeof raw.id === 'string' ? raw.id : `static_allowables[${i}]`;
    return inRecord(label, () => {
      const f = Fields.of(raw, `static_allowables[${i}]`, 'si');
      const id = f.string('id');
      if (!id) throw new InputError(f.name('id'), 'an id (the field is missing)');
      const fams = f.list('families');
      if (!fams || fams.length === 0) throw new InputError(f.name('families'), `a non-empty list of ${FAMILIES.join(' | ')}`);
      const families = fams.map((x, j) => {
        if (typeof x !== 'string' || !(FAMILIES as readonly string[]).includes(x))
          throw new InputError(`${f.name('families')}[${j}]`, `one of ${FAMILIES.join(' | ')}`, x);
        if (covered.has(x as Family)) throw new InputError(`${f.name('families')}[${j}]`, `a family not already covered by ${covered.get(x as Family)}`, x);
        covered.set(x as Family, id);
        return x as Family;
      });
      const a: StaticAllowables = {
        id,
        families,
        bodyTorsion: fraction(f, 'body_torsion'),
        loopTorsion: fraction(f, 'loop_torsion'),
        loopBending: fraction(f, 'loop_bending'),
        source: source(f),
      };
      f.rejectUnknown();
      return a;
    });
  });
  const missing = FAMILIES.filter((fam) => !covered.has(fam));
  if (missing.length) throw new CatalogError(`${FILE}: static_allowables: expected every material family to be covered, missing ${missing.join(', ')}`);

  const loopFatigue = inRecord('loop_fatigue', () => {
    const f = Fields.of(top.require('loop_fatigue', "the loops' fatigue fractions"), 'loop_fatigue', 'si');
    const statedFor = (f.list('stated_for') ?? []).map((x, j) => {
      if (typeof x !== 'string') throw new InputError(`loop_fatigue.stated_for[${j}]`, 'a material id', x);
      if (materials.length && !materials.some((m) => m.id === x))
        throw new InputError(`loop_fatigue.stated_for[${j}]`, `a material of catalogs/materials.yaml (${materials.map((m) => m.id).join(' | ')})`, x);
      return x;
    });
    const lf: LoopFatigue = { loopTorsion: falling(f, 'loop_torsion'), loopBending: falling(f, 'loop_bending'), statedFor, source: source(f) };
    f.rejectUnknown();
    return lf;
  });

  const ids = new Set<string>();
  const loopTypes = (inRecord('(top level)', () => top.list('loop_types')) ?? []).map((raw, i) => {
    const label = isRecord(raw) && typeof raw.id === 'string' ? raw.id : `loop_types[${i}]`;
    return inRecord(label, () => {
      const f = Fields.of(raw, `loop_types[${i}]`, 'si');
      const id = f.string('id');
      if (!id || !/^[a-z][a-z0-9-]*$/.test(id)) throw new InputError(f.name('id'), 'a lower-case id of letters, digits and dashes', f.get('id'));
      if (ids.has(id)) throw new InputError(f.name('id'), 'an id not used by another loop type', id);
      ids.add(id);
      const needsLength = f.bool('needs_length');
      if (needsLength === undefined) throw new InputError(f.name('needs_length'), 'true or false (the field is missing)');
      const rule: LoopRule = { id, innerHeight: fraction(f, 'inner_height', 2), wireCoils: fraction(f, 'wire_coils', 2), needsLength, source: source(f) };
      f.rejectUnknown();
      return rule;
    });
  });
  if (!loopTypes.some((t) => t.id === 'full')) throw new CatalogError(`${FILE}: loop_types: expected a record with id full (the default loop)`);

  const bendIndex = inRecord('bend_index', () => {
    const f = Fields.of(top.require('bend_index', 'the default bend index { default, source }'), 'bend_index', 'si');
    const value = f.number('default', { min: 1.5, max: 50 });
    if (value === undefined) throw new InputError(f.name('default'), 'a bend index C2 = 2 r2 / d (the field is missing)');
    const b = { value, source: source(f) };
    f.rejectUnknown();
    return b;
  });
  inRecord('(top level)', () => top.rejectUnknown());
  return { allowables, loopFatigue, loopTypes, bendIndex };
}

let cached: ExtensionCatalog | undefined;

/** The file the build writes beside this module (and beside the CLI bundle): the catalog already
 * validated, as JSON (scripts/build.mjs), so a run does not parse and check the YAML again. */
export const PREBUILT_EXTENSION_CATALOG = 'extension-catalog.json';

function readPrebuilt(): ExtensionCatalog | undefined {
  try {
    return JSON.parse(readFileSync(fileURLToPath(new URL(PREBUILT_EXTENSION_CATALOG, import.meta.url)), 'utf8')) as ExtensionCatalog;
  } catch {
    return undefined;
  }
}

/** Read and validate catalogs/extension.yaml of a folder against its materials: the source of truth,
 * and the one validator (the build runs it to write the pre-validated JSON). */
export function loadExtensionCatalogFromYaml(directory: string, materials: readonly Material[] = []): ExtensionCatalog {
  const file = join(directory, 'extension.yaml');
  let doc: unknown;
  try {
    doc = parseYaml(readFileSync(file, 'utf8'));
  } catch (e) {
    throw new CatalogError(`${FILE}: not readable YAML (${(e as Error).message.split('\n')[0]})`);
  }
  return parseExtensionCatalog(doc, materials);
}

/** The extension catalog beside the material catalog: the build's pre-validated JSON when there is
 * one, else the YAML, checked against the materials. */
export function loadExtensionCatalog(materials: readonly Material[] = []): ExtensionCatalog {
  cached ??= readPrebuilt() ?? loadExtensionCatalogFromYaml(catalogDirectory(), materials);
  return cached;
}

export function allowablesFor(catalog: ExtensionCatalog, material: Material): StaticAllowables {
  // Every family is covered: checked when the catalog was loaded.
  return catalog.allowables.find((a) => a.families.includes(material.family))!;
}

export function loopRule(catalog: ExtensionCatalog, id: string): LoopRule | undefined {
  return catalog.loopTypes.find((t) => t.id === id);
}
