// The output fields of a compression spring, one definition each: name, unit kind, how to read it
// (in SI) from a candidate, and its column in the ranked tables. JSON, CSV, the text table and the
// HTML table are rendered from these definitions (src/report/fields.ts); each format lists the fields
// it shows, in its order, by name. A new figure is one definition here plus its name in the formats
// that show it.
import type { Candidate } from './design.js';
import type { FieldDefinition } from '../kind.js';
import { CHECK, CHECKS } from './verify.js';
import { strengthBasisOf } from '../../input/material.js';
import { tolerancesJson } from './tolerance/model.js';
import { inUnit, sig, yieldPercent } from '../../units/format.js';
import { RELATIVE_COST_NOTE } from './objectives.js';

type Field = FieldDefinition<Candidate>;

const last = (c: Candidate) => c.analysis.points[c.analysis.points.length - 1];
const maxStress = (c: Candidate) => Math.max(...c.analysis.points.map((p) => p.stress));
const hasYield = (c: Candidate) => c.yield !== undefined;

/** How much further the spring may deflect past its largest working deflection before it buckles, as a
 * fraction of that deflection: the buckling check's own figure with its sign turned (the check is
 * (largest - critical) / largest). Null where the check does not apply: an absolutely stable spring, or
 * one guided on a rod or in a bore (the check is off). */
export function bucklingMargin(c: Candidate): number | null {
  const b = c.analysis.buckling;
  if (b.absolutelyStable) return null;
  const v = (b.maxDeflection - b.criticalDeflection) / b.maxDeflection;
  return c.checks[CHECK.buckling] === v && Number.isFinite(v) ? -v : null;
}

function bucklingCell(c: Candidate): string {
  const m = bucklingMargin(c);
  if (m !== null) return `${sig(m * 100, 3)}%`;
  return c.analysis.buckling.absolutelyStable ? 'stable' : c.checks[CHECK.buckling] === -1 ? 'guided' : '-';
}
// Structured figures (a list, a record, a flag) have no single CSV value: JSON only.
const structured = () => null;

