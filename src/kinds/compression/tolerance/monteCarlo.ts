// The yield confirmed by sampling: made springs drawn at random (each toleranced quantity normal and
// independent, its half-width three standard deviations), each judged by the requirement checks.
// Every draw flows from the seed (seedrandom): same seed, same springs, same figures.
import seedrandom from 'seedrandom';
import { CHECKS, type CheckName } from '../verify.js';
import type { CheckEvaluator } from './estimate.js';

export const DEFAULT_SAMPLES = 5_000;

export interface MonteCarloOptions {
  samples?: number;
  seed?: number | string;
}

export interface YieldResult {
  /** Fraction of sampled springs that passed every included check. */
  yield: number;
  samples: number;
  /** Binomial standard error of the yield. */
  standardError: number;
  /** Per check: how many sampled springs failed it. */
  failures: Partial<Record<CheckName, number>>;
  /** The check failed most often, or null when none failed. */
  limiting: CheckName | null;
}

/** Standard normal deviates from a uniform generator (Marsaglia's polar method), two per round. */
export function normalSource(uniform: () => number): () => number {
  let spare = NaN;
  return () => {
    if (spare === spare) {
      const z = spare;
      spare = NaN;
      return z;
    }
    let u = 0;
    let v = 0;
    let s = 0;
    do {
      u = 2 * uniform() - 1;
      v = 2 * uniform() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const f = Math.sqrt((-2 * Math.log(s)) / s);
    spare = v * f;
    return u * f;
  };
}

/**
 * Sample made springs around `nominal` with standard deviations `sigma`, judge each with `evaluate`
 * (checks marked in `include`; a NaN value fails) and count the passes.
 */
export function monteCarloYield(evaluate: CheckEvaluator, nominal: ArrayLike<number>, sigma: ArrayLike<number>, include: Uint8Array, opts: MonteCarloOptions = {}): YieldResult {
  const samples = opts.samples ?? DEFAULT_SAMPLES;
  if (!(Number.isInteger(samples) && samples > 0)) throw new RangeError(`samples must be a positive whole number, got ${samples}`);
  const normal = normalSource(seedrandom(String(opts.seed ?? 1)));
  const n = nominal.length;
  const q = new Float64Array(n);
  const g = new Float64Array(include.length);
  const failed = new Float64Array(include.length);
  let passed = 0;
  for (let k = 0; k < samples; k++) {
    for (let i = 0; i < n; i++) q[i] = nominal[i] + sigma[i] * normal();
    evaluate(q, g);
    let ok = true;
    for (let j = 0; j < include.length; j++) {
      if (include[j] === 1 && !(g[j] <= 0)) { ok = false; failed[j]++; }
    }
    if (ok) passed++;
  }
  const y = passed / samples;
  const failures: Partial<Record<CheckName, number>> = {};
  let limiting: CheckName | null = null;
  let most = 0;
  failed.forEach((count, j) => {
    if (include[j] !== 1) return;
    failures[CHECKS[j]] = count;
    if (count > most) { most = count; limiting = CHECKS[j]; }
  });
  return { yield: y, samples, standardError: Math.sqrt((y * (1 - y)) / samples), failures, limiting };
}
