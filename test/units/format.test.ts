// Number formatting for people (a property of our own output, no outside values): a value is rounded to
// its significant figures before its decimals are chosen, so the same quantity prints the same way on
// every row ("20.0 / 20.5", never "19.96" -> "20.00" beside "20.5").
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { groupedCount, sig } from '../../src/units/format.js';

const significantDigits = (s: string) => s.replace(/^-/, '').replace('.', '').replace(/^0+/, '').length;

describe('sig', () => {
  it('rounds before choosing the decimals', () => {
    expect(sig(9.9996, 3)).toBe('10.0');
    expect(sig(19.96, 3)).toBe('20.0');
    expect(sig(20.5, 3)).toBe('20.5');
    expect(sig(0.099996, 3)).toBe('0.100');
    expect(sig(999.96, 4)).toBe('1000');
    expect(sig(-9.9996, 3)).toBe('-10.0');
    expect(sig(999999.6, 4)).toBe('1.000e+6');
  });

  it('writes non-finite values as a dash, never NaN or Infinity', () => {
    expect(sig(Number.NaN)).toBe('-');
    expect(sig(Number.POSITIVE_INFINITY)).toBe('-');
  });

  it('always shows exactly the asked significant figures (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 6 }), fc.double({ min: 1e-3, max: 1, noNaN: true }), fc.boolean(), (digits, frac, neg) => {
        const v = (neg ? -1 : 1) * frac * 10 ** (digits - 1) * 0.999;
        if (Math.abs(v) < 1e-3) return;
        const s = sig(v, digits);
        expect(significantDigits(s), `${v} -> ${s}`).toBe(digits);
        expect(Math.abs(Number(s) - v)).toBeLessThanOrEqual(Math.abs(v) * 10 ** (1 - digits));
      }),
    );
  });
});

describe('groupedCount', () => {
  it('groups a whole count by thousands exactly as en-US does', () => {
    for (const n of [0, 7, 999, 1000, 20_000, 123_456_789, -4321]) expect(groupedCount(n)).toBe(n.toLocaleString('en-US'));
    fc.assert(fc.property(fc.integer({ min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER }), (n) => groupedCount(n) === n.toLocaleString('en-US')));
  });

  it('never writes NaN or Infinity', () => {
    expect(groupedCount(NaN)).toBe('-');
    expect(groupedCount(Infinity)).toBe('-');
  });
});
