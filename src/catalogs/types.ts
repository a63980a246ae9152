// Catalog records after loading: every value SI (mm, MPa, kg/m^3, degC), every record sourced.
import type { FiniteLifeTable } from '../model/fatigue.js';

export const FAMILIES = ['carbon-steel', 'alloy-steel', 'stainless', 'copper-alloy'] as const;
export type Family = (typeof FAMILIES)[number];

export interface Sourced<T> { value: T; source: string }

export type StrengthLaw =
  | { law: 'power'; segments: { minDiameter: number; maxDiameter: number; coefficient: number; exponent: number }[]; source: string }
  | { law: 'table'; diameters: number[]; strengths: number[]; source: string };

export interface ModulusBand { maxDiameter: number; elasticModulus: number; shearModulus: number }

export interface Material {
  id: string;
  name: string;
  standard: string;
  family: Family;
  source: string;
  strength: StrengthLaw;
  minDiameter: number;
  maxDiameter: number;
  /** The tabulated minimum tensile strength of the wire's standard, where one exists (strength_basis: minimum). */
  minimumStrength?: { law: StrengthLaw; minDiameter: number; maxDiameter: number; /** The published law is itself the minimum. */ isTheLaw: boolean };
  moduli: { bands: ModulusBand[]; source: string };
  density: Sourced<number>;
  allowable: { static: number; staticSetRemoved: number; source: string };
  fatigue: { classId: string; table: FiniteLifeTable; zimmerli: boolean; source: string };
  maxTemperature: Sourced<number>;
  relativeCost: Sourced<number>;
  wireSeries: string;
}

export interface WireSeries {
  id: string;
  name: string;
  source: string;
  /** Diameters in mm, ascending. */
  diameters: number[];
  /** Gauge labels, where the series is a gauge. */
  labels?: string[];
}

export interface Catalog { materials: Material[]; series: WireSeries[] }
