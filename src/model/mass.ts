// Mass of wire, for every spring kind.

/** Mass in kg of a wire volume (mm^3) at a density (kg/m^3). */
export function massOfVolume(volume: number, density: number): number {
  return volume * 1e-9 * density;
}
