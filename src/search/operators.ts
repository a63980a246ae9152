// The genetic operators both genetic searches are assembled from (after pymoo's split of an algorithm
// into sampling, selection, mutation and repair): the encoding of a point as genes, random sampling,
// neighbour-step mutation, binary tournament selection and the closing full-precision re-solve. Every
// draw comes from the caller's seeded generator, in a fixed order, so a seed gives one result.
import { CellMode, solveCell, type CellWorkspace } from './cell.js';
import { solvedIndex, valueAt, valueCount, type Problem } from './problem.js';

export type Rng = () => number;

/** Genes of a problem: list and range variables are integer genes (indices into their values),
 * scanned continuous variables real genes; the solved variable is no gene (each individual is repaired
 * by solving its cell). */
export interface Encoding {
  p: Problem;
  /** Index of the solved variable, or -1. */
  s: number;
  n: number;
  /** Per variable, its number of values (0 for a continuous gene, 1 for the solved variable). */
  sizes: number[];
  /** Every gene is an integer one: a genome then names a cell, and cells can be memoised by key. */
  discrete: boolean;
}

export function encoding(p: Problem): Encoding {
  const s = solvedIndex(p);
  const sizes = p.variables.map((v, i) => (i === s ? 1 : v.kind === 'continuous' ? 0 : valueCount(v)));
  return { p, s, n: p.variables.length, sizes, discrete: p.variables.every((v, i) => i === s || v.kind !== 'continuous') };
}

/** A number naming the cell of integer genes (mixed radix over the gene sizes). */
export function cellKey(e: Encoding, genes: Float64Array): number {
  let k = 0;
  for (let i = 0; i < e.n; i++) if (i !== e.s) k = k * e.sizes[i] + genes[i];
  return k;
}

/** Write the variables' values for the genes into x (the solved variable left as it is). */
export function decode(e: Encoding, genes: Float64Array, x: Float64Array): void {
  for (let i = 0; i < e.n; i++) {
    if (i === e.s) continue;
    const v = e.p.variables[i];
    x[i] = v.kind === 'continuous' ? genes[i] : valueAt(v, genes[i]);
  }
}

/** Uniform random genes: one draw per gene, in variable order. */
export function randomGenes(e: Encoding, rng: Rng): Float64Array {
  const g = new Float64Array(e.n);
  e.p.variables.forEach((v, i) => {
    if (i === e.s) return;
    g[i] = v.kind === 'continuous' ? v.min + rng() * (v.max - v.min) : Math.floor(rng() * e.sizes[i]);
  });
  return g;
}

/** Mutate each gene with probability `rate`: a real gene by a Gaussian step of 5% of its span; an
 * integer gene to a random value (with probability `resetShare`), else by a step of up to a twelfth
 * of its range either way, so that neighbouring wire sizes and coil counts are tried first. */
export function mutate(e: Encoding, g: Float64Array, rate: number, resetShare: number, rng: Rng): void {
  e.p.variables.forEach((v, i) => {
    if (i === e.s || rng() >= rate) return;
    if (v.kind === 'continuous') {
      const span = v.max - v.min;
      const gauss = Math.sqrt(-2 * Math.log(1 - rng())) * Math.cos(2 * Math.PI * rng());
      g[i] = Math.min(v.max, Math.max(v.min, g[i] + gauss * 0.05 * span));
    } else if (resetShare > 0 && rng() < resetShare) {
      g[i] = Math.floor(rng() * e.sizes[i]);
    } else {
      const size = e.sizes[i];
      const reach = Math.max(1, Math.round(size / 12));
      const step = 1 + Math.floor(rng() * reach);
      g[i] = Math.min(size - 1, Math.max(0, g[i] + (rng() < 0.5 ? -step : step)));
    }
  });
}

/** Binary tournament: the better of two members drawn at random. */
export function tournament<T>(pop: readonly T[], better: (a: T, b: T) => boolean, rng: Rng): T {
  const a = pop[Math.floor(rng() * pop.length)];
  const b = pop[Math.floor(rng() * pop.length)];
  return better(a, b) ? a : b;
}

/** Solve the cell of x again at full precision (the searches judge cells coarsely) and hand each
 * feasible point to sink: the cell's first feasible point when objective 0 grows with the solved
 * variable, else every scanned feasible point. */
export function resolveCell(
  p: Problem,
  s: number,
  x: Float64Array,
  fine: CellWorkspace,
  increasing: boolean,
  sink: (x: Float64Array, f: Float64Array) => void,
): boolean {
  if (increasing) {
    const ok = solveCell(p, s, x, fine, CellMode.First, null, null) === true;
    if (ok) sink(x, fine.f);
    return ok;
  }
  return solveCell(p, s, x, fine, CellMode.All, sink, null) === true;
}
