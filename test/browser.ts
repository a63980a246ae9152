// source: none needed; test helpers only (each browser test names the sources of its own checks).
// The real browser of the report tests: Debian's Chromium driven by playwright-core, launched once per
// test file, and pages opened offline with their console errors and network requests recorded.
import { existsSync, mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

/** Where the browser tests leave their pages and screenshots. */
export const OUT = resolve('test-output');

const CHROMIUM = '/usr/bin/chromium';

/** Launch Chromium before the file's tests and close it after them; the returned function gives the browser. */
export function useChromium(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    mkdirSync(OUT, { recursive: true });
    if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: install Debian's chromium package (.ci/run does)`);
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      // Offline and quiet: no first-run pages, background fetches, updates or sync.
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('Chromium is not running (useChromium() must be called at the top of the test file)');
    return browser;
  };
}

export interface OpenedPage {
  page: Page;
  /** Console errors and uncaught page errors. */
  errors: string[];
  /** Every request that left the file (anything but file: and data: URLs). */
  requests: string[];
  url: string;
}

/** Open a local HTML file, recording console errors and any request that is not for a file: or data: URL. */
export async function openFile(browser: Browser, path: string, viewport = { width: 1200, height: 900 }): Promise<OpenedPage> {
  const page = await browser.newPage({ viewport });
  const errors: string[] = [];
  const requests: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(String(e)));
  page.on('request', (r) => {
    if (!r.url().startsWith('file:') && !r.url().startsWith('data:')) requests.push(r.url());
  });
  const url = pathToFileURL(path).href;
  await page.goto(url);
  await page.waitForLoadState('load');
  return { page, errors, requests, url };
}

/** Pages of a PDF that Chromium printed: its page objects (Chromium writes them uncompressed). */
export function pdfPages(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
}
