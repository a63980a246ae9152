// One cell of the search: the discrete (and scanned) variables fixed, the solved variable free.
// The feasible interval of the solved variable is bracketed by bisection on the constraints that are
// monotone in it; the rest (checks of unknown trend) are searched on the variable's resolution grid
// by interval bisection from the left: a sub-interval whose bracket lower bound is above zero is
// ruled out whole, and only the sub-intervals where feasibility can begin are split further, so the
// work grows with the logarithm of the resolution instead of linearly. This is the shared inner
// routine of the grid and of the genetic search's repair, so both judge candidates alike.
// A check passes when g <= 0 exactly: no tolerance, so a reported point never shows a positive check.
import { TREND, type Problem } from './problem.js';

/** What a run has spent and seen, kept apart from the per-cell scratch so that every workspace of
 * one run (the genetic search's coarse, fine and final ones) adds to the same counts. */
export interface RunStats {
  /** Evaluations spent, cumulative. */
  evaluations: number;
  /** Calls of the problem's bounds: bracket bounds, branch and range hints (each about the cost of one evaluation). */
  boundCalls: number;
  /** Cells proved infeasible by the bracket bounds, without a scan. */
  boundedOut: number;
  /** Per constraint: cells it cut (the worst violation at the cell's least-violation point). */
  cutBy: Float64Array;
  /** Per constraint: the smallest violation seen where it was the only one violated (what to relax). */
  soleViolation: Float64Array;
}

export function makeRunStats(p: Problem): RunStats {
  const m = p.constraintNames.length;
  return { evaluations: 0, boundCalls: 0, boundedOut: 0, cutBy: new Float64Array(m), soleViolation: new Float64Array(m).fill(Infinity) };
}

/** The cell solver's state: its settings (tolerances, scan step, whether bounds narrow the scan), the
 * scratch of the cell in hand (last evaluation, least-violation point, boundary search results) and
 * the run's statistics. */
export interface CellWorkspace {
  /** The run's counts (shared between the workspaces of one run). */
  stats: RunStats;
  g: Float64Array;
  f: Float64Array;
  bounds: Float64Array;
  /** The least-violation point of the current cell (read after an infeasible cell). */
  missX: Float64Array;
  missG: Float64Array;
  missF: Float64Array;
  missViolation: number;
  incMask: Uint8Array;
  decMask: Uint8Array;
  /** Bisection stops when the interval is this fraction of its value. */
  relativeTolerance: number;
  /** In mode All, scan at most this many points per cell (the step grows past the resolution). */
  maxScanPoints: number;
  /** Scan at this many times the variable's resolution (1 for the grid; coarser for a quick look). */
  scanCoarsening: number;
  /** Scratch for the problem's bracket bounds. */
  lower: Float64Array;
  /** Rule out sub-intervals of the scan by the bracket bounds. Off, every scan point of a cell that
   * survives its whole-bracket bound is evaluated: slower, but the least-violation point of each
   * infeasible cell is then the one of a full scan (the diagnostics of a search that found nothing). */
  narrowing: boolean;
  /** The worst increasing and decreasing constraint of the last evaluation. */
  worstInc: number;
  worstDec: number;
  /** Left by the boundary searches: see there. */
  badValue: number;
  badObjective: number;
  lastAtGood: boolean;
  lastTotal: number;
  /** After a cell is pruned: pruneF[0] holds the bound on its objective that lost, and
   * prunedAtLowest says whether it was taken at the solved variable's lowest value (the bound
   * `boundGrowsAlong` speaks of) or higher up, after bracketing. */
  pruneF: Float64Array;
  prunedAtLowest: boolean;
  /** Set by the scan when an increasing check fails: nothing further up can pass. */
  stop: boolean;
  /** Set by the caller before each cell: the value of objective 0 that a point must beat to be kept
   * (the k-th best so far), Infinity for none. With the problem's objectiveCeiling, a cell whose
   * points cannot beat it is skipped, and a scan stops where they no longer can. */
  cap: number;
  /** Find the decreasing checks' coarse boundary by replaying bisection around a tight bracket of it
   * (decBisection): the same point for fewer evaluations. Off, every midpoint is evaluated. */
  replay: boolean;
}

