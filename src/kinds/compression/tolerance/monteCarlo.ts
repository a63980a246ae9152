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

/**
 * Sample made springs around `nominal` with standard deviations `sigma`, judge each with `evaluate`
 * (checks marked in `include`; a NaN value fails) and count the passes.
 */
export function monteCarloYield(
  evaluate: CheckEvaluator,
  nominal: ArrayLike<number>,
  sigma: ArrayLike<number>,
  include: Uint8Array,
  opts: MonteCarloOptions = {},
): YieldResult {
  const samples = opts.samples ?? DEFAULT_SAMPLES;
  if (!(Number.isInteger(samples) && samples > 0)) throw new RangeError(`samples must be a positive whole number, got ${samples}`);
  const uniform = seedrandom(String(opts.seed ?? 1));
  const n = nominal.length;
  // Everything the loop reads is set up once per run, in typed arrays: the loop allocates nothing and
  // calls only the generator and the evaluator, so it runs fast even before the JIT has warmed up.
  const mean = Float64Array.from(nominal);
  const sd = Float64Array.from(sigma);
  const q = new Float64Array(n);
  const g = new Float64Array(include.length);
  const failed = new Float64Array(include.length);
  let judged = 0;
  for (let j = 0; j < include.length; j++) if (include[j] === 1) judged++;
  const checks = new Int32Array(judged);
  for (let j = 0, m = 0; j < include.length; j++) if (include[j] === 1) checks[m++] = j;
  let passed = 0;
  // Standard normal deviates by Marsaglia's polar method, two per round, written into the loop (a
  // generator closure called per quantity costs more than the checks): the spare deviate is carried
  // from one quantity, and one sample, to the next (the stream is specified as a plain list of
  // deviates in test/kinds/compression/tolerance/yield.test.ts).
  let spare = NaN;
  for (let k = 0; k < samples; k++) {
    for (let i = 0; i < n; i++) {
      let z = spare;
      if (z === z) spare = NaN;
      else {
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
        z = u * f;
      }
      q[i] = mean[i] + sd[i] * z;
    }
    evaluate(q, g);
    let ok = true;
    for (let m = 0; m < judged; m++) {
      const j = checks[m];
      if (!(g[j] <= 0)) {
        ok = false;
        failed[j]++;
      }
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
    if (count > most) {
      most = count;
      limiting = CHECKS[j];
    }
  });
  return { yield: y, samples, standardError: Math.sqrt((y * (1 - y)) / samples), failures, limiting };
}
