// source: none needed; nothing here is checked against a value from outside the project.
// `kind: extension` end to end through the CLI: analyze, design, frontier and sweep, in text and --json,
// SI and US, and every spring a command reports read back through `analyze` as a spring file. No outside
// values: properties of our own behaviour on our own demo scenario (the pedal bin, invented for the
// demo); the published worked examples are checked in test/kinds/extension/analysis.test.ts.
import { readFileSync } from 'node:fs';
import { parse as parseCsv } from 'csv-parse/sync';
import { parse, stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { cli, inputFile, relClose, tempPath } from '../helpers.js';

const DEMO = 'examples/extension-pedal-bin.yaml';
const SPRING = 'examples/extension-pedal-bin-spring.yaml';
const demoDoc = parse(readFileSync(DEMO, 'utf8')) as Record<string, unknown>;

/** The demo requirements written in US customary units (exact conversions). */
const usDemo = inputFile(
  stringify({
    ...demoDoc,
    units: 'us',
    load: { force: `${20 / 4.4482216152605} lbf`, length: `${60 / 25.4} in` },
    operating_length: `${75 / 25.4} in`,
    operating_force: `${45 / 4.4482216152605} lbf`,
    envelope: { max_outer_diameter: `${14 / 25.4} in`, max_free_length: `${55 / 25.4} in`, max_extended_length: `${85 / 25.4} in` },
  }),
);

/** A designed spring (JSON record) as a spring file, at the requirement's lengths. */
function springFileOf(c: Record<string, any>, lengths: number[], extra: Record<string, unknown> = {}): string {
  return inputFile(
    stringify({
      kind: 'extension',
      units: 'si',
      material: c.material,
      wire_diameter: c.wire_diameter,
      mean_diameter: c.mean_diameter,
      body_coils: c.body_coils,
      initial_tension: c.initial_tension,
      loop: c.loop,
      loop_radius: c.loop_radius,
      bend_radius: c.bend_radius,
      lengths,
      ...extra,
    }),
  );
}

describe('coilfront analyze, kind: extension', () => {
  it('prints the initial tension and its band, the three stresses, their safety factors, fatigue and the extension caution', async () => {
    const r = await cli('analyze', SPRING);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    expect(r.stdout).toMatch(/^Extension spring analysis: Music wire/);
    expect(r.stdout).toMatch(/initial tension Fi\s+7\.200 N/);
    expect(r.stdout).toMatch(/inside the preferred range/);
    expect(r.stdout).toMatch(/static safety factors at the longest length: body [\d.]+, loop bending [\d.]+, loop torsion [\d.]+/);
    expect(r.stdout).toMatch(/loop bending \(A\)\s+[\d.]+ MPa/);
    expect(r.stdout).toMatch(/draw-bar arrangement or fit a guard/);
  });

  it('--json is SI with the figures the text shows; --units us changes the text only', async () => {
    const j = JSON.parse((await cli('analyze', SPRING, '--json')).stdout);
    expect(j.kind).toBe('extension');
    expect(j.units.force).toBe('N');
    expect(j.initial_tension.force).toBe(7.2);
    // The line starts at the initial tension: the force at the free length is Fi, above zero.
    expect(j.points[0].force).toBeCloseTo(7.2 + j.rate * (60 - j.geometry.free_length), 9);
    expect(j.safety_factors.fatigue.governing).toMatch(/^(body|loop_bending|loop_torsion)$/);
    const us = await cli('analyze', SPRING, '--units', 'us');
    expect(us.stdout).toMatch(/initial tension Fi\s+1\.619 lbf/);
    expect(us.stdout).toMatch(/rate k\s+[\d.]+ lbf\/in/);
    expect(us.stdout).not.toMatch(/ MPa| mm\b| N\b/);
  });

  it('a spring file written in US units gives the same analysis as in SI', async () => {
    const si = JSON.parse((await cli('analyze', SPRING, '--json')).stdout);
    const doc = parse(readFileSync(SPRING, 'utf8'));
    const usFile = inputFile(
      stringify({
        ...doc,
        units: 'us',
        wire_diameter: `${doc.wire_diameter / 25.4} in`,
        mean_diameter: `${doc.mean_diameter / 25.4} in`,
        initial_tension: `${7.2 / 4.4482216152605} lbf`,
        bend_radius: `${doc.bend_radius / 25.4} in`,
        lengths: doc.lengths.map((v: number) => `${v / 25.4} in`),
      }),
    );
    const us = JSON.parse((await cli('analyze', usFile, '--json')).stdout);
    for (const key of ['rate', 'mass']) expect(relClose(us[key], si[key], 1e-9), key).toBe(true);
    expect(relClose(us.fatigue.loop_bending.safety_factor, si.fatigue.loop_bending.safety_factor, 1e-9)).toBe(true);
  });
});

describe('coilfront design, kind: extension', () => {
  it('ranks springs with the initial-tension band and the loop stresses, and shows the best one in full', async () => {
    const r = await cli('design', DEMO);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Extension spring design: 20\.00 N at 60\.00 mm inside the loops/);
    expect(r.stdout).toMatch(/#\s+material\s+d mm\s+D mm\s+OD mm\s+Nb\s+Na\s+L0 mm\s+Fi N\s+Fi band\s+k N\/mm/);
    expect(r.stdout).toMatch(/loop A MPa\s+loop B MPa\s+SF body\/A\/B/);
    expect(r.stdout).toMatch(/The best spring/);
    expect(r.stdout).toMatch(/draw-bar/);
  });

  it('SI and US requirements find the same springs', async () => {
    const si = JSON.parse((await cli('design', DEMO, '--json')).stdout);
    const us = JSON.parse((await cli('design', usDemo, '--json')).stdout);
    expect(us.candidates.length).toBe(si.candidates.length);
    si.candidates.forEach((c: any, i: number) => {
      expect(us.candidates[i].wire_diameter).toBe(c.wire_diameter);
      expect(us.candidates[i].body_coils).toBe(c.body_coils);
      expect(relClose(us.candidates[i].mass, c.mass, 1e-6)).toBe(true);
    });
    const usText = await cli('design', usDemo);
    expect(usText.stdout).toMatch(/d in\s+D in\s+OD in/);
    expect(usText.stdout).toMatch(/mass oz/);
  });

  it('every spring design reports re-verifies through analyze: same figures, no failing check', async () => {
    const j = JSON.parse((await cli('design', DEMO, '--json', '--top', '5')).stdout);
    expect(j.candidates.length).toBe(5);
    for (const c of j.candidates) {
      const file = springFileOf(c, [60, 75], { cycles: 2e5, fatigue_criterion: 'gerber' });
      const a = JSON.parse((await cli('analyze', file, '--json')).stdout);
      expect(relClose(a.mass, c.mass, 1e-9)).toBe(true);
      expect(relClose(a.points[0].force, 20, 1e-9)).toBe(true);
      expect(relClose(a.points[1].force, c.points[1].force, 1e-9)).toBe(true);
      // Within the requirement's limits, with every safety factor at or above its target.
      expect(a.geometry.outer_diameter).toBeLessThanOrEqual(14 + 1e-9);
      expect(a.geometry.free_length).toBeLessThanOrEqual(55 + 1e-9);
      for (const v of Object.values(a.safety_factors.static).filter((x) => typeof x === 'number'))
        expect(v as number).toBeGreaterThanOrEqual(j.requirements.safety.static - 1e-6);
      for (const v of Object.values(a.safety_factors.fatigue).filter((x) => typeof x === 'number'))
        expect(v as number).toBeGreaterThanOrEqual(j.requirements.safety.fatigue - 1e-6);
      expect(a.initial_tension.position).toBe('inside');
      expect(a.points[1].force).toBeGreaterThanOrEqual(45 * 0.9 - 1e-6);
      expect(a.points[1].force).toBeLessThanOrEqual(45 * 1.1 + 1e-6);
    }
  });

  it('an infeasible extension requirement exits 1 and names the checks that cut', async () => {
    const file = inputFile(stringify({ ...demoDoc, envelope: { max_outer_diameter: 5 } }));
    const r = await cli('design', file);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/No spring meets every requirement/);
    expect(r.stdout).toMatch(/Limiting check: /);
    const j = await cli('design', file, '--json');
    expect(j.code).toBe(1);
    const inf = JSON.parse(j.stdout).infeasible;
    expect(inf.limiting_check).toMatch(/^[a-z_]+: /);
    // The advice: the bore that admits a spring, found by running the design; applied, it admits one,
    // and a bore 90% of the way there still does not (a looser bore never excludes a spring).
    const od = inf.relax.find((c: any) => c.path === 'envelope.max_outer_diameter');
    expect(od.from).toBe(5);
    expect(r.stdout).toContain(`[--set ${od.set}]`);
    expect((await cli('design', file, '--set', od.set)).code).toBe(0);
    expect((await cli('design', file, '--set', `envelope.max_outer_diameter=${5 + 0.9 * (od.to - 5)}`)).code).toBe(1);
  });

  it("--per-wire lists one spring per wire size; --strategy genetic finds the grid's best spring", async () => {
    const j = JSON.parse((await cli('design', DEMO, '--json', '--per-wire')).stdout);
    const wires = j.candidates.map((c: any) => `${c.material}/${c.wire_diameter}`);
    expect(new Set(wires).size).toBe(wires.length);
    const grid = JSON.parse((await cli('design', DEMO, '--json')).stdout);
    const g = await cli('design', DEMO, '--strategy', 'genetic', '--json');
    expect(g.code).toBe(0);
    const gen = JSON.parse(g.stdout);
    expect(gen.strategy).toBe('genetic');
    expect(gen.candidates[0].wire_diameter).toBe(grid.candidates[0].wire_diameter);
    expect(gen.candidates[0].body_coils).toBe(grid.candidates[0].body_coils);
    expect(relClose(gen.candidates[0].mass, grid.candidates[0].mass, 1e-9)).toBe(true);
  });
});

