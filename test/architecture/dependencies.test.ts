// No outside values here: coilfront's own layering (issue 7, "Dependency direction"). Imports point
// downwards only, and no file or folder of src/ imports itself back through others.
//
// Layers: see ./layers.ts (a unit may import its own layer or any lower one).
// The debts below would list the edges that break this, each with the way out; the test fails on any
// new one, and on a listed one that has been paid (delete its line then), so the lists only shrink.
// They are empty: the last of issue 7's were paid by moves into the kinds and below them.
import { describe, expect, it } from 'vitest';
import { cycles, importGraph, sourceFiles, unitGraph, unitOf } from './imports.js';
import { LAYER } from './layers.js';

function layerOf(unit: string): number {
  const top = unit.split('/')[0];
  if (!(top in LAYER)) throw new Error(`src/${unit} has no layer: add it to LAYER in test/architecture/layers.ts`);
  return LAYER[top];
}

/** Upward imports that exist today, unit -> unit, and the way out of each. */
const UPWARD_DEBTS: Record<string, string> = {};

/** Imports from one kind into another that exist today, and the way out. */
const ACROSS_DEBTS: Record<string, string> = {};

/** File cycles that exist today (sorted members joined by ' | '), and the way out of each. */
const CYCLE_DEBTS: Record<string, string> = {};

const graph = importGraph(sourceFiles());
const units = unitGraph(graph);

describe('dependency direction', () => {
  it('every folder of src/ has a layer', () => {
    for (const u of units.keys()) expect(() => layerOf(u)).not.toThrow();
  });

  it('no file of src/ imports itself back through others (beyond the listed debts)', () => {
    const found = cycles(graph).map((c) => c.join(' | '));
    expect(
      found.filter((c) => !(c in CYCLE_DEBTS)),
      'new import cycles between files',
    ).toEqual([]);
    expect(
      Object.keys(CYCLE_DEBTS).filter((c) => !found.includes(c)),
      'paid cycle debts: delete their lines',
    ).toEqual([]);
  });

  it('layers import downwards only (beyond the listed debts)', () => {
    const upward: string[] = [];
    for (const [from, edges] of units) {
      for (const to of edges.keys()) if (layerOf(to) > layerOf(from)) upward.push(`${from} -> ${to}`);
    }
    const fresh = upward.filter((e) => !(e in UPWARD_DEBTS)).map((e) => `${e} (${units.get(e.split(' -> ')[0])!.get(e.split(' -> ')[1])![0]})`);
    expect(fresh, 'new upward imports').toEqual([]);
    expect(
      Object.keys(UPWARD_DEBTS).filter((e) => !upward.includes(e)),
      'paid upward debts: delete their lines',
    ).toEqual([]);
  });

  it('no folder imports itself back through others, once the listed debts are set aside', () => {
    // src/kinds/index.ts, the registry, is the one file that names every kind (kinds -> kinds/<kind>);
    // each kind implements src/kinds/kind.ts (kinds/<kind> -> kinds). That pair is the seam, not a cycle.
    const debts = new Set([...Object.keys(UPWARD_DEBTS), ...Object.keys(ACROSS_DEBTS)]);
    const simple = new Map(
      [...units].map(([u, edges]) => [u, [...edges.keys()].filter((t) => !debts.has(`${u} -> ${t}`) && !(u === 'kinds' && t.startsWith('kinds/')))]),
    );
    expect(cycles(simple)).toEqual([]);
  });

  it('one kind never imports another: shared code lives below the kinds', () => {
    const across: string[] = [];
    for (const [from, edges] of units) {
      if (!from.startsWith('kinds/')) continue;
      for (const [to] of edges) if (to.startsWith('kinds/') && to !== from) across.push(`${from} -> ${to}`);
    }
    expect(
      across.filter((e) => !(e in ACROSS_DEBTS)).map((e) => `${e} (${units.get(e.split(' -> ')[0])!.get(e.split(' -> ')[1])![0]})`),
      'new imports across kinds',
    ).toEqual([]);
    expect(
      Object.keys(ACROSS_DEBTS).filter((e) => !across.includes(e)),
      'paid debts: delete their lines',
    ).toEqual([]);
  });

  it('the search engine knows nothing of springs, catalogs or input', () => {
    const edges = [...(units.get('search') ?? new Map()).keys()];
    expect(edges.filter((u) => u !== 'units')).toEqual([]);
  });

  it('the reader sees its own folder as one unit', () => {
    // A check of the checker: the unit of a kind's file is its kind.
    expect(unitOf('src/kinds/compression/problem.ts')).toBe('kinds/compression');
    expect(unitOf('src/kinds/kind.ts')).toBe('kinds');
    expect(unitOf('src/search/grid.ts')).toBe('search');
  });
});
