// The outputs of extension springs: text, JSON (SI, snake_case, null where a figure does not apply),
// CSV rows and the HTML sections, all read from the analysis the search re-verified. Properties of our
// own output, no outside values (the figures themselves are checked in analysis.test.ts): source: none needed.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { analyzeExtension } from '../../../src/kinds/extension/analysis.js';
import { designExtension } from '../../../src/kinds/extension/design.js';
import { EXTENSION_FIELDS, extensionColumns, extensionRow } from '../../../src/kinds/extension/fields.js';
import { computeExtensionFrontier, extensionReportFrontier } from '../../../src/kinds/extension/frontier.js';
import { extensionAnalysisHtml, extensionDesignHtml, extensionForcePlot } from '../../../src/kinds/extension/html.js';
import { extensionAnalysisJson, extensionAnalysisText, extensionDesignJson, extensionDesignText } from '../../../src/kinds/extension/report.js';
import { readExtensionRequirements } from '../../../src/kinds/extension/requirements.js';
import { readExtensionSpring } from '../../../src/kinds/extension/springFile.js';
import { toJson } from '../../../src/report/json.js';

const catalog = loadCatalog();
const demo = parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8'));
const run = designExtension(readExtensionRequirements(demo, catalog), catalog);
const spring = readExtensionSpring(
  { kind: 'extension', material: 'music-wire', wire_diameter: 1.2, mean_diameter: 8, body_coils: 20, initial_tension: 6, lengths: [45, 55] },
  catalog,
);
const analysis = analyzeExtension(spring.geometry, spring.material, spring.service);

/** Every leaf of a JSON value (no NaN, Infinity or undefined can survive JSON.parse of our output). */
function leaves(v: unknown, path = ''): [string, unknown][] {
  if (Array.isArray(v)) return v.flatMap((x, i) => leaves(x, `${path}[${i}]`));
  if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => leaves(x, path ? `${path}.${k}` : k));
  return [[path, v]];
}

describe('extension outputs', () => {
  it('the demo finds springs (the README shows them)', () => {
    expect(run.candidates.length).toBeGreaterThan(0);
  });

  it('JSON keys are snake_case and every value is finite, a string, a boolean or null', () => {
    for (const doc of [extensionAnalysisJson(spring, analysis), extensionDesignJson(run)]) {
      const text = toJson(doc);
      expect(text).not.toMatch(/NaN|Infinity|undefined/);
      for (const [path, v] of leaves(JSON.parse(text))) {
        expect(
          path
            .split('.')
            .pop()!
            .replace(/\[\d+\]/g, ''),
          path,
        ).toMatch(/^[a-z0-9_]+$/);
        expect(['number', 'string', 'boolean'].includes(typeof v) || v === null, path).toBe(true);
      }
    }
  });

  it('a figure that does not apply is null, not missing: static service has no fatigue', () => {
    const j = JSON.parse(toJson(extensionAnalysisJson(spring, analysis)));
    expect(j.fatigue).toBeNull();
    expect(j.safety_factors.fatigue).toBeNull();
    expect(j.kind).toBe('extension');
    expect(j.initial_tension.force).toBeCloseTo(6, 12);
  });

  it('the text names the initial tension, the three stresses and the extension caution, in the unit system asked', () => {
    const si = extensionAnalysisText(spring, analysis, 'si');
    expect(si).toMatch(/initial tension Fi\s+6\.000 N/);
    expect(si).toMatch(/loop bending \(A\)/);
    expect(si).toMatch(/draw-bar/);
    const us = extensionAnalysisText(spring, analysis, 'us');
    expect(us).toMatch(/initial tension Fi\s+1\.349 lbf/);
    // Notes on how the file was read keep the file's own units; every figure is in the system asked.
    expect(
      us
        .split('\n')
        .filter((l) => !l.startsWith('  ! '))
        .join('\n'),
    ).not.toMatch(/\bMPa\b|\bmm\b/);
    const d = extensionDesignText(run, 'si');
    expect(d).toMatch(/Fi band/);
    expect(d).toMatch(/draw-bar/);
  });

  it('CSV rows have one value per column and no non-finite number', () => {
    const cols = extensionColumns('us');
    expect(cols).toContain('initial_tension_lbf');
    for (const c of run.candidates) {
      const row = extensionRow(c, 'us');
      expect(row.length).toBe(EXTENSION_FIELDS.length);
      for (const v of row) expect(typeof v !== 'number' || Number.isFinite(v)).toBe(true);
    }
  });

  it('the force-length line starts at the initial tension, above zero, at the free length', () => {
    const svg = extensionForcePlot(analysis, 'si');
    const m = /id="force-line"[^>]*data-start-force="([^"]+)"[^>]*points="([\d.]+),([\d.]+) /.exec(svg)!;
    expect(Number(m[1])).toBeGreaterThan(0);
    expect(Number(m[1])).toBe(analysis.initialTension.force);
    // The y axis runs from 0 at the bottom of the frame: the line starts above it.
    const zeroY = /<text x="[\d.]+" y="([\d.]+)" text-anchor="end">0<\/text>/.exec(svg)!;
    expect(Number(m[3])).toBeLessThan(Number(zeroY[1]) - 4 - 1);
  });

  it('the HTML pages hold the loop stresses, both loops and the caution', () => {
    for (const html of [extensionAnalysisHtml(spring, analysis, 'si'), extensionDesignHtml(run, 'us', extensionReportFrontier(run, catalog))]) {
      expect(html).toMatch(/id="loop-stresses"/);
      expect(html).toMatch(/id="loop-left"/);
      expect(html).toMatch(/id="loop-right"/);
      expect(html).toMatch(/id="extension-caution"/);
      expect(html).not.toMatch(/NaN|Infinity|undefined/);
    }
  });

  it('the frontier on mass and outer diameter: each point re-verified, none dominated by another', () => {
    const fr = computeExtensionFrontier(run.req, catalog, 'mass', 'outer_diameter', undefined, run.problem);
    expect(fr.front.length).toBeGreaterThan(1);
    for (const a of fr.front)
      for (const b of fr.front) {
        if (a === b) continue;
        const dom =
          b.analysis.geometry.mass <= a.analysis.geometry.mass &&
          b.analysis.geometry.outerDiameter <= a.analysis.geometry.outerDiameter &&
          (b.analysis.geometry.mass < a.analysis.geometry.mass || b.analysis.geometry.outerDiameter < a.analysis.geometry.outerDiameter);
        expect(dom).toBe(false);
      }
    // The lightest spring of the frontier is the design's best.
    expect(Math.min(...fr.front.map((c) => c.analysis.geometry.mass))).toBeCloseTo(run.candidates[0].analysis.geometry.mass, 12);
  });
});
