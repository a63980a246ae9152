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

describe('catalog values checked against public copies of the tables', () => {
  it('Table 10-4 diameter ranges: hard-drawn and oil-tempered 0.028/0.020 to 0.500 in (12.7 mm), chrome-vanadium to 0.437 in (11.1 mm), chrome-silicon 1.6 to 9.5 mm (source: Shigley 9th ed., Table 10-4)', () => {
    expect(material('hard-drawn').maxDiameter).toBe(12.7);
    expect(material('oil-tempered').maxDiameter).toBe(12.7);
    expect(material('oil-tempered').minDiameter).toBe(0.5);
    expect(material('chrome-vanadium').maxDiameter).toBe(11.1);
    expect(material('chrome-silicon').minDiameter).toBe(1.6);
    expect(material('chrome-silicon').maxDiameter).toBe(9.5);
  });

  it('oil-tempered wire is not for use above 180 degC (source: Shigley 9th ed., table of high-carbon and alloy spring steels)', () => {
    expect(material('oil-tempered').maxTemperature.value).toBe(180);
    expect(material('oil-tempered').maxTemperature.source).toMatch(/Shigley/);
  });

  it('moduli of chrome-silicon 29.5/11.2, 302 28.0/10.0, 17-7 PH 29.5/11.0, phosphor bronze 15.0/6.0, beryllium copper 17.0/6.5 Mpsi (source: Shigley 9th ed., Table 10-5)', () => {
    const mpsi = KPSI * 1000;
    const cases: [string, number, number][] = [['chrome-silicon', 29.5, 11.2], ['stainless-302', 28.0, 10.0], ['stainless-17-7ph', 29.5, 11.0], ['phosphor-bronze', 15.0, 6.0], ['beryllium-copper', 17.0, 6.5]];
    for (const [id, e, g] of cases) {
      expect(moduliAt(material(id), 2).elasticModulus / mpsi, id).toBeCloseTo(e, 6);
      expect(moduliAt(material(id), 2).shearModulus / mpsi, id).toBeCloseTo(g, 6);
      expect(material(id).moduli.source, id).toMatch(/Table 10-5/);
    }
  });

  it('densities 0.284 / 0.286 / 0.282 / 0.320 / 0.298 lb/in^3 (source: spring-materials tables of spring makers\' handbooks)', () => {
    const lbIn3 = 27679.9047; // kg/m^3 per lb/in^3
    const cases: [string, number][] = [['music-wire', 0.284], ['stainless-302', 0.286], ['stainless-17-7ph', 0.282], ['phosphor-bronze', 0.32], ['beryllium-copper', 0.298]];
    for (const [id, v] of cases) expect(material(id).density.value / lbIn3, id).toBeCloseTo(v, 6);
  });

  it('finite-life fractions 36/33/30, peened 42/39/36, and 42/40/38, peened 49/47/46, credited to the Associated Spring handbook table, not Shigley Table 10-8 (source: Associated Spring design handbook as reprinted in earlier machine-design texts, from memory)', () => {
    expect(material('music-wire').fatigue.table).toEqual({ unpeened: [0.36, 0.33, 0.30], peened: [0.42, 0.39, 0.36] });
    expect(material('chrome-vanadium').fatigue.table).toEqual({ unpeened: [0.42, 0.40, 0.38], peened: [0.49, 0.47, 0.46] });
    for (const m of catalog.materials) {
      expect(m.fatigue.source, m.id).toMatch(/Associated Spring/);
      expect(m.fatigue.source, m.id).toMatch(/from memory/);
      expect(m.fatigue.source.replace(/not Shigley[^)]*/, ''), m.id).not.toMatch(/10-8/);
    }
  });

  it('Zimmerli\'s data (spring steels) are not applied to austenitic stainless or copper alloys (source: Zimmerli 1957, tests on spring steels)', () => {
    for (const id of ['stainless-302', 'phosphor-bronze', 'beryllium-copper']) expect(material(id).fatigue.zimmerli, id).toBe(false);
    for (const id of ['music-wire', 'hard-drawn', 'oil-tempered', 'chrome-vanadium', 'chrome-silicon', 'en10270-1-dm']) expect(material(id).fatigue.zimmerli, id).toBe(true);
  });

  it('ASTM A228 tabulated minimums: 0.004 in 439, 0.036 in 321, 0.063 in 293, 0.100 in 271, 0.250 in 230 kpsi (source: ASTM A228 tensile requirements, as printed in music-wire distributors\' data sheets)', () => {
    const min = material('music-wire').minimumStrength!;
    expect(min.law.law).toBe('table');
    const at = (dIn: number) => { const l = min.law as { diameters: number[]; strengths: number[] }; return l.strengths[l.diameters.findIndex((d) => Math.abs(d - dIn * IN) < 1e-9)] / KPSI; };
    expect(at(0.004)).toBeCloseTo(439, 6);
    expect(at(0.036)).toBeCloseTo(321, 6);
    expect(at(0.063)).toBeCloseTo(293, 6);
    expect(at(0.100)).toBeCloseTo(271, 6);
    expect(at(0.250)).toBeCloseTo(230, 6);
    // Every A228 size of the inch series has its own tabulated minimum.
    const sizes = findSeries(catalog, 'music-wire-inch')!.diameters;
    expect((min.law as { diameters: number[] }).diameters).toEqual(sizes);
  });

  it('the music-wire power law runs 2% above the A228 minimum at 1.6 mm, 3.4% at 2.5 mm (0.100 in) and 6.6% at 6.35 mm (sources: Shigley Table 10-4; ASTM A228 as in distributors\' tables)', () => {
    const mw = material('music-wire');
    expect(tensileStrength(mw, 0.063 * IN) / (293 * KPSI) - 1).toBeCloseTo(0.022, 2);
    expect(tensileStrength(mw, 0.100 * IN) / (271 * KPSI) - 1).toBeCloseTo(0.034, 2);
    expect(tensileStrength(mw, 0.250 * IN) / (230 * KPSI) - 1).toBeCloseTo(0.066, 2);
  });
});

