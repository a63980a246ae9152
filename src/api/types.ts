// The records the library returns: exactly what the matching command prints with --json (SI units;
// a figure that does not apply is null, never NaN, Infinity or undefined). The fields named here are
// the ones a program is likely to read; every record carries the rest of the command's JSON as well.

/** The units of every figure in a record. */
export interface Units {
  length: 'mm';
  force: 'N';
  rate: 'N/mm';
  stress: 'MPa';
  mass: 'kg';
  density: 'kg/m^3';
  frequency: 'Hz';
  temperature: 'degC';
  volume: 'mm^3';
  angle: 'deg';
}

/** One spring the search found (one row of `design --json`'s candidates). */
export interface CandidateRecord {
  material: string;
  material_name: string;
  ends: string;
  wire_diameter: number;
  mean_diameter: number;
  outer_diameter: number;
  inner_diameter: number;
  spring_index: number;
  active_coils: number;
  total_coils: number;
  free_length: number;
  solid_length: number;
  rate: number;
  mass: number;
  wire_volume: number;
  static_safety_factor: number | null;
  fatigue_safety_factor: number | null;
  points: { length: number; force: number; stress: number }[];
  warnings: string[];
  [field: string]: unknown;
}

/** How a search went: what `design`, `frontier` and `sweep` report beside their springs. */
export interface SearchCounts {
  strategy: string;
  evaluated: number;
  cells: number;
  /** Feasible combinations among those evaluated: every feasible one when feasible_complete. */
  feasible: number;
  /** Combinations skipped unevaluated: their lightest possible spring could not make the list. */
  pruned: number;
  /** Whether `feasible` counts the whole space (a grid that skipped nothing); a genetic search or a
   * pruned grid counts only what it evaluated, which can grow as a requirement tightens. */
  feasible_complete: boolean;
  cut_by: Record<string, number>;
  lp_bound: number | null;
  lp_status: string;
  gap: number | null;
}

/** What `coilfront design --json` prints. */
export interface DesignResult extends SearchCounts {
  units: Units;
  /** The cautions of the spring's kind, in the words the text output ends with (general ones first). */
  cautions: string[];
  requirements: Record<string, unknown>;
  /** What the requirements mean for the checks, as the notes on stderr say it (compression springs:
   * cycles with no operating_length is no load cycle, so no fatigue check). */
  notes?: string[];
  /** Present with `timing: true` only (it makes the output differ from run to run). */
  search_ms?: number;
  /** Best first; empty when no spring meets every requirement (then `infeasible` says why). */
  candidates: CandidateRecord[];
  infeasible?: Record<string, unknown>;
  [field: string]: unknown;
}

/** What `coilfront analyze --json` prints. */
export interface AnalysisResult {
  units: Units;
  /** The cautions of the spring's kind, in the words the text output ends with (general ones first). */
  cautions: string[];
  material: Record<string, unknown>;
  geometry: Record<string, unknown>;
  rate: number;
  mass: number;
  points: { length: number; deflection: number; force: number; stress: number; stress_ratio: number | null }[];
  safety_factors: { static: number | null; fatigue: number | null };
  warnings: unknown[];
  notes: string[];
  [field: string]: unknown;
}

/** What `coilfront frontier --json` prints: the Pareto set on the two objectives x and y. */
export interface FrontierResult extends SearchCounts {
  units: Units;
  /** The cautions of the spring's kind, in the words the text output ends with (general ones first). */
  cautions: string[];
  x: string;
  y: string;
  frontier_strategy: 'grid' | 'genetic';
  /** Each spring with its two objective values under the keys named by x and y. */
  frontier: CandidateRecord[];
  [field: string]: unknown;
}

/** One run of a sweep: the value of the varied requirement and the best spring at it. */
export interface SweepRowRecord {
  value: number;
  /** As SearchCounts: feasible among the combinations evaluated, skipped (pruned), and whether that is all. */
  feasible: number;
  pruned: number;
  feasible_complete: boolean;
  best: CandidateRecord | null;
  /** The check that cut most when nothing is feasible. */
  limiting_check: string | null;
}

/** What `coilfront sweep --json` prints. */
export interface SweepResult {
  units: Units;
  /** The cautions of the spring's kind, in the words the text output ends with (general ones first). */
  cautions: string[];
  vary: string;
  note: string;
  /** The combinations of the whole sweep's searches, over all its values, and of its largest value
   * (each value's search is bounded as one design's). */
  combinations: { total: number; largest_value: number };
  /** How each value's best spring was confirmed beyond the search, when it was (compression under
   * min_yield: the seeded Monte Carlo, as design confirms its list). */
  confirmation?: string;
  rows: SweepRowRecord[];
}

/** What `coilfront check --json` and `stock --json` print (see the README for their fields). */
export type CheckResult = Record<string, unknown>;
export type StockResult = Record<string, unknown>;
