// The open runs of a problem, best first: branch and bound over the grid's cells by the problem's own
// bounds. A branch is one combination of the list and range variables but the innermost (a wire size
// and an end type); a run is a stretch of the innermost variable's values in a branch (coil counts
// from..to). Branches the problem's branch hint rules out never open; every other one opens as one
// run, kept in a heap by the lower bound on objective 0 over it (Problem.rangeLowerBound). Refining
// takes the least run and halves it (each half gets its own bound, Infinity when the bounds leave it
// no feasible point), or, when it is a single cell, solves the cell exactly as the grid does. So the
// least bound of the open runs is a proven lower bound on every cell not yet solved, and it rises as
// the runs are refined: an incumbent within a tolerance of it is proven within that tolerance of the
// optimum, without visiting the rest. The genetic search draws its individuals from the open runs
// (never from a cell the bounds rule out) and stops on that proof (genetic.ts).
import { CellMode, solveCell, type CellWorkspace, type RunStats } from './cell.js';
import { TREND, solvedIndex, valueAt, valueCount, type Problem } from './problem.js';
import type { Rng } from './operators.js';

interface Run {
  bound: number;
  branch: number;
  from: number;
  to: number;
}

/** Whether f is within the relative tolerance of the bound (the test of termination.ts's reachesBound). */
export function withinBound(f: number, bound: number, tolerance: number): boolean {
  return f <= bound + tolerance * Math.abs(bound);
}

export class RunBounds {
  private readonly heap: Run[] = [];
  /** The least bound of what was set aside without being refined: runs and cells that could not hold a
   * point better than the incumbent of their day by more than the tolerance. */
  private setAside = Infinity;
  /** The variables a branch fixes, in order, and their numbers of values. */
  private readonly branchVars: number[];
  private readonly sizes: number[];
  /** The innermost variable (the one runs split) and its number of values. */
  readonly inner: number;
  private readonly innerSize: number;
  private readonly s: number;
  private readonly x: Float64Array;
  /** Cells solved so far, and how many of them were feasible. */
  cellsSolved = 0;
  cellsFeasible = 0;

  /** Whether the problem offers what the runs need: a solved variable, objective 0 increasing in it
   * (a cell is then solved by its first feasible point), every other variable a list or a range, and
   * the run bound. */
  static applies(p: Problem): boolean {
    const s = solvedIndex(p);
    if (p.rangeLowerBound === undefined || s < 0 || p.objectiveTrend?.[0] !== TREND.increasing) return false;
    return p.variables.length >= 2 && p.variables.every((v, i) => i === s || v.kind !== 'continuous');
  }

  /** Open every branch the branch hint leaves, each as one run (bound calls counted in stats). */
  constructor(
    private readonly p: Problem,
    private readonly stats: RunStats,
  ) {
    const s = solvedIndex(p);
    this.s = s;
    const free = p.variables.map((_, i) => i).filter((i) => i !== s);
    this.inner = free[free.length - 1];
    this.innerSize = valueCount(p.variables[this.inner]);
    this.branchVars = free.slice(0, -1);
    this.sizes = this.branchVars.map((i) => valueCount(p.variables[i]));
    this.x = new Float64Array(p.variables.length);
    this.open(0, 0);
  }

  /** Depth-first over the branch variables from `level`, ruling out whole sub-branches by the branch
   * hint (variables before `depth` fixed), as the grid does. */
  private open(level: number, branch: number): void {
    if (level === this.branchVars.length) {
      const bound = this.bound(0, this.innerSize - 1);
      if (bound < Infinity) this.push({ bound, branch, from: 0, to: this.innerSize - 1 });
      return;
    }
    const v = this.branchVars[level];
    for (let k = 0; k < this.sizes[level]; k++) {
      this.x[v] = valueAt(this.p.variables[v], k);
      const depth = v + 1;
      if (this.p.branchInfeasible !== undefined && this.s > v) {
        this.stats.boundCalls++;
        if (this.p.branchInfeasible(this.x, depth) >= 0) continue;
      }
      this.open(level + 1, branch * this.sizes[level] + k);
    }
  }

  private bound(from: number, to: number): number {
    this.stats.boundCalls++;
    return this.p.rangeLowerBound!(this.x, this.inner, from, to);
  }

  /** Write the branch's values into x and, when given, its gene indices into genes. */
  private decode(branch: number, genes?: Float64Array): void {
    for (let level = this.branchVars.length - 1; level >= 0; level--) {
      const k = branch % this.sizes[level];
      branch = (branch - k) / this.sizes[level];
      const v = this.branchVars[level];
      this.x[v] = valueAt(this.p.variables[v], k);
      if (genes) genes[v] = k;
    }
  }

