// `stock` and `check` agree row by row (property, over random tables of our own making): every row
// stock passes also passes `check` on a spring file written from that row, and every row it fails,
// check fails on the same checks. Also: the rate stock reports for each row is k = G d^4 / (8 D^3 Na)
// from the row's own figures (Castigliano; Shigley, Mechanical Engineering Design, eq. 10-9).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parse, stringify } from 'yaml';
import { loadCatalog } from '../../src/catalogs/load.js';
import { check } from '../../src/check/index.js';
import { materialFigures } from '../../src/input/material.js';
import { runCompressionStock as runStock, type StockRun } from '../../src/stock/run.js';
import { rowSpringFile } from '../../src/stock/table.js';

const catalog = loadCatalog();
const IN = 25.4;

const REQUIREMENTS = {
  units: 'si',
  material: ['music-wire', 'stainless-302', 'chrome-silicon'],
  seating: 'fixed-fixed',
  material_map: { 'Music wire': 'music-wire', '302 SS': 'stainless-302', 'Phos bronze': 'phosphor-bronze' },
  load: { force: 12, length: 30 },
  operating_length: 24,
  operating_force: 19.5,
  load_tolerance: '20%',
  envelope: { max_outer_diameter: 15, min_inner_diameter: 5, max_free_length: 50 },
  cycles: 3e5,
};

const rowArb = fc.record({
  material: fc.constantFrom('Music wire', '302 SS', 'Phos bronze', 'chrome-silicon', 'music-wire'),
  d: fc.constantFrom(0.9, 1, 1.2, 1.4, 1.6),
  index: fc.double({ min: 5, max: 11, noNaN: true }),
  // Rows gathered near the requirement, so that a fair share pass: a rate near 1.25 N/mm, a free length
  // near the one that gives the working force.
  rate: fc.double({ min: 0.8, max: 1.8, noNaN: true }),
  forceFactor: fc.double({ min: 0.8, max: 1.2, noNaN: true }),
  ends: fc.constantFrom('closed & ground', 'squared-ground', 'closed', 'open', 'plain-ground'),
  diameterField: fc.constantFrom('outer_diameter', 'mean_diameter', 'inner_diameter'),
  coilField: fc.constantFrom('total_coils', 'active_coils'),
});
type RowCase = typeof rowArb extends fc.Arbitrary<infer T> ? T : never;

const NOMINAL_G: Record<string, number> = { 'Music wire': 81700, 'music-wire': 81700, '302 SS': 69000, 'Phos bronze': 41400, 'chrome-silicon': 77200 };
const inactiveOf = (ends: string) => (ends === 'open' ? 0 : ends === 'plain-ground' ? 1 : 2);

/** Active coils (to a quarter) for the row's target rate, its total coils, and its free length. */
function shape(r: RowCase): { coils: number; L0: number } {
  const D = r.d * r.index;
  const Na = Math.max(1, Math.round(((NOMINAL_G[r.material] * r.d ** 4) / (8 * D ** 3 * r.rate)) * 4) / 4);
  const k = (NOMINAL_G[r.material] * r.d ** 4) / (8 * D ** 3 * Na);
  return { coils: r.coilField === 'active_coils' ? Na : Na + inactiveOf(r.ends), L0: 30 + (12 * r.forceFactor) / k };
}

const tableArb = fc.record({ rows: fc.array(rowArb, { minLength: 5, maxLength: 40 }), inches: fc.boolean() });

type TableCase = typeof tableArb extends fc.Arbitrary<infer T> ? T : never;

function tableText(t: TableCase): string {
  const u = t.inches ? 'in' : 'mm';
  const L = (mm: number) => (t.inches ? mm / IN : mm).toPrecision(10);
  const header = `part_number,material,wire_diameter_${u},outer_diameter_${u},mean_diameter_${u},inner_diameter_${u},free_length_${u},total_coils,active_coils,ends`;
  const lines = t.rows.map((r, i) => {
    const D = r.d * r.index;
    const dia = { outer_diameter: '', mean_diameter: '', inner_diameter: '' };
    dia[r.diameterField] = L(r.diameterField === 'outer_diameter' ? D + r.d : r.diameterField === 'mean_diameter' ? D : D - r.d);
    const { coils, L0 } = shape(r);
    return `P${i + 1},${r.material},${L(r.d)},${dia.outer_diameter},${dia.mean_diameter},${dia.inner_diameter},${L(L0)},${r.coilField === 'total_coils' ? coils : ''},${r.coilField === 'active_coils' ? coils : ''},${r.ends}`;
  });
  return [header, ...lines].join('\n');
}

describe('stock and check agree on every row (property)', () => {
  it('a row passes stock exactly when its spring file passes check, failing the same checks', () => {
    let passes = 0;
    let fails = 0;
    fc.assert(
      fc.property(tableArb, (t) => {
        let run: StockRun;
        try {
          run = runStock(REQUIREMENTS, tableText(t), catalog, {});
        } catch (e) {
          // A table whose every row is refused is bad input as a whole.
          expect((e as Error).message).toMatch(/expected at least one usable row; all \d+ data rows are bad/);
          return;
        }
        for (const r of run.results) {
          // The spring file as a user would save it: YAML text, read back.
          const file = parse(stringify(rowSpringFile(r.row)));
          const c = check(file, REQUIREMENTS, { catalog }) as { pass: boolean; failing: { name: string }[] };
          expect(c.pass).toBe(r.verdict.pass);
          expect(c.failing.map((f) => f.name)).toEqual(r.verdict.failingNames);
          if (r.verdict.pass) passes++;
          else fails++;
        }
      }),
      { numRuns: 40, seed: 3 },
    );
    expect(passes).toBeGreaterThan(20);
    expect(fails).toBeGreaterThan(100);
  });

  it("the reported rate of each row is G d^4 / (8 D^3 Na) from the row's own figures", () => {
    fc.assert(
      fc.property(tableArb, (t) => {
        let run: StockRun;
        try {
          run = runStock(REQUIREMENTS, tableText(t), catalog, {});
        } catch {
          return; // no usable row: nothing to report a rate for
        }
        t.rows.forEach((r, i) => {
          const res = run.results.find((x) => x.row.partNumber === `P${i + 1}`);
          if (!res) return; // a row refused as bad (coils overlapping at free length): no rate to report
          const D = r.d * r.index;
          const { coils } = shape(r);
          const Na = r.coilField === 'active_coils' ? coils : coils - inactiveOf(r.ends);
          const id = REQUIREMENTS.material_map[r.material as keyof typeof REQUIREMENTS.material_map] ?? r.material;
          const G = materialFigures({ material: catalog.materials.find((m) => m.id === id)! }, r.d, false).shearModulus;
          const k = (G * r.d ** 4) / (8 * D ** 3 * Na);
          expect(res.verdict.analysis.rate).toBeCloseTo(k, 6);
          expect(Math.abs(res.verdict.analysis.rate / k - 1)).toBeLessThan(1e-7);
        });
      }),
      { numRuns: 40, seed: 4 },
    );
  });
});
