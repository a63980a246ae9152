// `design --spec`: the best spring's specification sheet written beside the usual output (a property
// of our own output, no outside values; the sheet's rendering is tested in specSheet.browser.test.ts).
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, inputFile, tempPath } from '../helpers.js';

describe('design --spec', () => {
  it('writes the sheet of spring 1 as drawn, the same bytes every run, and leaves stdout as it was', async () => {
    const a = tempPath('spec-a.html');
    const b = tempPath('spec-b.html');
    const plain = await cli('design', 'examples/washer-trigger.yaml');
    const r = await cli('design', 'examples/washer-trigger.yaml', '--spec', a);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`specification sheet of spring 1 written to ${a}`);
    expect(r.stdout).toBe(plain.stdout);
    await cli('design', 'examples/washer-trigger.yaml', '--spec', b);
    const html = readFileSync(a, 'utf8');
    expect(readFileSync(b, 'utf8')).toBe(html);
    expect(html).toContain('EN 15800 grade 2');
    expect(html).toContain('302/304 austenitic stainless steel');
    expect(html).toContain('15.7'); // the outer diameter of spring 1, drawn to 0.01 mm
    expect(html).not.toMatch(/<script|NaN|Infinity|undefined/);
  });

  it("is drawn at the requirement's own tolerance grade, its yield sampled as the design's is", async () => {
    // A grade-1 requirement once got a grade-2 sheet (and a yield at grade 2), sampled 5,000 times where
    // the design confirms with 20,000. The sheet's spring is the drawn one (dimensions rounded as a
    // drawing gives them), so its yield may differ a little from the design's: not compared here.
    const req = inputFile(readFileSync('examples/washer-trigger.yaml', 'utf8') + 'tolerance_grade: 1\n');
    const p = tempPath('spec-grade1.html');
    const r = await cli('design', req, '--json', '--spec', p);
    expect(r.code).toBe(0);
    const best = JSON.parse(r.stdout).candidates[0];
    expect(best.tolerance_grade).toBe(1);
    const html = readFileSync(p, 'utf8');
    expect(html).toContain('EN 15800 grade 1');
    expect(html).not.toContain('EN 15800 grade 2');
    expect(html).toContain(`${best.yield_samples} samples`);
  });

  it('writes it in the units asked for', async () => {
    const p = tempPath('spec-us.html');
    expect((await cli('design', 'examples/washer-trigger.yaml', '--units', 'us', '--spec', p)).code).toBe(0);
    expect(readFileSync(p, 'utf8')).toContain('Dimensions in inches, forces in lbf');
  });

  it('refuses to overwrite a file without --force, and writes nothing when no spring is feasible', async () => {
    const p = tempPath('spec-existing.html');
    writeFileSync(p, 'keep');
    const r = await cli('design', 'examples/washer-trigger.yaml', '--spec', p);
    expect(r.code).toBe(2);
    expect(readFileSync(p, 'utf8')).toBe('keep');
    const q = tempPath('spec-none.html');
    const none = await cli('design', 'examples/washer-trigger.yaml', '--max-free-length', '36', '--spec', q);
    expect(none.code).toBe(1);
    expect(none.stderr).toContain('no specification sheet written');
    expect(existsSync(q)).toBe(false);
  });
});
