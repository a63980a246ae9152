// The spring file of an extension spring (`kind: extension`): one given spring and how it is used.
// Lengths are inside the loops. Every mistake is one InputError naming the field.
import type { Catalog } from '../../catalogs/types.js';
import { FATIGUE_CRITERIA, type FatigueCriterion } from '../../model/fatigue.js';
import type { StressCorrection } from '../../model/stressFactor.js';
import { Fields } from '../../units/fields.js';
import { LIMITS } from '../../input/limits.js';
import { parseMaterialChoice, strengthRangeNote, type MaterialChoice } from '../../input/material.js';
import { parseCycles } from '../../input/cycles.js';
import { formatQuantity } from '../../units/format.js';
import { InputError, parseQuantity } from '../../units/parse.js';
import type { UnitSystem } from '../../units/systems.js';
import type { ExtensionGeometry, ExtensionService } from './analysis.js';
import { loadExtensionCatalog, loopRule, type ExtensionCatalog } from './catalog.js';
import { bodyLength, extensionActiveCoils, loopHeight } from './geometry.js';
import { extensionMaterial, type ExtensionMaterial } from './material.js';
import { springRate } from '../../model/rate.js';

/** Loop radii a spring file may give, as multiples of the coil's mean radius D/2: beyond them the loop is
 * not one formed from the end coil (see readExtensionSpring); within them, one more than LOOP_RADIUS_NEAR
 * from D/2 is warned about (analysis.ts). */
export const LOOP_RADIUS_RANGE = [0.5, 2] as const;

export interface ExtensionCase {
  kind: 'extension';
  system: UnitSystem;
  materialChoice: MaterialChoice;
  material: ExtensionMaterial;
  geometry: ExtensionGeometry;
  service: ExtensionService;
  notes: string[];
}

/** `kind`, when present, must say extension (the seam dispatches on it). */
export function readKind(f: Fields, expected: 'extension'): void {
  if (!f.has('kind')) return;
  const k = f.get('kind');
  if (k !== expected) throw new InputError('kind', expected, k);
}

