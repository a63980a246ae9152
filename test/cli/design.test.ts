// No outside values here: each check is a property of our own behaviour on our own demo scenario (the
// published references are checked in test/search/benchmarks.test.ts and test/cli/analyze.test.ts).
// `coilfront design`, `frontier` and `sweep` end to end, on the demo requirements (a scenario of our own).
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { LIMITS } from '../../src/input/limits.js';
import { cli, inputFile, tempPath } from '../helpers.js';

const demo = 'examples/washer-trigger.yaml';

describe('coilfront design', () => {
  it('lists ranked candidates with counts, LP bound and cautions', async () => {
    const r = await cli('design', demo);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/#\s+material\s+d mm\s+D mm\s+OD mm/);
    expect(r.stdout).toMatch(/candidate evaluations/);
    expect(r.stdout).toMatch(/LP lower bound on mass/);
    expect(r.stdout).toMatch(/Cautions:/);
    expect(r.stderr).toBe('');
  });

  it('--json gives SI candidates with every documented field, best first, within the envelope', async () => {
    const r = await cli('design', demo, '--json', '--variants');
    expect(r.code).toBe(0);
    expect(r.stdout).not.toMatch(/NaN|Infinity/);
    const j = JSON.parse(r.stdout);
    expect(j.units.length).toBe('mm');
    expect(j.evaluated).toBeGreaterThan(0);
    expect(j.feasible).toBeGreaterThan(0);
    expect(j.candidates.length).toBe(10);
    for (const c of j.candidates) {
      for (const key of [
        'material',
        'wire_diameter',
        'mean_diameter',
        'outer_diameter',
        'inner_diameter',
        'active_coils',
        'total_coils',
        'free_length',
        'solid_length',
        'rate',
        'mass',
      ]) {
        expect(c[key], key).toBeDefined();
      }
      expect(c.outer_diameter).toBeLessThanOrEqual(16 + 1e-6);
      expect(c.inner_diameter).toBeGreaterThanOrEqual(6.5 - 1e-6);
      expect(c.free_length).toBeLessThanOrEqual(60 + 1e-6);
      // The working force is met exactly; the operating force within the 5% band.
      expect(c.points[0].force).toBeCloseTo(20, 6);
      expect(c.points[1].force).toBeGreaterThanOrEqual(32 * 0.95 - 1e-6);
      expect(c.points[1].force).toBeLessThanOrEqual(32 * 1.05 + 1e-6);
      expect(c.static_safety_factor).toBeGreaterThanOrEqual(1.2 - 1e-6);
      expect(c.fatigue_safety_factor).toBeGreaterThanOrEqual(1.5 - 1e-6);
    }
    for (let i = 1; i < j.candidates.length; i++) expect(j.candidates[i].mass).toBeGreaterThanOrEqual(j.candidates[i - 1].mass);
    expect(j.lp_bound).toBeLessThanOrEqual(j.candidates[0].mass);
  });

  it('--set and the envelope shorthands override the file; a tighter bore never gives a lighter spring', async () => {
    const base = JSON.parse((await cli('design', demo, '--json')).stdout);
    const viaSet = JSON.parse((await cli('design', demo, '--json', '--set', 'envelope.max_outer_diameter=15')).stdout);
    const viaShort = JSON.parse((await cli('design', demo, '--json', '--max-od', '15 mm')).stdout);
    expect(viaSet.candidates[0]).toEqual(viaShort.candidates[0]);
    expect(viaSet.candidates[0].outer_diameter).toBeLessThanOrEqual(15 + 1e-9);
    expect(viaSet.candidates[0].mass).toBeGreaterThanOrEqual(base.candidates[0].mass);
  });

  it('when nothing is feasible: exit 1, the checks that cut, the nearest misses and what to relax', async () => {
    const r = await cli('design', demo, '--max-od', '12');
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/No spring meets every requirement/);
    expect(r.stdout).toMatch(/Combinations cut, by the check that failed worst:/);
    expect(r.stdout).toMatch(/Nearest misses/);
    expect(r.stdout).toMatch(/What to relax/);
    const j = await cli('design', demo, '--max-od', '12', '--json');
    expect(j.code).toBe(1);
    const out = JSON.parse(j.stdout);
    expect(out.candidates).toHaveLength(0);
    expect(out.infeasible.nearest_misses.length).toBeGreaterThan(0);
    expect(out.infeasible.relax.length).toBeGreaterThan(0);
  });

  it('the relax advice is true: applying its first change admits a spring (the full battery: test/kinds/compression/relax.test.ts)', async () => {
    const j = JSON.parse((await cli('design', demo, '--max-od', '12', '--json')).stdout);
    const s = j.infeasible.relax[0];
    expect(s).toBeDefined();
    const again = await cli('design', demo, '--max-od', '12', '--set', s.set, '--json');
    expect(again.code).toBe(0);
  });

  it('--per-wire lists the best spring of each material and wire size, each the best its wire can give', async () => {
    const req = inputFile(`units: si
material: [music-wire, stainless-302]
load: { force: 30, length: 40 }
operating_length: 30
envelope: { max_outer_diameter: 22, max_free_length: 90 }
wire_sizes: metric
coil_step: 0.5
top: 6
`);
    const all = JSON.parse((await cli('design', req, '--json', '--variants')).stdout);
    const per = JSON.parse((await cli('design', req, '--json', '--per-wire')).stdout);
    const keys = per.candidates.map((c: { material: string; wire_diameter: number }) => `${c.material}@${c.wire_diameter}`);
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys.length).toBeGreaterThan(2);
    expect(per.candidates[0].mass).toBeCloseTo(all.candidates[0].mass, 12);
    for (const c of per.candidates.slice(0, 3)) {
      const only = JSON.parse(
        (await cli('design', req, '--json', '--set', `material=${c.material}`, '--set', `wire_sizes=[${c.wire_diameter}]`, '--top', '1')).stdout,
      );
      expect(only.candidates[0].mass).toBeCloseTo(c.mass, 12);
    }
  });

  it('a space too large for the grid goes to the genetic search, within its budget; a grid forced onto it is refused naming coil_step', async () => {
    // The demo's loads over every material and end type at coil_step 0.01: 2,149,996 combinations.
    const huge = inputFile(readFileSync(demo, 'utf8') + '\n');
    const over = ['--set', 'material=any', '--set', 'ends=[plain, plain-ground, squared, squared-ground]', '--set', 'coil_step=0.01'];
    const auto = await cli('design', huge, ...over, '--json', '--top', '3');
    expect(auto.code, auto.stderr).toBe(0);
    const out = JSON.parse(auto.stdout);
    expect(out.strategy).toBe('genetic');
    expect(out.evaluated).toBeGreaterThan(0);
    expect(out.evaluated).toBeLessThanOrEqual(LIMITS.geneticEvaluations);
    expect(out.candidates.length).toBeGreaterThan(0);
    const grid = await cli('design', huge, ...over, '--strategy', 'grid', '--json');
    expect(grid.code).toBe(2);
    expect(grid.stdout).toBe('');
    expect(grid.stderr).toMatch(/^coilfront: error: coil_step: /);
    expect(grid.stderr).toContain('2,149,996');
    expect(grid.stderr).toContain('--strategy auto');
  }, 120_000);

  it('the genetic strategy is reproducible: same seed, same output, byte for byte', async () => {
    const a = await cli('design', demo, '--strategy', 'genetic', '--seed', '42', '--json');
    const b = await cli('design', demo, '--strategy', 'genetic', '--seed', '42', '--json');
    expect(a.stdout).toBe(b.stdout);
    const text1 = await cli('design', demo, '--strategy', 'genetic', '--seed', '42');
    const text2 = await cli('design', demo, '--strategy', 'genetic', '--seed', '42');
    expect(text1.stdout).toBe(text2.stdout);
    const timed = await cli('design', demo, '--json', '--timing');
    expect(JSON.parse(timed.stdout).search_ms).toBeGreaterThan(0);
    expect(JSON.parse(a.stdout).strategy).toBe('genetic');
  });

  it('rejects bad requirements with exit 2 and one message', async () => {
    const cases: [string, RegExp][] = [
      ['units: si\nmaterial: music-wire\nenvelope: { max_outer_diameter: 20 }\n', /load: expected the force at the working length/],
      ['units: si\nmaterial: music-wire\nload: { force: 10, length: 30 }\n', /envelope: expected a mapping of envelope limits/],
      ['units: si\nmaterial: { family: plastics }\nload: { force: 10, length: 30 }\nenvelope: {}\n', /material\.family: expected one of carbon-steel/],
      [
        'units: si\nmaterial: music-wire\nload: { force: 10, length: 30 }\noperating_length: 40\nenvelope: {}\n',
        /operating_length: expected a length shorter than the working length/,
      ],
      ['units: si\nmaterial: music-wire\nload: { force: 10, length: "30 N" }\nenvelope: {}\n', /load\.length: expected a length/],
      [
        'units: si\nmaterial: music-wire\nload: { force: 10, length: 30 }\nenvelope: { max_outer_diameter: -5 }\n',
        /envelope\.max_outer_diameter: expected a positive length/,
      ],
      ['units: si\nmaterial: music-wire\nload: { force: 10, length: 30 }\nenvelope: {}\nwire_sizes: imperial\n', /wire_sizes: expected a wire series/],
    ];
    for (const [text, pattern] of cases) {
      const r = await cli('design', inputFile(text));
      expect(r.code, text).toBe(2);
      expect(r.stderr).toMatch(pattern);
      expect(r.stdout).toBe('');
    }
    const bad = await cli('design', demo, '--set', 'envelope.max_outer_diameter=wide');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/envelope\.max_outer_diameter: expected a length/);
  });
});

