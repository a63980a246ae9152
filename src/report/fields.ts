// Output fields rendered for a unit system: the CSV columns of any spring kind, from its fields
// registry (src/kinds/kind.ts). Names carry their unit symbol (`wire_diameter_mm`); values are
// rounded to the field's significant digits (0: written as they are).
import type { FieldDefinition, FieldValue } from '../kinds/kind.js';
import { inUnit, sig, unitSymbol } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';

export function fieldColumns<C>(fields: readonly FieldDefinition<C>[], system: UnitSystem): string[] {
  return fields.map((f) => (f.unit && f.unit !== 'volume' ? `${f.name}_${unitSymbol(f.unit, system)}` : f.name));
}

export function fieldRow<C>(fields: readonly FieldDefinition<C>[], c: C, system: UnitSystem): FieldValue[] {
  return fields.map((f) => {
    const v = f.read(c);
    if (typeof v !== 'number') return v;
    const shown = f.unit && f.unit !== 'volume' ? inUnit(v, f.unit, system) : v;
    return f.digits > 0 ? Number(sig(shown, f.digits)) : shown;
  });
}
