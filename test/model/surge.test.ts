// Surge frequency: its own boundary setting, independent of the buckling seating.
import { describe, expect, it } from 'vitest';
import { analyzeSpring, type MaterialFigures, type ServiceConditions } from '../../src/kinds/compression/analysis.js';
import { SEATINGS } from '../../src/kinds/compression/buckling.js';
import fc from 'fast-check';
import { springRate } from '../../src/model/rate.js';
import { activeCoilMass, surgeConstant, surgeFrequency } from '../../src/model/surge.js';

const steel: MaterialFigures = {
  tensileStrength: 1800,
  allowableStress: 810,
  shearModulus: 81500,
  elasticModulus: 206000,
  density: 7850,
  zimmerli: true,
  finiteLife: { unpeened: [0.36, 0.33, 0.3], peened: [0.42, 0.39, 0.36] },
  maxTemperature: 120,
};
const service = (extra: Partial<ServiceConditions>): ServiceConditions => ({
  lengths: [40, 30],
  peened: false,
  criterion: 'gerber',
  correction: 'bergstrasser',
  directShear: false,
  seating: 'fixed-fixed',
  clashAllowance: 0.15,
  gapRule: false,
  surgeMargin: 15,
  ...extra,
});
const geometry = { wireDiameter: 1.6, meanDiameter: 12, activeCoils: 8, ends: 'squared-ground' as const, freeLength: 48 };

describe('surge frequency', () => {
  it('f = d / (2 pi Na D^2) sqrt(G / (2 rho)) with both ends on plates, half that with one end free (source: Shigley 9th ed., eqs. 10-24 to 10-26)', () => {
    const k = (81500 * 1.6 ** 4) / (8 * 12 ** 3 * 8);
    const closed = (1.6 / (2 * Math.PI * 8 * 12 * 12)) * Math.sqrt(81500e6 / (2 * 7850)) * 1000;
    const m = activeCoilMass(1.6, 12, 8, 7850);
    expect(surgeFrequency(k, m, false) / closed).toBeCloseTo(1, 12);
    expect(surgeFrequency(k, m, true) / closed).toBeCloseTo(0.5, 12);
  });

  it('surgeConstant(G, rho) d / (D^2 Na) is the surge frequency of the same spring, both boundaries (same equations; property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 10, noNaN: true }),
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: 2, max: 40, noNaN: true }),
        fc.boolean(),
        (d, c, n, oneFree) => {
          const D = c * d;
          const f = surgeFrequency(springRate(81500, d, D, n), activeCoilMass(d, D, n, 7850), oneFree);
          expect((surgeConstant(81500, 7850, oneFree) * d) / (D * D * n) / f).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it('the boundary is surge_ends (default both ends on plates), whatever the buckling seating', () => {
    for (const seating of SEATINGS) {
      const plates = analyzeSpring(geometry, steel, service({ seating }));
      expect(plates.surge.ends).toBe('plates');
      expect(plates.surge.relevant).toBe(plates.surge.bothEndsOnPlates);
      const free = analyzeSpring(geometry, steel, service({ seating, surgeEnds: 'one-free' }));
      expect(free.surge.ends).toBe('one-free');
      expect(free.surge.relevant).toBe(free.surge.oneEndFree);
      expect(free.surge.oneEndFree / free.surge.bothEndsOnPlates).toBeCloseTo(0.5, 12);
    }
  });

  it('the surge warning judges the boundary asked', () => {
    const f = analyzeSpring(geometry, steel, service({})).surge.bothEndsOnPlates;
    const forcing = (0.75 * f) / 15; // 15 x forcing sits between the two frequencies
    expect(analyzeSpring(geometry, steel, service({ forcingFrequency: forcing, seating: 'fixed-free' })).warnings.map((w) => w.code)).not.toContain('surge');
    expect(analyzeSpring(geometry, steel, service({ forcingFrequency: forcing, surgeEnds: 'one-free' })).warnings.map((w) => w.code)).toContain('surge');
  });
});
