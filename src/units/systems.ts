// The two unit systems a file or a report may use. A plain number in an input file is read in
// the file's system; output for people is written in the chosen system; JSON is always SI (core).
import { INCH_MM, LBF_N, PSI_MPA, LB_KG, LB_PER_IN3_KG_PER_M3, type Kind } from './kinds.js';

export type UnitSystem = 'si' | 'us';

export interface DisplayUnit {
  symbol: string;
  fromCore: (v: number) => number;
  toCore: (v: number) => number;
}

const scale = (symbol: string, factor: number): DisplayUnit => ({
  symbol,
  fromCore: (v) => v / factor,
  toCore: (v) => v * factor,
});

const SI: Record<Kind, DisplayUnit> = {
  length: scale('mm', 1),
  force: scale('N', 1),
  stress: scale('MPa', 1),
  density: scale('kg/m^3', 1),
  temperature: scale('degC', 1),
  frequency: scale('Hz', 1),
  rate: scale('N/mm', 1),
  mass: scale('kg', 1),
  volume: scale('mm^3', 1),
};

const US: Record<Kind, DisplayUnit> = {
  length: scale('in', INCH_MM),
  force: scale('lbf', LBF_N),
  stress: scale('psi', PSI_MPA),
  density: scale('lb/in^3', LB_PER_IN3_KG_PER_M3),
  temperature: { symbol: 'degF', fromCore: (c) => (c * 9) / 5 + 32, toCore: (f) => ((f - 32) * 5) / 9 },
  frequency: scale('Hz', 1),
  rate: scale('lbf/in', LBF_N / INCH_MM),
  mass: scale('lb', LB_KG),
  volume: scale('in^3', INCH_MM ** 3),
};

export function displayUnit(system: UnitSystem, kind: Kind): DisplayUnit {
  return (system === 'us' ? US : SI)[kind];
}

// What people read differs from what a plain number in a file means in one place: a spring's stresses
// run to six figures in psi, so US output writes them in kpsi (a US file's plain numbers stay psi).
const US_OUTPUT: Partial<Record<Kind, DisplayUnit>> = { stress: scale('kpsi', 1e3 * PSI_MPA) };

/** The unit output is written in (text, HTML, CSV; JSON is always SI). */
export function outputUnit(system: UnitSystem, kind: Kind): DisplayUnit {
  return (system === 'us' ? US_OUTPUT[kind] : undefined) ?? displayUnit(system, kind);
}

const GRAM = scale('g', 1e-3);
/** The avoirdupois ounce, 1/16 lb (NIST Handbook 44, Appendix C). */
const OUNCE = scale('oz', LB_KG / 16);
const MPSI = scale('Mpsi', 1e6 * PSI_MPA);

/** The unit a figure of this size reads best in: SI masses under 1 kg in grams, US masses under 1 lb
 * in ounces (0.199 oz, not 0.0124 lb), US stresses of a thousand kpsi and more (moduli: no spring is
 * stressed that far) in Mpsi; else outputUnit. */
export function readableUnit(system: UnitSystem, kind: Kind, magnitude: number): DisplayUnit {
  const m = Math.abs(magnitude);
  if (kind === 'mass' && system === 'si' && m < 1) return GRAM;
  if (kind === 'mass' && system === 'us' && m < LB_KG) return OUNCE;
  if (kind === 'stress' && system === 'us' && m >= MPSI.toCore(1)) return MPSI;
  return outputUnit(system, kind);
}
