// source: none needed (our own scenarios; the checks are properties of coilfront's own verdicts).
// `check`: every requirement check on one given spring, with margins. No outside values here: these are
// properties of coilfront's own verdicts (check agrees with design), and scenarios of our own.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { loadCatalog } from '../../src/catalogs/load.js';
import { check, checkDocuments } from '../../src/check/index.js';
import { readInputFile } from '../../src/input/document.js';
import { readRequirements } from '../../src/kinds/compression/requirements.js';
import { candidateAt, runDesign } from '../../src/kinds/compression/design.js';
import { springDocument } from '../../src/kinds/compression/springDoc.js';
import { cli, inputFile, requirementSpace } from '../helpers.js';

const catalog = loadCatalog();

// The trigger spring of the washer-gun demo, written out at four figures as a user would retype it.
const TRIGGER_SPRING = `units: si
material: stainless-302
wire_diameter: 1.4
outer_diameter: 15.74
active_coils: 8.25
ends: squared-ground
free_length: 49.7
`;
const DEMO = 'examples/washer-trigger.yaml';

const { arb: reqArb, doc: requirementsDoc } = requirementSpace({
  force: [5, 150],
  length: [20, 70],
  stroke: [0.1, 0.45],
  forceRise: [1.2, 2.2],
  od: [7, 40],
  materials: ['music-wire', 'stainless-302', 'chrome-silicon', 'phosphor-bronze'],
  ends: ['squared-ground', 'squared', 'plain'],
  seatings: ['fixed-fixed', 'pivoted-pivoted', 'fixed-free'],
  cycles: [undefined, 1e5, 'infinite'],
  tolerances: [0, 0.05],
  peenedAndGuided: false,
  freeLengthFactor: 2.5,
  coilStep: 1,
  top: 4,
});

describe('check agrees with design', () => {
  it('every spring design reports passes check, read back from its spring file; every nearest miss fails check on the checks design saw fail (property)', () => {
    let passed = 0;
    let missed = 0;
    fc.assert(
      fc.property(reqArb, (r) => {
        const raw = requirementsDoc(r);
        const req = readRequirements(raw, catalog);
        const run = runDesign(req, { strategy: 'grid' });
        for (const c of run.candidates) {
          const out = check(springDocument(c, req), raw, { catalog });
          expect(out.failing).toEqual([]);
          expect(out.pass).toBe(true);
          passed++;
        }
        for (const m of run.result.nearestMisses) {
          const c = candidateAt(run.problem, m.x, m.f);
          if (c.analysis.geometry.freeLength <= c.analysis.geometry.solidLength) continue; // no spring at all: no spring file to write
          const designFails = [...c.checks.keys()].filter((i) => c.checks[i] > 1e-6).map((i) => run.problem.constraintNames[i]);
          // A miss may go solid before the operating length: its spring file leaves the lengths to the requirement.
          const { lengths: _lengths, ...springFile } = springDocument(c, req);
          const out = check(springFile, raw, { catalog }) as { pass: boolean; failing: { name: string }[] };
          expect(out.pass).toBe(false);
          expect(out.failing.map((f) => f.name).sort()).toEqual([...designFails].sort());
          missed++;
        }
      }),
      { numRuns: 16, seed: 5 },
    );
    expect(passed).toBeGreaterThan(10);
    expect(missed).toBeGreaterThan(10);
  });
});

