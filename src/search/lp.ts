// A small typed front to javascript-lp-solver. The solver reads a plain JSON model and silently
// ignores a misspelt key, so models are built here from typed rows only, every variable is declared
// unrestricted in sign, a timeout is always set, and `feasible` and `bounded` are checked before the
// result is read.
import lpModule from 'javascript-lp-solver';
import type { Model, SolverAPI } from 'javascript-lp-solver';

// The package is CommonJS: under Node's ESM loader its default import is module.exports, the solver.
const solver = lpModule as unknown as SolverAPI;

export interface LinearRow<V extends string> {
  coefficients: Partial<Record<V, number>>;
  min?: number;
  max?: number;
}

export type LpOutcome<V extends string> =
  { status: 'optimal'; objective: number; values: Record<V, number> } | { status: 'infeasible' } | { status: 'unbounded' };

export function minimiseLinear<V extends string>(
  variables: readonly V[],
  objective: Partial<Record<V, number>>,
  rows: LinearRow<V>[],
  timeoutMs = 2000,
): LpOutcome<V> {
  const constraints: Model['constraints'] = {};
  const vars: Model['variables'] = {};
  const unrestricted: Record<string, boolean> = {};
  for (const v of variables) {
    vars[v] = { objective: objective[v] ?? 0 };
    unrestricted[v] = true;
  }
  rows.forEach((row, i) => {
    const name = `row${i}`;
    const bound: { min?: number; max?: number } = {};
    if (row.min !== undefined) bound.min = row.min;
    if (row.max !== undefined) bound.max = row.max;
    constraints[name] = bound;
    for (const v of variables) {
      const c = row.coefficients[v];
      if (c !== undefined && c !== 0) vars[v][name] = c;
    }
  });
  const model: Model = { optimize: 'objective', opType: 'min', constraints, variables: vars, unrestricted, options: { timeout: timeoutMs } };
  const r = solver.Solve(model) as { feasible: boolean; bounded?: boolean; result: number } & Record<string, unknown>;
  if (!r.feasible) return { status: 'infeasible' };
  if (r.bounded === false || !Number.isFinite(r.result)) return { status: 'unbounded' };
  const values = {} as Record<V, number>;
  for (const v of variables) values[v] = typeof r[v] === 'number' ? (r[v] as number) : 0;
  return { status: 'optimal', objective: r.result, values };
}