describe('wire-size series', () => {
  it('steel wire gauge no. 21 is 0.0317 in (source: US Steel Wire Gauge, Washburn and Moen, as reprinted in spring handbooks)', () => {
    const g = findSeries(catalog, 'steel-wire-gauge')!;
    expect(g.diameters[g.labels!.indexOf('21')] / IN).toBeCloseTo(0.0317, 6);
  });

  it('the metric series is the preferred wire diameters table, 0.10 to 16 mm, 44 sizes (source: Saxena and Sahay, Computer Aided Engineering Design, Table 1.1(b))', () => {
    const m = findSeries(catalog, 'metric')!;
    expect(m.source).toMatch(/Saxena and Sahay/);
    expect(m.diameters.length).toBe(44);
    expect(m.diameters[0]).toBe(0.1);
    expect(m.diameters[m.diameters.length - 1]).toBe(16);
  });

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
  it('a finite-life table that rises with cycles (a longer life would be easier)', () => {
    const d = doc();
    d.fatigue_classes[0].peened = [0.42, 0.43, 0.36];
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/fatigue_classes\[0\]: fatigue_classes\[0\]\.peened\[1\]: expected a fraction at most the one for fewer cycles/);
  });
  it('a separate minimum table where the law already is the minimum', () => {
    const d = doc();
    const dm = d.materials.find((m: { id: string }) => m.id === 'en10270-1-dm');
    dm.minimum_strength = d.materials[0].minimum_strength;
    expect(() => parseMaterials(d, 'materials.yaml')).toThrow(/record en10270-1-dm: minimum_strength: expected no separate table when strength\.minimum is true/);
  });
  it('a wire series out of order', () => {
    expect(() => parseSeries({ series: [{ id: 'x', unit: 'mm', source: 's', diameters: [1, 0.5] }] }, 'wire-series.yaml')).toThrow(/wire-series\.yaml: record x: diameters\[1\]: expected diameters in ascending order/);
  });
});
