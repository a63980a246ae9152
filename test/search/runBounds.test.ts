// source: none needed; properties of our own engine, checked against its own exhaustive grid on spring
// requirements drawn at random (scenarios invented for the test).
// The open runs of the branch and bound (src/search/runBounds.ts) and the genetic search that draws
// from them and stops on their proof: the bounds never rule out the optimum, the proven bound never
// passes it, and a run stopped on the bound is within the bound's tolerance of the grid's optimum.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { readRequirements } from '../../src/kinds/compression/requirements.js';
import { buildSpringProblem, type SpringProblem } from '../../src/kinds/compression/problem.js';
import { makeRunStats, makeWorkspace } from '../../src/search/cell.js';
import { geneticSearch } from '../../src/search/genetic.js';
import { gridSearch } from '../../src/search/grid.js';
import { RunBounds } from '../../src/search/runBounds.js';
import { termination } from '../../src/search/termination.js';
import seedrandom from 'seedrandom';

const catalog = loadCatalog();

/** A push spring of our own invention: working force and length, a stroke, often a load band, and an
 * envelope that is sometimes tight. */
const specArb = fc
  .record({
    force: fc.double({ min: 5, max: 120, noNaN: true }),
    length: fc.double({ min: 20, max: 70, noNaN: true }),
    stroke: fc.double({ min: 0.1, max: 0.45, noNaN: true }),
    rise: fc.option(fc.double({ min: 1.2, max: 2.2, noNaN: true })),
    material: fc.constantFrom('music-wire', 'stainless-302', 'oil-tempered', 'any'),
    bore: fc.option(fc.double({ min: 12, max: 40, noNaN: true })),
    rod: fc.option(fc.double({ min: 1, max: 6, noNaN: true })),
    freeLength: fc.double({ min: 1.3, max: 3, noNaN: true }),
    rank: fc.constantFrom('mass', 'mass', 'wire_volume', 'outer_diameter', 'free_length'),
    cycles: fc.constantFrom(undefined, 1e6),
  })
  .map((r) => ({
    units: 'si',
    material: r.material,
    ends: ['plain', 'squared-ground'],
    load: { force: r.force, length: r.length },
    operating_length: r.length * (1 - r.stroke),
    ...(r.rise !== null ? { operating_force: r.force * r.rise, load_tolerance: 0.1 } : {}),
    envelope: {
      ...(r.bore !== null ? { max_outer_diameter: r.bore } : {}),
      ...(r.rod !== null ? { min_inner_diameter: r.rod } : {}),
      max_free_length: r.length * r.freeLength,
    },
    ...(r.cycles ? { cycles: r.cycles } : {}),
    coil_step: 0.5,
    rank: r.rank,
  }));

const build = (doc: Record<string, unknown>): SpringProblem => buildSpringProblem(readRequirements(doc, catalog));

/** The genes (indices) of a point of the spring problem. */
function genesOf(p: SpringProblem, x: Float64Array): Float64Array {
  const coils = p.variables[2] as { min: number; step: number };
  return Float64Array.of(x[0], x[1], Math.round((x[2] - coils.min) / coils.step), 0);
}

describe('open runs of the branch and bound', () => {
  it('never rule out the optimum: its cell lies in an open run, every drawn cell too, and the bound is at most the optimum (property)', () => {
    let optima = 0;
    fc.assert(
      fc.property(specArb, (doc) => {
        const p = build(doc);
        const grid = gridSearch(p, { top: 1 });
        const runs = new RunBounds(p, makeRunStats(p));
        const rng = seedrandom('draws');
        const genes = new Float64Array(4);
        for (let i = 0; i < 20 && runs.sample(rng, genes); i++) expect(runs.contains(genes)).toBe(true);
        if (grid.best.length === 0) return;
        optima++;
        const optimum = grid.best[0].f[0];
        expect(runs.contains(genesOf(p, grid.best[0].x))).toBe(true);
        expect(runs.lowerBound()).toBeLessThanOrEqual(optimum);
      }),
      { numRuns: 40, seed: 21 },
    );
    expect(optima).toBeGreaterThan(10);
  });

  it('refined best first with no tolerance and no incumbent, they reach exactly the grid optimum, or prove that nothing is feasible (property)', () => {
    fc.assert(
      fc.property(specArb, (doc) => {
        const p = build(doc);
        const grid = gridSearch(p, { top: 1 });
        const stats = makeRunStats(p);
        const runs = new RunBounds(p, stats);
        let best = Infinity;
        // At every stage the least of what was found and the open bound stays a lower bound on the optimum.
        const optimum = grid.best.length ? grid.best[0].f[0] : Infinity;
        runs.refine(
          makeWorkspace(p, undefined, stats),
          () => best,
          0,
          Infinity,
          (_g, _x, f) => {
            best = Math.min(best, f[0]);
            expect(Math.min(best, runs.lowerBound())).toBeLessThanOrEqual(optimum * (1 + 1e-12));
          },
        );
        if (grid.best.length === 0) {
          expect(best).toBe(Infinity);
          expect(runs.lowerBound()).toBe(Infinity);
        } else {
          expect(Math.abs(best / optimum - 1)).toBeLessThan(1e-9);
          expect(runs.proves(best, 0)).toBe(true);
        }
      }),
      { numRuns: 30, seed: 22 },
    );
  });

  it('with an incumbent above the optimum, the proven bound (least of the open runs and the cells found) never passes the optimum (property)', () => {
    fc.assert(
      fc.property(specArb, fc.double({ min: 1, max: 1.5, noNaN: true }), fc.double({ min: 0, max: 0.05, noNaN: true }), (doc, above, tolerance) => {
        const p = build(doc);
        const grid = gridSearch(p, { top: 1 });
        if (grid.best.length === 0) return;
        const optimum = grid.best[0].f[0];
        const stats = makeRunStats(p);
        const runs = new RunBounds(p, stats);
        let best = optimum * above;
        runs.refine(
          makeWorkspace(p, undefined, stats),
          () => best,
          tolerance,
          Infinity,
          (_g, _x, f) => {
            best = Math.min(best, f[0]);
          },
        );
        // (The cell solver's ceiling and the scan judge ties to a part in 1e9.)
        expect(Math.min(best, runs.lowerBound())).toBeLessThanOrEqual(optimum * (1 + 1e-9));
        // Refined to the end, the incumbent is proven within the tolerance, and so within it of the optimum.
        expect(runs.proves(best, tolerance)).toBe(true);
        expect(best).toBeLessThanOrEqual(optimum * (1 + tolerance) * (1 + 1e-9));
      }),
      { numRuns: 30, seed: 23 },
    );
  });
});

