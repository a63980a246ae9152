// A verdict for people (text) and machines (JSON, SI): every check with the spring's figure, the limit
// and the margin, which band the working force was held to, and what fails by how much.
import { rulesOfThumb } from '../kinds/compression/analysis.js';
import type { Requirements } from '../kinds/compression/requirements.js';
import { cautionText, cautionsOf } from '../report/cautions.js';
import { SI_UNITS } from '../report/json.js';
import { table } from '../report/table.js';
import { formatQuantity, quantityWriter, sig, yieldPercent } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import { PASS_TOLERANCE } from './judge.js';
import { bandText, type WorkingBand } from './band.js';
import { givenService } from './given.js';
import { spareOf, type CheckLine, type ValueKind, type Verdict } from './judge.js';
import { shortfallText } from '../report/checkFigure.js';

/** The spring itself and its main figures, SI. */
export function givenSpringRecord(v: Verdict): Record<string, unknown> {
  const a = v.analysis;
  const g = a.geometry;
  const m = v.spring.choice.material;
  return {
    material: m.id,
    material_name: m.name,
    ends: g.ends,
    wire_diameter: g.wireDiameter,
    mean_diameter: g.meanDiameter,
    outer_diameter: g.outerDiameter,
    inner_diameter: g.innerDiameter,
    spring_index: g.springIndex,
    active_coils: g.activeCoils,
    total_coils: g.totalCoils,
    free_length: g.freeLength,
    solid_length: g.solidLength,
    rate: a.rate,
    mass: g.mass,
    peened: v.spring.peened,
    set_removed: v.spring.setRemoved,
    points: a.points.map((p) => ({ length: p.length, force: p.force, stress: p.stress })),
    solid_force: a.solid.force,
    solid_stress: a.solid.stress,
    allowable_stress: a.material.allowableStress,
    static_safety_factor: a.staticSafetyFactor,
    fatigue_safety_factor: a.fatigue ? a.fatigue.safetyFactor : null,
    natural_frequency: a.surge.relevant,
    critical_deflection: a.buckling.absolutelyStable ? null : a.buckling.criticalDeflection,
  };
}

export function checkLineRecord(l: Omit<CheckLine, 'name'> & { name: string }): Record<string, unknown> {
  // spare: the margin in the figure's own unit (SI), positive inside the limit.
  return {
    name: l.name,
    label: l.label,
    value: l.value,
    relation: l.relation,
    limit: l.limit,
    spare: spareOf(l),
    margin: l.margin,
    pass: l.pass,
    ...(l.note ? { note: l.note } : {}),
  };
}

export function bandRecord(b: WorkingBand): Record<string, unknown> {
  return { force: b.force, length: b.length, tolerance: b.tolerance, source: b.source, low: b.low, high: b.high };
}

/** The failing checks and by how much: `by` a fraction of the limit (null for a categorical check),
 * `spare` the margin in the check's own unit (SI, negative: so many mm of clearance short), as in `checks`. */
export function failingRecord(v: Verdict): { name: string; by: number | null; spare: number | null }[] {
  return v.failing.map((l) => ({ name: l.name, by: l.margin === null ? null : -l.margin, spare: spareOf(l) }));
}

/** What a loose spring means, in words: where, by how much, and the free length that would give the
 * working force at this rate. */
export function looseNotes(v: Verdict, band: WorkingBand, system: UnitSystem): string[] {
  const L = (x: number) => formatQuantity(x, 'length', system);
  const L0 = v.analysis.geometry.freeLength;
  return v.loose.map(
    (p) =>
      `the spring is loose at the ${p.at} length: ${L(p.length)} is beyond its free length ${L(L0)}, so it carries no force there (taken as 0, never negative)` +
      (p.at === 'working'
        ? `; at its rate of ${formatQuantity(v.analysis.rate, 'rate', system)} a free length of ${L(band.length + band.force / v.analysis.rate)} gives the working force`
        : ''),
  );
}

export function checkJson(v: Verdict, band: WorkingBand, notes: string[]): Record<string, unknown> {
  return {
    units: SI_UNITS,
    pass: v.pass,
    failing: failingRecord(v),
    limiting_check: v.limiting ? { name: v.limiting.name, margin: v.limiting.margin, spare: spareOf(v.limiting) } : null,
    working_band: bandRecord(band),
    spring: givenSpringRecord(v),
    checks: v.lines.map(checkLineRecord),
    loose: v.loose,
    notes: [...notes, ...looseNotes(v, band, 'si')],
    warnings: v.analysis.warnings.map((w) => w.message),
    cautions: cautionsOf(),
  };
}

