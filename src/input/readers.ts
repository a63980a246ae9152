// The requirement fields every spring kind reads the same way: the materials to try, the wire sizes to
// try, the safety factors, and a [low, high] range. One reader each, so a rule added for one kind (a
// material override whose moduli contradict each other, a wire size no chosen material is made in, a
// safety factor below 1) holds for every kind.
import { findSeries } from '../catalogs/load.js';
import { inStrengthRange } from '../catalogs/properties.js';
import { FAMILIES, type Catalog } from '../catalogs/types.js';
import { formatQuantity } from '../units/format.js';
import { InputError, parseNumber, parseQuantity } from '../units/parse.js';
import { Fields, isRecord } from '../units/fields.js';
import { LIMITS } from './limits.js';
import { parseMaterialChoice, type MaterialChoice } from './material.js';
import { checkMaterialChoice } from './materialChecks.js';

/** `material`: an id, a list of ids, a family, "any", or an override object; each override checked
 * for figures that contradict each other. */
export function readMaterials(f: Fields, catalog: Catalog): MaterialChoice[] {
  const raw = f.require('material', `a material id, a list of ids, { family: ${FAMILIES.join(' | ')} }, "any", or { like: <id>, ... }`);
  let materials: MaterialChoice[];
  if (raw === 'any') materials = catalog.materials.map((material) => ({ material }));
  else if (Array.isArray(raw)) {
    if (raw.length === 0) throw new InputError('material', 'a non-empty list of material ids');
    materials = raw.map((id, i) => parseMaterialChoice(id, f.system, catalog, `material[${i}]`));
  } else if (isRecord(raw) && 'family' in raw) {
    const g = Fields.of(raw, 'material', f.system);
    const fam = g.choice('family', [...FAMILIES, 'any'] as const);
    g.rejectUnknown();
    materials = catalog.materials.filter((m) => fam === 'any' || m.family === fam).map((material) => ({ material }));
  } else materials = [parseMaterialChoice(raw, f.system, catalog, 'material')];
  materials.forEach((m, i) => checkMaterialChoice(m, Array.isArray(raw) ? `material[${i}]` : 'material', f.system));
  return materials;
}

export interface WireSizes {
  /** Per material: the wire diameters to try (mm), smallest first. */
  wireSizes: (m: MaterialChoice) => number[];
  /** In words, for reports ("each material's own series", a series id, "the listed diameters"). */
  label: string;
}

/** `wire_sizes`: a series id for every material, a list of diameters, or (absent) each material's own
 * series. */
export function readWireSizes(f: Fields, catalog: Catalog): WireSizes {
  const raw = f.get('wire_sizes');
  let sizes: WireSizes;
  if (raw === undefined) sizes = { wireSizes: (m) => findSeries(catalog, m.material.wireSeries)!.diameters, label: "each material's own series" };
  else if (typeof raw === 'string') {
    const series = findSeries(catalog, raw);
    if (!series) throw new InputError('wire_sizes', `a wire series (${catalog.series.map((s) => s.id).join(' | ')}) or a list of diameters`, raw);
    sizes = { wireSizes: () => series.diameters, label: series.id };
  } else if (Array.isArray(raw)) {
    if (raw.length === 0) throw new InputError('wire_sizes', 'a non-empty list of diameters');
    const list = raw.map((v, i) => parseQuantity(v, 'length', f.system, `wire_sizes[${i}]`, { positive: true })).sort((a, b) => a - b);
    sizes = { wireSizes: () => list, label: 'the listed diameters' };
  } else throw new InputError('wire_sizes', 'a wire series id or a list of diameters', raw);
  return sizes;
}

/** Every listed wire size must be one some chosen material is made in (its sourced strength range), and
 * a series must hold at least one: otherwise the search would quietly try nothing. */
