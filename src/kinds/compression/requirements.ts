// The requirements file of `coilfront design`, `frontier` and `sweep`: what the spring must do and
// where it must fit. Every field but load, material and envelope has a default, documented in the README.
import type { Catalog } from '../../catalogs/types.js';
import { RANK_KEYS, type RankKey } from './objectives.js';
import { inStrengthRange } from '../../catalogs/properties.js';
import { SEATINGS, type Seating } from './buckling.js';
import { FATIGUE_CRITERIA, type FatigueCriterion } from '../../model/fatigue.js';
import { END_TYPES, type EndType } from './geometry.js';
import type { StressCorrection } from '../../model/stressFactor.js';
import { InputError } from '../../units/parse.js';
import { formatQuantity } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import { Fields } from '../../units/fields.js';
import { applyStrengthBasis, materialFigures, STRENGTH_BASES, type MaterialChoice, type StrengthBasis } from '../../input/material.js';
import { ultimateShearStrength } from '../../model/strength.js';
import { SURGE_ENDS, type SurgeEnds } from '../../model/surge.js';
import {
  checkWireSizes,
  readCoilRange,
  readCoilStep,
  readDiameterResolution,
  readIndexRange,
  readMaterials,
  readSafety,
  readSeed,
  readWireSizes,
} from '../../input/readers.js';
import { LIMITS } from '../../input/limits.js';
import { parseCycles } from '../../input/cycles.js';
import { DEFAULTS } from '../../input/defaults.js';
import { readToleranceRequirements } from './tolerance/request.js';
import type { ToleranceRequest } from './tolerance/model.js';

// What may rank the springs is the objectives registry's to say.
export { RANK_KEYS, type RankKey };

export interface Requirements {
  system: UnitSystem;
  materials: MaterialChoice[];
  /** Tensile strength from the published law (default) or the standard's tabulated minimum. */
  strengthBasis: StrengthBasis;
  ends: EndType[];
  seating: Seating;
  /** Surge boundary: both ends on plates (default) or one end free; not the buckling seating. */
  surgeEnds: SurgeEnds;
  workingForce: number;
  workingLength: number;
  loadTolerance: number;
  /** Band on the working force of a given spring (`check`, `stock`); unset: the load tolerance, or 2%. */
  workingTolerance?: number;
  operatingLength?: number;
  operatingForce?: number;
  maxOuterDiameter?: number;
  minInnerDiameter?: number;
  maxFreeLength?: number;
  maxSolidLength?: number;
  cycles?: number;
  peened: boolean;
  criterion: FatigueCriterion;
  correction: StressCorrection;
  directShear: boolean;
  setRemoved: boolean;
  temperature?: number;
  forcingFrequency?: number;
  /** Per material: the wire diameters to try (mm). */
  wireSizes: (m: MaterialChoice) => number[];
  wireSizesLabel: string;
  activeCoils: [number, number];
  coilStep: number;
  index: [number, number];
  allowableStress?: number;
  safety: { static: number; fatigue: number; surge: number };
  clashAllowance: number;
  gapRule: boolean;
  solidSafe: boolean;
  /** The spring runs over a rod or in a bore that keeps it from buckling: the buckling check is off. */
  guided: boolean;
  /** List the best spring of each material, wire size and end type (the default) instead of every feasible variant. */
  bestPerWire: boolean;
  /** The grouped list was asked for in so many words (best_per_wire: true, --per-wire): the grid must
   * run, and a space past its size is refused rather than handed to the genetic search. */
  bestPerWireAsked?: boolean;
  rank: RankKey;
  top: number;
  seed: number;
  /** Mean-diameter scan step (mm) for the checks that are not monotone in it. */
  diameterResolution: number;
  /** The made spring's tolerances: `tolerance_grade` (EN 15800, default 2) and `tolerances` overrides. */
  tolerance: ToleranceRequest;
  /** `min_yield`: the fraction of made springs that must pass every check; unset, the yield is only reported. */
  minYield?: number;
}

/** The shared defaults (src/input/defaults.ts) and those of compression springs. */
export const COMPRESSION_DEFAULTS = {
  ...DEFAULTS,
  ends: 'squared-ground' as EndType,
  seating: 'fixed-fixed' as Seating,
  activeCoils: [3, 30] as [number, number],
  coilStep: 0.25,
  clashAllowance: 0.15,
  rank: DEFAULTS.rank as RankKey,
};

/** The size of a search: material wire sizes x end types x coil counts, with its factors. */
export function searchSize(req: Requirements): { sizes: number; coilCounts: number; combinations: number } {
  const coilCounts = Math.floor((req.activeCoils[1] - req.activeCoils[0]) / req.coilStep + 1e-9) + 1;
  let sizes = 0;
  for (const m of req.materials) sizes += req.wireSizes(m).filter((d) => m.tensileStrength !== undefined || inStrengthRange(m.material, d)).length;
  return { sizes, coilCounts, combinations: sizes * req.ends.length * coilCounts };
}

