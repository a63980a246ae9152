// source: none needed (properties of our own pages on our own demo scenario).
// The extension spring's specification sheet in a real browser (Debian's Chromium driven by
// playwright-core), as test/report/specSheet.browser.test.ts does for compression springs: self-contained,
// no network request, no console error, every item a maker quotes from shown, the side view drawn with
// both loops and its dimensions, and one printed page on A4 and on Letter. Screenshots go to test-output/.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { OUT, openFile, pdfPages, useChromium } from '../../browser.js';
import { cli } from '../../helpers.js';

const DEMO = 'examples/extension-pedal-bin.yaml';
const SPRING = 'examples/extension-pedal-bin-spring.yaml';
const browser = useChromium();

const ITEMS = [
  'ASTM A228',
  'wire diameter d',
  'outer diameter OD',
  'DIN 2097 grade 2',
  'free length L0',
  'body coils Nb',
  'active coils Na',
  'loop type',
  'loop orientation',
  'loop height h',
  'loop radius r1',
  'bend radius r2',
  'initial tension Fi',
  'working force F1',
  'operating force F2',
  'rate k',
  'largest pull before a set',
  'maximum extended length',
  'static safety factor',
  'fatigue safety factor',
  'load cycles',
  'finish',
  'to be agreed with the spring maker',
  'verify material figures',
  'draw-bar',
];

async function sheetInChromium(args: string[], name: string, units: 'si' | 'us') {
  const file = join(OUT, `${name}.html`);
  rmSync(file, { force: true });
  const r = await cli(...args, '--spec', file, '--units', units);
  expect(r.code, r.stderr).toBe(0);
  const html = readFileSync(file, 'utf8');
  expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
  expect(html).not.toMatch(/NaN|Infinity|undefined/);
  const { page, errors, requests } = await openFile(browser(), file, { width: 1000, height: 1300 });
  expect(errors).toEqual([]);
  expect(requests).toEqual([]);
  const text = (await page.textContent('body')) ?? '';
  for (const item of ITEMS) expect(text, item).toContain(item);
  const view = await page.$eval('#spec-view', (svg) => ({
    w: svg.getBoundingClientRect().width,
    h: svg.getBoundingClientRect().height,
    loops: Array.from(svg.querySelectorAll('ellipse.loop')).map((e) => e.getBoundingClientRect().width),
    sections: svg.querySelectorAll('.section circle').length,
    bodyCoils: Number((svg as SVGSVGElement).dataset.bodyCoils),
    labels: Array.from(svg.querySelectorAll('text')).map((t) => t.textContent ?? ''),
  }));
  expect(view.w).toBeGreaterThan(200);
  expect(view.h).toBeGreaterThan(80);
  expect(view.loops).toHaveLength(2);
  for (const w of view.loops) expect(w).toBeGreaterThan(5);
  expect(view.sections).toBeGreaterThan(2 * Math.floor(view.bodyCoils));
  const labels = view.labels.join(' | ');
  expect(labels).toMatch(/L0 inside the loops [\d.]+ (mm|in) ± /);
  expect(labels).toMatch(/OD [\d.]+ (mm|in) ± /);
  expect(labels).toMatch(/loop height [\d.]+ (mm|in)/);
  await page.screenshot({ path: join(OUT, `${name}.png`), fullPage: true });
  await page.emulateMedia({ media: 'print' });
  await page.setViewportSize({ width: 794, height: 1123 });
  await page.screenshot({ path: join(OUT, `${name}-print.png`), fullPage: true });
  for (const format of ['A4', 'Letter'] as const) {
    const pdf = await page.pdf({ format, printBackground: true });
    expect(pdfPages(pdf), `${name} ${format}`).toBe(1);
  }
  await page.close();
}

describe('extension specification sheet in headless Chromium', () => {
  for (const units of ['si', 'us'] as const) {
    it(`(${units}) design --spec: loads offline, carries every item a maker quotes from, draws both loops, prints on one page of A4 and of Letter`, async () => {
      await sheetInChromium(['design', DEMO], `extension-spec-sheet-${units}`, units);
    }, 60_000);
  }

  it('analyze --spec of the example spring file: the same, on one page', async () => {
    await sheetInChromium(['analyze', SPRING], 'extension-spec-sheet-analyze', 'si');
  }, 60_000);
});
