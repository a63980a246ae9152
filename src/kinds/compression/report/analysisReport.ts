// The analysis of one spring for people (text) and for machines (JSON, SI).
import { rulesOfThumb, type SpringAnalysis } from '../analysis.js';
import { enduranceSourceLabel } from '../../../model/fatigue.js';
import { surgeEndsLabel } from '../../../model/surge.js';
import { lawAboveMinimum, strengthBasisOf } from '../../../input/material.js';
import type { SpringCase } from '../springFile.js';
import { formatQuantity as q, quantityWriter, sig } from '../../../units/format.js';
import type { UnitSystem } from '../../../units/systems.js';
import { cautionText } from '../../../report/cautions.js';
import { SI_UNITS } from '../../../report/json.js';
import { table } from '../../../report/table.js';

export function analysisJson(c: SpringCase, a: SpringAnalysis, notes: string[]): Record<string, unknown> {
  const g = a.geometry;
  const basis = strengthBasisOf(c.materialChoice);
  const above = lawAboveMinimum(c.materialChoice, g.wireDiameter);
  return {
    units: SI_UNITS,
    material: {
      id: c.materialChoice.material.id,
      name: c.materialChoice.material.name,
      standard: c.materialChoice.material.standard,
      tensile_strength: a.material.tensileStrength,
      allowable_stress: a.material.allowableStress,
      ultimate_shear_strength: a.material.ultimateShear,
      shear_modulus: a.material.shearModulus,
      elastic_modulus: a.material.elasticModulus,
      density: a.material.density,
      max_temperature: a.material.maxTemperature,
      set_removed: c.setRemoved,
      strength_basis: basis.basis,
      strength_source: basis.source,
      ...(above ? { tabulated_minimum_tensile_strength: above.minimum, law_above_minimum: above.excess, tabulated_minimum_source: above.source } : {}),
    },
    geometry: {
      wire_diameter: g.wireDiameter,
      mean_diameter: g.meanDiameter,
      outer_diameter: g.outerDiameter,
      inner_diameter: g.innerDiameter,
      spring_index: g.springIndex,
      active_coils: g.activeCoils,
      total_coils: g.totalCoils,
      ends: g.ends,
      free_length: g.freeLength,
      solid_length: g.solidLength,
      pitch: g.pitch,
      helix_angle: g.helixAngleDeg,
      wire_length: g.wireLength,
      wire_volume: g.wireVolume,
    },
    rate: a.rate,
    solid_length: g.solidLength,
    mass: g.mass,
    stress_factor: { method: c.service.correction, value: a.stressFactor },
    points: a.points.map((p) => ({ length: p.length, deflection: p.deflection, force: p.force, stress: p.stress, stress_ratio: p.stressRatio })),
    solid: { force: a.solid.force, stress: a.solid.stress, solid_safe: a.solid.solidSafe, outer_diameter: a.solid.outerDiameter },
    safety_factors: { static: a.staticSafetyFactor, fatigue: a.fatigue ? a.fatigue.safetyFactor : null },
    fatigue: a.fatigue && {
      life: a.fatigue.life,
      cycles: Number.isFinite(a.fatigue.cycles) ? a.fatigue.cycles : 'infinite',
      criterion: a.fatigue.criterion,
      min_force: a.fatigue.minForce,
      max_force: a.fatigue.maxForce,
      alternating_stress: a.fatigue.alternatingStress,
      mean_stress: a.fatigue.meanStress,
      endurance_source: a.fatigue.enduranceSource,
      repeated_stress_strength: a.fatigue.repeatedStrength,
      endurance_alternating: a.fatigue.endurance.alternating,
      endurance_mean: a.fatigue.endurance.mean,
      ultimate_shear_strength: a.fatigue.ultimateShear,
      alternating_strength: a.fatigue.alternatingStrength,
      safety_factor: a.fatigue.safetyFactor,
    },
    buckling: {
      seating: c.service.seating,
      end_constant: a.buckling.endConstant,
      absolutely_stable: a.buckling.absolutelyStable,
      stable_free_length_limit: a.buckling.stableFreeLengthLimit,
      critical_deflection: a.buckling.absolutelyStable ? null : a.buckling.criticalDeflection,
      max_deflection: a.buckling.maxDeflection,
      buckles: a.buckling.buckles,
    },
    // The surge frequency of the boundary asked (surge_ends), then both, by name; the buckling seating plays no part.
    natural_frequency: a.surge.relevant,
    surge_ends: a.surge.ends,
    surge: { ends: a.surge.ends, both_ends_on_plates: a.surge.bothEndsOnPlates, one_end_free: a.surge.oneEndFree },
    clash: {
      shortest_length: a.clash.shortestLength,
      overrun: a.clash.overrun,
      required_overrun: a.clash.required,
      coil_gap_sum: a.clash.gapSum,
      min_coil_gap_sum_en13906: a.clash.minGapSum,
      ok: a.clash.ok,
    },
    warnings: a.warnings,
    notes,
  };
}

