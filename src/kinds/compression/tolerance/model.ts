// The tolerance model of one made compression spring: the +- half-widths of every quantity the maker
// cannot hold exactly, read from the tolerance catalog or the user's overrides, and the free-length
// spread that follows when the maker adjusts the free length to meet the working force at the
// working length (EN 15800 practice when one force is toleranced). SI inside: mm, MPa, N, coils.
import type { Material } from '../../../catalogs/types.js';
import type { CoilDiameterTable, ToleranceCatalog, ToleranceGrade, WireToleranceTable } from './catalog.js';

/** The quantities a made spring varies in, in the order of the yield model's vectors. */
export const TOLERANCED = ['wire_diameter', 'mean_diameter', 'shear_modulus', 'active_coils', 'working_force'] as const;
export type TolerancedQuantity = (typeof TOLERANCED)[number];
export const Q = { wire_diameter: 0, mean_diameter: 1, shear_modulus: 2, active_coils: 3, working_force: 4 } as const;

/** One half-width as the user wrote it: absolute (SI) or a fraction of the nominal value. */
export type ToleranceOverride = { absolute: number } | { fraction: number };

export interface ToleranceRequest {
  grade: ToleranceGrade;
  overrides: Partial<Record<TolerancedQuantity, ToleranceOverride>>;
}

export interface Tolerance {
  /** +- half-width, SI (mm, mm, MPa, coils, N): three standard deviations of the made spread. */
  halfWidth: number;
  source: string;
}

export interface SpringTolerances {
  grade: ToleranceGrade;
  wireDiameter: Tolerance;
  meanDiameter: Tolerance;
  shearModulus: Tolerance;
  activeCoils: Tolerance;
  workingForce: Tolerance;
  /** The free length the maker ends with, +- mm (three standard deviations, first order). */
  freeLength: Tolerance;
  /** Where the spring lies outside the tables' scope, what was done instead. */
  notes: string[];
  /** The standards the figures refer to. */
  standards: string[];
}

/** The nominal spring whose tolerances are asked for (SI). */
export interface NominalSpring {
  material: Material;
  wireDiameter: number;
  meanDiameter: number;
  activeCoils: number;
  shearModulus: number;
  workingForce: number;
  /** Spring rate, N/mm: the free-length spread follows from its spread. */
  rate: number;
}

function namesStandard(t: WireToleranceTable, material: Material): boolean {
  const std = material.standard.toUpperCase();
  return t.standards.some((s) => std.startsWith(s.toUpperCase()));
}

/** The wire-tolerance table of the material's standard; the last table when none names it. */
export function wireTableFor(catalog: ToleranceCatalog, material: Material): WireToleranceTable {
  return catalog.wireDiameter.find((t) => namesStandard(t, material)) ?? catalog.wireDiameter[catalog.wireDiameter.length - 1];
}

/** Wire-diameter tolerance, +- mm, by the wire standard and the nominal size. */
export function wireDiameterTolerance(catalog: ToleranceCatalog, material: Material, d: number, notes: string[] = []): Tolerance {
  const table = wireTableFor(catalog, material);
  if (!namesStandard(table, material)) {
    notes.push(`no wire-tolerance table names ${material.standard || material.id}: the ${table.id} table is used`);
  }
  const row = table.rows.find((r) => d <= r.maxDiameter * (1 + 1e-9));
  if (row) return { halfWidth: row.tolerance, source: row.source };
  const last = table.rows[table.rows.length - 1];
  notes.push(`wire diameter ${d} mm is above the ${table.id} table (${last.maxDiameter} mm): its largest tolerance is used`);
  return { halfWidth: last.tolerance, source: `${last.source}; extended beyond the table` };
}

/** Row and index column of the EN 15800 table for D and w (the last ones beyond the table). */
function rowIndex(table: CoilDiameterTable, D: number): number {
  const rows = table.rows;
  for (let r = 0; r < rows.length; r++) if (D <= rows[r].maxMeanDiameter * (1 + 1e-9)) return r;
  return rows.length - 1;
}

function columnIndex(table: CoilDiameterTable, w: number): number {
  const cols = table.indexColumns;
  for (let c = 0; c < cols.length; c++) if (w <= cols[c] * (1 + 1e-9)) return c;
  return cols.length - 1;
}

/** The coil-diameter half-width alone, +- mm: the same figure as meanDiameterTolerance, without its
 * notes and source, so that the search's hot loop can look it up per candidate without allocating. */
export function meanDiameterHalfWidth(table: CoilDiameterTable, grade: ToleranceGrade, D: number, w: number): number {
  return table.rows[rowIndex(table, D)].grades[grade - 1][columnIndex(table, w)];
}

