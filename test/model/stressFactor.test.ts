import { describe, expect, it } from 'vitest';
import { bergstrasserFactor, wahlFactor } from '../../src/model/stressFactor.js';

describe('stress-correction factors', () => {
  // Source: the published formulas (Wahl 1929; Bergstrasser, as in EN 13906-1's (w+0.5)/(w-0.75)),
  // tabulated at C = 4, 6, 8, 12 in spring handbooks (three decimals).
  it.each([
    [4, 1.404, 1.385],
    [6, 1.253, 1.238],
    [8, 1.184, 1.172],
    [12, 1.119, 1.111],
  ])('at C = %d: Wahl %f, Bergstrasser %f', (c, wahl, berg) => {
    expect(wahlFactor(c)).toBeCloseTo(wahl, 3);
    expect(bergstrasserFactor(c)).toBeCloseTo(berg, 3);
  });

  it('EN 13906-1 form (w + 0.5)/(w - 0.75) is the Bergstrasser factor (source: EN 13906-1)', () => {
    for (const w of [3.5, 5, 9.25, 15]) expect(bergstrasserFactor(w)).toBeCloseTo((w + 0.5) / (w - 0.75), 12);
  });

  it('Wahl and Bergstrasser agree within about 1.5% over the index range 4 to 12 (common practice)', () => {
    for (let c = 4; c <= 12; c += 0.25) {
      const diff = Math.abs(wahlFactor(c) - bergstrasserFactor(c)) / bergstrasserFactor(c);
      expect(diff).toBeLessThan(0.015);
    }
  });

  it('both fall towards 1 as the index grows (property: curvature matters less in open coils)', () => {
    let last = Infinity;
    for (let c = 3; c <= 20; c += 0.5) {
      const k = bergstrasserFactor(c);
      expect(k).toBeLessThan(last);
      expect(k).toBeGreaterThan(1);
      last = k;
    }
  });
});
