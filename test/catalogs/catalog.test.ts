import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { catalogDirectory, findMaterial, findSeries, loadCatalog, parseMaterials, parseSeries } from '../../src/catalogs/load.js';
import { moduliAt, tensileStrength } from '../../src/catalogs/properties.js';

const catalog = loadCatalog();
const material = (id: string) => findMaterial(catalog, id)!;
const IN = 25.4;
const KPSI = 6.894757293168361;

describe('material catalog', () => {
  it('holds the materials a spring designer expects, each with a source on every record', () => {
    for (const id of ['music-wire', 'hard-drawn', 'oil-tempered', 'chrome-vanadium', 'chrome-silicon', 'stainless-302', 'stainless-17-7ph', 'phosphor-bronze', 'beryllium-copper', 'en10270-1-dm']) {
      const m = material(id);
      expect(m, id).toBeDefined();
      for (const s of [m.source, m.strength.source, m.moduli.source, m.density.source, m.allowable.source, m.fatigue.source, m.maxTemperature.source, m.relativeCost.source]) {
        expect(s.length, id).toBeGreaterThan(3);
      }
    }
  });

  it('music wire follows ASTM A228 minimum tensile strengths: the power law runs 1% above at 0.010 in and up to 7% above at 0.250 in (source: ASTM A228 values in music-wire suppliers\' data sheets; Shigley Table 10-4)', () => {
    const a228: [number, number][] = [[0.010, 387], [0.020, 350], [0.040, 315], [0.063, 293], [0.100, 271], [0.125, 261], [0.250, 230]];
    for (const [dIn, kpsi] of a228) {
      const ratio = tensileStrength(material('music-wire'), dIn * IN) / (kpsi * KPSI);
      expect(ratio).toBeGreaterThan(0.99);
      expect(ratio).toBeLessThan(1.075);
    }
  });

  it('the SI and US columns of Table 10-4 agree within 0.2% (source: Shigley Table 10-4, A = 2211 MPa mm^m vs 201 kpsi in^m)', () => {
    for (const dIn of [0.01, 0.05, 0.2]) {
      const us = (201 / Math.pow(dIn, 0.145)) * KPSI;
      expect(Math.abs(tensileStrength(material('music-wire'), dIn * IN) / us - 1)).toBeLessThan(0.002);
    }
  });

  it('Example values: music wire 0.092 in has Sut 284 kpsi, hard-drawn 0.080 in 226 kpsi (source: Shigley 9th ed., Examples 10-4 and 10-2, from memory)', () => {
    expect(tensileStrength(material('music-wire'), 0.092 * IN) / KPSI).toBeCloseTo(284, -0.3);
    expect(tensileStrength(material('hard-drawn'), 0.080 * IN) / KPSI).toBeCloseTo(226.2, -0.3);
  });

  it('EN 10270-1 grade DM takes the lower bound of the tensile range at tabulated sizes (source: EN 10270-1, as tabulated by European spring makers)', () => {
    const dm = material('en10270-1-dm');
    expect(tensileStrength(dm, 1.0)).toBeCloseTo(1980, 6);
    expect(tensileStrength(dm, 3.0)).toBeCloseTo(1630, 6);
    expect(tensileStrength(dm, 10)).toBeCloseTo(1240, 6);
    const between = tensileStrength(dm, 3.5);
    expect(between).toBeLessThan(1630);
    expect(between).toBeGreaterThan(1530);
  });

  it('stainless 302 switches strength law at 2.5 and 5 mm (source: Shigley Table 10-4)', () => {
    const ss = material('stainless-302');
    expect(tensileStrength(ss, 1)).toBeCloseTo(1867, 6);
    expect(tensileStrength(ss, 3)).toBeCloseTo(2065 / Math.pow(3, 0.263), 6);
    expect(tensileStrength(ss, 8)).toBeCloseTo(2911 / Math.pow(8, 0.478), 6);
  });

  it('music-wire moduli change by diameter band: G 12.0 / 11.85 / 11.75 / 11.6 Mpsi (source: Shigley Table 10-5)', () => {
    const mw = material('music-wire');
    expect(moduliAt(mw, 0.020 * IN).shearModulus / (KPSI * 1000)).toBeCloseTo(12.0, 6);
    expect(moduliAt(mw, 0.037 * IN).shearModulus / (KPSI * 1000)).toBeCloseTo(11.85, 6);
    expect(moduliAt(mw, 0.092 * IN).shearModulus / (KPSI * 1000)).toBeCloseTo(11.75, 6);
    expect(moduliAt(mw, 0.2 * IN).elasticModulus / (KPSI * 1000)).toBeCloseTo(28.0, 6);
  });

  it('EN 10270-1 steel: E 206 GPa, G 81.5 GPa, 7850 kg/m^3 (source: EN 10270-1 / EN 13906-1)', () => {
    const dm = material('en10270-1-dm');
    expect(moduliAt(dm, 2).elasticModulus).toBeCloseTo(206000, 6);
    expect(moduliAt(dm, 2).shearModulus).toBeCloseTo(81500, 6);
    expect(dm.density.value).toBe(7850);
  });
});

describe('wire-size series', () => {
  it('steel wire gauge: no. 10 is 0.1350 in, no. 7/0 0.4900 in, no. 30 0.0140 in (source: US Steel Wire Gauge, Washburn and Moen)', () => {
    const g = findSeries(catalog, 'steel-wire-gauge')!;
    const at = (label: string) => g.diameters[g.labels!.indexOf(label)] / IN;
    expect(at('10')).toBeCloseTo(0.135, 6);
    expect(at('7/0')).toBeCloseTo(0.49, 6);
    expect(at('30')).toBeCloseTo(0.014, 6);
  });

  it('series are ascending and in mm', () => {
    const mw = findSeries(catalog, 'music-wire-inch')!;
    expect(mw.diameters[0]).toBeCloseTo(0.004 * IN, 9);
    for (const s of catalog.series) for (let i = 1; i < s.diameters.length; i++) expect(s.diameters[i]).toBeGreaterThan(s.diameters[i - 1]);
    expect(findSeries(catalog, 'metric')!.diameters).toContain(1.6);
  });
});

describe('catalog loader rejects malformed records, naming file, record and field', () => {
  const doc = () => parse(readFileSync(join(catalogDirectory(), 'materials.yaml'), 'utf8'));
  it('a record without a source', () => {
    const d = doc();
    delete d.materials[1].source;
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/materials\.yaml: record hard-drawn: source: expected the publication/);
  });
  it('an unknown family', () => {
    const d = doc();
    d.materials[0].family = 'unobtainium';
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/record music-wire: family: expected one of carbon-steel/);
  });
  it('a modulus given as a length', () => {
    const d = doc();
    d.materials[2].moduli.bands[0].shear_modulus = '11 mm';
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/record oil-tempered: moduli\.bands\[0\]\.shear_modulus: expected a stress/);
  });
  it('a misspelt field', () => {
    const d = doc();
    d.materials[0].densty = 7800;
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/record music-wire: densty: no such field/);
  });
  it('a wire series out of order', () => {
    expect(() => parseSeries({ series: [{ id: 'x', unit: 'mm', source: 's', diameters: [1, 0.5] }] }, 'wire-series.yaml')).toThrow(/wire-series\.yaml: record x: diameters\[1\]: expected diameters in ascending order/);
  });
});