/** The refusal of a grid search too large to finish, naming the settings that size it; null when it
 * fits. `size` is the search's own count when it is known (wire sizes outside what the problem can use
 * already left out). `why` says what asked for the grid (the automatic choice never does above the limit). */
export function gridWorkError(req: Requirements, why: string, size = searchSize(req)): InputError | null {
  const { sizes, coilCounts, combinations } = size;
  if (combinations <= LIMITS.gridCombinations) return null;
  return new InputError(
    'coil_step',
    `a grid search (${why}) of at most ${LIMITS.gridCombinations.toLocaleString('en-US')} combinations; this one has ${combinations.toLocaleString('en-US')} ` +
      `(${sizes} material wire sizes x ${req.ends.length} end types x ${coilCounts} coil counts): use a larger coil_step, a narrower active_coils, or fewer materials, end types or wire_sizes` +
      (why.includes('--strategy') ? ', or --strategy auto (the genetic search takes spaces this large)' : ''),
    req.coilStep,
  );
}

export function readRequirements(raw: unknown, catalog: Catalog): Requirements {
  const f = Fields.document(raw);
  f.expectKind('compression');
  const system = f.system;

  // Materials: an id, a list of ids, a family, any, or an override object.
  let materials = readMaterials(f, catalog);
  const strengthBasis = (f.choice('strength_basis', STRENGTH_BASES) ?? 'law') as StrengthBasis;
  materials = applyStrengthBasis(materials, strengthBasis, 'strength_basis', catalog);

  const endsRaw = f.get('ends');
  if (Array.isArray(endsRaw) && endsRaw.length === 0)
    throw new InputError('ends', `one end type or a non-empty list of them (${END_TYPES.join(' | ')})`, endsRaw);
  const ends: EndType[] =
    endsRaw === undefined
      ? [COMPRESSION_DEFAULTS.ends]
      : (Array.isArray(endsRaw) ? endsRaw : [endsRaw]).map((e, i) => {
          if (typeof e !== 'string' || !(END_TYPES as readonly string[]).includes(e))
            throw new InputError(Array.isArray(endsRaw) ? `ends[${i}]` : 'ends', `one of ${END_TYPES.join(' | ')}`, e);
          return END_TYPES[(END_TYPES as readonly string[]).indexOf(e)];
        });

  const load = Fields.of(f.require('load', 'the force at the working length: { force, length }'), 'load', system);
  const workingForce = load.requiredQuantity('force', 'force', { positive: true });
  const workingLength = load.requiredQuantity('length', 'length', { positive: true });
  load.rejectUnknown();

  const operatingLength = f.quantity('operating_length', 'length', { positive: true });
  const operatingForce = f.quantity('operating_force', 'force', { positive: true });
  if (operatingLength !== undefined && operatingLength >= workingLength)
    throw new InputError('operating_length', `a length shorter than the working length (the end of the stroke)`, f.get('operating_length'));
  if (operatingForce !== undefined && operatingLength === undefined)
    throw new InputError('operating_length', 'a value: operating_force needs the length it acts at (the field is missing)');
  if (operatingForce !== undefined && operatingForce <= workingForce)
    throw new InputError('operating_force', 'a force above the working force (the spring is compressed further)', f.get('operating_force'));

  const env = Fields.of(
    f.require('envelope', 'a mapping of envelope limits (max_outer_diameter, min_inner_diameter, max_free_length, max_solid_length)'),
    'envelope',
    system,
  );
  const maxOuterDiameter = env.quantity('max_outer_diameter', 'length', { positive: true });
  const minInnerDiameter = env.quantity('min_inner_diameter', 'length', { positive: true });
  const maxFreeLength = env.quantity('max_free_length', 'length', { positive: true });
  const maxSolidLength = env.quantity('max_solid_length', 'length', { positive: true });
  env.rejectUnknown();
  if (maxOuterDiameter !== undefined && minInnerDiameter !== undefined && minInnerDiameter >= maxOuterDiameter) {
    throw new InputError('envelope.min_inner_diameter', 'a diameter below envelope.max_outer_diameter', env.get('min_inner_diameter'));
  }
  if (maxFreeLength !== undefined && maxFreeLength <= workingLength)
    throw new InputError('envelope.max_free_length', 'a length above the working length', env.get('max_free_length'));

  // Wire sizes: a series id for every material, or an explicit list of diameters.
  const sizes = readWireSizes(f, catalog);
  checkWireSizes(f, materials, sizes);
  const { wireSizes, label: wireSizesLabel } = sizes;

  const activeCoils = readCoilRange(f, 'active_coils', COMPRESSION_DEFAULTS.activeCoils);
  const coilStep = readCoilStep(f, COMPRESSION_DEFAULTS.coilStep);
  const index = readIndexRange(f, COMPRESSION_DEFAULTS.index, 1, '');

  const safety = readSafety(f, COMPRESSION_DEFAULTS.safety);
  const req: Requirements = {
    system,
    materials,
    strengthBasis,
    ends,
    seating: (f.choice('seating', SEATINGS) ?? COMPRESSION_DEFAULTS.seating) as Seating,
    surgeEnds: (f.choice('surge_ends', SURGE_ENDS) ?? 'plates') as SurgeEnds,
    workingForce,
    workingLength,
    loadTolerance: f.fraction('load_tolerance') ?? COMPRESSION_DEFAULTS.loadTolerance,
    workingTolerance: f.fraction('working_tolerance'),
    operatingLength,
    operatingForce,
    maxOuterDiameter,
    minInnerDiameter,
    maxFreeLength,
    maxSolidLength,
    cycles: parseCycles(f.get('cycles'), 'cycles'),
    peened: f.bool('peened') ?? false,
    criterion: (f.choice('fatigue_criterion', FATIGUE_CRITERIA) ?? 'gerber') as FatigueCriterion,
    correction: (f.choice('stress_factor', ['bergstrasser', 'wahl'] as const) ?? 'bergstrasser') as StressCorrection,
    directShear: f.bool('direct_shear_rate') ?? false,
    setRemoved: f.bool('set_removed') ?? false,
    temperature: f.quantity('temperature', 'temperature'),
    forcingFrequency: f.quantity('forcing_frequency', 'frequency', { nonNegative: true }),
    wireSizes,
    wireSizesLabel,
    activeCoils,
    coilStep,
    index,
    allowableStress: f.quantity('allowable_stress', 'stress', { positive: true }),
    safety,
    clashAllowance: f.fraction('clash_allowance', LIMITS.clashAllowanceMax) ?? COMPRESSION_DEFAULTS.clashAllowance,
    gapRule: f.bool('coil_gap_rule') ?? false,
    solidSafe: f.bool('solid_safe') ?? false,
    guided: f.bool('guided') ?? false,
    // The ranked list holds the best spring of each material, wire size and end type unless `variants`
    // asks for every feasible spring (best_per_wire: false, the older spelling, means the same).
    bestPerWire: !(f.bool('variants') ?? f.bool('best_per_wire') === false),
    bestPerWireAsked: f.bool('best_per_wire') === true && f.bool('variants') !== true,
    rank: (f.choice('rank', RANK_KEYS) ?? COMPRESSION_DEFAULTS.rank) as RankKey,
    top: f.number('top', { integer: true, positive: true, max: 1000 }) ?? COMPRESSION_DEFAULTS.top,
    seed: readSeed(f, COMPRESSION_DEFAULTS.seed),
    diameterResolution: readDiameterResolution(f, COMPRESSION_DEFAULTS.diameterResolution),
    ...readToleranceRequirements(f),
  };
  if (req.loadTolerance >= 1) throw new InputError('load_tolerance', 'a fraction below 1 (such as 0.1 or "10%")', f.get('load_tolerance'));
  if (req.workingTolerance !== undefined && req.workingTolerance >= 1)
    throw new InputError('working_tolerance', 'a fraction below 1 (such as 0.02 or "2%")', f.get('working_tolerance'));
  if (req.allowableStress !== undefined) checkAllowableStress(req, f.get('allowable_stress'));
  f.get('material_map'); // the stock table's material words; read and checked by src/stock/materialMap.ts
  f.rejectUnknown();
  return req;
}

