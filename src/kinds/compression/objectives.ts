// The objectives of a compression spring, one definition each. One list decides what may rank the
// springs (`rank:`), what may be a frontier axis (`--x`, `--y`) and which have an LP lower bound; the
// search writes them into f[1..] in this order (f[0] is the one ranked by, copied), at
// f[Objective.mass] and so on. A quantity better larger (a safety factor) is stored negated (sign -1).
import { indexOf, type ObjectiveDefinition } from '../kind.js';

/** What relative_cost is, wherever it appears (CSV, JSON, the frontier's axis): the objective the
 * search computes, f[Objective.relative_cost] = mass * the material's relativeCost (problem.ts). */
export const RELATIVE_COST_NOTE =
  "the spring's mass in kg times its material's relative wire cost (hard-drawn carbon steel = 1.0; music wire 2.6, stainless 302 7.6; each material's factor and its source are in catalogs/materials.yaml, after Shigley Table 10-4, and `coilfront materials` lists them): the mass of hard-drawn wire that would cost as much. It compares materials and sizes; coiling, finishing and quantity are left out.";

export const COMPRESSION_OBJECTIVES = [
  { key: 'mass', label: 'mass', unit: 'mass', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: true },
  { key: 'wire_volume', label: 'wire volume', unit: 'volume', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: true },
  { key: 'outer_diameter', label: 'outer diameter', unit: 'length', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  { key: 'free_length', label: 'free length', unit: 'length', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  // Not a rank key: a cost index is a trade-off axis (mass x the catalog's relative cost factor), too
  // coarse a figure to pick one spring by.
  { key: 'relative_cost', label: 'relative cost (mass x cost factor)', unit: null, sign: 1, trend: 1, rankable: false, frontierAxis: true, lpBound: false },
  {
    key: 'safety_factor',
    label: 'safety factor (lowest of static and fatigue)',
    unit: null,
    sign: -1,
    trend: 0,
    rankable: true,
    frontierAxis: true,
    lpBound: false,
  },
  { key: 'static_safety', label: 'static safety factor', unit: null, sign: -1, trend: 0, rankable: false, frontierAxis: true, lpBound: false },
  { key: 'fatigue_safety', label: 'fatigue safety factor', unit: null, sign: -1, trend: 0, rankable: false, frontierAxis: true, lpBound: false },
] as const satisfies readonly ObjectiveDefinition[];

export type ObjectiveKey = (typeof COMPRESSION_OBJECTIVES)[number]['key'];

/** Names of the search's objective slots: f[0] is the ranked one, then the registry in order. */
export const OBJECTIVE_SLOTS = ['rank', ...COMPRESSION_OBJECTIVES.map((o) => (o.sign < 0 ? `neg_${o.key}` : o.key))] as const;

/** Slot of each objective in f[], for the hot loop: `f[Objective.mass]`; `Objective.rank` is 0. */
export const Objective = indexOf(['rank', ...COMPRESSION_OBJECTIVES.map((o) => o.key)] as ('rank' | ObjectiveKey)[]);

type Keys<P extends keyof (typeof COMPRESSION_OBJECTIVES)[number]> = Extract<(typeof COMPRESSION_OBJECTIVES)[number], { [K in P]: true }>['key'];
export type RankKey = Keys<'rankable'>;
export type FrontierKey = Keys<'frontierAxis'>;

export const RANK_KEYS = COMPRESSION_OBJECTIVES.filter((o) => o.rankable).map((o) => o.key) as RankKey[];
export const FRONTIER_AXES = COMPRESSION_OBJECTIVES.filter((o) => o.frontierAxis).map((o) => o.key) as FrontierKey[];

export function objectiveByKey(key: ObjectiveKey): (typeof COMPRESSION_OBJECTIVES)[number] {
  return COMPRESSION_OBJECTIVES.find((o) => o.key === key)!;
}
