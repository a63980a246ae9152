// The extension spring's specification sheet (`design --spec`, `analyze --spec`): every figure on it is
// the analysis's own (compared with the `--json` records, which come from the same analysis by another
// path), its cautions are all there, nothing undefined reaches it, and its tolerances are those of the
// tables in src/kinds/extension/tolerances.ts, each check below naming where its value was published.
// The sheet in a real browser (one printed page): specSheet.browser.test.ts.
import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { generalCautions } from '../../../src/report/cautions.js';
import { EXTENSION_CAUTION } from '../../../src/kinds/extension/analysis.js';
import {
  COIL_DIAMETER_GRADE_2,
  FREE_LENGTH_GRADE_2,
  coilDiameterTolerance,
  freeLengthTolerance,
  loopPositionTolerance,
} from '../../../src/kinds/extension/tolerances.js';
import { sig } from '../../../src/units/format.js';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { kindOf } from '../../../src/kinds/index.js';
import type { ExtensionKind } from '../../../src/kinds/extension/index.js';
import { parse } from 'yaml';
import { cli, inputFile, tempPath } from '../../helpers.js';

const DEMO = 'examples/extension-pedal-bin.yaml';
const SPRING = 'examples/extension-pedal-bin-spring.yaml';

/** The sheet as a reader sees it: tags out, entities back. */
function textOf(html: string): string {
  return html
    .replace(/<style>[\s\S]*?<\/style>/, '')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&quot;/g, '"')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ');
}

let run: ReturnType<ExtensionKind['design']> | undefined;
/** The demo designed in-process through the kind, as the CLI does. */
function designed() {
  if (!run) {
    const kind = kindOf({ kind: 'extension' }) as ExtensionKind;
    run = kind.design(kind.readRequirements(parse(readFileSync(DEMO, 'utf8')), loadCatalog()), loadCatalog());
  }
  return run;
}

const N = (v: number) => `${sig(v, 4)} N`;
const MPa = (v: number) => `${sig(v, 4)} MPa`;

function expectClean(html: string): void {
  expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
  expect(html).not.toMatch(/NaN|Infinity|undefined|\bnull\b/);
}

function expectCautions(text: string): void {
  for (const c of [...generalCautions('extension'), EXTENSION_CAUTION]) expect(text, c).toContain(c);
  expect(text).toMatch(/draw-bar/);
  expect(text).toMatch(/release it violently/);
}

