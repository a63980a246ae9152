// The requirements file of an extension spring (`kind: extension`): the pull it must give at its
// working length, the stroke, where it must fit and how long it must live. Lengths are inside the loops.
// The working force is met exactly through the initial tension: for a given wire, coil count and
// diameter the free length and rate are fixed, so Fi = F1 - k (L1 - L0), and Fi must lie in its range.
import type { Catalog } from '../../catalogs/types.js';
import { FATIGUE_CRITERIA, type FatigueCriterion } from '../../model/fatigue.js';
import type { StressCorrection } from '../../model/stressFactor.js';
import { Fields } from '../../units/fields.js';
import type { MaterialChoice } from '../../input/material.js';
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
import { DEFAULTS } from '../../input/defaults.js';
import { parseCycles } from '../../input/cycles.js';
import { formatQuantity } from '../../units/format.js';
import { InputError } from '../../units/parse.js';
import type { UnitSystem } from '../../units/systems.js';
import { loadExtensionCatalog, loopRule, type ExtensionCatalog, type LoopRule } from './catalog.js';
import { INITIAL_TENSION_RANGES, type InitialTensionRange } from './initialTension.js';
import { readKind } from './springFile.js';

export const EXTENSION_RANK_KEYS = ['mass', 'wire_volume', 'outer_diameter', 'free_length', 'safety_factor'] as const;
export type ExtensionRankKey = (typeof EXTENSION_RANK_KEYS)[number];

export interface ExtensionRequirements {
  kind: 'extension';
  system: UnitSystem;
  materials: MaterialChoice[];
  /** Per material: the wire diameters to try (mm). */
  wireSizes: (m: MaterialChoice) => number[];
  wireSizesLabel: string;
  loop: LoopRule;
  /** Explicit inside height of each loop (mm); otherwise the loop rule's. */
  loopLength?: number;
  /** C2 = 2 r2 / d of the bend into the loop. */
  bendIndex: number;
  workingForce: number;
  workingLength: number;
  operatingLength?: number;
  operatingForce?: number;
  loadTolerance: number;
  /** The band a given spring's working force must fall in (`check`); the design meets that force exactly. */
  workingTolerance?: number;
  maxOuterDiameter?: number;
  maxFreeLength?: number;
  /** The longest the spring is ever stretched (assembly, over-travel): reached without a set. */
  maxExtendedLength?: number;
  bodyCoils: [number, number];
  coilStep: number;
  index: [number, number];
  initialTensionRange: InitialTensionRange;
  cycles?: number;
  peened: boolean;
  criterion: FatigueCriterion;
  correction: StressCorrection;
  temperature?: number;
  forcingFrequency?: number;
  safety: { static: number; fatigue: number; surge: number };
  rank: ExtensionRankKey;
  /** List the best spring of each material and wire size instead of the best overall. */
  bestPerWire: boolean;
  top: number;
  seed: number;
  /** Mean-diameter scan step (mm) for the checks that are not monotone in it. */
  diameterResolution: number;
}

export const EXTENSION_DEFAULTS = {
  bodyCoils: [3, 40] as [number, number],
  coilStep: 0.25,
  initialTensionRange: 'preferred' as InitialTensionRange,
};

