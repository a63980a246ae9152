import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { materialFigures } from '../../src/input/material.js';
import { analyzeSpring } from '../../src/kinds/compression/analysis.js';
import {
  alternatingStrength,
  criterionLimit,
  endurancePoint,
  FATIGUE_CRITERIA,
  fatigueSafetyFactor,
  fullyReversedEndurance,
  lifeCurve,
  repeatedStressEquivalent,
  repeatedStressFraction,
  ZIMMERLI_PEENED,
  ZIMMERLI_UNPEENED,
} from '../../src/model/fatigue.js';
import { END_TYPES, inactiveCoils, solidLength } from '../../src/kinds/compression/geometry.js';

const KPSI = 6.894757293168361; // MPa per kpsi

describe('Zimmerli endurance data', () => {
  it('unpeened 241/379 MPa and peened 398/534 MPa, i.e. 35/55 and 57.5/77.5 kpsi (source: Zimmerli 1957, as in Shigley 9th ed., Sec. 10-9)', () => {
    expect(ZIMMERLI_UNPEENED.alternating / KPSI).toBeCloseTo(35, 0);
    expect(ZIMMERLI_UNPEENED.mean / KPSI).toBeCloseTo(55, 0);
    expect(Math.abs(ZIMMERLI_PEENED.alternating / KPSI - 57.5) / 57.5).toBeLessThan(0.005); // the source prints 398 MPa beside 57.5 kpsi
    expect(ZIMMERLI_PEENED.mean / KPSI).toBeCloseTo(77.5, 0);
  });
});

describe('fatigue criteria', () => {
  // Source: Budynas and Nisbett, Shigley 9th ed., Example 10-4 (from memory): tau_a = 29.7 kpsi,
  // tau_m = 39.6 kpsi, Ssu = 190.3 kpsi, Zimmerli unpeened; n_f = 1.21 Gerber, 1.18 Sines, 1.23 Goodman.
  const ta = 29.7 * KPSI;
  const tm = 39.6 * KPSI;
  const ssu = 190.3 * KPSI;
  const point = { alternating: 35 * KPSI, mean: 55 * KPSI };
  it('Gerber n_f = 1.21', () => expect(fatigueSafetyFactor(ta, tm, point, ssu, 'gerber')).toBeCloseTo(1.21, 2));
  it('Sines n_f = 1.18', () => expect(fatigueSafetyFactor(ta, tm, point, ssu, 'sines')).toBeCloseTo(1.18, 2));
  it('Goodman n_f = 1.23', () => expect(fatigueSafetyFactor(ta, tm, point, ssu, 'goodman')).toBeCloseTo(1.23, 2));
  it('Gerber Sse = 38.2 kpsi and Goodman Sse = 49.2 kpsi from the Zimmerli point (same example)', () => {
    expect(fullyReversedEndurance(point, ssu, 'gerber') / KPSI).toBeCloseTo(38.2, 1);
    expect(fullyReversedEndurance(point, ssu, 'goodman') / KPSI).toBeCloseTo(49.2, 1);
  });

  it('every criterion passes through the endurance point itself (property of the construction)', () => {
    const r = point.alternating / point.mean;
    for (const c of ['gerber', 'goodman', 'sines'] as const) expect(alternatingStrength(r, point, ssu, c)).toBeCloseTo(point.alternating, 6);
  });

  it('with no mean stress the limit is the fully reversed endurance (property)', () => {
    for (const c of ['gerber', 'goodman'] as const) expect(alternatingStrength(Infinity, point, ssu, c)).toBeCloseTo(fullyReversedEndurance(point, ssu, c), 9);
  });

  it('the criterion line the plots draw meets every load line at its alternating strength, passes through the endurance point and starts at Sse (property of the construction)', () => {
    for (const c of FATIGUE_CRITERIA) {
      const sse = fullyReversedEndurance(point, ssu, c);
      expect(criterionLimit(point.mean, point, ssu, sse, c)).toBeCloseTo(point.alternating, 9);
      expect(criterionLimit(0, point, ssu, sse, c)).toBe(c === 'sines' ? point.alternating : sse);
      fc.assert(
        fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), (r) => {
          const a = alternatingStrength(r, point, ssu, c);
          expect(criterionLimit(a / r, point, ssu, sse, c) / a).toBeCloseTo(1, 9);
        }),
      );
    }
  });
});