export function makeWorkspace(p: Problem, relativeTolerance = 1e-10, stats: RunStats = makeRunStats(p)): CellWorkspace {
  const m = p.constraintNames.length;
  const incMask = new Uint8Array(m);
  const decMask = new Uint8Array(m);
  for (let j = 0; j < m; j++) {
    const t = p.constraintTrend ? p.constraintTrend[j] : TREND.unknown;
    if (t === TREND.increasing) incMask[j] = 1;
    else if (t === TREND.decreasing) decMask[j] = 1;
  }
  return {
    g: new Float64Array(m),
    f: new Float64Array(p.objectiveNames.length),
    bounds: new Float64Array(2),
    stats,
    missX: new Float64Array(p.variables.length),
    missG: new Float64Array(m),
    missF: new Float64Array(p.objectiveNames.length),
    missViolation: Infinity,
    incMask,
    decMask,
    relativeTolerance,
    maxScanPoints: Infinity,
    scanCoarsening: 1,
    worstInc: -Infinity,
    worstDec: -Infinity,
    lower: new Float64Array(m),
    narrowing: true,
    badValue: NaN,
    badObjective: NaN,
    lastAtGood: false,
    lastTotal: NaN,
    pruneF: new Float64Array(p.objectiveNames.length),
    prunedAtLowest: false,
    stop: false,
    cap: Infinity,
    replay: false,
  };
}

/** Evaluate at x and keep the bookkeeping that every evaluation feeds. Returns the total violation. */
function evaluateAt(p: Problem, x: Float64Array, ws: CellWorkspace): number {
  p.evaluate(x, ws.g, ws.f);
  ws.stats.evaluations++;
  const g = ws.g;
  const inc = ws.incMask;
  let total = 0;
  let count = 0;
  let sole = -1;
  let wInc = -Infinity;
  let wDec = -Infinity;
  for (let j = 0; j < g.length; j++) {
    const v = g[j];
    if (v > 0) {
      total += v;
      count++;
      sole = j;
    }
    if (inc[j] === 1) {
      if (v > wInc) wInc = v;
    } else if (ws.decMask[j] === 1 && v > wDec) wDec = v;
  }
  ws.worstInc = wInc;
  ws.worstDec = wDec;
  if (count === 1 && g[sole] < ws.stats.soleViolation[sole]) ws.stats.soleViolation[sole] = g[sole];
  if (count > 0 && total < ws.missViolation) {
    ws.missViolation = total;
    ws.missX.set(x);
    ws.missG.set(g);
    ws.missF.set(ws.f);
  }
  return total;
}

function attributeCut(ws: CellWorkspace, g: Float64Array): void {
  let jw = 0;
  for (let j = 1; j < g.length; j++) if (g[j] > g[jw]) jw = j;
  ws.stats.cutBy[jw]++;
}

/**
 * Bisect [a, b] for the boundary of the masked constraints, keeping the feasible end: with
 * `badBelow` they fail at a and hold at b (return the smallest value that holds), otherwise they
 * hold at a and fail at b (return the largest). The failing end is left in ws.bounds[0], and the
 * worst masked value and objective 0 seen there in ws.badValue and ws.badObjective (NaN when that
 * end is where it started).
 */
function boundary(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, a: number, b: number, mask: Uint8Array, badBelow: boolean, tol: number): number {
  let badValue = NaN;
  let badObjective = NaN;
  ws.lastAtGood = false;
  while (b - a > tol) {
    const m = 0.5 * (a + b);
    x[s] = m;
    const total = evaluateAt(p, x, ws);
    const w = mask === ws.incMask ? ws.worstInc : ws.worstDec;
    const bad = w > 0;
    if (bad === badBelow) a = m;
    else b = m;
    if (bad) {
      badValue = w;
      badObjective = ws.f[0];
    }
    ws.lastAtGood = !bad;
    ws.lastTotal = total;
  }
  ws.bounds[0] = badBelow ? a : b;
  ws.badValue = badValue;
  ws.badObjective = badObjective;
  return badBelow ? b : a;
}

