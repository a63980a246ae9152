// The checks of a compression spring, one definition each: name, label, trend in the mean diameter
// (the solved variable), when the requirements ask for it, and the requirement paths whose relaxation
// eases it. The search's hot loop addresses them through `Check` (g[Check.clash]), the single-spring
// re-verification and the advice through the same names, the reports through the labels.
//
// relaxedBy names the changes the advice (relax.ts) tries, by their `--set` path; where a value or a
// range eases different checks as it moves down or up, the way is said: 'operating_force (lower)'
// eases the stresses, 'operating_force (higher)' the clash; 'active_coils (lower)' lowers the least
// coil count (a shorter solid), 'active_coils (higher)' raises the most (a softer, less stressed coil).
import type { Requirements } from './requirements.js';
import { STATIC_SERVICE_CYCLES } from '../../model/fatigue.js';
import { indexOf, type CheckDefinition, type Trend } from '../kind.js';

const inc: Trend = 1;
const dec: Trend = -1;
const unk: Trend = 0;
const always = (t: Trend) => () => t;

/** Fatigue is judged when there is a stroke and enough cycles to count as fatigue service. */
export function fatigueApplies(req: Requirements): boolean {
  return req.cycles !== undefined && req.cycles >= STATIC_SERVICE_CYCLES && req.operatingLength !== undefined;
}

// Trends in the mean diameter D: the rate falls as D^-3, so the free length rises. The stresses mix a
// lever arm that rises with D and forces that fall with the rate: monotone only when the force is
// fixed (no stroke). Buckling mixes a longer free length with a wider coil. Those are scanned.
export const COMPRESSION_CHECKS = [
  { name: 'index_min', label: 'spring index below the lower bound', trend: always(dec), active: () => true, relaxedBy: ['index (lower)'] },
  { name: 'index_max', label: 'spring index above the upper bound', trend: always(inc), active: () => true, relaxedBy: ['index (higher)'] },
  {
    name: 'outer_diameter',
    label: 'outer diameter too large for the bore',
    trend: always(inc),
    active: (r) => r.maxOuterDiameter !== undefined,
    relaxedBy: ['envelope.max_outer_diameter'],
  },
  {
    name: 'inner_diameter',
    label: 'inner diameter too small for the rod',
    trend: always(dec),
    active: (r) => r.minInnerDiameter !== undefined,
    relaxedBy: ['envelope.min_inner_diameter'],
  },
  {
    name: 'free_length',
    label: 'free length above the limit',
    trend: always(inc),
    active: (r) => r.maxFreeLength !== undefined,
    relaxedBy: ['envelope.max_free_length', 'ends'],
  },
  {
    name: 'solid_length',
    label: 'solid length above the limit',
    trend: always(inc),
    active: (r) => r.maxSolidLength !== undefined,
    relaxedBy: ['envelope.max_solid_length', 'active_coils (lower)', 'ends'],
  },
  {
    name: 'clash',
    label: 'too little overrun to solid (clash allowance)',
    trend: always(inc),
    active: () => true,
    relaxedBy: ['operating_length', 'operating_force (higher)', 'active_coils (lower)', 'ends', 'clash_allowance'],
  },
  { name: 'coil_gaps', label: 'coil gaps below the EN 13906-1 minimum', trend: always(inc), active: (r) => r.gapRule, relaxedBy: ['coil_gap_rule'] },
  {
    name: 'outer_diameter_at_solid',
    label: 'outer diameter at solid too large for the bore',
    trend: always(inc),
    active: (r) => r.maxOuterDiameter !== undefined,
    relaxedBy: ['envelope.max_outer_diameter'],
  },
  {
    name: 'static_stress',
    label: 'stress above the static allowable (with its safety factor)',
    trend: (r) => (r.operatingLength === undefined ? inc : unk),
    active: () => true,
    relaxedBy: ['operating_length', 'operating_force (lower)', 'active_coils (higher)', 'material', 'safety.static'],
  },
  {
    name: 'solid_stress',
    label: 'stress at solid above the allowable (not solid-safe)',
    trend: always(unk),
    active: (r) => r.solidSafe,
    relaxedBy: ['solid_safe'],
  },
  {
    name: 'fatigue',
    label: 'fatigue safety factor below the target',
    trend: always(unk),
    active: fatigueApplies,
    relaxedBy: ['operating_length', 'operating_force (lower)', 'active_coils (higher)', 'cycles', 'peened', 'material', 'safety.fatigue'],
  },
  {
    name: 'buckling',
    label: 'buckles before the operating length',
    trend: always(unk),
    active: (r) => !r.guided,
    relaxedBy: ['operating_length', 'guided', 'seating'],
  },
  {
    name: 'surge',
    label: 'surge frequency too close to the forcing frequency',
    trend: always(inc),
    active: (r) => r.forcingFrequency !== undefined && r.forcingFrequency > 0,
    relaxedBy: ['safety.surge'],
  },
  {
    name: 'operating_force_min',
    label: 'operating force too low (rate too soft)',
    trend: always(inc),
    active: (r) => r.operatingForce !== undefined,
    relaxedBy: ['operating_force (lower)', 'load_tolerance', 'active_coils (higher)'],
  },
  {
    name: 'operating_force_max',
    label: 'operating force too high (rate too stiff)',
    trend: always(dec),
    active: (r) => r.operatingForce !== undefined,
    relaxedBy: ['operating_force (lower)', 'operating_force (higher)', 'load_tolerance', 'active_coils (higher)'],
  },
  {
    name: 'temperature',
    label: "service temperature above the material's maximum",
    trend: always(inc),
    active: (r) => r.temperature !== undefined,
    relaxedBy: ['material'],
  },
  // The share of made springs that pass every other check (min_yield): farther from a limit is better,
  // but a wider coil nears some limits while it leaves others, so the trend is unknown. Judged by the
  // estimate in the search, confirmed by the Monte Carlo for the reported springs (src/kinds/compression/tolerance/confirm.ts).
  {
    name: 'yield',
    label: 'too few made springs pass (yield below min_yield at the tolerances)',
    trend: always(unk),
    active: (r) => r.minYield !== undefined,
    relaxedBy: ['min_yield', 'tolerance_grade'],
  },
] as const satisfies readonly CheckDefinition<Requirements>[];

export type CheckName = (typeof COMPRESSION_CHECKS)[number]['name'];

/** Index of each check in g[], for the hot loop: `g[Check.clash]`. */
export const Check = indexOf(COMPRESSION_CHECKS.map((c) => c.name));

/** The order in which the advice names the checks one change eases (RelaxChange.eases): strength and
 * life first, then the forces, then the lengths and buckling, then the diameters and the index. */
export const ADVICE_ORDER: readonly CheckName[] = [
  'static_stress',
  'solid_stress',
  'fatigue',
  'temperature',
  'surge',
  'operating_force_min',
  'operating_force_max',
  'solid_length',
  'clash',
  'coil_gaps',
  'free_length',
  'buckling',
  'index_min',
  'index_max',
  'outer_diameter',
  'outer_diameter_at_solid',
  'inner_diameter',
  'yield',
];

/** The checks a change eases (a relaxedBy entry, as the advice names its changes), in ADVICE_ORDER. */
export function easedBy(change: string): CheckName[] {
  return ADVICE_ORDER.filter((c) => (COMPRESSION_CHECKS[Check[c]].relaxedBy as readonly string[]).includes(change));
}
