// Physical kinds of quantity a spring file can carry, each with its core (SI) unit
// and the factors that bring every accepted unit to that core unit.
// Core units: mm, N, MPa, kg/m^3, degC, Hz, N/mm, kg, mm^3. Inch and pound factors are exact by definition
// (1 in = 25.4 mm, 1 lbf = 4.4482216152605 N, 1 lb = 0.45359237 kg).

export type Kind = 'length' | 'force' | 'stress' | 'density' | 'temperature' | 'frequency' | 'rate' | 'mass' | 'volume';

export const INCH_MM = 25.4;
export const LBF_N = 4.4482216152605;
export const PSI_MPA = LBF_N / (INCH_MM * INCH_MM);
export const LB_KG = 0.45359237;
export const LB_PER_IN3_KG_PER_M3 = LB_KG / Math.pow(INCH_MM / 1000, 3);

interface UnitDef {
  kind: Kind;
  factor: number;
  offset?: number;
}

// Unit spellings are compared after lower-casing and removing spaces, '^' and '·'.
const UNITS: Record<string, UnitDef> = {
  // length -> mm
  mm: { kind: 'length', factor: 1 },
  cm: { kind: 'length', factor: 10 },
  m: { kind: 'length', factor: 1000 },
  um: { kind: 'length', factor: 1e-3 },
  in: { kind: 'length', factor: INCH_MM },
  inch: { kind: 'length', factor: INCH_MM },
  '"': { kind: 'length', factor: INCH_MM },
  ft: { kind: 'length', factor: 12 * INCH_MM },
  // force -> N
  n: { kind: 'force', factor: 1 },
  kn: { kind: 'force', factor: 1000 },
  lbf: { kind: 'force', factor: LBF_N },
  kgf: { kind: 'force', factor: 9.80665 },
  // stress / modulus -> MPa
  pa: { kind: 'stress', factor: 1e-6 },
  kpa: { kind: 'stress', factor: 1e-3 },
  mpa: { kind: 'stress', factor: 1 },
  'n/mm2': { kind: 'stress', factor: 1 },
  gpa: { kind: 'stress', factor: 1000 },
  psi: { kind: 'stress', factor: PSI_MPA },
  kpsi: { kind: 'stress', factor: 1e3 * PSI_MPA },
  ksi: { kind: 'stress', factor: 1e3 * PSI_MPA },
  mpsi: { kind: 'stress', factor: 1e6 * PSI_MPA },
  // density -> kg/m^3
  'kg/m3': { kind: 'density', factor: 1 },
  'g/cm3': { kind: 'density', factor: 1000 },
  'lb/in3': { kind: 'density', factor: LB_PER_IN3_KG_PER_M3 },
  // temperature -> degC
  c: { kind: 'temperature', factor: 1 },
  degc: { kind: 'temperature', factor: 1 },
  '°c': { kind: 'temperature', factor: 1 },
  f: { kind: 'temperature', factor: 5 / 9, offset: -32 },
  degf: { kind: 'temperature', factor: 5 / 9, offset: -32 },
  '°f': { kind: 'temperature', factor: 5 / 9, offset: -32 },
  // frequency -> Hz
  hz: { kind: 'frequency', factor: 1 },
  rpm: { kind: 'frequency', factor: 1 / 60 },
  // rate -> N/mm
  'n/mm': { kind: 'rate', factor: 1 },
  'n/m': { kind: 'rate', factor: 1e-3 },
  'lbf/in': { kind: 'rate', factor: LBF_N / INCH_MM },
  // mass -> kg
  kg: { kind: 'mass', factor: 1 },
  g: { kind: 'mass', factor: 1e-3 },
  lb: { kind: 'mass', factor: LB_KG },
  // volume -> mm^3 (wire volume, the material a spring takes)
  mm3: { kind: 'volume', factor: 1 },
  cm3: { kind: 'volume', factor: 1e3 },
  in3: { kind: 'volume', factor: INCH_MM ** 3 },
};

export function lookupUnit(symbol: string): UnitDef | undefined {
  const key = symbol
    .toLowerCase()
    .replace(/[\s^·]/g, '')
    .replace(/³/g, '3')
    .replace(/²/g, '2');
  return UNITS[key];
}

/** Convert a value in the named unit to the core unit of its kind. */
export function toCore(value: number, def: UnitDef): number {
  return (value + (def.offset ?? 0)) * def.factor;
}
