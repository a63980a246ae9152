// The uniform stream of the seeded Monte Carlo: seedrandom's default generator written over typed
// arrays. seedrandom(seed) keys ARC4 (RC4) with the characters of the seed string, drops the first 256
// bytes, and forms each uniform in [0, 1) from six bytes and as many more as fill 52 significant bits;
// this class does the same steps in the same order, so it gives the very numbers seedrandom(seed)() gives
// (test/kinds/compression/tolerance/arc4Stream.test.ts compares the two over long runs and many seeds).
// Why not call seedrandom: its generator is a closure over a plain array, called once per uniform; the
// Monte Carlo asks for a hundred thousand uniforms in a process that has just started, and filling a
// typed array in one tight loop (fill) costs that cold start less (with the batched sampling loop of
// monteCarlo.ts, 246 M -> 220 M instructions for a design's 20,000 samples, V8 single-threaded).
// The byte stream follows Rivest's RC4 (key scheduling, then i, j and the swap per output byte).

const WIDTH = 256;
const MASK = WIDTH - 1;
/** Bytes are appended until the numerator has 52 significant bits... */
const SIGNIFICANCE = 2 ** 52;
/** ...and shifted back below 2^53 so that adding the last byte cannot round up. */
const OVERFLOW = 2 ** 53;

export class Arc4Stream {
  private readonly s = new Int32Array(WIDTH);
  private i = 0;
  private j = 0;
  private readonly one = new Float64Array(1);

  /** The stream seedrandom(seed) draws from (a string seed, as the Monte Carlo passes it). */
  constructor(seed: string) {
    // seedrandom's key: the seed's character codes, low byte, one per key slot; a seed longer than 256
    // characters folds its later characters into the same slots with the running "smear" seedrandom uses.
    const keyLength = Math.min(seed.length, WIDTH);
    const key = new Int32Array(Math.max(keyLength, 1));
    let smear = 0;
    for (let n = 0; n < seed.length; n++) {
      const slot = n & MASK;
      if (n >= WIDTH) smear ^= key[slot] * 19;
      key[slot] = MASK & (smear + seed.charCodeAt(n));
    }
    const s = this.s;
    for (let n = 0; n < WIDTH; n++) s[n] = n;
    const length = key.length;
    for (let n = 0, j = 0; n < WIDTH; n++) {
      const t = s[n];
      j = MASK & (j + key[n % length] + t);
      s[n] = s[j];
      s[j] = t;
    }
    // The first 256 output bytes are dropped, as seedrandom drops them.
    for (let n = 0; n < WIDTH; n++) this.byte();
  }

  /** The next output byte. */
  private byte(): number {
    const s = this.s;
    const i = (this.i = MASK & (this.i + 1));
    const t = s[i];
    const j = (this.j = MASK & (this.j + t));
    const a = s[j];
    s[i] = a;
    s[j] = t;
    return s[MASK & (a + t)];
  }

  /** The next uniform in [0, 1). */
  next(): number {
    this.fill(this.one, 1);
    return this.one[0];
  }

  /** Write the next `count` uniforms into out[0 .. count). */
  fill(out: Float64Array, count: number = out.length): void {
    const s = this.s;
    let i = this.i;
    let j = this.j;
    for (let m = 0; m < count; m++) {
      // seedrandom's steps: n = the first six bytes, then while n < 2^52 shift it a byte left (adding the
      // last byte x taken) and take the next byte as x. Shifting from n = x = 0 six times builds the same
      // n and x, so one loop takes every byte: seven always, more while n < 2^52.
      let n = 0;
      let d = 1;
      let x = 0;
      for (let b = 0; b < 7 || n < SIGNIFICANCE; b++) {
        n = (n + x) * WIDTH;
        d *= WIDTH;
        i = MASK & (i + 1);
        const t = s[i];
        j = MASK & (j + t);
        const a = s[j];
        s[i] = a;
        s[j] = t;
        x = s[MASK & (a + t)];
      }
      while (n >= OVERFLOW) {
        n /= 2;
        d /= 2;
        x >>>= 1;
      }
      out[m] = (n + x) / d;
    }
    this.i = i;
    this.j = j;
  }
}