describe('coilfront frontier and sweep, kind: extension', () => {
  it('frontier: CSV with units in the names, one row per non-dominated spring, each re-verifiable', async () => {
    const r = await cli('frontier', DEMO, '--x', 'mass', '--y', 'outer_diameter');
    expect(r.code).toBe(0);
    const rows = parseCsv(r.stdout, { columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThan(1);
    expect(Object.keys(rows[0])).toEqual(expect.arrayContaining(['initial_tension_N', 'loop_bending_stress_MPa', 'mass_kg']));
    for (let i = 1; i < rows.length; i++) {
      // Along the front the mass rises as the outer diameter falls.
      expect(Number(rows[i].mass_kg)).toBeGreaterThanOrEqual(Number(rows[i - 1].mass_kg));
      expect(Number(rows[i].outer_diameter_mm)).toBeLessThanOrEqual(Number(rows[i - 1].outer_diameter_mm));
    }
    expect(r.stderr).toMatch(/draw-bar/);
    const j = JSON.parse((await cli('frontier', DEMO, '--json', '--units', 'us')).stdout);
    expect(j.kind).toBe('extension');
    expect(j.frontier.length).toBe(rows.length);
    const us = await cli('frontier', DEMO, '--units', 'us');
    expect(us.stdout.split('\n')[0]).toMatch(/initial_tension_lbf/);
    // Every spring on the front, written as a spring file, analyses to the same figures within the limits.
    for (const c of j.frontier) {
      const a = JSON.parse((await cli('analyze', springFileOf(c, [60, 75], { cycles: 2e5 }), '--json')).stdout);
      expect(relClose(a.mass, c.mass, 1e-9)).toBe(true);
      expect(relClose(a.geometry.outer_diameter, c.outer_diameter, 1e-12)).toBe(true);
      expect(a.geometry.outer_diameter).toBeLessThanOrEqual(14 + 1e-9);
      expect(Math.min(a.safety_factors.static.body, a.safety_factors.static.loop_bending, a.safety_factors.static.loop_torsion)).toBeGreaterThanOrEqual(
        1.2 - 1e-6,
      );
      expect(a.initial_tension.position).toBe('inside');
    }
  });

  it('frontier refuses an objective extension springs do not have, naming --x', async () => {
    const r = await cli('frontier', DEMO, '--x', 'static_safety');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^coilfront: error: --x: /);
  });

  it('sweep: the best mass never falls as the bore tightens; none where nothing fits', async () => {
    const out = tempPath('sweep.csv');
    const r = await cli('sweep', DEMO, '--vary', 'envelope.max_outer_diameter=8:14:2', '-o', out);
    expect(r.code).toBe(0);
    const rows = parseCsv(readFileSync(out, 'utf8'), { columns: true }) as Record<string, string>[];
    expect(rows.map((x) => x.material)).toContain('none');
    const masses = rows.filter((x) => x.material !== 'none').map((x) => Number(x.mass_kg));
    for (let i = 1; i < masses.length; i++) expect(masses[i]).toBeLessThanOrEqual(masses[i - 1] + 1e-12);
    const j = JSON.parse((await cli('sweep', DEMO, '--vary', 'envelope.max_outer_diameter=8:14:2', '--json')).stdout);
    expect(j.rows[0].best).toBeNull();
    expect(j.rows[0].limiting_check).toMatch(/^[a-z_]+: /);
  });
});

describe('README, extension springs', () => {
  it('shows demo output that `design examples/extension-pedal-bin.yaml` really prints', async () => {
    const readme = readFileSync('README.md', 'utf8');
    const section = readme.slice(readme.indexOf('## Extension springs'));
    const start = section.indexOf('```\n') + 4;
    const block = section.slice(start, section.indexOf('\n```', start));
    const out = (await cli('design', DEMO)).stdout;
    const shown = block.split('\n').filter((l) => l.trim() !== '...' && l.trim() !== '');
    expect(shown.length).toBeGreaterThan(4);
    for (const line of shown) expect(out, line).toContain(line);
    // The example spring file is the design's best spring as drawn.
    expect(section).toContain('npm run coilfront -- analyze examples/extension-pedal-bin-spring.yaml');
    expect((await cli('analyze', SPRING)).code).toBe(0);
  });
});