/** A requirement-level allowable_stress replaces every wire's own (figuresUnder); above a wire's
 * torsional ultimate Ssu = 0.67 Sut (Budynas and Nisbett, Shigley, eq. 10-30) the static check would pass
 * a spring whose stress breaks it. So the allowable must not exceed the ultimate of the weakest wire the
 * search may use (the wires of problem.ts's stock: in the material's strength range, able to fit the bore). */
function checkAllowableStress(req: Requirements, given: unknown): void {
  let weakest: { ssu: number; material: string; d: number } | null = null;
  for (const m of req.materials)
    for (const d of req.wireSizes(m)) {
      if (m.tensileStrength === undefined && !inStrengthRange(m.material, d)) continue;
      if (req.maxOuterDiameter !== undefined && d * (req.index[0] + 1) > req.maxOuterDiameter) continue;
      const ssu = ultimateShearStrength(materialFigures(m, d, req.setRemoved).tensileStrength);
      if (!weakest || ssu < weakest.ssu) weakest = { ssu, material: m.material.id, d };
    }
  if (weakest && req.allowableStress! > weakest.ssu)
    throw new InputError(
      'allowable_stress',
      `a stress at most the torsional ultimate strength of every wire the search may use, Ssu = 0.67 Sut (Shigley eq. 10-30); the weakest, ${weakest.material} of ${formatQuantity(weakest.d, 'length', req.system)}, has Ssu ${formatQuantity(weakest.ssu, 'stress', req.system)}: lower allowable_stress, or narrow material or wire_sizes to stronger wires`,
      given,
    );
}
