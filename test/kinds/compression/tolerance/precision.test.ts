// source: none needed (no outside values: properties of our own model; the drawing steps are common practice, said where checked).
// Drawing precision: the spring as the drawing carries it, re-checked; the spring file of every reported
// spring passes `check` against its requirements, or says honestly that no drawing near it does.
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { readRequirements } from '../../../../src/kinds/compression/requirements.js';
import { runDesign } from '../../../../src/kinds/compression/design.js';
import { DRAWING_WINDOW, drawingPrecision, drawnSpring, roundToStep } from '../../../../src/kinds/compression/tolerance/precision.js';
import { designedSpring } from '../../../../src/kinds/compression/tolerance/confirm.js';
import { compression } from '../../../../src/kinds/compression/index.js';
import { springFileText } from '../../../../src/kinds/compression/springDoc.js';
import { checkDocuments } from '../../../../src/check/index.js';
import { springRate } from '../../../../src/model/rate.js';
import { catalog, designed, requirementArb, requirements } from './specs.js';

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
      const s = drawnSpring(designedSpring(c), demo);
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
  it("lies on the drawing's steps within the window around the nominal, or names what fails", () => {
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
          const s = drawnSpring(spring, req, p);
          expect(s.controlled).toBe('inner');
          expect(onStep(s.controlledValue, p.diameter)).toBe(true);
          expect(onStep(s.geometry.freeLength, p.freeLength)).toBe(true);
          expect(Math.abs(s.geometry.meanDiameter - spring.geometry.meanDiameter)).toBeLessThanOrEqual(
            (DRAWING_WINDOW.diameterSteps + 0.5) * p.diameter + 1e-9,
          );
          // The free length is the one that meets the working force at the drawn diameter, within the window's steps.
          const k = springRate(spring.figures.shearModulus, d, s.geometry.meanDiameter, na, req.directShear);
          const solved = req.workingLength + req.workingForce / k;
          expect(Math.abs(s.geometry.freeLength - solved)).toBeLessThanOrEqual((DRAWING_WINDOW.freeLengthSteps + 0.5) * p.freeLength + 1e-9);
          for (const name of s.failing) expect(typeof name).toBe('string');
          // The design checks fail exactly where their values say so; the working-force band adds its own two names.
          expect(s.failing.filter((n) => !n.startsWith('working_force')).length === 0).toBe(s.checks.every((g) => g <= 1e-9));
        },
      ),
      { numRuns: 60 },
    );
  });
});

/** Every listed spring of a design, as its spring file, against the requirements it was designed for. */
function drawnFilesOf(raw: Record<string, unknown>) {
  const req = readRequirements(raw, catalog);
  const run = compression.design(req, catalog);
  return run.candidates.map((c, i) => {
    const { text, exported } = springFileText(c, req, i + 1);
    return { c, req, text, drawn: exported.drawn, verdict: checkDocuments(parse(text), raw, catalog).verdict };
  });
}

describe('the spring file of every reported spring (property)', () => {
  it('passes check against its requirements, or says that no drawing near the design passes and a search three times as wide finds none either', () => {
    let files = 0;
    fc.assert(
      fc.property(requirementArb, (raw) => {
        for (const f of drawnFilesOf(raw)) {
          files++;
          // The file and check agree on the checks; what the file says of itself is what check finds.
          expect([...f.verdict.failingNames].sort()).toEqual([...f.drawn.failing].sort());
          if (f.verdict.pass) {
            expect(f.text).toMatch(/As drawn it passes every check/);
            continue;
          }
          expect(f.text).toMatch(new RegExp(`As drawn it FAILS ${f.drawn.failing.join(', ')}`));
          const wide = drawnSpring(designedSpring(f.c), f.req, undefined, {
            diameterSteps: 3 * DRAWING_WINDOW.diameterSteps,
            freeLengthSteps: 3 * DRAWING_WINDOW.freeLengthSteps,
          });
          expect(wide.failing.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 40, seed: 20261202 },
    );
    expect(files).toBeGreaterThan(40);
  }, 240_000);
});

describe('audit cases: spring files that failed check although a passing drawing existed', () => {
  // The three requirement sets an independent review of session 3 found (scenarios of our own); before
  // the free length was re-solved at the rounded diameter, each spring file failed check by a hair.
  // The requirement documents as the review wrote them (JSON, SI).
  const cases: [string, string, number, { od: number; freeLength: number }][] = [
    [
      'chrome-vanadium in a bore, pick 3: outer diameter at solid',
      '{"units":"si","material":"chrome-vanadium","ends":"squared","seating":"pivoted-pivoted","load":{"force":41.4,"length":34.9},"operating_length":31.4,"operating_force":94.4,"load_tolerance":0.05,"envelope":{"max_outer_diameter":11.9,"max_free_length":76.8,"min_inner_diameter":2.5},"top":5}',
      3,
      { od: 11.86, freeLength: 37.3 },
    ],
    [
      'hard-drawn for a million cycles, pick 1: fatigue',
      '{"units":"si","material":"hard-drawn","ends":"plain-ground","seating":"pivoted-pivoted","load":{"force":12.8,"length":23.2},"operating_length":20.9,"operating_force":33.7,"load_tolerance":0.1,"envelope":{"max_outer_diameter":10.2,"max_free_length":43.6},"cycles":1000000,"top":5}',
      1,
      { od: 8.72, freeLength: 24.8 },
    ],
    [
      'guided stainless over a rod, pick 1: static stress',
      '{"units":"si","material":"stainless-302","ends":"plain","seating":"pivoted-pivoted","load":{"force":123.8,"length":87.3},"operating_length":69,"operating_force":325.6,"load_tolerance":0.15,"envelope":{"max_outer_diameter":53.3,"max_free_length":114.4,"min_inner_diameter":20.8},"guided":true,"top":5}',
      1,
      { od: 50.82, freeLength: 102.1 },
    ],
  ];
  for (const [name, raw, pick, expected] of cases) {
    it(name, () => {
      const f = drawnFilesOf(JSON.parse(raw) as Record<string, unknown>)[pick - 1];
      expect(f.verdict.failingNames).toEqual([]);
      expect(f.drawn.failing).toEqual([]);
      expect(f.text).toMatch(/As drawn it passes every check/);
      const doc = parse(f.text) as Record<string, unknown>;
      expect(doc.outer_diameter).toBe(expected.od);
      expect(doc.free_length).toBe(expected.freeLength);
    });
  }
});
