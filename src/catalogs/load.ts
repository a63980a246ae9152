// Loading and validating the catalogs. A malformed catalog is rejected with a message naming the
// file, the record and the field, so that a contributor adding a material sees at once what is wrong.
import { readFileSync, existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse as parseYaml } from 'yaml';
import { Fields, isRecord } from '../units/fields.js';
import { InputError } from '../units/parse.js';
import type { Catalog, Family, Material, ModulusBand, StrengthLaw, WireSeries } from './types.js';
import { FAMILIES } from './types.js';
import type { FiniteLifeTable } from '../model/fatigue.js';

export class CatalogError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CatalogError';
  }
}

/** The folder that holds the catalog files, found by walking up from this module. */
export function catalogDirectory(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 6; i++) {
    if (existsSync(join(dir, 'catalogs', 'materials.yaml'))) return join(dir, 'catalogs');
    dir = resolve(dir, '..');
  }
  throw new CatalogError('catalogs/materials.yaml not found beside the coilfront package');
}

function readYaml(file: string): unknown {
  try {
    return parseYaml(readFileSync(file, 'utf8'));
  } catch (e) {
    throw new CatalogError(`${file}: not valid YAML (${(e as Error).message.split('\n')[0]})`);
  }
}

function inRecord<T>(file: string, record: string, body: () => T): T {
  try {
    return body();
  } catch (e) {
    if (e instanceof InputError) throw new CatalogError(`${file}: record ${record}: ${e.message}`);
    throw e;
  }
}

function sourced(f: Fields, key: string, read: (g: Fields) => number): { value: number; source: string } {
  const g = Fields.of(f.require(key, 'a mapping { value, source }'), f.name(key), 'si');
  const value = read(g);
  const source = g.string('source');
  if (!source) throw new InputError(g.name('source'), 'the publication the value comes from (the field is missing)');
  g.rejectUnknown();
  return { value, source };
}

function requireSource(f: Fields): string {
  const s = f.string('source');
  if (!s) throw new InputError(f.name('source'), 'the publication the values come from (the field is missing)');
  return s;
}

function triple(f: Fields, key: string): readonly [number, number, number] {
  const list = f.list(key);
  if (!list || list.length !== 3) throw new InputError(f.name(key), 'a list of three fractions (1e5, 1e6, 1e7 cycles)', f.get(key));
  const out = list.map((v, i) => {
    const n = typeof v === 'number' ? v : NaN;
    if (!(n > 0 && n < 1)) throw new InputError(`${f.name(key)}[${i}]`, 'a fraction between 0 and 1', v);
    return n;
  });
  // The life curve must be non-increasing in cycles (src/model/fatigue.ts relies on it).
  for (let i = 1; i < 3; i++) {
    if (out[i] > out[i - 1]) throw new InputError(`${f.name(key)}[${i}]`, `a fraction at most the one for fewer cycles (${out[i - 1]}): a longer life is never easier`, out[i]);
  }
  return [out[0], out[1], out[2]];
}

