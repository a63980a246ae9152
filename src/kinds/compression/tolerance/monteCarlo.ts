// The yield confirmed by sampling: made springs drawn at random (each toleranced quantity normal and
// independent, its half-width three standard deviations), each judged by the requirement checks.
// Every draw flows from the seed (seedrandom's generator, src/kinds/compression/tolerance/arc4Stream.ts):
// same seed, same springs, same figures.
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { CHECKS, type CheckName } from '../verify.js';
import { Arc4Stream } from './arc4Stream.js';
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

/** Samples drawn and judged per batch: small enough that each loop below is optimised by V8 as a plain
 * function called many times (a loop running through every sample in one call is optimised on the
 * stack, which costs a cold run several times as much to compile). */
const BATCH = 64;
/** Uniforms drawn at a time (even: the polar method takes them in pairs). */
const UNIFORMS = 256;

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
  const n = nominal.length;
  // A process that has just started runs this in V8's interpreter until each loop is optimised: so the
  // work is split into small loops of one kind each (deviates, then made springs and verdicts), run batch
  // by batch, which V8 optimises sooner and compiles faster than one loop that does everything.
  // Everything they read is set up once per run in typed arrays: nothing is allocated per sample.
  const deviates = standardDeviates(String(opts.seed ?? 1), samples * n);
  const z = new Float64Array(BATCH * n);
  const tally: Tally = {
    mean: Float64Array.from(nominal),
    sd: Float64Array.from(sigma),
    q: new Float64Array(n),
    g: new Float64Array(include.length),
    failed: new Float64Array(include.length),
    checks: Int32Array.from(include.keys()).filter((j) => include[j] === 1),
    passed: 0,
  };
  for (let k = 0; k < samples; k += BATCH) {
    const batch = Math.min(BATCH, samples - k);
    judgeBatch(evaluate, tally, deviates.next(z, batch * n), batch);
  }
  const y = tally.passed / samples;
  const failures: Partial<Record<CheckName, number>> = {};
  let limiting: CheckName | null = null;
  let most = 0;
  tally.failed.forEach((count, j) => {
    if (include[j] !== 1) return;
    failures[CHECKS[j]] = count;
    if (count > most) {
      most = count;
      limiting = CHECKS[j];
    }
  });
  return { yield: y, samples, standardError: Math.sqrt((y * (1 - y)) / samples), failures, limiting };
}

/** What the verdict loop reads and counts. */
interface Tally {
  readonly mean: Float64Array;
  readonly sd: Float64Array;
  /** The made spring being judged, and its check values. */
  readonly q: Float64Array;
  readonly g: Float64Array;
  /** Per check (CHECKS order): how many sampled springs failed it. */
  readonly failed: Float64Array;
  /** The judged checks' indices. */
  readonly checks: Int32Array;
  passed: number;
}

/** Judge `batch` made springs, sample k made of the deviates z[k n .. k n + n): q = mean + sd z. */
function judgeBatch(evaluate: CheckEvaluator, t: Tally, z: Float64Array, batch: number): void {
  const { mean, sd, q, g, failed, checks } = t;
  const n = q.length;
  let passed = 0;
  for (let k = 0, at = 0; k < batch; k++) {
    for (let i = 0; i < n; i++, at++) q[i] = mean[i] + sd[i] * z[at];
    evaluate(q, g);
    let ok = 1;
    for (let m = 0; m < checks.length; m++) {
      const j = checks[m];
      if (!(g[j] <= 0)) {
        ok = 0;
        failed[j]++;
      }
    }
    passed += ok;
  }
  t.passed += passed;
}

/** The standard normal deviates of a seed, taken in turn. */
interface DeviateSource {
  /** The next `count` deviates: written into `scratch` (which holds at least count), or a view of a table. */
  next(scratch: Float64Array, count: number): Float64Array;
}

