// source: none needed (no outside values here; helpers only). Random springs and requirement sets for the yield tests:
// scenarios of our own, built around a spring so that its checks sit near their limits.
import fc from 'fast-check';
import { findMaterial, loadCatalog } from '../../../../src/catalogs/load.js';
import { materialFigures } from '../../../../src/input/material.js';
import { readRequirements, type Requirements } from '../../../../src/kinds/compression/requirements.js';
import type { EndType } from '../../../../src/kinds/compression/geometry.js';
import { inactiveCoils, pitch, solidLength } from '../../../../src/kinds/compression/geometry.js';
import { solidOuterDiameter } from '../../../../src/kinds/compression/clash.js';
import { springRate } from '../../../../src/model/rate.js';
import type { DesignedSpring } from '../../../../src/kinds/compression/tolerance/springYield.js';

export const catalog = loadCatalog();

export function requirements(raw: Record<string, unknown>): Requirements {
  return readRequirements({ units: 'si', envelope: {}, ...raw }, catalog);
}

export function designed(materialId: string, d: number, D: number, Na: number, ends: EndType, req: Requirements): DesignedSpring {
  const material = findMaterial(catalog, materialId)!;
  const figures = materialFigures({ material }, d, req.setRemoved);
  const k = springRate(figures.shearModulus, d, D, Na, req.directShear);
  return { material, figures, geometry: { wireDiameter: d, meanDiameter: D, activeCoils: Na, ends, freeLength: req.workingLength + req.workingForce / k } };
}

/** A spring and a requirement set whose limits lie within a few percent of the spring's own values
 * (some just inside, some just outside): yields spread over the whole range from 0 to 1. */
export const specArb = fc.record({
  material: fc.constantFrom('music-wire', 'hard-drawn', 'stainless-302', 'chrome-silicon', 'en10270-1-dm', 'phosphor-bronze'),
  d: fc.double({ min: 0.5, max: 5, noNaN: true }),
  index: fc.double({ min: 5, max: 11, noNaN: true }),
  na: fc.double({ min: 4, max: 14, noNaN: true }),
  ends: fc.constantFrom<EndType>('squared-ground', 'squared', 'plain'),
  travelShare: fc.double({ min: 0.2, max: 0.6, noNaN: true }),
  preloadShare: fc.double({ min: 0.1, max: 0.5, noNaN: true }),
  odSlack: fc.double({ min: -0.01, max: 0.04, noNaN: true }),
  forceSlack: fc.double({ min: -0.03, max: 0.06, noNaN: true }),
  freeSlack: fc.double({ min: -0.01, max: 0.05, noNaN: true }),
  cycles: fc.constantFrom(undefined, 1e6),
  grade: fc.constantFrom(1 as const, 2 as const, 3 as const),
  loadTolerance: fc.constantFrom(0, 0.02, 0.05, 0.1),
  guided: fc.boolean(),
  gapRule: fc.boolean(),
  solidSafe: fc.boolean(),
  seating: fc.constantFrom('fixed-fixed' as const, 'fixed-pivoted' as const, 'pivoted-pivoted' as const),
  forcingFrequency: fc.constantFrom(undefined, 5, 40),
});

export type Spec = typeof specArb extends fc.Arbitrary<infer T> ? T : never;

/** A stainless spring near its bore, force and free-length limits. */
export const STAINLESS: Spec = {
  material: 'stainless-302',
  d: 1.4,
  index: 9,
  na: 8,
  ends: 'squared-ground',
  travelShare: 0.4,
  preloadShare: 0.3,
  odSlack: 0.005,
  forceSlack: 0.0,
  freeSlack: 0.02,
  cycles: 1e6,
  grade: 2,
  loadTolerance: 0.05,
  guided: true,
  gapRule: false,
  solidSafe: false,
  seating: 'fixed-fixed',
  forcingFrequency: undefined,
};

/** A spec drawn uniformly from the same ranges (fast-check leans to the ends of each range, which is
 * right for finding edge cases but not for measuring an average agreement). */
export function uniformSpec(u: () => number): Spec {
  const pick = <T>(list: readonly T[]): T => list[Math.floor(u() * list.length)];
  const between = (a: number, b: number) => a + (b - a) * u();
  return {
    material: pick(['music-wire', 'hard-drawn', 'stainless-302', 'chrome-silicon', 'en10270-1-dm', 'phosphor-bronze'] as const),
    d: between(0.5, 5),
    index: between(5, 11),
    na: between(4, 14),
    ends: pick(['squared-ground', 'squared', 'plain'] as const),
    travelShare: between(0.2, 0.6),
    preloadShare: between(0.1, 0.5),
    odSlack: between(-0.01, 0.04),
    forceSlack: between(-0.03, 0.06),
    freeSlack: between(-0.01, 0.05),
    cycles: pick([undefined, 1e6]),
    grade: pick([1, 2, 3] as const),
    loadTolerance: pick([0, 0.02, 0.05, 0.1]),
    guided: u() < 0.5,
    gapRule: u() < 0.5,
    solidSafe: u() < 0.5,
    seating: pick(['fixed-fixed', 'fixed-pivoted', 'pivoted-pivoted'] as const),
    forcingFrequency: pick([undefined, 5, 40]),
  };
}

