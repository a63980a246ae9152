// JSON output: always SI, snake_case keys, and never NaN or Infinity (a figure that does not apply
// is null and a neighbouring field says why).

export function finiteOrNull(v: number): number | null {
  // -0 prints as 0: the library's records (src/api/) are then equal to the JSON read back.
  return Number.isFinite(v) ? (v === 0 ? 0 : v) : null;
}

/** Deep copy with every non-finite number replaced by null. */
export function sanitize(value: unknown): unknown {
  if (typeof value === 'number') return finiteOrNull(value);
  if (Array.isArray(value)) return value.map(sanitize);
  if (value && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = sanitize(v);
    return out;
  }
  return value;
}

export const SI_UNITS = {
  length: 'mm',
  force: 'N',
  rate: 'N/mm',
  stress: 'MPa',
  mass: 'kg',
  density: 'kg/m^3',
  frequency: 'Hz',
  temperature: 'degC',
  volume: 'mm^3',
  angle: 'deg',
} as const;

export function toJson(value: unknown): string {
  return JSON.stringify(sanitize(value), null, 2);
}