describe('coilfront frontier and sweep', () => {
  it('frontier writes the Pareto set as CSV with units in the header, mass rising as OD falls', async () => {
    const out = tempPath('front.csv');
    const r = await cli('frontier', demo, '--x', 'mass', '--y', 'outer_diameter', '-o', out);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/springs on the mass \/ outer_diameter frontier/);
    const rows = parse(readFileSync(out, 'utf8'), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThan(1);
    expect(Object.keys(rows[0])).toContain('outer_diameter_mm');
    for (let i = 1; i < rows.length; i++) {
      expect(Number(rows[i].mass_kg)).toBeGreaterThanOrEqual(Number(rows[i - 1].mass_kg));
      expect(Number(rows[i].outer_diameter_mm)).toBeLessThan(Number(rows[i - 1].outer_diameter_mm));
    }
    const again = await cli('frontier', demo, '-o', out);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/--force/);
  });

  it('sweep re-runs per value, "none" and the limiting check where nothing fits, mass falling as the bore widens', async () => {
    const r = await cli('sweep', demo, '--vary', 'envelope.max_outer_diameter=12:17:1');
    expect(r.code).toBe(0);
    const rows = parse(r.stdout, { columns: true }) as Record<string, string>[];
    expect(rows).toHaveLength(6);
    expect(rows[0].material).toBe('none');
    expect(rows[0].limiting_check).toMatch(/static_stress|clash|outer_diameter/);
    const masses = rows.filter((x) => x.material !== 'none').map((x) => Number(x.mass_kg));
    expect(masses.length).toBeGreaterThan(2);
    for (let i = 1; i < masses.length; i++) expect(masses[i]).toBeLessThanOrEqual(masses[i - 1] * (1 + 1e-9));
  });
});
