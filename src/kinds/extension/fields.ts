// The output fields of a designed extension spring, one definition each: name, unit kind, significant
// digits, how to read it, and its column in the ranked tables. The CSV of `frontier` and `sweep`, the
// JSON candidate record (design, frontier, sweep --json) and the ranked text and HTML tables are
// rendered from these definitions (src/report/fields.ts); each format lists the fields it shows, in its
// order, by name. Values are SI; null where a figure does not apply.
import type { FieldDefinition, FieldValue } from '../kind.js';
import { fieldColumns, fieldRecord, fieldRow } from '../../report/fields.js';
import { inUnit, sig } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import type { ExtensionSite } from './analysis.js';
import { EXTENSION_CHECKS } from './checks.js';
import type { ExtensionCandidate } from './design.js';
import { bandFraction, fatigueSafety, staticSafety } from './figures.js';

export type ExtensionFieldValue = FieldValue;
export type ExtensionField = FieldDefinition<ExtensionCandidate>;

const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
const longest = (c: ExtensionCandidate) => c.analysis.points.reduce((m, p) => (p.force > m.force ? p : m), c.analysis.points[0]);
const shortSite = (s: ExtensionSite) => (s === 'body' ? 'body' : s === 'loopBending' ? 'A' : 'B');
// Structured figures (a list, a record) have no single CSV value: JSON only.
const structured = () => null;
const sites = (v: { body: number; loopBending: number; loopTorsion: number }) => ({
  body: finite(v.body),
  loop_bending: finite(v.loopBending),
  loop_torsion: finite(v.loopTorsion),
});

/** The checks that apply, by name: their normalised values (negative passes). */
function checksRecord(c: ExtensionCandidate): Record<string, number> {
  const checks: Record<string, number> = {};
  EXTENSION_CHECKS.forEach((name, i) => {
    if (c.checks[i] !== -1) checks[name] = c.checks[i];
  });
  return checks;
}

