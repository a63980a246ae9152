// The yield estimate as the search's hot loop calls it: everything that does not change from one
// candidate to the next is worked out once per problem (per stock item the wire and shear-modulus
// half-widths, per stock item and end type the made-spring context and its check evaluator), so one
// call allocates nothing. It gives the same figure as cloudYields / springYield for the same spring:
// the half-widths are those of springTolerances, looked up without their notes and sources.
import type { Requirements } from '../requirements.js';
import type { MaterialFigures } from '../analysis.js';
import type { EndType } from '../geometry.js';
import type { MaterialChoice } from '../../../input/material.js';
import type { ToleranceCatalog } from './catalog.js';
import { estimateYield, yieldScratch, type CheckEvaluator, type YieldScratch } from './estimate.js';
import { madeSpringChecks, madeSpringContext, yieldChecks } from './madeSpring.js';
import { Q, TOLERANCED, meanDiameterHalfWidth, wireDiameterTolerance, type ToleranceOverride } from './model.js';

export interface YieldStockItem {
  choice: MaterialChoice;
  wireDiameter: number;
  figures: MaterialFigures;
}

export interface InSearchYield {
  /** Estimated yield of the spring (stock item i, end type e, mean diameter D, active coils Na). */
  estimate(i: number, e: number, D: number, Na: number): number;
  /** The scratch of the last call: its `limiting` and `pass` say which check limits the yield. */
  readonly scratch: YieldScratch;
}

function halfWidth(o: ToleranceOverride | undefined, nominal: number, fallback: number): number {
  if (!o) return fallback;
  return 'absolute' in o ? o.absolute : o.fraction * nominal;
}

export function inSearchYield(req: Requirements, stock: readonly YieldStockItem[], ends: readonly EndType[], catalog: ToleranceCatalog): InSearchYield {
  const o = req.tolerance.overrides;
  const grade = req.tolerance.grade;
  const F1 = req.workingForce;
  const n = stock.length;
  const wireSigma = new Float64Array(n);
  const shearSigma = new Float64Array(n);
  const evaluators: CheckEvaluator[] = [];
  stock.forEach((s, i) => {
    const d = s.wireDiameter;
    const G = s.figures.shearModulus;
    wireSigma[i] = halfWidth(o.wire_diameter, d, o.wire_diameter ? 0 : wireDiameterTolerance(catalog, s.choice.material, d).halfWidth) / 3;
    const row = catalog.shearModulus.find((r) => r.family === s.choice.material.family);
    shearSigma[i] = halfWidth(o.shear_modulus, G, row ? row.tolerance * G : 0) / 3;
    for (const end of ends) {
      const c = madeSpringContext(req, s.figures, end);
      evaluators.push((q, g) => madeSpringChecks(c, q, g));
    }
  });
  const forceSigma = halfWidth(o.working_force, F1, catalog.workingForce.tolerance * F1) / 3;
  const table = catalog.meanDiameter;
  const include = yieldChecks(req);
  const scratch = yieldScratch(TOLERANCED.length);
  const q = new Float64Array(TOLERANCED.length);
  const sigma = new Float64Array(TOLERANCED.length);
  const endCount = ends.length;
  return {
    scratch,
    estimate(i, e, D, Na) {
      const d = stock[i].wireDiameter;
      q[Q.wire_diameter] = d;
      q[Q.mean_diameter] = D;
      q[Q.shear_modulus] = stock[i].figures.shearModulus;
      q[Q.active_coils] = Na;
      q[Q.working_force] = F1;
      sigma[Q.wire_diameter] = wireSigma[i];
      sigma[Q.mean_diameter] = halfWidth(o.mean_diameter, D, o.mean_diameter ? 0 : meanDiameterHalfWidth(table, grade, D, D / d)) / 3;
      sigma[Q.shear_modulus] = shearSigma[i];
      sigma[Q.active_coils] = halfWidth(o.active_coils, Na, catalog.activeCoils.tolerance) / 3;
      sigma[Q.working_force] = forceSigma;
      return estimateYield(evaluators[i * endCount + e], q, sigma, include, scratch);
    },
  };
}
