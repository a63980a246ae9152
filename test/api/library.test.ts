// No outside values here: each check is a property of our own behaviour on our own demo scenarios.
// The library API (src/index.ts): every function takes the plain object an input file holds and returns
// exactly what the command prints with --json; bad input throws an InputError naming the field and what
// was expected. (test/api/package.test.ts runs the same from the packed tarball.)
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { analyze, check, design, frontier, InputError, stock, sweep } from '../../src/index.js';
import { cli } from '../helpers.js';

const read = (path: string): Record<string, unknown> => parse(readFileSync(path, 'utf8'));
const demo = 'examples/washer-trigger.yaml';
const valve = 'examples/valve-return-spring.yaml';
const printed = (value: unknown) => JSON.stringify(value, null, 2) + '\n';

async function sameAsCli(value: unknown, ...args: string[]): Promise<void> {
  const r = await cli(...args, '--json');
  expect(printed(value)).toBe(r.stdout);
  expect(value).toStrictEqual(JSON.parse(r.stdout));
}

function thrown(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error('expected an InputError');
}

describe('the library returns what the command prints with --json', () => {
  it('design, with and without options', async () => {
    await sameAsCli(design(read(demo)), 'design', demo);
    await sameAsCli(
      design(read(demo), { top: 3, rank: 'outer_diameter', perWire: true }),
      'design',
      demo,
      '--top',
      '3',
      '--rank',
      'outer_diameter',
      '--per-wire',
    );
  });

  it('analyze', async () => {
    await sameAsCli(analyze(read(valve)), 'analyze', valve);
  });

  it('frontier on two chosen axes', async () => {
    await sameAsCli(frontier(read(demo), { x: 'relative_cost', y: 'free_length' }), 'frontier', demo, '--x', 'relative_cost', '--y', 'free_length');
  });

  it('sweep, its range as --vary writes it or as a path and a list of values', async () => {
    const byText = sweep(read(demo), { vary: 'envelope.max_outer_diameter=12:16:2' });
    await sameAsCli(byText, 'sweep', demo, '--vary', 'envelope.max_outer_diameter=12:16:2');
    expect(sweep(read(demo), { vary: { path: 'envelope.max_outer_diameter', values: [12, 14, 16] } })).toStrictEqual(byText);
  });

  it('check and stock', async () => {
    const dispenser = 'examples/stock-dispenser.yaml';
    await sameAsCli(check(read(valve), read(demo)), 'check', valve, demo);
    await sameAsCli(
      stock(read(dispenser), readFileSync('examples/stock-springs.csv', 'utf8'), { label: 'examples/stock-springs.csv' }),
      'stock',
      dispenser,
      'examples/stock-springs.csv',
    );
  });
});

describe('documents as plain objects', () => {
  it('reads quantities written with their units as the file would', () => {
    const doc = read(demo);
    const withUnits = {
      ...doc,
      load: { force: '20 N', length: '3.5 cm' },
      operating_length: '25 mm',
      envelope: { max_outer_diameter: '16 mm', min_inner_diameter: '6.5 mm', max_free_length: '0.06 m' },
    };
    expect(design(withUnits, { top: 2 })).toStrictEqual(design(doc, { top: 2 }));
  });

  it("never changes the caller's object", () => {
    const doc = read(demo);
    const before = structuredClone(doc);
    design(doc, { top: 1, rank: 'free_length', seed: 7 });
    sweep(doc, { vary: 'envelope.max_outer_diameter=14:14:1' });
    expect(doc).toStrictEqual(before);
  });
});

describe('bad input throws an InputError with the field and what was expected', () => {
  it('a bad value in the document names its path', () => {
    const e = thrown(() => design({ ...read(demo), load: { force: 'twenty', length: 35 } }));
    expect(e.field).toBe('load.force');
    expect(e.expected).toMatch(/force/);
    expect(thrown(() => analyze({ ...read(valve), wire_diameter: -1 })).field).toBe('wire_diameter');
    expect(thrown(() => design('not a document')).expected).toBeTruthy();
  });

  it('a bad option names the option', () => {
    expect(thrown(() => design(read(demo), { top: -3 })).field).toBe('options.top');
    expect(thrown(() => design(read(demo), { rank: 'cheapest' as never })).field).toBe('options.rank');
    expect(thrown(() => frontier(read(demo), { x: 'mass', y: 'mass' })).field).toBe('options.y');
    expect(thrown(() => frontier(read(demo), { x: 'weight' as never })).field).toBe('options.x');
    expect(thrown(() => sweep(read(demo), { vary: 'envelope.max_outer_diameter=16:12:1' })).field).toBe('options.vary');
    expect(thrown(() => sweep(read(demo), { vary: { path: 'envelope.max_outer_diameter', values: [] } })).field).toBe('options.vary.values');
    expect(thrown(() => sweep(read(demo), { vary: 'envelope.max_outer_diameter=-2:2:2' })).field).toMatch(/^options\.vary envelope\.max_outer_diameter=-2$/);
  });
});