export function analysisText(c: SpringCase, a: SpringAnalysis, system: UnitSystem, notes: string[]): string {
  const g = a.geometry;
  const L = (v: number) => q(v, 'length', system);
  const S = (v: number) => q(v, 'stress', system);
  const out: string[] = [];
  const m = c.materialChoice.material;
  out.push(`Spring analysis: ${m.name} (${m.standard}), ${g.ends} ends`);
  out.push('');
  out.push('Geometry');
  out.push(
    table([
      ['wire diameter d', L(g.wireDiameter), 'mean diameter D', L(g.meanDiameter)],
      ['outer diameter', L(g.outerDiameter), 'inner diameter', L(g.innerDiameter)],
      ['spring index C', sig(g.springIndex), 'stress factor', `${sig(a.stressFactor)} (${c.service.correction})`],
      ['active coils Na', sig(g.activeCoils), 'total coils Nt', sig(g.totalCoils)],
      ['free length L0', L(g.freeLength), 'solid length Ls', L(g.solidLength)],
      ['pitch', L(g.pitch), 'pitch angle', `${sig(g.helixAngleDeg, 3)} deg`],
      ['wire length', L(g.wireLength), 'mass', q(g.mass, 'mass', system)],
      ['rate k', q(a.rate, 'rate', system), 'natural frequency', `${sig(a.surge.relevant)} Hz (${surgeEndsLabel(a.surge.ends)}, surge_ends: ${a.surge.ends})`],
    ]),
  );
  out.push('');
  out.push('Material at this diameter');
  out.push(
    table([
      ['tensile strength Sut', S(a.material.tensileStrength), 'static allowable', `${S(a.material.allowableStress)}${c.setRemoved ? ' (set removed)' : ''}`],
      ['shear modulus G', S(a.material.shearModulus), 'elastic modulus E', S(a.material.elasticModulus)],
      ['density', q(a.material.density, 'density', system), 'max temperature', q(a.material.maxTemperature, 'temperature', system)],
    ]),
  );
  out.push(`  ${strengthLine(c, a, system)}`);
  out.push('');
  out.push('Working points');
  const rows: string[][] = [['', 'length', 'deflection', 'force', 'stress', 'stress / allowable']];
  a.points.forEach((p, i) => rows.push([`point ${i + 1}`, L(p.length), L(p.deflection), q(p.force, 'force', system), S(p.stress), sig(p.stressRatio, 3)]));
  rows.push([
    'solid',
    L(g.solidLength),
    L(g.freeLength - g.solidLength),
    q(a.solid.force, 'force', system),
    S(a.solid.stress),
    sig(a.solid.stress / a.material.allowableStress, 3),
  ]);
  out.push(table(rows));
  out.push(`  solid-safe: ${a.solid.solidSafe ? 'yes' : 'no'}; outer diameter at solid ${L(a.solid.outerDiameter)}`);
  if (a.points.length) out.push(`  static safety factor: ${sig(a.staticSafetyFactor, 3)} (allowable / stress at the most compressed point)`);
  out.push('');
  if (a.fatigue) {
    const fa = a.fatigue;
    out.push(
      `Fatigue (${fa.life === 'infinite' ? 'infinite life' : `${sig(fa.cycles, 3)} cycles`}, ${fa.criterion}, ${enduranceSourceLabel(fa.enduranceSource, c.service.peened)})`,
    );
    out.push(
      table([
        ['repeated-stress strength S_sr', S(fa.repeatedStrength), 'S_sr / Sut', sig(fa.repeatedStrength / a.material.tensileStrength, 3)],
        ['alternating stress', S(fa.alternatingStress), 'mean stress', S(fa.meanStress)],
        ['endurance point Ssa', S(fa.endurance.alternating), 'at Ssm', S(fa.endurance.mean)],
        ['ultimate shear Ssu', S(fa.ultimateShear), 'alternating strength', S(fa.alternatingStrength)],
        ['fatigue safety factor', Number.isFinite(fa.safetyFactor) ? sig(fa.safetyFactor, 3) : 'n/a (no alternating stress)', '', ''],
      ]),
    );
  } else {
    out.push('Fatigue: static service (no cycle count, or fewer than 1e4 cycles)');
  }
  out.push('');
  const b = a.buckling;
  out.push(
    `Buckling (${c.service.seating}, alpha ${b.endConstant}): ${b.absolutelyStable ? `absolutely stable (free length below ${L(b.stableFreeLengthLimit)})` : `critical deflection ${L(b.criticalDeflection)}, largest deflection ${L(b.maxDeflection)}: ${b.buckles ? 'BUCKLES unless guided' : 'stable'}`}`,
  );
  out.push(
    `Clash: force overrun to solid ${sig(a.clash.overrun * 100, 3)}% (asked ${sig(a.clash.required * 100, 3)}%), coil-gap sum ${L(a.clash.gapSum)} (EN 13906-1 static minimum ${L(a.clash.minGapSum)})`,
  );
  out.push(
    `Surge: ${sig(a.surge.bothEndsOnPlates)} Hz with both ends on plates, ${sig(a.surge.oneEndFree)} Hz with one end free; the surge check uses ${surgeEndsLabel(a.surge.ends)} (surge_ends: ${a.surge.ends})`,
  );
  out.push('');
  const all = [...notes, ...rulesOfThumb(a, c.service, quantityWriter(system)).map((w) => w.message)];
  out.push(all.length ? 'Warnings' : 'Warnings: none');
  for (const w of all) out.push(`  ! ${w}`);
  out.push('');
  out.push(cautionText());
  return out.join('\n') + '\n';
}

/** Which tensile strength the figures use, with its source; where the published law is used and the
 * standard's tabulated minimum is known, how far the law runs above it. */
function strengthLine(c: SpringCase, a: SpringAnalysis, system: UnitSystem): string {
  const basis = strengthBasisOf(c.materialChoice);
  const name =
    basis.basis === 'given' ? 'as given' : basis.basis === 'minimum' ? 'tabulated minimum (strength_basis: minimum)' : 'published law (strength_basis: law)';
  const above = lawAboveMinimum(c.materialChoice, a.geometry.wireDiameter);
  const extra = above
    ? `; the law runs ${sig(above.excess * 100, 2)}% above the tabulated minimum ${q(above.minimum, 'stress', system)} here (${above.source}): strength_basis: minimum uses the minimum`
    : '';
  return `tensile strength: ${name}, ${basis.source}${extra}`;
}
