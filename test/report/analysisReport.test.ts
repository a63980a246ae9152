// The analysis as users read it (text) and as programs read it (JSON): names and bases stated.
import { describe, expect, it } from 'vitest';
import { cli, inputFile } from '../helpers.js';

const spring = (extra: string) =>
  inputFile(`units: si
material: music-wire
wire_diameter: 1.6
mean_diameter: 12
active_coils: 8
ends: squared-ground
free_length: 48
lengths: [40, 30]
${extra}`);

describe('analysis output: surge', () => {
  it('natural_frequency follows surge_ends, not the buckling seating, and both values are named', async () => {
    const fixedFree = JSON.parse((await cli('analyze', spring('seating: fixed-free\n'), '--json')).stdout);
    expect(fixedFree.surge_ends).toBe('plates');
    expect(fixedFree.natural_frequency).toBe(fixedFree.surge.both_ends_on_plates);
    expect(fixedFree.buckling.seating).toBe('fixed-free');
    const oneFree = JSON.parse((await cli('analyze', spring('surge_ends: one-free\n'), '--json')).stdout);
    expect(oneFree.surge_ends).toBe('one-free');
    expect(oneFree.natural_frequency).toBe(oneFree.surge.one_end_free);
    expect(oneFree.surge.one_end_free / oneFree.surge.both_ends_on_plates).toBeCloseTo(0.5, 12);
    const text = (await cli('analyze', spring('surge_ends: one-free\n'))).stdout;
    expect(text).toMatch(/natural frequency +[\d.]+ Hz \(one end free, surge_ends: one-free\)/);
    expect(text).toMatch(/Surge: [\d.]+ Hz with both ends on plates, [\d.]+ Hz with one end free; the surge check uses one end free/);
  });

  it('an unknown surge boundary is refused naming the field', async () => {
    const r = await cli('analyze', spring('surge_ends: floating\n'));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/surge_ends/);
  });
});

const KPSI = 6.894757293168361; // MPa per kpsi

describe('strength basis: the published law (default) or the tabulated minimum', () => {
  const musicWire = (extra: string) =>
    inputFile(`units: us
material: music-wire
wire_diameter: 0.100
mean_diameter: 0.8
active_coils: 8
ends: squared-ground
free_length: 2.4
lengths: [2.0, 1.6]
${extra}`);

  it("by default the power law is used and the output says how far it runs above the ASTM A228 minimum: 3.4% at 0.100 in (sources: Shigley Table 10-4; ASTM A228 as in distributors' tables, 271 kpsi)", async () => {
    const r = await cli('analyze', musicWire(''), '--json');
    const j = JSON.parse(r.stdout);
    expect(j.material.strength_basis).toBe('law');
    expect(j.material.strength_source).toMatch(/Table 10-4/);
    expect(j.material.tabulated_minimum_tensile_strength / KPSI).toBeCloseTo(271, 6);
    expect(j.material.law_above_minimum).toBeCloseTo(0.034, 3);
    expect(j.material.tabulated_minimum_source).toMatch(/ASTM A228/);
    const text = (await cli('analyze', musicWire(''))).stdout;
    expect(text).toMatch(/tensile strength: published law \(strength_basis: law\), Shigley Table 10-4.*runs 3\.4% above the tabulated minimum 271\.0 kpsi/);
  });

  it("strength_basis: minimum uses 271 kpsi at 0.100 in and 261 kpsi at 0.125 in, and says so (source: ASTM A228 tensile requirements, as printed in music-wire distributors' data sheets)", async () => {
    const j = JSON.parse((await cli('analyze', musicWire('strength_basis: minimum\n'), '--json')).stdout);
    expect(j.material.strength_basis).toBe('minimum');
    expect(j.material.strength_source).toMatch(/ASTM A228/);
    expect(j.material.tensile_strength / KPSI).toBeCloseTo(271, 6);
    expect(j.material.allowable_stress / KPSI).toBeCloseTo(0.45 * 271, 6); // Shigley Table 10-6, 45% for music wire
    expect(j.material.law_above_minimum).toBeUndefined();
    const big = inputFile(
      `units: us\nmaterial: music-wire\nwire_diameter: 0.125\nmean_diameter: 1\nactive_coils: 8\nfree_length: 3\nlengths: [2.5]\nstrength_basis: minimum\n`,
    );
    expect(JSON.parse((await cli('analyze', big, '--json')).stdout).material.tensile_strength / KPSI).toBeCloseTo(261, 6);
    const text = (await cli('analyze', musicWire('strength_basis: minimum\n'))).stdout;
    expect(text).toMatch(/tensile strength: tabulated minimum \(strength_basis: minimum\), ASTM A228/);
  });

  it('EN 10270-1 DM: its law already is the lower bound of the tensile range, so both bases give 1630 MPa at 3 mm (source: EN 10270-1 as tabulated by European spring makers)', async () => {
    const f = (extra: string) =>
      inputFile(`units: si\nmaterial: en10270-1-dm\nwire_diameter: 3\nmean_diameter: 24\nactive_coils: 8\nfree_length: 70\nlengths: [60]\n${extra}`);
    for (const extra of ['', 'strength_basis: minimum\n']) {
      expect(JSON.parse((await cli('analyze', f(extra), '--json')).stdout).material.tensile_strength).toBeCloseTo(1630, 9);
    }
  });

  it('a material with no tabulated minimum is an input error naming strength_basis and the materials that have one', async () => {
    const r = await cli(
      'analyze',
      inputFile(
        `units: si\nmaterial: hard-drawn\nwire_diameter: 2\nmean_diameter: 16\nactive_coils: 8\nfree_length: 50\nlengths: [40]\nstrength_basis: minimum\n`,
      ),
    );
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/strength_basis: expected "law" for hard-drawn.*music-wire, en10270-1-dm/);
    expect(r.stderr).not.toMatch(/at .*\.ts:\d+/);
    const bad = await cli('analyze', musicWire('strength_basis: nominal\n'));
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/strength_basis/);
  });

  it('a design on the minimum basis uses, prints and re-verifies the A228 minimum for every spring it reports', async () => {
    const req = inputFile(`units: si
material: music-wire
strength_basis: minimum
ends: squared-ground
load: { force: 40, length: 30 }
operating_length: 22
operating_force: 70
load_tolerance: 10%
envelope: { max_outer_diameter: 20, max_free_length: 60 }
cycles: 1e6
top: 5
`);
    const r = await cli('design', req, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.requirements.strength_basis).toBe('minimum');
    expect(j.requirements.strength_sources['music-wire']).toMatch(/ASTM A228/);
    expect(j.candidates.length).toBeGreaterThan(0);
    const { loadCatalog, findMaterial } = await import('../../src/catalogs/load.js');
    const { tensileStrength } = await import('../../src/catalogs/properties.js');
    const m = findMaterial(loadCatalog(), 'music-wire')!;
    for (const s of j.candidates) {
      expect(s.strength_source).toMatch(/ASTM A228/);
      expect(s.tensile_strength).toBeCloseTo(tensileStrength({ ...m, strength: m.minimumStrength!.law }, s.wire_diameter), 9);
      expect(s.tensile_strength).toBeLessThan(tensileStrength(m, s.wire_diameter));
    }
    expect((await cli('design', req)).stdout).toMatch(/tensile strength: tabulated minimum \(strength_basis: minimum\); music-wire: ASTM A228/);
  });
});
