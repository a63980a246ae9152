// Manufacturing tolerances of a cold-coiled extension spring, as far as they could be sourced. EN 15800
// (the compression springs' tolerance standard) does not cover extension springs; their tolerances are
// DIN 2097's, three quality grades like EN 15800's, grade 2 the makers' standard grade. The standard
// itself could not be read here: its tables below are as spring makers reproduce them, each row with
// where it was seen. DIN 2097 derives the force tolerances and the loops' relative position from
// diagrams of the spring's own figures, which no public source reproduces: those are left "to be agreed
// with the spring maker" on the sheet, never guessed. Lengths in mm; null where the spring lies outside
// a table's scope (the sheet then says "to be agreed").

export interface SourcedTolerance {
  /** +- half-width, mm (or degrees for the loops' position). */
  halfWidth: number;
  source: string;
}

/** DIN 2097 quality grade 2 (medium), the grade makers coil to unless another is agreed. */
export const EXTENSION_TOLERANCE_GRADE = 2;

const MAKER_A =
  'DIN 2097 grade 2 as reproduced in a spring maker\'s tension-spring tolerance tables (federnshop.com blog, "Tension spring tolerances") and a second maker\'s (Industrial Springs, "What tolerances does an extension spring have?"); not confirmed from the standard';
const MAKER_B =
  'DIN 2097 grade 2 as reproduced by a spring maker (Industrial Springs, "What tolerances does an extension spring have?"); not confirmed from the standard';

/** Coil-diameter tolerance (applies to D, OD and ID alike), grade 2, by the mean diameter D (rows up to and
 * including maxD) and the spring index w = D/d in the columns 4-8, over 8-14, over 14-20. Rows to 31.5 mm
 * are printed alike by both makers (and match EN 15800's grade 2 for compression springs); above, one. */
export const COIL_DIAMETER_GRADE_2: readonly { maxD: number; byIndex: readonly [number, number, number]; source: string }[] = [
  { maxD: 1.0, byIndex: [0.07, 0.1, 0.15], source: MAKER_A },
  { maxD: 1.6, byIndex: [0.08, 0.1, 0.15], source: MAKER_A },
  { maxD: 2.5, byIndex: [0.1, 0.15, 0.2], source: MAKER_A },
  { maxD: 4.0, byIndex: [0.15, 0.2, 0.25], source: MAKER_A },
  { maxD: 6.3, byIndex: [0.2, 0.25, 0.3], source: MAKER_A },
  { maxD: 10, byIndex: [0.25, 0.3, 0.35], source: MAKER_A },
  { maxD: 16, byIndex: [0.3, 0.35, 0.4], source: MAKER_A },
  { maxD: 25, byIndex: [0.35, 0.45, 0.5], source: MAKER_A },
  { maxD: 31.5, byIndex: [0.4, 0.5, 0.6], source: MAKER_A },
  { maxD: 40, byIndex: [0.5, 0.6, 0.7], source: MAKER_B },
  { maxD: 50, byIndex: [0.6, 0.8, 0.9], source: MAKER_B },
  { maxD: 63, byIndex: [0.8, 1.0, 1.1], source: MAKER_B },
  { maxD: 80, byIndex: [1.0, 1.2, 1.4], source: MAKER_B },
  { maxD: 100, byIndex: [1.2, 1.5, 1.7], source: MAKER_B },
  { maxD: 125, byIndex: [1.4, 1.9, 2.2], source: MAKER_B },
  { maxD: 160, byIndex: [1.8, 2.3, 2.7], source: MAKER_B },
  { maxD: 200, byIndex: [2.1, 2.9, 3.3], source: MAKER_B },
];
const COIL_MIN_D = 0.63;
const INDEX_COLUMNS = [8, 14, 20] as const;
const MIN_INDEX = 4;

/** The coil-diameter tolerance of grade 2, or null outside the table (D 0.63-200 mm, index 4-20). */
export function coilDiameterTolerance(meanDiameter: number, springIndex: number): SourcedTolerance | null {
  if (!(meanDiameter >= COIL_MIN_D && springIndex >= MIN_INDEX && springIndex <= INDEX_COLUMNS[2])) return null;
  const row = COIL_DIAMETER_GRADE_2.find((r) => meanDiameter <= r.maxD);
  if (!row) return null;
  const col = INDEX_COLUMNS.findIndex((w) => springIndex <= w);
  return { halfWidth: row.byIndex[col], source: row.source };
}

/** Free-length tolerance (inside the loops), grade 2, by L0 (rows up to and including maxL0) and the
 * index w in the columns 4-8 and over 8-20; above 400 mm 1.5% of L0. One maker's reproduction. */
export const FREE_LENGTH_GRADE_2: readonly { maxL0: number; byIndex: readonly [number, number] }[] = [
  { maxL0: 10, byIndex: [0.4, 0.5] },
  { maxL0: 16, byIndex: [0.5, 0.6] },
  { maxL0: 25, byIndex: [0.6, 0.7] },
  { maxL0: 40, byIndex: [0.8, 0.9] },
  { maxL0: 63, byIndex: [1.1, 1.3] },
  { maxL0: 100, byIndex: [1.5, 1.8] },
  { maxL0: 160, byIndex: [2.0, 2.4] },
  { maxL0: 250, byIndex: [2.5, 3.0] },
  { maxL0: 400, byIndex: [3.0, 4.0] },
];
const LONG_SPRING_SHARE = 0.015;

/** The free-length tolerance of grade 2, or null outside the table's index range (4-20). */
export function freeLengthTolerance(freeLength: number, springIndex: number): SourcedTolerance | null {
  if (!(freeLength > 0 && springIndex >= MIN_INDEX && springIndex <= INDEX_COLUMNS[2])) return null;
  const col = springIndex <= INDEX_COLUMNS[0] ? 0 : 1;
  const row = FREE_LENGTH_GRADE_2.find((r) => freeLength <= r.maxL0);
  return { halfWidth: row ? row.byIndex[col] : LONG_SPRING_SHARE * freeLength, source: MAKER_B };
}

/** Commercial tolerance of the loops' relative position (degrees) by the body coils: 3-5 coils +-20,
 * 6-8 +-30, 9-12 +-40, 1.5 more per coil above 12; null under 3 coils. A distributor's published
 * practice, not a standard (DIN 2097's own figure comes from a diagram not reproduced anywhere public). */
export function loopPositionTolerance(bodyCoils: number): SourcedTolerance | null {
  const n = Math.round(bodyCoils);
  if (!(n >= 3)) return null;
  const halfWidth = n <= 5 ? 20 : n <= 8 ? 30 : n <= 12 ? 40 : 40 + 1.5 * (n - 12);
  return {
    halfWidth,
    source: 'commercial practice as published by a spring distributor (Stock Springs Australia, "Technical information": tension springs); not a standard',
  };
}

/** What the sheet says of a figure it cannot tolerance from a source. */
export const TO_BE_AGREED = 'to be agreed with the spring maker';
