// Options worth choosing between: the ranked list holds the best spring of each material, wire size
// and end type (a row per real choice of stock and grinding), not ten coil-count variants of one wire.
// Grouping works on the cloud of feasible cells (one lightest point per feasible material, wire, end
// type and coil count), so the count of feasible springs each row stands for is exact: no cell is
// skipped by a bound, as a pruned cell's feasibility would be unknown.
import type { PointBuffer } from '../../search/archive.js';
import type { Point } from '../../search/result.js';

export interface Group {
  /** The group's best point (objective 0 least). */
  best: Point;
  /** Feasible cells (coil counts) of this material, wire size and end type. */
  feasible: number;
}

/**
 * Best point and feasible-cell count per (stock, ends) pair, best first, at most `top` of them. The
 * cloud holds a cell's points one after another (every feasible scan point, when the objective is not
 * monotone in the diameter); a new cell starts where the coil count or the pair changes.
 */
export function bestPerGroup(cloud: PointBuffer, top: number): Group[] {
  const groups = new Map<number, { index: number; value: number; feasible: number }>();
  let lastKey = -1;
  let lastCoils = NaN;
  for (let i = 0; i < cloud.size; i++) {
    const x = cloud.x(i);
    // x = [stock, ends, active coils, mean diameter]: stock and ends are small whole indices.
    const key = x[0] * 1024 + x[1];
    const value = cloud.f(i)[0];
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { index: i, value, feasible: 0 }));
    if (key !== lastKey || x[2] !== lastCoils) g.feasible++;
    lastKey = key;
    lastCoils = x[2];
    if (value < g.value) {
      g.value = value;
      g.index = i;
    }
  }
  return [...groups.values()]
    .sort((a, b) => a.value - b.value || a.index - b.index)
    .slice(0, top)
    .map((g) => ({ best: { x: Float64Array.from(cloud.x(g.index)), f: Float64Array.from(cloud.f(g.index)) }, feasible: g.feasible }));
}
