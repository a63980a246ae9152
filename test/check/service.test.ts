// source: none needed; our own demo scenarios, and the check is that coilfront says which checks its
// reading of the service leaves out.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { check } from '../../src/check/index.js';

const demo = parse(readFileSync('examples/washer-trigger.yaml', 'utf8')) as Record<string, unknown>;
const bin = parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8')) as Record<string, unknown>;
const binSpring = parse(readFileSync('examples/extension-pedal-bin-spring.yaml', 'utf8')) as Record<string, unknown>;
const trigger = {
  units: 'si',
  material: 'stainless-302',
  wire_diameter: 1.4,
  outer_diameter: 15.75,
  active_coils: 8.25,
  ends: 'squared-ground',
  free_length: 49.7,
};
const without = (doc: Record<string, unknown>, ...keys: string[]) => Object.fromEntries(Object.entries(doc).filter(([k]) => !keys.includes(k)));
type Result = { notes: string[]; checks: { name: string }[] };

describe('check says when the service leaves the fatigue check out', () => {
  it('cycles with a single working length: no load cycle, said so, and no fatigue line (both kinds)', () => {
    const c = check(trigger, without(demo, 'operating_length', 'operating_force')) as unknown as Result;
    expect(c.notes).toContain('cycles given without operating_length: one working length is no load cycle (no fatigue check)');
    expect(c.checks.map((l) => l.name)).not.toContain('fatigue');
    const e = check(binSpring, without(bin, 'operating_length', 'operating_force')) as unknown as Result;
    expect(e.notes).toContain('cycles given without operating_length: one working length is no load cycle (no fatigue check)');
    expect(e.checks.map((l) => l.name)).not.toContain('body_fatigue');
  });

  it('cycles below 1e4: static service, said so', () => {
    const c = check(trigger, { ...demo, cycles: 5000 }) as unknown as Result;
    expect(c.notes.join(' ')).toMatch(/cycles 5000 is below 1e4: judged as static service/);
    expect(c.checks.map((l) => l.name)).not.toContain('fatigue');
  });

  it('a cycled requirement with a stroke adds no such note', () => {
    expect((check(trigger, demo) as unknown as Result).notes.join(' ')).not.toMatch(/no fatigue check/);
  });
});