function readStrength(f: Fields): { law: StrengthLaw; min: number; max: number } {
  const law = f.choice('law', ['power', 'table'] as const);
  const source = requireSource(f);
  if (law === 'power') {
    const segs = f.list('segments');
    if (!segs || segs.length === 0) throw new InputError(f.name('segments'), 'a non-empty list of { min_diameter, max_diameter, coefficient, exponent }');
    const segments = segs.map((raw, i) => {
      const g = Fields.of(raw, `${f.name('segments')}[${i}]`, 'si');
      const seg = {
        minDiameter: g.requiredQuantity('min_diameter', 'length', { positive: true }),
        maxDiameter: g.requiredQuantity('max_diameter', 'length', { positive: true }),
        coefficient: g.number('coefficient', { positive: true }) ?? NaN,
        exponent: g.number('exponent', { nonNegative: true, max: 1 }) ?? NaN,
      };
      if (Number.isNaN(seg.coefficient)) throw new InputError(g.name('coefficient'), 'A in MPa mm^m (the field is missing)');
      if (Number.isNaN(seg.exponent)) throw new InputError(g.name('exponent'), 'the exponent m (the field is missing)');
      if (seg.maxDiameter <= seg.minDiameter) throw new InputError(g.name('max_diameter'), 'a diameter above min_diameter');
      g.rejectUnknown();
      return seg;
    });
    for (let i = 1; i < segments.length; i++) {
      if (segments[i].minDiameter < segments[i - 1].minDiameter) throw new InputError(`${f.name('segments')}[${i}]`, 'segments in ascending diameter order');
    }
    return { law: { law, segments, source }, min: segments[0].minDiameter, max: segments[segments.length - 1].maxDiameter };
  }
  if (law === 'table') {
    const pts = f.list('points');
    if (!pts || pts.length < 2) throw new InputError(f.name('points'), 'a list of at least two { diameter, tensile_strength }');
    const diameters: number[] = [];
    const strengths: number[] = [];
    pts.forEach((raw, i) => {
      const g = Fields.of(raw, `${f.name('points')}[${i}]`, 'si');
      const d = g.requiredQuantity('diameter', 'length', { positive: true });
      if (diameters.length && d <= diameters[diameters.length - 1]) throw new InputError(g.name('diameter'), 'diameters in ascending order');
      diameters.push(d);
      strengths.push(g.requiredQuantity('tensile_strength', 'stress', { positive: true }));
      g.rejectUnknown();
    });
    return { law: { law, diameters, strengths, source }, min: diameters[0], max: diameters[diameters.length - 1] };
  }
  throw new InputError(f.name('law'), 'power | table (the field is missing)');
}

function readModuli(f: Fields): { bands: ModulusBand[]; source: string } {
  const source = requireSource(f);
  const list = f.list('bands');
  if (!list || list.length === 0) throw new InputError(f.name('bands'), 'a non-empty list of { max_diameter?, elastic_modulus, shear_modulus }');
  const bands = list.map((raw, i) => {
    const g = Fields.of(raw, `${f.name('bands')}[${i}]`, 'si');
    const last = i === list.length - 1;
    const maxDiameter = g.quantity('max_diameter', 'length', { positive: true, required: !last }) ?? Number.MAX_VALUE;
    const elasticModulus = g.requiredQuantity('elastic_modulus', 'stress', { positive: true });
    const shearModulus = g.requiredQuantity('shear_modulus', 'stress', { positive: true });
    if (shearModulus >= elasticModulus) throw new InputError(g.name('shear_modulus'), 'a shear modulus below the elastic modulus');
    g.rejectUnknown();
    return { maxDiameter, elasticModulus, shearModulus };
  });
  return { bands, source };
}

