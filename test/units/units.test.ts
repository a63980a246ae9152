import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, parseQuantity, SANE_RANGE } from '../../src/units/parse.js';
import { displayUnit } from '../../src/units/systems.js';
import type { Kind } from '../../src/units/kinds.js';

describe('parsing quantities', () => {
  it("reads plain numbers in the file's system and strings in their own unit (1 in = 25.4 mm, 1 lbf = 4.4482216152605 N by definition)", () => {
    expect(parseQuantity(1.6, 'length', 'si', 'x')).toBe(1.6);
    expect(parseQuantity(1, 'length', 'us', 'x')).toBeCloseTo(25.4, 12);
    expect(parseQuantity('0.063 in', 'length', 'si', 'x')).toBeCloseTo(1.6002, 10);
    expect(parseQuantity('25 lbf', 'force', 'si', 'x')).toBeCloseTo(111.2055, 4);
    expect(parseQuantity('11.5 Mpsi', 'stress', 'si', 'x')).toBeCloseTo(79289.7, 1);
    expect(parseQuantity('79.3 GPa', 'stress', 'us', 'x')).toBeCloseTo(79300, 9);
    expect(parseQuantity('7850 kg/m3', 'density', 'us', 'x')).toBeCloseTo(7850, 9);
    expect(parseQuantity('0.284 lb/in^3', 'density', 'si', 'x')).toBeCloseTo(7861.1, 1);
    expect(parseQuantity('212 F', 'temperature', 'si', 'x')).toBeCloseTo(100, 9);
    // 1 in^3 = 25.4^3 mm^3 = 16387.064 mm^3 exactly (from the inch's definition).
    expect(parseQuantity('1 in^3', 'volume', 'si', 'x')).toBeCloseTo(16387.064, 9);
    expect(parseQuantity(2, 'volume', 'us', 'x')).toBeCloseTo(32774.128, 9);
    expect(parseQuantity('3 cm3', 'volume', 'si', 'x')).toBe(3000);
  });

  it('writes wire volume as mm^3 in SI and in^3 in US customary', () => {
    expect(displayUnit('si', 'volume').symbol).toBe('mm^3');
    expect(displayUnit('us', 'volume').symbol).toBe('in^3');
    expect(displayUnit('us', 'volume').fromCore(16387.064)).toBeCloseTo(1, 12);
  });

  it('rejects a unit of the wrong kind, naming the field', () => {
    expect(() => parseQuantity('25 N', 'length', 'si', 'wire_diameter')).toThrow(/wire_diameter: expected a length .*, not a force/);
    expect(() => parseQuantity('3 furlongs', 'length', 'si', 'free_length')).toThrow(/free_length: .*unknown unit "furlongs"/);
    expect(() => parseQuantity(-2, 'length', 'si', 'wire_diameter', { positive: true })).toThrow(InputError);
    expect(() => parseQuantity(NaN, 'length', 'si', 'wire_diameter')).toThrow(InputError);
  });

  const kinds: Kind[] = ['length', 'force', 'stress', 'density', 'temperature', 'rate', 'mass', 'volume'];
  it('round-trips SI <-> US for every kind (property)', () => {
    // Values inside the range a spring quantity can have (SANE_RANGE); outside it parseQuantity refuses them.
    const kindAndValue = fc.constantFrom(...kinds).chain((kind) => {
      const r = SANE_RANGE[kind];
      const v =
        r.floor !== undefined
          ? fc.double({ min: r.floor, max: r.max, noNaN: true })
          : fc
              .tuple(fc.boolean(), fc.double({ min: Math.max(r.min * 10, 1e-2), max: Math.min(r.max / 10, 1e6), noNaN: true }))
              .map(([neg, a]) => (neg ? -a : a));
      return fc.tuple(fc.constant(kind), v);
    });
    fc.assert(
      fc.property(kindAndValue, ([kind, v]) => {
        const us = displayUnit('us', kind);
        expect(us.toCore(us.fromCore(v))).toBeCloseTo(v, 6);
        const parsed = parseQuantity(`${us.fromCore(v)} ${us.symbol}`, kind, 'si', 'x');
        expect(parsed).toBeCloseTo(v, 6);
      }),
    );
  });
});
