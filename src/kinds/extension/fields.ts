// The output fields of a designed extension spring, one definition each: the CSV of `frontier` and
// `sweep` is rendered from this list (the same shape as the seam's field registry: name, unit kind,
// significant digits, how to read it). Values are SI; null where a figure does not apply.
import { inUnit, sig, unitSymbol } from '../../units/format.js';
import type { Kind } from '../../units/kinds.js';
import type { UnitSystem } from '../../units/systems.js';
import type { ExtensionCandidate } from './design.js';
import { bandFraction, fatigueSafety } from './report.js';

export type ExtensionFieldValue = number | string | null;

export interface ExtensionField {
  readonly name: string;
  readonly unit: Kind | null;
  readonly digits: number;
  read(c: ExtensionCandidate): ExtensionFieldValue;
}

const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
const longest = (c: ExtensionCandidate) => c.analysis.points.reduce((m, p) => (p.force > m.force ? p : m), c.analysis.points[0]);

export const EXTENSION_FIELDS: readonly ExtensionField[] = [
  { name: 'material', unit: null, digits: 0, read: (c) => c.item.choice.material.id },
  { name: 'loop', unit: null, digits: 0, read: (c) => c.analysis.geometry.loop },
  { name: 'wire_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.wireDiameter },
  { name: 'mean_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.meanDiameter },
  { name: 'outer_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.outerDiameter },
  { name: 'spring_index', unit: null, digits: 6, read: (c) => c.analysis.geometry.springIndex },
  { name: 'body_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.bodyCoils },
  { name: 'active_coils', unit: null, digits: 6, read: (c) => c.analysis.geometry.activeCoils },
  { name: 'free_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.freeLength },
  { name: 'initial_tension', unit: 'force', digits: 6, read: (c) => c.analysis.initialTension.force },
  { name: 'initial_tension_stress', unit: 'stress', digits: 6, read: (c) => c.analysis.initialTension.stress },
  { name: 'initial_tension_band_position', unit: null, digits: 0, read: (c) => c.analysis.initialTension.position },
  { name: 'initial_tension_band_fraction', unit: null, digits: 4, read: (c) => finite(bandFraction(c.analysis)) },
  { name: 'rate', unit: 'rate', digits: 6, read: (c) => c.analysis.rate },
  { name: 'working_force', unit: 'force', digits: 6, read: (c) => c.analysis.points[0]?.force ?? null },
  { name: 'operating_force', unit: 'force', digits: 6, read: (c) => (c.analysis.points.length > 1 ? c.analysis.points[c.analysis.points.length - 1].force : null) },
  { name: 'body_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.bodyStress ?? null },
  { name: 'loop_bending_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.loopBendingStress ?? null },
  { name: 'loop_torsion_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.loopTorsionStress ?? null },
  { name: 'body_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.body) },
  { name: 'loop_bending_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.loopBending) },
  { name: 'loop_torsion_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.loopTorsion) },
  { name: 'fatigue_safety_factor', unit: null, digits: 5, read: (c) => fatigueSafety(c.analysis) },
  { name: 'natural_frequency_Hz', unit: null, digits: 5, read: (c) => c.analysis.surge.frequency },
  { name: 'mass', unit: 'mass', digits: 6, read: (c) => c.analysis.geometry.mass },
  { name: 'relative_cost', unit: null, digits: 6, read: (c) => c.analysis.geometry.mass * c.item.choice.material.relativeCost.value },
];

/** CSV column names in a unit system (the unit symbol in each name). */
export function extensionColumns(system: UnitSystem): string[] {
  return EXTENSION_FIELDS.map((f) => (f.unit ? `${f.name}_${unitSymbol(f.unit, system)}` : f.name));
}

export function extensionRow(c: ExtensionCandidate, system: UnitSystem): ExtensionFieldValue[] {
  return EXTENSION_FIELDS.map((f) => {
    const v = f.read(c);
    if (typeof v !== 'number') return v;
    if (!Number.isFinite(v)) return null;
    const shown = f.unit ? inUnit(v, f.unit, system) : v;
    return f.digits > 0 ? Number(sig(shown, f.digits)) : shown;
  });
}
