// The output fields of a compression spring, one definition each: name, unit kind and how to read it
// (in SI) from a candidate. CSV is rendered from this list (src/report/fields.ts); a new column is one
// entry here.
import type { Candidate } from './design.js';
import type { FieldDefinition } from '../kind.js';

const last = (c: Candidate) => c.analysis.points[c.analysis.points.length - 1];

export const COMPRESSION_FIELDS: readonly FieldDefinition<Candidate>[] = [
  { name: 'material', unit: null, digits: 0, read: (c) => c.item.choice.material.id },
  { name: 'ends', unit: null, digits: 0, read: (c) => c.geometry.ends },
  { name: 'wire_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.wireDiameter },
  { name: 'mean_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.meanDiameter },
  { name: 'outer_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.outerDiameter },
  { name: 'inner_diameter', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.innerDiameter },
  { name: 'spring_index', unit: null, digits: 6, read: (c) => c.analysis.geometry.springIndex },
  // Coil counts are steps of the coil_step: written as they are.
  { name: 'active_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.activeCoils },
  { name: 'total_coils', unit: null, digits: 0, read: (c) => c.analysis.geometry.totalCoils },
  { name: 'free_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.freeLength },
  { name: 'solid_length', unit: 'length', digits: 6, read: (c) => c.analysis.geometry.solidLength },
  { name: 'rate', unit: 'rate', digits: 6, read: (c) => c.analysis.rate },
  { name: 'working_force', unit: 'force', digits: 6, read: (c) => c.analysis.points[0].force },
  { name: 'operating_force', unit: 'force', digits: 6, read: (c) => (c.analysis.points.length > 1 ? last(c).force : null) },
  { name: 'max_stress', unit: 'stress', digits: 6, read: (c) => Math.max(...c.analysis.points.map((p) => p.stress)) },
  { name: 'solid_stress', unit: 'stress', digits: 6, read: (c) => c.analysis.solid.stress },
  { name: 'static_safety_factor', unit: null, digits: 5, read: (c) => c.analysis.staticSafetyFactor },
  { name: 'fatigue_safety_factor', unit: null, digits: 5, read: (c) => (c.analysis.fatigue ? c.analysis.fatigue.safetyFactor : null) },
  { name: 'natural_frequency', unit: 'frequency', digits: 5, read: (c) => c.analysis.surge.relevant },
  { name: 'mass', unit: 'mass', digits: 6, read: (c) => c.analysis.geometry.mass },
  { name: 'relative_cost', unit: null, digits: 6, read: (c) => c.analysis.geometry.mass * c.item.choice.material.relativeCost.value },
];