export function parseMaterials(doc: unknown, file: string): Material[] {
  const top = inRecord(file, '(top level)', () => Fields.of(doc, '', 'si'));
  const fatigueClasses = new Map<string, { table: FiniteLifeTable; source: string }>();
  const allowableClasses = new Map<string, { static: number; staticSetRemoved: number; source: string }>();
  (inRecord(file, '(top level)', () => top.list('fatigue_classes')) ?? []).forEach((raw, i) => {
    inRecord(file, `fatigue_classes[${i}]`, () => {
      const f = Fields.of(raw, `fatigue_classes[${i}]`, 'si');
      const id = f.string('id');
      if (!id) throw new InputError(f.name('id'), 'an id');
      f.string('description');
      fatigueClasses.set(id, { table: { unpeened: triple(f, 'unpeened'), peened: triple(f, 'peened') }, source: requireSource(f) });
      f.rejectUnknown();
    });
  });
  (inRecord(file, '(top level)', () => top.list('allowable_classes')) ?? []).forEach((raw, i) => {
    inRecord(file, `allowable_classes[${i}]`, () => {
      const f = Fields.of(raw, `allowable_classes[${i}]`, 'si');
      const id = f.string('id');
      if (!id) throw new InputError(f.name('id'), 'an id');
      const st = f.number('static', { positive: true, max: 1 });
      const sr = f.number('static_set_removed', { positive: true, max: 1 });
      if (st === undefined || sr === undefined) throw new InputError(f.name(st === undefined ? 'static' : 'static_set_removed'), 'a fraction of Sut (the field is missing)');
      allowableClasses.set(id, { static: st, staticSetRemoved: sr, source: requireSource(f) });
      f.rejectUnknown();
    });
  });
  const list = inRecord(file, '(top level)', () => top.list('materials'));
  inRecord(file, '(top level)', () => top.rejectUnknown());
  if (!list || list.length === 0) throw new CatalogError(`${file}: materials: expected a non-empty list`);
  const ids = new Set<string>();
  return list.map((raw, i) => {
    const label = isRecord(raw) && typeof raw.id === 'string' ? raw.id : `materials[${i}]`;
    return inRecord(file, label, () => {
      const f = Fields.of(raw, '', 'si');
      const id = f.string('id');
      if (!id || !/^[a-z0-9][a-z0-9-]*$/.test(id)) throw new InputError('id', 'a lower-case id of letters, digits and dashes', f.get('id'));
      if (ids.has(id)) throw new InputError('id', 'an id not used by another material', id);
      ids.add(id);
      const family = f.choice('family', FAMILIES);
      if (!family) throw new InputError('family', `one of ${FAMILIES.join(' | ')} (the field is missing)`);
      const strengthFields = Fields.of(f.require('strength', 'a strength law'), 'strength', 'si');
      const strength = readStrength(strengthFields);
      const lawIsMinimum = strengthFields.bool('minimum') ?? false;
      strengthFields.rejectUnknown();
      let minimumStrength: Material['minimumStrength'];
      if (f.get('minimum_strength') !== undefined) {
        if (lawIsMinimum) throw new InputError('minimum_strength', 'no separate table when strength.minimum is true');
        const minFields = Fields.of(f.require('minimum_strength', 'a tabulated minimum strength law'), 'minimum_strength', 'si');
        const min = readStrength(minFields);
        minFields.rejectUnknown();
        minimumStrength = { law: min.law, minDiameter: min.min, maxDiameter: min.max, isTheLaw: false };
      } else if (lawIsMinimum) {
        minimumStrength = { law: strength.law, minDiameter: strength.min, maxDiameter: strength.max, isTheLaw: true };
      }
      const moduliFields = Fields.of(f.require('moduli', 'moduli bands'), 'moduli', 'si');
      const moduli = readModuli(moduliFields);
      moduliFields.rejectUnknown();
      const allowId = f.string('allowable_class');
      const allowable = allowId ? allowableClasses.get(allowId) : undefined;
      if (!allowable) throw new InputError('allowable_class', `one of ${[...allowableClasses.keys()].join(' | ')}`, allowId);
      const fatigueId = f.string('fatigue_class');
      const fatigue = fatigueId ? fatigueClasses.get(fatigueId) : undefined;
      if (!fatigue || !fatigueId) throw new InputError('fatigue_class', `one of ${[...fatigueClasses.keys()].join(' | ')}`, fatigueId);
      const zimmerli = f.bool('zimmerli');
      if (zimmerli === undefined) throw new InputError('zimmerli', 'true or false: whether Zimmerli\'s steel endurance data apply (the field is missing)');
      const material: Material = {
        id,
        name: f.string('name') ?? id,
        standard: f.string('standard') ?? '',
        family: family as Family,
        source: requireSource(f),
        strength: strength.law,
        minDiameter: strength.min,
        maxDiameter: strength.max,
        // Only where one exists: the pre-built JSON catalog must equal this record exactly.
        ...(minimumStrength ? { minimumStrength } : {}),
        moduli,
        density: sourced(f, 'density', (g) => g.requiredQuantity('value', 'density', { positive: true })),
        allowable,
        fatigue: { classId: fatigueId, table: fatigue.table, zimmerli, source: fatigue.source },
        maxTemperature: sourced(f, 'max_temperature', (g) => g.requiredQuantity('value', 'temperature')),
        relativeCost: sourced(f, 'relative_cost', (g) => g.number('value', { positive: true }) ?? NaN),
        wireSeries: f.string('wire_series') ?? 'metric',
      };
      if (Number.isNaN(material.relativeCost.value)) throw new InputError('relative_cost.value', 'a positive number (the field is missing)');
      f.rejectUnknown();
      return material;
    });
  });
}

