// The tolerance part of a requirements file: `tolerance_grade` (EN 15800 grade 1, 2 or 3),
// `tolerances: { wire_diameter, mean_diameter, shear_modulus, active_coils, working_force }` (each a
// +- half-width in its unit, or a percentage of the nominal value such as "3%") and `min_yield`.
// Read from the requirement document's Fields, so that its unknown-key check sees these keys as known.
import { Fields } from '../../../units/fields.js';
import type { Kind } from '../../../units/kinds.js';
import { InputError, parseFraction, parseNumber, parseQuantity } from '../../../units/parse.js';
import { GRADES, type ToleranceGrade } from './catalog.js';
import type { ToleranceOverride, ToleranceRequest, TolerancedQuantity } from './model.js';

export const DEFAULT_GRADE: ToleranceGrade = 2;

export interface ToleranceRequirements {
  tolerance: ToleranceRequest;
  /** The fraction of made springs that must meet every check; undefined: yield is reported, not required. */
  minYield?: number;
}

const KINDS: Record<TolerancedQuantity, Kind | 'coils'> = {
  wire_diameter: 'length',
  mean_diameter: 'length',
  shear_modulus: 'stress',
  active_coils: 'coils',
  working_force: 'force',
};

const WORDS: Record<TolerancedQuantity, string> = {
  wire_diameter: 'a +- length such as "0.01 mm", or a percentage of the wire diameter such as "0.5%"',
  mean_diameter: 'a +- length such as "0.2 mm", or a percentage of the mean diameter such as "1.5%"',
  shear_modulus: 'a +- stress such as "1.6 GPa", or a percentage of the shear modulus such as "2%"',
  active_coils: 'a +- number of coils such as 0.25, or a percentage of the active coils such as "3%"',
  working_force: 'a +- force such as "0.5 N", or a percentage of the working force such as "2%"',
};

function isPercent(raw: unknown): boolean {
  return typeof raw === 'string' && raw.trim().endsWith('%');
}

function override(f: Fields, key: TolerancedQuantity): ToleranceOverride | undefined {
  if (!f.has(key)) return undefined;
  const raw = f.get(key);
  const field = f.name(key);
  try {
    if (isPercent(raw)) {
      const fraction = parseFraction(raw, field);
      if (!(fraction < 0.5)) throw new InputError(field, 'a percentage below 50%', raw);
      return { fraction };
    }
    const kind = KINDS[key];
    const absolute =
      kind === 'coils' ? parseNumber(raw, field, { nonNegative: true, max: 5 }) : parseQuantity(raw, kind, f.system, field, { nonNegative: true });
    return { absolute };
  } catch (e) {
    if (e instanceof InputError) throw new InputError(field, WORDS[key], raw);
    throw e;
  }
}

/** Read `tolerance_grade`, `tolerances` and `min_yield` from a requirement document. */
export function readToleranceRequirements(f: Fields): ToleranceRequirements {
  const gradeRaw = f.get('tolerance_grade');
  let grade: ToleranceGrade = DEFAULT_GRADE;
  if (gradeRaw !== undefined && gradeRaw !== null) {
    const n = typeof gradeRaw === 'number' ? gradeRaw : typeof gradeRaw === 'string' ? Number(gradeRaw.trim()) : NaN;
    if (!(GRADES as readonly number[]).includes(n))
      throw new InputError(f.name('tolerance_grade'), 'an EN 15800 tolerance grade: 1 (fine), 2 (medium) or 3 (coarse)', gradeRaw);
    grade = n as ToleranceGrade;
  }
  const overrides: ToleranceRequest['overrides'] = {};
  if (f.has('tolerances')) {
    const t = Fields.of(f.get('tolerances'), f.name('tolerances'), f.system);
    for (const key of Object.keys(KINDS) as TolerancedQuantity[]) {
      const o = override(t, key);
      if (o) overrides[key] = o;
    }
    t.rejectUnknown();
  }
  let minYield: number | undefined;
  if (f.has('min_yield')) {
    minYield = parseFraction(f.get('min_yield'), f.name('min_yield'));
    if (!(minYield > 0 && minYield < 1))
      throw new InputError(f.name('min_yield'), 'a fraction between 0 and 1 such as 0.99 or "99%" (a yield of 1 needs zero tolerances)', f.get('min_yield'));
  }
  return { tolerance: { grade, overrides }, minYield };
}
