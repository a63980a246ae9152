// source: none needed; the LP relaxation is checked against our own exhaustive grid on requirements
// drawn at random (scenarios invented for the test), and against itself with the envelope removed.
// The LP lower bound (src/kinds/compression/lpBound.ts) relaxes every check it takes into a row implied
// by the true one, so its value never exceeds the lightest spring (or the smallest wire volume) the
// grid finds, whatever the envelope, the load band, the clash allowance, direct shear or surge.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readRequirements } from '../../../src/kinds/compression/requirements.js';
import { buildSpringProblem } from '../../../src/kinds/compression/problem.js';
import { lpLowerBound } from '../../../src/kinds/compression/lpBound.js';
import { gridSearch } from '../../../src/search/grid.js';

const catalog = loadCatalog();

const specArb = fc
  .record({
    force: fc.double({ min: 5, max: 200, noNaN: true }),
    length: fc.double({ min: 15, max: 90, noNaN: true }),
    stroke: fc.double({ min: 0.05, max: 0.5, noNaN: true }),
    rise: fc.option(fc.double({ min: 1.1, max: 3, noNaN: true })),
    band: fc.constantFrom(0.02, 0.05, 0.15),
    material: fc.constantFrom('music-wire', 'stainless-302', 'chrome-silicon', 'phosphor-bronze', 'any'),
    ends: fc.constantFrom(['squared-ground'], ['plain', 'squared'], ['plain-ground', 'squared-ground']),
    bore: fc.option(fc.double({ min: 6, max: 45, noNaN: true })),
    rod: fc.option(fc.double({ min: 0.5, max: 5, noNaN: true })),
    freeLength: fc.double({ min: 1.2, max: 3, noNaN: true }),
    clash: fc.constantFrom(0, 0.1, 0.15, 0.3),
    directShear: fc.boolean(),
    surge: fc.option(fc.double({ min: 5, max: 60, noNaN: true })),
    cycles: fc.constantFrom(undefined, 1e6),
    rank: fc.constantFrom('mass', 'wire_volume'),
  })
  .map((r) => ({
    units: 'si',
    material: r.material,
    ends: r.ends,
    load: { force: r.force, length: r.length },
    operating_length: r.length * (1 - r.stroke),
    ...(r.rise !== null ? { operating_force: r.force * r.rise, load_tolerance: r.band } : {}),
    envelope: {
      ...(r.bore !== null ? { max_outer_diameter: r.bore } : {}),
      ...(r.rod !== null && r.bore !== null && r.rod < r.bore / 2 ? { min_inner_diameter: r.rod } : {}),
      max_free_length: r.length * r.freeLength,
    },
    clash_allowance: r.clash,
    direct_shear_rate: r.directShear,
    ...(r.surge !== null ? { forcing_frequency: r.surge } : {}),
    ...(r.cycles ? { cycles: r.cycles } : {}),
    coil_step: 0.5,
    rank: r.rank,
  }));

describe('LP lower bound', () => {
  it('never exceeds the optimum the grid finds over random feasible requirements (property)', () => {
    let feasible = 0;
    let bounded = 0;
    fc.assert(
      fc.property(specArb, (doc) => {
        const p = buildSpringProblem(readRequirements(doc, catalog));
        const grid = gridSearch(p, { top: 1 });
        const lp = lpLowerBound(p);
        if (grid.best.length === 0) return;
        feasible++;
        // A relaxation of a feasible problem is feasible.
        expect(lp.status).toBe('bound');
        bounded++;
        expect(lp.value!).toBeLessThanOrEqual(grid.best[0].f[0] * (1 + 1e-9));
        expect(lp.value!).toBeGreaterThan(0);
      }),
      { numRuns: 80, seed: 31 },
    );
    expect(feasible).toBeGreaterThan(15);
    expect(bounded).toBe(feasible);
  });

  it('the envelope only tightens it: with the bore and rod removed the bound is no higher (property)', () => {
    fc.assert(
      fc.property(specArb, (doc) => {
        const bound = (d: typeof doc) => lpLowerBound(buildSpringProblem(readRequirements(d, catalog))).value ?? 0;
        const open = { ...doc, envelope: { max_free_length: doc.envelope.max_free_length } };
        expect(bound(open)).toBeLessThanOrEqual(bound(doc) * (1 + 1e-9) || Infinity);
      }),
      { numRuns: 60, seed: 32 },
    );
  });
});
