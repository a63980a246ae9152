// Reading a quantity from an input file: a plain number in the file's unit system, or a string
// that carries its own unit ("1.6 mm", "0.063 in", "11.5 Mpsi"). A unit of the wrong kind is an error.
import { lookupUnit, toCore, type Kind } from './kinds.js';
import { displayUnit, type UnitSystem } from './systems.js';

export class InputError extends Error {
  constructor(
    public readonly field: string,
    public readonly expected: string,
    public readonly got?: unknown,
  ) {
    super(`${field}: ${expected.startsWith('no such') ? '' : 'expected '}${expected}${got === undefined ? '' : `, got ${describe(got)}`}`);
    this.name = 'InputError';
  }
}

/** Longest echo of a bad text value: enough to recognise it, never a whole file pasted into a field. */
const ECHO_LIMIT = 60;

export function describe(v: unknown): string {
  if (typeof v === 'string') {
    return v.length <= ECHO_LIMIT ? JSON.stringify(v) : `${JSON.stringify(v.slice(0, ECHO_LIMIT))}... (${v.length} characters)`;
  }
  // Non-finite numbers are described in words: "NaN" and "Infinity" never reach output.
  if (typeof v === 'number' && Number.isNaN(v)) return 'a value that is not a number';
  if (typeof v === 'number' && !Number.isFinite(v)) return 'an infinite value';
  if (v === null) return 'an empty value';
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
  volume: 'a volume (mm3, cm3, in3)',
};

const NUMBER_WITH_UNIT = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/;
/** A plain decimal number: no hex, octal or binary forms, no "Infinity", no empty text (which Number() reads as 0). */
const DECIMAL = /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*$/;

/** Read text as a decimal number, or NaN when it is anything else. */
export function decimal(text: string): number {
  return DECIMAL.test(text) ? Number(text) : NaN;
}

export interface QuantityRule {
  positive?: boolean;
  nonNegative?: boolean;
}

/**
 * The magnitudes a coil-spring quantity can meaningfully have (core units). Outside them a value is a
 * typo or a unit slip (1e308 kN overflows every formula; a 1e-300 mm wire divides into NaN), so it is
 * refused at the edge rather than carried into the search. Zero passes where the field's own rule allows it.
 */
export const SANE_RANGE: Record<Kind, { min: number; max: number; floor?: number }> = {
  length: { min: 1e-3, max: 1e5 }, // 1 um .. 100 m
  force: { min: 1e-6, max: 1e7 }, // 1 uN .. 10 MN
  stress: { min: 1e-3, max: 1e7 }, // 1 kPa .. 10 000 GPa
  density: { min: 1, max: 1e5 },
  temperature: { min: 0, max: 5000, floor: -273.15 }, // absolute zero
  frequency: { min: 1e-6, max: 1e7 },
  rate: { min: 1e-9, max: 1e9 },
  mass: { min: 1e-12, max: 1e6 },
  volume: { min: 1e-9, max: 1e15 }, // 1 um^3 .. 1 m^3
};

/** Refuse a core value outside SANE_RANGE for its kind (an infinite one too), naming the field: what
 * every quantity read from a file passes, also where the number was read some other way (a stock
 * table's plain cells, in the column's unit). */
export function checkRange(value: number, kind: Kind, system: UnitSystem, field: string, raw: unknown): void {
  if (Number.isNaN(value)) throw new InputError(field, KIND_WORDS[kind], raw);
  const r = SANE_RANGE[kind];
  const u = displayUnit(system, kind);
  const show = (core: number) => `${Number(u.fromCore(core).toPrecision(6))} ${u.symbol}`;
  const noun = KIND_WORDS[kind].split(' (')[0];
  if (r.floor !== undefined) {
    if (value < r.floor) throw new InputError(field, `${noun} at or above absolute zero (${show(r.floor)})`, raw);
    if (value > r.max) throw new InputError(field, `${noun} of at most ${show(r.max)}`, raw);
    return;
  }
  const a = Math.abs(value);
  if (a > r.max) throw new InputError(field, `${noun} of at most ${show(r.max)} in size`, raw);
  if (a !== 0 && a < r.min) throw new InputError(field, `${noun} of at least ${show(r.min)} in size (or a unit slip?)`, raw);
}

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
    if (/^(x|o|b)[0-9a-f]/i.test(symbol)) throw new InputError(field, `${KIND_WORDS[kind]}, a decimal number (no hex, octal or binary)`, raw);
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
  checkRange(value, kind, system, field, raw);
  if (rule.positive && !(value > 0)) throw new InputError(field, `a positive ${KIND_WORDS[kind].split(' (')[0].replace(/^an? /, '')}`, raw);
  if (rule.nonNegative && !(value >= 0)) throw new InputError(field, `a non-negative ${KIND_WORDS[kind].split(' (')[0].replace(/^an? /, '')}`, raw);
  return value;
}

/** A bare number (counts, ratios); strings like "1e6" are accepted. */
export function parseNumber(raw: unknown, field: string, rule: QuantityRule & { integer?: boolean; min?: number; max?: number } = {}): number {
  const n = typeof raw === 'number' ? raw : typeof raw === 'string' ? decimal(raw) : NaN;
  if (!Number.isFinite(n)) throw new InputError(field, 'a number (in decimal)', raw);
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
    const n = decimal(raw.trim().slice(0, -1));
    if (!Number.isFinite(n) || n < 0) throw new InputError(field, 'a non-negative fraction such as 0.1 or "10%"', raw);
    return n / 100;
  }
  return parseNumber(raw, field, { nonNegative: true });
}
