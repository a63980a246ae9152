// The requirements document (SI, as `design` reads it) that stands for a set of requirements already
// read, so that a change can be applied by path exactly as `--set` applies it, and read again through
// the same checks. Used when the caller no longer has the file it read.
import type { MaterialChoice } from '../../input/material.js';
import type { Requirements } from './requirements.js';

function materialValue(ch: MaterialChoice): unknown {
  const overrides = {
    shear_modulus: ch.shearModulus,
    elastic_modulus: ch.elasticModulus,
    density: ch.density,
    tensile_strength: ch.tensileStrength,
    allowable_stress: ch.allowableStress,
  };
  const given = Object.entries(overrides).filter(([, v]) => v !== undefined);
  return given.length ? { like: ch.material.id, ...Object.fromEntries(given) } : ch.material.id;
}

export function requirementsDocument(req: Requirements): Record<string, unknown> {
  const envelope = Object.fromEntries(
    Object.entries({
      max_outer_diameter: req.maxOuterDiameter,
      min_inner_diameter: req.minInnerDiameter,
      max_free_length: req.maxFreeLength,
      max_solid_length: req.maxSolidLength,
    }).filter(([, v]) => v !== undefined),
  );
  const doc: Record<string, unknown> = {
    units: 'si',
    material: req.materials.length === 1 ? materialValue(req.materials[0]) : req.materials.map(materialValue),
    ends: req.ends.length === 1 ? req.ends[0] : [...req.ends],
    seating: req.seating,
    load: { force: req.workingForce, length: req.workingLength },
    load_tolerance: req.loadTolerance,
    envelope,
    peened: req.peened,
    fatigue_criterion: req.criterion,
    stress_factor: req.correction,
    direct_shear_rate: req.directShear,
    set_removed: req.setRemoved,
    active_coils: [...req.activeCoils],
    coil_step: req.coilStep,
    index: [...req.index],
    safety: { ...req.safety },
    clash_allowance: req.clashAllowance,
    coil_gap_rule: req.gapRule,
    solid_safe: req.solidSafe,
    guided: req.guided,
    // The grouped list is the default: written only when asked for (it then forces the grid) or turned off.
    ...(req.bestPerWireAsked ? { best_per_wire: true } : req.bestPerWire ? {} : { best_per_wire: false }),
    rank: req.rank,
    top: req.top,
    seed: req.seed,
    diameter_resolution: req.diameterResolution,
  };
  if (req.operatingLength !== undefined) doc.operating_length = req.operatingLength;
  if (req.operatingForce !== undefined) doc.operating_force = req.operatingForce;
  if (req.cycles !== undefined) doc.cycles = Number.isFinite(req.cycles) ? req.cycles : 'infinite';
  if (req.temperature !== undefined) doc.temperature = req.temperature;
  if (req.forcingFrequency !== undefined) doc.forcing_frequency = req.forcingFrequency;
  if (req.allowableStress !== undefined) doc.allowable_stress = req.allowableStress;
  // The made spring's tolerances and the yield asked of it (a fraction override as the percentage it was read from).
  doc.tolerance_grade = req.tolerance.grade;
  const overrides = Object.entries(req.tolerance.overrides);
  if (overrides.length) doc.tolerances = Object.fromEntries(overrides.map(([k, o]) => [k, 'fraction' in o ? `${o.fraction * 100}%` : o.absolute]));
  if (req.minYield !== undefined) doc.min_yield = req.minYield;
  if (req.wireSizesLabel === 'the listed diameters') doc.wire_sizes = req.wireSizes(req.materials[0]);
  else if (req.wireSizesLabel !== "each material's own series") doc.wire_sizes = req.wireSizesLabel;
  return doc;
}