const ALL: readonly Field[] = [
  { name: 'material', unit: null, digits: 0, read: (c) => c.item.choice.material.id, column: { head: 'material', digits: 0 } },
  { name: 'material_name', unit: null, digits: 0, read: (c) => c.item.choice.material.name },
  { name: 'ends', unit: null, digits: 0, read: (c) => c.geometry.ends, column: { head: 'ends', digits: 0 } },
  { name: 'wire_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.wireDiameter, column: { head: 'd', digits: 4 } },
  { name: 'mean_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.meanDiameter, column: { head: 'D', digits: 4 } },
  { name: 'outer_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.outerDiameter, column: { head: 'OD', digits: 4 } },
  { name: 'inner_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.innerDiameter, column: { head: 'ID', digits: 4 } },
  { name: 'spring_index', unit: null, digits: 6, read: (c) => c.analysis.geometry.springIndex, column: { head: 'C', digits: 3 } },
  // Coil counts are steps of the coil_step: written as they are (CSV, JSON).
  { name: 'active_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.activeCoils, column: { head: 'Na', digits: 4 } },
  { name: 'total_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.totalCoils, column: { head: 'Nt', digits: 4 } },
  { name: 'free_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.freeLength, column: { head: 'L0', digits: 4 } },
  { name: 'solid_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.solidLength, column: { head: 'Ls', digits: 4 } },
  { name: 'pitch', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.pitch },
  { name: 'rate', unit: 'rate', digits: 6, read: (c) => c.analysis.rate, column: { head: 'k', digits: 4 } },
  { name: 'working_force', unit: 'force', digits: 6, read: (c) => c.analysis.points[0].force },
  { name: 'operating_force', unit: 'force', digits: 6, read: (c) => (c.analysis.points.length > 1 ? last(c).force : null) },
  // The forces at every point the requirement names, in one cell.
  {
    name: 'forces',
    unit: 'force',
    digits: 0,
    read: structured,
    column: { head: 'forces', digits: 3, cell: (c, system) => c.analysis.points.map((p) => sig(inUnit(p.force, 'force', system), 3)).join(' / ') },
  },
  {
    name: 'points',
    unit: null,
    digits: 0,
    read: structured,
    json: (c) => c.analysis.points.map((p) => ({ length: p.length, force: p.force, stress: p.stress })),
  },
  { name: 'max_stress', unit: 'stress', digits: 6, read: maxStress, column: { head: 'tau max', digits: 4 } },
  { name: 'solid_force', unit: 'force', digits: 6, read: (c) => c.analysis.solid.force },
  { name: 'solid_stress', unit: 'stress', digits: 6, read: (c) => c.analysis.solid.stress },
  { name: 'solid_outer_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.solid.outerDiameter },
  { name: 'tensile_strength', unit: 'stress', digits: 6, read: (c) => c.analysis.material.tensileStrength },
  { name: 'strength_source', unit: null, digits: 0, read: (c) => strengthBasisOf(c.item.choice).source },
  { name: 'allowable_stress', unit: 'stress', digits: 6, read: (c) => c.analysis.material.allowableStress },
  { name: 'static_safety_factor', unit: null, digits: 5, read: (c) => c.analysis.staticSafetyFactor, column: { head: 'SF static', digits: 3 } },
  {
    name: 'fatigue_safety_factor',
    unit: null,
    digits: 5,
    read: (c) => (c.analysis.fatigue ? c.analysis.fatigue.safetyFactor : null),
    column: { head: 'SF fatigue', digits: 3 },
  },
  { name: 'natural_frequency', unit: 'frequency', digits: 5, read: (c) => c.analysis.surge.relevant },
  { name: 'surge_ends', unit: null, digits: 0, read: (c) => c.analysis.surge.ends },
  { name: 'absolutely_stable', unit: null, digits: 0, read: structured, json: (c) => c.analysis.buckling.absolutelyStable },
  {
    name: 'critical_deflection',
    unit: 'length',
    digits: 6,
    read: (c) => (c.analysis.buckling.absolutelyStable ? null : c.analysis.buckling.criticalDeflection),
  },
  { name: 'buckling_margin', unit: null, digits: 5, read: bucklingMargin, column: { head: 'buckling', digits: 3, cell: bucklingCell } },
  { name: 'mass', unit: 'mass', digits: 6, read: (c) => c.analysis.geometry.mass, column: { head: 'mass', digits: 3 } },
  { name: 'wire_volume', unit: 'volume', digits: 6, read: (c) => c.analysis.geometry.wireVolume },
  { name: 'relative_cost', unit: null, digits: 6, read: (c) => c.analysis.geometry.mass * c.item.choice.material.relativeCost.value, note: RELATIVE_COST_NOTE },
  { name: 'checks', unit: null, digits: 0, read: structured, json: checksRecord },
  // The yield at the tolerances, where the run was confirmed (the design command and API).
  {
    name: 'yield',
    unit: null,
    digits: 6,
    present: hasYield,
    read: (c) => c.yield?.monteCarlo.yield ?? null,
    column: { head: 'yield', digits: 0, cell: (c) => yieldPercent(c.yield!.monteCarlo.yield) },
  },
  { name: 'yield_samples', unit: null, digits: 0, present: hasYield, read: (c) => c.yield?.monteCarlo.samples ?? null },
  { name: 'yield_standard_error', unit: null, digits: 6, present: hasYield, read: (c) => c.yield?.monteCarlo.standardError ?? null },
  { name: 'yield_estimate', unit: null, digits: 6, present: hasYield, read: (c) => c.yield?.estimate ?? null },
  {
    name: 'yield_limited_by',
    unit: null,
    digits: 0,
    present: hasYield,
    read: (c) => c.yield?.limiting ?? null,
    column: { head: 'yield limited by', digits: 0 },
  },
  { name: 'tolerance_grade', unit: null, digits: 0, present: hasYield, read: (c) => c.yield?.tolerances.grade ?? null },
  { name: 'tolerances', unit: null, digits: 0, present: hasYield, read: structured, json: (c) => tolerancesJson(c.yield!.tolerances) },
  // In the grouped list: the feasible springs (coil counts) this row stands for.
  { name: 'variants', unit: null, digits: 0, present: (c) => c.variants !== undefined, read: (c) => c.variants ?? null, column: { head: 'of', digits: 0 } },
  { name: 'warnings', unit: null, digits: 0, read: structured, json: (c) => c.analysis.warnings.map((w) => w.message) },
];

/** The checks that apply, by name: their signed margins (negative passes). */
function checksRecord(c: Candidate): Record<string, number> {
  const checks: Record<string, number> = {};
  CHECKS.forEach((name, i) => {
    if (c.checks[i] !== -1) checks[name] = c.checks[i];
  });
  return checks;
}

function pick(names: readonly string[]): readonly Field[] {
  return names.map((n) => {
    const f = ALL.find((x) => x.name === n);
    if (!f) throw new Error(`no output field '${n}' in the compression fields registry`);
    return f;
  });
}

/** CSV columns (frontier, sweep): flat figures, each with its unit in the column name. */
export const COMPRESSION_FIELDS = pick([
  'material',
  'ends',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'inner_diameter',
  'spring_index',
  'active_coils',
  'total_coils',
  'free_length',
  'solid_length',
  'rate',
  'working_force',
  'operating_force',
  'max_stress',
  'solid_stress',
  'static_safety_factor',
  'fatigue_safety_factor',
  'buckling_margin',
  'natural_frequency',
  'mass',
  'relative_cost',
  // Only where a spring carries its confirmed yield (a sweep under min_yield): see presentFields.
  'yield',
  'yield_standard_error',
  'yield_estimate',
  'yield_limited_by',
]);

/** The JSON record of a candidate (SI), in its key order. */
export const COMPRESSION_JSON_FIELDS = pick([
  'material',
  'material_name',
  'ends',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'inner_diameter',
  'spring_index',
  'active_coils',
  'total_coils',
  'free_length',
  'solid_length',
  'pitch',
  'rate',
  'mass',
  'wire_volume',
  'relative_cost',
  'points',
  'solid_force',
  'solid_stress',
  'solid_outer_diameter',
  'tensile_strength',
  'strength_source',
  'allowable_stress',
  'static_safety_factor',
  'fatigue_safety_factor',
  'natural_frequency',
  'surge_ends',
  'absolutely_stable',
  'critical_deflection',
  'buckling_margin',
  'checks',
  'yield',
  'yield_samples',
  'yield_standard_error',
  'yield_estimate',
  'yield_limited_by',
  'tolerance_grade',
  'tolerances',
  'variants',
  'warnings',
]);

/** The columns of the ranked text and HTML tables. */
export const COMPRESSION_TABLE_FIELDS = pick([
  'material',
  'wire_diameter',
  'mean_diameter',
  'outer_diameter',
  'inner_diameter',
  'spring_index',
  'active_coils',
  'total_coils',
  'ends',
  'free_length',
  'solid_length',
  'rate',
  'forces',
  'max_stress',
  'static_safety_factor',
  'fatigue_safety_factor',
  'buckling_margin',
  'mass',
  'yield',
  'yield_limited_by',
  'variants',
]);

/** What the columns of the ranked table that are not plain figures mean, under the table. */
export const TABLE_NOTE =
  "C: spring index D/d. buckling: how much further than its largest working deflection the spring may deflect before it buckles (the buckling check's margin); stable: absolutely stable at any deflection; guided: on a rod or in a bore (not checked).";
