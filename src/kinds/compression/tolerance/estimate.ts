// A cheap yield estimate for the search's hot loop: first-order margins. Each toleranced quantity is
// normal with its half-width as three standard deviations (z standard normal in units of sigma); each
// check value g is first taken as linear over +-1 sigma: g_j = g0_j + a_j . z with a_ij = (g_j(q + s_i)
// - g_j(q - s_i)) / 2, beta_j = -g0_j / |a_j|. For a check that may fail, the linearisation is then
// moved to its most probable failure point (the first-order reliability method: Hasofer and Lind,
// with the Rackwitz-Fiessler iteration), which accounts for the skew of products such as the rate
// G d^4 / (8 D^3 Na). A check alone passes with probability Phi(beta_j). The
// checks share their causes (a stiffer spring raises the operating force, the stress and the solid
// force at once), so their joint pass probability is the multinormal orthant probability with
// correlations a_i . a_j / (|a_i| |a_j|), evaluated by the product of conditional margins (Pandey,
// "An effective approximation to evaluate multinormal integrals", Structural Safety 20, 1998).
// Nothing is allocated per call: the caller holds a scratch.
import { CHECKS } from '../verify.js';

/** Writes the check values of the made spring q into g. */
export type CheckEvaluator = (q: ArrayLike<number>, g: Float64Array) => void;

export interface YieldScratch {
  readonly q: Float64Array;
  readonly g0: Float64Array;
  readonly gPlus: Float64Array;
  readonly gMinus: Float64Array;
  readonly variance: Float64Array;
  /** Gradients in sigma units, a[j * quantities + i], and the working arrays of the conditioning. */
  readonly gradient: Float64Array;
  readonly beta: Float64Array;
  readonly rho: Float64Array;
  readonly order: Int32Array;
  /** Design point and the gradient there (quantities), the checks evaluated there. */
  readonly u: Float64Array;
  readonly b: Float64Array;
  readonly gu: Float64Array;
  /** Per check: the estimated probability of passing (1 for checks left out). */
  readonly pass: Float64Array;
  /** The check with the lowest pass probability after the last call, -1 when none is short of 1. */
  limiting: number;
  /** Bonferroni lower bound on the yield of the last call: 1 - sum of the failure probabilities. */
  lowerBound: number;
  /** The product of the single-check probabilities (exact for uncorrelated checks, low otherwise). */
  independent: number;
}

export function yieldScratch(quantities: number, checks = CHECKS.length): YieldScratch {
  return {
    q: new Float64Array(quantities),
    g0: new Float64Array(checks),
    gPlus: new Float64Array(checks),
    gMinus: new Float64Array(checks),
    variance: new Float64Array(checks),
    gradient: new Float64Array(checks * quantities),
    beta: new Float64Array(checks),
    rho: new Float64Array(checks * checks),
    order: new Int32Array(checks),
    u: new Float64Array(quantities),
    b: new Float64Array(quantities),
    gu: new Float64Array(checks),
    pass: new Float64Array(checks),
    limiting: -1,
    lowerBound: 1,
    independent: 1,
  };
}

const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

/** Standard normal distribution function, Abramowitz and Stegun 26.2.17 (absolute error < 7.5e-8). */
export function normalCdf(x: number): number {
  if (x !== x) return NaN;
  const t = 1 / (1 + 0.2316419 * Math.abs(x));
  const tail = INV_SQRT_2PI * Math.exp(-0.5 * x * x) * t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  return x >= 0 ? 1 - tail : tail;
}

/** Checks whose margin exceeds this many standard deviations pass for certain (Phi(-8) < 1e-15). */
const SURE = 8;

/** Rackwitz-Fiessler steps from the linear estimate's design point (two settle the springs' checks). */
const FORM_STEPS = 2;

/** Evaluate all checks at q = nominal + sigma * u into out. */
function evaluateAt(evaluate: CheckEvaluator, nominal: ArrayLike<number>, sigma: ArrayLike<number>, u: Float64Array, s: YieldScratch, out: Float64Array): void {
  for (let i = 0; i < s.q.length; i++) s.q[i] = nominal[i] + sigma[i] * u[i];
  evaluate(s.q, out);
}

/**
 * Reliability index of check j at its most probable failure point, starting from the linear estimate;
 * the gradient row of j becomes the gradient there (its direction sets the correlations). Returns NaN
 * when a step meets a non-finite check value (the linear estimate then stands).
 */
function designPointBeta(evaluate: CheckEvaluator, nominal: ArrayLike<number>, sigma: ArrayLike<number>, s: YieldScratch, j: number): number {
  const n = s.q.length;
  const { u, b, gu } = s;
  const scale = -s.g0[j] / s.variance[j];
  for (let i = 0; i < n; i++) u[i] = scale * s.gradient[j * n + i];
  let beta = NaN;
  for (let step = 0; step < FORM_STEPS; step++) {
    evaluateAt(evaluate, nominal, sigma, u, s, gu);
    const g = gu[j];
    if (g !== g) return NaN;
    // Gradient at u by central differences of half a sigma.
    let bb = 0;
    let bu = 0;
    for (let i = 0; i < n; i++) {
      b[i] = 0;
      if (!(sigma[i] > 0)) continue;
      const ui = u[i];
      u[i] = ui + 0.5;
      evaluateAt(evaluate, nominal, sigma, u, s, s.gPlus);
      u[i] = ui - 0.5;
      evaluateAt(evaluate, nominal, sigma, u, s, s.gMinus);
      u[i] = ui;
      b[i] = s.gPlus[j] - s.gMinus[j];
      bb += b[i] * b[i];
      bu += b[i] * ui;
    }
    if (!(bb > 0) || bb !== bb) return NaN;
    beta = (bu - g) / Math.sqrt(bb);
    const next = (bu - g) / bb;
    for (let i = 0; i < n; i++) u[i] = next * b[i];
  }
  let variance = 0;
  for (let i = 0; i < n; i++) {
    s.gradient[j * n + i] = b[i];
    variance += b[i] * b[i];
  }
  s.variance[j] = variance;
  return beta;
}

