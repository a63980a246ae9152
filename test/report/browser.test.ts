// source: none needed (properties of our own pages on our own demo scenarios).
// Each check is a property of our own reports (no outside values): the HTML reports end to end in a real browser: Debian's Chromium driven by playwright-core. The
// page must load offline (no network request of any kind), with no console errors, every plot drawn,
// and the marked spring equal to the CLI's best candidate. Screenshots go to test-output/.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { OUT, openFile, useChromium } from '../browser.js';
import { cli } from '../helpers.js';

const browser = useChromium();

const openReport = (path: string) => openFile(browser(), path);

async function geometry(page: import('playwright-core').Page, id: string) {
  return page.$eval(`#${id}`, (svg) => {
    const box = svg.getBoundingClientRect();
    const marks = svg.querySelectorAll('circle, polyline, line').length;
    const longest = Math.max(0, ...Array.from(svg.querySelectorAll('polyline')).map((p) => (p.getAttribute('points') ?? '').split(' ').length));
    return { width: box.width, height: box.height, marks, longest };
  });
}

describe('design report in headless Chromium', () => {
  const file = join(OUT, 'design-report.html');
  it("loads offline with every plot drawn and the CLI's best spring marked", async () => {
    rmSync(file, { force: true });
    const r = await cli('design', 'examples/washer-trigger.yaml', '--report', file);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/report written/);
    const html = readFileSync(file, 'utf8');
    expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
    const best = JSON.parse((await cli('design', 'examples/washer-trigger.yaml', '--json')).stdout).candidates[0];

    const { page, errors, requests } = await openReport(file);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    for (const id of ['plot-cloud', 'plot-force', 'plot-fatigue', 'plot-drawing']) {
      const g = await geometry(page, id);
      expect(g.width, id).toBeGreaterThan(100);
      expect(g.height, id).toBeGreaterThan(100);
      expect(g.marks, id).toBeGreaterThan(3);
    }
    expect((await geometry(page, 'plot-cloud')).longest).toBeGreaterThan(1);
    const chosen = await page.$eval('#chosen-spring', (c) => ({ ...(c as HTMLElement).dataset }));
    expect(chosen.material).toBe(best.material);
    expect(Number(chosen.wire)).toBeCloseTo(best.wire_diameter, 9);
    expect(Number(chosen.meanDiameter)).toBeCloseTo(best.mean_diameter, 9);
    expect(Number(chosen.activeCoils)).toBe(best.active_coils);
    const firstRow = await page.$eval('tr.best', (tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent));
    expect(firstRow[1]).toBe(best.material);
    expect(await page.textContent('body')).toMatch(/verify material figures/);
    await page.screenshot({ path: join(OUT, 'design-report.png'), fullPage: true });
    await page.emulateMedia({ colorScheme: 'dark' });
    await page.screenshot({ path: join(OUT, 'design-report-dark.png') });
    await page.close();
  });

  it('is written atomically and never replaces a file without --force', async () => {
    const again = await cli('design', 'examples/washer-trigger.yaml', '--report', file);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/--report: expected a file that does not exist yet .*--force/);
    expect(again.stdout).toBe('');
    const forced = await cli('design', 'examples/washer-trigger.yaml', '--report', file, '--force');
    expect(forced.code).toBe(0);
  });

  it('a sweep report carries the sweep plot', async () => {
    const sweepFile = join(OUT, 'sweep-report.html');
    rmSync(sweepFile, { force: true });
    const r = await cli('sweep', 'examples/washer-trigger.yaml', '--vary', 'envelope.max_outer_diameter=12:18:1', '--report', sweepFile);
    expect(r.code).toBe(0);
    const { page, errors, requests } = await openReport(sweepFile);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const g = await geometry(page, 'plot-sweep');
    expect(g.marks).toBeGreaterThan(3);
    expect(await page.$$eval('#plot-sweep text.none', (t) => t.length)).toBeGreaterThan(0);
    await page.close();
  });
});

describe('spring report in headless Chromium', () => {
  it('shows the force-length and fatigue diagrams and the drawing with the right coil count', async () => {
    const file = join(OUT, 'spring-report.html');
    rmSync(file, { force: true });
    const r = await cli('analyze', 'examples/valve-return-spring.yaml', '--report', file);
    expect(r.code).toBe(0);
    const { page, errors, requests } = await openReport(file);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    for (const id of ['plot-force', 'plot-fatigue', 'plot-drawing']) expect((await geometry(page, id)).marks, id).toBeGreaterThan(3);
    expect(await page.$eval('#plot-drawing', (s) => s.getAttribute('data-coils'))).toBe('10');
    expect(await page.$$eval('#plot-drawing .section circle', (c) => c.length)).toBe(21);
    await page.screenshot({ path: join(OUT, 'spring-report.png'), fullPage: true });
    await page.close();
  });
});

describe('design report printed', () => {
  // The page less the report's print margins (@page margin 14 mm each side, src/report/html/page.ts), in
  // CSS pixels (96 to the inch): the width a printed table has. A4 210 mm (ISO 216), Letter 8.5 in.
  const printable = { A4: ((210 - 28) / 25.4) * 96, Letter: ((8.5 * 25.4 - 28) / 25.4) * 96 };

  /** The ranked table's right edge and its width against the page's content width, at that width. */
  async function ranked(file: string, width: number, media: 'print' | 'screen') {
    const { page } = await openReport(file);
    await page.setViewportSize({ width: Math.floor(width), height: 1000 });
    await page.emulateMedia({ media });
    const box = await page.$eval('table.ranked', (t) => ({
      width: t.scrollWidth,
      right: t.getBoundingClientRect().right,
      page: document.documentElement.clientWidth,
      cells: t.querySelectorAll('tbody td').length,
    }));
    return { page, box };
  }

  for (const [units, extra] of [
    ['si', []],
    ['us', ['--units', 'us']],
    ['si, every variant', ['--variants']],
  ] as const) {
    it(`(${units}) the ranked table fits the printed width of A4 and of Letter, every column on the page`, async () => {
      const file = join(OUT, `design-report-print-${units.replace(/\W+/g, '-')}.html`);
      rmSync(file, { force: true });
      const r = await cli('design', 'examples/washer-trigger.yaml', ...extra, '--report', file);
      expect(r.code).toBe(0);
      for (const [format, width] of Object.entries(printable)) {
        const { page, box } = await ranked(file, width, 'print');
        expect(box.cells).toBeGreaterThan(10);
        // The yield columns as the text table has them (the widest cells: a check's name).
        expect(await page.textContent('table.ranked thead')).toContain('yield limited by');
        expect(box.width, `${format}: table ${box.width} px on a ${box.page} px page`).toBeLessThanOrEqual(box.page);
        expect(box.right, format).toBeLessThanOrEqual(box.page);
        await page.pdf({
          path: join(OUT, `design-report-${units.replace(/\W+/g, '-')}-${format}.pdf`),
          format: format as 'A4' | 'Letter',
          printBackground: true,
        });
        await page.close();
      }
    });
  }

  it('the check can fail: on screen at the A4 width the same table does not fit (it scrolls there)', async () => {
    const file = join(OUT, 'design-report-print-si.html');
    const { page, box } = await ranked(file, printable.A4, 'screen');
    expect(box.width).toBeGreaterThan(box.page);
    await page.close();
  });
});
