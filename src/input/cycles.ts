// Reading a service life: a count of load cycles, or "infinite" (also "inf") for a life without end.
import { InputError, parseNumber } from '../units/parse.js';

export function parseCycles(raw: unknown, field: string): number | undefined {
  if (raw === undefined || raw === null) return undefined;
  if (raw === 'infinite' || raw === 'inf') return Infinity;
  const n = parseNumber(raw, field, { positive: true });
  // Beyond 1e15 a count is a slip of the exponent; a life without end is written "infinite".
  if (n > 1e15) throw new InputError(field, 'a cycle count of at most 1e15, or "infinite"', raw);
  return n;
}
