// Drawing precision: the spring as the drawing carries it, re-checked.
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { readRequirements } from '../../../../src/kinds/compression/requirements.js';
import { runDesign } from '../../../../src/kinds/compression/design.js';
import { drawingPrecision, drawnSpring, roundToStep } from '../../../../src/kinds/compression/tolerance/precision.js';
import { catalog, designed, requirements } from './specs.js';

const demo = readRequirements(parse(readFileSync('examples/washer-trigger.yaml', 'utf8')), catalog);
const onStep = (v: number, step: number) => Math.abs(v / step - Math.round(v / step)) < 1e-6;

describe("rounding to the drawing's steps", () => {
  it('rounds to the nearest step, or down and up, and prints as written', () => {
    expect(roundToStep(14.346, 0.01)).toBe(14.35);
    expect(roundToStep(14.346, 0.01, 'down')).toBe(14.34);
    expect(roundToStep(14.34, 0.01, 'up')).toBe(14.34);
    expect(roundToStep(45.2049, 0.1)).toBe(45.2);
    expect(String(roundToStep(0.1 + 0.2, 0.1))).toBe('0.3');
  });

  it('carries 0.01 mm and 0.1 mm in SI, 0.001 in and 0.01 in in US units (common practice)', () => {
    expect(drawingPrecision('si')).toEqual({ system: 'si', diameter: 0.01, freeLength: 0.1, coils: 0.25 });
    const us = drawingPrecision('us', 0.5);
    expect(us.diameter).toBeCloseTo(0.0254, 12);
    expect(us.freeLength).toBeCloseTo(0.254, 12);
    expect(us.coils).toBe(0.5);
  });
});

describe("the demo's reported springs at drawing precision", () => {
  const run = runDesign({ ...demo, bestPerWire: false });
  it('every one still passes every check, with its outer diameter (the bore controls) on 0.01 mm', () => {
    expect(run.candidates.length).toBeGreaterThan(3);
    for (const c of run.candidates) {
      const s = drawnSpring(c.geometry, c.item.figures, demo);
      expect(s.failing).toEqual([]);
      expect(s.controlled).toBe('outer');
      expect(onStep(s.controlledValue, 0.01)).toBe(true);
      expect(s.geometry.meanDiameter + s.geometry.wireDiameter).toBeCloseTo(s.controlledValue, 9);
      expect(onStep(s.geometry.freeLength, 0.1)).toBe(true);
      expect(onStep(s.geometry.activeCoils, 0.25)).toBe(true);
      expect(s.geometry.wireDiameter).toBe(c.geometry.wireDiameter);
      // Rounding the free length by at most 0.05 mm moves the working force by at most rate x 0.05.
      expect(Math.abs(s.workingForce - demo.workingForce)).toBeLessThanOrEqual(s.analysis.rate * 0.05 * 3 + 1e-9);
    }
  });
});

describe('the drawn spring (property)', () => {
  it("lies on the drawing's steps and within half a step of the nominal, or names what fails", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 4, noNaN: true }),
        fc.double({ min: 5, max: 11, noNaN: true }),
        fc.double({ min: 4, max: 14, noNaN: true }),
        fc.constantFrom('si' as const, 'us' as const),
        (d, C, Na, units) => {
          const na = roundToStep(Na, 0.25);
          const L1 = 3 * d * (na + 2);
          const req = requirements({
            units,
            material: 'hard-drawn',
            load: { force: '5 N', length: `${L1} mm` },
            envelope: { min_inner_diameter: `${(C - 1) * d * 0.9} mm` },
            index: [3, 16],
            guided: true,
          });
          const spring = designed('hard-drawn', d, C * d, na, 'squared-ground', req);
          const p = drawingPrecision(units);
          const s = drawnSpring(spring.geometry, spring.figures, req, p);
          expect(s.controlled).toBe('inner');
          expect(onStep(s.controlledValue, p.diameter)).toBe(true);
          expect(onStep(s.geometry.freeLength, p.freeLength)).toBe(true);
          expect(Math.abs(s.geometry.meanDiameter - spring.geometry.meanDiameter)).toBeLessThanOrEqual(p.diameter + 1e-9);
          expect(Math.abs(s.geometry.freeLength - spring.geometry.freeLength)).toBeLessThanOrEqual(p.freeLength + 1e-9);
          for (const name of s.failing) expect(typeof name).toBe('string');
          expect(s.failing.length === 0).toBe(s.checks.every((g) => g <= 1e-9));
        },
      ),
      { numRuns: 60 },
    );
  });
});