export function readExtensionSpring(raw: unknown, catalog: Catalog, ext: ExtensionCatalog = loadExtensionCatalog(catalog.materials)): ExtensionCase {
  const f = Fields.document(raw);
  readKind(f, 'extension');
  const system = f.system;
  const q = (v: number, kind: 'length' | 'force' = 'length') => formatQuantity(v, kind, system);
  const choice = parseMaterialChoice(f.require('material', 'a material id or { like: <id>, ... }'), system, catalog, 'material');
  const d = f.requiredQuantity('wire_diameter', 'length', { positive: true });
  const which = f.exactlyOne(['mean_diameter', 'outer_diameter', 'inner_diameter']);
  const given = f.requiredQuantity(which, 'length', { positive: true });
  const D = which === 'mean_diameter' ? given : which === 'outer_diameter' ? given - d : given + d;
  if (!(D > d)) throw new InputError(which, `a diameter that leaves a mean diameter above the wire diameter ${q(d)}`, f.get(which));
  const Nb = f.number('body_coils', { positive: true });
  if (Nb === undefined) throw new InputError('body_coils', 'the number of coils in the body (the field is missing)');
  const Fi = f.quantity('initial_tension', 'force', { nonNegative: true });
  if (Fi === undefined) throw new InputError('initial_tension', 'the force wound into the coils, such as "4 N" (the field is missing)');

  const loopId = f.string('loop') ?? 'full';
  const rule = loopRule(ext, loopId);
  if (!rule) throw new InputError('loop', `one of ${ext.loopTypes.map((t) => t.id).join(' | ')}`, f.get('loop'));
  const explicitLoop = f.quantity('loop_length', 'length', { positive: true });
  const L0given = f.quantity('free_length', 'length', { positive: true });
  if (explicitLoop !== undefined && L0given !== undefined)
    throw new InputError('loop_length, free_length', 'only one of loop_length | free_length (the other follows from it)');
  const body = bodyLength(d, Nb);
  let h: number;
  if (L0given !== undefined) {
    if (!(L0given > body)) throw new InputError('free_length', `a free length inside the loops above the body length ${q(body)}`, f.get('free_length'));
    h = (L0given - body) / 2;
  } else {
    if (rule.needsLength && explicitLoop === undefined)
      throw new InputError(
        'loop_length',
        `the height of each ${rule.id} loop from the end of the body to the inside of the loop (the field is missing), or free_length`,
      );
    h = loopHeight(rule, d, D, explicitLoop);
  }
  const r1 = f.quantity('loop_radius', 'length', { positive: true }) ?? D / 2;
  if (!(2 * r1 > d)) throw new InputError('loop_radius', `a loop radius above half the wire diameter (${q(d / 2)})`, f.get('loop_radius'));
  // The loop types the model knows are formed from the end coil: the loop stresses take the body's D/2 as
  // the loop's moment arm (Shigley eq. 10-34), so a loop of another size is not one of them.
  const [r1Low, r1High] = LOOP_RADIUS_RANGE.map((x) => (x * D) / 2);
  if (r1 < r1Low || r1 > r1High)
    throw new InputError(
      'loop_radius',
      `a loop radius near the coil's mean radius D/2 = ${q(D / 2)} (${q(r1Low)} to ${q(r1High)}): ${rule.id} loops are formed from the end coil, and their stresses take D/2 as the loop's moment arm (Shigley eq. 10-34)`,
      f.get('loop_radius'),
    );
  const r2given = f.quantity('bend_radius', 'length', { positive: true });
  const r2 = r2given ?? (ext.bendIndex.value * d) / 2;
  if (!(2 * r2 > d)) throw new InputError('bend_radius', `a bend radius above half the wire diameter (${q(d / 2)})`, f.get('bend_radius'));
  // The bend from the body into the loop is part of the loop: it cannot be wider than the loop itself.
  if (r2given !== undefined && r2 > r1 * (1 + 1e-9))
    throw new InputError(
      'bend_radius',
      `a bend radius at most the loop radius r1 = ${q(r1)} (the bend into the loop is part of the loop)`,
      f.get('bend_radius'),
    );

  const criterion = (f.choice('fatigue_criterion', FATIGUE_CRITERIA) ?? 'gerber') as FatigueCriterion;
  const correction = (f.choice('stress_factor', ['bergstrasser', 'wahl'] as const) ?? 'bergstrasser') as StressCorrection;
  const material = extensionMaterial(choice, d, ext);
  const L0 = body + 2 * h;
  const k = springRate(material.figures.shearModulus, d, D, extensionActiveCoils(Nb, material.figures.shearModulus, material.figures.elasticModulus));

  if (f.has('lengths') && f.has('forces')) throw new InputError('lengths, forces', 'only one of lengths | forces (both given)');
  let lengths: number[] = [];
  if (f.has('lengths')) {
    lengths = (f.list('lengths') ?? []).map((v, i) => {
      const L = parseQuantity(v, 'length', system, `lengths[${i}]`, { positive: true });
      if (L < L0 - 1e-9) throw new InputError(`lengths[${i}]`, `a length inside the loops at or above the free length ${q(L0)} (an extension spring)`, v);
      return L;
    });
  } else if (f.has('forces')) {
    lengths = (f.list('forces') ?? []).map((v, i) => {
      const F = parseQuantity(v, 'force', system, `forces[${i}]`, { positive: true });
      if (F < Fi) throw new InputError(`forces[${i}]`, `a force at or above the initial tension ${q(Fi, 'force')} (below it the spring does not extend)`, v);
      return L0 + (F - Fi) / k;
    });
  }
  const cycles = parseCycles(f.get('cycles'), 'cycles');
  const service: ExtensionService = {
    lengths,
    cycles,
    peened: f.bool('peened') ?? false,
    criterion,
    correction,
    temperature: f.quantity('temperature', 'temperature'),
    forcingFrequency: f.quantity('forcing_frequency', 'frequency', { nonNegative: true }),
    surgeMargin: f.number('surge_margin', { min: LIMITS.safetyMin, max: LIMITS.surgeMarginMax }) ?? 15,
  };
  f.rejectUnknown();
  const notes: string[] = [];
  const range = strengthRangeNote(choice, d, system);
  if (range) notes.push(range);
  if (r2given === undefined) notes.push(`bend_radius not given: r2 = ${q(r2)} assumed (bend index C2 = ${ext.bendIndex.value}; ${ext.bendIndex.source})`);
  if (cycles !== undefined && cycles < 1e4) notes.push(`${cycles} cycles is below 1e4: judged as static service`);
  return {
    kind: 'extension',
    system,
    materialChoice: choice,
    material,
    geometry: { wireDiameter: d, meanDiameter: D, bodyCoils: Nb, loop: rule, loopHeight: h, loopRadius: r1, bendRadius: r2, initialTension: Fi },
    service,
    notes,
  };
}
