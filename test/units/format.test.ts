// Number formatting for people (a property of our own output, no outside values): a value is rounded to
// its significant figures before its decimals are chosen, so the same quantity prints the same way on
// every row ("20.0 / 20.5", never "19.96" -> "20.00" beside "20.5").
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatQuantity, groupedCount, sig } from '../../src/units/format.js';
import { readableUnit } from '../../src/units/systems.js';

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

describe('masses in the unit they read best in', () => {
  // 1 lb = 0.45359237 kg and 1 oz = 1/16 lb exactly (source: NIST Handbook 44, Appendix C).
  it('US masses under 1 lb in ounces, from 1 lb in pounds; SI under 1 kg in grams', () => {
    expect(formatQuantity(0.00563, 'mass', 'us')).toBe('0.1986 oz');
    expect(formatQuantity(0.45359237 / 16, 'mass', 'us')).toBe('1.000 oz');
    expect(formatQuantity(0.45359237, 'mass', 'us')).toBe('1.000 lb');
    expect(formatQuantity(0.45359237 * 0.999, 'mass', 'us')).toBe('15.98 oz');
    expect(formatQuantity(0.00563, 'mass', 'si')).toBe('5.630 g');
  });

  it('a whole table of springs under 1 lb has its mass column in ounces', () => {
    expect(readableUnit('us', 'mass', 0.0124 * 0.45359237).symbol).toBe('oz');
    expect(readableUnit('us', 'mass', 2).symbol).toBe('lb');
  });
});