/**
 * The point that boundary(.., decMask, badBelow = true, tol) returns, the very end that plain
 * bisection of [a, b] stops at, for fewer evaluations. The decreasing checks fail at a (worst value
 * fa > 0) and hold at b (fb <= 0), and only loosen upwards: a midpoint below a point where they fail
 * fails them too, one above a point where they hold holds them. So the bisection is replayed,
 * evaluating a midpoint only when it lies between the highest failing and the lowest holding point
 * evaluated so far, and that gap is narrowed first by probes on either side of the regula falsi
 * estimate (Illinois: Dowell and Jarratt, BIT 11 (1971) 168-174), nudged past it by a fraction of the
 * last bisection step. A linear check (a rod) is settled by two probes: a cell costs about four
 * evaluations here instead of a dozen. After a probe that fails to halve the gap, the next waits for
 * two midpoints to be evaluated, then four, and so on, so a check the estimate serves badly costs
 * bisection and a few probes. The failing end left in ws.bounds[0] is the highest failing point evaluated (a itself
 * when none was), with its worst value and objective 0 in ws.badValue and ws.badObjective (NaN when
 * it is a): every feasible point lies above it, as above a bisection's.
 */
function decBisection(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, a: number, fa: number, b: number, fb: number, tol: number): number {
  // The width that plain bisection stops at; the probes aim a quarter of it apart.
  let width = b - a;
  while (width > tol) width *= 0.5;
  const delta = 0.125 * width;
  const q = gap;
  q.ra = a;
  q.va = fa;
  q.rb = b;
  q.vb = fb;
  q.raValue = NaN;
  q.raObjective = NaN;
  q.lastAt = NaN;
  q.lastGood = false;
  q.lastTotal = NaN;
  let side = 0;
  let wait = 0;
  let backoff = 2;
  let lo = a;
  let hi = b;
  while (hi - lo > tol) {
    const m = 0.5 * (lo + hi);
    if (m <= q.ra) {
      lo = m;
      continue;
    }
    if (m >= q.rb) {
      hi = m;
      continue;
    }
    if (wait === 0 && q.rb - q.ra > 2 * delta) {
      let r = q.va > 0 && q.vb <= 0 ? q.rb - (q.vb * (q.rb - q.ra)) / (q.vb - q.va) : m;
      r -= side * delta;
      if (r > q.ra && r < q.rb && Math.abs(r - m) > delta) {
        const before = q.rb - q.ra;
        probeGap(p, s, x, ws, r);
        const now = q.lastGood ? 1 : -1;
        // Illinois: an end that stays put twice has its value halved, so that the next estimate moves it.
        if (now === side) {
          if (now === 1) q.va *= 0.5;
          else q.vb *= 0.5;
        }
        side = now;
        if (q.rb - q.ra > 0.5 * before) {
          wait = backoff;
          backoff *= 2;
        } else backoff = 2;
        continue;
      }
    }
    probeGap(p, s, x, ws, m);
    if (q.lastGood) hi = m;
    else lo = m;
    if (wait > 0) wait--;
  }
  ws.bounds[0] = q.ra;
  ws.badValue = q.raValue;
  ws.badObjective = q.raObjective;
  ws.lastAtGood = q.lastGood && q.lastAt === hi;
  ws.lastTotal = q.lastTotal;
  return hi;
}

/** decBisection's gap between the highest failing (ra, worst value va as Illinois weighs it, raValue as
 * evaluated) and the lowest holding point (rb, vb) evaluated, and its last evaluation; one object
 * reused, so that a cell allocates nothing. */
const gap = { ra: 0, va: 0, rb: 0, vb: 0, raValue: NaN, raObjective: NaN, lastAt: NaN, lastGood: false, lastTotal: NaN };

/** Evaluate at m and narrow decBisection's gap by what the decreasing checks show there. */
function probeGap(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, m: number): void {
  const q = gap;
  x[s] = m;
  q.lastTotal = evaluateAt(p, x, ws);
  q.lastAt = m;
  const v = ws.worstDec;
  q.lastGood = !(v > 0);
  if (q.lastGood) {
    q.rb = m;
    q.vb = v;
  } else {
    q.ra = m;
    q.va = v;
    q.raValue = v;
    q.raObjective = ws.f[0];
  }
}

