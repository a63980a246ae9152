// The stock report in a real browser (Debian's Chromium driven by playwright-core), a property of our own
// report (no outside values): it loads offline with no console errors, shows the stock section with the
// CLI's best stock row first, draws the best stock spring's plots, and prints without cutting a table.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

const OUT = resolve('test-output');
const CHROMIUM = '/usr/bin/chromium';
let browser: Browser;

beforeAll(async () => {
  mkdirSync(OUT, { recursive: true });
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: install Debian's chromium package (.ci/run does)`);
  browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'] });
});

afterAll(async () => {
  await browser?.close();
});

describe('stock report in headless Chromium', () => {
  it('loads offline, lists the CLI\'s best stock row first and draws its plots', async () => {
    const file = join(OUT, 'stock-report.html');
    rmSync(file, { force: true });
    const r = await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv', '--report', file);
    expect(r.code).toBe(0);
    const html = readFileSync(file, 'utf8');
    expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
    const best = JSON.parse((await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv', '--json')).stdout).passing[0];
    const page = await browser.newPage({ viewport: { width: 1200, height: 900 } });
    const errors: string[] = [];
    const requests: string[] = [];
    page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
    page.on('pageerror', (e) => errors.push(String(e)));
    page.on('request', (q) => { if (!q.url().startsWith('file:') && !q.url().startsWith('data:')) requests.push(q.url()); });
    await page.goto(pathToFileURL(file).href);
    await page.waitForLoadState('load');
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const firstRow = await page.$eval('tr.best', (tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent));
    expect(firstRow[1]).toBe(best.part_number);
    const headings = await page.$$eval('h2', (hs) => hs.map((h) => h.textContent));
    expect(headings).toEqual(expect.arrayContaining(['Stock springs', 'Best near misses', 'Bad rows (skipped)', `The best stock spring: ${best.part_number}`, 'Cautions']));
    const plots = await page.$$eval('svg.plot', (svgs) => svgs.map((s) => s.getBoundingClientRect().width));
    expect(plots.length).toBeGreaterThanOrEqual(2);
    for (const w of plots) expect(w).toBeGreaterThan(100);
    await page.screenshot({ path: join(OUT, 'stock-report.png'), fullPage: true });
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    expect(pdf.length).toBeGreaterThan(1000);
    await page.close();
  }, 60000);
});
