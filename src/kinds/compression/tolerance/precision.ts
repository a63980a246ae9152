// Drawing precision: a spring as a drawing carries it (wire as listed, the controlled diameter to
// 0.01 mm or 0.001 in, the free length to 0.1 mm or 0.01 in, coils to the coil step), re-checked at
// those values. A search result sits on its limits to many digits; the spring the maker builds is the
// one on the drawing, so that is the one that must pass.
import type { Requirements } from '../requirements.js';
import { analyzeSpring, type MaterialFigures, type SpringAnalysis, type SpringGeometry } from '../analysis.js';
import { CHECK, CHECKS, checkAnalysis, figuresUnder, type CheckName } from '../verify.js';
import { springServiceConditions } from '../problem.js';
import { springRate } from '../../../model/rate.js';
import { workingBand, type WorkingBand } from '../../../input/workingBand.js';
import { springYieldFigures, yieldShortfall } from './confirm.js';
import type { YieldResult } from './monteCarlo.js';
import type { DesignedSpring } from './springYield.js';
import { INCH_MM } from '../../../units/kinds.js';
import type { UnitSystem } from '../../../units/systems.js';

export interface DrawingPrecision {
  system: UnitSystem;
  /** Step of the diameters, mm (0.01 mm, or 0.001 in). */
  diameter: number;
  /** Step of the free length, mm (0.1 mm, or 0.01 in). */
  freeLength: number;
  /** Step of the coil counts. */
  coils: number;
}

/** The precision a drawing carries in the unit system (common practice). */
export function drawingPrecision(system: UnitSystem, coilStep = 0.25): DrawingPrecision {
  return system === 'us'
    ? { system, diameter: 0.001 * INCH_MM, freeLength: 0.01 * INCH_MM, coils: coilStep }
    : { system, diameter: 0.01, freeLength: 0.1, coils: coilStep };
}

/** v rounded to a multiple of step; mode 'down' / 'up' for the neighbours. The result is cleaned of
 * binary noise so that it prints as the drawing writes it. */
export function roundToStep(v: number, step: number, mode: 'nearest' | 'down' | 'up' = 'nearest'): number {
  const n = v / step;
  const k = mode === 'down' ? Math.floor(n + 1e-9) : mode === 'up' ? Math.ceil(n - 1e-9) : Math.round(n);
  return Number((k * step).toPrecision(12));
}

/** Which diameter the drawing controls: the outer one in a bore, the inner one over a rod. */
export type ControlledDiameter = 'outer' | 'inner';

export function controlledDiameter(req: Requirements): ControlledDiameter {
  return req.maxOuterDiameter === undefined && req.minInnerDiameter !== undefined ? 'inner' : 'outer';
}

/** The drawings tried around the design: so many steps of the controlled diameter either side of its
 * exact value, and for each diameter so many steps of the free length either side of the one that
 * meets the working force at that diameter (the free length is re-solved after the diameter is rounded,
 * as the maker sets it). Wide enough that a drawing passing every check is found whenever one exists
 * near the design (test/kinds/compression/tolerance/precision.test.ts compares with a search three times as wide).
 * Ten diameter steps (0.1 mm, or 0.01 in): a stiff spring at its operating-force limit can need its rate
 * moved by several steps of the diameter to meet the force band once the free length is rounded. */
export const DRAWING_WINDOW = { diameterSteps: 10, freeLengthSteps: 4 } as const;

/** The checks a drawn spring adds to the design checks: its working force within the band `check` reads
 * (src/input/workingBand.ts), as the drawn free length can only meet the working force to its step. */
export type DrawnCheckName = CheckName | 'working_force_min' | 'working_force_max';

export interface DrawnSpring {
  geometry: SpringGeometry;
  controlled: ControlledDiameter;
  /** The controlled diameter as drawn, mm. */
  controlledValue: number;
  analysis: SpringAnalysis;
  /** checkAnalysis's values, with the yield's (under min_yield) judged by the one rule of confirm.ts. */
  checks: Float64Array;
  /** The failing checks of the drawn spring (empty when it passes), as `check` names them. */
  failing: DrawnCheckName[];
  /** Force at the working length with the drawn free length, N, and its deviation from the requirement (fraction). */
  workingForce: number;
  workingForceDeviation: number;
  /** The seeded Monte Carlo yield of the drawn spring (min_yield only): the figure `check` prints for the file. */
  madeYield?: YieldResult;
}

interface Drawing {
  geometry: SpringGeometry;
  controlledValue: number;
  /** Order of preference of the controlled diameter: steps from its nearest rounding, then distance from its exact value. */
  diameterOffset: [number, number];
  analysis: SpringAnalysis;
  checks: Float64Array;
  workingForce: number;
}

