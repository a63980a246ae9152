import { describe, expect, it } from 'vitest';
import { criticalDeflection, endConditionConstant, stableFreeLengthLimit } from '../../../src/kinds/compression/buckling.js';

describe('buckling', () => {
  it('end-condition constants 0.5, 0.707, 1, 2 (source: Shigley 9th ed., Table 10-2)', () => {
    expect(endConditionConstant('fixed-fixed')).toBe(0.5);
    expect(endConditionConstant('fixed-pivoted')).toBe(0.707);
    expect(endConditionConstant('pivoted-pivoted')).toBe(1);
    expect(endConditionConstant('fixed-free')).toBe(2);
  });

  it('steel (E 30 Mpsi, G 11.5 Mpsi) is absolutely stable below L0 = 2.63 D / alpha (source: Shigley 9th ed., eq. 10-13)', () => {
    expect(Math.abs(stableFreeLengthLimit(1, 30e6, 11.5e6, 1) - 2.63)).toBeLessThan(0.01);
  });

  it('Example 10-1: D 0.400 in between plates gives (L0)cr = 2.10 in with the steel constant (source: Shigley 9th ed., Example 10-1, from memory)', () => {
    expect(stableFreeLengthLimit(0.4, 30e6, 11.5e6, 0.5)).toBeCloseTo(2.1, 2);
  });

  it('has no critical deflection below the stability limit and a finite one above it (property)', () => {
    const E = 206000;
    const G = 81500;
    const limit = stableFreeLengthLimit(10, E, G, 0.5);
    expect(Number.isNaN(criticalDeflection(limit * 0.99, 10, E, G, 0.5))).toBe(true);
    const y = criticalDeflection(limit * 1.5, 10, E, G, 0.5);
    expect(y).toBeGreaterThan(0);
    expect(y).toBeLessThan(limit * 1.5);
    // Longer springs buckle at a smaller share of their free length.
    expect(criticalDeflection(limit * 3, 10, E, G, 0.5) / (limit * 3)).toBeLessThan(y / (limit * 1.5));
  });
});
