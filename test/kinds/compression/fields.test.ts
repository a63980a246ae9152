// source: none needed; the figures the ranked table, JSON and CSV add (issue 9, readable figures) are
// checked against coilfront's own single-spring analysis and its buckling check. 1 psi = 0.006894757293168361 MPa
// (1 lbf / 1 in^2, exact by the definitions of the inch and the pound-force).
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readRequirements } from '../../../src/kinds/compression/requirements.js';
import { runDesign } from '../../../src/kinds/compression/design.js';
import { CHECK } from '../../../src/kinds/compression/verify.js';
import { bucklingMargin, COMPRESSION_TABLE_FIELDS } from '../../../src/kinds/compression/fields.js';
import { candidateGrid, candidateRecord } from '../../../src/kinds/compression/report/designReport.js';
import { fieldGrid } from '../../../src/report/fields.js';
import { formatQuantity, sig } from '../../../src/units/format.js';

const catalog = loadCatalog();
// A long return spring on pivoted ends with a long stroke: it buckles unless guided (guided: true).
const slender = (extra = '') =>
  readRequirements(
    parse(`units: si
material: music-wire
seating: pivoted-pivoted
load: { force: 10, length: 80 }
operating_length: 40
operating_force: 30
envelope: { max_outer_diameter: 14 }
${extra}`),
    catalog,
  );
const demo = readRequirements(parse(readFileSync('examples/washer-trigger.yaml', 'utf8')), catalog);

describe('buckling margin', () => {
  const guided = runDesign(slender('guided: true'));
  const c = guided.candidates.find((x) => !x.analysis.buckling.absolutelyStable)!;
  // The same spring judged unguided: the buckling check as verify.ts writes it when it is on.
  const b = c.analysis.buckling;
  const checks = Float64Array.from(c.checks);
  checks[CHECK.buckling] = (b.maxDeflection - b.criticalDeflection) / b.maxDeflection;
  const unguided = { ...c, checks };

  it('is the buckling check turned round: (critical - largest deflection) / largest deflection', () => {
    expect(c).toBeDefined();
    const m = bucklingMargin(unguided)!;
    expect(m).toBeCloseTo((b.criticalDeflection - b.maxDeflection) / b.maxDeflection, 12);
    expect(m).toBe(-checks[CHECK.buckling]);
    expect(candidateRecord(unguided).buckling_margin).toBe(m);
    const g = candidateGrid([unguided], 'si');
    expect(g.rows[0][g.header.indexOf('buckling')]).toBe(`${sig(m * 100, 3)}%`);
  });

  it('is null and reads "guided" where the spring is guided (the check is off)', () => {
    expect(bucklingMargin(c)).toBeNull();
    expect(candidateRecord(c).buckling_margin).toBeNull();
    const g = candidateGrid([c], 'si');
    expect(g.rows[0][g.header.indexOf('buckling')]).toBe('guided');
  });

  it('is null and reads "stable" for an absolutely stable spring (the demo)', () => {
    const s = runDesign(demo).candidates[0];
    expect(s.analysis.buckling.absolutelyStable).toBe(true);
    expect(bucklingMargin(s)).toBeNull();
    const g = candidateGrid([s], 'si');
    expect(g.rows[0][g.header.indexOf('buckling')]).toBe('stable');
  });
});

describe('readable figures in the ranked table', () => {
  const run = runDesign(demo);
  it('masses under 1 kg in grams (SI), the JSON in kg', () => {
    const g = candidateGrid(run.candidates, 'si');
    const col = g.header.indexOf('mass g');
    expect(col).toBeGreaterThan(0);
    expect(Number(g.rows[0][col])).toBeCloseTo(run.candidates[0].analysis.geometry.mass * 1000, 1);
    expect(candidateRecord(run.candidates[0]).mass).toBe(run.candidates[0].analysis.geometry.mass);
  });

  it('stresses in kpsi (US), the spring index C as D/d', () => {
    const g = fieldGrid(COMPRESSION_TABLE_FIELDS, run.candidates, 'us');
    const tau = g.header.indexOf('tau max kpsi');
    expect(tau).toBeGreaterThan(0);
    const c = run.candidates[0];
    const psi = Math.max(...c.analysis.points.map((p) => p.stress)) / 0.006894757293168361;
    expect(Number(g.rows[0][tau])).toBeCloseTo(psi / 1000, 1);
    expect(Number(g.rows[0][g.header.indexOf('C')])).toBeCloseTo(c.geometry.meanDiameter / c.geometry.wireDiameter, 1);
  });

  it('a table of springs of 1 kg and more keeps kg', () => {
    const heavy = run.candidates.map((c) => ({ ...c, analysis: { ...c.analysis, geometry: { ...c.analysis.geometry, mass: 1.5 } } }));
    expect(candidateGrid(heavy, 'si').header).toContain('mass kg');
  });
});

describe('readable figures in text', () => {
  it('grams under 1 kg, kg from 1 kg (SI); kpsi for stresses and Mpsi for moduli (US)', () => {
    expect(formatQuantity(0.00563, 'mass', 'si')).toBe('5.630 g');
    expect(formatQuantity(1.5, 'mass', 'si')).toBe('1.500 kg');
    expect(formatQuantity(506.1, 'stress', 'us')).toBe('73.40 kpsi');
    // 79.3 GPa is 11.5 Mpsi (the usual shear modulus of spring steel, common practice; 1 psi = 1 lbf/in^2 exactly).
    expect(formatQuantity(79300, 'stress', 'us')).toBe('11.50 Mpsi');
    expect(formatQuantity(506.1, 'stress', 'si')).toBe('506.1 MPa');
  });
});
