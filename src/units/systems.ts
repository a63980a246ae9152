// The two unit systems a file or a report may use. A plain number in an input file is read in
// the file's system; output for people is written in the chosen system; JSON is always SI (core).
import { INCH_MM, LBF_N, PSI_MPA, LB_KG, LB_PER_IN3_KG_PER_M3, type Kind } from './kinds.js';

export type UnitSystem = 'si' | 'us';

export interface DisplayUnit { symbol: string; fromCore: (v: number) => number; toCore: (v: number) => number }

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
  temperature: { symbol: 'degF', fromCore: (c) => c * 9 / 5 + 32, toCore: (f) => (f - 32) * 5 / 9 },
  frequency: scale('Hz', 1),
  rate: scale('lbf/in', LBF_N / INCH_MM),
  mass: scale('lb', LB_KG),
  volume: scale('in^3', INCH_MM ** 3),
};

export function displayUnit(system: UnitSystem, kind: Kind): DisplayUnit {
  return (system === 'us' ? US : SI)[kind];
}