export function parseSeries(doc: unknown, file: string): WireSeries[] {
  const top = inRecord(file, '(top level)', () => Fields.of(doc, '', 'si'));
  const list = inRecord(file, '(top level)', () => top.list('series'));
  inRecord(file, '(top level)', () => top.rejectUnknown());
  if (!list || list.length === 0) throw new CatalogError(`${file}: series: expected a non-empty list`);
  return list.map((raw, i) => {
    const label = isRecord(raw) && typeof raw.id === 'string' ? raw.id : `series[${i}]`;
    return inRecord(file, label, () => {
      const f = Fields.of(raw, '', 'si');
      const id = f.string('id');
      if (!id) throw new InputError('id', 'an id');
      const unit = f.choice('unit', ['mm', 'in'] as const);
      if (!unit) throw new InputError('unit', 'mm | in (the field is missing)');
      const system = unit === 'in' ? 'us' : 'si';
      const series: WireSeries = { id, name: f.string('name') ?? id, source: requireSource(f), diameters: [] };
      const plain = f.list('diameters');
      const gauges = f.list('gauges');
      if (plain && gauges) throw new InputError('diameters, gauges', 'only one of diameters | gauges');
      if (plain) {
        series.diameters = plain.map((v, j) => {
          if (typeof v !== 'number') throw new InputError(`diameters[${j}]`, 'a number', v);
          return Fields.of({ v }, `diameters[${j}]`, system).requiredQuantity('v', 'length', { positive: true });
        });
      } else if (gauges) {
        series.labels = [];
        series.diameters = gauges.map((raw2, j) => {
          const g = Fields.of(raw2, `gauges[${j}]`, system);
          series.labels!.push(g.string('gauge') ?? String(j));
          const d = g.requiredQuantity('diameter', 'length', { positive: true });
          g.rejectUnknown();
          return d;
        });
        // Gauges run from thick to thin; keep diameters ascending with their labels.
        const order = series.diameters.map((_, j) => j).sort((a, b) => series.diameters[a] - series.diameters[b]);
        series.diameters = order.map((j) => series.diameters[j]);
        series.labels = order.map((j) => series.labels![j]);
      } else {
        throw new InputError('diameters', 'a list of wire diameters (the field is missing)');
      }
      for (let j = 1; j < series.diameters.length; j++) {
        if (series.diameters[j] <= series.diameters[j - 1]) throw new InputError(`diameters[${j}]`, 'diameters in ascending order without repeats', series.diameters[j]);
      }
      f.rejectUnknown();
      return series;
    });
  });
}

let cached: Catalog | undefined;

/** The file the build writes beside the built module: the catalog already read from the YAML and
 * validated by this module (scripts/build.mjs), so a run pays neither the YAML parser nor the
 * validation. Running from source there is no such file, and the YAML is read as below. */
export const PREBUILT_CATALOG = 'catalog.json';

function readPrebuilt(): Catalog | undefined {
  let text: string;
  try {
    text = readFileSync(fileURLToPath(new URL(PREBUILT_CATALOG, import.meta.url)), 'utf8');
  } catch {
    return undefined;
  }
  return JSON.parse(text) as Catalog;
}

/** The catalog: the pre-validated build output when there is one, else the YAML of `directory`
 * (default the package's catalogs/ folder), read and validated. */
export function loadCatalog(directory?: string): Catalog {
  if (directory === undefined || directory === catalogDirectory()) {
    cached ??= (directory === undefined ? readPrebuilt() : undefined) ?? loadCatalogFromYaml(catalogDirectory());
    return cached;
  }
  return loadCatalogFromYaml(directory);
}

/** Read and validate the YAML catalogs of `directory`: the source of truth, and the one validator
 * (the build runs it to write the pre-validated JSON). */
export function loadCatalogFromYaml(directory: string): Catalog {
  const mFile = join(directory, 'materials.yaml');
  const sFile = join(directory, 'wire-series.yaml');
  const catalog: Catalog = {
    materials: parseMaterials(readYaml(mFile), 'catalogs/materials.yaml'),
    series: parseSeries(readYaml(sFile), 'catalogs/wire-series.yaml'),
  };
  for (const m of catalog.materials) {
    if (!catalog.series.some((s) => s.id === m.wireSeries)) {
      throw new CatalogError(`catalogs/materials.yaml: record ${m.id}: wire_series: expected one of ${catalog.series.map((s) => s.id).join(' | ')}, got "${m.wireSeries}"`);
    }
  }
  return catalog;
}

export function findMaterial(catalog: Catalog, id: string): Material | undefined {
  return catalog.materials.find((m) => m.id === id);
}

export function findSeries(catalog: Catalog, id: string): WireSeries | undefined {
  return catalog.series.find((s) => s.id === id);
}
