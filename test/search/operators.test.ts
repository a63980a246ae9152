// The genetic operators shared by the single- and two-objective searches: properties of our own
// engine (no outside values), on the Sandgren problem's variables (bench/problems/sandgren.ts).
import fc from 'fast-check';
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { sandgrenProblem } from '../../bench/problems/sandgren.js';
import { cellKey, decode, encoding, mutate, randomGenes, tournament } from '../../src/search/operators.js';
import { valueAt } from '../../src/search/problem.js';

describe('genetic operators', () => {
  const p = sandgrenProblem();
  const e = encoding(p);

  it('the encoding has one integer gene per list or range variable and none for the solved one', () => {
    expect(e.discrete).toBe(true);
    expect(e.s).toBeGreaterThanOrEqual(0);
    expect(e.sizes[e.s]).toBe(1);
    e.sizes.forEach((k, i) => {
      if (i !== e.s) expect(k).toBeGreaterThan(1);
    });
  });

  it("random genes and mutated genes stay inside every gene's range, and decode to the variables' own values (property)", () => {
    fc.assert(
      fc.property(fc.integer(), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (seed, rate, reset) => {
        const rng = seedrandom(String(seed));
        const g = randomGenes(e, rng);
        mutate(e, g, rate, reset, rng);
        const x = new Float64Array(e.n);
        decode(e, g, x);
        for (let i = 0; i < e.n; i++) {
          if (i === e.s) continue;
          expect(Number.isInteger(g[i]) && g[i] >= 0 && g[i] < e.sizes[i]).toBe(true);
          expect(x[i]).toBe(valueAt(p.variables[i], g[i]));
        }
      }),
      { numRuns: 300 },
    );
  });

  it('the cell key names each combination of integer genes once (property)', () => {
    fc.assert(
      fc.property(fc.integer(), fc.integer(), (s1, s2) => {
        const a = randomGenes(e, seedrandom(String(s1)));
        const b = randomGenes(e, seedrandom(String(s2)));
        const same = a.every((v, i) => i === e.s || v === b[i]);
        expect(cellKey(e, a) === cellKey(e, b)).toBe(same);
      }),
      { numRuns: 300 },
    );
  });

  it('the same seed draws the same genes and mutations', () => {
    const one = () => {
      const r = seedrandom('42');
      const g = randomGenes(e, r);
      mutate(e, g, 0.5, 0.15, r);
      return Array.from(g);
    };
    expect(one()).toEqual(one());
  });

  it('a binary tournament returns the better of the two it draws, so the best member of a pair always wins', () => {
    const rng = seedrandom('t');
    const pop = [5, 3];
    let wins = 0;
    for (let i = 0; i < 200; i++) if (tournament(pop, (a, b) => a < b, rng) === 3) wins++;
    // The worse member wins only when it is drawn twice: about a quarter of the time.
    expect(wins).toBeGreaterThan(120);
    expect(wins).toBeLessThan(190);
  });
});
