// Defaults shared by every spring kind's requirements: what a field means when the file leaves it out.
// A kind adds its own (end types, coil ranges, loops) beside these; the README documents them all.

export const DEFAULTS = {
  loadTolerance: 0,
  index: [4, 12] as [number, number],
  safety: { static: 1.2, fatigue: 1.5, surge: 15 },
  rank: 'mass' as const,
  top: 10,
  seed: 1,
  diameterResolution: 0.01,
};
