// The bounds on settings that every input reader shares.
/**
 * Bounds on the search settings. Below them a setting is finer than any spring maker works to (a coil
 * count to 0.01 turn, a diameter to 1 um) and only multiplies the work; the work bound refuses a search
 * that would run for minutes, naming the setting to change instead of hanging.
 */
export const LIMITS = {
  /** Active coils: a spring needs at least one active turn; beyond 1000 it is a wire, not a spring. */
  activeCoils: [1, 1000] as [number, number],
  /** Coil-count step: from a hundredth of a turn (finer than a coiling machine holds) to 10 turns. */
  coilStep: [0.01, 10] as [number, number],
  /** Largest spring index worth searching (common practice: 4 to 12, rarely beyond 25). */
  indexMax: 100,
  /** Mean-diameter scan step: 1 um to 10 mm. */
  diameterResolution: [1e-3, 10] as [number, number],
  /** A safety factor beyond 100 admits no spring; a surge margin beyond 1000 neither (common practice asks 15 to 20). */
  safetyMax: 100,
  /**
   * Smallest safety factor or surge margin accepted. Below 1 the spring is designed to exceed its own
   * allowable stress (or to run at or below its surge frequency): never safe advice, so refused rather
   * than warned about. 1 designs to the allowable itself; common practice asks 1.1 to 1.5 (static) and
   * 1.3 to 2 (fatigue).
   */
  safetyMin: 1,
  surgeMarginMax: 1000,
  /** Solid force margin over the largest working force: up to 100%. */
  clashAllowanceMax: 1,
  /** Material x wire size x end type x coil count combinations one grid search may visit (the grid
   * visits every one: about 5 s at this size on a busy 2-core machine, see bench/results.md). Above it
   * the automatic choice is the genetic search, whose work is bounded by its evaluation budget instead,
   * and a grid the user forces is refused. A sweep bounds each value's search by the same rule, and
   * its number of values by --vary's own limit. */
  gridCombinations: 2_000_000,
  /** The genetic search's evaluation budget: 50 of 50 seeds reach the grid's optimum within 0.5% on
   * the every-material, every-end-type, coil_step 0.01 space at this budget (bench/results.md). */
  geneticEvaluations: 500_000,
};
