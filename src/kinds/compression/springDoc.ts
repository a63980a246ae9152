// The spring file (as `coilfront analyze` reads it) that describes a candidate under its requirements,
// so that any spring the search reports can be checked again, independently, by the single-spring path.
import type { Requirements } from './requirements.js';
import type { Candidate } from './design.js';
import { drawnSpring, type DrawnSpring } from './tolerance/precision.js';
import { INCH_MM, type Kind } from '../../units/kinds.js';
import { displayUnit, type UnitSystem } from '../../units/systems.js';
import { isRecord } from '../../units/fields.js';
import { designedSpring } from './tolerance/confirm.js';
import { yieldPercent } from '../../units/format.js';
import { stringify as stringifyYaml } from 'yaml';
import { CAUTIONS } from '../../report/cautions.js';

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
  if (
    ch.shearModulus !== undefined ||
    ch.elasticModulus !== undefined ||
    ch.density !== undefined ||
    ch.tensileStrength !== undefined ||
    allowable !== undefined
  ) {
    doc.material = Object.fromEntries(
      Object.entries({
        like: ch.material.id,
        shear_modulus: ch.shearModulus,
        elastic_modulus: ch.elasticModulus,
        density: ch.density,
        tensile_strength: ch.tensileStrength,
        allowable_stress: allowable,
      }).filter(([, v]) => v !== undefined),
    );
  }
  if (req.cycles !== undefined) doc.cycles = Number.isFinite(req.cycles) ? req.cycles : 'infinite';
  if (req.temperature !== undefined) doc.temperature = req.temperature;
  if (req.forcingFrequency !== undefined) doc.forcing_frequency = req.forcingFrequency;
  return doc;
}

/** A length as a drawing writes it, a plain number in the file's system (binary noise cleaned): mm in SI,
 * inches in US. */
function drawnLength(mm: number, system: UnitSystem): number {
  return Number((system === 'us' ? mm / INCH_MM : mm).toPrecision(10));
}

/** The wire as listed: in a US file a wire listed in inches is a plain number of inches; one listed in
 * mm (a metric size: 1.6 mm is 0.06299... in) keeps its mm, spelt out. */
function drawnWire(mm: number, system: UnitSystem): number | string {
  if (system !== 'us') return drawnLength(mm, system);
  const inches = Number((mm / INCH_MM).toPrecision(4));
  return Math.abs(inches * INCH_MM - mm) <= 1e-9 * mm ? inches : `${Number(mm.toPrecision(10))} mm`;
}

/** A quantity of the service conditions or the material, plain in the file's system (10 figures). */
function inFileUnits(core: number, kind: Kind, system: UnitSystem): number {
  return Number(displayUnit(system, kind).fromCore(core).toPrecision(10));
}

// The material's overrides by their unit.
const OVERRIDE_KINDS: Record<string, Kind> = {
  shear_modulus: 'stress',
  elastic_modulus: 'stress',
  tensile_strength: 'stress',
  allowable_stress: 'stress',
  density: 'density',
};

export interface ExportedSpring {
  /** The spring file (plain data, as `analyze` and `check` read it). */
  doc: Record<string, unknown>;
  /** The spring as drawn and its checks at those values. */
  drawn: DrawnSpring;
}

/**
 * The spring file of a reported spring at drawing precision (src/kinds/compression/tolerance/precision.ts): the wire as
 * listed, the controlled diameter (outer in a bore, inner over a rod) to 0.01 mm or 0.001 in, the free
 * length to 0.1 mm or 0.01 in, the coils to the coil step, with the requirement's service conditions;
 * of the drawings near the design, one that passes every check `check` applies when there is one.
 * Lengths of the spring are written in the requirement's unit system.
 */
export function drawnSpringDocument(c: Candidate, req: Requirements): ExportedSpring {
  const drawn = drawnSpring(designedSpring(c), req);
  const g = drawn.geometry;
  const base = springDocument({ ...c, geometry: g }, req);
  const doc: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(base)) {
    // In the requirement's unit system throughout: a US file is drawn in inches (units: us), its service
    // conditions and material overrides in US units, as a US user wrote the requirement.
    if (k === 'units') doc[k] = req.system;
    else if (k === 'mean_diameter') doc[drawn.controlled === 'outer' ? 'outer_diameter' : 'inner_diameter'] = drawnLength(drawn.controlledValue, req.system);
    else if (k === 'wire_diameter') doc[k] = drawnWire(v as number, req.system);
    else if (k === 'free_length') doc[k] = drawnLength(v as number, req.system);
    else if (k === 'lengths') doc[k] = (v as number[]).map((L) => inFileUnits(L, 'length', req.system));
    else if (k === 'temperature') doc[k] = inFileUnits(v as number, 'temperature', req.system);
    else if (k === 'material' && isRecord(v))
      doc[k] = Object.fromEntries(
        Object.entries(v).map(([m, x]) => [m, typeof x === 'number' && OVERRIDE_KINDS[m] ? inFileUnits(x, OVERRIDE_KINDS[m], req.system) : x]),
      );
    else doc[k] = v;
  }
  return { doc, drawn };
}

/** The exported spring as a YAML file: a comment header (which spring, the precision, its verdict as
 * drawn, the cautions), then the document. */
export function springFileText(c: Candidate, req: Requirements, rank: number): { text: string; exported: ExportedSpring } {
  const exported = drawnSpringDocument(c, req);
  const { drawn } = exported;
  const precision = req.system === 'us' ? 'diameters to 0.001 in, free length to 0.01 in' : 'diameters to 0.01 mm, free length to 0.1 mm';
  const header = [
    `Spring ${rank} of a coilfront design, as drawn: wire as listed, ${precision}, coils to ${req.coilStep}.`,
    `The ${drawn.controlled} diameter is the controlled one; the free length is the one to adjust to meet the working force.`,
    drawn.failing.length
      ? `As drawn it FAILS ${drawn.failing.join(', ')}: check it with \`coilfront check\` before use.`
      : `As drawn it passes every check of the requirements it was designed for (\`coilfront check\` this file against them).`,
    ...(drawn.madeYield && req.minYield !== undefined
      ? [
          `Yield as drawn: ${yieldPercent(drawn.madeYield.yield)} of made springs pass (seeded Monte Carlo, seed ${req.seed}, ${drawn.madeYield.samples} springs; min_yield ${yieldPercent(req.minYield)}): the figure \`coilfront check\` prints for this file.`,
        ]
      : []),
    `Working force at the working length as drawn: ${Number(drawn.workingForce.toPrecision(5))} N (${Number((drawn.workingForceDeviation * 100).toPrecision(3))}% from the requirement).`,
    ...CAUTIONS,
  ];
  const text = header.map((l) => `# ${l}`).join('\n') + '\n' + stringifyYaml(exported.doc, { lineWidth: 0 });
  return { text, exported };
}
