// The few infeasible points closest to feasibility, kept for the "nothing is feasible" report.
/** An infeasible point, its checks, objectives and total violation. */
export interface Miss { x: Float64Array; g: Float64Array; f: Float64Array; violation: number }

export class NearestMisses {
  readonly items: Miss[] = [];
  constructor(readonly capacity: number) {}

  threshold(): number {
    return this.items.length < this.capacity ? Infinity : this.items[this.items.length - 1].violation;
  }

  /** Copies are made only for a point that enters the list, which is rare. */
  offer(x: Float64Array, g: Float64Array, f: Float64Array, violation: number): void {
    if (!(violation < this.threshold())) return;
    const item = { x: Float64Array.from(x), g: Float64Array.from(g), f: Float64Array.from(f), violation };
    this.items.push(item);
    this.items.sort((a, b) => a.violation - b.violation);
    if (this.items.length > this.capacity) this.items.pop();
  }
}