const ALL: readonly ExtensionField[] = [
  { name: 'material', unit: null, digits: 0, read: (c) => c.item.choice.material.id, column: { head: 'material', digits: 0 } },
  { name: 'material_name', unit: null, digits: 0, read: (c) => c.item.choice.material.name },
  { name: 'loop', unit: null, digits: 0, read: (c) => c.analysis.geometry.loop },
  { name: 'wire_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.wireDiameter, column: { head: 'd', digits: 4 } },
  { name: 'mean_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.meanDiameter, column: { head: 'D', digits: 4 } },
  { name: 'outer_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.outerDiameter, column: { head: 'OD', digits: 4 } },
  { name: 'inner_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.innerDiameter },
  { name: 'spring_index', unit: null, digits: 6, read: (c) => c.analysis.geometry.springIndex },
  { name: 'body_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.bodyCoils, column: { head: 'Nb', digits: 4 } },
  { name: 'active_coils', unit: null, digits: 6, read: (c) => c.analysis.geometry.activeCoils, column: { head: 'Na', digits: 4 } },
  { name: 'free_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.freeLength, column: { head: 'L0', digits: 4 } },
  { name: 'loop_height', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.loopHeight },
  { name: 'loop_radius', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.loopRadius },
  { name: 'bend_radius', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.bendRadius },
  { name: 'initial_tension', unit: 'force', digits: 6, read: (c) => c.analysis.initialTension.force, column: { head: 'Fi', digits: 3 } },
  { name: 'initial_tension_stress', unit: 'stress', digits: 6, read: (c) => c.analysis.initialTension.stress },
  { name: 'initial_tension_band_position', unit: null, digits: 0, read: (c) => c.analysis.initialTension.position },
  {
    name: 'initial_tension_band_fraction',
    unit: null,
    digits: 4,
    read: (c) => finite(bandFraction(c.analysis)),
    column: {
      head: 'Fi band',
      digits: 2,
      cell: (c) => {
        const f = bandFraction(c.analysis);
        return Number.isFinite(f) ? `${sig(f * 100, 2)}%` : '-';
      },
    },
  },
  // The preferred band of the initial-tension stress and where the spring sits in it (JSON).
  {
    name: 'initial_tension_band',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) => {
      const it = c.analysis.initialTension;
      return { low: it.band.low, high: it.band.high, position: it.position, fraction: finite(bandFraction(c.analysis)) };
    },
  },
  { name: 'rate', unit: 'rate', digits: 6, read: (c) => c.analysis.rate, column: { head: 'k', digits: 4 } },
  // The forces at every point the requirement names, in one cell (tables only).
  {
    name: 'forces',
    unit: 'force',
    digits: 0,
    read: () => null,
    column: { head: 'forces', digits: 3, cell: (c, system) => c.analysis.points.map((p) => sig(inUnit(p.force, 'force', system), 3)).join(' / ') },
  },
  {
    name: 'points',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) =>
      c.analysis.points.map((p) => ({
        length: p.length,
        force: p.force,
        body_stress: p.bodyStress,
        loop_bending_stress: p.loopBendingStress,
        loop_torsion_stress: p.loopTorsionStress,
      })),
  },
  { name: 'working_force', unit: 'force', digits: 6, read: (c) => c.analysis.points[0]?.force ?? null },
  {
    name: 'operating_force',
    unit: 'force',
    digits: 6,
    read: (c) => (c.analysis.points.length > 1 ? c.analysis.points[c.analysis.points.length - 1].force : null),
  },
  { name: 'body_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.bodyStress ?? null, column: { head: 'body', digits: 4 } },
  { name: 'loop_bending_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.loopBendingStress ?? null, column: { head: 'loop A', digits: 4 } },
  { name: 'loop_torsion_stress', unit: 'stress', digits: 6, read: (c) => longest(c)?.loopTorsionStress ?? null, column: { head: 'loop B', digits: 4 } },
  { name: 'tensile_strength', unit: 'stress', digits: 6, read: (c) => c.analysis.material.figures.tensileStrength },
  {
    name: 'allowable_stress',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) => {
      const allow = c.analysis.material.allowables;
      return { body_torsion: allow.bodyTorsion, loop_bending: allow.loopBending, loop_torsion: allow.loopTorsion };
    },
  },
  // The three static safety factors: a record in JSON, one cell in the tables.
  {
    name: 'static_safety_factors',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) => sites(c.analysis.staticSafety),
    column: {
      head: 'SF body/A/B',
      digits: 3,
      cell: (c) => {
        const s = c.analysis.staticSafety;
        return `${sig(s.body, 3)}/${sig(s.loopBending, 3)}/${sig(s.loopTorsion, 3)}`;
      },
    },
  },
  { name: 'body_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.body) },
  { name: 'loop_bending_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.loopBending) },
  { name: 'loop_torsion_safety_factor', unit: null, digits: 5, read: (c) => finite(c.analysis.staticSafety.loopTorsion) },
  {
    name: 'fatigue_safety_factors',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) => {
      const fa = c.analysis.fatigue;
      return fa ? sites({ body: fa.body.safetyFactor, loopBending: fa.loopBending.safetyFactor, loopTorsion: fa.loopTorsion.safetyFactor }) : null;
    },
  },
  { name: 'static_safety_factor', unit: null, digits: 5, read: (c) => finite(staticSafety(c.analysis)) },
  {
    name: 'fatigue_safety_factor',
    unit: null,
    digits: 5,
    read: (c) => fatigueSafety(c.analysis),
    column: {
      head: 'SF fatigue',
      digits: 3,
      cell: (c) => {
        const nf = fatigueSafety(c.analysis);
        return nf === null ? '-' : `${sig(nf, 3)} ${c.analysis.fatigue ? shortSite(c.analysis.fatigue.governing) : ''}`.trim();
      },
    },
  },
  { name: 'natural_frequency', unit: 'frequency', digits: 5, read: (c) => c.analysis.surge.frequency },
  { name: 'mass', unit: 'mass', digits: 6, read: (c) => c.analysis.geometry.mass, column: { head: 'mass', digits: 3 } },
  { name: 'wire_volume', unit: 'volume', digits: 6, read: (c) => c.analysis.geometry.wireVolume },
  { name: 'relative_cost', unit: null, digits: 6, read: (c) => c.analysis.geometry.mass * c.item.choice.material.relativeCost.value },
  { name: 'checks', unit: null, digits: 0, read: structured, json: checksRecord },
  { name: 'warnings', unit: null, digits: 0, read: structured, json: (c) => c.analysis.warnings.map((w) => w.message) },
];

function pick(names: readonly string[]): readonly ExtensionField[] {
  return names.map((n) => {
    const f = ALL.find((x) => x.name === n);
    if (!f) throw new Error(`no output field '${n}' in the extension fields registry`);
    return f;
  });
}

/** CSV columns (frontier, sweep): flat figures, each with its unit in the column name. */
export const EXTENSION_FIELDS = pick([
  'material',
  'loop',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'spring_index',
  'body_coils',
  'active_coils',
  'free_length',
  'initial_tension',
  'initial_tension_stress',
  'initial_tension_band_position',
  'initial_tension_band_fraction',
  'rate',
  'working_force',
  'operating_force',
  'body_stress',
  'loop_bending_stress',
  'loop_torsion_stress',
  'body_safety_factor',
  'loop_bending_safety_factor',
  'loop_torsion_safety_factor',
  'fatigue_safety_factor',
  'natural_frequency',
  'mass',
  'relative_cost',
]);

/** The JSON record of a candidate (SI), in its key order. */
export const EXTENSION_JSON_FIELDS = pick([
  'material',
  'material_name',
  'loop',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'inner_diameter',
  'spring_index',
  'body_coils',
  'active_coils',
  'free_length',
  'loop_height',
  'loop_radius',
  'bend_radius',
  'initial_tension',
  'initial_tension_stress',
  'initial_tension_band',
  'rate',
  'mass',
  'wire_volume',
  'relative_cost',
  'points',
  'tensile_strength',
  'allowable_stress',
  'static_safety_factors',
  'fatigue_safety_factors',
  'static_safety_factor',
  'fatigue_safety_factor',
  'natural_frequency',
  'checks',
  'warnings',
]);

/** The columns of the ranked text and HTML tables. */
export const EXTENSION_TABLE_FIELDS = pick([
  'material',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'body_coils',
  'active_coils',
  'free_length',
  'initial_tension',
  'initial_tension_band_fraction',
  'rate',
  'forces',
  'body_stress',
  'loop_bending_stress',
  'loop_torsion_stress',
  'static_safety_factors',
  'fatigue_safety_factor',
  'mass',
]);

/** CSV column names in a unit system (the unit symbol in each name). */
export function extensionColumns(system: UnitSystem): string[] {
  return fieldColumns(EXTENSION_FIELDS, system);
}

export function extensionRow(c: ExtensionCandidate, system: UnitSystem): ExtensionFieldValue[] {
  return fieldRow(EXTENSION_FIELDS, c, system);
}

/** One designed spring as JSON (SI): the fields of EXTENSION_JSON_FIELDS, in their order. */
export function extensionCandidateRecord(c: ExtensionCandidate): Record<string, unknown> {
  return fieldRecord(EXTENSION_JSON_FIELDS, c);
}
