// `frontier` in the library: every spring on the trade-off front of two objectives. Takes the plain
// object a requirements file holds and returns exactly what `coilfront frontier --json` prints. The
// document's `kind` picks the spring kind (src/kinds/index.ts), whose objectives registry says which
// axes there are and whose frontier() finds the front.
import { frontierAxes, objectiveValue, type AnySpringKind, type KindFrontier } from '../kinds/kind.js';
import { kindOf } from '../kinds/index.js';
import { FRONTIER_KEYS, type FrontierKey } from '../kinds/compression/frontier.js';
import { cautionsOf } from '../report/cautions.js';
import { SI_UNITS, sanitize } from '../report/json.js';
import { InputError } from '../units/parse.js';
import { planDesign, type DesignPlan } from './design.js';
import { blamed, withRequirementOptions, type SearchOptions } from './options.js';
import type { FrontierResult } from './types.js';

export interface FrontierOptions extends SearchOptions {
  /** Objective on the x axis (default mass). */
  x?: FrontierKey;
  /** Objective on the y axis (default outer_diameter). */
  y?: FrontierKey;
}

/** The frontier axes of compression springs (a kind's own: frontierAxes(kind)). */
export const FRONTIER_AXES = Object.keys(FRONTIER_KEYS) as FrontierKey[];

/** A frontier axis of the kind, or one clear refusal naming the option. */
export function frontierAxis(kind: AnySpringKind, value: unknown, option: string, fallback: string): string {
  if (value === undefined) return fallback;
  const axes = frontierAxes(kind);
  if (typeof value !== 'string' || !axes.includes(value)) throw new InputError(option, `an objective of ${kind.label}s: ${axes.join(' | ')}`, value);
  return value;
}

/** The frontier of a plan on the axes x and y (checked by frontierAxis). */
export function frontierOfPlan(plan: DesignPlan, x: string, y: string, options: Pick<SearchOptions, 'strategy' | 'onProgress'> = {}): KindFrontier {
  return plan.kind.frontier(plan.req, plan.catalog, x, y, { strategy: options.strategy, onProgress: options.onProgress });
}

/** The JSON record of a frontier, as `frontier --json` prints it: framed by the kind (jsonFrame). */
export function frontierResult(kind: AnySpringKind, fr: KindFrontier): FrontierResult {
  const value = (c: unknown, key: string) => objectiveValue(kind.objectives, c as { objectives: Float64Array }, key);
  return sanitize({
    units: SI_UNITS,
    ...kind.report.jsonFrame.head,
    x: fr.x,
    y: fr.y,
    feasible: fr.cloud.length,
    ...kind.report.countsJson(fr.run),
    frontier_strategy: fr.strategy,
    frontier: fr.front.map((c) => ({ [fr.x]: value(c, fr.x), [fr.y]: value(c, fr.y), ...kind.report.candidateJson(c) })),
    ...kind.report.jsonFrame.tail,
    cautions: cautionsOf(kind),
  }) as FrontierResult;
}

export function frontier(requirements: unknown, options: FrontierOptions = {}): FrontierResult {
  const { document, overrides } = withRequirementOptions(requirements, { seed: options.seed });
  const kind = kindOf(document);
  const x = frontierAxis(kind, options.x, 'options.x', 'mass');
  const y = frontierAxis(kind, options.y, 'options.y', 'outer_diameter');
  if (x === y) throw new InputError('options.y', 'an objective other than options.x', y);
  const plan = blamed(() => planDesign(document, options.catalog), overrides);
  return frontierResult(kind, frontierOfPlan(plan, x, y, options));
}
