// Extension-spring design through the shared grid search. Property checks of the search's promises (no
// outside values), a brute force over a small space, and the demo requirement.
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { analyzeExtension } from '../../../src/kinds/extension/analysis.js';
import { EXTENSION_CHECKS, checkExtension } from '../../../src/kinds/extension/checks.js';
import { readExtensionSpring } from '../../../src/kinds/extension/springFile.js';
import { assertExtensionVerified, designExtension, extensionCandidateAt } from '../../../src/kinds/extension/design.js';
import { XO, buildExtensionProblem } from '../../../src/kinds/extension/problem.js';
import { readExtensionRequirements } from '../../../src/kinds/extension/requirements.js';
import { TREND, valueAt, valueCount } from '../../../src/search/problem.js';
import { InputError } from '../../../src/units/parse.js';
import { relClose } from '../../helpers.js';

const catalog = loadCatalog();
const WIRES = [0.5, 0.6, 0.8, 1.0, 1.2, 1.4, 1.6, 2.0];

const reqArb = fc
  .record({
    force: fc.double({ min: 4, max: 40, noNaN: true }),
    length: fc.double({ min: 30, max: 90, noNaN: true }),
    stroke: fc.double({ min: 0.1, max: 0.4, noNaN: true }),
    rise: fc.option(fc.double({ min: 1.3, max: 2.5, noNaN: true })),
    material: fc.constantFrom('music-wire', 'stainless-302', 'hard-drawn'),
    bore: fc.double({ min: 8, max: 25, noNaN: true }),
    cycles: fc.constantFrom(undefined, 1e5, 1e6, 'infinite'),
    range: fc.constantFrom('preferred', 'makeable'),
    loop: fc.constantFrom('full', 'half'),
    extended: fc.boolean(),
  })
  .map((r) => ({
    kind: 'extension',
    units: 'si',
    material: r.material,
    loop: r.loop,
    // Each listed size one the material is made in (hard-drawn starts at 0.7 mm): the reader refuses others.
    wire_sizes: r.material === 'hard-drawn' ? WIRES.filter((d) => d >= 0.7) : WIRES,
    body_coils: [3, 60],
    coil_step: 0.5,
    load: { force: r.force, length: r.length },
    operating_length: r.length * (1 + r.stroke),
    ...(r.rise !== null ? { operating_force: r.force * r.rise, load_tolerance: 0.1 } : {}),
    envelope: { max_outer_diameter: r.bore, ...(r.extended ? { max_extended_length: r.length * (1 + 1.2 * r.stroke) } : {}) },
    ...(r.cycles !== undefined ? { cycles: r.cycles } : {}),
    initial_tension_range: r.range,
  }));

const requirements = (doc: Record<string, unknown>) => readExtensionRequirements(doc, catalog);

