// Reading a quantity from an input file: a plain number in the file's unit system, or a string
// that carries its own unit ("1.6 mm", "0.063 in", "11.5 Mpsi"). A unit of the wrong kind is an error.
import { lookupUnit, toCore, type Kind } from './kinds.js';
import { displayUnit, type UnitSystem } from './systems.js';

export class InputError extends Error {
  constructor(public readonly field: string, public readonly expected: string, public readonly got?: unknown) {
    super(`${field}: ${expected.startsWith('no such') ? '' : 'expected '}${expected}${got === undefined ? '' : `, got ${describe(got)}`}`);
    this.name = 'InputError';
  }
}

export function describe(v: unknown): string {
  if (typeof v === 'string') return JSON.stringify(v);
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'an object';
  return String(v);
}

const KIND_WORDS: Record<Kind, string> = {
  length: 'a length (mm, cm, m, in, ft)',
  force: 'a force (N, kN, lbf, kgf)',
  stress: 'a stress (MPa, GPa, Pa, psi, kpsi, Mpsi)',
  density: 'a density (kg/m3, g/cm3, lb/in3)',
  temperature: 'a temperature (C, F)',
  frequency: 'a frequency (Hz, rpm)',
  rate: 'a spring rate (N/mm, N/m, lbf/in)',
  mass: 'a mass (kg, g, lb)',
};

const NUMBER_WITH_UNIT = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/;

export interface QuantityRule { positive?: boolean; nonNegative?: boolean }

/** Parse one quantity into the core unit of its kind; throws InputError naming the field. */
export function parseQuantity(raw: unknown, kind: Kind, system: UnitSystem, field: string, rule: QuantityRule = {}): number {
  let value: number;
  if (typeof raw === 'number') {
    if (!Number.isFinite(raw)) throw new InputError(field, KIND_WORDS[kind], raw);
    value = displayUnit(system, kind).toCore(raw);
  } else if (typeof raw === 'string') {
    const m = NUMBER_WITH_UNIT.exec(raw);
    if (!m) throw new InputError(field, `${KIND_WORDS[kind]}, a number with its unit`, raw);
    const n = Number(m[1]);
    const symbol = m[2];
    if (!Number.isFinite(n)) throw new InputError(field, KIND_WORDS[kind], raw);
    if (symbol === '') {
      value = displayUnit(system, kind).toCore(n);
    } else {
      const def = lookupUnit(symbol);
      if (!def) throw new InputError(field, `${KIND_WORDS[kind]}; unknown unit "${symbol}"`, raw);
      if (def.kind !== kind) throw new InputError(field, `${KIND_WORDS[kind]}, not ${KIND_WORDS[def.kind].split(' (')[0]}`, raw);
      value = toCore(n, def);
    }
  } else {
    throw new InputError(field, KIND_WORDS[kind], raw);
  }
  if (rule.positive && !(value > 0)) throw new InputError(field, `a positive ${KIND_WORDS[kind].split(' (')[0].replace(/^an? /, '')}`, raw);
  if (rule.nonNegative && !(value >= 0)) throw new InputError(field, `a non-negative ${KIND_WORDS[kind].split(' (')[0].replace(/^an? /, '')}`, raw);
  return value;
}

/** A bare number (counts, ratios); strings like "1e6" are accepted. */
export function parseNumber(raw: unknown, field: string, rule: QuantityRule & { integer?: boolean; min?: number; max?: number } = {}): number {
  const n = typeof raw === 'number' ? raw : typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : NaN;
  if (!Number.isFinite(n)) throw new InputError(field, 'a number', raw);
  if (rule.integer && !Number.isInteger(n)) throw new InputError(field, 'a whole number', raw);
  if (rule.positive && !(n > 0)) throw new InputError(field, 'a positive number', raw);
  if (rule.nonNegative && !(n >= 0)) throw new InputError(field, 'a non-negative number', raw);
  if (rule.min !== undefined && n < rule.min) throw new InputError(field, `a number of at least ${rule.min}`, raw);
  if (rule.max !== undefined && n > rule.max) throw new InputError(field, `a number of at most ${rule.max}`, raw);
  return n;
}

/** A fraction written as 0.1 or "10%". */
export function parseFraction(raw: unknown, field: string): number {
  if (typeof raw === 'string' && raw.trim().endsWith('%')) {
    const n = Number(raw.trim().slice(0, -1));
    if (!Number.isFinite(n) || n < 0) throw new InputError(field, 'a non-negative fraction such as 0.1 or "10%"', raw);
    return n / 100;
  }
  return parseNumber(raw, field, { nonNegative: true });
}