/**
 * The boundary of the decreasing constraints in [a, b] to `tol`, where they fail at a (worst value
 * fa > 0) and hold at b (fb <= 0): regula falsi with the Illinois modification (Dowell and Jarratt,
 * BIT 11 (1971) 168-174), which keeps a bracket like bisection but converges superlinearly on a
 * smooth check: about 6 evaluations instead of 20 to go from a scan step to 1e-10. A step that fails
 * to halve the bracket twice running is replaced by a bisection, so it is never slower than
 * bisection by more than a third. Returns the end that holds; ws.lastAtGood says whether the last
 * evaluation was there.
 */
function decBoundary(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, a: number, fa: number, b: number, fb: number, tol: number): number {
  let side = 0;
  let slow = 0;
  ws.lastAtGood = false;
  const margin = 0.25 * tol;
  while (b - a > tol) {
    const width = b - a;
    let m = slow >= 2 || !(fa > 0) || !(fb <= 0) ? 0.5 * (a + b) : b - (fb * (b - a)) / (fb - fa);
    if (!(m >= a + margin)) m = a + margin;
    else if (!(m <= b - margin)) m = b - margin;
    x[s] = m;
    ws.lastTotal = evaluateAt(p, x, ws);
    const v = ws.worstDec;
    if (v > 0) {
      a = m;
      fa = v;
      if (side === -1) fb *= 0.5;
      side = -1;
      ws.lastAtGood = false;
    } else {
      b = m;
      fb = v;
      if (side === 1) fa *= 0.5;
      side = 1;
      ws.lastAtGood = true;
    }
    slow = b - a > 0.5 * width ? slow + 1 : 0;
  }
  // The answer is made canonical: the first point of the lattice q Z (q, the power of two at or below
  // tol) where the checks hold, whatever bracket the search started from, so that a finer scan
  // resolution (another starting bracket) can never give a worse boundary point.
  const q = 2 ** Math.floor(Math.log2(tol));
  for (let c = Math.floor(a / q) * q + q; ; c += q) {
    if (c === b) return b;
    x[s] = c;
    ws.lastTotal = evaluateAt(p, x, ws);
    // Past b the decreasing checks hold (they only loosen upwards).
    if (ws.worstDec <= 0 || c > b) {
      ws.lastAtGood = true;
      return c;
    }
  }
}

/** The feasible point at `good` came from a coarse bracket (and x, ws are at it): move it down to the
 * decreasing constraints' boundary at full precision, if every check still holds there. Leaves x,
 * ws.f and ws.g at the point kept. */
function refineLow(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, bad: number, badValue: number, good: number, tol: number): void {
  const fine = decBoundary(p, s, x, ws, bad, badValue, good, ws.worstDec, tol);
  if (fine !== good) {
    if (ws.lastAtGood && ws.lastTotal === 0) return;
    x[s] = fine;
    if (evaluateAt(p, x, ws) === 0) return;
  }
  x[s] = good;
  evaluateAt(p, x, ws);
}

/** True when the problem's bracket bounds prove [lo, hi] infeasible for a check of unknown trend. */
function excluded(p: Problem, x: Float64Array, lo: number, hi: number, ws: CellWorkspace): boolean {
  ws.lower.fill(-Infinity);
  p.bracketBounds!(x, lo, hi, ws.lower);
  ws.stats.boundCalls++;
  for (let j = 0; j < ws.lower.length; j++) {
    if (ws.lower[j] > 0 && ws.incMask[j] === 0 && ws.decMask[j] === 0) return true;
  }
  return false;
}

/** The same for a whole cell, counted. */
function boundedOut(p: Problem, x: Float64Array, lo: number, hi: number, ws: CellWorkspace): boolean {
  if (!excluded(p, x, lo, hi, ws)) return false;
  ws.stats.boundedOut++;
  return true;
}

/** Intervals of at most this many scan points are evaluated point by point (a bound costs about one
 * evaluation, so splitting further saves nothing). */
const LEAF_POINTS = 3;