describe('extension design', () => {
  it('every spring the search reports re-verifies through the single-spring analysis', () => {
    let found = 0;
    fc.assert(
      fc.property(reqArb, (doc) => {
        const run = designExtension(requirements({ ...doc, top: 3 }), catalog);
        for (const c of run.candidates) {
          expect(Math.max(...c.checks)).toBeLessThanOrEqual(1e-6);
          expect(relClose(c.analysis.geometry.mass, c.objectives[XO.mass], 1e-9)).toBe(true);
          expect(relClose(c.analysis.geometry.freeLength, c.objectives[XO.free_length], 1e-9)).toBe(true);
          // The working force is met exactly through the initial tension.
          expect(relClose(c.analysis.points[0].force, run.req.workingForce, 1e-9)).toBe(true);
          // And the spring written as a spring file reads back into the same analysis (the analyze path).
          const g = c.geometry;
          const file = readExtensionSpring(
            {
              kind: 'extension',
              material: doc.material,
              wire_diameter: g.wireDiameter,
              mean_diameter: g.meanDiameter,
              body_coils: g.bodyCoils,
              initial_tension: g.initialTension,
              loop: g.loop.id,
              loop_radius: g.loopRadius,
              bend_radius: g.bendRadius,
              lengths: run.problem.service().lengths,
              ...(doc.cycles !== undefined ? { cycles: doc.cycles } : {}),
            },
            catalog,
          );
          const again = checkExtension(analyzeExtension(file.geometry, file.material, file.service), run.req);
          again.forEach((v, j) => expect(Math.abs(v - c.checks[j])).toBeLessThan(1e-9));
          found++;
        }
      }),
      { numRuns: 25, seed: 11 },
    );
    expect(found).toBeGreaterThan(10);
  });

  it('tightening the bore never lowers the best mass', () => {
    fc.assert(
      fc.property(reqArb, fc.double({ min: 0.6, max: 0.95, noNaN: true }), (doc, shrink) => {
        const loose = designExtension(requirements({ ...doc, top: 1 }), catalog).candidates[0];
        const env = doc.envelope as Record<string, unknown>;
        const tight = designExtension(
          requirements({ ...doc, top: 1, envelope: { ...env, max_outer_diameter: (env.max_outer_diameter as number) * shrink } }),
          catalog,
        ).candidates[0];
        if (!tight) return;
        expect(loose).toBeDefined();
        expect(tight.analysis.geometry.mass).toBeGreaterThanOrEqual(loose.analysis.geometry.mass * (1 - 1e-9));
      }),
      { numRuns: 12, seed: 5 },
    );
  });

  it('agrees with a brute force over a small extension space', () => {
    const doc = {
      kind: 'extension',
      material: 'music-wire',
      wire_sizes: [0.8, 1.0, 1.2],
      body_coils: [5, 40],
      coil_step: 1,
      load: { force: 12, length: 50 },
      operating_length: 62,
      operating_force: 24,
      load_tolerance: 0.1,
      envelope: { max_outer_diameter: 13, max_free_length: 48 },
      cycles: 1e6,
      diameter_resolution: 0.002,
      top: 1,
    };
    const req = requirements(doc);
    const grid = designExtension(req, catalog).candidates[0];
    // Every wire, every coil count, the mean diameter in steps of 0.001 mm over the index range.
    const p = buildExtensionProblem(req, catalog);
    const g = new Float64Array(EXTENSION_CHECKS.length);
    const f = new Float64Array(p.objectiveNames.length);
    const x = new Float64Array(3);
    let best = Infinity;
    let bestX: Float64Array | null = null;
    for (let i = 0; i < p.stock.length; i++) {
      for (let Nb = 5; Nb <= 40; Nb++) {
        const d = p.stock[i].wireDiameter;
        for (let D = 4 * d; D <= 12 * d; D += 0.001) {
          x[0] = i;
          x[1] = Nb;
          x[2] = D;
          p.evaluate(x, g, f);
          let worst = -Infinity;
          for (let j = 0; j < g.length; j++) if (g[j] > worst) worst = g[j];
          if (worst <= 0 && f[XO.mass] < best) {
            best = f[XO.mass];
            bestX = Float64Array.from(x);
          }
        }
      }
    }
    expect(bestX).not.toBeNull();
    // The brute force's best, judged again by the analysis, is a real spring.
    assertExtensionVerified(extensionCandidateAt(p, bestX!, f));
    expect(grid).toBeDefined();
    // The grid scans the checks of unknown trend at diameter_resolution (0.002 mm): it may stop up to one
    // step above the brute force's finer point, a relative mass of 0.002 / D.
    expect(grid.analysis.geometry.mass).toBeLessThanOrEqual(best * (1 + 0.002 / grid.geometry.meanDiameter));
    expect(grid.analysis.geometry.mass).toBeGreaterThanOrEqual(best * (1 - 1e-4));
    expect(grid.geometry.bodyCoils).toBe(bestX![1]);
    expect(grid.item.wireDiameter).toBe(p.stock[bestX![0]].wireDiameter);
  });

  it('finds the same spring from US input as from SI input (units at the edge)', () => {
    const si = {
      kind: 'extension',
      units: 'si',
      material: 'stainless-302',
      wire_sizes: WIRES,
      load: { force: 15, length: 50 },
      operating_length: 62,
      operating_force: 30,
      load_tolerance: 0.1,
      envelope: { max_outer_diameter: 12, max_free_length: 48 },
      cycles: 1e6,
      top: 1,
    };
    const mm = (v: number) => v / 25.4;
    const lbf = (v: number) => v / 4.4482216152605;
    const us = {
      ...si,
      units: 'us',
      wire_sizes: WIRES.map((d) => `${d} mm`),
      load: { force: lbf(15), length: mm(50) },
      operating_length: mm(62),
      operating_force: lbf(30),
      envelope: { max_outer_diameter: mm(12), max_free_length: mm(48) },
    };
    const a = designExtension(requirements(si), catalog).candidates[0];
    const b = designExtension(requirements(us), catalog).candidates[0];
    expect(a).toBeDefined();
    expect(b.item.wireDiameter).toBe(a.item.wireDiameter);
    expect(b.geometry.bodyCoils).toBe(a.geometry.bodyCoils);
    expect(relClose(b.analysis.geometry.mass, a.analysis.geometry.mass, 1e-9)).toBe(true);
  });

  it('runs the demo requirement: a spring whose loops govern', () => {
    const doc = parse(readFileSync(new URL('../../../examples/extension-pedal-bin.yaml', import.meta.url), 'utf8'));
    const run = designExtension(requirements(doc), catalog);
    expect(run.candidates.length).toBeGreaterThan(0);
    const a = run.candidates[0].analysis;
    expect(a.initialTension.position).toBe('inside');
    expect(a.staticSafety.governing).not.toBe('body');
    expect(a.fatigue!.governing).not.toBe('body');
  });
});

