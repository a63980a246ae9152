// Two-objective genetic search for the trade-off front, after NSGA-II (Deb et al., IEEE Trans.
// Evolutionary Computation 6 (2002)): non-dominated sorting with crowding distance, constraint
// domination (feasible before infeasible, then less violation), the same integer-gene operators and
// the same cell solve as the single-objective search, seeded through seedrandom.
import seedrandom from 'seedrandom';
import { CellMode, makeWorkspace, solveCell } from './cell.js';
import { solvedIndex, valueAt, valueCount, type Problem } from './problem.js';

export interface FrontOptions {
  seed: number | string;
  /** Objective indices (both minimised). */
  objectives: [number, number];
  maxEvaluations: number;
  populationSize?: number;
}

export interface FrontPoint { x: Float64Array; f: Float64Array }

interface Member { genes: Int32Array; feasible: boolean; violation: number; a: number; b: number; x: Float64Array; f: Float64Array; rank: number; crowd: number }

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

export function geneticFront(p: Problem, opts: FrontOptions): { points: FrontPoint[]; cloud: FrontPoint[]; evaluations: number; cells: number } {
  const rng = seedrandom(String(opts.seed));
  const s = solvedIndex(p);
  if (p.variables.some((v, i) => i !== s && v.kind === 'continuous')) throw new Error('geneticFront: discrete variables and one solved variable only');
  const n = p.variables.length;
  const ws = makeWorkspace(p, 1e-3);
  ws.scanCoarsening = 4;
  const sizes = p.variables.map((v, i) => (i === s ? 1 : valueCount(v)));
  const [ia, ib] = opts.objectives;
  const popSize = opts.populationSize ?? 40;
  const memo = new Map<string, Member>();
  const x = new Float64Array(n);
  let cells = 0;

  const assess = (genes: Int32Array): Member => {
    const key = genes.join(',');
    const known = memo.get(key);
    if (known) return { ...known, genes };
    for (let i = 0; i < n; i++) if (i !== s) x[i] = valueAt(p.variables[i], genes[i]);
    cells++;
    const r = solveCell(p, s, x, ws, CellMode.First, null, null);
    const m: Member = r === true
      ? { genes, feasible: true, violation: 0, a: ws.f[ia], b: ws.f[ib], x: Float64Array.from(x), f: Float64Array.from(ws.f), rank: 0, crowd: 0 }
      : { genes, feasible: false, violation: ws.missViolation, a: Infinity, b: Infinity, x: Float64Array.from(ws.missX), f: Float64Array.from(ws.missF), rank: 0, crowd: 0 };
    memo.set(key, m);
    return m;
  };
  const random = (): Int32Array => Int32Array.from(sizes, (k, i) => (i === s ? 0 : Math.floor(rng() * k)));
  const mutate = (g: Int32Array): void => {
    for (let i = 0; i < n; i++) {
      if (i === s || rng() >= 1.5 / Math.max(1, n - 1)) continue;
      const reach = Math.max(1, Math.round(sizes[i] / 12));
      g[i] = Math.min(sizes[i] - 1, Math.max(0, g[i] + (rng() < 0.5 ? -1 : 1) * (1 + Math.floor(rng() * reach))));
    }
  };
  let pop: Member[] = Array.from({ length: popSize }, () => assess(random()));
  rankAndCrowd(pop);
  // Stop on the budget, after 300 generations, or when 15 generations in a row find no new combination
  // (the memo answers revisits for free, so the budget alone would never run out).
  let stale = 0;
  for (let gen = 0; gen < 300 && stale < 15 && ws.stats.evaluations < opts.maxEvaluations; gen++) {
    const cellsBefore = cells;
    const children: Member[] = [];
    while (children.length < popSize && ws.stats.evaluations < opts.maxEvaluations) {
      const pick = () => { const a = pop[Math.floor(rng() * pop.length)]; const b = pop[Math.floor(rng() * pop.length)]; return better(a, b) ? a : b; };
      const pa = pick();
      const pb = pick();
      const child = Int32Array.from(pa.genes, (g, i) => (rng() < 0.5 ? g : pb.genes[i]));
      mutate(child);
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
  const points: FrontPoint[] = [];
  for (const m of nd) {
    x.set(m.x);
    if (solveCell(p, s, x, fine, CellMode.First, null, null) === true) points.push({ x: Float64Array.from(x), f: Float64Array.from(fine.f) });
  }
  points.sort((u, v) => u.f[ia] - v.f[ia]);
  const cloud = all.map((m) => ({ x: m.x, f: m.f }));
  return { points, cloud, evaluations: ws.stats.evaluations, cells };
}
