// Invariant of the CLI, no outside values: bad input gets one clear message naming the field and what was expected, exit code 2, no stack trace,
// nothing on stdout.
import { describe, expect, it } from 'vitest';
import { cli, inputFile } from '../helpers.js';

const good: Record<string, string> = {
  units: 'si',
  material: 'music-wire',
  wire_diameter: '1.6',
  mean_diameter: '12',
  active_coils: '8',
  ends: 'squared-ground',
  free_length: '48',
  lengths: '[40, 30]',
};

function springText(change: Record<string, string | null>): string {
  const fields = { ...good, ...change };
  return (
    Object.entries(fields)
      .filter(([, v]) => v !== null)
      .map(([k, v]) => `${k}: ${v}`)
      .join('\n') + '\n'
  );
}

async function expectInputError(text: string, pattern: RegExp, ext = 'yaml') {
  const r = await cli('analyze', inputFile(text, ext));
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  expect(r.stderr).toMatch(pattern);
  expect(r.stderr.trim().split('\n')).toHaveLength(1);
  expect(r.stderr).not.toMatch(/\bat .*\.(ts|js):\d+/);
}

describe('analyze rejects bad input with exit code 2 and one message', () => {
  it('the good file analyses (control)', async () => {
    const r = await cli('analyze', inputFile(springText({})));
    expect(r.code).toBe(0);
  });
  it.each([
    ['a missing field', { free_length: null }, /free_length: expected a value \(the field is missing\)/],
    ['two diameters', { outer_diameter: '13.6' }, /mean_diameter, outer_diameter: expected only one of/],
    ['no diameter', { mean_diameter: null }, /mean_diameter \| outer_diameter \| inner_diameter: expected exactly one/],
    ['a negative diameter', { wire_diameter: '-1.6' }, /wire_diameter: expected a positive length, got -1\.6/],
    ['a zero free length', { free_length: '0' }, /free_length: expected a positive length/],
    ['an unknown material', { material: 'kryptonite' }, /material: expected a known material \(music-wire \| .*\), got "kryptonite"/],
    ['an unknown end type', { ends: 'flared' }, /ends: expected one of plain \| plain-ground \| squared \| squared-ground, got "flared"/],
    ['a force where a length belongs', { wire_diameter: '"1.6 N"' }, /wire_diameter: expected a length \(mm, cm, m, in, ft\), not a force/],
    ['coils overlapping at free length', { free_length: '15' }, /free_length: expected a free length above the solid length 16\.00 mm/],
    ['a length below solid', { lengths: '[40, 10]' }, /lengths\[1\]: expected a length at or above the solid length/],
    ['a misspelt field', { free_lenght: '48' }, /free_lenght: no such field/],
    ['an unknown unit system', { units: 'imperial' }, /units: expected one of si \| us, got "imperial"/],
    ['a bad fatigue criterion', { fatigue_criterion: 'soderberg' }, /fatigue_criterion: expected one of gerber \| goodman \| sines/],
    ['a material override with a bad modulus', { material: '{ like: music-wire, shear_modulus: "3 in" }' }, /material\.shear_modulus: expected a stress/],
  ])('%s', async (_label, change, pattern) => {
    await expectInputError(springText(change as Record<string, string | null>), pattern);
  });

  it('malformed YAML', async () => {
    await expectInputError('units: si\nmaterial: [music-wire\nwire_diameter: 1.6\n', /expected well-formed YAML or JSON/);
  });
  it('a repeated field', async () => {
    await expectInputError(springText({}) + 'wire_diameter: 2\n', /expected each field given once/);
  });
  it('malformed JSON', async () => {
    await expectInputError('{"units": "si", "material": }', /expected well-formed JSON/, 'json');
  });
  it('a missing file', async () => {
    const r = await cli('analyze', '/nonexistent/spring.yaml');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/spring\.yaml: expected an existing file/);
  });
  it('an unknown option goes through commander with exit code 2', async () => {
    const r = await cli('analyze', inputFile(springText({})), '--colour');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/unknown option '--colour'/);
  });
});
