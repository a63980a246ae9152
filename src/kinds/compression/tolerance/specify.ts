// One reported spring made ready for a specification: rounded to drawing precision and re-checked,
// its tolerances, its yield by estimate and by Monte Carlo, gathered as the specification sheet's input.
import type { Material } from '../../../catalogs/types.js';
import type { Requirements } from '../requirements.js';
import type { MaterialFigures, SpringAnalysis, SpringGeometry } from '../analysis.js';
import type { ToleranceCatalog } from './catalog.js';
import type { SpringTolerances, ToleranceRequest } from './model.js';
import type { MonteCarloOptions, YieldResult } from './monteCarlo.js';
import { drawnSpring, type DrawnSpring } from './precision.js';
import { springYield, type SpringYield } from './springYield.js';

export type CoilingDirection = 'right' | 'left' | 'optional';

/** What the sheet is made from: a reported spring (as drawn), its requirements, tolerances and yield. */
export interface SpecSheetInput {
  analysis: SpringAnalysis;
  requirements: Requirements;
  material: Material;
  tolerances: SpringTolerances;
  yield?: { estimate: number; monteCarlo?: YieldResult; seed?: number };
  /** Items the requirements do not carry; the sheet says "maker's choice" or "to be agreed" without them. */
  part?: string;
  coilingDirection?: CoilingDirection;
  finish?: string;
  /** Written as the sheet's date line (kept out by default so that the same input gives the same bytes). */
  date?: string;
}

export interface SpecifiedSpring {
  drawn: DrawnSpring;
  yield: SpringYield;
  sheet: SpecSheetInput;
}

/** The spring at `geometry` (a reported candidate) as drawn, toleranced and with its yield. */
export function specifySpring(
  catalog: ToleranceCatalog,
  request: ToleranceRequest,
  spring: { geometry: SpringGeometry; figures: MaterialFigures; material: Material },
  req: Requirements,
  opts: MonteCarloOptions = {},
): SpecifiedSpring {
  const drawn = drawnSpring(spring, req);
  const y = springYield(catalog, request, { geometry: drawn.geometry, figures: spring.figures, material: spring.material }, req, opts);
  return {
    drawn,
    yield: y,
    sheet: {
      analysis: drawn.analysis,
      requirements: req,
      material: spring.material,
      tolerances: y.tolerances,
      yield: { estimate: y.estimate, monteCarlo: y.monteCarlo, seed: Number(opts.seed ?? req.seed) },
    },
  };
}
