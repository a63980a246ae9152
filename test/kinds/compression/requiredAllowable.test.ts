// A requirement-level `allowable_stress` is the allowable of every printed figure (issue 12, item 2).
// Sources: 1 psi = 6.894 757 293 168 kPa (NIST SP 811, Appendix B.8, lbf/in^2 to Pa); the 302 stainless scenario with a
// 90 kpsi allowable is invented for the test (the trigger spring of our own demo); the torsional ultimate
// Ssu = 0.67 Sut is Budynas and Nisbett, Shigley's Mechanical Engineering Design, eq. 10-30.
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readInputFile } from '../../../src/input/document.js';
import { readRequirements } from '../../../src/kinds/compression/requirements.js';
import { readSpringCase } from '../../../src/kinds/compression/springFile.js';
import { analyzeSpring } from '../../../src/kinds/compression/analysis.js';
import { runDesign } from '../../../src/kinds/compression/design.js';
import { springDocument } from '../../../src/kinds/compression/springDoc.js';
import { materialFigures } from '../../../src/input/material.js';
import { cli } from '../../helpers.js';

const KPSI = 6.894757293168;
const allowable = 90 * KPSI;
const demo = 'examples/washer-trigger.yaml';
const set = ['--set', 'allowable_stress=90 kpsi', '--top', '5'];

interface JsonCandidate {
  allowable_stress: number;
  static_safety_factor: number;
  points: { stress: number }[];
  solid_stress: number;
  warnings: string[];
}

describe('a requirement-level allowable_stress', () => {
  it('is the allowable in the JSON of every candidate, and the static safety factor is allowable / highest stress', async () => {
    const r = await cli('design', demo, ...set, '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.requirements.allowable_stress).toBeCloseTo(allowable, 6);
    expect(out.candidates.length).toBeGreaterThan(0);
    for (const c of out.candidates as JsonCandidate[]) {
      expect(c.allowable_stress).toBeCloseTo(allowable, 6);
      const tauMax = Math.max(...c.points.map((p) => p.stress));
      expect(tauMax).toBeLessThanOrEqual(allowable * (1 + 1e-9));
      expect(c.static_safety_factor).toBeCloseTo(allowable / tauMax, 10);
      // The search kept tau <= 90 kpsi, so no printed factor may say otherwise.
      expect(c.static_safety_factor).toBeGreaterThanOrEqual(1 - 1e-9);
      for (const w of c.warnings) if (/allowable/.test(w)) expect(w).toContain(`${Number(allowable.toPrecision(4))} MPa`);
    }
  });

  it('the requirements echo says when there is none (null), so the echo always names the field', async () => {
    const out = JSON.parse((await cli('design', demo, '--json', '--top', '1')).stdout);
    expect(out.requirements).toHaveProperty('allowable_stress', null);
  });

  it('is the allowable of the safety-factor column and the notes of the text report', async () => {
    const r = await cli('design', demo, ...set, '--units', 'us');
    expect(r.code).toBe(0);
    const rows = r.stdout.split('\n').filter((l) => /^\s+\d+\s+stainless-302/.test(l));
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      const cells = row.trim().split(/\s+/);
      // Counted from the end: ... tau max (kpsi), SF static, SF fatigue, buckling, mass, yield, yield limited by, of.
      const tauKpsi = Number(cells[cells.length - 8]);
      const sf = Number(cells[cells.length - 7]);
      expect(sf).toBeCloseTo(90 / tauKpsi, 2);
    }
    // The catalog allowable of this wire (0.35 Sut, about 92.3 kpsi) must not appear; 90 kpsi does.
    const notes = r.stdout.slice(r.stdout.indexOf('Notes on the best spring'));
    if (/allowable \(/.test(notes)) expect(notes).toMatch(/allowable \(90\.00 kpsi\)/);
    expect(r.stdout).not.toMatch(/92\.\d+ kpsi\)/);
  });

  it('travels with the spring into its spring file, so `analyze` judges it by the same allowable', () => {
    const catalog = loadCatalog();
    const doc = { ...(readInputFile(demo) as Record<string, unknown>), allowable_stress: '90 kpsi', top: 3 };
    const req = readRequirements(doc, catalog);
    const run = runDesign(req);
    expect(run.candidates.length).toBeGreaterThan(0);
    for (const c of run.candidates) {
      expect(c.analysis.material.allowableStress).toBeCloseTo(allowable, 6);
      const again = readSpringCase(springDocument(c, req), catalog);
      const a = analyzeSpring(again.geometry, again.figures, again.service);
      expect(a.material.allowableStress).toBeCloseTo(allowable, 9);
      expect(a.staticSafetyFactor).toBeCloseTo(c.analysis.staticSafetyFactor, 9);
    }
  });

  it('the search and the printed factor agree at the edge: the best spring sits at the allowable', () => {
    // With a lighter spring always more stressed, the lightest feasible spring runs close to its limit.
    const catalog = loadCatalog();
    const doc = { ...(readInputFile(demo) as Record<string, unknown>), allowable_stress: '90 kpsi', top: 1 };
    const req = readRequirements(doc, catalog);
    const best = runDesign(req).candidates[0];
    expect(best.analysis.staticSafetyFactor).toBeGreaterThanOrEqual(1 - 1e-9);
    expect(best.analysis.staticSafetyFactor).toBeLessThan(1.1);
  });
});

describe('an allowable_stress above the wire can carry', () => {
  it('is refused naming the field, the limit Ssu = 0.67 Sut of the weakest wire and its source: exit 2, nothing on stdout', async () => {
    const r = await cli('design', demo, '--set', 'allowable_stress=5000', '--set', 'envelope.min_inner_diameter=none');
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/allowable_stress: expected a stress at most the torsional ultimate strength/);
    expect(r.stderr).toContain('Ssu = 0.67 Sut (Shigley eq. 10-30)');
    expect(r.stderr).not.toMatch(/\n\s+at /); // no stack trace
  });

  it('is judged against the weakest wire the search may use (stainless 302 of 3 mm in the demo bore)', async () => {
    // The demo's wires fit a 16 mm bore up to 3.2 mm (index 4): the largest listed size is 3.0 mm.
    const catalog = loadCatalog();
    const req = readRequirements(readInputFile(demo), catalog);
    const m = req.materials[0];
    const ssu = 0.67 * materialFigures(m, 3, false).tensileStrength; // Shigley eq. 10-30
    const limit = /has Ssu ([\d.]+) MPa/.exec((await cli('design', demo, '--set', 'allowable_stress=5000')).stderr);
    expect(Number(limit![1])).toBeCloseTo(ssu, -1);
    expect((await cli('design', demo, '--set', `allowable_stress=${Math.floor(ssu) - 1}`, '--top', '1')).code).not.toBe(2);
    expect((await cli('design', demo, '--set', `allowable_stress=${Math.ceil(ssu) + 1}`, '--top', '1')).code).toBe(2);
  });
});