// A sweep bounds each value's search as one design bounds it, not the sum over its values: many small
// values run, a value past one grid's size runs the genetic search under the automatic choice (as
// design does) and is refused, naming the value and the setting, where a grid is forced; the whole
// sweep's combinations are reported.
/** The demo over every material and end type at coil_step 0.01: about 2 million combinations a value. */
const everything = (): Record<string, unknown> => ({
  ...read(demo),
  material: 'any',
  ends: ['plain', 'squared', 'squared-ground', 'plain-ground'],
  coil_step: 0.01,
});

describe('the work bound of a sweep', () => {
  it('is per value: twenty values of 89,133 combinations each (1.78 million in all, past the old whole-sweep cap of one million) run, and the total is reported', () => {
    const values = Array.from({ length: 20 }, (_, i) => 15 + i * 0.05);
    const s = sweep({ ...read(demo), coil_step: 0.01 }, { vary: { path: 'envelope.max_outer_diameter', values } });
    expect(s.rows).toHaveLength(20);
    // 33 metric wire sizes of stainless 302 in its strength range x 1 end type x 2701 coil counts.
    expect(s.combinations.largest_value).toBe(33 * 2701);
    expect(s.combinations.total).toBe(20 * 33 * 2701);
    expect(s.rows.every((r) => r.best !== null)).toBe(true);
  });

  it('a value past one grid search runs the genetic search under the automatic choice, as design does, and finds what design finds', () => {
    const s = sweep({ ...everything(), best_per_wire: false }, { vary: { path: 'envelope.max_outer_diameter', values: [16] } });
    const d = design({ ...everything(), best_per_wire: false, envelope: { ...(read(demo).envelope as object), max_outer_diameter: 16 } });
    expect(s.rows[0].best).not.toBeNull();
    expect((s.rows[0].best as { mass: number }).mass).toBe((d.candidates as { mass: number }[])[0].mass);
    expect(s.combinations.largest_value).toBeGreaterThan(2_000_000);
  });

  it('a value past one grid search where a grid is forced is refused before any search, naming the value and the setting, offering the genetic search', () => {
    const e = thrown(() => sweep(everything(), { vary: 'envelope.max_outer_diameter=14:16:1', strategy: 'grid' }));
    expect(e.field).toBe('options.vary envelope.max_outer_diameter=14');
    expect(e.message).toContain('coil_step');
    expect(e.message).toContain('2,000,000 combinations');
    expect(e.message).toMatch(/--strategy (auto|genetic)/);
  });
});

describe('a compression sweep under min_yield', () => {
  it("confirms each value's best spring by the seeded Monte Carlo as design does: the same spring and yield as design's first, and says so", async () => {
    const doc: Record<string, unknown> = { ...read(demo), min_yield: 0.95 };
    const s = sweep(doc, { vary: { path: 'envelope.max_outer_diameter', values: [15, 16] } });
    expect(s.confirmation).toMatch(/seeded Monte Carlo/);
    for (const row of s.rows) {
      const d = design({ ...doc, envelope: { ...(doc.envelope as object), max_outer_diameter: row.value } });
      const first = (d.candidates as Record<string, unknown>[])[0];
      expect(row.best).not.toBeNull();
      for (const key of ['mass', 'wire_diameter', 'active_coils', 'yield', 'yield_samples', 'yield_standard_error', 'yield_estimate'])
        expect((row.best as Record<string, unknown>)[key]).toBe(first[key]);
    }
    const text = await cli('sweep', demo, '--set', 'min_yield=0.95', '--vary', 'envelope.max_outer_diameter=15:16:1');
    expect(text.stdout.split('\n')[0]).toContain(',yield,yield_standard_error,yield_estimate,yield_limited_by,');
    expect(text.stderr).toContain('seeded Monte Carlo');
  });

  it("where the Monte Carlo refuses the search's best spring (min_yield 0.9, an 18 mm bore), the row gives way to the next, design's first", () => {
    const doc: Record<string, unknown> = { ...read(demo), min_yield: 0.9 };
    const row = sweep(doc, { vary: { path: 'envelope.max_outer_diameter', values: [18] } }).rows[0];
    const d = design({ ...doc, envelope: { ...(doc.envelope as object), max_outer_diameter: 18 } });
    const refused = d.refused_by_monte_carlo as Record<string, unknown>[];
    expect(refused.length).toBeGreaterThan(0);
    const best = row.best as Record<string, unknown>;
    expect(best.mean_diameter).toBe((d.candidates as Record<string, unknown>[])[0].mean_diameter);
    expect(best.yield).toBe((d.candidates as Record<string, unknown>[])[0].yield);
    expect(refused.map((r) => r.mean_diameter)).not.toContain(best.mean_diameter);
  });

  it('without min_yield nothing is confirmed: no yield columns, no note', async () => {
    const text = await cli('sweep', demo, '--vary', 'envelope.max_outer_diameter=15:16:1');
    expect(text.stdout).not.toContain('yield');
    expect(sweep(read(demo), { vary: 'envelope.max_outer_diameter=15:16:1' }).confirmation).toBeUndefined();
  });
});
