// Plot scales and the spring drawing's geometry (properties of our own code; no outside values).
import { describe, expect, it } from 'vitest';
import { niceDomain, scaleLinear, tickStep, ticks } from '../../src/report/html/scale.js';
import { springDrawing } from '../../src/kinds/compression/report/springDrawing.js';

describe('linear scales (invariant: ticks are 1, 2 or 5 times a power of ten, inside the domain)', () => {
  it('picks round steps', () => {
    expect(tickStep(0, 10, 5)).toBe(2);
    expect(tickStep(0, 1, 5)).toBe(0.2);
    expect(tickStep(0.0056, 0.0072, 6)).toBeCloseTo(0.0002, 12);
    expect(ticks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
  });
  it('nice domains contain the data and start and end on ticks', () => {
    const [a, b] = niceDomain(13.7, 15.74);
    expect(a).toBeLessThanOrEqual(13.7);
    expect(b).toBeGreaterThanOrEqual(15.74);
    expect(niceDomain(3, 3)[0]).toBeLessThan(3);
  });
  it('maps the domain ends to the range ends, and inverts the y axis when asked', () => {
    const s = scaleLinear([0, 50], [64, 542]);
    expect(s(0)).toBe(64);
    expect(s(50)).toBe(542);
    expect(s(25)).toBe(303);
    const y = scaleLinear([0, 10], [300, 20]);
    expect(y(10)).toBe(20);
  });
});

describe('spring side view (to scale)', () => {
  const spring = { wireDiameter: 1.4, meanDiameter: 14.34, activeCoils: 8.25, ends: 'squared-ground' as const, freeLength: 49.71 };
  const dwg = springDrawing(spring);
  it('draws one cross-section per half turn: 2 Nt + 1 of them', () => {
    expect(dwg.sections.length).toBe(Math.round(2 * (8.25 + 2)) + 1);
  });
  it('spans the free length (ground ends: end sections on the end planes) and the outer diameter', () => {
    const xs = dwg.sections.map((p) => p.x);
    expect(Math.min(...xs)).toBeCloseTo(0, 9);
    expect(Math.max(...xs)).toBeCloseTo(49.71, 9);
    const ys = dwg.sections.map((p) => p.y);
    expect(Math.max(...ys) - Math.min(...ys) + 1.4).toBeCloseTo(dwg.outerDiameter, 9);
  });
  it('spaces the active coils at the pitch and the closed end coils one wire diameter apart, for every end type', () => {
    for (const ends of ['plain', 'plain-ground', 'squared', 'squared-ground'] as const) {
      const dw = springDrawing({ ...spring, activeCoils: 8, ends });
      const top = dw.sections.filter((p) => p.y > 0).map((p) => p.x);
      const mid = top[Math.floor(top.length / 2)] - top[Math.floor(top.length / 2) - 1];
      expect(mid / dw.pitch, ends).toBeCloseTo(1, 9);
      if (ends.startsWith('squared')) expect((top[1] - top[0]) / 1.4, ends).toBeCloseTo(1, 9);
    }
  });
});
