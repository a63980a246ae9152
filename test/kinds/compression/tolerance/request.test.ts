// The tolerance fields of a requirements file: tolerance_grade, tolerances { ... }, min_yield.
// source: the grades 1 (fine), 2 (medium), 3 (coarse) are EN 15800's tolerance grades for cylindrical
// compression springs; everything else here is our own reader, no outside values.
import { describe, expect, it } from 'vitest';
import { Fields } from '../../../../src/units/fields.js';
import { readToleranceRequirements } from '../../../../src/kinds/compression/tolerance/request.js';

const read = (doc: Record<string, unknown>) => {
  const f = Fields.document(doc);
  const out = readToleranceRequirements(f);
  f.rejectUnknown();
  return out;
};

describe('reading tolerance_grade, tolerances and min_yield', () => {
  it('defaults to grade 2 with no overrides and no yield requirement', () => {
    expect(read({})).toEqual({ tolerance: { grade: 2, overrides: {} }, minYield: undefined });
  });

  it('reads every override in its unit, or as a percentage of the nominal value', () => {
    const r = read({
      tolerance_grade: 1,
      min_yield: '99%',
      tolerances: { wire_diameter: '0.01 mm', mean_diameter: 0.2, shear_modulus: '2%', active_coils: 0.5, working_force: '1 N' },
    });
    expect(r.tolerance.grade).toBe(1);
    expect(r.minYield).toBeCloseTo(0.99, 12);
    expect(r.tolerance.overrides).toEqual({
      wire_diameter: { absolute: 0.01 },
      mean_diameter: { absolute: 0.2 },
      shear_modulus: { fraction: 0.02 },
      active_coils: { absolute: 0.5 },
      working_force: { absolute: 1 },
    });
  });

  it("reads plain numbers in the file's unit system", () => {
    const r = read({ units: 'us', tolerances: { wire_diameter: 0.001, working_force: 0.5 } });
    expect((r.tolerance.overrides.wire_diameter as { absolute: number }).absolute).toBeCloseTo(0.0254, 12);
    expect((r.tolerance.overrides.working_force as { absolute: number }).absolute).toBeCloseTo(2.2241108, 6);
  });

  it.each([
    [{ tolerance_grade: 4 }, /tolerance_grade: expected an EN 15800 tolerance grade: 1 \(fine\), 2 \(medium\) or 3 \(coarse\), got 4/],
    [{ tolerances: { wire_diameter: '2 N' } }, /tolerances\.wire_diameter: expected a \+- length/],
    [{ tolerances: { mean_diameter: -0.1 } }, /tolerances\.mean_diameter: expected/],
    [{ tolerances: { active_coils: 'many' } }, /tolerances\.active_coils: expected a \+- number of coils/],
    [{ tolerances: { shear_modulus: '80%' } }, /tolerances\.shear_modulus: expected/],
    [
      { tolerances: { free_length: 1 } },
      /tolerances\.free_length: no such field; the known fields here are: active_coils, mean_diameter, shear_modulus, wire_diameter, working_force/,
    ],
    [{ tolerances: 3 }, /tolerances: expected a mapping/],
    [{ min_yield: 1 }, /min_yield: expected a fraction between 0 and 1/],
    [{ min_yield: 'most' }, /min_yield: expected a number/],
  ])('rejects %j with one message naming the field', (doc, message) => {
    expect(() => read(doc)).toThrow(message);
  });
});