describe('extension problem: its promises to the engine', () => {
  it('every check declared monotone in the mean diameter is monotone', () => {
    fc.assert(
      fc.property(reqArb, fc.boolean(), fc.nat(), fc.nat(), (doc, noStroke, a, b) => {
        const d2 = noStroke ? { ...doc, operating_length: undefined, operating_force: undefined, load_tolerance: undefined, cycles: undefined } : doc;
        const p = buildExtensionProblem(requirements(d2), catalog);
        if (p.stock.length === 0) return;
        const x = new Float64Array(3);
        x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
        x[1] = valueAt(p.variables[1], b % valueCount(p.variables[1]));
        const d = p.stock[x[0]].wireDiameter;
        const g = new Float64Array(EXTENSION_CHECKS.length);
        const f = new Float64Array(p.objectiveNames.length);
        let prev: Float64Array | null = null;
        let prevF = -Infinity;
        for (let c = 4; c <= 12; c += 0.125) {
          x[2] = c * d;
          p.evaluate(x, g, f);
          if (prev) {
            EXTENSION_CHECKS.forEach((_, j) => {
              if (g[j] === -1 || prev![j] === -1) return;
              if (p.constraintTrend![j] === TREND.increasing) expect(g[j]).toBeGreaterThanOrEqual(prev![j] - 1e-12);
              if (p.constraintTrend![j] === TREND.decreasing) expect(g[j]).toBeLessThanOrEqual(prev![j] + 1e-12);
            });
            if (p.objectiveTrend![0] === TREND.increasing) expect(f[0]).toBeGreaterThanOrEqual(prevF);
          }
          prev = Float64Array.from(g);
          prevF = f[0];
        }
      }),
      { numRuns: 80, seed: 2 },
    );
  });

  it('a branch it rules out holds no feasible spring, and ruling branches out changes no result', () => {
    let cut = 0;
    fc.assert(
      fc.property(reqArb, fc.integer({ min: 0, max: 1_000_000 }), (doc, seed) => {
        const req = requirements({ ...doc, top: 1 });
        const p = buildExtensionProblem(req, catalog);
        const g = new Float64Array(EXTENSION_CHECKS.length);
        const f = new Float64Array(p.objectiveNames.length);
        const x = new Float64Array(3);
        let r = seed;
        const rand = () => {
          r = (r * 1103515245 + 12345) % 2147483648;
          return r / 2147483648;
        };
        for (let i = 0; i < p.stock.length; i++) {
          x[0] = i;
          for (const depth of [1, 2]) {
            x[1] = valueAt(p.variables[1], Math.floor(rand() * valueCount(p.variables[1])));
            if (p.branchInfeasible!(x, depth) < 0) continue;
            cut++;
            const d = p.stock[i].wireDiameter;
            const Nb = x[1];
            for (let t = 0; t < 60; t++) {
              if (depth === 1) x[1] = valueAt(p.variables[1], Math.floor(rand() * valueCount(p.variables[1])));
              x[2] = d * (req.index[0] + rand() * (req.index[1] - req.index[0]));
              p.evaluate(x, g, f);
              expect(Math.max(...g)).toBeGreaterThan(0);
            }
            x[1] = Nb;
          }
        }
        const without = designExtension(req, catalog, { problem: { ...p, branchInfeasible: undefined } }).candidates[0];
        const withCuts = designExtension(req, catalog, { problem: p }).candidates[0];
        expect(withCuts?.objectives[XO.mass]).toBe(without?.objectives[XO.mass]);
      }),
      { numRuns: 12, seed: 9 },
    );
    expect(cut).toBeGreaterThan(20);
  });

  it('bracket bounds never exceed the checks anywhere in the bracket', () => {
    fc.assert(
      fc.property(
        reqArb,
        fc.nat(),
        fc.nat(),
        fc.double({ min: 4, max: 11, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (doc, a, b, c0, w) => {
          const p = buildExtensionProblem(requirements(doc), catalog);
          if (p.stock.length === 0) return;
          const x = new Float64Array(3);
          x[0] = valueAt(p.variables[0], a % valueCount(p.variables[0]));
          x[1] = valueAt(p.variables[1], b % valueCount(p.variables[1]));
          const d = p.stock[x[0]].wireDiameter;
          const lo = c0 * d;
          const hi = lo * (1 + w);
          const lower = new Float64Array(EXTENSION_CHECKS.length).fill(-Infinity);
          p.bracketBounds!(x, lo, hi, lower);
          const g = new Float64Array(EXTENSION_CHECKS.length);
          const f = new Float64Array(p.objectiveNames.length);
          for (let t = 0; t <= 20; t++) {
            x[2] = lo + ((hi - lo) * t) / 20;
            p.evaluate(x, g, f);
            EXTENSION_CHECKS.forEach((_, j) => {
              if (g[j] !== -1) expect(lower[j]).toBeLessThanOrEqual(g[j] + 1e-12);
            });
          }
        },
      ),
      { numRuns: 80, seed: 4 },
    );
  });
});

describe('extension requirements', () => {
  const base = {
    kind: 'extension',
    material: 'music-wire',
    load: { force: 20, length: 60 },
    operating_length: 75,
    operating_force: 45,
    envelope: { max_outer_diameter: 14 },
  };
  const bad: [Record<string, unknown>, string][] = [
    [{ ...base, kind: 'compression' }, 'kind'],
    [{ ...base, load: undefined }, 'load'],
    [{ ...base, operating_length: 50 }, 'operating_length'],
    [{ ...base, operating_force: 10 }, 'operating_force'],
    [{ ...base, loop: 'extended' }, 'loop_length'],
    [{ ...base, loop: 'pigtail' }, 'loop'],
    [{ ...base, bend_index: 1 }, 'bend_index'],
    [{ ...base, envelope: { max_extended_length: 70 } }, 'envelope.max_extended_length'],
    [{ ...base, envelope: { max_inner_diameter: 3 } }, 'envelope.max_inner_diameter'],
    [{ ...base, body_coils: [30, 10] }, 'body_coils'],
    [{ ...base, index: [1.5, 10] }, 'index[0]'],
    [{ ...base, initial_tension_range: 'any' }, 'initial_tension_range'],
    [{ ...base, diameter_resolution: 1e-9 }, 'diameter_resolution'],
    [{ ...base, set_removed: true }, 'set_removed'],
  ];
  for (const [doc, field] of bad) {
    it(`refuses a bad ${field} with one line naming it`, () => {
      try {
        requirements(doc);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).field).toBe(field);
        expect((e as Error).message).not.toMatch(/\n|NaN|undefined|Infinity/);
      }
    });
  }

  it('defaults the bend index from the catalog (C2 = 4)', () => {
    expect(requirements(base).bendIndex).toBe(4);
  });
});
