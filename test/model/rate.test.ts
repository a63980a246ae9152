import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { activeCoilsForRate, directShearFactor, springRate } from '../../src/model/rate.js';

describe('spring rate k = G d^4 / (8 D^3 Na) (Castigliano; Shigley eq. 10-9)', () => {
  it('music wire 0.092 in, D 0.4705 in, 21 coils, G 11.75 Mpsi gives 48.1 lbf/in (source: Budynas and Nisbett, Shigley 9th ed., Example 10-4, from memory)', () => {
    const psi = 0.0068947572931683625; // MPa
    const k = springRate(11.75e6 * psi, 0.092 * 25.4, 0.4705 * 25.4, 21);
    expect(k / (4.4482216152605 / 25.4)).toBeCloseTo(48.1, 1);
  });

  it('the direct-shear term lowers the rate by about 3% at C = 4 and less above (common practice)', () => {
    const base = (c: number) => springRate(79300, 2, 2 * c, 8);
    const withShear = (c: number) => springRate(79300, 2, 2 * c, 8, true);
    const drop = (c: number) => 1 - withShear(c) / base(c);
    expect(drop(4)).toBeGreaterThan(0.028);
    expect(drop(4)).toBeLessThan(0.032);
    for (let c = 4.5; c <= 16; c += 0.5) expect(drop(c)).toBeLessThan(drop(c - 0.5));
  });

  it('the direct-shear rate is the plain rate over directShearFactor(C) = 1 + 1/(2C^2) (Shigley eq. 10-8 derivation; property)', () => {
    expect(directShearFactor(4)).toBe(1 + 1 / 32);
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 10, noNaN: true }),
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: 2, max: 40, noNaN: true }),
        (d, c, n) => {
          expect((springRate(79000, d, c * d, n, true) * directShearFactor(c)) / springRate(79000, d, c * d, n)).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it('scales as d^4 / (D^3 Na) (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        (d, D, n, s) => {
          const k = springRate(80000, d, D, n);
          expect(springRate(80000, d * s, D, n) / k).toBeCloseTo(s ** 4, 6);
          expect(springRate(80000, d, D * s, n) / k).toBeCloseTo(s ** -3, 6);
          expect(springRate(80000, d, D, n * s) / k).toBeCloseTo(1 / s, 6);
        },
      ),
    );
  });

  it('activeCoilsForRate inverts springRate (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 10, noNaN: true }),
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: 2, max: 40, noNaN: true }),
        (d, c, n) => {
          const k = springRate(79000, d, c * d, n);
          expect(activeCoilsForRate(79000, d, c * d, k)).toBeCloseTo(n, 8);
        },
      ),
    );
  });
});
