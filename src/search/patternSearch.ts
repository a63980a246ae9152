// Hooke and Jeeves pattern search over the scanned continuous variables of a grid's best point: the
// grid's optional refinement pass. Each trial point solves its cell exactly as the grid does.
import type { TopK } from './archive.js';
import { CellMode, evaluateFixed, solveCell, type CellWorkspace } from './cell.js';
import type { Problem } from './problem.js';

/**
 * Hooke and Jeeves (1961) pattern search over the scanned continuous variables, starting from the grid's
 * best at the grid's resolution; each trial point solves its cell like the grid. Exploratory moves
 * along each axis, then a pattern move along the last successful direction, which lets it follow a
 * curved valley that an axis-aligned zoom cannot.
 */
export function patternSearch(p: Problem, s: number, halvings: number, top: TopK, ws: CellWorkspace): void {
  const n = p.variables.length;
  const axes = p.variables.map((v, i) => (v.kind === 'continuous' && i !== s ? i : -1)).filter((i) => i >= 0);
  if (axes.length === 0) return;
  const steps = new Float64Array(n);
  for (const i of axes) steps[i] = (p.variables[i] as { resolution: number }).resolution;
  const x = new Float64Array(n);
  const base = Float64Array.from(top.x(0));
  let baseF = top.f(0)[0];
  const trial = (pt: Float64Array): number => {
    for (const i of axes) {
      const v = p.variables[i] as { min: number; max: number };
      if (pt[i] < v.min || pt[i] > v.max) return Infinity;
    }
    x.set(pt);
    if (s >= 0 ? solveCell(p, s, x, ws, CellMode.First, null, null) !== true : !evaluateFixed(p, x, ws)) return Infinity;
    top.offer(x, ws.f);
    pt.set(x);
    return ws.f[0];
  };
  const explore = (from: Float64Array, fromF: number): [Float64Array, number] => {
    const cur = Float64Array.from(from);
    let curF = fromF;
    for (const i of axes) {
      for (const dir of [1, -1]) {
        const t = Float64Array.from(cur);
        t[i] += dir * steps[i];
        let ft = trial(t);
        if (!Number.isFinite(ft)) {
          // Infeasible: slide to the feasibility boundary along this move (bisection), since the
          // optimum of a constrained problem usually sits on it.
          let a = 0;
          let b = 1;
          let fa = Infinity;
          const at = Float64Array.from(cur);
          for (let k = 0; k < 30; k++) {
            const m = 0.5 * (a + b);
            at.set(cur);
            at[i] += m * dir * steps[i];
            const fm = trial(at);
            if (Number.isFinite(fm)) {
              a = m;
              fa = fm;
              t.set(at);
            } else b = m;
          }
          ft = a > 0 ? fa : Infinity;
          // Restoration: take the full move, then regain feasibility along another axis (expanding,
          // then bisecting back to the boundary). This walks along a ridge where one constraint is
          // active, which axis moves alone cannot.
          for (const j of axes) {
            if (j === i) continue;
            for (const dj of [1, -1]) {
              const moved = Float64Array.from(cur);
              moved[i] += dir * steps[i];
              let reach = steps[j];
              let found = -1;
              for (let e = 0; e < 16 && found < 0; e++, reach *= 2) {
                const probe = Float64Array.from(moved);
                probe[j] += dj * reach;
                if (Number.isFinite(trial(probe))) found = reach;
              }
              if (found < 0) continue;
              let lo = found / 2;
              let hi = found;
              if (found === steps[j]) lo = 0;
              let bestProbe = Float64Array.from(moved);
              bestProbe[j] += dj * hi;
              let bestF = trial(Float64Array.from(bestProbe));
              for (let k = 0; k < 30; k++) {
                const m = 0.5 * (lo + hi);
                const probe = Float64Array.from(moved);
                probe[j] += dj * m;
                const fm = trial(probe);
                if (Number.isFinite(fm)) {
                  hi = m;
                  if (fm < bestF) {
                    bestF = fm;
                    bestProbe = probe;
                  }
                } else lo = m;
              }
              if (bestF < ft) {
                ft = bestF;
                t.set(bestProbe);
              }
            }
          }
        }
        if (ft < curF) {
          cur.set(t);
          curF = ft;
          break;
        }
      }
    }
    return [cur, curF];
  };
  let halved = 0;
  let guard = 0;
  while (halved < halvings && guard++ < 100000) {
    let [next, nextF] = explore(base, baseF);
    if (nextF < baseF) {
      // Pattern moves: keep going in the direction that worked while it keeps working.
      let prev = Float64Array.from(base);
      base.set(next);
      baseF = nextF;
      for (;;) {
        const jump = Float64Array.from(base);
        for (const i of axes) jump[i] = 2 * base[i] - prev[i];
        const jf = trial(jump);
        const [after, afterF] = explore(Number.isFinite(jf) ? jump : base, Number.isFinite(jf) ? jf : baseF);
        if (afterF < baseF) {
          prev = Float64Array.from(base);
          base.set(after);
          baseF = afterF;
        } else break;
      }
    } else {
      for (const i of axes) steps[i] /= 2;
      halved++;
    }
  }
}
