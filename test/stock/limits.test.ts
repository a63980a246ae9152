// A hand-built stock table: for each limit (bore, rod, free length, working-force band, stress, clash,
// buckling, index) one row just inside and one just outside, 0.3% either side. The rows are placed by
// hand calculation with the published formulas, written out here independently of coilfront's model:
//   rate k = G d^4 / (8 D^3 Na) (Castigliano; Shigley, Mechanical Engineering Design, eq. 10-9)
//   stress tau = K_B 8 F D / (pi d^3), K_B = (4C + 2) / (4C - 3) (Shigley eqs. 10-5 and 10-7)
//   squared-and-ground ends: Nt = Na + 2, Ls = d Nt, pitch p = (L0 - 2d) / Na (Shigley Table 10-1)
//   clash: Ls + xi (L0 - Lmin) <= Lmin, xi = 0.15 (Shigley eq. 10-18, as robust linearity)
//   buckling: y_cr = L0 C1 [1 - sqrt(1 - C2 / lambda^2)], lambda = alpha L0 / D (Shigley eqs. 10-10 to 10-13)
//   outer diameter at solid: sqrt(D^2 + (p^2 - d^2) / pi^2) + d (spring makers' handbooks; common practice)
// The moduli are the catalog's for music wire at each diameter (catalogs/materials.yaml, with its source).
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { moduliAt } from '../../src/catalogs/properties.js';
import { stock } from '../../src/stock/index.js';

const catalog = loadCatalog();
const music = catalog.materials.find((m) => m.id === 'music-wire')!;

// The scenario (our own): 10 N at 40 mm, +-5%, stroke to 35 mm; 16 mm bore, 6 mm rod, 60 mm free at most;
// the static shear limit given outright as 700 MPa; both ends fixed on plates.
const REQUIREMENTS = {
  units: 'si',
  material: 'music-wire',
  ends: 'squared-ground',
  seating: 'fixed-fixed',
  load: { force: 10, length: 40 },
  operating_length: 35,
  working_tolerance: '5%',
  envelope: { max_outer_diameter: 16, min_inner_diameter: 6, max_free_length: 60 },
  allowable_stress: 700,
  index: [4, 12],
};
const F1 = 10;
const L1 = 40;
const LMIN = 35;

interface Spring {
  d: number;
  D: number;
  Na: number;
  L0: number;
}

const G = (d: number) => moduliAt(music, d).shearModulus;
const E = (d: number) => moduliAt(music, d).elasticModulus;
const rate = (s: Spring) => (G(s.d) * s.d ** 4) / (8 * s.D ** 3 * s.Na);
/** Free length that gives exactly F at the working length. */
const freeFor = (d: number, D: number, Na: number, F = F1) => L1 + F / ((G(d) * d ** 4) / (8 * D ** 3 * Na));
const spring = (d: number, D: number, Na: number, F = F1): Spring => ({ d, D, Na, L0: freeFor(d, D, Na, F) });
const stressAtShortest = (s: Spring) => {
  const C = s.D / s.d;
  const F2 = rate(s) * (s.L0 - LMIN);
  return (((4 * C + 2) / (4 * C - 3)) * 8 * F2 * s.D) / (Math.PI * s.d ** 3);
};
const solidOD = (s: Spring) => {
  const p = (s.L0 - 2 * s.d) / s.Na;
  return Math.sqrt(s.D ** 2 + (p * p - s.d * s.d) / (Math.PI * Math.PI)) + s.d;
};
const clashValue = (s: Spring) => s.d * (s.Na + 2) + 0.15 * (s.L0 - LMIN); // must stay at or below LMIN
const bucklingMargin = (s: Spring) => {
  const e = E(s.d);
  const g = G(s.d);
  const c1 = e / (2 * (e - g));
  const c2 = (2 * Math.PI * Math.PI * (e - g)) / (2 * g + e);
  const lambda = (0.5 * s.L0) / s.D;
  const ycr = s.L0 * c1 * (1 - Math.sqrt(1 - c2 / lambda ** 2));
  return ycr / (s.L0 - LMIN); // above 1: stable
};

/** Bisection for x in [lo, hi] where f(x) = target (f monotone). */
function solve(f: (x: number) => number, target: number, lo: number, hi: number): number {
  const up = f(hi) > f(lo);
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(mid) < target === up) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

const IN = 0.997;
const OUT = 1.003;

