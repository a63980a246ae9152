// The spring file of `coilfront analyze`: one given spring and how it is used.
import type { Catalog } from '../../catalogs/types.js';
import type { MaterialFigures, ServiceConditions, SpringGeometry } from './analysis.js';
import { SEATINGS, type Seating } from './buckling.js';
import { FATIGUE_CRITERIA, type FatigueCriterion } from '../../model/fatigue.js';
import { END_TYPES, inactiveCoils, solidLength, type EndType } from './geometry.js';
import { springRate } from '../../model/rate.js';
import type { StressCorrection } from '../../model/stressFactor.js';
import { formatQuantity } from '../../units/format.js';
import { InputError, parseQuantity } from '../../units/parse.js';
import type { UnitSystem } from '../../units/systems.js';
import { Fields } from '../../units/fields.js';
import {
  applyStrengthBasis,
  materialFigures,
  parseMaterialChoice,
  STRENGTH_BASES,
  strengthRangeNote,
  type MaterialChoice,
  type StrengthBasis,
} from '../../input/material.js';
import { SURGE_ENDS, type SurgeEnds } from '../../model/surge.js';
import { checkMaterialChoice } from '../../input/materialChecks.js';
import { LIMITS } from '../../input/limits.js';
import { parseCycles } from '../../input/cycles.js';

export interface SpringCase {
  system: UnitSystem;
  materialChoice: MaterialChoice;
  figures: MaterialFigures;
  geometry: SpringGeometry;
  service: ServiceConditions;
  setRemoved: boolean;
  notes: string[];
}

export function readSpringCase(raw: unknown, catalog: Catalog): SpringCase {
  const f = Fields.document(raw);
  f.expectKind('compression');
  const system = f.system;
  const strengthBasis = (f.choice('strength_basis', STRENGTH_BASES) ?? 'law') as StrengthBasis;
  const [choice] = applyStrengthBasis(
    [parseMaterialChoice(f.require('material', 'a material id or { like: <id>, ... }'), system, catalog, 'material')],
    strengthBasis,
    'strength_basis',
    catalog,
  );
  const d = f.requiredQuantity('wire_diameter', 'length', { positive: true });
  const which = f.exactlyOne(['mean_diameter', 'outer_diameter', 'inner_diameter']);
  const given = f.requiredQuantity(which, 'length', { positive: true });
  const D = which === 'mean_diameter' ? given : which === 'outer_diameter' ? given - d : given + d;
  if (!(D > d))
    throw new InputError(which, `a diameter that leaves a mean diameter above the wire diameter ${formatQuantity(d, 'length', system)}`, f.get(which));
  const ends = (f.choice('ends', END_TYPES) ?? 'squared-ground') as EndType;
  const coilsKey = f.exactlyOne(['active_coils', 'total_coils']);
  const coils = f.number(coilsKey, { positive: true }) as number;
  const Na = coilsKey === 'active_coils' ? coils : coils - inactiveCoils(ends);
  if (!(Na > 0)) throw new InputError(coilsKey, `more total coils than the ${inactiveCoils(ends)} inactive coils of ${ends} ends`, coils);
  const L0 = f.requiredQuantity('free_length', 'length', { positive: true });
  const Ls = solidLength(d, Na + inactiveCoils(ends), ends);
  if (L0 <= Ls)
    throw new InputError(
      'free_length',
      `a free length above the solid length ${formatQuantity(Ls, 'length', system)} (the coils overlap at free length)`,
      f.get('free_length'),
    );
  const seating = (f.choice('seating', SEATINGS) ?? 'fixed-fixed') as Seating;
  const criterion = (f.choice('fatigue_criterion', FATIGUE_CRITERIA) ?? 'gerber') as FatigueCriterion;
  const correction = (f.choice('stress_factor', ['bergstrasser', 'wahl'] as const) ?? 'bergstrasser') as StressCorrection;
  const directShear = f.bool('direct_shear_rate') ?? false;
  const setRemoved = f.bool('set_removed') ?? false;
  checkMaterialChoice(choice, 'material', system, [d]);
  const figures = materialFigures(choice, d, setRemoved);
  const k = springRate(figures.shearModulus, d, D, Na, directShear);

  const lengthsRaw = f.has('lengths') ? 'lengths' : undefined;
  const forcesRaw = f.has('forces') ? 'forces' : undefined;
  if (lengthsRaw && forcesRaw) throw new InputError('lengths, forces', 'only one of lengths | forces (both given)');
  for (const key of [lengthsRaw, forcesRaw]) {
    if (key && (f.list(key) ?? []).length === 0)
      throw new InputError(key, 'a non-empty list (leave the field out to analyse the spring at no working point)', f.get(key));
  }
  let lengths: number[] = [];
  if (lengthsRaw) {
    lengths = (f.list('lengths') ?? []).map((v, i) => {
      const L = parseQuantity(v, 'length', system, `lengths[${i}]`, { positive: true });
      if (L < Ls - 1e-9) throw new InputError(`lengths[${i}]`, `a length at or above the solid length ${formatQuantity(Ls, 'length', system)}`, v);
      if (L > L0)
        throw new InputError(`lengths[${i}]`, `a length at or below the free length ${formatQuantity(L0, 'length', system)} (a compression spring)`, v);
      return L;
    });
  } else if (forcesRaw) {
    lengths = (f.list('forces') ?? []).map((v, i) => {
      const F = parseQuantity(v, 'force', system, `forces[${i}]`, { nonNegative: true });
      const L = L0 - F / k;
      if (L < Ls - 1e-9)
        throw new InputError(`forces[${i}]`, `a force the spring can carry before it is solid (at most ${formatQuantity(k * (L0 - Ls), 'force', system)})`, v);
      return L;
    });
  }
  const cycles = parseCycles(f.get('cycles'), 'cycles');
  const service: ServiceConditions = {
    lengths,
    cycles,
    peened: f.bool('peened') ?? false,
    criterion,
    correction,
    directShear,
    seating,
    surgeEnds: (f.choice('surge_ends', SURGE_ENDS) ?? 'plates') as SurgeEnds,
    temperature: f.quantity('temperature', 'temperature'),
    forcingFrequency: f.quantity('forcing_frequency', 'frequency', { nonNegative: true }),
    clashAllowance: f.fraction('clash_allowance', LIMITS.clashAllowanceMax) ?? 0.15,
    gapRule: f.bool('coil_gap_rule') ?? false,
    surgeMargin: f.number('surge_margin', { min: LIMITS.safetyMin, max: LIMITS.surgeMarginMax }) ?? 15,
  };
  f.rejectUnknown();
  const notes: string[] = [];
  const range = strengthRangeNote(choice, d, system);
  if (range) notes.push(range);
  if (cycles !== undefined && cycles < 1e4) notes.push(`${cycles} cycles is below 1e4: judged as static service`);
  return {
    system,
    materialChoice: choice,
    figures,
    geometry: { wireDiameter: d, meanDiameter: D, activeCoils: Na, ends, freeLength: L0 },
    service,
    setRemoved,
    notes,
  };
}
