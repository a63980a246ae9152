// source: none needed; the figures are checked against each other (check's clash and buckling lines
// against the same spring's analysis), on springs of our own.
// check's clash and buckling lines read in the unit of the check: the coil clearance to solid at the
// shortest working length against the clearance the clash allowance asks (mm / in), and the largest
// deflection against the critical deflection; the margin is that difference, and its sign is the verdict.
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { check } from '../../src/check/index.js';
import { analyze } from '../../src/index.js';
import { cli, inputFile } from '../helpers.js';

const DEMO = 'examples/washer-trigger.yaml';
const demo = parse(readFileSync(DEMO, 'utf8')) as Record<string, unknown>;
const spring = (over: Record<string, unknown> = {}) => ({
  units: 'si',
  material: 'stainless-302',
  wire_diameter: 1.4,
  outer_diameter: 15.75,
  active_coils: 8.25,
  ends: 'squared-ground',
  free_length: 49.7,
  ...over,
});

type Line = { name: string; value: number | null; limit: number | null; spare: number | null; margin: number | null; pass: boolean; note?: string };
type Result = { checks: Line[]; spring: { free_length: number; solid_length: number; critical_deflection: number | null } };
const line = (r: Result, name: string) => r.checks.find((l) => l.name === name)!;

describe('clash reads as coil clearance', () => {
  it('the demo spring: clearance to solid at the operating length against the share of the deflection the allowance asks', async () => {
    const r = check(spring(), demo) as unknown as Result;
    const clash = line(r, 'clash');
    const Ls = r.spring.solid_length;
    expect(clash.value).toBeCloseTo(25 - Ls, 9);
    expect(clash.limit).toBeCloseTo(0.15 * (49.7 - 25), 9);
    expect(clash.spare).toBeCloseTo(clash.value! - clash.limit!, 9);
    // The margin stays design's normalised figure (-g: here the spare clearance over the shortest length).
    expect(clash.margin).toBeCloseTo(clash.spare! / 25, 9);
    // The same test as analyze's force overrun: clearance / deflection = solid force / largest force - 1.
    const overrun = (25 - Ls) / (49.7 - 25);
    expect(clash.note).toContain(`${Number((overrun * 100).toPrecision(3))}% force overrun to solid, asked 15.0%`);
    const text = (await cli('check', inputFile(JSON.stringify(spring()), 'json'), DEMO)).stdout;
    expect(text).toMatch(/clash +10\.65 mm +>= +3\.705 mm +\+6\.945 mm +pass/);
    const us = (await cli('check', inputFile(JSON.stringify(spring()), 'json'), DEMO, '--units', 'us')).stdout;
    expect(us).toMatch(/clash +0\.4193 in +>= +0\.1459 in +\+0\.2734 in +pass/);
  });

  it('absolutely stable buckling has no margin to show; a spring that can buckle shows its deflection to spare', async () => {
    const stable = line(check(spring(), demo) as unknown as Result, 'buckling');
    expect(stable).toMatchObject({ limit: null, spare: null, pass: true });
    const r = check(spring(), { ...demo, seating: 'fixed-free' }) as unknown as Result;
    const b = line(r, 'buckling');
    expect(b.limit).toBeCloseTo(r.spring.critical_deflection!, 9);
    expect(b.spare).toBeCloseTo(b.limit! - b.value!, 9);
    expect(b.pass).toBe(false);
    const out = await cli('check', inputFile(JSON.stringify(spring()), 'json'), DEMO, '--set', 'seating=fixed-free');
    expect(out.stdout).toMatch(/buckling +24\.70 mm +< +3\.107 mm +-21\.59 mm +FAIL/);
    expect(out.stdout).toMatch(/buckling by 21\.59 mm \(24\.700 mm against < 3\.1066 mm\)/);
  });

  it("over many springs, the sign of each unit margin is the verdict, and clash agrees with analyze's overrun (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 90, noNaN: true }),
        fc.double({ min: 4, max: 14, noNaN: true }),
        fc.constantFrom('fixed-fixed', 'fixed-pivoted', 'pivoted-pivoted', 'fixed-free'),
        (freeLength, coils, seating) => {
          const s = spring({ free_length: freeLength, active_coils: coils });
          const r = check(s, { ...demo, seating }) as unknown as Result;
          for (const name of ['clash', 'buckling']) {
            const l = line(r, name);
            if (l.spare !== null) expect(l.pass, `${name} ${JSON.stringify(l)}`).toBe(l.spare >= -1e-9 * Math.max(1, Math.abs(l.limit!)));
          }
          if (freeLength <= 35) return; // loose at the working length: analyze refuses such lengths
          const clash = line(r, 'clash');
          const a = analyze({ ...s, seating, lengths: [35, 25] }) as unknown as { clash: { overrun: number | null } };
          if (a.clash.overrun !== null) expect(clash.value! / (freeLength - 25)).toBeCloseTo(a.clash.overrun, 6);
        },
      ),
      { numRuns: 60, seed: 7 },
    );
  });
});
