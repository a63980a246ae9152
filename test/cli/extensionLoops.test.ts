// Extension spring files: loop geometry the model cannot represent is refused, an unusual one warned
// about, and a spring past its allowable at its free length is said to be (audit findings 9, 10).
// Sources: the loop stresses take the body's D/2 as the loop's moment arm and r1, r2 only through the
// curvature factors (Budynas and Nisbett, Shigley's Mechanical Engineering Design, sec. 10-11, eqs. 10-34
// to 10-37), so a loop of radius far from D/2 is not the loop they describe; C2 should exceed 4 (same
// section, from memory). The 10% warning band and the factor-2 refusal are common practice / our choice.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, inputFile } from '../helpers.js';

// The demo spring (invented): music wire 1.2192 mm, D 8.25 mm, 29 body coils, 7.2 N initial tension, bend radius 2.44 mm.
const SPRING = readFileSync('examples/extension-pedal-bin-spring.yaml', 'utf8');
const withLine = (line: string) => inputFile(`${SPRING}\n${line}\n`);
const withBend = (r2: string) => inputFile(SPRING.replace(/^bend_radius: .*$/m, `bend_radius: ${r2}`));

describe('extension loop geometry', () => {
  it.each([
    ['loop_radius: 100', 'loop_radius', /expected a loop radius near the coil's mean radius D\/2 = 4.125 mm \(2.063 mm to 8.250 mm\)/],
    ['loop_radius: 2', 'loop_radius', /expected a loop radius near the coil's mean radius/],
  ])('%s on D 8.25 mm: exit 2 naming the field', async (line, field, message) => {
    const r = await cli('analyze', withLine(line));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain(`${field}: `);
    expect(r.stderr).toMatch(message);
  });

  it.each(['50', '500', '4.2'])('bend_radius %s above the loop radius 4.125 mm: exit 2 naming bend_radius', async (r2) => {
    const r = await cli('analyze', withBend(r2));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/bend_radius: expected a bend radius at most the loop radius r1 = 4.125 mm/);
  });

  it('a loop radius 16% off D/2 is analysed with a warning; at D/2 there is none', async () => {
    const off = await cli('analyze', withLine('loop_radius: 4.8'));
    expect(off.code).toBe(0);
    expect(off.stdout).toMatch(/! loop radius r1 4.800 mm is 16% off the coil's mean radius D\/2 4.125 mm/);
    const json = JSON.parse((await cli('analyze', withLine('loop_radius: 4.8'), '--json')).stdout);
    expect(json.warnings).toContainEqual(expect.objectContaining({ code: 'loop-radius', message: expect.stringMatching(/loop radius r1 4.8 mm is 16% off/) }));
    const at = await cli('analyze', withLine('loop_radius: 4.125'));
    expect(at.stdout).not.toMatch(/! loop radius r1/);
  });
});

describe('extension: past the allowable at the free length', () => {
  const overTensioned = (fi: string) => inputFile(SPRING.replace(/^initial_tension: .*$/m, `initial_tension: ${fi}`));

  it.each(['65 N', '1e6 N'])('initial tension %s above the 59.32 N the loops allow: no set point below the free length', async (fi) => {
    const r = await cli('analyze', overTensioned(fi));
    expect(r.stdout).toMatch(
      /largest pull before a set: none: the spring is already past its allowable at its free length \(initial tension .* above the 59.32 N/,
    );
    expect(r.stdout).not.toMatch(/largest pull before a set: [\d.]+ N at/);
    expect(r.stdout).toMatch(/! the initial tension .* is above the 59.32 N that .* allows: the spring is past its allowable at its free length/);
    const json = JSON.parse((await cli('analyze', overTensioned(fi), '--json')).stdout);
    expect(json.safe_extension).toMatchObject({ length: null, past_allowable_at_free_length: true });
  });

  it('check judges extended_stress against the free length, never a length below it', async () => {
    const r = await cli('check', overTensioned('1e6 N'), 'examples/extension-pedal-bin.yaml');
    expect(r.stdout).toMatch(/extended_stress +85.00 mm +<= +50.64 mm/);
    expect(r.stdout).not.toMatch(/-731700/);
  });

  it('the demo spring keeps its set point (59.32 N at 88.78 mm)', async () => {
    const r = await cli('analyze', 'examples/extension-pedal-bin-spring.yaml');
    expect(r.stdout).toContain('largest pull before a set: 59.32 N at 88.78 mm');
  });
});
