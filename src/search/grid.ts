// Grid strategy: every combination of the list and range variables, continuous variables scanned at
// their resolution, the solved variable bracketed and scanned per cell (cell.ts). It is the reference
// answer. Whole cells are skipped when the objective at their lowest bound already loses to the
// k-th best (valid when objective 0 grows with the solved variable). Optional refinement passes
// zoom the scanned continuous variables around the incumbent.
import { PointBuffer, TopK } from './archive.js';
import { CellMode, evaluateFixed, makeWorkspace, solveCell } from './cell.js';
import { NearestMisses } from './misses.js';
import { TREND, solvedIndex, valueAt, valueCount, type Problem, type Variable } from './problem.js';
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
  onProgress?: (done: number, total: number) => void;
}

function gridPass(p: Problem, vars: readonly Variable[], s: number, opts: GridOptions, top: TopK, cloud: PointBuffer | null,
  misses: NearestMisses, ws: ReturnType<typeof makeWorkspace>, counts: GridCounts, groups: TopK[] | null = null): void {
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
    if (f[0] < cellBest) { cellBest = f[0]; cellX.set(px); cellF.set(f); }
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
  let changed = 0;
  for (let done = 0; done < total; done++) {
    let skip = false;
    if (branchHint) {
      for (let depth = Math.max(1, changed + 1); depth <= innermost; depth++) {
        const j = p.branchInfeasible!(x, depth);
        if (j < 0) continue;
        let size = 1;
        for (let i = depth; i < n; i++) { size *= sizes[i]; idx[i] = sizes[i] - 1; }
        ws.cutBy[j] += size;
        counts.cells += size;
        counts.branchCut += size;
        done += size - 1;
        skip = true;
        break;
      }
    }
    if (!skip) {
    counts.cells++;
    cellBest = Infinity;
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
      if (++idx[i] < sizes[i]) { x[i] = valueAt(vars[i], idx[i]); break; }
      idx[i] = 0;
      x[i] = valueAt(vars[i], 0);
    }
  }
  opts.onProgress?.(total, total);
}

export interface GridCounts { cells: number; feasible: number; pruned: number; branchCut: number }

export function gridSearch(p: Problem, opts: GridOptions): SearchResult {
  const s = solvedIndex(p);
  const ws = makeWorkspace(p, opts.relativeTolerance);
  if (opts.everyFeasiblePoint && opts.maxScanPoints) ws.maxScanPoints = opts.maxScanPoints;
  ws.narrowing = opts.narrowing ?? true;
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
  if (top.size === 0 && s >= 0 && p.bracketBounds && ws.narrowing) {
    // Nothing feasible: the diagnostics (what cut, the nearest misses) come from a pass that scans
    // every cell in full, as they would without the interval bounds. Only searches that fail pay it.
    ws.cutBy.fill(0);
    ws.soleViolation.fill(Infinity);
    ws.narrowing = false;
    counts.cells = 0; counts.feasible = 0; counts.pruned = 0; counts.branchCut = 0;
    result = new NearestMisses(5);
    gridPass(p, p.variables, s, opts, top, cloud, result, ws, counts, groups);
  }
  if ((opts.refine ?? 0) > 0 && top.size > 0) patternSearch(p, s, opts.refine ?? 0, top, ws);
  return packResult('grid', p, top, cloud, ws, counts, result);
}


/**
 * Hooke and Jeeves (1961) pattern search over the scanned continuous variables, starting from the grid's
 * best at the grid's resolution; each trial point solves its cell like the grid. Exploratory moves
 * along each axis, then a pattern move along the last successful direction, which lets it follow a
 * curved valley that an axis-aligned zoom cannot.
 */
