// Pareto utilities for two minimised objectives.

/** Indices of the non-dominated points among (xs[i], ys[i]), sorted by x ascending. A point is
 * dominated when another is no worse in both and better in one. */
export function paretoFront2(xs: ArrayLike<number>, ys: ArrayLike<number>): number[] {
  const order = Array.from({ length: xs.length }, (_, i) => i).sort((a, b) => xs[a] - xs[b] || ys[a] - ys[b]);
  const front: number[] = [];
  let bestY = Infinity;
  for (const i of order) {
    if (ys[i] < bestY) {
      front.push(i);
      bestY = ys[i];
    }
  }
  return front;
}

/** True when a dominates b (both minimised). */
export function dominates(ax: number, ay: number, bx: number, by: number): boolean {
  return ax <= bx && ay <= by && (ax < bx || ay < by);
}
