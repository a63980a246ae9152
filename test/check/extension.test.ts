// source: none needed (our own scenarios; the checks are properties of coilfront's own verdicts).
// `check` of a given extension spring: every check of the extension kind with its margin, the working
// force held to its band, and a spring of one kind refused under requirements of another. No outside
// values here: scenarios of our own (the pedal-bin demo, invented for coilfront), judged against
// coilfront's own extension checks and the load line F = Fi + k (L - L0).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { check } from '../../src/check/index.js';
import { readInputFile } from '../../src/input/document.js';
import { EXTENSION_CHECKS, activeExtensionChecks } from '../../src/kinds/extension/checks.js';
import { readExtensionRequirements } from '../../src/kinds/extension/requirements.js';
import { cli, inputFile } from '../helpers.js';

const SPRING = 'examples/extension-pedal-bin-spring.yaml';
const REQ = 'examples/extension-pedal-bin.yaml';
const reqText = readFileSync(REQ, 'utf8');
// The demo requirement with the pedal-down force at 44 N +-10%: the drawn spring's 40.49 N is inside.
const EASED = reqText.replace('operating_force: 45', 'operating_force: 44');

describe('check of an extension spring', () => {
  it('passes a spring that meets every check, listing each active check of the kind with its margin', async () => {
    const r = await cli('check', SPRING, inputFile(EASED), '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.kind).toBe('extension');
    expect(out.pass).toBe(true);
    const req = readExtensionRequirements(readInputFile(inputFile(EASED)), loadCatalog());
    const active = EXTENSION_CHECKS.filter((_, i) => activeExtensionChecks(req)[i]);
    const names = out.checks.map((c: { name: string }) => c.name);
    expect(names).toEqual(['working_force_min', 'working_force_max', ...active, 'material', 'loop']);
    for (const c of out.checks) if (c.margin !== null) expect(c.margin).toBeGreaterThanOrEqual(-1e-6);
    // The working force lies on the load line from the initial tension: F1 = Fi + k (L1 - L0).
    const s = out.spring;
    expect(s.points[0].force).toBeCloseTo(s.initial_tension + s.rate * (60 - s.free_length), 9);
    expect(out.working_band).toMatchObject({ source: 'load_tolerance', low: 18, high: 22 });
  });

  it('fails the drawn demo spring on its pedal-down force by the margin it misses, exit 1', async () => {
    const r = await cli('check', SPRING, REQ);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/Result: FAILS 1 of 20 checks: operating_force_min by 0\.0\d+%/);
    expect(r.stdout).toContain('extension spring that breaks');
    expect(r.stderr).toContain('the spring fails operating_force_min');
    const out = check(readInputFile(SPRING), readInputFile(REQ));
    expect(out.failing).toEqual([{ name: 'operating_force_min', by: expect.closeTo(1.93e-4, 5) }]);
  });

  it('holds the working force to working_tolerance: a spring wound with less initial tension falls below its band', async () => {
    const weak = inputFile(readFileSync(SPRING, 'utf8').replace('initial_tension: 7.2 N', 'initial_tension: 6 N'));
    const r = await cli('check', weak, inputFile(`${EASED}\nworking_tolerance: 5%\n`), '--json');
    expect(r.code).toBe(1);
    const out = JSON.parse(r.stdout);
    expect(out.working_band).toMatchObject({ source: 'working_tolerance', low: 19, high: 21 });
    // 1.2 N less initial tension is 1.2 N less at every length: 19.99 N becomes 18.79 N.
    expect(out.spring.points[0].force).toBeCloseTo(18.79, 1);
    expect(out.failing.map((f: { name: string }) => f.name)).toContain('working_force_min');
  });

  it('refuses a spring of one kind under requirements of another, exit 2 naming kind, nothing on stdout', async () => {
    const r = await cli('check', SPRING, 'examples/washer-trigger.yaml');
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/kind: expected the same kind .*spring file is extension, the requirements compression/);
    const r2 = await cli(
      'check',
      inputFile('units: si\nmaterial: stainless-302\nwire_diameter: 1.4\nouter_diameter: 15.74\nactive_coils: 8.25\nends: squared-ground\nfree_length: 49.7\n'),
      REQ,
    );
    expect(r2.code).toBe(2);
    expect(r2.stderr).toMatch(/kind: .*spring file is compression, the requirements extension/);
  });
});