describe('design --spec (extension)', () => {
  it('writes the sheet of spring 1, its figures those of design --json, the same bytes every run, stdout as it was', async () => {
    const pa = tempPath('xspec-a.html');
    const b = tempPath('xspec-b.html');
    const plain = await cli('design', DEMO);
    const r = await cli('design', DEMO, '--spec', pa);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`specification sheet of spring 1 written to ${pa}`);
    expect(r.stdout).toBe(plain.stdout);
    await cli('design', DEMO, '--spec', b);
    const html = readFileSync(pa, 'utf8');
    expect(readFileSync(b, 'utf8')).toBe(html);
    expectClean(html);
    const text = textOf(html);
    // The spring the library designs from the same file: its analysis is the one source of every figure.
    const c = designed().candidates[0];
    const a = c.analysis;
    const g = a.geometry;
    const last = a.points[a.points.length - 1];
    // Dimensions at a drawing's precision. The tolerances: DIN 2097 grade 2, coil diameter D 6.3-10 mm at
    // index 4-8 +-0.25 mm (source: DIN 2097 grade 2 as reproduced by federnshop.com, "Tension spring
    // tolerances", and Industrial Springs, "What tolerances does an extension spring have?"); free length
    // 40-63 mm at index 4-8 +-1.1 mm (source: Industrial Springs, the same page).
    expect(g.meanDiameter).toBeGreaterThan(6.3);
    expect(g.meanDiameter).toBeLessThan(10);
    expect(g.springIndex).toBeLessThan(8);
    expect(g.freeLength).toBeGreaterThan(40);
    expect(g.freeLength).toBeLessThan(63);
    const it = a.initialTension;
    const ss = a.staticSafety;
    const allow = a.material.allowables;
    for (const s of [
      'Music wire',
      'ASTM A228',
      `wire diameter d ${g.wireDiameter.toFixed(2)} mm`,
      `outer diameter OD ${g.outerDiameter.toFixed(2)} mm ± 0.250 mm`,
      `${g.meanDiameter.toFixed(2)} mm / ${g.innerDiameter.toFixed(2)} mm`,
      `free length L0 ${g.freeLength.toFixed(1)} mm ± 1.100 mm`,
      `body coils Nb ${g.bodyCoils}`,
      `active coils Na ${g.activeCoils.toFixed(2)}`,
      `loop height h ${g.loopHeight.toFixed(1)} mm`,
      `loop radius r1 ${g.loopRadius.toFixed(2)} mm`,
      `bend radius r2 ${g.bendRadius.toFixed(2)} mm`,
      `initial tension Fi ${N(it.force)} reference`,
      `stress ${MPa(it.stress)}; preferred ${MPa(it.band.low)} to ${MPa(it.band.high)}`,
      'Shigley eq. 10-41',
      `working force F1 ${N(a.points[0].force)} ± 10%`,
      `this spring ${N(last.force)}`,
      `rate k ${sig(a.rate, 4)} N/mm`,
      `stress at 75.0 mm ${MPa(last.bodyStress)} ${MPa(last.loopBendingStress)} ${MPa(last.loopTorsionStress)}`,
      `static safety factor ${ss.body.toFixed(2)} (allowable ${MPa(allow.bodyTorsion)}) ${ss.loopBending.toFixed(2)} (allowable ${MPa(allow.loopBending)}) ${ss.loopTorsion.toFixed(2)} (allowable ${MPa(allow.loopTorsion)})`,
      `fatigue safety factor ${a.fatigue!.body.safetyFactor.toFixed(2)} ${a.fatigue!.loopBending.safetyFactor.toFixed(2)} ${a.fatigue!.loopTorsion.safetyFactor.toFixed(2)}`,
      `largest pull before a set ${N(a.safeExtension.force)} at ${a.safeExtension.length.toFixed(1)} mm`,
      `mass ${sig(g.mass * 1000, 4)} g`,
      `natural frequency ${sig(a.surge.frequency, 4)} Hz`,
      'loop type full, both ends height = ID',
      'loop orientation',
      'maximum extended length 85.0 mm',
      'DIN 2097 grade 2',
      'to be agreed with the spring maker',
      'load cycles 2.0e5',
    ])
      expect(text, s).toContain(s);
    // The CLI's JSON names the same spring.
    const j = JSON.parse((await cli('design', DEMO, '--json')).stdout).candidates[0];
    expect(j.mean_diameter).toBe(g.meanDiameter);
    expect(j.body_coils).toBe(g.bodyCoils);
    // The required operating force's band: 45 N +-10% (the demo requirement's own figures).
    expect(text).toContain('operating force F2 40.50 N to 49.50 N');
    expectCautions(text);
  });

  it('writes the spring --pick names, in the units asked for (US: inches, lbf, ounces)', async () => {
    const p = tempPath('xspec-pick2-us.html');
    const r = await cli('design', DEMO, '--spec', p, '--pick', '2', '--units', 'us');
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('specification sheet of spring 2');
    const g = designed().candidates[1].analysis.geometry;
    const text = textOf(readFileSync(p, 'utf8'));
    expect(text).toContain('Dimensions in inches, forces in lbf');
    expect(text).toContain(`outer diameter OD ${(g.outerDiameter / 25.4).toFixed(3)} in ± `);
    expect(text).toContain(`free length L0 ${(g.freeLength / 25.4).toFixed(2)} in ± `);
    expect(text).toMatch(/mass [\d.]+ oz/);
    expect(text).toMatch(/kpsi/);
    expectClean(readFileSync(p, 'utf8'));
  });

  it('writes nothing when no spring is feasible, and refuses a rank beyond the list', async () => {
    const q = tempPath('xspec-none.html');
    const none = await cli('design', DEMO, '--max-od', '6', '--spec', q);
    expect(none.code).toBe(1);
    expect(none.stderr).toContain('no specification sheet written');
    expect(existsSync(q)).toBe(false);
    const far = await cli('design', DEMO, '--spec', q, '--pick', '6');
    expect(far.code).toBe(2);
    expect(far.stderr).toContain('--pick');
    expect(existsSync(q)).toBe(false);
  });
});

