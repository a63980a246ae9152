// source: none needed. Invariants of the spring search (property tests with fast-check, over requirements of our own making).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/units/parse.js';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readRequirements } from '../../../src/kinds/compression/requirements.js';
import { readSpringCase } from '../../../src/kinds/compression/springFile.js';
import { analyzeSpring } from '../../../src/kinds/compression/analysis.js';
import { paretoFront2, dominates } from '../../../src/search/pareto.js';
import { checkAnalysis } from '../../../src/kinds/compression/verify.js';
import { runDesign } from '../../../src/kinds/compression/design.js';
import { springDocument } from '../../../src/kinds/compression/springDoc.js';
import { computeFrontier } from '../../../src/kinds/compression/frontier.js';
import { requirementSpace } from '../../helpers.js';

const catalog = loadCatalog();

const { arb: reqArb, doc: requirementsDoc } = requirementSpace({
  force: [5, 200],
  length: [20, 80],
  stroke: [0.1, 0.5],
  forceRise: [1.2, 2.5],
  od: [8, 40],
  materials: ['music-wire', 'stainless-302', 'chrome-silicon', 'phosphor-bronze', 'en10270-1-dm'],
  ends: ['squared-ground', 'squared', 'plain', 'plain-ground'],
  seatings: ['fixed-fixed', 'fixed-pivoted', 'pivoted-pivoted', 'fixed-free'],
  cycles: [undefined, 1e5, 1e6, 'infinite'],
  tolerances: [0, 0.05, 0.1],
  peenedAndGuided: true,
  freeLengthFactor: 3,
  coilStep: 0.5,
  top: 5,
});

