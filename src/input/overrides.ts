// Command-line overrides of a requirements file: `--set envelope.max_outer_diameter=18` (the value
// is read as YAML, so "18", "18 mm" and "[3, 20]" all work) applied to the parsed document before it
// is validated, so an override meets the same checks and messages as the file.
import { parse } from 'yaml';
import { InputError } from '../units/parse.js';
import { isRecord } from './fields.js';

export function parseAssignment(text: string, option = '--set'): { path: string[]; value: unknown } {
  const eq = text.indexOf('=');
  if (eq <= 0) throw new InputError(option, 'path=value, such as envelope.max_outer_diameter=18', text);
  const path = text.slice(0, eq).trim().split('.');
  if (path.some((p) => !/^[a-z_][a-z0-9_]*$/.test(p))) throw new InputError(option, 'a dotted path of field names, such as envelope.max_outer_diameter', text.slice(0, eq));
  let value: unknown;
  try {
    value = parse(text.slice(eq + 1));
  } catch {
    value = text.slice(eq + 1);
  }
  return { path, value };
}

/** Return a copy of doc with value placed at path (intermediate mappings created as needed). */
export function withValue(doc: unknown, path: string[], value: unknown): Record<string, unknown> {
  const root: Record<string, unknown> = isRecord(doc) ? structuredClone(doc) : {};
  let node = root;
  for (let i = 0; i < path.length - 1; i++) {
    const next = node[path[i]];
    if (!isRecord(next)) node[path[i]] = {};
    node = node[path[i]] as Record<string, unknown>;
  }
  node[path[path.length - 1]] = value;
  return root;
}

/** The shorthand options for the envelope, each a `--set` in disguise. */
export const ENVELOPE_SHORTHANDS: [string, string, string][] = [
  ['--max-od <length>', 'maxOd', 'envelope.max_outer_diameter'],
  ['--min-id <length>', 'minId', 'envelope.min_inner_diameter'],
  ['--max-free-length <length>', 'maxFreeLength', 'envelope.max_free_length'],
  ['--max-solid-length <length>', 'maxSolidLength', 'envelope.max_solid_length'],
];

/** Parse a sweep range "from:to:step" into its values (at most 1000). */
export function sweepValues(spec: string): number[] {
  const parts = spec.split(':').map(Number);
  if (parts.length !== 3 || parts.some((n) => !Number.isFinite(n)) || parts[2] <= 0 || parts[1] < parts[0]) {
    throw new InputError('--vary', 'path=from:to:step with from <= to and a positive step, such as envelope.max_outer_diameter=14:24:0.5', spec);
  }
  const [a, b, step] = parts;
  const n = Math.floor((b - a) / step + 1e-9) + 1;
  if (n > 1000) throw new InputError('--vary', 'at most 1000 values', spec);
  return Array.from({ length: n }, (_, i) => Number((a + i * step).toPrecision(12)));
}