describe('design --spec across the requirement shapes (extension)', () => {
  // Static service, one working length, half and extended loops, a stroke with no force: every sheet whole, its
  // figures finite, its cautions there, its F2 line saying what applies.
  const variants: { name: string; sets: string[]; expect: RegExp }[] = [
    {
      name: 'static, one working length',
      sets: ['cycles=none', 'operating_length=none', 'operating_force=none', 'envelope.max_extended_length=none'],
      expect: /operating force F2 none/,
    },
    { name: 'half loops', sets: ['loop=half'], expect: /loop type half, both ends height about 2\/3 ID/ },
    { name: 'extended loops 12 mm', sets: ['loop=extended', 'loop_length=12', 'envelope.max_free_length=80'], expect: /loop height h 12\.0 mm/ },
    { name: 'a stroke without a required force', sets: ['operating_force=none'], expect: /operating force F2 [\d.]+ N reference/ },
  ];
  for (const v of variants)
    it(
      v.name,
      async () => {
        const p = tempPath('xspec-variant.html');
        const r = await cli('design', DEMO, ...v.sets.flatMap((x) => ['--set', x]), '--spec', p);
        expect(r.code, r.stderr).toBe(0);
        const html = readFileSync(p, 'utf8');
        expectClean(html);
        const text = textOf(html);
        expect(text).toMatch(v.expect);
        expectCautions(text);
      },
      60_000,
    );
});

describe('analyze --spec (extension)', () => {
  it("writes the given spring's sheet, its figures those of analyze --json; force tolerances left to be agreed", async () => {
    const p = tempPath('xspec-analyze.html');
    const r = await cli('analyze', SPRING, '--spec', p);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`specification sheet written to ${p}`);
    expect(r.stdout).toBe((await cli('analyze', SPRING)).stdout);
    const html = readFileSync(p, 'utf8');
    expectClean(html);
    const text = textOf(html);
    const kind = kindOf({ kind: 'extension' });
    const a = kind.analyse(kind.readSpring(parse(readFileSync(SPRING, 'utf8')), loadCatalog()));
    const g = a.geometry;
    const s = a.staticSafety;
    // The CLI's JSON is the same analysis.
    expect(JSON.parse((await cli('analyze', SPRING, '--json')).stdout).geometry.free_length).toBe(g.freeLength);
    for (const x of [
      `outer diameter OD ${g.outerDiameter.toFixed(2)} mm ± `,
      `free length L0 ${g.freeLength.toFixed(1)} mm ± `,
      `body coils Nb ${g.bodyCoils}`,
      `initial tension Fi ${N(a.initialTension.force)} reference`,
      `working force F1 ${N(a.points[0].force)} at L1 = 60.0 mm`,
      `operating force F2 ${N(a.points[1].force)} reference`,
      `static safety factor ${s.body.toFixed(2)} (allowable`,
      `${s.loopTorsion.toFixed(2)} (allowable`,
      `bend radius r2 ${g.bendRadius.toFixed(2)} mm`,
      'from a spring file: lengths 60.0 mm, 75.0 mm',
    ])
      expect(text, x).toContain(x);
    expect(text).toContain('tolerance to be agreed with the spring maker');
    expectCautions(text);
  });

  it('refuses a spring file without lengths or forces, and a compression spring (design --spec writes theirs): exit 2, nothing written', async () => {
    const bare = inputFile(readFileSync(SPRING, 'utf8').replace(/^lengths:.*$/m, ''));
    const p = tempPath('xspec-bare.html');
    const rep = tempPath('xspec-bare-report.html');
    const r = await cli('analyze', bare, '--spec', p, '--report', rep);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^coilfront: error: --spec: /);
    expect(existsSync(p)).toBe(false);
    expect(existsSync(rep)).toBe(false);
    const c = await cli('analyze', 'examples/valve-return-spring.yaml', '--spec', p, '--report', rep);
    expect(c.code).toBe(2);
    expect(c.stderr).toContain('--spec');
    expect(c.stderr).toContain('design --spec');
    expect(existsSync(p)).toBe(false);
    expect(existsSync(rep)).toBe(false);
  });
});

