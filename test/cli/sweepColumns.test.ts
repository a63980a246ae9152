// The sweep CSV's first column names the varied requirement in its own unit, in the chosen system:
// a cycle count has none, load_tolerance is a fraction, a diameter a length (audit finding 15: every
// varied column was headed "(mm/N/MPa)", also under --units us).
// Outside value: 1 in = 25.4 mm exactly (source: NIST SP 811, Appendix B.8); everything else is our own output.
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

async function firstColumn(...args: string[]): Promise<string[]> {
  const r = await cli('sweep', ...args);
  expect(r.code).toBe(0);
  return r.stdout
    .trim()
    .split('\n')
    .map((l) => l.split(',')[0]);
}

describe('sweep CSV: the varied column in its own unit', () => {
  it('a cycle count has no unit', async () => {
    expect(await firstColumn('examples/washer-trigger.yaml', '--vary', 'cycles=1e4:1e7:5e6')).toEqual(['cycles', '10000', '5010000']);
    expect((await firstColumn('examples/washer-trigger.yaml', '--vary', 'cycles=1e4:1e7:5e6', '--units', 'us'))[0]).toBe('cycles');
  });

  it('load_tolerance is a fraction, in either system', async () => {
    expect(await firstColumn('examples/washer-trigger.yaml', '--vary', 'load_tolerance=0.05:0.1:0.05')).toEqual(['load_tolerance (fraction)', '0.05', '0.1']);
    expect((await firstColumn('examples/washer-trigger.yaml', '--vary', 'load_tolerance=0.05:0.1:0.05', '--units', 'us'))[0]).toBe('load_tolerance (fraction)');
  });

  it('a diameter is a length: mm, or inches under --units us (values converted, 14 mm = 0.551181 in)', async () => {
    expect(await firstColumn('examples/washer-trigger.yaml', '--vary', 'envelope.max_outer_diameter=14:16:2')).toEqual([
      'envelope.max_outer_diameter (mm)',
      '14',
      '16',
    ]);
    expect(await firstColumn('examples/washer-trigger.yaml', '--vary', 'envelope.max_outer_diameter=14:16:2', '--units', 'us')).toEqual([
      'envelope.max_outer_diameter (in)',
      '0.551181', // 14 mm / 25.4 (source: NIST SP 811, Appendix B.8: 1 in = 25.4 mm exactly)
      '0.629921',
    ]);
  });

  it('a US file varied in inches reads in mm under --units si (0.8 in = 20.32 mm)', async () => {
    expect(await firstColumn('test/golden/inputs/shutter-lift.yaml', '--vary', 'envelope.max_outer_diameter=0.8:1:0.2', '--units', 'si')).toEqual([
      'envelope.max_outer_diameter (mm)',
      '20.32',
      '25.4',
    ]);
  });

  it('a stress in MPa, or kpsi under --units us; a temperature in degC or degF', async () => {
    expect((await firstColumn('examples/washer-trigger.yaml', '--vary', 'allowable_stress=600:700:100'))[0]).toBe('allowable_stress (MPa)');
    expect((await firstColumn('examples/washer-trigger.yaml', '--vary', 'allowable_stress=600:700:100', '--units', 'us'))[0]).toBe('allowable_stress (kpsi)');
    expect(await firstColumn('examples/washer-trigger.yaml', '--vary', 'temperature=20:40:20', '--units', 'us')).toEqual(['temperature (degF)', '68', '104']);
  });
});
