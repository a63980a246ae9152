// The tolerance catalog: spot checks against the tables its figures come from, and the loader's
// refusal of malformed tables.
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { catalogDirectory, findMaterial, loadCatalog } from '../../../../src/catalogs/load.js';
import { loadToleranceCatalog, parseToleranceCatalog } from '../../../../src/kinds/compression/tolerance/catalog.js';
import { meanDiameterTolerance, wireDiameterTolerance } from '../../../../src/kinds/compression/tolerance/model.js';

const tc = loadToleranceCatalog();
const materials = loadCatalog();
const material = (id: string) => findMaterial(materials, id)!;
const raw = () => parse(readFileSync(join(catalogDirectory(), 'tolerances.yaml'), 'utf8')) as Record<string, any>;

describe('coil-diameter tolerance (EN 15800 / DIN 2095)', () => {
  // Source: spring makers' summaries of DIN 2095 / EN 15800 (not confirmed from the standard):
  // D 0.63-1: grade 1 0.05/0.07/0.10, grade 2 0.07/0.10/0.15, grade 3 0.10/0.15/0.20 for w 4-8 / 8-14 / 14-20;
  // D 4-6.3: 0.10/0.15/0.20, 0.20/0.25/0.30, 0.40/0.50/0.60; D 10-16: 0.15/0.20/0.25, 0.30/0.35/0.40, 0.60/0.70/0.80.
  const cases: [number, [number, number, number][]][] = [
    [
      0.8,
      [
        [0.05, 0.07, 0.1],
        [0.07, 0.1, 0.15],
        [0.1, 0.15, 0.2],
      ],
    ],
    [
      5,
      [
        [0.1, 0.15, 0.2],
        [0.2, 0.25, 0.3],
        [0.4, 0.5, 0.6],
      ],
    ],
    [
      12,
      [
        [0.15, 0.2, 0.25],
        [0.3, 0.35, 0.4],
        [0.6, 0.7, 0.8],
      ],
    ],
  ];
  for (const [D, grades] of cases) {
    it(`D = ${D} mm matches the makers' summary for every grade and index column`, () => {
      grades.forEach((cols, g) =>
        [6, 10, 16].forEach((w, j) => {
          expect(meanDiameterTolerance(tc.meanDiameter, (g + 1) as 1 | 2 | 3, D, w).halfWidth).toBe(cols[j]);
        }),
      );
    });
  }

  it("grade 3 is about twice grade 2 (the makers' summary says so) from D 1 mm up", () => {
    // The smallest row of the same summary is narrower (0.10 / 0.07 and 0.20 / 0.15): the rule is for the rest.
    for (const row of tc.meanDiameter.rows.slice(1))
      row.grades[2].forEach((v, j) => {
        expect(v / row.grades[1][j]).toBeGreaterThanOrEqual(1.7);
        expect(v / row.grades[1][j]).toBeLessThanOrEqual(2.3);
      });
  });

  it('the column edges: w = 8 is in the first column, just above 8 in the second', () => {
    expect(meanDiameterTolerance(tc.meanDiameter, 2, 5, 8).halfWidth).toBe(0.2);
    expect(meanDiameterTolerance(tc.meanDiameter, 2, 5, 8.01).halfWidth).toBe(0.25);
  });

  it("outside the standard's scope the nearest row or column is used, and a note says so", () => {
    const notes: string[] = [];
    expect(meanDiameterTolerance(tc.meanDiameter, 2, 250, 10, notes).halfWidth).toBe(3.0);
    expect(meanDiameterTolerance(tc.meanDiameter, 2, 5, 25, notes).halfWidth).toBe(0.3);
    expect(notes).toHaveLength(2);
    expect(notes.join(' ')).toMatch(/EN 15800/);
  });
});

describe('wire-diameter tolerance', () => {
  // Source: EN 10270-1 as printed by a wire maker: +-0.003 mm for 0.05-0.09, +-0.004 for 0.10-0.16,
  // +-0.005 for 0.18-0.25, +-0.008 from 0.28 mm.
  it("EN 10270-1 wire matches the wire maker's print", () => {
    const w = material('en10270-1-dm');
    expect(wireDiameterTolerance(tc, w, 0.08).halfWidth).toBe(0.003);
    expect(wireDiameterTolerance(tc, w, 0.12).halfWidth).toBe(0.004);
    expect(wireDiameterTolerance(tc, w, 0.25).halfWidth).toBe(0.005);
    expect(wireDiameterTolerance(tc, w, 0.3).halfWidth).toBe(0.008);
  });

  // Source: music-wire makers' practice (not a standard): +-0.001 in for 0.028-0.075 in, +-0.002 in above.
  it("music wire follows the makers' practice", () => {
    const m = material('music-wire');
    expect(wireDiameterTolerance(tc, m, 0.045 * 25.4).halfWidth).toBeCloseTo(0.0254, 12);
    expect(wireDiameterTolerance(tc, m, 0.075 * 25.4).halfWidth).toBeCloseTo(0.0254, 12);
    expect(wireDiameterTolerance(tc, m, 0.08 * 25.4).halfWidth).toBeCloseTo(0.0508, 12);
  });

  it('every row names its source; rows grow with the diameter', () => {
    for (const t of tc.wireDiameter)
      t.rows.forEach((r, i) => {
        expect(r.source.length).toBeGreaterThan(5);
        if (i > 0) expect(r.tolerance).toBeGreaterThanOrEqual(t.rows[i - 1].tolerance);
      });
  });

  it('a wire above the table takes its largest tolerance and a note', () => {
    const notes: string[] = [];
    expect(wireDiameterTolerance(tc, material('en10270-1-dm'), 25, notes).halfWidth).toBe(0.09);
    expect(notes[0]).toMatch(/above/);
  });
});

describe('loading the tolerance catalog', () => {
  it('every family has a shear-modulus spread and every figure a source', () => {
    expect(tc.shearModulus.map((r) => r.family).sort()).toEqual(['alloy-steel', 'carbon-steel', 'copper-alloy', 'stainless']);
    expect(tc.activeCoils.source).toMatch(/from memory/);
  });

  it('rejects a row without its source, naming file, record and field', () => {
    const doc = raw();
    delete doc.wire_diameter[0].rows[2].source;
    expect(() => parseToleranceCatalog(doc, 'tolerances.yaml')).toThrow(/tolerances\.yaml: wire_diameter\[0\]: wire_diameter\[0\]\.rows\[2\]\.source/);
  });

  it('rejects rows out of order', () => {
    const doc = raw();
    doc.mean_diameter.rows[3].max_mean_diameter = 1.2;
    expect(() => parseToleranceCatalog(doc, 'x.yaml')).toThrow(/ascending/);
  });

  it('rejects a finer grade looser than a coarser one', () => {
    const doc = raw();
    doc.mean_diameter.rows[4].grade_1 = [0.3, 0.3, 0.3];
    expect(() => parseToleranceCatalog(doc, 'x.yaml')).toThrow(/grade_2\[0\].*at least grade 1/);
  });

  it('rejects a missing family and an unknown key', () => {
    const doc = raw();
    doc.shear_modulus = doc.shear_modulus.slice(1);
    expect(() => parseToleranceCatalog(doc, 'x.yaml')).toThrow(/missing: carbon-steel/);
    const doc2 = raw();
    doc2.extra = 1;
    expect(() => parseToleranceCatalog(doc2, 'x.yaml')).toThrow(/extra: no such field/);
  });
});
