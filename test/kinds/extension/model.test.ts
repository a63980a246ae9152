// The extension spring's own pieces: the load line from the initial tension, the loops' length and wire,
// the catalog's validation and the spring file's messages. Property checks unless a source is named.
import fc from 'fast-check';
import { parse } from 'yaml';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CatalogError, loadCatalog } from '../../../src/catalogs/load.js';
import { alternatingStrengthFrom, fullyReversedEndurance, type FatigueCriterion } from '../../../src/model/fatigue.js';
import { wireVolume } from '../../../src/kinds/compression/geometry.js';
import { massOfVolume } from '../../../src/model/mass.js';
import { analyzeExtension } from '../../../src/kinds/extension/analysis.js';
import { loadExtensionCatalog, parseExtensionCatalog } from '../../../src/kinds/extension/catalog.js';
import { offsetAlternatingStrength } from '../../../src/kinds/extension/fatigue.js';
import { readExtensionSpring } from '../../../src/kinds/extension/springFile.js';
import { InputError } from '../../../src/units/parse.js';
import { relClose } from '../../helpers.js';

const catalog = loadCatalog();
const analyze = (doc: Record<string, unknown>) => {
  const c = readExtensionSpring(doc, catalog);
  return analyzeExtension(c.geometry, c.material, c.service);
};
const spring = { kind: 'extension', material: 'music-wire', wire_diameter: 1, mean_diameter: 8, body_coils: 12, initial_tension: 6 };

describe('load line from the initial-tension stress', () => {
  it("is the shared model's load line through the origin when there is no initial stress", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 600, max: 1500, noNaN: true }),
        fc.constantFrom<FatigueCriterion>('gerber', 'goodman', 'sines'),
        (r, ssu, criterion) => {
          const point = { alternating: 241, mean: 379 };
          const sse = fullyReversedEndurance(point, ssu, criterion);
          expect(
            relClose(offsetAlternatingStrength(r, 0, sse, point.alternating, ssu, criterion), alternatingStrengthFrom(r, point, ssu, sse, criterion), 1e-12),
          ).toBe(true);
        },
      ),
      { numRuns: 200, seed: 1 },
    );
  });

  it('meets the criterion curve where it says (the Goodman line and the Gerber parabola)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 1, noNaN: true }), fc.double({ min: 0, max: 300, noNaN: true }), (r, si) => {
        const ssu = 1000;
        const sse = 280;
        const good = offsetAlternatingStrength(r, si, sse, 241, ssu, 'goodman');
        expect(good / sse + (si + good / r) / ssu).toBeCloseTo(1, 12);
        const ger = offsetAlternatingStrength(r, si, sse, 241, ssu, 'gerber');
        expect(ger / sse + ((si + ger / r) / ssu) ** 2).toBeCloseTo(1, 12);
        expect(ger).toBeGreaterThanOrEqual(good);
      }),
      { numRuns: 200, seed: 2 },
    );
  });

  it('a longer life is never easier, at the body or at either loop', () => {
    const lives = [1e4, 3e4, 1e5, 3e5, 1e6, 3e6, 9.9e6, 1e7, 'infinite'];
    for (const material of ['music-wire', 'hard-drawn', 'stainless-302', 'phosphor-bronze', 'chrome-silicon']) {
      const d = material === 'stainless-302' || material === 'phosphor-bronze' ? 1 : 1.6;
      let prev = { loopBending: Infinity, loopTorsion: Infinity };
      for (const cycles of lives) {
        const a = analyze({ ...spring, material, wire_diameter: d, mean_diameter: 8 * d, lengths: [30 * d, 34 * d], cycles });
        const f = a.fatigue!;
        expect(f.loopBending.safetyFactor).toBeLessThanOrEqual(prev.loopBending * (1 + 1e-12));
        expect(f.loopTorsion.safetyFactor).toBeLessThanOrEqual(prev.loopTorsion * (1 + 1e-12));
        prev = { loopBending: f.loopBending.safetyFactor, loopTorsion: f.loopTorsion.safetyFactor };
      }
    }
  });
});

