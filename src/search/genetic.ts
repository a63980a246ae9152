// Genetic strategy for spaces too large to enumerate. Mixed encoding: list and range variables are
// integer genes (indices into their values), scanned continuous variables are real genes, and the
// solved variable is not a gene at all: each individual is repaired by solving its cell exactly as
// the grid does (cell.ts). Constraint handling by Deb's feasibility rules (feasible beats infeasible,
// then objective, then total violation), binary tournaments, uniform crossover, neighbour-step
// mutation, elitism, and a closing hill-climb over the integer genes. Every random draw comes from one
// seeded generator (seedrandom): the same seed gives the same result.
import seedrandom from 'seedrandom';
import { TopK } from './archive.js';
import { CellMode, evaluateFixed, makeWorkspace, solveCell } from './cell.js';
import { NearestMisses } from './misses.js';
import { cellKey, decode as decodeGenes, encoding, mutate as mutateGenes, randomGenes as sampleGenes, resolveCell, tournament as pick } from './operators.js';
import { TREND, type Problem } from './problem.js';
import { packResult, type SearchResult } from './result.js';
import { reachesBound, termination, type StopReason, type Termination } from './termination.js';
import { RunBounds } from './runBounds.js';

export interface GeneticOptions {
  seed: number | string;
  /** Stop once this many problem evaluations are spent (bisection steps count). */
  maxEvaluations: number;
  populationSize?: number;
  /** End a round of generations after this many without improvement. */
  stallGenerations?: number;
  /** When to stop, in full (its budget, when given, replaces maxEvaluations): with a proven lower
   * bound the run stops as soon as its incumbent reaches it. */
  termination?: Termination;
  top?: number;
  /** Relative bisection tolerance while searching (default 1e-3 with discrete genes only, else 1e-7). */
  searchTolerance?: number;
  /** Scan step while searching, in multiples of the solved variable's resolution (default 4 with discrete genes only). */
  scanCoarsening?: number;
  /** Use the problem's run bounds (Problem.rangeLowerBound) when it offers them (default true): draw
   * individuals only from runs they leave open, and stop once the incumbent is proven within the
   * termination's tolerance of the optimum. Off, the search is the plain genetic one. */
  runBounds?: boolean;
}

interface Individual {
  genes: Float64Array;
  f: number;
  violation: number;
  x: Float64Array;
}

function better(a: Individual, b: Individual): boolean {
  if (a.violation === 0 && b.violation === 0) return a.f < b.f;
  if (a.violation === 0) return true;
  if (b.violation === 0) return false;
  return a.violation < b.violation;
}