describe('finite life, repeated-stress fraction of Sut', () => {
  // Source: Associated Spring design handbook, compression-spring cyclic table, as reprinted in earlier
  // machine-design texts (from memory): music wire, austenitic stainless, nonferrous 36/33/30, peened 42/39/36.
  const table = { unpeened: [0.36, 0.33, 0.3], peened: [0.42, 0.39, 0.36] } as const;
  it('returns the table rows at 1e5, 1e6, 1e7 and interpolates in log10(cycles)', () => {
    expect(repeatedStressFraction(table, 1e5, false)).toBeCloseTo(0.36, 12);
    expect(repeatedStressFraction(table, 1e6, true)).toBeCloseTo(0.39, 12);
    expect(repeatedStressFraction(table, 1e7, false)).toBeCloseTo(0.3, 12);
    expect(repeatedStressFraction(table, Math.sqrt(1e11), false)).toBeCloseTo(0.345, 12);
  });
  it('keeps the 1e5 value below 1e5 cycles (conservative, no extrapolation; common practice)', () => {
    expect(repeatedStressFraction(table, 2e4, false)).toBeCloseTo(0.36, 12);
  });
});

// Associated Spring design handbook, compression-spring cyclic table, as reprinted in earlier machine-design
// texts (from memory): music wire / austenitic stainless / nonferrous row, unpeened and peened.
const MUSIC_ROW = { unpeened: [0.36, 0.33, 0.3], peened: [0.42, 0.39, 0.36] } as const;

