// Grid strategy: every combination of the list and range variables, continuous variables scanned at
// their resolution, the solved variable bracketed and scanned per cell (cell.ts). It is the reference
// answer. Whole cells are skipped when the objective at their lowest bound already loses to the
// k-th best (valid when objective 0 grows with the solved variable). Optional refinement passes
// polish the scanned continuous variables around the incumbent (patternSearch.ts).
import { PointBuffer, TopK } from './archive.js';
import { CellMode, evaluateFixed, makeWorkspace, solveCell, type RunStats } from './cell.js';
import { NearestMisses } from './misses.js';
import { TREND, solvedIndex, valueAt, valueCount, type Problem, type Variable } from './problem.js';
import { patternSearch } from './patternSearch.js';
import { packResult, type SearchResult } from './result.js';

export interface GridOptions {
  /** How many best points to keep. */
  top: number;
  /** Keep every feasible point (for frontiers); disables pruning. */
  collectAll?: boolean;
  /** With collectAll: every feasible scan point of a cell, not only its first (needed when an
   * objective is not monotone in the solved variable). */
  everyFeasiblePoint?: boolean;
  /** With everyFeasiblePoint: sample each cell's feasible interval at no more than this many points. */
  maxScanPoints?: number;
  /** Keep the best point for each value of this (list or range) variable, then rank those: the best
   * spring per wire size, say. Pruning then compares a cell with its own group's best only. */
  bestPerValueOf?: number;
  /** Polish the scanned continuous variables of the best point by a Hooke-Jeeves pattern search
   * with at most this many step halvings (0: none). */
  refine?: number;
  /** Bisection tolerance, relative. */
  relativeTolerance?: number;
  /** Use the problem's bounds to rule out parts of the space without evaluating them (default true).
   * Off, the grid evaluates what a plain scan would: the same answer, more work (for tests and benchmarks). */
  narrowing?: boolean;
  /** When nothing is feasible, run one plain pass so that what cut and the nearest misses are those of
   * a full scan (default true). A caller that only asks "is anything feasible?" may skip it. */
  diagnostics?: boolean;
  onProgress?: (done: number, total: number) => void;
}

function gridPass(
  p: Problem,
  vars: readonly Variable[],
  s: number,
  opts: GridOptions,
  top: TopK,
  cloud: PointBuffer | null,
  misses: NearestMisses,
  ws: ReturnType<typeof makeWorkspace>,
  counts: GridCounts,
  groups: TopK[] | null = null,
): void {
  const n = vars.length;
  const sizes = new Int32Array(n);
  const idx = new Int32Array(n);
  const x = new Float64Array(n);
  let total = 1;
  for (let i = 0; i < n; i++) {
    sizes[i] = i === s ? 1 : valueCount(vars[i]);
    total *= sizes[i];
    if (i !== s) x[i] = valueAt(vars[i], 0);
  }
  const increasing = p.objectiveTrend !== undefined && p.objectiveTrend[0] === TREND.increasing;
  const mode = (opts.collectAll && opts.everyFeasiblePoint) || !increasing ? CellMode.All : CellMode.First;
  // A cell enters the ranking once, with its best point; the cloud may keep every feasible point.
  const cellX = new Float64Array(n);
  const cellF = new Float64Array(p.objectiveNames.length);
  let cellBest = Infinity;
  const visit = (px: Float64Array, f: Float64Array) => {
    if (f[0] < cellBest) {
      cellBest = f[0];
      cellX.set(px);
      cellF.set(f);
    }
    if (cloud) cloud.push(px, f);
  };
  const group = opts.bestPerValueOf ?? -1;
  const sink = (): TopK => (groups !== null ? groups[idx[group]] : top);
  const prune = opts.collectAll ? null : (f: Float64Array) => f[0] >= sink().threshold();
  const progressEvery = Math.max(1, Math.floor(total / 100));
  // The odometer's fastest variable; a pruned cell ends its branch when the bound grows along it.
  const innermost = s === n - 1 ? n - 2 : n - 1;
  const branchPrune = p.boundGrowsAlong !== undefined && p.boundGrowsAlong === innermost && innermost >= 0;
  // Whole branches (a wire size and everything under it, say) may be ruled out by the problem's hint.
  const branchHint = p.branchInfeasible !== undefined && ws.narrowing;
  // And the ends of the innermost variable's run, by the range hint (see ruleOutEnds).
  const rangeHint = p.rangeInfeasible !== undefined && ws.narrowing && innermost >= 0;
  const ruled = new Int32Array(innermost >= 0 ? sizes[innermost] : 0);
  let changed = 0;
  for (let done = 0; done < total; done++) {
    let skip = false;
    if (branchHint) {
      for (let depth = Math.max(1, changed + 1); depth <= innermost; depth++) {
        ws.stats.boundCalls++;
        const j = p.branchInfeasible!(x, depth);
        if (j < 0) continue;
        let size = 1;
        for (let i = depth; i < n; i++) {
          size *= sizes[i];
          idx[i] = sizes[i] - 1;
        }
        ws.stats.cutBy[j] += size;
        counts.cells += size;
        counts.branchCut += size;
        done += size - 1;
        skip = true;
        break;
      }
    }
    if (!skip && rangeHint) {
      if (idx[innermost] === 0) ruleOutEnds(p, x, innermost, sizes[innermost], ruled, ws.stats);
      const j = ruled[idx[innermost]];
      if (j >= 0) {
        ws.stats.cutBy[j]++;
        counts.cells++;
        counts.branchCut++;
        skip = true;
      }
    }
    if (!skip) {
      counts.cells++;
      cellBest = Infinity;
      ws.cap = prune !== null ? sink().threshold() : Infinity;
      const r = s >= 0 ? solveCell(p, s, x, ws, mode, visit, prune) : evaluateFixed(p, x, ws);
      if (r === 'pruned') {
        counts.pruned++;
        if (branchPrune && ws.prunedAtLowest) {
          const rest = sizes[innermost] - 1 - idx[innermost];
          counts.cells += rest;
          counts.pruned += rest;
          done += rest;
          idx[innermost] = sizes[innermost] - 1;
        }
      } else if (r) {
        counts.feasible++;
        if (mode === CellMode.First) visit(x, ws.f);
        if (cellBest < Infinity) sink().offer(cellX, cellF);
        else sink().offer(x, ws.f);
      } else if (ws.missViolation < misses.threshold()) {
        misses.offer(ws.missX, ws.missG, ws.missF, ws.missViolation);
      }
      if (opts.onProgress && done % progressEvery === 0) opts.onProgress(done, total);
    }
    // Odometer step over the non-solved variables, last variable fastest.
    for (let i = n - 1; i >= 0; i--) {
      if (i === s) continue;
      changed = i;
      if (++idx[i] < sizes[i]) {
        x[i] = valueAt(vars[i], idx[i]);
        break;
      }
      idx[i] = 0;
      x[i] = valueAt(vars[i], 0);
    }
  }
  opts.onProgress?.(total, total);
}

