// `frontier` in the library: every spring on the trade-off front of two objectives. Takes the plain
// object a requirements file holds and returns exactly what `coilfront frontier --json` prints.
import type { Requirements } from '../kinds/compression/requirements.js';
import { candidateRecord, countsRecord } from '../report/designReport.js';
import { SI_UNITS, sanitize } from '../report/json.js';
import type { Candidate } from '../kinds/compression/design.js';
import { computeFrontier, FRONTIER_KEYS, type Frontier, type FrontierKey } from '../kinds/compression/frontier.js';
import { InputError } from '../units/parse.js';
import { planCompression, type DesignPlan } from './design.js';
import { blamed, withRequirementOptions, type SearchOptions } from './options.js';
import type { FrontierResult } from './types.js';

export interface FrontierOptions extends SearchOptions {
  /** Objective on the x axis (default mass). */
  x?: FrontierKey;
  /** Objective on the y axis (default outer_diameter). */
  y?: FrontierKey;
}

export const FRONTIER_AXES = Object.keys(FRONTIER_KEYS) as FrontierKey[];

function axis(value: unknown, name: string, fallback: FrontierKey): FrontierKey {
  if (value === undefined) return fallback;
  if (typeof value !== 'string' || !Object.hasOwn(FRONTIER_KEYS, value)) throw new InputError(name, `one of ${FRONTIER_AXES.join(' | ')}`, value);
  return value as FrontierKey;
}

/** The frontier of a plan on the axes x and y. */
export function frontierOfPlan(
  plan: DesignPlan<Requirements>,
  x: FrontierKey,
  y: FrontierKey,
  options: Pick<SearchOptions, 'strategy' | 'onProgress'> = {},
): Frontier {
  return computeFrontier(plan.req, x, y, options.onProgress, options.strategy);
}

/** The JSON record of a frontier, as `frontier --json` prints it. */
export function frontierResult(fr: Frontier): FrontierResult {
  const value = (c: Candidate, k: FrontierKey) => FRONTIER_KEYS[k].sign * c.objectives[FRONTIER_KEYS[k].objective];
  return sanitize({
    units: SI_UNITS,
    x: fr.x,
    y: fr.y,
    feasible: fr.cloud.length,
    ...countsRecord(fr.run),
    frontier_strategy: fr.strategy,
    frontier: fr.front.map((c) => ({ [fr.x]: value(c, fr.x), [fr.y]: value(c, fr.y), ...candidateRecord(c) })),
  }) as FrontierResult;
}

export function frontier(requirements: unknown, options: FrontierOptions = {}): FrontierResult {
  const x = axis(options.x, 'options.x', 'mass');
  const y = axis(options.y, 'options.y', 'outer_diameter');
  if (x === y) throw new InputError('options.y', 'an objective other than options.x', y);
  const { document, overrides } = withRequirementOptions(requirements, { seed: options.seed });
  const plan = blamed(() => planCompression(document, options.catalog), overrides);
  return frontierResult(frontierOfPlan(plan, x, y, options));
}
