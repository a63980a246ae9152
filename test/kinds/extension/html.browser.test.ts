// source: none needed (properties of our own pages on our own demo scenarios).
// The extension-spring HTML reports end to end in a real browser (Debian's Chromium driven by
// playwright-core), as test/report/browser.test.ts does for compression springs: offline (no network
// request), no console errors, the force-length line starting above zero at the free length, both loops
// drawn, the loop stresses shown and the chosen spring the CLI's best. Properties of our own reports on
// our own demo scenario; no outside values. Screenshots go to test-output/.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { OUT, openFile, useChromium } from '../../browser.js';
import { cli } from '../../helpers.js';

const DEMO = 'examples/extension-pedal-bin.yaml';
const browser = useChromium();

const open = (path: string) => openFile(browser(), path);

/** The force-length line as drawn: its first point, and the screen height of force zero on the axis. */
async function forceLine(page: Page) {
  return page.$eval('#plot-force', (svg) => {
    const line = svg.querySelector('#force-line') as SVGPolylineElement;
    const first = line.points.getItem(0);
    const zero = Array.from(svg.querySelectorAll('.axis text')).find((t) => t.textContent === '0' && t.getAttribute('text-anchor') === 'end') as SVGTextElement;
    return {
      startForce: Number(line.dataset.startForce),
      y: first.y,
      zeroY: Number(zero.getAttribute('y')) - 4,
      drawnWidth: svg.getBoundingClientRect().width,
    };
  });
}

async function loops(page: Page) {
  return page.$$eval('#plot-drawing ellipse.loop', (es) =>
    es.map((e) => {
      const b = e.getBoundingClientRect();
      return { id: e.id, width: b.width, height: b.height };
    }),
  );
}

describe('extension design report in headless Chromium', () => {
  it("loads offline; the force line starts above zero; both loops drawn; the loop stresses and the CLI's best spring shown", async () => {
    const file = join(OUT, 'extension-design-report.html');
    rmSync(file, { force: true });
    const r = await cli('design', DEMO, '--report', file);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/report written/);
    const html = readFileSync(file, 'utf8');
    expect(html).not.toMatch(/<script|<link|@import|url\(|\ssrc=|\shref=/i);
    const best = JSON.parse((await cli('design', DEMO, '--json')).stdout).candidates[0];
    const { page, errors, requests } = await open(file);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const fl = await forceLine(page);
    expect(fl.startForce).toBeCloseTo(best.initial_tension, 9);
    expect(fl.startForce).toBeGreaterThan(0);
    // SVG y grows downwards: the line's first point is drawn above the axis' zero.
    expect(fl.y).toBeLessThan(fl.zeroY - 5);
    expect(fl.drawnWidth).toBeGreaterThan(100);
    const ls = await loops(page);
    expect(ls.map((l) => l.id).sort()).toEqual(['loop-left', 'loop-right']);
    for (const l of ls) {
      expect(l.width).toBeGreaterThan(5);
      expect(l.height).toBeGreaterThan(5);
    }
    const stressHeader = await page.$$eval('#loop-stresses th', (th) => th.map((t) => t.textContent));
    expect(stressHeader).toEqual(expect.arrayContaining(['body (torsion)', 'loop, A (bending)', 'loop, B (torsion)']));
    const chosen = await page.$eval('#chosen-spring', (c) => ({ ...(c as HTMLElement).dataset }));
    expect(chosen.material).toBe(best.material);
    expect(Number(chosen.meanDiameter)).toBeCloseTo(best.mean_diameter, 9);
    expect(Number(chosen.bodyCoils)).toBe(best.body_coils);
    const firstRow = await page.$eval('tr.best', (tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent));
    expect(firstRow[1]).toBe(best.material);
    expect(await page.textContent('#extension-caution')).toMatch(/draw-bar arrangement/);
    await page.screenshot({ path: join(OUT, 'extension-design-report.png'), fullPage: true });
    await page.close();
  });

  it('the single-spring report, in US units: the same drawings, the axis in lbf', async () => {
    const file = join(OUT, 'extension-spring-report.html');
    rmSync(file, { force: true });
    const r = await cli('analyze', 'examples/extension-pedal-bin-spring.yaml', '--units', 'us', '--report', file);
    expect(r.code).toBe(0);
    const { page, errors, requests } = await open(file);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const fl = await forceLine(page);
    expect(fl.startForce).toBe(7.2);
    expect(fl.y).toBeLessThan(fl.zeroY - 5);
    expect(await page.textContent('#plot-force')).toMatch(/force \(lbf\)/);
    expect((await loops(page)).length).toBe(2);
    await page.screenshot({ path: join(OUT, 'extension-spring-report.png'), fullPage: true });
    await page.close();
  });
});
