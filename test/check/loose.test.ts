// source: none needed; the springs and requirements are our own demo scenarios, and the checks are
// properties of coilfront's own verdicts (a spring carries no force where nothing loads it).
// `check` of a given spring whose free length does not reach a working length: a compression spring
// beyond its free length is loose there, an extension spring below its free length hangs slack. Either
// carries no force at that length: the force is 0 (never negative), named, and the force checks fail
// saying why.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { check } from '../../src/check/index.js';
import { cli, inputFile } from '../helpers.js';

const DEMO = 'examples/washer-trigger.yaml';
const BIN = 'examples/extension-pedal-bin.yaml';
const BIN_SPRING = 'examples/extension-pedal-bin-spring.yaml';

// The trigger spring of the washer-gun demo (free length 49.7 mm), cut to a free length of its own.
const trigger = (freeLength: number) => ({
  units: 'si',
  material: 'stainless-302',
  wire_diameter: 1.4,
  outer_diameter: 15.74,
  active_coils: 8.25,
  ends: 'squared-ground',
  free_length: freeLength,
});
const demo = parse(readFileSync(DEMO, 'utf8')) as Record<string, unknown>;
const bin = parse(readFileSync(BIN, 'utf8')) as Record<string, unknown>;
const binSpring = parse(readFileSync(BIN_SPRING, 'utf8')) as Record<string, unknown>;

type Line = { name: string; value: unknown; label: string; pass: boolean; margin: number | null };
type Result = {
  pass: boolean;
  checks: Line[];
  notes: string[];
  loose?: unknown;
  slack?: unknown;
  spring: { points: { length: number; force: number }[]; rate: number };
};
const line = (r: Result, name: string) => r.checks.find((l) => l.name === name)!;
const forces = (r: Result) => r.spring.points.map((p) => p.force);

describe('a compression spring beyond its free length is loose', () => {
  it('at the working length: force 0 there, named, and the working force fails saying why', () => {
    const r = check(trigger(33), demo) as unknown as Result;
    expect(r.pass).toBe(false);
    expect(r.loose).toStrictEqual([{ at: 'working', length: 35 }]);
    expect(r.spring.points[0]).toMatchObject({ length: 35, force: 0, stress: 0 });
    expect(forces(r).every((f) => f >= 0)).toBe(true);
    const low = line(r, 'working_force_min');
    expect(low).toMatchObject({ value: 0, pass: false });
    expect(low.label).toMatch(/loose/);
    expect(line(r, 'working_force_max').pass).toBe(true);
    expect(line(r, 'operating_force_min').label).not.toMatch(/loose/);
    expect(r.notes.join(' ')).toMatch(/loose at the working length: 35(\.0+)? mm is beyond its free length 33(\.0+)? mm/);
  });

  it('the free length the note offers gives the working force', () => {
    const r = check(trigger(33), demo) as unknown as Result;
    const offered = Number(/a free length of ([\d.]+) mm gives the working force/.exec(r.notes.join(' '))![1]);
    const fixed = check(trigger(offered), demo) as unknown as Result;
    expect(fixed.loose).toStrictEqual([]);
    expect(Math.abs(fixed.spring.points[0].force - 20)).toBeLessThan(20 * 1e-3);
  });

  it('at both lengths: every force 0, both force checks fail as loose, no NaN anywhere', async () => {
    const r = check(trigger(24), demo) as unknown as Result;
    expect(r.loose).toStrictEqual([
      { at: 'working', length: 35 },
      { at: 'operating', length: 25 },
    ]);
    expect(forces(r)).toStrictEqual([0, 0]);
    expect(line(r, 'operating_force_min').label).toMatch(/loose/);
    expect(line(r, 'operating_force_min').pass).toBe(false);
    const out = await cli('check', inputFile(JSON.stringify(trigger(24)), 'json'), DEMO);
    expect(out.code).toBe(1);
    expect(out.stdout).toMatch(/working_force_min +0 N +>= +19\.00 N/);
    expect(out.stdout).not.toMatch(/NaN|Infinity|undefined|-\d[\d.]* N /);
    expect(out.stderr).toMatch(/fails working_force_min/);
  });

  it('a spring that reaches its lengths is not loose (the demo spring)', () => {
    const r = check(trigger(49.7), demo) as unknown as Result;
    expect(r.loose).toStrictEqual([]);
    expect(line(r, 'working_force_min')).toMatchObject({ pass: true, label: 'working force below its band' });
  });
});

describe('an extension spring below its free length hangs slack', () => {
  // The pedal-bin spring (free length 50.64 mm inside the loops) with the pedal-up length moved to 45 mm.
  const slackReq = { ...bin, load: { force: 20, length: 45 }, envelope: { max_outer_diameter: 14, max_free_length: 60, max_extended_length: 85 } };

  it('at the working length: force 0 (not the initial tension, not negative), named; the force check fails saying why', () => {
    const r = check(binSpring, slackReq) as unknown as Result;
    expect(r.pass).toBe(false);
    expect(r.slack).toStrictEqual([{ at: 'working', length: 45 }]);
    expect(r.spring.points[0]).toMatchObject({ length: 45, force: 0 });
    expect(forces(r).every((f) => f >= 0)).toBe(true);
    const low = line(r, 'working_force_min');
    expect(low).toMatchObject({ value: 0, pass: false });
    expect(low.label).toMatch(/slack/);
    expect(r.notes.join(' ')).toMatch(/slack at the working length: 45(\.0+)? mm is below its free length/);
  });

  it('its fatigue is not judged on a cycle it never runs: each site fails, saying why', async () => {
    const r = check(binSpring, slackReq) as unknown as Result;
    for (const site of ['body_fatigue', 'loop_bending_fatigue', 'loop_torsion_fatigue']) {
      expect(line(r, site)).toMatchObject({ value: null, pass: false, margin: null });
      expect(line(r, site).label).toMatch(/slack every cycle/);
    }
    const out = await cli('check', BIN_SPRING, inputFile(JSON.stringify(slackReq), 'json'));
    expect(out.code).toBe(1);
    expect(out.stdout).toMatch(/body_fatigue \(not judged\)/);
    expect(out.stdout).not.toMatch(/NaN|Infinity|undefined|-\d[\d.]* N /);
  });

  it('the demo requirement stretches it at both lengths: nothing slack', () => {
    expect((check(binSpring, bin) as unknown as Result).slack).toStrictEqual([]);
  });
});