describe('loops: length and wire', () => {
  it('full loops: L0 = (2C - 1 + Nb) d (Shigley eq. 10-39) and the mass of the body coils plus one coil per loop (common practice)', () => {
    const a = analyze(spring);
    expect(a.geometry.freeLength).toBeCloseTo((2 * 8 - 1 + 12) * 1, 12);
    const rho = a.material.figures.density;
    expect(relClose(a.geometry.mass, massOfVolume(wireVolume(1, 8, 12 + 2), rho), 1e-12)).toBe(true);
  });

  it('an explicit loop_length sets the free length, and its reach beyond a full loop counts as straight wire', () => {
    const a = analyze({ ...spring, loop_length: 12 });
    expect(a.geometry.freeLength).toBeCloseTo(13 + 24, 12);
    const full = analyze(spring);
    expect(a.geometry.wireLength - full.geometry.wireLength).toBeCloseTo(2 * (12 - 7), 9);
  });

  it('half loops are shorter and lighter than full loops; extended loops need their length', () => {
    const half = analyze({ ...spring, loop: 'half' });
    const full = analyze(spring);
    expect(half.geometry.freeLength).toBeLessThan(full.geometry.freeLength);
    expect(half.geometry.mass).toBeLessThan(full.geometry.mass);
    expect(() => analyze({ ...spring, loop: 'extended' })).toThrow(/loop_length/);
    expect(analyze({ ...spring, loop: 'extended', loop_length: 20 }).geometry.freeLength).toBeCloseTo(53, 12);
  });

  it('the safe extension is where the first site reaches its allowable', () => {
    const a = analyze(spring);
    const b = analyze({ ...spring, lengths: [a.safeExtension.length] });
    expect(Math.min(b.staticSafety.body, b.staticSafety.loopBending, b.staticSafety.loopTorsion)).toBeCloseTo(1, 9);
  });
});

describe('spring file', () => {
  const bad: [Record<string, unknown>, string][] = [
    [{ ...spring, kind: 'compression' }, 'kind'],
    [{ ...spring, body_coils: undefined }, 'body_coils'],
    [{ ...spring, initial_tension: undefined }, 'initial_tension'],
    [{ ...spring, initial_tension: '-2 N' }, 'initial_tension'],
    [{ ...spring, initial_tension: '2 mm' }, 'initial_tension'],
    [{ ...spring, loop: 'spiral' }, 'loop'],
    [{ ...spring, loop_radius: 0.3 }, 'loop_radius'],
    [{ ...spring, bend_radius: 0.4 }, 'bend_radius'],
    [{ ...spring, free_length: 10 }, 'free_length'],
    [{ ...spring, free_length: 30, loop_length: 5 }, 'loop_length, free_length'],
    [{ ...spring, lengths: [20] }, 'lengths[0]'],
    [{ ...spring, forces: [3] }, 'forces[0]'],
    [{ ...spring, lengths: [30], forces: [9] }, 'lengths, forces'],
    [{ ...spring, coils: 3 }, 'coils'],
  ];
  for (const [doc, field] of bad) {
    it(`refuses a bad ${field} with one line naming it`, () => {
      try {
        readExtensionSpring(doc, catalog);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).field).toBe(field);
        expect((e as Error).message).not.toMatch(/\n|NaN|undefined|Infinity/);
      }
    });
  }

  it('assumes a bend index of 4 when bend_radius is missing, and says so', () => {
    const c = readExtensionSpring(spring, catalog);
    expect(c.geometry.bendRadius).toBe(2);
    expect(c.notes.join(' ')).toMatch(/bend_radius not given/);
  });
});

describe('catalogs/extension.yaml', () => {
  const doc = parse(readFileSync(new URL('../../../catalogs/extension.yaml', import.meta.url), 'utf8'));
  it('loads, every record sourced, every material family covered', () => {
    const ext = loadExtensionCatalog(catalog.materials);
    for (const a of ext.allowables) expect(a.source.length).toBeGreaterThan(20);
    for (const t of ext.loopTypes) expect(t.source.length).toBeGreaterThan(20);
    for (const m of catalog.materials) expect(ext.allowables.some((a) => a.families.includes(m.family))).toBe(true);
  });
  const broken: [string, (d: any) => void, RegExp][] = [
    [
      'a record without a source',
      (d) => {
        delete d.static_allowables[0].source;
      },
      /carbon-alloy-steels: static_allowables\[0\]\.source/,
    ],
    [
      'a family covered twice',
      (d) => {
        d.static_allowables[1].families.push('alloy-steel');
      },
      /families\[2\]/,
    ],
    [
      'a family not covered',
      (d) => {
        d.static_allowables[1].families = ['stainless'];
      },
      /missing copper-alloy/,
    ],
    [
      'a fraction that rises with the cycles',
      (d) => {
        d.loop_fatigue.loop_bending = [0.45, 0.47, 0.51];
      },
      /loop_fatigue\.loop_bending/,
    ],
    [
      'an unknown material in stated_for',
      (d) => {
        d.loop_fatigue.stated_for = ['unobtainium'];
      },
      /stated_for\[0\]/,
    ],
    [
      'an unknown field',
      (d) => {
        d.loop_types[0].height = 1;
      },
      /loop_types\[0\]\.height/,
    ],
  ];
  for (const [what, edit, message] of broken) {
    it(`refuses ${what}, naming the record and field`, () => {
      const d = structuredClone(doc);
      edit(d);
      expect(() => parseExtensionCatalog(d, catalog.materials)).toThrow(CatalogError);
      expect(() => parseExtensionCatalog(d, catalog.materials)).toThrow(message);
    });
  }
});