describe('genetic search on the open runs', () => {
  it('a run stopped on the proven bound is within the tolerance of the grid optimum, and reports nothing the grid would not (property)', () => {
    let onBound = 0;
    fc.assert(
      fc.property(specArb, fc.integer({ min: 1, max: 1000 }), fc.constantFrom(1e-3, 1e-2), (doc, seed, tolerance) => {
        const p = build(doc);
        const grid = gridSearch(p, { top: 1 });
        const r = geneticSearch(p, { seed, maxEvaluations: 20_000, top: 3, termination: termination({ maxEvaluations: 20_000, boundTolerance: tolerance }) });
        if (grid.best.length === 0) {
          expect(r.best).toEqual([]);
          return;
        }
        const optimum = grid.best[0].f[0];
        expect(r.best[0]?.f[0] ?? Infinity).toBeGreaterThanOrEqual(optimum * (1 - 1e-9));
        if (r.stoppedBy === 'bound') {
          onBound++;
          expect(r.best[0].f[0]).toBeLessThanOrEqual(optimum * (1 + tolerance) * (1 + 1e-9));
        }
      }),
      { numRuns: 30, seed: 24 },
    );
    expect(onBound).toBeGreaterThan(10);
  });

  it('a list proven by the run bounds holds each spring once and is the grid list, value for value within the tolerance (property)', () => {
    let proven = 0;
    fc.assert(
      fc.property(specArb, fc.integer({ min: 1, max: 1000 }), (doc, seed) => {
        const p = build(doc);
        const grid = gridSearch(p, { top: 5 });
        const r = geneticSearch(p, { seed, maxEvaluations: 50_000, top: 5 });
        const cells = r.best.map((b) => `${b.x[0]} ${b.x[1]} ${b.x[2]}`);
        expect(new Set(cells).size).toBe(cells.length);
        if (r.stoppedBy !== 'bound') return;
        proven++;
        expect(r.best.length).toBe(grid.best.length);
        r.best.forEach((b, i) => {
          expect(b.f[0]).toBeGreaterThanOrEqual(grid.best[i].f[0] * (1 - 1e-9));
          expect(b.f[0]).toBeLessThanOrEqual(grid.best[i].f[0] * (1 + 1e-3) * (1 + 1e-9));
        });
      }),
      { numRuns: 20, seed: 25 },
    );
    expect(proven).toBeGreaterThan(10);
  });

  it('a space with nothing feasible is proven so and the run stops before its budget', () => {
    const p = build({
      units: 'si',
      material: 'music-wire',
      ends: ['plain', 'squared-ground'],
      load: { force: 100, length: 30 },
      operating_length: 20,
      envelope: { max_outer_diameter: 6 },
      coil_step: 0.5,
    });
    expect(gridSearch(p, { top: 1 }).best).toEqual([]);
    const r = geneticSearch(p, { seed: 1, maxEvaluations: 200_000, top: 1 });
    expect(r.best).toEqual([]);
    expect(r.stoppedBy).toBe('exhausted');
    expect(r.evaluations).toBeLessThan(200_000);
  });

  it('off, the search is the one of a problem without run bounds: the same seed, the same springs and work', () => {
    const p = build({
      units: 'si',
      material: 'music-wire',
      ends: ['plain'],
      load: { force: 20, length: 35 },
      operating_length: 25,
      envelope: { max_free_length: 70 },
      coil_step: 0.5,
    });
    const off = geneticSearch(p, { seed: 5, maxEvaluations: 5_000, top: 2, runBounds: false });
    const without = geneticSearch({ ...p, rangeLowerBound: undefined }, { seed: 5, maxEvaluations: 5_000, top: 2 });
    const on = geneticSearch(p, { seed: 5, maxEvaluations: 5_000, top: 2 });
    expect(off.best.map((q) => Array.from(q.f))).toEqual(without.best.map((q) => Array.from(q.f)));
    expect(off.evaluations).toBe(without.evaluations);
    expect(off.boundCalls).toBe(without.boundCalls);
    // On, the same problem is proven solved and stops early.
    expect(off.stoppedBy).not.toBe('bound');
    expect(on.stoppedBy).toBe('bound');
    expect(on.evaluations).toBeLessThan(off.evaluations);
  });
});
