// The band a given spring's working force must fall in. A made spring cannot meet a force exactly, so
// `check` and `stock` accept the working force within `working_tolerance`; without it, within the
// load tolerance; and when that is zero too, within 2%: coilfront's own default, a band narrow enough to
// mean "this force" and wide enough for a spring whose free length was rounded to a drawing's precision.
import { formatQuantity, sig } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import type { BandSource, WorkingBand } from '../input/workingBand.js';

// The rule lives below the kinds, where the specification sheets read it too.
export { DEFAULT_WORKING_TOLERANCE, workingBand, type BandSource, type WorkingBand } from '../input/workingBand.js';

const SOURCE_WORDS: Record<BandSource, string> = {
  working_tolerance: "the requirement's working_tolerance",
  load_tolerance: "the requirement's load_tolerance (no working_tolerance given)",
  default: 'the default 2% (neither working_tolerance nor load_tolerance given)',
};

/** "20 N +-5% at 35 mm (19 to 21 N), from ...": which band was used, in words. */
export function bandText(b: WorkingBand, system: UnitSystem): string {
  const F = (v: number) => formatQuantity(v, 'force', system);
  return `${F(b.force)} +-${sig(b.tolerance * 100, 3)}% at ${formatQuantity(b.length, 'length', system)} (${F(b.low)} to ${F(b.high)}), from ${SOURCE_WORDS[b.source]}`;
}