function drawing(geometry: SpringGeometry, controlledValue: number, diameterOffset: [number, number], figures: MaterialFigures, req: Requirements): Drawing {
  const analysis = analyzeSpring(geometry, figures, springServiceConditions(req));
  return {
    geometry,
    controlledValue,
    diameterOffset,
    analysis,
    checks: checkAnalysis(analysis, req),
    workingForce: analysis.rate * (geometry.freeLength - req.workingLength),
  };
}

/** The failing checks of a drawing, design checks first, then the working-force band. */
function failingOf(s: Drawing, band: WorkingBand): DrawnCheckName[] {
  const failing: DrawnCheckName[] = [];
  if (s.workingForce < band.low * (1 - 1e-9)) failing.push('working_force_min');
  if (s.workingForce > band.high * (1 + 1e-9)) failing.push('working_force_max');
  CHECKS.forEach((name, i) => {
    if (s.checks[i] > 1e-9) failing.push(name);
  });
  return failing;
}

function result(s: Drawing, controlled: ControlledDiameter, req: Requirements, failing: DrawnCheckName[], madeYield?: YieldResult): DrawnSpring {
  return {
    geometry: s.geometry,
    controlled,
    controlledValue: s.controlledValue,
    analysis: s.analysis,
    checks: s.checks,
    failing,
    workingForce: s.workingForce,
    workingForceDeviation: (s.workingForce - req.workingForce) / req.workingForce,
    ...(madeYield ? { madeYield } : {}),
  };
}

/**
 * The spring at drawing precision. The drawings of the window (DRAWING_WINDOW) are tried in order of
 * preference: the controlled diameter nearest its exact value first, and at one diameter the free length
 * whose working force is nearest the requirement; the first that passes every check `check` applies
 * (the design checks, the working-force band and, under min_yield, the seeded Monte Carlo yield of the
 * drawn spring by the rule of confirm.ts) is kept. When none passes, the nearest drawing is returned
 * with its failing checks named.
 */
export function drawnSpring(
  spring: DesignedSpring,
  req: Requirements,
  precision = drawingPrecision(req.system, req.coilStep),
  window: { diameterSteps: number; freeLengthSteps: number } = DRAWING_WINDOW,
): DrawnSpring {
  const { geometry, figures } = spring;
  const d = geometry.wireDiameter;
  const controlled = controlledDiameter(req);
  const sign = controlled === 'outer' ? 1 : -1;
  const exact = geometry.meanDiameter + sign * d;
  const activeCoils = roundToStep(geometry.activeCoils, precision.coils);
  const band = workingBand(req);
  const nearest = roundToStep(exact, precision.diameter);
  const drawings: Drawing[] = [];
  for (let i = -window.diameterSteps; i <= window.diameterSteps; i++) {
    const c = roundToStep(nearest + i * precision.diameter, precision.diameter);
    const meanDiameter = c - sign * d;
    if (!(meanDiameter > d)) continue;
    const rate = springRate(figures.shearModulus, d, meanDiameter, activeCoils, req.directShear);
    // The free length that meets the working force at this diameter, as the maker would set it.
    const solved = roundToStep(req.workingLength + req.workingForce / rate, precision.freeLength);
    for (let j = -window.freeLengthSteps; j <= window.freeLengthSteps; j++) {
      const freeLength = roundToStep(solved + j * precision.freeLength, precision.freeLength);
      drawings.push(drawing({ ...geometry, meanDiameter, activeCoils, freeLength }, c, [Math.abs(i), Math.abs(c - exact)], figures, req));
    }
  }
  drawings.sort(
    (a, b) =>
      a.diameterOffset[0] - b.diameterOffset[0] ||
      a.diameterOffset[1] - b.diameterOffset[1] ||
      Math.abs(a.workingForce - req.workingForce) - Math.abs(b.workingForce - req.workingForce),
  );
  // The yield is a property of the made population: it depends on the drawn diameter, not on the free
  // length (each made spring's free length is set to its working force), so one Monte Carlo per diameter.
  const yields = new Map<number, YieldResult>();
  const yieldAt = (s: Drawing): YieldResult | undefined => {
    if (req.minYield === undefined) return undefined;
    let y = yields.get(s.controlledValue);
    if (!y) {
      y = springYieldFigures({ geometry: s.geometry, figures: figuresUnder(req, figures), material: spring.material }, req).monteCarlo;
      yields.set(s.controlledValue, y);
    }
    return y;
  };
  for (const s of drawings) {
    if (failingOf(s, band).length) continue;
    const y = yieldAt(s);
    if (y && yieldShortfall(y, req.minYield!) > 0) continue;
    if (y) s.checks[CHECK.yield] = yieldShortfall(y, req.minYield!);
    return result(s, controlled, req, [], y);
  }
  const first = drawings[0];
  const y = yieldAt(first);
  if (y) first.checks[CHECK.yield] = yieldShortfall(y, req.minYield!);
  return result(first, controlled, req, failingOf(first, band), y);
}
