// The spring file (as `coilfront analyze` reads it) that describes a candidate under its requirements,
// so that any spring the search reports can be checked again, independently, by the single-spring path.
import type { Requirements } from './requirements.js';
import type { Candidate } from './design.js';

export function springDocument(c: Candidate, req: Requirements): Record<string, unknown> {
  const g = c.geometry;
  const doc: Record<string, unknown> = {
    units: 'si',
    material: c.item.choice.material.id,
    wire_diameter: g.wireDiameter,
    mean_diameter: g.meanDiameter,
    active_coils: g.activeCoils,
    ends: g.ends,
    free_length: g.freeLength,
    strength_basis: req.strengthBasis,
    seating: req.seating,
    surge_ends: req.surgeEnds,
    lengths: req.operatingLength !== undefined ? [req.workingLength, req.operatingLength] : [req.workingLength],
    peened: req.peened,
    fatigue_criterion: req.criterion,
    stress_factor: req.correction,
    direct_shear_rate: req.directShear,
    set_removed: req.setRemoved,
    clash_allowance: req.clashAllowance,
    coil_gap_rule: req.gapRule,
    surge_margin: req.safety.surge,
  };
  const ch = c.item.choice;
  // A requirement-level allowable_stress is the one the search judged by (figuresUnder).
  const allowable = req.allowableStress ?? ch.allowableStress;
  if (ch.shearModulus !== undefined || ch.elasticModulus !== undefined || ch.density !== undefined || ch.tensileStrength !== undefined || allowable !== undefined) {
    doc.material = Object.fromEntries(Object.entries({ like: ch.material.id, shear_modulus: ch.shearModulus, elastic_modulus: ch.elasticModulus, density: ch.density, tensile_strength: ch.tensileStrength, allowable_stress: allowable }).filter(([, v]) => v !== undefined));
  }
  if (req.cycles !== undefined) doc.cycles = Number.isFinite(req.cycles) ? req.cycles : 'infinite';
  if (req.temperature !== undefined) doc.temperature = req.temperature;
  if (req.forcingFrequency !== undefined) doc.forcing_frequency = req.forcingFrequency;
  return doc;
}