describe('coilfront check', () => {
  it('prints every check with its margin and exits 1 naming the check that fails', async () => {
    const r = await cli('check', inputFile(TRIGGER_SPRING), DEMO);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/operating_force_max\s+33\.62 N\s+<=\s+33\.60 N\s+-0\.04\d+%\s+FAIL/);
    expect(r.stdout).toMatch(/outer_diameter\s+15\.74 mm\s+<=\s+16\.00 mm\s+\+1\.6\d%\s+pass/);
    expect(r.stdout).toMatch(/Result: FAILS 1 of 17 checks: operating_force_max by 0\.04\d+% \(33\.615 N against <= 33\.600 N\)/);
    expect(r.stdout).toMatch(/Cautions:/);
    expect(r.stderr).toBe('coilfront: the spring fails operating_force_max\n');
  });

  it('exits 0 when every check passes; --set and the envelope shorthands apply to the requirements', async () => {
    const ok = await cli('check', inputFile(TRIGGER_SPRING), DEMO, '--set', 'load_tolerance=6%');
    expect(ok.code).toBe(0);
    expect(ok.stdout).toMatch(/Result: all 17 checks pass; the smallest margin is operating_force_max at \+0\.952%/);
    const tight = await cli('check', inputFile(TRIGGER_SPRING), DEMO, '--set', 'load_tolerance=6%', '--max-od', '15.5', '--json');
    expect(tight.code).toBe(1);
    const j = JSON.parse(tight.stdout);
    expect(j.failing.map((f: { name: string }) => f.name)).toEqual(['outer_diameter', 'outer_diameter_at_solid']);
    expect(j.failing[0].by).toBeCloseTo((15.74 - 15.5) / 15.5, 12);
  });

  it('says which band it held the working force to', async () => {
    const spring = inputFile(TRIGGER_SPRING);
    const cases: [string[], number, string][] = [
      [[], 0.05, 'load_tolerance'],
      [['--set', 'working_tolerance=1%'], 0.01, 'working_tolerance'],
      [['--set', 'load_tolerance=0', '--set', 'operating_force=33.62'], 0.02, 'default'],
    ];
    for (const [extra, tol, source] of cases) {
      const j = JSON.parse((await cli('check', spring, DEMO, '--json', ...extra)).stdout);
      expect(j.working_band.tolerance).toBe(tol);
      expect(j.working_band.source).toBe(source);
      expect(j.working_band.low).toBeCloseTo(20 * (1 - tol), 12);
    }
    const text = (await cli('check', spring, DEMO, '--set', 'working_tolerance=1%')).stdout;
    expect(text).toMatch(/Working force band: 20\.00 N \+-1\.00% at 35\.00 mm \(19\.80 N to 20\.20 N\), from the requirement's working_tolerance/);
  });

  it('fails a working force outside its band, on the side it misses', async () => {
    // 49.7 mm free gives 20.01 N at 35 mm; 48 mm free gives 17.7 N: below the 19 N floor.
    const j = JSON.parse(
      (await cli('check', inputFile(TRIGGER_SPRING.replace('free_length: 49.7', 'free_length: 48')), DEMO, '--json', '--set', 'load_tolerance=6%')).stdout,
    );
    expect(j.pass).toBe(false);
    expect(j.failing.map((f: { name: string }) => f.name)).toEqual(['working_force_min']);
  });

  it('the library function returns exactly what --json prints', async () => {
    const r = await cli('check', inputFile(TRIGGER_SPRING), DEMO, '--json');
    const lib = check(readInputFile(inputFile(TRIGGER_SPRING)), readInputFile(DEMO));
    expect(JSON.stringify(lib, null, 2) + '\n').toBe(r.stdout);
  });

  it("holds the spring to the requirement's material and named end types", () => {
    const req = readInputFile(DEMO) as Record<string, unknown>;
    const spring = readInputFile(inputFile(TRIGGER_SPRING.replace('stainless-302', 'music-wire').replace('squared-ground', 'squared'))) as Record<
      string,
      unknown
    >;
    const out = checkDocuments(spring, { ...req, load_tolerance: '6%' }, catalog);
    expect(out.verdict.failing.map((l) => l.name)).toEqual(expect.arrayContaining(['material', 'ends']));
    // Without an `ends` field the default end type does not restrict a given spring.
    const { ends: _ends, ...noEnds } = req;
    expect(checkDocuments(spring, noEnds, catalog).verdict.lines.map((l) => l.name)).not.toContain('ends');
  });

  it("uses the requirement's service conditions and says so where the spring file states others", async () => {
    const j = JSON.parse((await cli('check', inputFile(TRIGGER_SPRING + 'lengths: [40, 30]\ncycles: 1e6\n'), DEMO, '--json')).stdout);
    expect(j.notes.join(' ')).toMatch(/the spring file's lengths, cycles differ from the requirement's: the requirement's service conditions are used/);
    expect(j.spring.points.map((p: { length: number }) => p.length)).toEqual([35, 25]);
  });

  it('rejects bad input with exit 2 and one message, nothing on stdout', async () => {
    const cases: [string[], RegExp][] = [
      [[inputFile(TRIGGER_SPRING + 'colour: red\n'), DEMO], /colour: no such field/],
      [[inputFile(TRIGGER_SPRING), 'examples/missing.yaml'], /examples\/missing\.yaml: expected an existing file/],
      [[inputFile(TRIGGER_SPRING), DEMO, '--set', 'working_tolerance=150%'], /working_tolerance: expected a fraction below 1/],
      [[inputFile(TRIGGER_SPRING), DEMO, '--max-od', 'wide'], /envelope\.max_outer_diameter: expected a length/],
    ];
    for (const [args, pattern] of cases) {
      const r = await cli('check', ...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(pattern);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  });

  it('writes no NaN, Infinity or undefined, even for a spring that never reaches its working length', async () => {
    const short = TRIGGER_SPRING.replace('free_length: 49.7', 'free_length: 30');
    const r = await cli('check', inputFile(short), DEMO, '--json');
    expect(r.code).toBe(1);
    expect(r.stdout).not.toMatch(/NaN|Infinity|undefined/);
    const t = await cli('check', inputFile(short), DEMO);
    expect(t.stdout).not.toMatch(/NaN|Infinity|undefined/);
    expect(t.stdout).toMatch(/working_force_min/);
  });
});

// Keep the YAML writer exercised: a spring file written from a check's own spring record reads back the same verdict.
describe('spring file round trip', () => {
  it("a spring written from check's JSON record re-checks to the same verdict", () => {
    const req = readInputFile(DEMO);
    const first = check(readInputFile(inputFile(TRIGGER_SPRING)), req) as { spring: Record<string, number | string>; pass: boolean };
    const s = first.spring;
    const again = check(
      readInputFile(
        inputFile(
          stringify({
            units: 'si',
            material: s.material,
            wire_diameter: s.wire_diameter,
            mean_diameter: s.mean_diameter,
            active_coils: s.active_coils,
            ends: s.ends,
            free_length: s.free_length,
          }),
        ),
      ),
      req,
    ) as { pass: boolean; spring: unknown };
    expect(again.pass).toBe(first.pass);
    expect(again.spring).toEqual(first.spring);
  });
});
