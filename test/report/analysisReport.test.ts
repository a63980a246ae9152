// The analysis as users read it (text) and as programs read it (JSON): names and bases stated.
import { describe, expect, it } from 'vitest';
import { cli, inputFile } from '../helpers.js';

const spring = (extra: string) => inputFile(`units: si
material: music-wire
wire_diameter: 1.6
mean_diameter: 12
active_coils: 8
ends: squared-ground
free_length: 48
lengths: [40, 30]
${extra}`);

describe('analysis output: surge', () => {
  it('natural_frequency follows surge_ends, not the buckling seating, and both values are named', async () => {
    const fixedFree = JSON.parse((await cli('analyze', spring('seating: fixed-free\n'), '--json')).stdout);
    expect(fixedFree.surge_ends).toBe('plates');
    expect(fixedFree.natural_frequency).toBe(fixedFree.surge.both_ends_on_plates);
    expect(fixedFree.buckling.seating).toBe('fixed-free');
    const oneFree = JSON.parse((await cli('analyze', spring('surge_ends: one-free\n'), '--json')).stdout);
    expect(oneFree.surge_ends).toBe('one-free');
    expect(oneFree.natural_frequency).toBe(oneFree.surge.one_end_free);
    expect(oneFree.surge.one_end_free / oneFree.surge.both_ends_on_plates).toBeCloseTo(0.5, 12);
    const text = (await cli('analyze', spring('surge_ends: one-free\n'))).stdout;
    expect(text).toMatch(/natural frequency +[\d.]+ Hz \(one end free, surge_ends: one-free\)/);
    expect(text).toMatch(/Surge: [\d.]+ Hz with both ends on plates, [\d.]+ Hz with one end free; the surge check uses one end free/);
  });

  it('an unknown surge boundary is refused naming the field', async () => {
    const r = await cli('analyze', spring('surge_ends: floating\n'));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/surge_ends/);
  });
});
