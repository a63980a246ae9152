// The figure and limit behind each compression check, for people: what `check` prints beside each
// verdict and what design's nearest-miss lines give, so both read a miss in the same unit. The verdict
// itself is checkAnalysis's (verify.ts).
import { sig } from '../../units/format.js';
import type { CheckFigure } from '../../report/checkFigure.js';
import type { SpringAnalysis } from './analysis.js';
import type { Requirements } from './requirements.js';
import { forceBand, staticLimit, type CheckName } from './verify.js';

/** The figure of one check on a full analysis; `madeYield` the Monte Carlo yield where min_yield asks for it. */
export function checkFigure(name: CheckName, a: SpringAnalysis, req: Requirements, madeYield: number | null): CheckFigure {
  const g = a.geometry;
  switch (name) {
    case 'index_min':
      return { value: g.springIndex, limit: req.index[0], relation: '>=', kind: 'number' };
    case 'index_max':
      return { value: g.springIndex, limit: req.index[1], relation: '<=', kind: 'number' };
    case 'outer_diameter':
      return { value: g.outerDiameter, limit: req.maxOuterDiameter ?? null, relation: '<=', kind: 'length' };
    case 'inner_diameter':
      return { value: g.innerDiameter, limit: req.minInnerDiameter ?? null, relation: '>=', kind: 'length' };
    case 'free_length':
      return { value: g.freeLength, limit: req.maxFreeLength ?? null, relation: '<=', kind: 'length' };
    case 'solid_length':
      return { value: g.solidLength, limit: req.maxSolidLength ?? null, relation: '<=', kind: 'length' };
    case 'clash': {
      // In mm at the shortest working length: the coil clearance left to solid against the clearance the
      // clash allowance asks for (that share of the deflection there); the same test as the force overrun.
      const Lmin = a.clash.shortestLength;
      const overrun = Number.isFinite(a.clash.overrun) ? `${sig(a.clash.overrun * 100, 3)}% force overrun to solid` : 'no force there';
      return {
        value: Lmin - g.solidLength,
        limit: req.clashAllowance * (g.freeLength - Lmin),
        relation: '>=',
        kind: 'length',
        unitMargin: true,
        note: `coil clearance to solid at the ${req.operatingLength !== undefined ? 'operating' : 'working'} length against ${sig(req.clashAllowance * 100, 3)}% of the deflection there (${overrun}, asked ${sig(req.clashAllowance * 100, 3)}%)`,
      };
    }
    case 'coil_gaps':
      return { value: a.clash.gapSum, limit: a.clash.minGapSum, relation: '>=', kind: 'length', note: 'sum of coil gaps at the shortest length (EN 13906-1)' };
    case 'outer_diameter_at_solid':
      return { value: a.solid.outerDiameter, limit: req.maxOuterDiameter ?? null, relation: '<=', kind: 'length' };
    case 'static_stress': {
      const { limit, factor } = staticLimit(req, a.material.allowableStress);
      const tau = a.points.reduce((m, p) => Math.max(m, p.stress), -Infinity);
      return {
        value: tau,
        limit: limit / factor,
        relation: '<=',
        kind: 'stress',
        note: factor !== 1 ? `allowable / static safety factor ${factor}` : "the requirement's allowable_stress",
      };
    }
    case 'solid_stress':
      return { value: a.solid.stress, limit: staticLimit(req, a.material.allowableStress).limit, relation: '<=', kind: 'stress' };
    case 'fatigue':
      return { value: a.fatigue ? a.fatigue.safetyFactor : null, limit: req.safety.fatigue, relation: '>=', kind: 'number', note: 'fatigue safety factor' };
    case 'buckling':
      return a.buckling.absolutelyStable
        ? {
            value: a.buckling.maxDeflection,
            limit: null,
            relation: '<',
            kind: 'length',
            unitMargin: true,
            note: `largest deflection; absolutely stable at ${req.seating} seating (no deflection buckles it)`,
          }
        : {
            value: a.buckling.maxDeflection,
            limit: a.buckling.criticalDeflection,
            relation: '<',
            kind: 'length',
            unitMargin: true,
            note: `largest deflection against the critical deflection at ${req.seating} seating`,
          };
    case 'surge':
      return { value: a.surge.relevant, limit: req.forcingFrequency ? req.safety.surge * req.forcingFrequency : null, relation: '>=', kind: 'frequency' };
    case 'operating_force_min':
      return { value: a.points[a.points.length - 1].force, limit: req.operatingForce! * (1 - forceBand(req)), relation: '>=', kind: 'force' };
    case 'operating_force_max':
      return { value: a.points[a.points.length - 1].force, limit: req.operatingForce! * (1 + forceBand(req)), relation: '<=', kind: 'force' };
    case 'temperature':
      return { value: req.temperature ?? null, limit: a.material.maxTemperature, relation: '<=', kind: 'temperature' };
    case 'yield':
      return {
        value: madeYield,
        limit: req.minYield ?? null,
        relation: '>=',
        kind: 'percent',
        note: `share of made springs that pass every check: seeded Monte Carlo at EN 15800 grade ${req.tolerance.grade}${Object.keys(req.tolerance.overrides).length ? ' and the given tolerances' : ''}, accepted within its standard error`,
      };
  }
}
