// `coilfront materials`: what the catalogs hold, with the source of every figure, so a user can pick
// a material id and see how far to trust it.
import { loadCatalog } from '../catalogs/load.js';
import { moduliAt, tensileStrength } from '../catalogs/properties.js';
import { lawAboveMinimum } from '../input/material.js';
import { toJson, SI_UNITS } from '../report/json.js';
import { table } from '../report/table.js';
import { formatQuantity, sig } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import type { Material } from '../catalogs/types.js';
import { EXIT, type Io } from './io.js';

export function materialsCommand(opts: { json?: boolean; units?: UnitSystem }, io: Io): number {
  const catalog = loadCatalog();
  const system = opts.units ?? 'si';
  if (opts.json) {
    io.stdout(
      toJson({
        units: SI_UNITS,
        materials: catalog.materials.map((m) => {
          const dMid = Math.sqrt(m.minDiameter * m.maxDiameter);
          const mod = moduliAt(m, dMid);
          return {
            id: m.id,
            name: m.name,
            standard: m.standard,
            family: m.family,
            min_diameter: m.minDiameter,
            max_diameter: m.maxDiameter,
            tensile_strength_at: [m.minDiameter, dMid, m.maxDiameter].map((d) => ({ diameter: d, tensile_strength: tensileStrength(m, d) })),
            shear_modulus: mod.shearModulus,
            elastic_modulus: mod.elasticModulus,
            density: m.density.value,
            max_temperature: m.maxTemperature.value,
            static_allowable_fraction: m.allowable.static,
            static_allowable_fraction_set_removed: m.allowable.staticSetRemoved,
            tabulated_minimum: minimumAt(m).length ? { source: m.minimumStrength!.law.source, at: minimumAt(m) } : null,
            zimmerli: m.fatigue.zimmerli,
            relative_cost: m.relativeCost.value,
            wire_series: m.wireSeries,
            sources: {
              record: m.source,
              strength: m.strength.source,
              moduli: m.moduli.source,
              density: m.density.source,
              allowable: m.allowable.source,
              fatigue: m.fatigue.source,
              max_temperature: m.maxTemperature.source,
              relative_cost: m.relativeCost.source,
            },
          };
        }),
        wire_series: catalog.series.map((s) => ({
          id: s.id,
          name: s.name,
          count: s.diameters.length,
          min_diameter: s.diameters[0],
          max_diameter: s.diameters[s.diameters.length - 1],
          source: s.source,
        })),
      }) + '\n',
    );
    return EXIT.ok;
  }
  const L = (v: number) => formatQuantity(v, 'length', system, 3);
  const S = (v: number) => formatQuantity(v, 'stress', system, 4);
  const rows = [['id', 'standard', 'family', 'wire range', 'Sut at mid-range', 'G', 'max temp', 'cost', 'strength source']];
  for (const m of catalog.materials) {
    const dMid = Math.sqrt(m.minDiameter * m.maxDiameter);
    rows.push([
      m.id,
      m.standard,
      m.family,
      `${L(m.minDiameter)} - ${L(m.maxDiameter)}`,
      `${S(tensileStrength(m, dMid))} at ${L(dMid)}`,
      S(moduliAt(m, dMid).shearModulus),
      formatQuantity(m.maxTemperature.value, 'temperature', system, 3),
      sig(m.relativeCost.value, 2),
      m.strength.source,
    ]);
  }
  const series = [['series', 'sizes', 'range', 'source']];
  for (const s of catalog.series) series.push([s.id, String(s.diameters.length), `${L(s.diameters[0])} - ${L(s.diameters[s.diameters.length - 1])}`, s.source]);
  io.stdout(
    [
      'Materials (catalogs/materials.yaml; every figure has its source there, "from memory" where it could not be checked)',
      table(rows),
      "cost: the relative cost of the wire per unit mass, hard-drawn carbon steel = 1.0; relative_cost in design outputs is the spring's mass in kg times it.",
      '',
      ...catalog.materials
        .filter((m) => minimumAt(m).length)
        .map(
          (m) =>
            `${m.id}: the published law runs ${minimumAt(m)
              .map((p) => `${sig(p.law_above_minimum * 100, 2)}% at ${L(p.diameter)}`)
              .join(', ')} above the tabulated minimum (${m.minimumStrength!.law.source}); strength_basis: minimum uses the minimum`,
        ),
      '',
      'Wire-size series (catalogs/wire-series.yaml)',
      table(series),
      '',
    ].join('\n'),
  );
  return EXIT.ok;
}

/** Where the catalog holds the standard's tabulated minimum beside the published law: the law's excess
 * over it at the small end, the middle and the large end of the table. */
function minimumAt(m: Material): { diameter: number; tensile_strength_minimum: number; law_above_minimum: number }[] {
  const min = m.minimumStrength;
  if (!min) return [];
  const ds = [min.minDiameter, Math.sqrt(min.minDiameter * min.maxDiameter), min.maxDiameter];
  return ds.flatMap((d) => {
    const above = lawAboveMinimum({ material: m }, d);
    return above ? [{ diameter: d, tensile_strength_minimum: above.minimum, law_above_minimum: above.excess }] : [];
  });
}