// name, the spring, and the checks it must fail (none: it passes).
const rows: [string, Spring, string[]][] = [];
// Bore: the coils grow when closed, so the outer diameter at solid binds first; just outside, both fail.
rows.push([
  'bore-in',
  spring(
    1.4,
    solve((D) => solidOD(spring(1.4, D, 10)), 16 * IN, 12, 15),
    10,
  ),
  [],
]);
rows.push(['bore-out', spring(1.4, 16 * OUT - 1.4, 10), ['outer_diameter', 'outer_diameter_at_solid']]);
rows.push(['rod-in', spring(1, 6 * (2 - IN) + 1, 10), []]);
rows.push(['rod-out', spring(1, 6 * (2 - OUT) + 1, 10), ['inner_diameter']]);
rows.push([
  'free-length-in',
  spring(
    1,
    11,
    solve((Na) => freeFor(1, 11, Na), 60 * IN, 5, 40),
  ),
  [],
]);
rows.push([
  'free-length-out',
  spring(
    1,
    11,
    solve((Na) => freeFor(1, 11, Na), 60 * OUT, 5, 40),
  ),
  ['free_length'],
]);
rows.push(['force-low-in', spring(1, 9, 10, 9.5 / IN), []]);
rows.push(['force-low-out', spring(1, 9, 10, 9.5 / OUT), ['working_force_min']]);
rows.push(['force-high-in', spring(1, 9, 10, 10.5 * IN), []]);
rows.push(['force-high-out', spring(1, 9, 10, 10.5 * OUT), ['working_force_max']]);
rows.push([
  'stress-in',
  spring(
    solve((d) => stressAtShortest(spring(d, 9, 6)), 700 * IN, 0.75, 1),
    9,
    6,
  ),
  [],
]);
rows.push([
  'stress-out',
  spring(
    solve((d) => stressAtShortest(spring(d, 9, 6)), 700 * OUT, 0.75, 1),
    9,
    6,
  ),
  ['static_stress'],
]);
rows.push([
  'clash-in',
  spring(
    1.6,
    12,
    solve((Na) => clashValue(spring(1.6, 12, Na)), LMIN * IN, 10, 19),
  ),
  [],
]);
rows.push([
  'clash-out',
  spring(
    1.6,
    12,
    solve((Na) => clashValue(spring(1.6, 12, Na)), LMIN * OUT, 10, 19),
  ),
  ['clash'],
]);
rows.push([
  'buckling-in',
  spring(
    0.8,
    7.2,
    solve((Na) => bucklingMargin(spring(0.8, 7.2, Na)), 1 / IN, 5, 14),
  ),
  [],
]);
rows.push([
  'buckling-out',
  spring(
    0.8,
    7.2,
    solve((Na) => bucklingMargin(spring(0.8, 7.2, Na)), 1 / OUT, 5, 14),
  ),
  ['buckling'],
]);
rows.push(['index-in', spring(1, 12 * IN, 5), []]);
rows.push(['index-out', spring(1, 12 * OUT, 5), ['index_max']]);

const csv = [
  'part_number,material,wire_diameter_mm,mean_diameter_mm,active_coils,free_length_mm,ends',
  ...rows.map(([name, s]) => `${name},music-wire,${s.d.toPrecision(15)},${s.D.toPrecision(15)},${s.Na.toPrecision(15)},${s.L0.toPrecision(15)},squared-ground`),
].join('\n');

describe('stock: rows just inside and just outside each limit (hand-built table)', () => {
  const out = stock(REQUIREMENTS, csv, { catalog, top: 100, misses: 100 }) as {
    passing: { part_number: string }[];
    near_misses: { part_number: string; failing: { name: string; by: number }[] }[];
    bad_rows: unknown[];
  };

  it('reads every row', () => {
    expect(out.bad_rows).toEqual([]);
    expect(out.passing.length + out.near_misses.length).toBe(rows.length);
  });

  it.each(rows.map(([name, , fails]) => [name, fails] as const))('%s: fails exactly %j', (name, fails) => {
    const passed = out.passing.find((r) => r.part_number === name);
    const missed = out.near_misses.find((r) => r.part_number === name);
    if (fails.length === 0) {
      expect(missed?.failing, name).toBeUndefined();
      expect(passed).toBeDefined();
    } else {
      expect(passed, name).toBeUndefined();
      expect(missed!.failing.map((f) => f.name).sort()).toEqual([...fails].sort());
      // Just outside: by about the 0.3% it was placed past the limit (in the check's own normalisation).
      for (const f of missed!.failing) expect(f.by).toBeLessThan(0.02);
    }
  });
});
