// Stores for search results that allocate once: the k best feasible points, and a growable buffer of
// every feasible point (for the frontier).

/** The k best points by objective 0 (ties broken by objective 1), kept sorted. */
export class TopK {
  readonly xs: Float64Array;
  readonly fs: Float64Array;
  size = 0;
  constructor(
    readonly k: number,
    readonly nx: number,
    readonly nf: number,
  ) {
    this.xs = new Float64Array(k * nx);
    this.fs = new Float64Array(k * nf);
  }

  /** The objective a point must beat to enter, Infinity while not full. */
  threshold(): number {
    return this.size < this.k ? Infinity : this.fs[(this.k - 1) * this.nf];
  }

  offer(x: Float64Array, f: Float64Array): boolean {
    if (this.k === 0) return false;
    const v = f[0];
    if (this.size === this.k && !(v < this.threshold())) return false;
    let i = this.size < this.k ? this.size++ : this.k - 1;
    while (i > 0 && this.fs[(i - 1) * this.nf] > v) {
      this.xs.copyWithin(i * this.nx, (i - 1) * this.nx, i * this.nx);
      this.fs.copyWithin(i * this.nf, (i - 1) * this.nf, i * this.nf);
      i--;
    }
    this.xs.set(x, i * this.nx);
    this.fs.set(f, i * this.nf);
    return true;
  }

  /** Offer a point that may already be kept under another value (`same` says which kept point is
   * the same, a cell solved twice at two precisions, say): the list holds it once, at the better value. */
  offerOnce(x: Float64Array, f: Float64Array, same: (kept: Float64Array, x: Float64Array) => boolean): boolean {
    for (let i = 0; i < this.size; i++) {
      if (!same(this.x(i), x)) continue;
      if (!(f[0] < this.fs[i * this.nf])) return false;
      this.xs.copyWithin(i * this.nx, (i + 1) * this.nx, this.size * this.nx);
      this.fs.copyWithin(i * this.nf, (i + 1) * this.nf, this.size * this.nf);
      this.size--;
      break;
    }
    return this.offer(x, f);
  }

  x(i: number): Float64Array {
    return this.xs.subarray(i * this.nx, (i + 1) * this.nx);
  }
  f(i: number): Float64Array {
    return this.fs.subarray(i * this.nf, (i + 1) * this.nf);
  }
}

/** Every offered point, in a buffer that doubles when full. */
export class PointBuffer {
  xs: Float64Array;
  fs: Float64Array;
  size = 0;
  constructor(
    readonly nx: number,
    readonly nf: number,
    capacity = 1024,
  ) {
    this.xs = new Float64Array(capacity * nx);
    this.fs = new Float64Array(capacity * nf);
  }

  push(x: Float64Array, f: Float64Array): void {
    if ((this.size + 1) * this.nx > this.xs.length) {
      const xs = new Float64Array(this.xs.length * 2);
      xs.set(this.xs);
      this.xs = xs;
      const fs = new Float64Array(this.fs.length * 2);
      fs.set(this.fs);
      this.fs = fs;
    }
    this.xs.set(x, this.size * this.nx);
    this.fs.set(f, this.size * this.nf);
    this.size++;
  }

  x(i: number): Float64Array {
    return this.xs.subarray(i * this.nx, (i + 1) * this.nx);
  }
  f(i: number): Float64Array {
    return this.fs.subarray(i * this.nf, (i + 1) * this.nf);
  }
}