describe('extension tolerances (DIN 2097 grade 2 as spring makers reproduce it)', () => {
  it('coil diameter by D and the index (source: federnshop.com and Industrial Springs reproductions of DIN 2097 grade 2)', () => {
    // D 6.3-10 mm: 0.25 / 0.30 / 0.35 mm for index 4-8 / 8-14 / 14-20 (both makers print the row alike).
    expect(coilDiameterTolerance(8.25, 6.77)?.halfWidth).toBe(0.25);
    expect(coilDiameterTolerance(8.25, 10)?.halfWidth).toBe(0.3);
    expect(coilDiameterTolerance(8.25, 16)?.halfWidth).toBe(0.35);
    // D 0.63-1.0 mm: 0.07 / 0.10 / 0.15 mm; D 160-200 mm: 2.1 / 2.9 / 3.3 mm (Industrial Springs).
    expect(coilDiameterTolerance(0.8, 5)?.halfWidth).toBe(0.07);
    expect(coilDiameterTolerance(180, 18)?.halfWidth).toBe(3.3);
    // Outside the table's scope (D 0.63-200 mm, index 4-20): nothing is guessed.
    expect(coilDiameterTolerance(8, 3.5)).toBeNull();
    expect(coilDiameterTolerance(8, 21)).toBeNull();
    expect(coilDiameterTolerance(250, 10)).toBeNull();
    expect(coilDiameterTolerance(0.5, 5)).toBeNull();
    expect(coilDiameterTolerance(8.25, 6.77)?.source).toMatch(/DIN 2097 grade 2/);
  });

  it('free length inside the loops by L0 and the index (source: Industrial Springs reproduction of DIN 2097 grade 2)', () => {
    expect(freeLengthTolerance(50.6, 6.77)?.halfWidth).toBe(1.1);
    expect(freeLengthTolerance(50.6, 10)?.halfWidth).toBe(1.3);
    expect(freeLengthTolerance(8, 5)?.halfWidth).toBe(0.4);
    // Above 400 mm: 1.5% of L0.
    expect(freeLengthTolerance(500, 10)?.halfWidth).toBeCloseTo(7.5, 12);
    expect(freeLengthTolerance(50, 3)).toBeNull();
  });

  it("the loops' relative position by the body coils (source: Stock Springs Australia, technical information; commercial practice)", () => {
    expect(loopPositionTolerance(4)?.halfWidth).toBe(20);
    expect(loopPositionTolerance(7)?.halfWidth).toBe(30);
    expect(loopPositionTolerance(12)?.halfWidth).toBe(40);
    expect(loopPositionTolerance(29)?.halfWidth).toBe(65.5);
    expect(loopPositionTolerance(2)).toBeNull();
  });

  it('the tables never tighten as the coil grows or slenders (the tables themselves, common practice)', () => {
    COIL_DIAMETER_GRADE_2.forEach((r, i) => {
      for (let j = 1; j < 3; j++) expect(r.byIndex[j]).toBeGreaterThanOrEqual(r.byIndex[j - 1]);
      if (i > 0) for (let j = 0; j < 3; j++) expect(r.byIndex[j]).toBeGreaterThanOrEqual(COIL_DIAMETER_GRADE_2[i - 1].byIndex[j]);
    });
    FREE_LENGTH_GRADE_2.forEach((r, i) => {
      expect(r.byIndex[1]).toBeGreaterThanOrEqual(r.byIndex[0]);
      if (i > 0) expect(r.byIndex[0]).toBeGreaterThan(FREE_LENGTH_GRADE_2[i - 1].byIndex[0]);
    });
  });
});

describe('README, extension specification sheet', () => {
  it('shows the --spec command of the extension section, and it runs', async () => {
    const readme = readFileSync('README.md', 'utf8');
    const section = readme.slice(readme.indexOf('## Extension springs'));
    expect(section).toContain('npm run coilfront -- design examples/extension-pedal-bin.yaml --spec pedal-bin-spring.html');
    const p = tempPath('pedal-bin-spring.html');
    expect((await cli('design', DEMO, '--spec', p)).code).toBe(0);
  });
});
