// source: none needed (the advice is checked by applying it).
// An infeasible design's advice writes each length or force --set with its unit, in the user's units
// (audit finding 13: under --units us it printed "[--set operating_length=25.41]", mm unlabelled beside
// a line in inches), and each such --set, applied alone as printed, admits a spring.
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

const QUANTITY_PATHS = /^(operating_length|operating_force|envelope\.\w+)=/;

async function adviceSets(...args: string[]): Promise<string[]> {
  const r = await cli('design', ...args);
  expect(r.code).toBe(1);
  return [...r.stdout.matchAll(/\[--set "?([^"\]]+)"?\]/g)].map((m) => m[1]);
}

describe('advice --set values carry their unit, in the user units', () => {
  it.each([
    ['SI file, --units us', ['examples/washer-trigger.yaml', '--max-od', '12', '--units', 'us'], / (in|lbf)$/],
    ['SI file', ['examples/washer-trigger.yaml', '--max-od', '12'], / (mm|N)$/],
    ['US file, --units si', ['test/golden/inputs/shutter-lift.yaml', '--max-od', '0.5', '--units', 'si'], / (mm|N)$/],
    ['US file', ['test/golden/inputs/shutter-lift.yaml', '--max-od', '0.5'], / (in|lbf)$/],
  ])('%s', async (_, args, unit) => {
    const sets = (await adviceSets(...args)).filter((s) => QUANTITY_PATHS.test(s));
    expect(sets.length).toBeGreaterThan(0);
    for (const s of sets) {
      expect(s).toMatch(unit);
      // As printed, alone, it admits a spring (the other overrides of the run kept).
      const r = await cli('design', ...args, '--set', s);
      expect(r.code, s).toBe(0);
    }
  });

  it('the line under --units us reads in inches, its --set too', async () => {
    const r = await cli('design', 'examples/washer-trigger.yaml', '--max-od', '12', '--units', 'us');
    expect(r.stdout).toContain('raise operating_length from 0.9843 in to 1.001 in (+1.64%, a shorter stroke) [--set "operating_length=1.001 in"]');
  });
});