export function buildSpec(s: Spec): { req: Requirements; spring: DesignedSpring } {
  const material = findMaterial(catalog, s.material)!;
  const d = Math.min(Math.max(s.d, material.minDiameter), material.maxDiameter);
  const D = s.index * d;
  const figures = materialFigures({ material }, d, false);
  const k = springRate(figures.shearModulus, d, D, s.na, false);
  const Ls = solidLength(d, s.na + inactiveCoils(s.ends), s.ends);
  // Room to solid sized so that the static stress at the shortest length is about 60-80% of the allowable.
  const yStatic = (0.7 * figures.allowableStress * Math.PI * d ** 3) / (8 * 1.2 * D * 1.15) / k;
  const L0 = Ls + yStatic * 1.3;
  const L2 = L0 - yStatic * (1 - 0.3 * s.preloadShare);
  const L1 = L2 + (L0 - L2) * s.travelShare;
  const F1 = k * (L0 - L1);
  const F2 = k * (L0 - L2);
  const req = requirements({
    material: s.material,
    ends: s.ends,
    load: { force: F1, length: L1 },
    operating_length: L2,
    operating_force: F2 * (1 + (s.forceSlack * Math.max(s.loadTolerance, 0.01)) / 0.05),
    load_tolerance: s.loadTolerance,
    envelope: { max_outer_diameter: solidOuterDiameter(D, d, pitch(L0, s.na, d, s.ends)) * (1 + s.odSlack), max_free_length: L0 * (1 + s.freeSlack) },
    index: [3, 16],
    guided: s.guided,
    coil_gap_rule: s.gapRule,
    solid_safe: s.solidSafe,
    seating: s.seating,
    ...(s.cycles ? { cycles: s.cycles } : {}),
    ...(s.forcingFrequency ? { forcing_frequency: s.forcingFrequency } : {}),
  });
  return { req, spring: designed(s.material, d, D, s.na, s.ends, req) };
}

/** A requirements document of our own around a random spring (for the drawing and sheet properties): loads from the spring's
 * own rate and a stress well inside the allowable, an envelope a little larger than the spring. */
export const requirementArb = fc
  .record({
    material: fc.constantFrom('music-wire', 'hard-drawn', 'stainless-302', 'chrome-vanadium', 'chrome-silicon', 'oil-tempered'),
    ends: fc.constantFrom('squared-ground', 'squared', 'plain', 'plain-ground'),
    seating: fc.constantFrom('pivoted-pivoted', 'fixed-fixed', 'fixed-pivoted'),
    d: fc.double({ min: 0.6, max: 4, noNaN: true }),
    index: fc.double({ min: 5, max: 11, noNaN: true }),
    na: fc.double({ min: 4, max: 14, noNaN: true }),
    stress: fc.double({ min: 300, max: 600, noNaN: true }),
    strokeShare: fc.double({ min: 0.3, max: 0.7, noNaN: true }),
    overrun: fc.double({ min: 0.2, max: 0.6, noNaN: true }),
    loadTolerance: fc.constantFrom(0.02, 0.05, 0.1, 0.15),
    odRoom: fc.double({ min: 1, max: 1.15, noNaN: true }),
    freeRoom: fc.double({ min: 1, max: 1.4, noNaN: true }),
    rod: fc.option(fc.double({ min: 0.5, max: 0.95, noNaN: true }), { nil: undefined }),
    cycles: fc.constantFrom(undefined, 1e5, 1e6, 1e7),
    guided: fc.boolean(),
    units: fc.constantFrom('si', 'si', 'us'),
  })
  .map((v) => {
    const D = v.index * v.d;
    const k = (79300 * v.d ** 4) / (8 * D ** 3 * v.na);
    const F2 = (v.stress * Math.PI * v.d ** 3) / (8 * D * 1.15);
    const stroke = (v.strokeShare * F2) / k;
    const L2 = v.d * (v.na + 3) + (v.overrun * F2) / k;
    const L1 = L2 + stroke;
    const L0 = L1 + (F2 - k * stroke) / k;
    const r = (x: number) => Number(x.toFixed(1));
    const doc: Record<string, unknown> = {
      units: v.units,
      material: v.material,
      ends: v.ends,
      seating: v.seating,
      load: { force: `${r(F2 - k * stroke)} N`, length: `${r(L1)} mm` },
      operating_length: `${r(L2)} mm`,
      operating_force: `${r(F2)} N`,
      load_tolerance: v.loadTolerance,
      envelope: {
        max_outer_diameter: `${r((D + v.d) * v.odRoom)} mm`,
        max_free_length: `${r(L0 * v.freeRoom)} mm`,
        ...(v.rod !== undefined ? { min_inner_diameter: `${r((D - v.d) * v.rod)} mm` } : {}),
      },
      guided: v.guided,
      top: 3,
      ...(v.cycles !== undefined ? { cycles: v.cycles } : {}),
    };
    return doc;
  });
