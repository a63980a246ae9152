// Reading the fields of a parsed YAML/JSON document (requirements, spring files, catalogs, tables)
// with one clear message per mistake: the message names the field by its full path and says what was
// expected. Unknown keys are mistakes too (a misspelt key silently ignored is how a spring ends up
// designed for the wrong load). It sits with the units, below the catalogs and the input readers that
// both use it: a field is read as a quantity in the document's unit system.
import { InputError, parseFraction, parseNumber, parseQuantity, type QuantityRule } from './parse.js';
import type { Kind } from './kinds.js';
import type { UnitSystem } from './systems.js';

export type Raw = Record<string, unknown>;

export function isRecord(v: unknown): v is Raw {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

export class Fields {
  private readonly seen = new Set<string>();
  constructor(
    readonly raw: Raw,
    readonly path: string,
    readonly system: UnitSystem,
  ) {}

  static of(raw: unknown, path: string, system: UnitSystem): Fields {
    if (!isRecord(raw)) throw new InputError(path || 'file', 'a mapping of fields (key: value)', raw);
    if (Object.getPrototypeOf(raw) !== Object.prototype && Object.getPrototypeOf(raw) !== null)
      throw new InputError(path || 'file', 'a plain mapping of fields', raw);
    return new Fields(raw, path, system);
  }

  /** A whole input file: its `units` field (si | us, default si) sets how plain numbers are read. */
  static document(raw: unknown): Fields {
    const system = Fields.of(raw, '', 'si').choice('units', ['si', 'us'] as const) ?? 'si';
    const f = Fields.of(raw, '', system);
    f.get('units');
    return f;
  }

  name(key: string): string {
    return this.path ? `${this.path}.${key}` : key;
  }

  /** The field is given. Only the mapping's own keys count (never "constructor" or "__proto__" from
   * Object.prototype), and an empty value (`key:` with nothing after it) is refused rather than read as
   * "not given": a blank bore limit must not silently remove the limit. Leave the line out instead. */
  has(key: string): boolean {
    this.seen.add(key);
    if (!Object.hasOwn(this.raw, key) || this.raw[key] === undefined) return false;
    if (this.raw[key] === null) throw new InputError(this.name(key), 'a value (the field is empty; leave the line out to use the default)');
    return true;
  }

  get(key: string): unknown {
    this.seen.add(key);
    if (!Object.hasOwn(this.raw, key)) return undefined;
    if (this.raw[key] === null) throw new InputError(this.name(key), 'a value (the field is empty; leave the line out to use the default)');
    return this.raw[key];
  }

  require(key: string, expected: string): unknown {
    if (!this.has(key)) throw new InputError(this.name(key), `${expected} (the field is missing)`);
    return this.raw[key];
  }

  quantity(key: string, kind: Kind, rule: QuantityRule & { required?: boolean } = {}): number | undefined {
    if (!this.has(key)) {
      if (rule.required) throw new InputError(this.name(key), `a value (the field is missing)`);
      return undefined;
    }
    return parseQuantity(this.raw[key], kind, this.system, this.name(key), rule);
  }

  requiredQuantity(key: string, kind: Kind, rule: QuantityRule = {}): number {
    return this.quantity(key, kind, { ...rule, required: true }) as number;
  }

  number(key: string, rule: Parameters<typeof parseNumber>[2] = {}): number | undefined {
    if (!this.has(key)) return undefined;
    return parseNumber(this.raw[key], this.name(key), rule);
  }

  fraction(key: string, max?: number): number | undefined {
    if (!this.has(key)) return undefined;
    const v = parseFraction(this.raw[key], this.name(key));
    if (max !== undefined && v > max) throw new InputError(this.name(key), `a fraction of at most ${max} (${max * 100}%)`, this.raw[key]);
    return v;
  }

  string(key: string): string | undefined {
    if (!this.has(key)) return undefined;
    const v = this.raw[key];
    if (typeof v !== 'string' || v.trim() === '') throw new InputError(this.name(key), 'a text value', v);
    return v.trim();
  }

  bool(key: string): boolean | undefined {
    if (!this.has(key)) return undefined;
    const v = this.raw[key];
    if (typeof v !== 'boolean') throw new InputError(this.name(key), 'true or false', v);
    return v;
  }

  choice<T extends string>(key: string, options: readonly T[]): T | undefined {
    if (!this.has(key)) return undefined;
    const v = this.raw[key];
    if (typeof v !== 'string' || !(options as readonly string[]).includes(v)) {
      throw new InputError(this.name(key), `one of ${options.join(' | ')}`, v);
    }
    // The option's own (interned) string: the hot loop compares end types by identity.
    return options[(options as readonly string[]).indexOf(v)];
  }

  list(key: string): unknown[] | undefined {
    if (!this.has(key)) return undefined;
    const v = this.raw[key];
    if (!Array.isArray(v)) throw new InputError(this.name(key), 'a list', v);
    return v;
  }

  /** Exactly one of the keys must be present. */
  exactlyOne(keys: readonly string[]): string {
    const present = keys.filter((k) => this.has(k));
    if (present.length === 1) return present[0];
    const names = keys.map((k) => this.name(k)).join(' | ');
    if (present.length === 0) throw new InputError(names, `exactly one of these fields (none given)`);
    throw new InputError(present.map((k) => this.name(k)).join(', '), `only one of ${names} (several given)`);
  }

  /** The document's `kind` (src/kinds/index.ts dispatches on it), when given, must be this one. */
  expectKind(expected: string): void {
    if (this.has('kind') && this.raw.kind !== expected) throw new InputError('kind', expected, this.raw.kind);
  }

  /** Fail on keys that were never asked for. Call after reading every known key. */
  rejectUnknown(): void {
    for (const key of Object.keys(this.raw)) {
      if (!this.seen.has(key)) {
        const known = [...this.seen].sort().join(', ');
        throw new InputError(this.name(key), `no such field; the known fields here are: ${known}`);
      }
    }
  }
}