export function geneticSearch(p: Problem, opts: GeneticOptions): SearchResult {
  const rng = seedrandom(String(opts.seed));
  const enc = encoding(p);
  const { s, n, sizes } = enc;
  const until = opts.termination ?? termination({ maxEvaluations: opts.maxEvaluations, stallGenerations: opts.stallGenerations });
  let stoppedBy: StopReason = 'budget';
  // Bisection to 1e-3 (relative) while searching discrete genes: the kept end of each bracket is always
  // on the feasible side, so a cell is never judged feasible wrongly, only up to about 0.1% worse, which
  // is far below the steps between neighbouring cells. Real genes move by small amounts, so there it is
  // 1e-7. The final top cells are solved again to the grid's 1e-10 before they are reported.
  const discreteGenes = enc.discrete;
  const ws = makeWorkspace(p, opts.searchTolerance ?? (discreteGenes ? 1e-3 : 1e-7));
  // Likewise the scan of the non-monotone checks looks at every 4th diameter step while searching.
  if (discreteGenes) ws.scanCoarsening = opts.scanCoarsening ?? 4;
  const top = new TopK(Math.max(1, opts.top ?? 10), n, p.objectiveNames.length);
  const misses = new NearestMisses(5);
  const counts = { cells: 0, feasible: 0, pruned: 0 };
  const popSize = opts.populationSize ?? 12;
  const stall = until.stallGenerations;
  const memo = new Map<number, { f: number; violation: number; x: Float64Array }>();
  // The workspace and memo in use: coarse for the generations, fine for each round's hill-climb.
  const fineWs = makeWorkspace(p, undefined, ws.stats);
  let cw = ws;
  let cm = memo;
  const fineMemo = new Map<number, { f: number; violation: number; x: Float64Array }>();
  const spent = () => ws.stats.evaluations;
  // The problem's run bounds, when it offers them: the open runs that individuals are drawn from, and
  // the proof that ends the run (runBounds.ts). Their refinement gets as much work as the generations
  // and hill-climbs have had (evaluations and bound calls alike), no more.
  const runs = (opts.runBounds ?? true) && discreteGenes && RunBounds.applies(p) ? new RunBounds(p, ws.stats) : null;
  const work = () => ws.stats.evaluations + ws.stats.boundCalls;
  let proofWork = 0;
  const increasing = p.objectiveTrend !== undefined && p.objectiveTrend[0] === TREND.increasing;
  const x = new Float64Array(n);
  // A cell enters the list once: the coarse generations, the fine hill-climb and the proof may each
  // solve it (the integer genes name it; real genes and the solved variable do not).
  const sameCell = (a: Float64Array, b: Float64Array): boolean => {
    for (let i = 0; i < n; i++) if (i !== s && a[i] !== b[i]) return false;
    return true;
  };
  const keep = (px: Float64Array, f: Float64Array): boolean => (discreteGenes ? top.offerOnce(px, f, sameCell) : top.offer(px, f));
  const cellBest = { f: Infinity, x: new Float64Array(n) };
  const visitAll = (px: Float64Array, f: Float64Array) => {
    keep(px, f);
    if (f[0] < cellBest.f) {
      cellBest.f = f[0];
      cellBest.x.set(px);
    }
  };

  let bestFeasible = Infinity;
  // The best objective met so far at any precision, and the evaluations spent when it was met.
  let incumbent = Infinity;
  let foundAt = 0;
  // A cell is abandoned when its bound loses to the k-th best kept, so the reported list stays whole.
  const prune = (f: Float64Array) => f[0] >= bestFeasible && f[0] >= top.threshold();

  const key = (genes: Float64Array): number => cellKey(enc, genes);
  const decode = (genes: Float64Array): void => decodeGenes(enc, genes, x);

  const assess = (genes: Float64Array): Individual => {
    const k = discreteGenes ? key(genes) : -1;
    const known = k >= 0 ? cm.get(k) : undefined;
    if (known) return { genes, f: known.f, violation: known.violation, x: known.x };
    decode(genes);
    counts.cells++;
    let f = Infinity;
    let violation = 0;
    if (s >= 0) {
      cellBest.f = Infinity;
      const r = solveCell(p, s, x, cw, increasing ? CellMode.First : CellMode.All, increasing ? null : visitAll, increasing ? prune : null);
      if (r === 'pruned') {
        // The objective at the cell's lower bound already loses to the best found: its value stands in.
        counts.pruned++;
        f = cw.pruneF[0];
      } else if (r === true) {
        counts.feasible++;
        if (increasing) {
          f = cw.f[0];
          keep(x, cw.f);
        } else {
          f = cellBest.f;
          x.set(cellBest.x);
        }
      } else {
        violation = cw.missViolation;
        misses.offer(cw.missX, cw.missG, cw.missF, cw.missViolation);
        x.set(cw.missX);
      }
    } else if (evaluateFixed(p, x, cw)) {
      counts.feasible++;
      f = cw.f[0];
      keep(x, cw.f);
    } else {
      violation = cw.missViolation;
      misses.offer(cw.missX, cw.missG, cw.missF, cw.missViolation);
    }
    if (violation === 0 && f < bestFeasible && top.size > 0) bestFeasible = top.f(0)[0];
    if (violation === 0 && f < incumbent) {
      incumbent = f;
      foundAt = spent();
    }
    const ind = { genes, f, violation, x: Float64Array.from(x) };
    if (k >= 0) cm.set(k, { f, violation, x: ind.x });
    return ind;
  };

  const randomGenes = (): Float64Array => {
    if (runs === null) return sampleGenes(enc, rng);
    const g = new Float64Array(n);
    return runs.sample(rng, g) ? g : sampleGenes(enc, rng);
  };
  // A random value now and then lets an integer gene leave its neighbourhood.
  const mutate = (g: Float64Array, rate: number): void => mutateGenes(enc, g, rate, 0.15, rng);
  const tournament = (pop: Individual[]): Individual => pick(pop, better, rng);
  // The incumbent is proven optimal (within the tolerance) once it reaches the LP bound; with the run
  // bounds, the list is proven once its k-th best is within the tolerance of every cell left unsolved.
  let best: Individual = { genes: new Float64Array(n), f: Infinity, violation: Infinity, x: new Float64Array(n) };
  const proven = (ind: Individual): boolean =>
    ind.violation === 0 && (reachesBound(until, ind.f) || (runs !== null && runs.proves(top.threshold(), until.boundTolerance)));
  // The run ends early on a proven bound, or when it has gone stallEvaluations without a better
  // incumbent (a run that has found nothing feasible keeps looking until its budget is spent).
  const halted = (): boolean => {
    if (proven(best)) {
      stoppedBy = 'bound';
      return true;
    }
    if (runs !== null && runs.lowerBound() === Infinity) {
      // Every cell is solved or ruled out by the bounds: what was found is all there is.
      stoppedBy = incumbent < Infinity ? 'bound' : 'exhausted';
      return true;
    }
    if (incumbent < Infinity && spent() - foundAt >= until.stallEvaluations) {
      stoppedBy = 'stall';
      return true;
    }
    return false;
  };

  // A cell the proof solved feasible: exact already, it joins the list and may be the new best.
  const found = (genes: Float64Array, px: Float64Array, f: Float64Array): void => {
    keep(px, f);
    if (f[0] < bestFeasible && top.size > 0) bestFeasible = top.f(0)[0];
    if (f[0] < incumbent) {
      incumbent = f[0];
      foundAt = spent();
    }
    const ind: Individual = { genes: Float64Array.from(genes), f: f[0], violation: 0, x: Float64Array.from(px) };
    const k = key(genes);
    const record = { f: ind.f, violation: 0, x: ind.x };
    memo.set(k, record);
    fineMemo.set(k, record);
    if (better(ind, best)) best = ind;
  };
  // The proof's turn: refine the least open runs, on the list's k-th best, until its work matches the
  // search's so far (an even, self-adjusting split: a search that fills the list with good springs
  // early leaves the proof little to refine).
  const prove = (): void => {
    if (runs === null) return;
    const before = work();
    const limit = Math.min(before + (before - proofWork) - proofWork, budget + ws.stats.boundCalls);
    if (limit > before) runs.refine(fineWs, () => top.threshold(), until.boundTolerance, limit, found);
    proofWork += work() - before;
  };

  // Closing hill-climb over the integer genes: moves of one step in one gene or in two genes at once
  // (a thicker wire wants fewer coils), taken while they improve.
  const integerGenes = p.variables.map((v, i) => (i !== s && v.kind !== 'continuous' ? i : -1)).filter((i) => i >= 0);
  const moves: [number, number, number, number][] = [];
  for (const i of integerGenes) for (const di of [-1, 1]) moves.push([i, di, -1, 0]);
  for (const i of integerGenes) for (const j of integerGenes) if (j > i) for (const di of [-1, 1]) for (const dj of [-1, 1]) moves.push([i, di, j, dj]);
  const hillClimb = (from: Individual, limit: number): Individual => {
    let here = from;
    let last = -1;
    let improved = true;
    while (improved && spent() < limit && !halted()) {
      improved = false;
      // The move that worked last is tried first: descents along one gene are common.
      for (let t = -1; t < moves.length && spent() < limit; t++) {
        const m = t < 0 ? last : t;
        if (m < 0 || (t >= 0 && t === last)) continue;
        const [i, di, j, dj] = moves[m];
        const g = Float64Array.from(here.genes);
        g[i] += di;
        if (j >= 0) g[j] += dj;
        if (g[i] < 0 || g[i] >= sizes[i] || (j >= 0 && (g[j] < 0 || g[j] >= sizes[j]))) continue;
        const cand = assess(g);
        if (better(cand, here)) {
          here = cand;
          last = m;
          improved = true;
          break;
        }
      }
    }
    return here;
  };

  const rate = 1.5 / Math.max(1, n - (s >= 0 ? 1 : 0));
  // Rounds until the budget is spent: generations on coarse cells until they stall, then a hill-climb
  // from the best judged at full precision (the best combination may be feasible only in a sliver of
  // diameters that the coarse scan stepped over), then a restart around the best with fresh random
  // individuals. Half the budget at most goes to a round's generations before its hill-climb.
  const fineClimb = s >= 0 && discreteGenes;
  let pop: Individual[] = [];
  while (pop.length < popSize) pop.push(assess(randomGenes()));
  best = pop.reduce((a, b) => (better(b, a) ? b : a));
  // The budget is checked before each cell, and the reported cells are solved again at the end: keep
  // back what those cost, so that the whole run stays within maxEvaluations.
  const budget = Math.max(0, until.maxEvaluations - 256 - 64 * top.k);
  prove();
  for (let round = 0; round < 10_000 && spent() < budget; round++) {
    if (halted()) break;
    const cellsBefore = counts.cells;
    const roundEnd = spent() + 0.5 * (budget - spent());
    let sinceBetter = 0;
    cw = ws;
    cm = memo;
    while (spent() < roundEnd && sinceBetter < stall && !halted()) {
      pop.sort((a, b) => (better(a, b) ? -1 : better(b, a) ? 1 : 0));
      const next: Individual[] = [pop[0], pop[1]];
      while (next.length < popSize && spent() < roundEnd) {
        const pa = tournament(pop);
        const pb = tournament(pop);
        const child = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          const v = p.variables[i];
          if (v.kind === 'continuous' && i !== s) {
            const lo = Math.min(pa.genes[i], pb.genes[i]);
            const hi = Math.max(pa.genes[i], pb.genes[i]);
            const ext = 0.5 * (hi - lo);
            child[i] = Math.min(v.max, Math.max(v.min, lo - ext + rng() * (hi - lo + 2 * ext)));
          } else {
            child[i] = rng() < 0.5 ? pa.genes[i] : pb.genes[i];
          }
        }
        mutate(child, rate);
        next.push(assess(child));
      }
      pop = next;
      prove();
      if (better(best, pop[0]) && better(best, pop[1])) pop[pop.length - 1] = best;
      const genBest = pop.reduce((a, b) => (better(b, a) ? b : a));
      if (better(genBest, best)) {
        best = genBest;
        sinceBetter = 0;
      } else sinceBetter++;
    }
    if (fineClimb) {
      cw = fineWs;
      cm = fineMemo;
      bestFeasible = Infinity;
      best = hillClimb(assess(Float64Array.from(best.genes)), budget);
    } else best = hillClimb(best, budget);
    prove();
    // A whole round that met no combination it had not seen means the space is exhausted.
    if (halted()) break;
    if (counts.cells === cellsBefore) {
      stoppedBy = 'exhausted';
      break;
    }
    pop = [best];
    cw = ws;
    cm = memo;
    while (pop.length < popSize) pop.push(assess(randomGenes()));
  }
  if (runs !== null) {
    counts.cells += runs.cellsSolved;
    counts.feasible += runs.cellsFeasible;
  }
  if (s < 0) return { ...packResult('genetic', p, top, null, ws, counts, misses, stoppedBy), evaluationsToBest: foundAt };
  // Solve the reported cells again at the grid's tolerance.
  const fine = makeWorkspace(p, undefined, ws.stats);
  const finalTop = new TopK(top.k, n, p.objectiveNames.length);
  for (let r = 0; r < top.size; r++) {
    x.set(top.x(r));
    resolveCell(p, s, x, fine, increasing, (px, f) => finalTop.offer(px, f));
  }
  return { ...packResult('genetic', p, finalTop.size ? finalTop : top, null, ws, counts, misses, stoppedBy), evaluationsToBest: foundAt };
}