export function checkWireSizes(f: Fields, materials: MaterialChoice[], { wireSizes }: WireSizes): void {
  const raw = f.get('wire_sizes');
  const system = f.system;
  const fits = (m: MaterialChoice, d: number) => m.tensileStrength !== undefined || inStrengthRange(m.material, d);
  const ranges = () =>
    materials
      .map(
        (m) =>
          `${m.material.id} ${formatQuantity(m.material.minDiameter, 'length', system, 3)} to ${formatQuantity(m.material.maxDiameter, 'length', system, 3)}`,
      )
      .filter((v, i, a) => a.indexOf(v) === i)
      .slice(0, 6)
      .join('; ');
  if (Array.isArray(raw)) {
    for (const d of wireSizes(materials[0])) {
      if (!materials.some((m) => fits(m, d))) {
        const i = raw.findIndex((v) => {
          try {
            return parseQuantity(v, 'length', system, 'x') === d;
          } catch {
            return false;
          }
        });
        throw new InputError(`wire_sizes[${Math.max(0, i)}]`, `a diameter the chosen material is made in (${ranges()})`, raw[i]);
      }
    }
    return;
  }
  if (!materials.some((m) => wireSizes(m).some((d) => fits(m, d)))) {
    throw new InputError('wire_sizes', `a series with sizes the chosen material is made in (${ranges()})`, raw ?? "each material's own series");
  }
}

export interface SafetyFactors {
  static: number;
  fatigue: number;
  surge: number;
}

/** `safety: { static, fatigue, surge }`, each defaulting to the kind's own; never below 1 (LIMITS.safetyMin). */
export function readSafety(f: Fields, defaults: SafetyFactors): SafetyFactors {
  const safety = { ...defaults };
  const raw = f.get('safety');
  if (raw === undefined || raw === null) return safety;
  const sf = Fields.of(raw, 'safety', f.system);
  safety.static = sf.number('static', { min: LIMITS.safetyMin, max: LIMITS.safetyMax }) ?? safety.static;
  safety.fatigue = sf.number('fatigue', { min: LIMITS.safetyMin, max: LIMITS.safetyMax }) ?? safety.fatigue;
  safety.surge = sf.number('surge', { min: LIMITS.safetyMin, max: LIMITS.surgeMarginMax }) ?? safety.surge;
  sf.rejectUnknown();
  return safety;
}

/** A `[low, high]` pair of plain numbers (coil counts, spring index), each within `rule`. */
export function readRange(f: Fields, key: string, fallback: [number, number], rule: Parameters<typeof parseNumber>[2]): [number, number] {
  const list = f.list(key);
  if (!list) return fallback;
  if (list.length !== 2) throw new InputError(f.name(key), 'a list of two numbers [low, high]', f.get(key));
  const a = parseNumber(list[0], `${f.name(key)}[0]`, rule);
  const b = parseNumber(list[1], `${f.name(key)}[1]`, rule);
  if (!(b >= a)) throw new InputError(f.name(key), '[low, high] with high at or above low', f.get(key));
  return [a, b];
}

/** A `[low, high]` range of coil counts (compression `active_coils`, extension `body_coils`), within
 * LIMITS.activeCoils. */
export function readCoilRange(f: Fields, key: string, fallback: [number, number]): [number, number] {
  return readRange(f, key, fallback, { min: LIMITS.activeCoils[0], max: LIMITS.activeCoils[1] });
}

/** `coil_step`: the coil-count step of the search, within LIMITS.coilStep. */
export function readCoilStep(f: Fields, fallback: number): number {
  return f.number('coil_step', { min: LIMITS.coilStep[0], max: LIMITS.coilStep[1] }) ?? fallback;
}

/** `index`: the spring-index range, at most LIMITS.indexMax, its low end above `floor` (`why` says
 * what needs it there). */
export function readIndexRange(f: Fields, fallback: [number, number], floor: number, why: string): [number, number] {
  const index = readRange(f, 'index', fallback, { positive: true, max: LIMITS.indexMax });
  if (index[0] <= floor) throw new InputError('index[0]', `a spring index above ${floor}${why ? ` (${why})` : ''}`, index[0]);
  return index;
}

/** `diameter_resolution`: the mean-diameter scan step (mm), within LIMITS.diameterResolution. */
export function readDiameterResolution(f: Fields, fallback: number): number {
  const v = f.quantity('diameter_resolution', 'length', { positive: true }) ?? fallback;
  const [lo, hi] = LIMITS.diameterResolution;
  if (v < lo || v > hi) {
    throw new InputError(
      'diameter_resolution',
      `a length from ${formatQuantity(lo, 'length', f.system)} to ${formatQuantity(hi, 'length', f.system)} (finer than a wire maker can hold is no more exact, only slower)`,
      f.get('diameter_resolution'),
    );
  }
  return v;
}

/** `seed`: a whole number a double holds exactly (so the same seed is the same run). */
export function readSeed(f: Fields, fallback: number): number {
  return f.number('seed', { integer: true, min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER }) ?? fallback;
}
