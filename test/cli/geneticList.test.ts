// source: none needed (the listed springs are compared with each other).
// The genetic strategy lists each spring once (audit finding 6: washer trigger --seed 7 listed rows 1
// and 2 identical, 3 and 4 too; the pedal bin's #2 and #3). A cell solved by both the coarse generations
// and the fine hill-climb entered the list twice.
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

async function candidates(...args: string[]): Promise<Record<string, unknown>[]> {
  const r = await cli('design', ...args, '--strategy', 'genetic', '--json');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout).candidates;
}

// A spring is named by what a maker would be asked for: material, wire, coils, ends or loop, diameter.
const identity = (c: Record<string, unknown>) =>
  JSON.stringify([c.material, c.wire_diameter, c.mean_diameter, c.active_coils ?? null, c.body_coils ?? null, c.ends ?? null, c.loop ?? null]);

describe('the genetic list names each spring once', () => {
  it.each([
    ['examples/washer-trigger.yaml', '7'],
    ['examples/washer-trigger.yaml', '1'],
    ['examples/extension-pedal-bin.yaml', '1'],
    ['examples/extension-pedal-bin.yaml', '7'],
  ])('%s, seed %s', async (file, seed) => {
    const list = await candidates(file, '--seed', seed);
    expect(list.length).toBeGreaterThan(1);
    const ids = list.map(identity);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
