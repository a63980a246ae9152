// `design` in the library: the springs that meet a set of requirements, best first. Takes the plain
// object a requirements file holds (quantities as numbers in its unit system, or strings with their
// unit such as "25 lbf") and returns exactly what `coilfront design --json` prints. The command is
// this function's reading and running steps with a file, options and a renderer around them.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { kindOf } from '../kinds/index.js';
import type { AnySpringKind, InUnits } from '../kinds/kind.js';
import { withCautions } from '../report/cautions.js';
import { sanitize } from '../report/json.js';
import type { StrategyChoice } from '../kinds/compression/design.js';
import { blamed, withRequirementOptions, type RankedOptions } from './options.js';
import type { DesignResult } from './types.js';

export interface DesignOptions extends RankedOptions {
  /** Also report the search time (search_ms), which makes the result differ from run to run. */
  timing?: boolean;
}

/** Requirements read from their document (overrides applied) by the kind the document names, with
 * the document kept for the advice. */
export interface DesignPlan<Req extends InUnits = InUnits> {
  kind: AnySpringKind;
  req: Req;
  document: unknown;
  catalog: Catalog;
}

/** Read a requirements document through its kind (src/kinds/index.ts); throws InputError naming the field. */
export function planDesign(document: unknown, catalog: Catalog = loadCatalog()): DesignPlan {
  const kind = kindOf(document);
  return { kind, req: kind.readRequirements(document, catalog), document, catalog };
}

/** The search of a plan: requirements -> candidates -> evaluation -> filters -> ranking. */
export function runPlan(plan: DesignPlan, options: { strategy?: StrategyChoice; onProgress?: (done: number, total: number) => void } = {}): unknown {
  return plan.kind.design(plan.req, plan.catalog, { strategy: options.strategy, onProgress: options.onProgress, document: plan.document });
}

/** The JSON record of a design run, as `design --json` prints it. */
export function designResult(plan: DesignPlan, run: unknown, timing = false): DesignResult {
  return sanitize(withCautions(plan.kind.report.designJson(run, timing), plan.kind)) as DesignResult;
}

export function design(requirements: unknown, options: DesignOptions = {}): DesignResult {
  const { document, overrides } = withRequirementOptions(requirements, options);
  const plan = blamed(() => planDesign(document, options.catalog), overrides);
  return designResult(plan, runPlan(plan, options), !!options.timing);
}
