// The band a given spring's working force must fall in. A made spring cannot meet a force exactly, so
// `check` and `stock` accept the working force within `working_tolerance`; without it, within the
// load tolerance; and when that is zero too, within 2%: coilfront's own default, a band narrow enough to
// mean "this force" and wide enough for a spring whose free length was rounded to a drawing's precision.
// The specification sheets tolerance the working force by the same band (src/check/band.ts words it).

export const DEFAULT_WORKING_TOLERANCE = 0.02;

export type BandSource = 'working_tolerance' | 'load_tolerance' | 'default';

export interface WorkingBand {
  force: number;
  length: number;
  tolerance: number;
  source: BandSource;
  low: number;
  high: number;
}

/** Compression and extension requirements alike: the working force, its length and the two tolerances. */
export function workingBand(req: { workingTolerance?: number; loadTolerance: number; workingForce: number; workingLength: number }): WorkingBand {
  const [tolerance, source]: [number, BandSource] =
    req.workingTolerance !== undefined
      ? [req.workingTolerance, 'working_tolerance']
      : req.loadTolerance > 0
        ? [req.loadTolerance, 'load_tolerance']
        : [DEFAULT_WORKING_TOLERANCE, 'default'];
  const force = req.workingForce;
  return { force, length: req.workingLength, tolerance, source, low: force * (1 - tolerance), high: force * (1 + tolerance) };
}