export function writeValue(x: number | string | null, kind: ValueKind, system: UnitSystem, digits = 4): string {
  if (x === null) return '-';
  if (typeof x === 'string') return x;
  if (kind === 'text' || kind === 'number') return sig(x, digits);
  if (kind === 'percent') return yieldPercent(x); // as design and the spring file print a yield
  return formatQuantity(x, kind, system, digits);
}

export function writeMargin(m: number | null): string {
  if (m === null) return '';
  // A spring at its limit, within the tolerance a check passes by, reads 0%, not +1.63e-8% or a
  // negative share beside "pass"; past it, three figures (never fewer than 0.0001%: no exponent).
  if (Math.abs(m) <= PASS_TOLERANCE) return '0%';
  return `${m >= 0 ? '+' : ''}${sig(m * 100, 3)}%`;
}

/** A line's margin as the table shows it: in the check's own unit where a share would not read
 * (clash: "+6.95 mm" of coil clearance), else as a share of the limit. */
export function writeLineMargin(l: Omit<CheckLine, 'name'>, system: UnitSystem): string {
  if (!l.unitMargin) return writeMargin(l.margin);
  const spare = spareOf(l);
  return spare === null ? '' : `${spare >= 0 ? '+' : '-'}${writeValue(Math.abs(spare), l.kind, system)}`;
}

/** "outer_diameter by 2.5% (16.4 mm, limit 16 mm)" */
export function failureText(l: Omit<CheckLine, 'name'> & { name: string }, system: UnitSystem): string {
  // Five figures: a near miss by a fraction of a percent must not read "10.35 N against <= 10.35 N".
  if (l.value === null && l.kind !== 'text') return `${l.name} (not judged)`;
  const by = shortfallText(l, system);
  if (by === null) return `${l.name} (${writeValue(l.value, l.kind, system)}, not ${l.limit})`;
  return `${l.name} ${by} (${writeValue(l.value, l.kind, system, 5)} against ${l.relation} ${writeValue(l.limit, l.kind, system, 5)})`;
}

/** The smallest-margin cell of a table row ("static_stress +3.43%", "clash +0.250 mm"), '-' without one. */
export function smallestMarginText(l: (Omit<CheckLine, 'name'> & { name: string }) | null, system: UnitSystem): string {
  return l ? `${l.name} ${writeLineMargin(l, system)}` : '-';
}

export function checkTable(v: Verdict, system: UnitSystem): string {
  const rows = [['check', 'spring', '', 'limit', 'margin', 'verdict', '']];
  for (const l of v.lines) {
    rows.push([
      l.name,
      writeValue(l.value, l.kind, system),
      l.relation,
      l.limit === null && l.name === 'buckling' ? 'stable' : writeValue(l.limit, l.kind, system),
      writeLineMargin(l, system),
      l.pass ? 'pass' : 'FAIL',
      l.pass ? (l.note ?? '') : l.label,
    ]);
  }
  return table(rows);
}

export function verdictSummary(v: Verdict, system: UnitSystem): string {
  if (v.pass)
    return `Result: all ${v.lines.length} checks pass${v.limiting ? `; the smallest margin is ${v.limiting.name} at ${writeLineMargin(v.limiting, system)}` : ''}.`;
  return `Result: FAILS ${v.failing.length} of ${v.lines.length} checks: ${v.failing.map((l) => failureText(l, system)).join('; ')}.`;
}

export function checkText(v: Verdict, req: Requirements, band: WorkingBand, notes: string[], system: UnitSystem): string {
  const g = v.analysis.geometry;
  const L = (x: number) => formatQuantity(x, 'length', system);
  const m = v.spring.choice.material;
  const out: string[] = [];
  out.push(
    `Check of a given spring: ${m.id} (${m.name}), wire ${L(g.wireDiameter)}, OD ${L(g.outerDiameter)}, ${sig(g.activeCoils, 4)} active of ${sig(g.totalCoils, 4)} coils, ${g.ends} ends, free length ${L(g.freeLength)}; rate ${formatQuantity(v.analysis.rate, 'rate', system)}`,
  );
  out.push(`Working force band: ${bandText(band, system)}`);
  out.push('');
  out.push(checkTable(v, system));
  out.push('');
  out.push(verdictSummary(v, system));
  const warnings = rulesOfThumb(v.analysis, givenService(req, v.spring), quantityWriter(system)).map((w) => w.message);
  const all = [...looseNotes(v, band, system), ...notes, ...warnings];
  if (all.length) {
    out.push('');
    out.push('Notes:');
    for (const n of all) out.push(`  ! ${n}`);
  }
  out.push('');
  out.push(cautionText());
  return out.join('\n') + '\n';
}