describe('spring search invariants (property)', () => {
  it('every spring the search reports re-verifies through the single-spring analysis, read from its own spring file', () => {
    let withSprings = 0;
    fc.assert(
      fc.property(reqArb, (r) => {
        const req = readRequirements(requirementsDoc(r), catalog);
        const run = runDesign(req, { strategy: 'grid' });
        for (const c of run.candidates) {
          const springCase = readSpringCase(springDocument(c, req), catalog);
          const a = analyzeSpring(springCase.geometry, springCase.figures, springCase.service);
          const g = checkAnalysis(a, req);
          for (let i = 0; i < g.length; i++) expect(g[i]).toBeLessThanOrEqual(1e-6);
          expect(a.geometry.mass).toBeCloseTo(c.analysis.geometry.mass, 12);
          // Sorted best first.
        }
        for (let i = 1; i < run.candidates.length; i++) expect(run.candidates[i].objectives[0]).toBeGreaterThanOrEqual(run.candidates[i - 1].objectives[0]);
        if (run.candidates.length) withSprings++;
      }),
      { numRuns: 40, seed: 7 },
    );
    expect(withSprings).toBeGreaterThan(5);
  });

  it("the LP bound is never above the grid's best, and the genetic search never beats the grid", () => {
    fc.assert(
      fc.property(reqArb, fc.integer({ min: 1, max: 1000 }), (r, seed) => {
        const req = readRequirements({ ...requirementsDoc(r), seed }, catalog);
        const grid = runDesign(req, { strategy: 'grid' });
        const ga = runDesign(req, { strategy: 'genetic', maxEvaluations: 20000 });
        if (grid.candidates.length === 0) {
          expect(ga.candidates).toHaveLength(0);
          return;
        }
        const best = grid.candidates[0].objectives[0];
        if (grid.lp.value !== null) expect(grid.lp.value).toBeLessThanOrEqual(best * (1 + 1e-9));
        if (ga.candidates.length) expect(ga.candidates[0].objectives[0]).toBeGreaterThanOrEqual(best * (1 - 1e-9));
      }),
      { numRuns: 25, seed: 11 },
    );
  });

  it('the LP bound stays below the best spring across envelopes, end-type lists, rods, surge and solid limits', () => {
    let compared = 0;
    fc.assert(
      fc.property(
        reqArb,
        fc.record({
          id: fc.option(fc.double({ min: 0.3, max: 0.8, noNaN: true })),
          solid: fc.option(fc.double({ min: 0.3, max: 0.9, noNaN: true })),
          forcing: fc.option(fc.double({ min: 5, max: 60, noNaN: true })),
          allowable: fc.option(fc.double({ min: 300, max: 900, noNaN: true })),
          ends: fc.subarray(['plain', 'plain-ground', 'squared', 'squared-ground'], { minLength: 1 }),
          rank: fc.constantFrom('mass', 'wire_volume'),
        }),
        (r, extra) => {
          const doc = requirementsDoc(r);
          const env = doc.envelope as Record<string, number>;
          if (extra.id !== null) env.min_inner_diameter = r.od * extra.id * 0.5;
          if (extra.solid !== null) env.max_solid_length = r.length * (1 - r.stroke) * extra.solid;
          if (extra.forcing !== null) doc.forcing_frequency = extra.forcing;
          if (extra.allowable !== null) doc.allowable_stress = extra.allowable;
          doc.ends = extra.ends;
          doc.rank = extra.rank;
          let req;
          try {
            req = readRequirements(doc, catalog);
          } catch (e) {
            // An allowable above the torsional ultimate of the weakest wire is refused (requiredAllowable.test.ts).
            if (e instanceof InputError && e.field === 'allowable_stress') return;
            throw e;
          }
          const run = runDesign(req, { strategy: 'grid' });
          if (run.candidates.length && run.lp.value !== null) {
            expect(run.lp.value).toBeLessThanOrEqual(run.candidates[0].objectives[0] * (1 + 1e-9));
            compared++;
          }
          if (run.candidates.length) expect(run.lp.status).toBe('bound');
        },
      ),
      { numRuns: 60, seed: 5 },
    );
    expect(compared).toBeGreaterThan(10);
  });

  it('tightening the bore never lowers the best mass', () => {
    fc.assert(
      fc.property(reqArb, fc.double({ min: 0.6, max: 0.98, noNaN: true }), (r, shrink) => {
        const wide = runDesign(readRequirements(requirementsDoc(r), catalog), { strategy: 'grid' });
        const narrow = runDesign(readRequirements(requirementsDoc({ ...r, od: r.od * shrink }), catalog), { strategy: 'grid' });
        if (narrow.candidates.length) {
          expect(wide.candidates.length).toBeGreaterThan(0);
          expect(narrow.candidates[0].objectives[0]).toBeGreaterThanOrEqual(wide.candidates[0].objectives[0] * (1 - 1e-9));
        }
      }),
      { numRuns: 20, seed: 3 },
    );
  });

  it('the frontier is non-dominated and every feasible spring is dominated by or on it', () => {
    const req = readRequirements(
      {
        units: 'si',
        material: ['music-wire', 'stainless-302'],
        load: { force: 30, length: 40 },
        operating_length: 30,
        envelope: { max_outer_diameter: 22, max_free_length: 90 },
        cycles: 1e6,
        coil_step: 0.5,
      },
      catalog,
    );
    for (const [x, y] of [
      ['mass', 'outer_diameter'],
      ['mass', 'fatigue_safety'],
    ] as const) {
      const fr = computeFrontier(req, x, y);
      expect(fr.front.length).toBeGreaterThan(1);
      const xs = fr.cloud.map((p) => p.x);
      const ys = fr.cloud.map((p) => (y === 'fatigue_safety' ? -p.y : p.y));
      const idx = paretoFront2(xs, ys);
      for (const i of idx) for (const j of idx) if (i !== j) expect(dominates(xs[j], ys[j], xs[i], ys[i])).toBe(false);
      for (let k = 0; k < xs.length; k++) {
        const onOrDominated = idx.some((i) => i === k || dominates(xs[i], ys[i], xs[k], ys[k]) || (xs[i] === xs[k] && ys[i] === ys[k]));
        expect(onOrDominated).toBe(true);
      }
    }
  });

  it("the two-objective genetic search finds a front that never beats the grid's and covers most of it", () => {
    const req = readRequirements(
      {
        units: 'si',
        material: 'stainless-302',
        load: { force: 20, length: 35 },
        operating_length: 25,
        operating_force: 32,
        load_tolerance: '5%',
        envelope: { max_outer_diameter: 16, min_inner_diameter: 6.5, max_free_length: 60 },
        cycles: 5e5,
        wire_sizes: 'metric',
      },
      catalog,
    );
    const grid = computeFrontier(req, 'mass', 'outer_diameter', undefined, 'grid');
    const ga = computeFrontier(req, 'mass', 'outer_diameter', undefined, 'genetic');
    expect(ga.strategy).toBe('genetic');
    const pts = (fr: typeof grid) => fr.front.map((c) => [c.analysis.geometry.mass, c.analysis.geometry.outerDiameter]);
    const g = pts(grid);
    const h = pts(ga);
    for (const [a, b] of h) for (const [c, d] of g) expect(dominates(a, b, c, d) && (a < c * (1 - 1e-9) || b < d * (1 - 1e-9))).toBe(false);
    const covered = g.filter(([c, d]) => h.some(([a, b]) => Math.abs(a / c - 1) < 1e-6 && Math.abs(b / d - 1) < 1e-6)).length;
    expect(covered / g.length).toBeGreaterThanOrEqual(0.8);
  });
});
