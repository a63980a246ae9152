// source: none needed; nothing here is checked against a value from outside the project.
// `coilfront stock` against an extension requirement (issue 8 leftover): every row of a table of
// extension springs through the path of `check`. The demo table is invented data for the demo only
// (examples/stock-extension-springs.csv says so), the requirement our own scenario (a printer's
// paper-tray return spring); the checks here are properties of our own behaviour.
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { check, stock } from '../../src/index.js';
import { loadCatalog } from '../../src/catalogs/load.js';
import { runExtensionStock } from '../../src/stock/extension.js';
import { cli, inputFile, tempPath } from '../helpers.js';

const REQ = 'examples/stock-extension-tray.yaml';
const TABLE = 'examples/stock-extension-springs.csv';
const PASSING = ['XM-065-068-23', 'XM-065-066-24', 'XM-065-064-26', 'XM-070-082-17'];
const req = parseYaml(readFileSync(REQ, 'utf8')) as Record<string, unknown>;
const text = readFileSync(TABLE, 'utf8');

describe('stock with an extension requirement', () => {
  it('the demo table is marked as invented and holds extension springs of two materials', () => {
    expect(text.split('\n')[0]).toMatch(/INVENTED DATA FOR THE DEMO ONLY/);
    const rows = parse(text, { comment: '#', columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThanOrEqual(60);
    expect(new Set(rows.map((r) => r.material))).toEqual(new Set(['302 SS', 'Music wire']));
  });

  it('lists the rows that pass, ranked by mass with margins, the near misses by how much, the bad row by line and column', async () => {
    const r = await cli('stock', REQ, TABLE);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Stock extension springs for 6\.000 N at 40\.00 mm inside the loops, stretched to 52\.00 mm at 10\.00 N/);
    expect(r.stdout).toMatch(/Table: 61 rows, 60 checked, 1 bad .*; 4 pass every check, ranked by mass\./);
    const listed = [...r.stdout.matchAll(/^\s+\d\s+(X[MS]-\d{3}-\d{3}-\d{2})\s/gm)].map((m) => m[1]);
    expect(listed).toEqual(PASSING);
    expect(r.stdout).toMatch(/XM-065-070-21 \(line 41\) fails loop_bending_fatigue by 2\.27% \(1\.4659 against >= 1\.5000\)/);
    expect(r.stdout).toMatch(/draw-bar arrangement or fit a guard/);
    expect(r.stderr).toMatch(
      /stock-extension-springs\.csv line 65 \(XC-080-090-12\), initial_tension_N: expected an initial tension \(the cell is empty\); row skipped/,
    );
  });

  it('agrees with `check` row by row: the same verdict and the same failing checks for every row', () => {
    const run = runExtensionStock(req, text, loadCatalog());
    expect(run.results.length).toBe(60);
    for (const r of run.results) {
      const c = check(r.row.springFile, req) as { pass: boolean; failing: { name: string; by: number | null }[] };
      expect(c.pass, r.row.partNumber).toBe(r.pass);
      expect(c.failing, r.row.partNumber).toEqual(r.verdict.failing.map((l) => ({ name: l.name, by: l.margin === null ? null : -l.margin })));
    }
  });

  it('the library returns what --json prints; the same table in inches and pounds gives the same verdicts', async () => {
    const j = stock(req, text, { label: TABLE });
    const printed = await cli('stock', REQ, TABLE, '--json');
    expect(JSON.stringify(j, null, 2) + '\n').toBe(printed.stdout);
    expect(j.kind).toBe('extension');
    expect((j.cautions as string[]).at(-1)).toMatch(/draw-bar/);
    const rows = parse(text, { comment: '#', columns: true }) as Record<string, string>[];
    const inch = (v: string) => String(Number(v) / 25.4);
    const us = [
      'part_number,material,wire_diameter_in,outer_diameter_in,body_coils,initial_tension_lbf,free_length_in,loop',
      ...rows.map((r) =>
        [
          r.part_number,
          r.material,
          inch(r.wire_diameter_mm),
          inch(r.outer_diameter_mm),
          r.body_coils,
          r.initial_tension_N === '' ? '' : String(Number(r.initial_tension_N) / 4.4482216152605),
          inch(r.free_length_mm),
          r.loop,
        ].join(','),
      ),
    ].join('\n');
    const ju = stock(req, us, { label: 'us' }) as { passing: { part_number: string }[]; failed_by: Record<string, number> };
    expect(ju.passing.map((p) => p.part_number)).toEqual(PASSING);
    expect(ju.failed_by).toEqual(j.failed_by);
  });

  it('a row of another kind is a bad row naming the kind column; a table without body_coils names the header', async () => {
    const t = inputFile(
      'part_number,material,wire_diameter,outer_diameter,body_coils,initial_tension,kind\nA,music-wire,0.65,6.8,23,1.6,extension\nB,music-wire,0.65,6.8,23,1.6,compression\n',
      'csv',
    );
    const j = JSON.parse((await cli('stock', REQ, t, '--json')).stdout);
    expect(j.table.checked).toBe(1);
    expect(j.bad_rows[0]).toMatchObject({ line: 3, field: 'kind' });
    expect(j.bad_rows[0].message).toMatch(/^expected extension \(the requirements are for extension springs/);
    const noCoils = await cli('stock', REQ, inputFile('part_number,material,wire_diameter,outer_diameter,initial_tension\nA,music-wire,0.65,6.8,1.6\n', 'csv'));
    expect(noCoils.code).toBe(2);
    expect(noCoils.stderr).toMatch(/header: expected a column body_coils/);
  });

  it('--compare runs the extension design and judges its best spring as a stock row: the same spring design lists, passing, beside the best stock one', async () => {
    const printed = await cli('stock', REQ, TABLE, '--compare', '--json');
    expect(printed.code).toBe(0);
    const c = JSON.parse(printed.stdout).compare;
    const design = JSON.parse((await cli('design', REQ, '--json')).stdout);
    const best = design.candidates[0];
    for (const k of ['material', 'wire_diameter', 'mean_diameter', 'body_coils', 'free_length', 'initial_tension', 'rate', 'mass'])
      expect(c.best_custom[k], k).toBe(best[k]);
    expect(c.design_strategy).toBe(design.strategy);
    expect(c.design_feasible).toBe(design.feasible);
    // Judged through check's path, the designed spring passes every check, its working force in the band.
    expect(c.best_custom.limiting_check.margin).toBeGreaterThanOrEqual(0);
    expect(c.best_stock.part_number).toBe(PASSING[0]);
    expect(c.stock_over_custom_mass).toBeCloseTo(c.best_stock.mass / c.best_custom.mass, 12);
    // The library gives the same record.
    expect(JSON.stringify(stock(req, text, { label: TABLE, compare: true }), null, 2) + '\n').toBe(printed.stdout);
    const t = (await cli('stock', REQ, TABLE, '--compare')).stdout;
    expect(t).toMatch(/Stock against custom \(--compare: the best spring `design` finds for the same requirements\):/);
    expect(t).toMatch(new RegExp(`best stock: ${PASSING[0]}`));
    expect(t).toMatch(/The best stock spring \(XM-065-068-23\) is [\d.]+% heavier than the best custom spring/);
  });

  it('-o writes every checked row as CSV and --report an HTML page with the best row in full and the caution', async () => {
    const csvPath = tempPath('stock.csv');
    const html = tempPath('stock.html');
    const r = await cli('stock', REQ, TABLE, '-o', csvPath, '--report', html);
    expect(r.code).toBe(0);
    const rows = parse(readFileSync(csvPath, 'utf8'), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(60);
    expect(rows.filter((x) => x.verdict === 'pass').map((x) => x.part_number)).toEqual(PASSING);
    const page = readFileSync(html, 'utf8');
    expect(page).toMatch(/The best stock spring: XM-065-068-23/);
    expect(page).toMatch(/id="extension-caution"/);
    expect(page).not.toMatch(/NaN|Infinity|undefined/);
  });
});
