// source: none needed (what the CLI refuses and writes; no outside values; the good rows are the demo's invented ones).
// `stock` checks every output path before any work (audit finding 7: a refused --report left the
// --output CSV written), and a table cell passes the limits a spring file's field does, the row's
// error naming its column (audit finding 8: free length 1e400 or 1e30 was checked, not refused; a
// wire diameter of 1e400 was blamed on outer_diameter_mm).
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, inputFile, tempPath } from '../helpers.js';

const REQ = 'examples/stock-dispenser.yaml';
const TABLE = 'examples/stock-springs.csv';

describe('stock output paths are checked first', () => {
  it('an existing --report: exit 2, and --output is not written', async () => {
    const rows = tempPath('rows.csv');
    const report = tempPath('rep.html');
    writeFileSync(report, 'x');
    const r = await cli('stock', REQ, TABLE, '-o', rows, '--report', report);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--report: expected a file that does not exist yet/);
    expect(r.stdout).toBe('');
    expect(existsSync(rows)).toBe(false);
    expect(readFileSync(report, 'utf8')).toBe('x');
  });

  it('a --report in a missing folder: exit 2, nothing written', async () => {
    const rows = tempPath('rows.csv');
    const r = await cli('stock', REQ, TABLE, '-o', rows, '--report', '/nonexistent-coilfront/x.html');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--report: expected a path in an existing folder/);
    expect(existsSync(rows)).toBe(false);
  });

  it('an --output that is the table itself is refused', async () => {
    const table = inputFile(readFileSync(TABLE, 'utf8'), 'csv');
    const r = await cli('stock', REQ, table, '-o', table, '--force');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--output: expected a file other than the input file/);
  });
});

describe('stock table cells have the limits of a spring file', () => {
  const header = 'part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends';
  const table = (...rows: string[]) => inputFile([header, ...rows, 'OK,302 SS,0.9,10,30,12,squared-ground'].join('\n') + '\n', 'csv');

  it.each([
    ['free length 1e400', 'L,302 SS,0.9,10,1e400,12,squared-ground', 'free_length_mm', /a length of at most 100000 mm in size, got "1e400"/],
    ['free length 1e30', 'L,302 SS,0.9,10,1e30,12,squared-ground', 'free_length_mm', /a length of at most 100000 mm in size, got "1e30"/],
    ['wire diameter 1e400', 'L,302 SS,1e400,10,30,12,squared-ground', 'wire_diameter_mm', /a length of at most 100000 mm in size/],
    ['outer diameter 1e-9', 'L,302 SS,0.9,1e-9,30,12,squared-ground', 'outer_diameter_mm', /a length of at least 0.001 mm in size/],
    ['free length "1e30 mm" with its unit', 'L,302 SS,0.9,10,1e30 mm,12,squared-ground', 'free_length_mm', /a length of at most 100000 mm in size/],
  ])('%s: the row is refused naming its column', async (_, row, column, message) => {
    const r = await cli('stock', REQ, table(row), '--json');
    const out = JSON.parse(r.stdout);
    const bad = out.bad_rows;
    expect(bad).toHaveLength(1);
    expect(bad[0].field).toBe(column);
    expect(bad[0].message).toMatch(message);
    expect(r.stderr).toContain(`line 2 (L), ${column}: expected`);
    expect(r.stdout).not.toMatch(/Infinity|NaN|e\+29/);
  });

  it('an extension table too', async () => {
    const ext = inputFile(
      [
        'part_number,material,wire_diameter_mm,outer_diameter_mm,body_coils,initial_tension_N,free_length_mm,loop,rate_N_per_mm,max_extended_length_mm,price',
        'X,302 SS,0.6,7.5,16,2.4,1e400,full,,,',
        'XS-060-075-16,302 SS,0.6,7.5,16,2.4,22.8,full,0.208,55,0.95',
      ].join('\n') + '\n',
      'csv',
    );
    const r = await cli('stock', 'examples/stock-extension-tray.yaml', ext);
    expect(r.stderr).toMatch(/line 2 \(X\), free_length_mm: expected a length of at most 100000 mm in size/);
  });
});