/** The seed whose first deviates the build computes into a table: the default seed (Requirements.seed). */
export const DEVIATES_TABLE_SEED = '1';
/** How many: what the design's confirmation of a listed spring takes (20,000 samples of 5 quantities). */
export const DEVIATES_TABLE_LENGTH = 100_000;
/** The table's file, beside the module (for the bundled CLI, dist/cli/): float64 little-endian. */
export const DEVIATES_TABLE_FILE = 'deviates-seed-1.f64';

/**
 * The deviates of `seed`, `count` of them to be taken: from the table the build computed for the default
 * seed when it is there and long enough, else computed here. The table holds the very numbers computed
 * here (scripts/build.mjs writes computeDeviates(DEVIATES_TABLE_SEED, DEVIATES_TABLE_LENGTH);
 * test/kinds/compression/tolerance/deviatesTable.test.ts fails while a built one differs): it spares
 * every run with the default seed the generator's cold start, about a third of a design's Monte Carlo.
 */
function standardDeviates(seed: string, count: number): DeviateSource {
  const table = seed === DEVIATES_TABLE_SEED ? deviatesTable() : undefined;
  if (table === undefined || table.length < count) return new NormalDeviates(seed);
  let at = 0;
  return {
    next(_scratch, n) {
      at += n;
      return table.subarray(at - n, at);
    },
  };
}

let tableRead: Float64Array | null | undefined;
function deviatesTable(): Float64Array | undefined {
  if (tableRead === undefined) {
    tableRead = null;
    // Only where the bytes mean what they say: a little-endian machine and a file of the full length.
    const littleEndian = new Uint8Array(Float64Array.of(1).buffer)[7] === 0x3f;
    const file = fileURLToPath(new URL(DEVIATES_TABLE_FILE, import.meta.url));
    if (littleEndian && existsSync(file)) {
      const bytes = readFileSync(file);
      if (bytes.length === DEVIATES_TABLE_LENGTH * 8)
        tableRead =
          bytes.byteOffset % 8 === 0
            ? new Float64Array(bytes.buffer, bytes.byteOffset, DEVIATES_TABLE_LENGTH)
            : new Float64Array(Uint8Array.from(bytes).buffer);
    }
  }
  return tableRead ?? undefined;
}

/** The first `count` deviates of `seed`, computed: the stream the samples draw from. */
export function computeDeviates(seed: string, count: number): Float64Array {
  return new NormalDeviates(seed).next(new Float64Array(count), count);
}

/**
 * Standard normal deviates by Marsaglia's polar method (Marsaglia and Bray, 1964) from the seeded uniform
 * stream: a point (u, v) drawn in the square [-1, 1)^2 and kept when inside the unit circle gives two
 * deviates, u's first. The deviates form one plain list, the samples and their quantities taking them
 * in turn (a pair may straddle two samples); the list is specified in
 * test/kinds/compression/tolerance/yield.test.ts.
 */
class NormalDeviates implements DeviateSource {
  private readonly stream: Arc4Stream;
  private readonly uniforms = new Float64Array(UNIFORMS);
  /** Next unused uniform (UNIFORMS: none left). */
  private at = UNIFORMS;
  /** The second deviate of the last pair when it is not used yet, else NaN. */
  private spare = NaN;

  constructor(seed: string) {
    this.stream = new Arc4Stream(seed);
  }

  next(out: Float64Array, count: number): Float64Array {
    const uniforms = this.uniforms;
    let p = this.at;
    let m = 0;
    if (count > 0 && this.spare === this.spare) {
      out[m++] = this.spare;
      this.spare = NaN;
    }
    while (m < count) {
      if (p === UNIFORMS) {
        this.stream.fill(uniforms);
        p = 0;
      }
      const u = 2 * uniforms[p] - 1;
      const v = 2 * uniforms[p + 1] - 1;
      p += 2;
      const s = u * u + v * v;
      if (s >= 1 || s === 0) continue;
      const f = Math.sqrt((-2 * Math.log(s)) / s);
      out[m++] = u * f;
      if (m < count) out[m++] = v * f;
      else this.spare = v * f;
    }
    this.at = p;
    return out;
  }
}
