// source: none needed (properties of our own pages on our own demo scenarios).
// Each check is a property of our own output (no outside values): the specification sheet of the
// demo's best spring in a real browser (Debian's Chromium driven by playwright-core): self-contained,
// no network request, no console error, every item a maker quotes from present, and one printed page
// on A4 and on Letter.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { loadCatalog } from '../../src/catalogs/load.js';
import { readRequirements } from '../../src/kinds/compression/requirements.js';
import { specSheetHtml } from '../../src/kinds/compression/report/specSheet.js';
import { runDesign } from '../../src/kinds/compression/design.js';
import { loadToleranceCatalog } from '../../src/kinds/compression/tolerance/catalog.js';
import { specifySpring } from '../../src/kinds/compression/tolerance/specify.js';
import { OUT, openFile, pdfPages, useChromium } from '../browser.js';

const browser = useChromium();

function demoSheet(units: 'si' | 'us', extra: Record<string, unknown> = {}) {
  const raw = { ...(parse(readFileSync('examples/washer-trigger.yaml', 'utf8')) as Record<string, unknown>), units: 'si', ...extra };
  const req = readRequirements(raw, loadCatalog());
  const shown = { ...req, system: units };
  const best = runDesign(req).candidates[0];
  const spec = specifySpring(
    loadToleranceCatalog(),
    { grade: 2, overrides: {} },
    { geometry: best.geometry, figures: best.item.figures, material: best.item.choice.material },
    shown,
    { samples: 2000 },
  );
  return { html: specSheetHtml({ ...spec.sheet, part: 'trigger return spring (demo, invented)', coilingDirection: 'right' }), spec, req };
}

describe('specification sheet in headless Chromium', () => {
  for (const units of ['si', 'us'] as const) {
    it(`(${units}) loads offline, carries every item a maker quotes from, and prints on one page of A4 and of Letter`, async () => {
      const { html, spec } = demoSheet(units);
      expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
      expect(html).not.toMatch(/NaN|Infinity|undefined/);
      const file = join(OUT, `spec-sheet-${units}.html`);
      writeFileSync(file, html);
      const { page, errors, requests } = await openFile(browser(), file, { width: 1000, height: 1300 });
      expect(errors).toEqual([]);
      expect(requests).toEqual([]);
      const text = (await page.textContent('body')) ?? '';
      for (const item of [
        'ASTM A313',
        'wire diameter',
        'outer diameter OD (controlled)',
        'EN 15800 grade 2',
        'free length L0',
        'reference',
        'total / active coils',
        'ends',
        'coiling direction',
        'right hand',
        'working force F1',
        'operating force F2',
        'largest solid length',
        'set removal',
        'shot peening',
        'finish',
        'temperature',
        'load cycles',
        'yield (estimate)',
        'yield (Monte Carlo)',
        'EN 13906-1',
        'verify material figures',
      ]) {
        expect(text, item).toContain(item);
      }
      const g = spec.drawn.geometry;
      const od =
        units === 'si'
          ? `${(g.meanDiameter + g.wireDiameter).toFixed(2)} mm ± ${spec.yield.tolerances.meanDiameter.halfWidth.toFixed(3)} mm`
          : `${((g.meanDiameter + g.wireDiameter) / 25.4).toFixed(3)} in ± ${(spec.yield.tolerances.meanDiameter.halfWidth / 25.4).toFixed(4)} in`;
      expect(text).toContain(od);
      const view = await page.$eval('#spec-view', (svg) => ({
        w: svg.getBoundingClientRect().width,
        h: svg.getBoundingClientRect().height,
        marks: svg.querySelectorAll('circle, line').length,
        labels: Array.from(svg.querySelectorAll('text')).map((t) => t.textContent),
      }));
      expect(view.w).toBeGreaterThan(200);
      expect(view.h).toBeGreaterThan(100);
      expect(view.marks).toBeGreaterThan(2 * g.activeCoils);
      expect(view.labels.join(' ')).toMatch(/L0 .* reference/);
      expect(view.labels.join(' ')).toMatch(/OD .* ±/);
      await page.screenshot({ path: join(OUT, `spec-sheet-${units}.png`), fullPage: true });
      await page.emulateMedia({ media: 'print' });
      await page.setViewportSize({ width: 794, height: 1123 });
      await page.screenshot({ path: join(OUT, `spec-sheet-${units}-print.png`), fullPage: true });
      for (const format of ['A4', 'Letter'] as const) {
        const pdf = await page.pdf({ format, printBackground: true });
        expect(pdfPages(pdf), `${units} ${format}`).toBe(1);
      }
      await page.close();
    }, 60_000);
  }

  it('dimensions the inner diameter when the spring works over a rod and no bore is given', async () => {
    const { html } = demoSheet('si', { envelope: { min_inner_diameter: 6.5, max_free_length: 60 } });
    expect(html).toContain('inner diameter ID (controlled)');
    expect(html).toContain('works over a rod of 6.50 mm');
    expect(html).toMatch(/>ID [\d.]+ mm ± /);
  }, 60_000);

  it('gives the same bytes for the same input', () => {
    expect(demoSheet('si').html).toBe(demoSheet('si').html);
  }, 60_000);
});
