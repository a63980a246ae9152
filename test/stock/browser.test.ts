// source: none needed (properties of our own pages on our own demo scenarios).
// The stock report in a real browser (Debian's Chromium driven by playwright-core), a property of our own
// report (no outside values): it loads offline with no console errors, shows the stock section with the
// CLI's best stock row first, draws the best stock spring's plots, and prints without cutting a table.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { OUT, openFile, useChromium } from '../browser.js';
import { cli } from '../helpers.js';

const browser = useChromium();

describe('stock report in headless Chromium', () => {
  it("loads offline, lists the CLI's best stock row first and draws its plots", async () => {
    const file = join(OUT, 'stock-report.html');
    rmSync(file, { force: true });
    const r = await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv', '--report', file);
    expect(r.code).toBe(0);
    const html = readFileSync(file, 'utf8');
    expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
    const best = JSON.parse((await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv', '--json')).stdout).passing[0];
    const { page, errors, requests } = await openFile(browser(), file);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const firstRow = await page.$eval('tr.best', (tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent));
    expect(firstRow[1]).toBe(best.part_number);
    const headings = await page.$$eval('h2', (hs) => hs.map((h) => h.textContent));
    expect(headings).toEqual(
      expect.arrayContaining(['Stock springs', 'Best near misses', 'Bad rows (skipped)', `The best stock spring: ${best.part_number}`, 'Cautions']),
    );
    const plots = await page.$$eval('svg.plot', (svgs) => svgs.map((s) => s.getBoundingClientRect().width));
    expect(plots.length).toBeGreaterThanOrEqual(2);
    for (const w of plots) expect(w).toBeGreaterThan(100);
    await page.screenshot({ path: join(OUT, 'stock-report.png'), fullPage: true });
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    expect(pdf.length).toBeGreaterThan(1000);
    await page.close();
  }, 60000);
});
