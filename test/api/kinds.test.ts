// source: none needed; nothing here is checked against a value from outside the project.
// frontier and sweep in the library for every spring kind (issue 7): the document's `kind` picks the
// kind through the registry, and the result is exactly what the command prints with --json. Our own
// demo scenarios only (the pedal-bin return spring is invented for the demo).
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { frontier, InputError, sweep } from '../../src/index.js';
import { cli } from '../helpers.js';

const read = (path: string): Record<string, unknown> => parse(readFileSync(path, 'utf8'));
const pedalBin = 'examples/extension-pedal-bin.yaml';

async function sameAsCli(value: unknown, ...args: string[]): Promise<void> {
  const r = await cli(...args, '--json');
  expect(r.code).toBe(0);
  expect(JSON.stringify(value, null, 2) + '\n').toBe(r.stdout);
}

/** The InputError f throws (the test fails if it throws none, or another error). */
function refusal(f: () => unknown): InputError {
  const e = (() => {
    try {
      f();
      return null;
    } catch (err) {
      return err;
    }
  })();
  expect(e).toBeInstanceOf(InputError);
  return e as InputError;
}

describe('frontier and sweep of extension springs from the library', () => {
  it('frontier: the same record as `frontier --json`, on the default and on chosen axes', async () => {
    const fr = frontier(read(pedalBin));
    await sameAsCli(fr, 'frontier', pedalBin);
    expect(fr.kind).toBe('extension');
    expect(fr.frontier_strategy).toBe('grid');
    expect(fr.frontier.length).toBeGreaterThan(1);
    expect(fr.cautions.at(-1)).toMatch(/draw-bar/);
    const safe = frontier(read(pedalBin), { x: 'safety_factor', y: 'mass' });
    await sameAsCli(safe, 'frontier', pedalBin, '--x', 'safety_factor', '--y', 'mass');
    // Along the front on (safety factor, mass), both minimised as stored: the factor read as itself
    // falls as the mass falls.
    const pts = safe.frontier.map((c) => [c.safety_factor as number, c.mass]);
    for (let i = 1; i < pts.length; i++) expect(pts[i][1]).toBeLessThanOrEqual(pts[i - 1][1]);
  });

  it('sweep: the same record as `sweep --json`, "none" where nothing fits', async () => {
    const s = sweep(read(pedalBin), { vary: 'envelope.max_outer_diameter=8:14:2' });
    await sameAsCli(s, 'sweep', pedalBin, '--vary', 'envelope.max_outer_diameter=8:14:2');
    expect(s.rows[0].best).toBeNull();
    expect(s.rows[0].limiting_check).toMatch(/^[a-z_]+: /);
    expect(s.rows[3].best?.mass).toBeGreaterThan(0);
    expect(sweep(read(pedalBin), { vary: { path: 'envelope.max_outer_diameter', values: [8, 10, 12, 14] } })).toStrictEqual(s);
  });

  it('an axis the kind does not have is refused naming the option and the axes it has', () => {
    const e = refusal(() => frontier(read(pedalBin), { x: 'static_safety' }));
    expect(e.field).toBe('options.x');
    expect(e.expected).toMatch(/helical extension springs: mass \| .*safety_factor/);
    expect(refusal(() => sweep(read(pedalBin), { vary: 'bend_index=0:1:0.5' })).field).toBe('options.vary bend_index=0');
  });
});