/**
 * The scan grid of a bracket: points lo + k step for k = 0 .. last - 1, and hi itself as point `last`
 * (the first multiple of the step at or past hi is clipped to it). Interval bisection over point
 * indices visits the feasible points in increasing order, exactly those a linear scan would find,
 * skipping every sub-interval the bracket bounds rule out.
 */
class ScanGrid {
  lo = 0;
  hi = 0;
  step = 1;
  last = 0;
  set(lo: number, hi: number, step: number): void {
    this.lo = lo;
    this.hi = hi;
    this.step = step;
    let k = Math.max(0, Math.ceil((hi - lo) / step));
    while (k > 0 && lo + (k - 1) * step >= hi) k--;
    while (lo + k * step < hi) k++;
    this.last = k;
  }
  at(k: number): number {
    return k >= this.last ? this.hi : this.lo + k * this.step;
  }
  /** Index of the last point at or below v, -1 when there is none. */
  lastAtOrBelow(v: number): number {
    if (v >= this.hi) return this.last;
    let k = Math.max(-1, Math.min(this.last - 1, Math.floor((v - this.lo) / this.step)));
    while (k >= 0 && this.at(k) > v) k--;
    while (k + 1 < this.last && this.at(k + 1) <= v) k++;
    return k;
  }
}

/** Index of the first feasible scan point in [ka, kb], or -1. `checked`: the caller has already
 * tried the bounds on this interval. */
function firstFeasible(p: Problem, s: number, x: Float64Array, ws: CellWorkspace, grid: ScanGrid, ka: number, kb: number, checked: boolean): number {
  if (kb - ka + 1 > LEAF_POINTS && p.bracketBounds && ws.narrowing) {
    if (!checked && excluded(p, x, grid.at(ka), grid.at(kb), ws)) return -1;
    const mid = (ka + kb) >>> 1;
    const r = firstFeasible(p, s, x, ws, grid, ka, mid, false);
    return r >= 0 || ws.stop ? r : firstFeasible(p, s, x, ws, grid, mid + 1, kb, false);
  }
  for (let k = ka; k <= kb; k++) {
    x[s] = grid.at(k);
    if (evaluateAt(p, x, ws) === 0) return k;
    // An increasing check that fails here fails at every later point.
    if (ws.worstInc > 0) {
      ws.stop = true;
      return -1;
    }
  }
  return -1;
}

/** Visit every feasible scan point in [ka, kb] in increasing order; true when any was found. */
function everyFeasible(
  p: Problem,
  s: number,
  x: Float64Array,
  ws: CellWorkspace,
  grid: ScanGrid,
  ka: number,
  kb: number,
  checked: boolean,
  visit: ((x: Float64Array, f: Float64Array, g: Float64Array) => void) | null,
): boolean {
  if (kb - ka + 1 > LEAF_POINTS && p.bracketBounds && ws.narrowing) {
    if (!checked && excluded(p, x, grid.at(ka), grid.at(kb), ws)) return false;
    const mid = (ka + kb) >>> 1;
    const left = everyFeasible(p, s, x, ws, grid, ka, mid, false, visit);
    return everyFeasible(p, s, x, ws, grid, mid + 1, kb, false, visit) || left;
  }
  let found = false;
  for (let k = ka; k <= kb; k++) {
    x[s] = grid.at(k);
    if (evaluateAt(p, x, ws) === 0) {
      found = true;
      if (visit !== null) visit(x, ws.f, ws.g);
    }
  }
  return found;
}

const scanGrid = new ScanGrid();

function infeasibleCell(ws: CellWorkspace): false {
  attributeCut(ws, ws.missG);
  return false;
}

/** A problem with no solved variable: the cell is the single point x. */
export function evaluateFixed(p: Problem, x: Float64Array, ws: CellWorkspace): boolean {
  ws.missViolation = Infinity;
  if (evaluateAt(p, x, ws) === 0) return true;
  return infeasibleCell(ws);
}

export const enum CellMode {
  First = 0,
  All = 1,
}

/**
 * Solve one cell. x holds the cell's fixed values; on return with `true`, x[s] holds the first
 * feasible value of the solved variable (mode First) and ws.f / ws.g its evaluation. In mode All
 * every feasible scan point is passed to `visit` and the return says whether any was found.
 * `prune(f)`: return true to abandon the cell when the objective at its lowest bound shows it cannot win.
 */
