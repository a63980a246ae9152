// source: none needed (properties of our own pages on our own demo scenarios).
// The stock report in a real browser (Debian's Chromium driven by playwright-core), a property of our own
// report (no outside values): it loads offline with no console errors, shows the stock section with the
// CLI's best stock row first, draws the best stock spring's plots, and prints without cutting a table.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { OUT, openFile, useChromium } from '../browser.js';
import { cli } from '../helpers.js';

const browser = useChromium();

/** The command's --report opened offline (no script, link or fetch; no console error), its first
 * ranked row the --json's best stock row. */
async function openReport(args: string[], name: string) {
  const file = join(OUT, name);
  rmSync(file, { force: true });
  const r = await cli(...args, '--report', file);
  expect(r.code).toBe(0);
  expect(readFileSync(file, 'utf8')).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
  const json = JSON.parse((await cli(...args, '--json')).stdout);
  const best = json.passing[0];
  const { page, errors, requests } = await openFile(browser(), file);
  expect(errors).toEqual([]);
  expect(requests).toEqual([]);
  const firstRow = await page.$eval('tr.best', (tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent));
  expect(firstRow[1]).toBe(best.part_number);
  return { page, best, json };
}

/** At least two plots drawn at a readable width; a screenshot left for people; the page prints to A4. */
async function plotsAndPrint(page: Page, screenshot: string): Promise<void> {
  const plots = await page.$$eval('svg.plot', (svgs) => svgs.map((s) => s.getBoundingClientRect().width));
  expect(plots.length).toBeGreaterThanOrEqual(2);
  for (const w of plots) expect(w).toBeGreaterThan(100);
  await page.screenshot({ path: join(OUT, screenshot), fullPage: true });
  const pdf = await page.pdf({ format: 'A4', printBackground: true });
  expect(pdf.length).toBeGreaterThan(1000);
  await page.close();
}

describe('stock report in headless Chromium', () => {
  it("loads offline, lists the CLI's best stock row first and draws its plots", async () => {
    const { page, best } = await openReport(['stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv'], 'stock-report.html');
    const headings = await page.$$eval('h2', (hs) => hs.map((h) => h.textContent));
    expect(headings).toEqual(
      expect.arrayContaining(['Stock springs', 'Best near misses', 'Bad rows (skipped)', `The best stock spring: ${best.part_number}`, 'Cautions']),
    );
    await plotsAndPrint(page, 'stock-report.png');
  }, 60000);

  it('the extension stock report (--compare) loads offline, lists the best stock row first, compares it with the custom spring and draws its plots', async () => {
    const args = ['stock', 'examples/stock-extension-tray.yaml', 'examples/stock-extension-springs.csv', '--compare'];
    const { page, best, json: j } = await openReport(args, 'stock-extension-report.html');
    const headings = await page.$$eval('h2', (hs) => hs.map((h) => h.textContent));
    expect(headings).toEqual(
      expect.arrayContaining([
        'Stock extension springs',
        'Best near misses',
        'Bad rows (skipped)',
        'Stock against custom',
        `The best stock spring: ${best.part_number}`,
        'Extension springs let go of their load',
        'Cautions',
      ]),
    );
    // The comparison names the best custom and the best stock spring, as the JSON does.
    const compared = await page.$$eval('h2', (hs) => {
      const h = hs.find((x) => x.textContent === 'Stock against custom')!;
      const table = h.nextElementSibling as HTMLTableElement;
      return Array.from(table.querySelectorAll('tr')).map((tr) => tr.children[1]?.textContent ?? '');
    });
    expect(compared).toEqual(['material', j.compare.best_custom.material, best.spring.material]);
    await plotsAndPrint(page, 'stock-extension-report.png');
  }, 120000);
});