/**
 * Estimated fraction of made springs that pass every included check. `nominal` and `sigma` hold each
 * toleranced quantity and its standard deviation; `include` marks the checks that judge a made spring.
 * A check that does not vary passes or fails outright; a NaN check value fails.
 */
export function estimateYield(evaluate: CheckEvaluator, nominal: ArrayLike<number>, sigma: ArrayLike<number>, include: Uint8Array, s: YieldScratch): number {
  const n = s.q.length;
  const m = include.length;
  for (let i = 0; i < n; i++) s.q[i] = nominal[i];
  evaluate(s.q, s.g0);
  s.variance.fill(0);
  s.gradient.fill(0);
  for (let i = 0; i < n; i++) {
    const h = sigma[i];
    if (!(h > 0)) continue;
    s.q[i] = nominal[i] + h;
    evaluate(s.q, s.gPlus);
    s.q[i] = nominal[i] - h;
    evaluate(s.q, s.gMinus);
    s.q[i] = nominal[i];
    for (let j = 0; j < m; j++) {
      if (include[j] === 0) continue;
      const half = 0.5 * (s.gPlus[j] - s.gMinus[j]);
      s.gradient[j * n + i] = half;
      s.variance[j] += half * half;
    }
  }
  // Single-check probabilities; the uncertain checks (neither sure to pass nor to fail) go on to the joint step.
  let product = 1;
  let failSum = 0;
  let worst = 1;
  let count = 0;
  s.limiting = -1;
  for (let j = 0; j < m; j++) {
    let p = 1;
    if (include[j] === 1) {
      const g = s.g0[j];
      const sd = Math.sqrt(s.variance[j]);
      if (g !== g || sd !== sd) p = 0;
      else if (sd > 0) {
        let beta = -g / sd;
        if (beta < SURE && beta > -SURE) {
          const refined = designPointBeta(evaluate, nominal, sigma, s, j);
          if (refined === refined) beta = refined;
        }
        p = normalCdf(beta);
        if (beta < SURE) {
          s.beta[j] = beta;
          s.order[count++] = j;
        }
      } else p = g <= 0 ? 1 : 0;
    }
    s.pass[j] = p;
    product *= p;
    failSum += 1 - p;
    if (p < worst) {
      worst = p;
      s.limiting = j;
    }
  }
  s.independent = product;
  s.lowerBound = failSum < 1 ? 1 - failSum : 0;
  if (product === 0 || count <= 1) return product;
  return conditionalMargins(s, count, n);
}

/** Pandey's product of conditional margins over the `count` checks listed in s.order. */
function conditionalMargins(s: YieldScratch, count: number, n: number): number {
  const { order, beta, rho, gradient } = s;
  // Most critical first (insertion sort: a handful of checks).
  for (let a = 1; a < count; a++) {
    const j = order[a];
    let b = a - 1;
    while (b >= 0 && beta[order[b]] > beta[j]) {
      order[b + 1] = order[b];
      b--;
    }
    order[b + 1] = j;
  }
  // Correlations of the listed checks, rho[a * count + b]. Two checks with opposite gradients are the
  // two sides of one band (the operating force's, say): the conditioning's normal approximation does
  // not hold for them, but their joint probability is exact, Phi(beta_a) + Phi(beta_b) - 1, and no
  // larger set of checks passes more often than any one of its pairs.
  let bound = 1;
  for (let a = 0; a < count; a++) {
    const ja = order[a];
    for (let b = a; b < count; b++) {
      const jb = order[b];
      let dot = 0;
      for (let i = 0; i < n; i++) dot += gradient[ja * n + i] * gradient[jb * n + i];
      const r = dot / Math.sqrt(s.variance[ja] * s.variance[jb]);
      const clipped = r > 1 ? 1 : r < -1 ? -1 : r;
      rho[a * count + b] = clipped;
      rho[b * count + a] = clipped;
      if (clipped < -1 + 1e-9) bound = Math.min(bound, Math.max(0, normalCdf(beta[ja]) + normalCdf(beta[jb]) - 1));
    }
    // The conditioned reliability indices live in s.gPlus from here on (scratch reuse).
    s.gPlus[a] = beta[ja];
  }
  if (bound === 0) return 0;
  let p = 1;
  for (let k = 0; k < count; k++) {
    const bk = s.gPlus[k];
    const pk = normalCdf(bk);
    p *= pk;
    if (!(pk > 0)) return 0;
    if (k === count - 1) break;
    // Condition the rest on Z_k <= beta_k: mean -rho A, variance 1 - rho^2 (1 - B).
    const A = (INV_SQRT_2PI * Math.exp(-0.5 * bk * bk)) / pk;
    const shrink = A * (bk + A);
    for (let a = k + 1; a < count; a++) {
      const r = rho[a * count + k];
      s.gMinus[a] = Math.sqrt(Math.max(1 - r * r * shrink, 1e-12));
      s.gPlus[a] = (s.gPlus[a] + r * A) / s.gMinus[a];
    }
    for (let a = k + 1; a < count; a++) {
      for (let b = a + 1; b < count; b++) {
        const r = (rho[a * count + b] - rho[a * count + k] * rho[b * count + k] * shrink) / (s.gMinus[a] * s.gMinus[b]);
        const clipped = r > 1 ? 1 : r < -1 ? -1 : r;
        rho[a * count + b] = clipped;
        rho[b * count + a] = clipped;
      }
    }
  }
  return p < bound ? p : bound;
}