/**
 * Rule out, by the problem's range hint, the longest run of the innermost variable's first values and
 * the longest run of its last values that no point can come from (the stiffest coil counts of a wire
 * fail its stress, the softest its free length, say): ruled[k] = the check that rules value k out, or
 * -1. Each run is found by bisection on its length (a run inside a ruled-out run is ruled out too, as
 * its bounds are tighter), after one call on the end value alone: a run of the branch that nothing rules
 * out costs two calls, one with runs costs about twice the logarithm of its length.
 */
function ruleOutEnds(p: Problem, x: Float64Array, v: number, size: number, ruled: Int32Array, stats: RunStats): void {
  ruled.fill(-1);
  const hint = (x: Float64Array, v: number, from: number, to: number): number => {
    stats.boundCalls++;
    return p.rangeInfeasible!(x, v, from, to);
  };
  let first = hint(x, v, 0, 0);
  let head = -1;
  if (first >= 0) {
    // Values 0..head are ruled out (by `first`); 0..bad is not.
    head = 0;
    let bad = size - 1;
    while (bad - head > 1) {
      const mid = (head + bad) >>> 1;
      const j = hint(x, v, 0, mid);
      if (j >= 0) {
        head = mid;
        first = j;
      } else bad = mid;
    }
    ruled.fill(first, 0, head + 1);
  }
  if (head >= size - 1) return;
  let last = hint(x, v, size - 1, size - 1);
  if (last < 0) return;
  let tail = size - 1;
  let bad = head;
  while (tail - bad > 1) {
    const mid = (bad + tail + 1) >>> 1;
    const j = hint(x, v, mid, size - 1);
    if (j >= 0) {
      tail = mid;
      last = j;
    } else bad = mid;
  }
  ruled.fill(last, tail, size);
}

export interface GridCounts {
  cells: number;
  feasible: number;
  pruned: number;
  branchCut: number;
}

export function gridSearch(p: Problem, opts: GridOptions): SearchResult {
  const s = solvedIndex(p);
  const ws = makeWorkspace(p, opts.relativeTolerance);
  if (opts.everyFeasiblePoint && opts.maxScanPoints) ws.maxScanPoints = opts.maxScanPoints;
  ws.narrowing = opts.narrowing ?? true;
  ws.replay = ws.narrowing;
  const nx = p.variables.length;
  const top = new TopK(Math.max(1, opts.top), nx, p.objectiveNames.length);
  const cloud = opts.collectAll ? new PointBuffer(nx, p.objectiveNames.length) : null;
  const misses = new NearestMisses(5);
  const counts: GridCounts = { cells: 0, feasible: 0, pruned: 0, branchCut: 0 };
  const g = opts.bestPerValueOf;
  const groups = g !== undefined ? Array.from({ length: valueCount(p.variables[g]) }, () => new TopK(1, nx, p.objectiveNames.length)) : null;
  gridPass(p, p.variables, s, opts, top, cloud, misses, ws, counts, groups);
  if (groups) for (const one of groups) if (one.size) top.offer(one.x(0), one.f(0));
  let result = misses;
  if (top.size === 0 && s >= 0 && p.bracketBounds && ws.narrowing && (opts.diagnostics ?? true)) {
    // Nothing feasible: the diagnostics (what cut, the nearest misses) come from a pass that scans
    // every cell in full, as they would without the interval bounds. Only searches that fail pay it.
    ws.stats.cutBy.fill(0);
    ws.stats.soleViolation.fill(Infinity);
    ws.narrowing = false;
    ws.replay = false;
    ws.cap = Infinity;
    counts.cells = 0;
    counts.feasible = 0;
    counts.pruned = 0;
    counts.branchCut = 0;
    result = new NearestMisses(5);
    gridPass(p, p.variables, s, opts, top, cloud, result, ws, counts, groups);
  }
  if ((opts.refine ?? 0) > 0 && top.size > 0) patternSearch(p, s, opts.refine ?? 0, top, ws);
  return packResult('grid', p, top, cloud, ws, counts, result);
}