export function readExtensionRequirements(
  raw: unknown,
  catalog: Catalog,
  ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials),
): ExtensionRequirements {
  const f = Fields.document(raw);
  readKind(f, 'extension');
  const system = f.system;
  const materials = readMaterials(f, catalog);
  const sizes = readWireSizes(f, catalog);
  checkWireSizes(f, materials, sizes);
  const { wireSizes, label } = sizes;

  const loopId = f.string('loop') ?? 'full';
  const loop = loopRule(ext, loopId);
  if (!loop) throw new InputError('loop', `one of ${ext.loopTypes.map((t) => t.id).join(' | ')}`, f.get('loop'));
  const loopLength = f.quantity('loop_length', 'length', { positive: true });
  if (loop.needsLength && loopLength === undefined)
    throw new InputError('loop_length', `the height of each ${loop.id} loop from the end of the body to the inside of the loop (the field is missing)`);
  const bendIndex = f.number('bend_index', { min: 1.5, max: 50 }) ?? ext.bendIndex.value;

  const load = Fields.of(f.require('load', 'the pull at the working length: { force, length }'), 'load', system);
  const workingForce = load.requiredQuantity('force', 'force', { positive: true });
  const workingLength = load.requiredQuantity('length', 'length', { positive: true });
  load.rejectUnknown();
  const operatingLength = f.quantity('operating_length', 'length', { positive: true });
  const operatingForce = f.quantity('operating_force', 'force', { positive: true });
  if (operatingLength !== undefined && operatingLength <= workingLength)
    throw new InputError('operating_length', 'a length longer than the working length (the end of the pull)', f.get('operating_length'));
  if (operatingForce !== undefined && operatingLength === undefined)
    throw new InputError('operating_length', 'a value: operating_force needs the length it acts at (the field is missing)');
  if (operatingForce !== undefined && operatingForce <= workingForce)
    throw new InputError('operating_force', 'a force above the working force (the spring is stretched further)', f.get('operating_force'));

  const envRaw = f.get('envelope');
  const env = envRaw === undefined || envRaw === null ? Fields.of({}, 'envelope', system) : Fields.of(envRaw, 'envelope', system);
  const maxOuterDiameter = env.quantity('max_outer_diameter', 'length', { positive: true });
  const maxFreeLength = env.quantity('max_free_length', 'length', { positive: true });
  const maxExtendedLength = env.quantity('max_extended_length', 'length', { positive: true });
  env.rejectUnknown();
  const longest = operatingLength ?? workingLength;
  if (maxExtendedLength !== undefined && maxExtendedLength < longest)
    throw new InputError(
      'envelope.max_extended_length',
      `a length at or beyond the longest working length ${formatQuantity(longest, 'length', system)}`,
      env.get('max_extended_length'),
    );

  // The same bounds as compression requirements (src/input/readers.ts, src/input/limits.ts).
  const bodyCoils = readCoilRange(f, 'body_coils', EXTENSION_DEFAULTS.bodyCoils);
  const coilStep = readCoilStep(f, EXTENSION_DEFAULTS.coilStep);
  const index = readIndexRange(f, DEFAULTS.index, 1.75, 'the loop formulas need C1 = C above it');

  const safety = readSafety(f, DEFAULTS.safety);
  const req: ExtensionRequirements = {
    kind: 'extension',
    system,
    materials,
    wireSizes,
    wireSizesLabel: label,
    loop,
    loopLength,
    bendIndex,
    workingForce,
    workingLength,
    operatingLength,
    operatingForce,
    loadTolerance: f.fraction('load_tolerance') ?? DEFAULTS.loadTolerance,
    workingTolerance: f.fraction('working_tolerance'),
    maxOuterDiameter,
    maxFreeLength,
    maxExtendedLength,
    bodyCoils,
    coilStep,
    index,
    initialTensionRange: (f.choice('initial_tension_range', INITIAL_TENSION_RANGES) ?? EXTENSION_DEFAULTS.initialTensionRange) as InitialTensionRange,
    cycles: parseCycles(f.get('cycles'), 'cycles'),
    peened: f.bool('peened') ?? false,
    criterion: (f.choice('fatigue_criterion', FATIGUE_CRITERIA) ?? 'gerber') as FatigueCriterion,
    correction: (f.choice('stress_factor', ['bergstrasser', 'wahl'] as const) ?? 'bergstrasser') as StressCorrection,
    temperature: f.quantity('temperature', 'temperature'),
    forcingFrequency: f.quantity('forcing_frequency', 'frequency', { nonNegative: true }),
    safety,
    rank: (f.choice('rank', EXTENSION_RANK_KEYS) ?? DEFAULTS.rank) as ExtensionRankKey,
    bestPerWire: f.bool('best_per_wire') ?? false,
    top: f.number('top', { integer: true, positive: true, max: 1000 }) ?? DEFAULTS.top,
    seed: readSeed(f, DEFAULTS.seed),
    diameterResolution: readDiameterResolution(f, DEFAULTS.diameterResolution),
  };
  if (req.loadTolerance >= 1) throw new InputError('load_tolerance', 'a fraction below 1 (such as 0.1 or "10%")', f.get('load_tolerance'));
  if (req.workingTolerance !== undefined && req.workingTolerance >= 1)
    throw new InputError('working_tolerance', 'a fraction below 1 (such as 0.02 or "2%")', f.get('working_tolerance'));
  f.get('material_map'); // a stock table's material words; read and checked by src/stock/materialMap.ts
  f.rejectUnknown();
  return req;
}
