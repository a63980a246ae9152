// Command-line overrides of a requirements file: `--set envelope.max_outer_diameter=18` (the value
// is read as YAML, so "18", "18 mm" and "[3, 20]" all work) applied to the parsed document before it
// is validated, so an override meets the same checks and messages as the file.
import { parse } from 'yaml';
import { decimal, InputError } from '../units/parse.js';
import { isRecord } from '../units/fields.js';

/** The value that removes a setting: `--set envelope.max_free_length=none`. An empty value is refused
 * (a stray `--set key=` must not silently drop a limit). */
export const REMOVE = 'none';
/** Marks a setting to be removed (withValue deletes the key). */
export const REMOVED = Symbol('removed');

/** Text that names something in Object.prototype: never a path step, whatever the schema says. */
const FORBIDDEN_STEPS = new Set(['__proto__', 'constructor', 'prototype']);

export function parsePath(text: string, option: string): string[] {
  const path = text.trim().split('.');
  if (path.some((p) => !/^[a-z_][a-z0-9_]*$/.test(p))) throw new InputError(option, 'a dotted path of field names, such as envelope.max_outer_diameter', text);
  const bad = path.find((p) => FORBIDDEN_STEPS.has(p));
  if (bad) throw new InputError(option, `a path of requirement fields ("${bad}" is not one)`, text);
  return path;
}

export function parseAssignment(text: string, option = '--set'): { path: string[]; value: unknown } {
  const eq = text.indexOf('=');
  if (eq <= 0) throw new InputError(option, 'path=value, such as envelope.max_outer_diameter=18', text);
  const path = parsePath(text.slice(0, eq), option);
  const rawValue = text.slice(eq + 1);
  if (rawValue.trim() === '') {
    throw new InputError(option, `a value after "=" (to remove a setting write ${text.slice(0, eq)}=${REMOVE})`, text);
  }
  if (rawValue.trim() === REMOVE) return { path, value: REMOVED };
  if (/(^|[\s,[{])[-+]?0[xob][0-9a-f]/i.test(rawValue)) throw new InputError(option, 'a decimal number (no hex, octal or binary)', text);
  let value: unknown;
  try {
    value = parse(rawValue, { logLevel: 'silent', maxAliasCount: 10 });
  } catch (e) {
    if (/alias/i.test((e as Error).message)) throw new InputError(option, 'a value whose YAML aliases expand to a reasonable size (an alias bomb?)', text);
    value = rawValue;
  }
  // YAML's null spellings (~, null) would quietly drop the setting; removal is written `none`.
  if (value === null || value === undefined) throw new InputError(option, `a value (to remove a setting write ${text.slice(0, eq)}=${REMOVE})`, text);
  return { path, value };
}

/** Re-blame an error in an overridden field on the option that set it (`--set envelope.x: ...`). */
export function blameOverride(e: unknown, overrides: readonly { path: string[]; option: string }[]): unknown {
  if (!(e instanceof InputError)) return e;
  for (const o of overrides) {
    const p = o.path.join('.');
    if (e.field === p || p.startsWith(`${e.field}.`) || e.field.startsWith(`${p}.`) || e.field.startsWith(`${p}[`)) {
      return new InputError(o.option === '--set' ? `--set ${e.field}` : o.option, e.expected, e.got);
    }
  }
  return e;
}

/** Return a copy of doc with value placed at path (intermediate mappings created as needed), or the key
 * removed when value is REMOVED. Only own keys are followed and written, so no path reaches a prototype. */
export function withValue(doc: unknown, path: string[], value: unknown): Record<string, unknown> {
  const root: Record<string, unknown> = isRecord(doc) ? structuredClone(doc) : {};
  let node = root;
  for (let i = 0; i < path.length - 1; i++) {
    if (FORBIDDEN_STEPS.has(path[i])) throw new InputError(path.join('.'), 'a path of requirement fields');
    const next = Object.hasOwn(node, path[i]) ? node[path[i]] : undefined;
    if (!isRecord(next)) {
      if (value === REMOVED) return root;
      Object.defineProperty(node, path[i], { value: {}, enumerable: true, writable: true, configurable: true });
    }
    node = node[path[i]] as Record<string, unknown>;
  }
  const last = path[path.length - 1];
  if (FORBIDDEN_STEPS.has(last)) throw new InputError(path.join('.'), 'a path of requirement fields');
  if (value === REMOVED) delete node[last];
  else Object.defineProperty(node, last, { value, enumerable: true, writable: true, configurable: true });
  return root;
}

/** The shorthand options for the envelope, each a `--set` in disguise. */
export const ENVELOPE_SHORTHANDS: [string, string, string][] = [
  ['--max-od <length>', 'maxOd', 'envelope.max_outer_diameter'],
  ['--min-id <length>', 'minId', 'envelope.min_inner_diameter'],
  ['--max-free-length <length>', 'maxFreeLength', 'envelope.max_free_length'],
  ['--max-solid-length <length>', 'maxSolidLength', 'envelope.max_solid_length'],
];

/** Parse a sweep range "from:to:step" (decimal numbers) into its values (at most 1000). */
export function sweepValues(spec: string): number[] {
  const expected = 'path=from:to:step with decimal numbers, from <= to and a positive step, such as envelope.max_outer_diameter=14:24:0.5';
  const texts = spec.split(':');
  const parts = texts.map((t) => decimal(t));
  if (texts.length !== 3 || parts.some((n) => !Number.isFinite(n))) throw new InputError('--vary', expected, spec);
  const [a, b, step] = parts;
  if (!(step > 0)) throw new InputError('--vary', `${expected} (the step is not positive)`, spec);
  if (b < a) throw new InputError('--vary', `${expected} (from is above to)`, spec);
  const n = Math.floor((b - a) / step + 1e-9) + 1;
  if (!(n <= 1000)) throw new InputError('--vary', 'a range of at most 1000 values (a larger step?)', spec);
  return Array.from({ length: n }, (_, i) => Number((a + i * step).toPrecision(12)));
}
