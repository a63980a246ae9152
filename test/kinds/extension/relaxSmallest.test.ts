// source: none needed; nothing here is checked against a value from outside the project.
// The advice of an infeasible extension design (review findings): the change it gives is the smallest
// at the resolution it is printed in (one step less admits nothing), every change it gives admits a
// spring when run through the design, the limiting check it names is one the nearest misses fail, and
// the changes it tries are the ones the checks registry names (relaxedBy in checks.ts). Our own demo
// scenario (the pedal-bin return spring, invented) in a bore too narrow for it.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { withValue } from '../../../src/input/overrides.js';
import { EXTENSION_CHECKS, EXTENSION_RELAXED_BY, extensionEasedBy } from '../../../src/kinds/extension/checks.js';
import { extension } from '../../../src/kinds/extension/index.js';
import { EXTENSION_RELAX_NAMES, extensionLimitingChecks } from '../../../src/kinds/extension/relax.js';
import { extensionAdviceFor } from '../../../src/kinds/extension/report.js';

const catalog = loadCatalog();
const demo = parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8')) as Record<string, unknown>;
// The demo in an 8 mm bore: no spring fits; a 8.95 mm one already admits one (found by hand).
const narrow = withValue(demo, ['envelope', 'max_outer_diameter'], 8);

/** Whether the requirements admit a spring: the search alone (no advice of its own). */
const found = (doc: unknown) => extension.search(extension.readRequirements(doc, catalog), catalog).candidates.length > 0;

describe('extension advice in a bore too narrow', { timeout: 180_000 }, () => {
  const run = extension.design(extension.readRequirements(narrow, catalog), catalog, { document: narrow });
  const advice = extensionAdviceFor(run);
  const json = extension.report.designJson(run, false) as {
    candidates: unknown[];
    infeasible: { limiting_check: string; nearest_misses: { failing_checks: Record<string, number> }[] };
  };

  it('is infeasible as given, and 8.95 mm admits a spring (the scenario holds)', () => {
    expect(json.candidates).toEqual([]);
    expect(found(withValue(narrow, ['envelope', 'max_outer_diameter'], 8.95))).toBe(true);
  });

  it('gives the smallest bore at the printed resolution: the advised value admits, 0.001 mm less does not', () => {
    const od = advice.changes.find((c) => c.path === 'envelope.max_outer_diameter')!;
    expect(od).toBeDefined();
    expect(typeof od.to).toBe('number');
    const to = od.to as number;
    expect(to).toBeLessThanOrEqual(8.95);
    expect(to).toBeGreaterThan(8);
    expect(od.set).toBe(`envelope.max_outer_diameter=${to}`);
    expect(found(withValue(narrow, ['envelope', 'max_outer_diameter'], to))).toBe(true);
    expect(found(withValue(narrow, ['envelope', 'max_outer_diameter'], Number((to - 0.001).toFixed(3))))).toBe(false);
    // The text prints that value, not a rounder one.
    expect(extension.report.designText(run, 'si', false)).toContain(`to ${to.toFixed(3)} mm [--set envelope.max_outer_diameter=${to}]`);
  });

  it('every change it gives admits a spring when run through the design', () => {
    expect(advice.changes.length).toBeGreaterThan(0);
    for (const c of advice.changes) {
      const value = typeof c.to === 'string' && c.to.startsWith('[') ? JSON.parse(c.to) : c.to;
      expect(found(withValue(narrow, c.path.split('.'), value)), c.set).toBe(true);
    }
  });

  it('names as limiting a check the nearest misses fail, never one none of them fails', () => {
    const failed = new Set(json.infeasible.nearest_misses.flatMap((m) => Object.keys(m.failing_checks)));
    const limiting = json.infeasible.limiting_check.split(':')[0];
    expect(failed.has(limiting)).toBe(true);
    expect(limiting).not.toBe('initial_tension_min');
    // The one every nearest miss fails comes first.
    const everyMiss = [...failed].filter((c) => json.infeasible.nearest_misses.every((m) => c in m.failing_checks));
    if (everyMiss.length) expect(everyMiss).toContain(limiting);
    expect(extensionLimitingChecks(run)).toEqual(expect.arrayContaining([...failed]));
  });

  it('tries only the changes the checks registry names for the checks that cut, and says which each eases', () => {
    const cut = extensionLimitingChecks(run);
    for (const c of advice.changes) {
      expect(c.eases.length).toBeGreaterThan(0);
      for (const e of c.eases) {
        expect(cut).toContain(e);
        expect(EXTENSION_RELAXED_BY[e]).toContain(c.name);
      }
    }
  });
});

describe('the extension checks registry and the advice name the same changes', () => {
  it('every relaxedBy entry is a change the advice can try, and every change it can try eases some check', () => {
    for (const c of EXTENSION_CHECKS) for (const name of EXTENSION_RELAXED_BY[c]) expect(EXTENSION_RELAX_NAMES, `${c}: ${name}`).toContain(name);
    for (const name of EXTENSION_RELAX_NAMES) expect(extensionEasedBy(name).length, name).toBeGreaterThan(0);
    // The kind's registry (what the library exposes) reads the same entries.
    for (const d of extension.checks) expect(d.relaxedBy).toBe(EXTENSION_RELAXED_BY[d.name as keyof typeof EXTENSION_RELAXED_BY]);
  });
});
