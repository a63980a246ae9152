// The tolerance model of a made spring: catalog figures, the user's overrides, and the free-length
// spread that the adjustment to the working force leaves.
import { describe, expect, it } from 'vitest';
import { findMaterial, loadCatalog } from '../../../../src/catalogs/load.js';
import { loadToleranceCatalog } from '../../../../src/kinds/compression/tolerance/catalog.js';
import { rateSpread, springTolerances, tolerancesJson, type NominalSpring } from '../../../../src/kinds/compression/tolerance/model.js';

const tc = loadToleranceCatalog();
const cat = loadCatalog();
const nominal = (id: string, extra: Partial<NominalSpring> = {}): NominalSpring => ({
  material: findMaterial(cat, id)!,
  wireDiameter: 1.6,
  meanDiameter: 12,
  activeCoils: 8,
  shearModulus: 80000,
  workingForce: 20,
  rate: 2,
  ...extra,
});

describe('tolerances of a made spring', () => {
  it('reads each figure from the catalog by standard, grade, diameter and index', () => {
    const t = springTolerances(tc, { grade: 2, overrides: {} }, nominal('en10270-1-dm'));
    expect(t.wireDiameter.halfWidth).toBe(0.02);
    expect(t.meanDiameter.halfWidth).toBe(0.3); // D 12, w 7.5: grade 2, first column
    expect(t.shearModulus.halfWidth).toBeCloseTo(1600, 9);
    expect(t.activeCoils.halfWidth).toBe(0.25);
    expect(t.workingForce.halfWidth).toBe(0);
    expect(t.standards).toEqual(['EN 15800 (formerly DIN 2095)', 'EN 10270-1']);
    expect(t.notes).toEqual([]);
  });

  it('a finer grade narrows only the coil diameter', () => {
    const g1 = springTolerances(tc, { grade: 1, overrides: {} }, nominal('en10270-1-dm'));
    const g3 = springTolerances(tc, { grade: 3, overrides: {} }, nominal('en10270-1-dm'));
    expect(g1.meanDiameter.halfWidth).toBe(0.15);
    expect(g3.meanDiameter.halfWidth).toBe(0.6);
    expect(g1.wireDiameter).toEqual(g3.wireDiameter);
    expect(g1.freeLength.halfWidth).toBeLessThan(g3.freeLength.halfWidth);
  });

  it("takes the user's figures, absolute or as a fraction, and says so", () => {
    const t = springTolerances(
      tc,
      { grade: 2, overrides: { wire_diameter: { absolute: 0.005 }, shear_modulus: { fraction: 0.01 }, working_force: { fraction: 0.02 } } },
      nominal('stainless-302'),
    );
    expect(t.wireDiameter).toEqual({ halfWidth: 0.005, source: 'given in the requirements' });
    expect(t.shearModulus.halfWidth).toBeCloseTo(800, 9);
    expect(t.workingForce.halfWidth).toBeCloseTo(0.4, 12);
  });

  it("the free-length spread is the working deflection times the rate's spread (first order, L0 = L1 + F1/k)", () => {
    const n = nominal('en10270-1-dm');
    const t = springTolerances(tc, { grade: 2, overrides: {} }, n);
    const rel = Math.hypot((4 * 0.02) / 1.6, (3 * 0.3) / 12, 0.02, 0.25 / 8) / 3;
    expect(rateSpread(n, t)).toBeCloseTo(rel, 12);
    expect(t.freeLength.halfWidth).toBeCloseTo(3 * (20 / 2) * rel, 12);
    expect(tolerancesJson(t).free_length).toBe(t.freeLength.halfWidth);
  });

  it('every figure it reports is finite for springs across the tables', () => {
    for (const D of [0.5, 3, 50, 300])
      for (const d of [0.1, 1, 8]) {
        const t = springTolerances(tc, { grade: 3, overrides: {} }, nominal('music-wire', { wireDiameter: d, meanDiameter: D }));
        for (const v of Object.values(tolerancesJson(t))) expect(Number.isFinite(v)).toBe(true);
      }
  });
});
