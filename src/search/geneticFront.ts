// Two-objective genetic search for the trade-off front, after NSGA-II (Deb et al., IEEE Trans.
// Evolutionary Computation 6 (2002)): non-dominated sorting with crowding distance, constraint
// domination (feasible before infeasible, then less violation), the same integer-gene operators and
// the same cell solve as the single-objective search, seeded through seedrandom.
import seedrandom from 'seedrandom';
import { PointBuffer } from './archive.js';
import { CellMode, makeWorkspace, solveCell } from './cell.js';
import { NearestMisses } from './misses.js';
import { cellKey, decode, encoding, mutate as mutateGenes, randomGenes, resolveCell, tournament } from './operators.js';
import type { Problem } from './problem.js';
import { packResult, type SearchResult } from './result.js';
import { termination, type StopReason, type Termination } from './termination.js';

export interface FrontOptions {
  seed: number | string;
  /** Objective indices (both minimised). */
  objectives: [number, number];
  maxEvaluations: number;
  populationSize?: number;
  /** When to stop, in full (replaces maxEvaluations); its stall count is in generations that meet no
   * combination not seen before (default 15). */
  termination?: Termination;
}

interface Member {
  genes: Float64Array;
  feasible: boolean;
  violation: number;
  a: number;
  b: number;
  x: Float64Array;
  f: Float64Array;
  rank: number;
  crowd: number;
}

/** Constraint-domination of p over q on objectives (a, b). */
function dominatesMember(p: Member, q: Member): boolean {
  if (p.feasible !== q.feasible) return p.feasible;
  if (!p.feasible) return p.violation < q.violation;
  return p.a <= q.a && p.b <= q.b && (p.a < q.a || p.b < q.b);
}

function rankAndCrowd(pop: Member[]): void {
  let remaining = pop.slice();
  let rank = 0;
  while (remaining.length) {
    const front = remaining.filter((p) => !remaining.some((q) => q !== p && dominatesMember(q, p)));
    for (const m of front) m.rank = rank;
    for (const key of ['a', 'b'] as const) {
      front.sort((p, q) => p[key] - q[key]);
      const span = (front[front.length - 1]?.[key] ?? 0) - (front[0]?.[key] ?? 0) || 1;
      front.forEach((m, i) => {
        if (key === 'a') m.crowd = 0;
        m.crowd += i === 0 || i === front.length - 1 ? Infinity : (front[i + 1][key] - front[i - 1][key]) / span;
      });
    }
    remaining = remaining.filter((p) => !front.includes(p));
    rank++;
  }
}

function better(p: Member, q: Member): boolean {
  return p.rank < q.rank || (p.rank === q.rank && p.crowd > q.crowd);
}

/** The search's result is the common SearchResult: `best` holds the non-dominated feasible points,
 * solved again to full precision and sorted by the first objective; `cloud` every feasible cell it
 * assessed (at the search's precision), in the order it met them; the counts, cuts and nearest misses
 * as every strategy reports them. */
export function geneticFront(p: Problem, opts: FrontOptions): SearchResult {
  const rng = seedrandom(String(opts.seed));
  const enc = encoding(p);
  const { s, n } = enc;
  if (!enc.discrete || s < 0) throw new Error('geneticFront: discrete variables and one solved variable only');
  const until = opts.termination ?? termination({ maxEvaluations: opts.maxEvaluations, stallGenerations: 15 });
  const ws = makeWorkspace(p, 1e-3);
  ws.scanCoarsening = 4;
  const [ia, ib] = opts.objectives;
  const popSize = opts.populationSize ?? 40;
  const memo = new Map<number, Member>();
  const x = new Float64Array(n);
  let cells = 0;
  let feasibleCells = 0;
  const misses = new NearestMisses(5);

  const assess = (genes: Float64Array): Member => {
    const key = cellKey(enc, genes);
    const known = memo.get(key);
    if (known) return { ...known, genes };
    decode(enc, genes, x);
    cells++;
    const r = solveCell(p, s, x, ws, CellMode.First, null, null);
    if (r === true) feasibleCells++;
    else misses.offer(ws.missX, ws.missG, ws.missF, ws.missViolation);
    const m: Member =
      r === true
        ? { genes, feasible: true, violation: 0, a: ws.f[ia], b: ws.f[ib], x: Float64Array.from(x), f: Float64Array.from(ws.f), rank: 0, crowd: 0 }
        : {
            genes,
            feasible: false,
            violation: ws.missViolation,
            a: Infinity,
            b: Infinity,
            x: Float64Array.from(ws.missX),
            f: Float64Array.from(ws.missF),
            rank: 0,
            crowd: 0,
          };
    memo.set(key, m);
    return m;
  };
  const rate = 1.5 / Math.max(1, n - 1);
  let pop: Member[] = Array.from({ length: popSize }, () => assess(randomGenes(enc, rng)));
  rankAndCrowd(pop);
  // Stop on the budget, after 300 generations, or when stallGenerations in a row find no new combination
  // (the memo answers revisits for free, so the budget alone would never run out).
  let stale = 0;
  let gen = 0;
  for (; gen < 300 && stale < until.stallGenerations && ws.stats.evaluations < until.maxEvaluations; gen++) {
    const cellsBefore = cells;
    const children: Member[] = [];
    while (children.length < popSize && ws.stats.evaluations < until.maxEvaluations) {
      const pa = tournament(pop, better, rng);
      const pb = tournament(pop, better, rng);
      const child = Float64Array.from(pa.genes, (g, i) => (rng() < 0.5 ? g : pb.genes[i]));
      mutateGenes(enc, child, rate, 0, rng);
      children.push(assess(child));
    }
    const merged = [...pop, ...children];
    rankAndCrowd(merged);
    merged.sort((p1, p2) => (better(p1, p2) ? -1 : better(p2, p1) ? 1 : 0));
    pop = merged.slice(0, popSize);
    stale = cells === cellsBefore ? stale + 1 : 0;
  }
  // Report the non-dominated feasible members of everything assessed, solved again to full precision.
  const fine = makeWorkspace(p, undefined, ws.stats);
  const all = [...memo.values()].filter((m) => m.feasible);
  const nd = all.filter((m) => !all.some((q) => q !== m && dominatesMember(q, m)));
  const points: { x: Float64Array; f: Float64Array }[] = [];
  for (const m of nd) {
    x.set(m.x);
    resolveCell(p, s, x, fine, true, (px, f) => points.push({ x: Float64Array.from(px), f: Float64Array.from(f) }));
  }
  points.sort((u, v) => u.f[ia] - v.f[ia]);
  const nf = p.objectiveNames.length;
  const cloud = new PointBuffer(n, nf, Math.max(1, all.length));
  for (const m of all) cloud.push(m.x, m.f);
  const stoppedBy: StopReason = stale >= until.stallGenerations ? 'exhausted' : 'budget';
  return packResult('genetic', p, points, cloud, ws, { cells, feasible: feasibleCells, pruned: 0 }, misses, stoppedBy);
}