function patternSearch(p: Problem, s: number, halvings: number, top: TopK, ws: ReturnType<typeof makeWorkspace>): void {
  const n = p.variables.length;
  const axes = p.variables.map((v, i) => (v.kind === 'continuous' && i !== s ? i : -1)).filter((i) => i >= 0);
  if (axes.length === 0) return;
  const steps = new Float64Array(n);
  for (const i of axes) steps[i] = (p.variables[i] as { resolution: number }).resolution;
  const x = new Float64Array(n);
  const base = Float64Array.from(top.x(0));
  let baseF = top.f(0)[0];
  const trial = (pt: Float64Array): number => {
    for (const i of axes) {
      const v = p.variables[i] as { min: number; max: number };
      if (pt[i] < v.min || pt[i] > v.max) return Infinity;
    }
    x.set(pt);
    if (s >= 0 ? solveCell(p, s, x, ws, CellMode.First, null, null) !== true : !evaluateFixed(p, x, ws)) return Infinity;
    top.offer(x, ws.f);
    pt.set(x);
    return ws.f[0];
  };
  const explore = (from: Float64Array, fromF: number): [Float64Array, number] => {
    const cur = Float64Array.from(from);
    let curF = fromF;
    for (const i of axes) {
      for (const dir of [1, -1]) {
        const t = Float64Array.from(cur);
        t[i] += dir * steps[i];
        let ft = trial(t);
        if (!Number.isFinite(ft)) {
          // Infeasible: slide to the feasibility boundary along this move (bisection), since the
          // optimum of a constrained problem usually sits on it.
          let a = 0;
          let b = 1;
          let fa = Infinity;
          const at = Float64Array.from(cur);
          for (let k = 0; k < 30; k++) {
            const m = 0.5 * (a + b);
            at.set(cur);
            at[i] += m * dir * steps[i];
            const fm = trial(at);
            if (Number.isFinite(fm)) { a = m; fa = fm; t.set(at); } else b = m;
          }
          ft = a > 0 ? fa : Infinity;
          // Restoration: take the full move, then regain feasibility along another axis (expanding,
          // then bisecting back to the boundary). This walks along a ridge where one constraint is
          // active, which axis moves alone cannot.
          for (const j of axes) {
            if (j === i) continue;
            for (const dj of [1, -1]) {
              const moved = Float64Array.from(cur);
              moved[i] += dir * steps[i];
              let reach = steps[j];
              let found = -1;
              for (let e = 0; e < 16 && found < 0; e++, reach *= 2) {
                const probe = Float64Array.from(moved);
                probe[j] += dj * reach;
                if (Number.isFinite(trial(probe))) found = reach;
              }
              if (found < 0) continue;
              let lo = found / 2;
              let hi = found;
              if (found === steps[j]) lo = 0;
              let bestProbe = Float64Array.from(moved);
              bestProbe[j] += dj * hi;
              let bestF = trial(Float64Array.from(bestProbe));
              for (let k = 0; k < 30; k++) {
                const m = 0.5 * (lo + hi);
                const probe = Float64Array.from(moved);
                probe[j] += dj * m;
                const fm = trial(probe);
                if (Number.isFinite(fm)) { hi = m; if (fm < bestF) { bestF = fm; bestProbe = probe; } } else lo = m;
              }
              if (bestF < ft) { ft = bestF; t.set(bestProbe); }
            }
          }
        }
        if (ft < curF) { cur.set(t); curF = ft; break; }
      }
    }
    return [cur, curF];
  };
  let halved = 0;
  let guard = 0;
  while (halved < halvings && guard++ < 100000) {
    let [next, nextF] = explore(base, baseF);
    if (nextF < baseF) {
      // Pattern moves: keep going in the direction that worked while it keeps working.
      let prev = Float64Array.from(base);
      base.set(next); baseF = nextF;
      for (;;) {
        const jump = Float64Array.from(base);
        for (const i of axes) jump[i] = 2 * base[i] - prev[i];
        const jf = trial(jump);
        const [after, afterF] = explore(Number.isFinite(jf) ? jump : base, Number.isFinite(jf) ? jf : baseF);
        if (afterF < baseF) { prev = Float64Array.from(base); base.set(after); baseF = afterF; } else break;
      }
    } else {
      for (const i of axes) steps[i] /= 2;
      halved++;
    }
  }
}
