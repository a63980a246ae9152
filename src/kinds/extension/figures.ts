// Figures of an extension spring that several outputs show (text, JSON, CSV, the tables): each
// worked out once here from the analysis, never again by a report.
import { EXTENSION_SITES, type ExtensionAnalysis } from './analysis.js';

/** Where the initial-tension stress sits in its preferred band: 0 at the bottom, 1 at the top (below 0
 * or above 1 outside it). */
export function bandFraction(a: ExtensionAnalysis): number {
  const b = a.initialTension.band;
  return b.high > b.low ? (a.initialTension.stress - b.low) / (b.high - b.low) : NaN;
}

/** The lowest fatigue safety factor of the three sites (null in static service or with no alternation). */
export function fatigueSafety(a: ExtensionAnalysis): number | null {
  if (!a.fatigue) return null;
  const v = Math.min(...EXTENSION_SITES.map((s) => (Number.isNaN(a.fatigue![s].safetyFactor) ? Infinity : a.fatigue![s].safetyFactor)));
  return Number.isFinite(v) ? v : null;
}

/** The lowest static safety factor of the three sites. */
export function staticSafety(a: ExtensionAnalysis): number {
  return Math.min(a.staticSafety.body, a.staticSafety.loopBending, a.staticSafety.loopTorsion);
}