export function solveCell(
  p: Problem,
  s: number,
  x: Float64Array,
  ws: CellWorkspace,
  mode: CellMode,
  visit: ((x: Float64Array, f: Float64Array, g: Float64Array) => void) | null,
  prune: ((f: Float64Array) => boolean) | null,
): boolean | 'pruned' {
  const v = p.variables[s];
  if (v.kind !== 'continuous') throw new Error('solved variable must be continuous');
  let lo = v.min;
  let hi = v.max;
  if (p.solvedBounds) {
    ws.bounds[0] = lo;
    ws.bounds[1] = hi;
    p.solvedBounds(x, ws.bounds);
    lo = Math.max(lo, ws.bounds[0]);
    hi = Math.min(hi, ws.bounds[1]);
  }
  ws.missViolation = Infinity;
  if (!(hi >= lo)) {
    // The bounds hook found no interval: evaluate at the bound it gave to learn which checks cut it.
    x[s] = lo;
    evaluateAt(p, x, ws);
    return infeasibleCell(ws);
  }
  const increasing = p.objectiveTrend !== undefined && p.objectiveTrend[0] === TREND.increasing;
  // Past the ceiling no point can beat the k-th best kept: a cell that starts past it is skipped
  // before any evaluation, as it would be after its first. (Eased outwards by a part in 1e9: the
  // ceiling is worked out apart from evaluate(), and a point it leaves in is judged by its own value.)
  let ceiling = Infinity;
  if (prune !== null && increasing && ws.cap < Infinity && p.objectiveCeiling !== undefined) {
    const c = p.objectiveCeiling(x, ws.cap);
    if (c === c) ceiling = c + Math.abs(c) * 1e-9;
    if (ceiling < lo) {
      ws.pruneF[0] = ws.cap;
      ws.prunedAtLowest = true;
      return 'pruned';
    }
  }
  const tol = ws.relativeTolerance * Math.max(Math.abs(lo), Math.abs(hi), 1e-12);
  // Bracket first to a fraction of the scan step; only the end that turns out to be the answer is
  // then refined to full precision (most cells fail elsewhere, and this halves their cost).
  const coarse = Math.max(tol, (v.resolution * ws.scanCoarsening) / 4);
  let loBad = NaN;
  // Only the first feasible point is wanted, and the objective grows with the solved variable.
  const first = mode === CellMode.First && p.objectiveTrend !== undefined && p.objectiveTrend[0] === TREND.increasing;

  // Increasing constraints only get worse upwards: if violated at lo, the cell is lost.
  x[s] = lo;
  let total = evaluateAt(p, x, ws);
  if (prune !== null && increasing && prune(ws.f)) {
    ws.pruneF[0] = ws.f[0];
    ws.prunedAtLowest = true;
    return 'pruned';
  }
  const loDec = ws.worstDec;
  const loObjective = ws.f[0];
  let loBadValue = NaN;
  if (ws.worstInc > 0) return infeasibleCell(ws);
  if (total === 0 && mode === CellMode.First && p.objectiveTrend && p.objectiveTrend[0] === TREND.increasing) return true;
  // The same bound over the whole interval often settles a hopeless cell before any bisection.
  if (p.bracketBounds && ws.narrowing && boundedOut(p, x, lo, hi, ws)) return infeasibleCell(ws);
  // Decreasing constraints tighten downwards: find the smallest value that meets them.
  if (ws.worstDec > 0) {
    x[s] = hi;
    evaluateAt(p, x, ws);
    if (ws.worstDec > 0) return infeasibleCell(ws);
    lo = ws.replay ? decBisection(p, s, x, ws, lo, loDec, hi, ws.worstDec, coarse) : boundary(p, s, x, ws, lo, hi, ws.decMask, true, coarse);
    loBad = ws.bounds[0];
    loBadValue = ws.badValue === ws.badValue ? ws.badValue : loDec;
    // Every feasible point lies above loBad, so the objective there bounds the cell from below.
    if (prune !== null && increasing) {
      ws.pruneF[0] = ws.badObjective === ws.badObjective ? ws.badObjective : loObjective;
      if (prune(ws.pruneF)) {
        ws.prunedAtLowest = false;
        return 'pruned';
      }
    }
    if (ceiling < lo) {
      ws.pruneF[0] = ws.cap;
      ws.prunedAtLowest = false;
      return 'pruned';
    }
  }
  if (first) {
    // Only the first feasible point is wanted: the increasing checks need no bracket of their own,
    // since the scan stops at the first point where one fails (all later points fail it too).
    if (loBad === loBad) {
      // The bracket's last evaluation may have been at lo itself (x, ws are still there).
      const total = ws.lastAtGood ? ws.lastTotal : ((x[s] = lo), evaluateAt(p, x, ws));
      if (total === 0) {
        refineLow(p, s, x, ws, loBad, loBadValue, lo, tol);
        return true;
      }
      const w = ws.worstInc;
      // A hair's breadth of violation (see below): settle lo exactly and look again.
      if (w > 0 && w < (300 * coarse) / Math.max(Math.abs(lo), 1e-12)) {
        lo = decBoundary(p, s, x, ws, loBad, loBadValue, lo, ws.worstDec, tol);
        loBad = NaN;
        x[s] = lo;
        if (evaluateAt(p, x, ws) === 0) return true;
      }
      if (ws.worstInc > 0) return infeasibleCell(ws);
    }
    // lo itself has been tried and fails a check of unknown trend. The scan stops at the ceiling: a
    // cell whose feasible points all lie past it is pruned, not cut.
    const grid = scanGrid;
    grid.set(lo, hi, v.resolution * ws.scanCoarsening);
    const end = ceiling < hi ? grid.lastAtOrBelow(ceiling) : grid.last;
    ws.stop = false;
    const k = end < 1 ? -1 : firstFeasible(p, s, x, ws, grid, 1, end, false);
    if (k >= 0) return true;
    if (end < grid.last && !ws.stop) {
      ws.pruneF[0] = ws.cap;
      ws.prunedAtLowest = false;
      return 'pruned';
    }
    return infeasibleCell(ws);
  }
  // And the largest value that still meets the increasing ones.
  x[s] = hi;
  evaluateAt(p, x, ws);
  if (ws.worstInc > 0) {
    x[s] = lo;
    evaluateAt(p, x, ws);
    const w = ws.worstInc;
    // A hair's breadth of violation: the feasible interval may be narrower than the coarse bracket, so
    // settle lo exactly and look again. Normalised checks move by a few units per unit of relative
    // change of the solved variable; a violation 100 times what the coarse step could undo is real.
    if (w > 0 && w < (300 * coarse) / Math.max(Math.abs(lo), 1e-12) && loBad === loBad) {
      lo = decBoundary(p, s, x, ws, loBad, loBadValue, lo, ws.worstDec, tol);
      loBad = NaN;
      x[s] = lo;
      evaluateAt(p, x, ws);
    }
    if (ws.worstInc > 0) return infeasibleCell(ws);
    hi = boundary(p, s, x, ws, lo, hi, ws.incMask, false, coarse);
  }
  // A bound may prove the whole bracket infeasible for a check of unknown trend: then no scan.
  if (p.bracketBounds && ws.narrowing && boundedOut(p, x, lo, hi, ws)) return infeasibleCell(ws);
  // Search the bracket's scan grid for the checks of unknown trend (the monotone ones hold on all of it).
  const resolution = v.resolution * ws.scanCoarsening;
  const step = mode === CellMode.All ? Math.max(resolution, (hi - lo) / ws.maxScanPoints) : resolution;
  const grid = scanGrid;
  grid.set(lo, hi, step);
  if (mode === CellMode.First) {
    ws.stop = false;
    const k = firstFeasible(p, s, x, ws, grid, 0, grid.last, true);
    if (k < 0) return infeasibleCell(ws);
    // x, ws.f and ws.g hold the point found.
    if (k === 0 && loBad === loBad) refineLow(p, s, x, ws, loBad, loBadValue, lo, tol);
    return true;
  }
  if (!everyFeasible(p, s, x, ws, grid, 0, grid.last, true, visit)) return infeasibleCell(ws);
  return true;
}
