// source: none needed; nothing here is checked against a value from outside the project.
// The spring-kind interface (src/kinds/kind.ts) as the commands and the API use it: every kind offers
// frontier, search and its JSON frame, its objective vector follows the registry, and the commands and
// the library dispatch through the registry instead of naming a kind (issue 7).
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { DEFAULT_KIND, KINDS, kindOf } from '../../src/kinds/index.js';
import { frontierAxes, objectiveValue, type KindCandidate } from '../../src/kinds/kind.js';
import { Objective } from '../../src/kinds/compression/objectives.js';
import { XO } from '../../src/kinds/extension/problem.js';
import { parse } from 'yaml';

const demos: Record<string, string> = { compression: 'examples/washer-trigger.yaml', extension: 'examples/extension-pedal-bin.yaml' };

/** Files of src/cli and src/api that still branch on a kind by name, and the way out of each (none:
 * check's outcome of either kind is rendered in src/check/, which sits above the kinds). */
const KIND_BRANCH_DEBTS: Record<string, string> = {};

describe('the spring-kind interface', () => {
  it('every kind stores objective i of its registry at f[1 + i], as objectiveValue reads it', () => {
    const compression = kindOf({});
    compression.objectives.forEach((o, i) => expect(Objective[o.key as keyof typeof Objective]).toBe(1 + i));
    const extension = kindOf({ kind: 'extension' });
    const slot: Record<string, number> = { ...XO, safety_factor: XO.neg_safety_factor };
    extension.objectives.forEach((o, i) => expect(slot[o.key]).toBe(1 + i));
    const f = Float64Array.from([0, 1, 2, 3, 4, -5, 6]);
    expect(objectiveValue(extension.objectives, { objectives: f }, 'safety_factor')).toBe(5);
    expect(objectiveValue(extension.objectives, { objectives: f }, 'relative_cost')).toBe(6);
  });

  it('every kind gives a frontier on each pair of its default axes, a search, and frames its JSON', () => {
    const catalog = loadCatalog();
    for (const kind of KINDS) {
      expect(frontierAxes(kind)).toEqual(expect.arrayContaining(['mass', 'outer_diameter']));
      const req = kind.readRequirements(parse(readFileSync(demos[kind.id], 'utf8')), catalog);
      const fr = kind.frontier(req, catalog, 'mass', 'outer_diameter');
      expect(fr.front.length, kind.id).toBeGreaterThan(1);
      // The front is in order of x with y falling: no spring on it dominates another.
      const xs = fr.front.map((c: KindCandidate) => objectiveValue(kind.objectives, c, 'mass'));
      const ys = fr.front.map((c: KindCandidate) => objectiveValue(kind.objectives, c, 'outer_diameter'));
      for (let i = 1; i < xs.length; i++) {
        expect(xs[i]).toBeGreaterThanOrEqual(xs[i - 1]);
        expect(ys[i]).toBeLessThan(ys[i - 1]);
      }
      // The search finds the design's best spring.
      const run = kind.search(req, catalog);
      expect(objectiveValue(kind.objectives, run.candidates[0], 'mass')).toBe(xs[0]);
      expect(kind.searchSize(req, catalog)).toBeGreaterThanOrEqual(run.result.cells);
      // A document of the default kind need not say its kind; every other kind's records say it.
      expect(kind.report.jsonFrame.head).toEqual(kind.id === DEFAULT_KIND ? {} : { kind: kind.id });
    }
  });

  it('src/cli and src/api name no spring kind: they dispatch through the registry', () => {
    const branches: string[] = [];
    for (const dir of ['src/cli', 'src/api']) {
      for (const name of readdirSync(dir).filter((f) => f.endsWith('.ts'))) {
        const path = join(dir, name);
        const text = readFileSync(path, 'utf8');
        if (/['"]extension['"]|kinds\/extension\//.test(text)) branches.push(path);
      }
    }
    expect(branches.filter((p) => !(p in KIND_BRANCH_DEBTS))).toEqual([]);
    expect(
      Object.keys(KIND_BRANCH_DEBTS).filter((p) => !branches.includes(p)),
      'paid debts: delete their lines',
    ).toEqual([]);
  });
});
