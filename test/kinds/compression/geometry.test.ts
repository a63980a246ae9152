import { describe, expect, it } from 'vitest';
import { END_TYPES, freeLengthFromPitch, inactiveCoils, pitch, solidLength } from '../../../src/kinds/compression/geometry.js';

// Source: the end-type table of the spring handbooks (Associated Spring, Design Handbook;
// Budynas and Nisbett, Shigley 9th ed., Table 10-1).
describe('end types', () => {
  const d = 2;
  const Na = 10;
  const p = 5;
  it.each([
    ['plain', 0, d * (Na + 1), p * Na + d],
    ['plain-ground', 1, d * (Na + 1), p * (Na + 1)],
    ['squared', 2, d * (Na + 3), p * Na + 3 * d],
    ['squared-ground', 2, d * (Na + 2), p * Na + 2 * d],
  ] as const)('%s: inactive coils, solid length and free length per the table', (ends, q, ls, l0) => {
    expect(inactiveCoils(ends)).toBe(q);
    expect(solidLength(d, Na + q, ends)).toBeCloseTo(ls, 12);
    expect(freeLengthFromPitch(p, Na, d, ends)).toBeCloseTo(l0, 12);
  });

  it('pitch inverts the free-length relation for every end type (property)', () => {
    for (const ends of END_TYPES) {
      for (const L0 of [20, 47.5, 130]) expect(freeLengthFromPitch(pitch(L0, 7.5, 1.6, ends), 7.5, 1.6, ends)).toBeCloseTo(L0, 10);
    }
  });
});