describe('the life curve: one continuous, non-increasing curve per material', () => {
  it('the knee at 1e7 cycles is the lower of the table and Zimmerli: Zimmerli governs unpeened 2000 MPa wire (Zimmerli 1957; Associated Spring table, from memory)', () => {
    const sut = 2000;
    const ssu = 0.67 * sut;
    const z = repeatedStressEquivalent(ZIMMERLI_UNPEENED, ssu, 'gerber');
    expect(z).toBeLessThan(0.3 * sut);
    const inf = lifeCurve(Infinity, false, true, MUSIC_ROW, sut, ssu, 'gerber');
    expect(inf.source).toBe('zimmerli');
    expect(inf.repeatedStrength).toBeCloseTo(z, 9);
    // The criterion line through (S_sr/2, S_sr/2) is the line through Zimmerli's point itself.
    expect(alternatingStrength(0.25, inf.point, ssu, 'gerber')).toBeCloseTo(alternatingStrength(0.25, ZIMMERLI_UNPEENED, ssu, 'gerber'), 9);
    expect(lifeCurve(1e7, false, true, MUSIC_ROW, sut, ssu, 'gerber').repeatedStrength).toBe(inf.repeatedStrength);
    expect(lifeCurve(3e6, false, true, MUSIC_ROW, sut, ssu, 'gerber').source).toBe('finite-life-table-to-zimmerli');
    expect(lifeCurve(1e6, false, true, MUSIC_ROW, sut, ssu, 'gerber').repeatedStrength).toBeCloseTo(0.33 * sut, 9);
  });

  it('the table governs where Zimmerli lies above it: shot-peened wire keeps 0.36 Sut at infinite life (same sources)', () => {
    const sut = 1600;
    const inf = lifeCurve(Infinity, true, true, MUSIC_ROW, sut, 0.67 * sut, 'goodman');
    expect(repeatedStressEquivalent(ZIMMERLI_PEENED, 0.67 * sut, 'goodman')).toBeGreaterThan(0.36 * sut);
    expect(inf.source).toBe('finite-life-table');
    expect(inf.repeatedStrength).toBeCloseTo(0.36 * sut, 9);
  });

  it('without Zimmerli (austenitic stainless, copper alloys) the endurance is the 1e7 row of the class (same table)', () => {
    const sut = 1687;
    for (const c of FATIGUE_CRITERIA) {
      expect(lifeCurve(Infinity, false, false, MUSIC_ROW, sut, 0.67 * sut, c).repeatedStrength).toBeCloseTo(0.3 * sut, 9);
      expect(lifeCurve(Infinity, true, false, MUSIC_ROW, sut, 0.67 * sut, c).repeatedStrength).toBeCloseTo(0.36 * sut, 9);
    }
  });

  it('endurancePoint is the life curve at Ssu = 0.67 Sut (Shigley eq. 10-30)', () => {
    const a = endurancePoint(2e6, false, true, MUSIC_ROW, 1800, 'sines');
    const b = lifeCurve(2e6, false, true, MUSIC_ROW, 1800, 0.67 * 1800, 'sines');
    expect(a).toEqual(b);
  });

  const lives = [1e4, 2e4, 5e4, 1e5, 2e5, 5e5, 1e6, 2e6, 5e6, 9e6, 9.9e6, 1e7, 1.01e7, 2e7, 1e8, Infinity];
  it('S_sr is non-increasing and continuous in cycles for every catalog material, size, surface and criterion (property)', () => {
    const catalog = loadCatalog();
    fc.assert(
      fc.property(
        fc.constantFrom(...catalog.materials),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.boolean(),
        fc.constantFrom(...FATIGUE_CRITERIA),
        fc.double({ min: 4, max: 8, noNaN: true }),
        (m, t, peened, criterion, e) => {
          const d = m.minDiameter * Math.pow(m.maxDiameter / m.minDiameter, t);
          const f = materialFigures({ material: m }, d, false);
          const at = (n: number) => endurancePoint(n, peened, f.zimmerli, f.finiteLife, f.tensileStrength, criterion).repeatedStrength;
          for (let i = 1; i < lives.length; i++) expect(at(lives[i])).toBeLessThanOrEqual(at(lives[i - 1]) * (1 + 1e-12));
          const n = Math.pow(10, e);
          expect(at(n * 1.01)).toBeLessThanOrEqual(at(n) * (1 + 1e-12));
          expect(at(n * 1.01)).toBeGreaterThan(at(n) * 0.99);
        },
      ),
    );
  });

  it('the fatigue safety factor of random springs never rises with cycles over 1e4..1e8 and infinite life, and 1% more cycles moves it less than 1% (property)', () => {
    const catalog = loadCatalog();
    let worst = 0;
    fc.assert(
      fc.property(
        fc.record({
          material: fc.constantFrom(...catalog.materials),
          t: fc.double({ min: 0, max: 1, noNaN: true }),
          c: fc.double({ min: 4, max: 14, noNaN: true }),
          na: fc.double({ min: 3, max: 20, noNaN: true }),
          ends: fc.constantFrom(...END_TYPES),
          open: fc.double({ min: 1.3, max: 3, noNaN: true }),
          a: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
          b: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
          peened: fc.boolean(),
          criterion: fc.constantFrom(...FATIGUE_CRITERIA),
          e: fc.double({ min: 4, max: 8, noNaN: true }),
        }),
        (s) => {
          fc.pre(Math.abs(s.a - s.b) > 1e-3);
          const m = s.material;
          const d = m.minDiameter * Math.pow(m.maxDiameter / m.minDiameter, s.t);
          const figures = materialFigures({ material: m }, d, false);
          const Ls = solidLength(d, s.na + inactiveCoils(s.ends), s.ends);
          const L0 = Ls * s.open + d;
          const lengths = [Ls + (L0 - Ls) * s.a, Ls + (L0 - Ls) * s.b];
          const sf = (cycles: number) =>
            analyzeSpring({ wireDiameter: d, meanDiameter: s.c * d, activeCoils: s.na, ends: s.ends, freeLength: L0 }, figures, {
              lengths,
              cycles,
              peened: s.peened,
              criterion: s.criterion,
              correction: 'bergstrasser',
              directShear: false,
              seating: 'fixed-fixed',
              surgeEnds: 'plates',
              clashAllowance: 0.15,
              gapRule: false,
              surgeMargin: 15,
            }).fatigue!.safetyFactor;
          const values = lives.map(sf);
          for (let i = 1; i < values.length; i++) expect(values[i]).toBeLessThanOrEqual(values[i - 1] * (1 + 1e-12));
          const n = Math.pow(10, s.e);
          const step = sf(n) / sf(n * 1.01) - 1;
          expect(step).toBeGreaterThanOrEqual(-1e-12);
          worst = Math.max(worst, step);
          expect(step).toBeLessThan(0.01);
        },
      ),
      { numRuns: 300 },
    );
    expect(worst).toBeLessThan(0.01);
  });
});
