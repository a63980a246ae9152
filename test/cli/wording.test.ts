// Help, messages and files say what is true (audit finding 17).
// Outside values: 1 in = 25.4 mm exactly (NIST SP 811, Appendix B.8); the rest needs no source (the
// tests compare the tool's outputs with each other).
import { readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { cli, inputFile, tempPath } from '../helpers.js';

describe('help says what each option does', () => {
  it('materials --units defaults to SI (materials reads no input file)', async () => {
    const r = await cli('materials', '--help');
    expect(r.stdout).toMatch(/--units <system>\s+units for the human-readable output \(default: si\)/);
    expect(r.stdout).not.toMatch(/input file's/);
  });

  it("design --seed also seeds the yield's Monte Carlo; --spring-file says it is for compression springs", async () => {
    const r = await cli('design', '--help');
    const help = r.stdout.replace(/\s+/g, ' ');
    expect(help).toMatch(/--seed <n> random seed of the genetic strategy and of the yield's Monte Carlo/);
    expect(help).toMatch(/--spring-file <file.yaml> .*\(compression springs; not yet for kind: extension\)/);
    const refused = await cli('design', 'examples/extension-pedal-bin.yaml', '--spring-file', tempPath('e.yaml'));
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/--spring-file: expected a kind that exports spring files/);
  });
});

describe('messages', () => {
  it('a file that is a list or a lone value: the error names the file', async () => {
    for (const [text, ext] of [
      ['- units: si\n- material: music-wire\n', 'yaml'],
      ['[1, 2]', 'json'],
      ['just words\n', 'yaml'],
    ]) {
      const file = inputFile(text, ext);
      const r = await cli('analyze', file);
      expect(r.code).toBe(2);
      expect(r.stderr).toContain(`coilfront: error: ${file}: expected a mapping of fields`);
      expect(r.stderr).not.toMatch(/error: file:/);
    }
  });

  it('a file over 1 MiB says its size without rounding it down to the limit (1.05 MiB, not 1.0)', async () => {
    const file = tempPath('big.yaml');
    writeFileSync(file, '#'.repeat(Math.round(1.05 * 1048576)) + '\n');
    const r = await cli('analyze', file);
    expect(r.stderr).toContain('expected an input file of at most 1 MiB (this one is 1.05 MiB)');
    const justOver = tempPath('just-over.yaml');
    writeFileSync(justOver, '#'.repeat(1048576) + '\n');
    expect((await cli('analyze', justOver)).stderr).toContain('(this one is 1.01 MiB)');
  });

  it('a margin at the limit reads 0%, never a share in exponent form, and never negative beside "pass"', async () => {
    const spring = tempPath('s.yaml');
    expect((await cli('design', 'examples/washer-trigger.yaml', '--spring-file', spring)).code).toBe(0);
    const L0 = Number(parseYaml(readFileSync(spring, 'utf8')).free_length);
    for (const limit of [L0 * (1 + 1e-10), L0, L0 * (1 - 1e-10)]) {
      const r = await cli('check', spring, 'examples/washer-trigger.yaml', '--set', `envelope.max_free_length=${limit}`);
      expect(r.stdout).toMatch(/^ {2}free_length +\S+ mm +<= +\S+ mm +0% +pass/m);
      expect(r.stdout).not.toMatch(/e-\d+%/);
    }
    const over = await cli('check', spring, 'examples/washer-trigger.yaml', '--set', `envelope.max_free_length=${L0 * 0.9998}`);
    expect(over.stdout).toMatch(/^ {2}free_length +\S+ mm +<= +\S+ mm +-0\.02\d*% +FAIL/m);
  });
});

describe('files say what they were drawn on', () => {
  it('frontier --y safety_factor has a safety_factor column: the lowest of the static and fatigue factors', async () => {
    const r = await cli('frontier', 'examples/washer-trigger.yaml', '--x', 'mass', '--y', 'safety_factor');
    const [head, ...rows] = r.stdout
      .trim()
      .split('\n')
      .map((l) => l.split(','));
    const at = (name: string) => head.indexOf(name);
    expect(at('safety_factor')).toBeGreaterThan(0);
    for (const row of rows) {
      const lowest = Math.min(Number(row[at('static_safety_factor')]), Number(row[at('fatigue_safety_factor')]));
      expect(Math.abs(Number(row[at('safety_factor')]) - lowest)).toBeLessThan(1e-3);
    }
    // An axis the CSV has already is not repeated.
    const od = await cli('frontier', 'examples/washer-trigger.yaml', '--x', 'mass', '--y', 'outer_diameter');
    expect(
      od.stdout
        .split('\n')[0]
        .split(',')
        .filter((c) => c.startsWith('outer_diameter')),
    ).toHaveLength(1);
  });

  it("a US design's spring file is in US units (units: us, inches), a metric wire spelt in mm, and check passes it", async () => {
    const spring = tempPath('us.yaml');
    const req = 'test/golden/inputs/shutter-lift.yaml';
    expect((await cli('design', req, '--spring-file', spring)).code).toBe(0);
    const doc = parseYaml(readFileSync(spring, 'utf8'));
    expect(doc.units).toBe('us');
    expect(doc.wire_diameter).toBe('1.6 mm');
    expect(typeof doc.outer_diameter).toBe('number');
    expect(doc.outer_diameter).toBeLessThan(1); // inches: the requirement's bore is 0.9 in
    expect(doc.lengths).toEqual([2.2, 1.6]); // the requirement's working and operating lengths, in inches
    const check = await cli('check', spring, req);
    expect(check.code).toBe(0);
    expect(check.stdout).toMatch(/Result: all \d+ checks pass/);
    // The same spring read back: the outer diameter in mm is the file's inches times 25.4.
    const a = JSON.parse((await cli('analyze', spring, '--json')).stdout);
    expect(a.geometry.outer_diameter).toBeCloseTo(doc.outer_diameter * 25.4, 9);
  });
});
