// Drawing precision: a spring as a drawing carries it (wire as listed, the controlled diameter to
// 0.01 mm or 0.001 in, the free length to 0.1 mm or 0.01 in, coils to the coil step), re-checked at
// those values. A search result sits on its limits to many digits; the spring the maker builds is the
// one on the drawing, so that is the one that must pass.
import type { Requirements } from '../requirements.js';
import { analyzeSpring, type MaterialFigures, type SpringAnalysis, type SpringGeometry } from '../analysis.js';
import { CHECKS, checkAnalysis, type CheckName } from '../verify.js';
import { springServiceConditions } from '../problem.js';
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

export interface DrawnSpring {
  geometry: SpringGeometry;
  controlled: ControlledDiameter;
  /** The controlled diameter as drawn, mm. */
  controlledValue: number;
  analysis: SpringAnalysis;
  checks: Float64Array;
  /** The failing checks of the drawn spring (empty when it passes). */
  failing: CheckName[];
  /** Force at the working length with the drawn free length, N, and its deviation from the requirement (fraction). */
  workingForce: number;
  workingForceDeviation: number;
}

function drawn(geometry: SpringGeometry, controlled: ControlledDiameter, controlledValue: number, figures: MaterialFigures, req: Requirements): DrawnSpring {
  const analysis = analyzeSpring(geometry, figures, springServiceConditions(req));
  const checks = checkAnalysis(analysis, req);
  const workingForce = analysis.rate * (geometry.freeLength - req.workingLength);
  return {
    geometry,
    controlled,
    controlledValue,
    analysis,
    checks,
    failing: CHECKS.filter((_, i) => checks[i] > 1e-9),
    workingForce,
    workingForceDeviation: (workingForce - req.workingForce) / req.workingForce,
  };
}

/**
 * The spring at drawing precision. Of the roundings of the controlled diameter and the free length
 * (nearest first, then down and up), the first that passes every check is kept, the one with the
 * working force closest to the requirement among those; when none passes, the nearest rounding is
 * returned with its failing checks named.
 */
export function drawnSpring(
  geometry: SpringGeometry,
  figures: MaterialFigures,
  req: Requirements,
  precision = drawingPrecision(req.system, req.coilStep),
): DrawnSpring {
  const d = geometry.wireDiameter;
  const controlled = controlledDiameter(req);
  const sign = controlled === 'outer' ? 1 : -1;
  const diameter = geometry.meanDiameter + sign * d;
  const activeCoils = roundToStep(geometry.activeCoils, precision.coils);
  const modes = ['nearest', 'down', 'up'] as const;
  let best: DrawnSpring | undefined;
  let first: DrawnSpring | undefined;
  for (const dm of modes) {
    for (const lm of modes) {
      const c = roundToStep(diameter, precision.diameter, dm);
      const g: SpringGeometry = {
        ...geometry,
        meanDiameter: c - sign * d,
        activeCoils,
        freeLength: roundToStep(geometry.freeLength, precision.freeLength, lm),
      };
      const s = drawn(g, controlled, c, figures, req);
      first ??= s;
      if (s.failing.length === 0 && (!best || Math.abs(s.workingForceDeviation) < Math.abs(best.workingForceDeviation))) best = s;
    }
    if (best) return best;
  }
  return first!;
}
