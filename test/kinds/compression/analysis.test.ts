// Invariants of the single-spring analysis (property tests).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeSpring, type MaterialFigures, type ServiceConditions } from '../../../src/kinds/compression/analysis.js';
import { END_TYPES, inactiveCoils, solidLength } from '../../../src/kinds/compression/geometry.js';
import { SEATINGS } from '../../../src/kinds/compression/buckling.js';
import { sanitize } from '../../../src/report/json.js';

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
const service = (lengths: number[], extra: Partial<ServiceConditions> = {}): ServiceConditions => ({
  lengths,
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

const springArb = fc.record({
  d: fc.double({ min: 0.2, max: 12, noNaN: true }),
  c: fc.double({ min: 3, max: 20, noNaN: true }),
  na: fc.double({ min: 1, max: 40, noNaN: true }),
  ends: fc.constantFrom(...END_TYPES),
  seating: fc.constantFrom(...SEATINGS),
  open: fc.double({ min: 1.05, max: 4, noNaN: true }),
  a: fc.double({ min: 0, max: 1, noNaN: true }),
  b: fc.double({ min: 0, max: 1, noNaN: true }),
  cycles: fc.constantFrom(undefined, 1e3, 5e4, 1e6, Infinity),
  criterion: fc.constantFrom('gerber' as const, 'goodman' as const, 'sines' as const),
});

describe('single-spring analysis invariants (property)', () => {
  it('every output is finite or an explicit "not applicable" for every valid spring', () => {
    fc.assert(
      fc.property(springArb, (s) => {
        const Ls = solidLength(s.d, s.na + inactiveCoils(s.ends), s.ends);
        const L0 = Ls * s.open + s.d;
        const lengths = [Ls + (L0 - Ls) * s.a, Ls + (L0 - Ls) * s.b];
        const a = analyzeSpring(
          { wireDiameter: s.d, meanDiameter: s.c * s.d, activeCoils: s.na, ends: s.ends, freeLength: L0 },
          steel,
          service(lengths, { cycles: s.cycles, criterion: s.criterion, seating: s.seating, forcingFrequency: 10 }),
        );
        const text = JSON.stringify(sanitize(a));
        expect(text).not.toMatch(/NaN|Infinity/);
        for (const v of [a.rate, a.geometry.mass, a.geometry.solidLength, a.solid.force, a.solid.stress, a.surge.relevant, a.buckling.stableFreeLengthLimit]) {
          expect(Number.isFinite(v)).toBe(true);
        }
        expect(a.buckling.absolutelyStable || Number.isFinite(a.buckling.criticalDeflection)).toBe(true);
      }),
    );
  });

  it('stress grows with force: shorter lengths mean higher stress', () => {
    fc.assert(
      fc.property(springArb, (s) => {
        const Ls = solidLength(s.d, s.na + inactiveCoils(s.ends), s.ends);
        const L0 = Ls * s.open + s.d;
        const lo = Math.min(s.a, s.b);
        const hi = Math.max(s.a, s.b);
        fc.pre(hi - lo > 1e-6);
        const a = analyzeSpring(
          { wireDiameter: s.d, meanDiameter: s.c * s.d, activeCoils: s.na, ends: s.ends, freeLength: L0 },
          steel,
          service([Ls + (L0 - Ls) * hi, Ls + (L0 - Ls) * lo]),
        );
        expect(a.points[1].force).toBeGreaterThan(a.points[0].force);
        expect(a.points[1].stress).toBeGreaterThan(a.points[0].stress);
        expect(a.solid.stress).toBeGreaterThanOrEqual(a.points[1].stress);
      }),
    );
  });

  it('mass grows with the number of coils', () => {
    fc.assert(
      fc.property(springArb, fc.double({ min: 0.25, max: 10, noNaN: true }), (s, extra) => {
        const geom = (na: number) => ({ wireDiameter: s.d, meanDiameter: s.c * s.d, activeCoils: na, ends: s.ends, freeLength: 10 * s.d * (na + 3) });
        const a = analyzeSpring(geom(s.na), steel, service([]));
        const b = analyzeSpring(geom(s.na + extra), steel, service([]));
        expect(b.geometry.mass).toBeGreaterThan(a.geometry.mass);
      }),
    );
  });
});
