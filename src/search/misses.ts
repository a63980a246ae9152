// The few infeasible points closest to feasibility, kept for the "nothing is feasible" report.
/** An infeasible point, its checks, objectives and total violation. */
export interface Miss {
  x: Float64Array;
  g: Float64Array;
  f: Float64Array;
  violation: number;
}

/** The `capacity` least-violation points offered, least first (a later point goes after an earlier
 * one of the same violation). Held in preallocated rows, so that offering a point allocates nothing:
 * the grid offers every infeasible cell's nearest point, and most of them enter while the list fills. */
export class NearestMisses {
  private size = 0;
  private nx = -1;
  private ng = 0;
  private nf = 0;
  private xs = new Float64Array(0);
  private gs = new Float64Array(0);
  private fs = new Float64Array(0);
  private readonly violations: Float64Array;
  constructor(readonly capacity: number) {
    this.violations = new Float64Array(capacity);
  }

  threshold(): number {
    return this.size < this.capacity ? Infinity : this.violations[this.capacity - 1];
  }

  offer(x: Float64Array, g: Float64Array, f: Float64Array, violation: number): void {
    if (!(violation < this.threshold())) return;
    if (this.nx < 0) {
      this.nx = x.length;
      this.ng = g.length;
      this.nf = f.length;
      this.xs = new Float64Array(this.capacity * this.nx);
      this.gs = new Float64Array(this.capacity * this.ng);
      this.fs = new Float64Array(this.capacity * this.nf);
    }
    let i = this.size < this.capacity ? this.size++ : this.capacity - 1;
    while (i > 0 && this.violations[i - 1] > violation) {
      this.violations[i] = this.violations[i - 1];
      this.xs.copyWithin(i * this.nx, (i - 1) * this.nx, i * this.nx);
      this.gs.copyWithin(i * this.ng, (i - 1) * this.ng, i * this.ng);
      this.fs.copyWithin(i * this.nf, (i - 1) * this.nf, i * this.nf);
      i--;
    }
    this.violations[i] = violation;
    this.xs.set(x, i * this.nx);
    this.gs.set(g, i * this.ng);
    this.fs.set(f, i * this.nf);
  }

  /** The points kept, least violation first, as copies. */
  get items(): Miss[] {
    const out: Miss[] = [];
    for (let i = 0; i < this.size; i++) {
      out.push({
        x: this.xs.slice(i * this.nx, (i + 1) * this.nx),
        g: this.gs.slice(i * this.ng, (i + 1) * this.ng),
        f: this.fs.slice(i * this.nf, (i + 1) * this.nf),
        violation: this.violations[i],
      });
    }
    return out;
  }
}
