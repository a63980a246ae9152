// source: none needed; nothing here is checked against a value from outside the project.
// The advice of an infeasible extension design when no single change admits a spring: the best pair,
// after compression's relax.ts (issue 8 leftover). Our own demo scenario (the pedal-bin return spring,
// invented for the demo) squeezed into a bore and a length it cannot meet one at a time.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { withValue } from '../../../src/input/overrides.js';
import { extension } from '../../../src/kinds/extension/index.js';

const demo = parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8')) as Record<string, unknown>;
const squeezed = { ...demo, envelope: { max_outer_diameter: 4, max_free_length: 20, max_extended_length: 85 } };

type Advice = { path: string; to: number; set: string; suggestion: string };
const catalog = loadCatalog();
/** Whether the requirements admit a spring: the search alone (no advice of its own). */
const found = (doc: unknown) => extension.search(extension.readRequirements(doc, catalog), catalog).candidates.length > 0;

describe('extension advice: the best pair when no single change works', () => {
  it('gives two changes that admit a spring together, neither alone, each one run, written as --set takes it, in JSON and text', { timeout: 120_000 }, () => {
    // One run and its advice (worked out once per run), read by the JSON and the text alike.
    const run = extension.design(extension.readRequirements(squeezed, catalog), catalog, { document: squeezed });
    const r = extension.report.designJson(run, false) as {
      candidates: unknown[];
      infeasible: { relax: Advice[]; relax_pair: Advice[] | null; relax_runs: number };
    };
    expect(r.candidates).toEqual([]);
    expect(r.infeasible.relax).toEqual([]);
    const pair = r.infeasible.relax_pair!;
    expect(pair.map((c) => c.path).sort()).toEqual(['envelope.max_free_length', 'envelope.max_outer_diameter']);
    for (const c of pair) expect(c.set).toBe(`${c.path}=${c.to}`);
    const apply = (doc: unknown, c: Advice) => withValue(doc, c.path.split('.'), c.to);
    expect(found(apply(apply(squeezed, pair[0]), pair[1]))).toBe(true);
    expect(found(apply(squeezed, pair[0]))).toBe(false);
    expect(found(apply(squeezed, pair[1]))).toBe(false);
    // Both limits move by one common share of the way to their loosest, bisected: 90% of the advised
    // move (both limits back towards the requirement) admits no spring.
    const start: Record<string, number> = { 'envelope.max_outer_diameter': 4, 'envelope.max_free_length': 20 };
    const back = pair.map((c) => ({ ...c, to: start[c.path] + 0.9 * (c.to - start[c.path]) }));
    expect(found(apply(apply(squeezed, back[0]), back[1]))).toBe(false);
    expect(r.infeasible.relax_runs).toBeLessThanOrEqual(80);
    const text = extension.report.designText(run, 'si', false);
    expect(text).toMatch(/No single change of a limit or setting admits a spring; these two together do/);
    for (const c of pair) expect(text).toContain(`[--set ${c.set}]`);
  });
});