/** EN 15800 coil-diameter tolerance, +- mm, by grade, mean diameter D and index w = D/d. */
export function meanDiameterTolerance(table: CoilDiameterTable, grade: ToleranceGrade, D: number, w: number, notes: string[] = []): Tolerance {
  const lastRow = table.rows[table.rows.length - 1];
  let row = table.rows.find((r) => D <= r.maxMeanDiameter * (1 + 1e-9));
  if (!row) {
    row = lastRow;
    notes.push(`mean diameter ${D.toFixed(2)} mm is above the ${table.standard} table (${lastRow.maxMeanDiameter} mm): its largest row is used`);
  } else if (D < table.minMeanDiameter) notes.push(`mean diameter ${D.toFixed(2)} mm is below the ${table.standard} scope (${table.minMeanDiameter} mm)`);
  let col = table.indexColumns.findIndex((top) => w <= top * (1 + 1e-9));
  if (col < 0) {
    col = table.indexColumns.length - 1;
    notes.push(`spring index ${w.toFixed(2)} is above the ${table.standard} scope (${table.indexColumns[col]}): the last column is used`);
  } else if (w < table.minIndex * (1 - 1e-9))
    notes.push(`spring index ${w.toFixed(2)} is below the ${table.standard} scope (${table.minIndex}): the first column is used`);
  return { halfWidth: row.grades[grade - 1][col], source: `${table.standard} grade ${grade}: ${row.source}` };
}

function resolve(override: ToleranceOverride | undefined, nominal: number, fallback: () => Tolerance): Tolerance {
  if (!override) return fallback();
  const halfWidth = 'absolute' in override ? override.absolute : override.fraction * nominal;
  return { halfWidth, source: 'given in the requirements' };
}

/** Relative standard deviation of the rate k = G d^4 / (8 D^3 Na), first order. */
export function rateSpread(n: NominalSpring, t: Pick<SpringTolerances, 'wireDiameter' | 'meanDiameter' | 'shearModulus' | 'activeCoils'>): number {
  const a = (4 * t.wireDiameter.halfWidth) / (3 * n.wireDiameter);
  const b = (3 * t.meanDiameter.halfWidth) / (3 * n.meanDiameter);
  const c = t.shearModulus.halfWidth / (3 * n.shearModulus);
  const e = t.activeCoils.halfWidth / (3 * n.activeCoils);
  return Math.sqrt(a * a + b * b + c * c + e * e);
}

/** Every half-width of the made spring: catalog figures, replaced by the user's where given. */
export function springTolerances(catalog: ToleranceCatalog, request: ToleranceRequest, n: NominalSpring): SpringTolerances {
  const notes: string[] = [];
  const o = request.overrides;
  const wireDiameter = resolve(o.wire_diameter, n.wireDiameter, () => wireDiameterTolerance(catalog, n.material, n.wireDiameter, notes));
  const meanDiameter = resolve(o.mean_diameter, n.meanDiameter, () =>
    meanDiameterTolerance(catalog.meanDiameter, request.grade, n.meanDiameter, n.meanDiameter / n.wireDiameter, notes),
  );
  const shearModulus = resolve(o.shear_modulus, n.shearModulus, () => {
    const row = catalog.shearModulus.find((r) => r.family === n.material.family)!;
    return { halfWidth: row.tolerance * n.shearModulus, source: row.source };
  });
  const activeCoils = resolve(o.active_coils, n.activeCoils, () => ({ halfWidth: catalog.activeCoils.tolerance, source: catalog.activeCoils.source }));
  const workingForce = resolve(o.working_force, n.workingForce, () => ({
    halfWidth: catalog.workingForce.tolerance * n.workingForce,
    source: catalog.workingForce.source,
  }));
  // L0 = L1 + F1 / k: the deflection F1/k takes the rate's relative spread and the force's.
  const deflection = n.workingForce / n.rate;
  const sk = rateSpread(n, { wireDiameter, meanDiameter, shearModulus, activeCoils });
  const sf = workingForce.halfWidth / (3 * n.workingForce);
  const freeLength = {
    halfWidth: 3 * deflection * Math.sqrt(sk * sk + sf * sf),
    source: 'follows from the spread of the rate, the free length being adjusted to the working force (first order)',
  };
  const wireTable = wireTableFor(catalog, n.material);
  const standards = [catalog.meanDiameter.standard, wireTable.standards.some((s) => s.startsWith('EN')) ? 'EN 10270-1' : n.material.standard].filter((s) => s);
  return { grade: request.grade, wireDiameter, meanDiameter, shearModulus, activeCoils, workingForce, freeLength, notes, standards };
}

/** The +- half-widths as the JSON output carries them (SI). */
export function tolerancesJson(t: SpringTolerances): Record<string, number> {
  return {
    wire_diameter: t.wireDiameter.halfWidth,
    mean_diameter: t.meanDiameter.halfWidth,
    shear_modulus: t.shearModulus.halfWidth,
    active_coils: t.activeCoils.halfWidth,
    working_force: t.workingForce.halfWidth,
    free_length: t.freeLength.halfWidth,
  };
}

/** Standard deviations in the order of TOLERANCED, written into `out`. */
export function standardDeviations(t: SpringTolerances, out: Float64Array = new Float64Array(TOLERANCED.length)): Float64Array {
  out[Q.wire_diameter] = t.wireDiameter.halfWidth / 3;
  out[Q.mean_diameter] = t.meanDiameter.halfWidth / 3;
  out[Q.shear_modulus] = t.shearModulus.halfWidth / 3;
  out[Q.active_coils] = t.activeCoils.halfWidth / 3;
  out[Q.working_force] = t.workingForce.halfWidth / 3;
  return out;
}