  /** Open runs. */
  get size(): number {
    return this.heap.length;
  }

  /** Cells in the open runs. */
  openCells(): number {
    let n = 0;
    for (const r of this.heap) n += r.to - r.from + 1;
    return n;
  }

  /** A proven lower bound on objective 0 over every cell not yet solved (Infinity: none is left). */
  lowerBound(): number {
    return Math.min(this.heap.length ? this.heap[0].bound : Infinity, this.setAside);
  }

  /** Whether an incumbent of value f is proven within the tolerance of the optimum: no open run, and
   * nothing set aside, can hold a point better than f by more than the tolerance. */
  proves(f: number, tolerance: number): boolean {
    if (!Number.isFinite(f)) return false;
    const b = this.lowerBound();
    return b === Infinity || withinBound(f, b, tolerance);
  }

  /** Whether the genes' cell lies in an open run. */
  contains(genes: Float64Array): boolean {
    const k = genes[this.inner];
    const own = new Float64Array(this.x.length);
    return this.heap.some((r) => {
      if (k < r.from || k > r.to) return false;
      this.decode(r.branch, own);
      return this.branchVars.every((v) => own[v] === genes[v]);
    });
  }

  /** Genes of a cell drawn from the open runs: the better bounded of two runs drawn at random, then
   * one of its values. False when no run is open. */
  sample(rng: Rng, genes: Float64Array): boolean {
    if (this.heap.length === 0) return false;
    const a = this.heap[Math.floor(rng() * this.heap.length)];
    const b = this.heap[Math.floor(rng() * this.heap.length)];
    const r = a.bound <= b.bound ? a : b;
    this.decode(r.branch, genes);
    genes[this.inner] = r.from + Math.floor(rng() * (r.to - r.from + 1));
    return true;
  }

  /**
   * Refine the least open runs while they could hold a point better than `cap()` (the value a point
   * must beat to be kept: the incumbent, or the k-th best of a list) by more than the tolerance, and
   * the run's evaluations and bound calls stay below `limit`. A single cell is solved exactly (ws at
   * the grid's tolerance) and pruned on the cap; each feasible one goes to `found` with its genes,
   * point and objectives, and may lower the cap.
   */
  refine(ws: CellWorkspace, cap: () => number, tolerance: number, limit: number, found: (genes: Float64Array, x: Float64Array, f: Float64Array) => void): void {
    const genes = new Float64Array(this.x.length);
    const work = () => this.stats.evaluations + this.stats.boundCalls;
    while (this.heap.length > 0 && work() < limit) {
      const beat = cap();
      const run = this.heap[0];
      if (withinBound(beat, run.bound, tolerance)) return;
      this.pop();
      this.decode(run.branch, genes);
      if (run.from === run.to) {
        this.x[this.inner] = valueAt(this.p.variables[this.inner], run.from);
        genes[this.inner] = run.from;
        ws.cap = beat;
        this.cellsSolved++;
        const r = solveCell(this.p, this.s, this.x, ws, CellMode.First, null, (f) => f[0] >= beat);
        if (r === true) {
          this.cellsFeasible++;
          found(genes, this.x, ws.f);
        } else if (r === 'pruned') this.setAside = Math.min(this.setAside, Math.max(run.bound, ws.pruneF[0]));
        continue;
      }
      const mid = (run.from + run.to) >>> 1;
      this.split(run, run.from, mid, beat, tolerance);
      this.decode(run.branch);
      this.split(run, mid + 1, run.to, beat, tolerance);
    }
  }

  private split(parent: Run, from: number, to: number, cap: number, tolerance: number): void {
    // The parent's bound holds over the half as well.
    const bound = Math.max(parent.bound, this.bound(from, to));
    if (bound === Infinity) return;
    if (withinBound(cap, bound, tolerance)) this.setAside = Math.min(this.setAside, bound);
    else this.push({ bound, branch: parent.branch, from, to });
  }

  private push(r: Run): void {
    const h = this.heap;
    h.push(r);
    let i = h.length - 1;
    while (i > 0) {
      const up = (i - 1) >>> 1;
      if (h[up].bound <= r.bound) break;
      h[i] = h[up];
      i = up;
    }
    h[i] = r;
  }

  private pop(): void {
    const h = this.heap;
    const last = h.pop()!;
    if (h.length === 0) return;
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      if (l >= h.length) break;
      const c = l + 1 < h.length && h[l + 1].bound < h[l].bound ? l + 1 : l;
      if (h[c].bound >= last.bound) break;
      h[i] = h[c];
      i = c;
    }
    h[i] = last;
  }
}
