// `coilfront stock` end to end on the demo table and on small tables of our own (no outside values:
// the demo table is invented data, and these are properties of the command's behaviour).
import { existsSync, readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { readInputFile } from '../../src/input/document.js';
import { stock } from '../../src/stock/index.js';
import { cli, inputFile, tempPath } from '../helpers.js';

const REQ = 'examples/stock-dispenser.yaml';
const TABLE = 'examples/stock-springs.csv';
const MATCHES = ['PH-090-100-040', 'PH-090-095-040', 'SS-090-090-040'];

describe('the stock demo', () => {
  it('the demo table is marked as invented and holds at least 60 rows over several materials', () => {
    const text = readFileSync(TABLE, 'utf8');
    expect(text.split('\n')[0]).toMatch(/INVENTED DATA FOR THE DEMO ONLY/);
    const rows = parse(text, { comment: '#', columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThanOrEqual(60);
    expect(new Set(rows.map((r) => r.material)).size).toBeGreaterThanOrEqual(4);
    expect(new Set(rows.map((r) => r.wire_diameter_mm)).size).toBeGreaterThanOrEqual(8);
  });

  it('lists the three rows that meet the dispenser requirement, ranked by mass, with margins, and exits 0', async () => {
    const r = await cli('stock', REQ, TABLE);
    expect(r.code).toBe(0);
    const listed = r.stdout
      .slice(0, r.stdout.indexOf('Best near misses'))
      .split('\n')
      .filter((l) => /^\s+\d+\s+(PH|SS|MW|CS|PB)-/.test(l))
      .map((l) => l.trim().split(/\s+/)[1]);
    expect(listed).toEqual(MATCHES);
    expect(r.stdout).toMatch(/3 pass every check, ranked by mass/);
    expect(r.stdout).toMatch(/static_stress \+3\.43%/);
    expect(r.stdout).toMatch(/Working force band: 9\.000 N \+-15\.0% at 30\.00 mm \(7\.650 N to 10\.35 N\), from the requirement's working_tolerance/);
    expect(r.stdout).toMatch(/Best near misses/);
    expect(r.stdout).toMatch(/SS-110-115-042 \(line 121\) fails working_force_max by 0\.0522% \(10\.355 N against <= 10\.350 N\)/);
    expect(r.stdout).toMatch(/Cautions:/);
    expect(r.stdout).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('reports each bad row on stderr with its line and column, counts it, and goes on', async () => {
    const r = await cli('stock', REQ, TABLE);
    expect(r.stderr).toMatch(
      /examples\/stock-springs\.csv line 129 \(SS-100-090-040\), kind: expected compression \(the requirements are for compression springs: run the extension rows against an extension requirements file/,
    );
    expect(r.stderr).toMatch(/line 130 \(MW-120-120-060\), kind:/);
    expect(r.stdout).toMatch(/Table: 125 rows, 123 checked, 2 bad/);
  });

  it("puts the table's rate beside coilfront's where they differ by more than the stated percentage", async () => {
    const r = await cli('stock', REQ, TABLE);
    expect(r.stdout).toMatch(/differs from coilfront's k = G d\^4 \/ \(8 D\^3 Na\) by more than 10\.0% on 2 rows/);
    expect(r.stdout).toMatch(/127\s+PH-100-110-038B\s+1\.120\s+0\.9480\s+\+18\.1%/);
    const wide = await cli('stock', REQ, TABLE, '--rate-deviation', '20%');
    expect(wide.stdout).not.toMatch(/differs from coilfront's/);
  });

  it('--compare shows the best custom spring beside the best stock one', async () => {
    const j = JSON.parse((await cli('stock', REQ, TABLE, '--compare', '--json')).stdout);
    expect(j.compare.best_stock.part_number).toBe('PH-090-100-040');
    expect(j.compare.best_custom.material).toBe('stainless-17-7ph');
    for (const k of ['mass', 'outer_diameter', 'free_length']) {
      expect(j.compare.best_custom[k]).toBeGreaterThan(0);
      expect(j.compare.best_stock[k]).toBeGreaterThan(0);
    }
    expect(j.compare.best_custom.limiting_check.margin).toBeGreaterThanOrEqual(0);
    expect(j.compare.stock_over_custom_mass).toBeCloseTo(j.compare.best_stock.mass / j.compare.best_custom.mass, 12);
    const t = await cli('stock', REQ, TABLE, '--compare');
    expect(t.stdout).toMatch(/best custom \(design #1\)\s+stainless-17-7ph/);
    expect(t.stdout).toMatch(/best stock: PH-090-100-040/);
  });

  it('--compare under min_yield shows the spring design lists: the first one the Monte Carlo confirms, passing the yield check', async () => {
    // At grade 3 and 97% the search's lightest spring is refused by the Monte Carlo (design lists the next one).
    const sets = ['--set', 'min_yield=0.97', '--set', 'tolerance_grade=3', '--set', 'top=3'];
    const design = JSON.parse((await cli('design', REQ, '--json', ...sets)).stdout);
    expect(design.refused_by_monte_carlo.some((r: { mass: number }) => r.mass < design.candidates[0].mass)).toBe(true);
    const j = JSON.parse((await cli('stock', REQ, TABLE, '--compare', '--json', ...sets)).stdout);
    for (const k of ['material', 'wire_diameter', 'mean_diameter', 'active_coils', 'free_length', 'mass'])
      expect(j.compare.best_custom[k], k).toBe(design.candidates[0][k]);
    expect(j.compare.best_custom.limiting_check.margin).toBeGreaterThanOrEqual(0);
  });

  it('the library function returns exactly what --json prints', async () => {
    const r = await cli('stock', REQ, TABLE, '--json');
    const lib = stock(readInputFile(REQ), readFileSync(TABLE, 'utf8'), { label: TABLE });
    expect(JSON.stringify(lib, null, 2) + '\n').toBe(r.stdout);
    expect(lib.table).toEqual({ units: 'si', rows: 125, checked: 123, bad: 2, passing: 3, failing: 120, ignored_columns: [] });
  });

  it("--rank price ranks the passing rows by the table's price; --rank and --top come from the command line", async () => {
    const j = JSON.parse((await cli('stock', REQ, TABLE, '--json', '--rank', 'price', '--top', '2')).stdout);
    expect(j.rank).toBe('price');
    expect(j.passing.map((p: { part_number: string }) => p.part_number)).toEqual(['SS-090-090-040', 'PH-090-100-040']);
    expect(j.passing[0].price).toBeLessThanOrEqual(j.passing[1].price);
  });

  it('--set and the envelope shorthands apply to the requirements', async () => {
    const j = JSON.parse((await cli('stock', REQ, TABLE, '--json', '--max-od', '9.6')).stdout);
    expect(j.passing.map((p: { part_number: string }) => p.part_number)).toEqual(['PH-090-095-040', 'SS-090-090-040']);
    const none = await cli('stock', REQ, TABLE, '--set', 'envelope.max_outer_diameter=8');
    expect(none.code).toBe(1);
    expect(none.stdout).toMatch(/No row passes every check/);
  });

  it('-o writes every checked row as CSV with units in the column names; --report writes the HTML section', async () => {
    const csvPath = tempPath('stock.csv');
    const htmlPath = tempPath('stock.html');
    const r = await cli('stock', REQ, TABLE, '-o', csvPath, '--report', htmlPath);
    expect(r.code).toBe(0);
    const rows = parse(readFileSync(csvPath, 'utf8'), { columns: true }) as Record<string, string>[];
    expect(rows).toHaveLength(123);
    expect(Object.keys(rows[0])).toEqual(
      expect.arrayContaining(['wire_diameter_mm', 'rate_N_per_mm', 'table_rate_N_per_mm', 'working_force_N', 'max_stress_MPa', 'failing_checks']),
    );
    expect(rows.slice(0, 3).map((x) => x.part_number)).toEqual(MATCHES);
    expect(rows[3].verdict).toBe('fail');
    const html = readFileSync(htmlPath, 'utf8');
    expect(html).toMatch(/<h2>Stock springs<\/h2>/);
    expect(html).toMatch(/PH-090-100-040/);
    expect(html).toMatch(/The best stock spring: PH-090-100-040/);
    // The design report carries the stock section under --compare.
    const both = tempPath('both.html');
    await cli('stock', REQ, TABLE, '--compare', '--report', both);
    expect(readFileSync(both, 'utf8')).toMatch(/coilfront design report[\s\S]*<h2>Stock springs<\/h2>[\s\S]*<h2>Stock against custom<\/h2>/);
  });
});

describe('stock tables', () => {
  const REQS = inputFile(`units: si
material: music-wire
load: { force: 10, length: 40 }
operating_length: 35
envelope: { max_outer_diameter: 16 }
`);

  it('reads units from column suffixes and plain numbers in the --units system, to the same verdicts', async () => {
    const mm = inputFile(
      'part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends,rate_N_per_mm\nA,music-wire,1,10,47.05,12,squared-ground,1.42\n',
      'csv',
    );
    const inch = inputFile(
      `part_number,material,wire_diameter_in,outer_diameter_in,free_length_in,total_coils,ends,rate_lbf_per_in\nA,music-wire,${1 / 25.4},${10 / 25.4},${47.05 / 25.4},12,squared-ground,${(1.42 * 25.4) / 4.4482216152605}\n`,
      'csv',
    );
    const plainUs = inputFile(
      `part_number,material,wire_diameter,outer_diameter,free_length,total_coils,ends,rate\nA,music-wire,${1 / 25.4},${10 / 25.4},${47.05 / 25.4},12,squared-ground,${(1.42 * 25.4) / 4.4482216152605}\n`,
      'csv',
    );
    const a = JSON.parse((await cli('stock', REQS, mm, '--json')).stdout);
    const b = JSON.parse((await cli('stock', REQS, inch, '--json')).stdout);
    const c = JSON.parse((await cli('stock', REQS, plainUs, '--json', '--units', 'us')).stdout);
    for (const x of [b, c]) {
      expect(x.passing[0].spring.rate).toBeCloseTo(a.passing[0].spring.rate, 9);
      expect(x.passing[0].spring.free_length).toBeCloseTo(47.05, 9);
      expect(x.passing[0].table_rate).toBeCloseTo(1.42, 9);
    }
    expect(c.table.units).toBe('us');
    const text = await cli('stock', REQS, plainUs, '--units', 'us');
    expect(text.stdout).toMatch(/plain numbers in in, lbf/);
    expect(text.stdout).toMatch(/OD in/);
  });

  it("takes the trade's end words and the material_map, and refuses unknown ones by row", async () => {
    const req = inputFile(`units: si
material: [music-wire, stainless-302]
material_map: { "Piano wire": music-wire }
load: { force: 10, length: 40 }
envelope: {}
`);
    const table = inputFile(
      [
        'part_number,material,wire_diameter_mm,mean_diameter_mm,free_length_mm,active_coils,ends',
        'A,Piano wire,1,9,47.05,10,Closed and ground',
        'B,music-wire,1,9,47.05,10,closed',
        'C,Unobtainium,1,9,47.05,10,closed',
        'D,music-wire,1,9,47.05,10,hooked',
        'E,music-wire,1,9,,10,closed',
        'F,music-wire,one,9,47,10,closed',
        'G,music-wire,1,9,10,10,closed',
      ].join('\n'),
      'csv',
    );
    const r = await cli('stock', req, table, '--json');
    const j = JSON.parse(r.stdout);
    expect(j.table).toMatchObject({ rows: 7, checked: 2, bad: 5 });
    expect(j.bad_rows.map((b: { line: number; field: string }) => [b.line, b.field])).toEqual([
      [4, 'material'],
      [5, 'ends'],
      [6, 'free_length_mm'],
      [7, 'wire_diameter_mm'],
      [8, 'free_length_mm'],
    ]);
    expect(j.bad_rows[0].message).toMatch(/material_map/);
    expect(j.bad_rows[4].message).toMatch(/above the solid length/);
    expect(r.stderr).toMatch(/line 7 \(F\), wire_diameter_mm: expected a length/);
    const springs = [...j.passing, ...j.near_misses].map((p: { part_number: string; spring: { ends: string } }) => [p.part_number, p.spring.ends]).sort();
    expect(springs).toEqual([
      ['A', 'squared-ground'],
      ['B', 'squared'],
    ]);
  });

  it('rejects a table with no usable row, a missing column or a bad material_map with exit 2 and one message', async () => {
    const cases: [string, string, RegExp][] = [
      [
        REQS,
        'part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends\nA,steel,1,10,40,12,closed\n',
        /expected at least one usable row; all 1 data rows are bad \(line 2, material:/,
      ],
      [
        REQS,
        'part_number,material,wire_diameter_mm,free_length_mm,total_coils,ends\nA,music-wire,1,40,12,closed\n',
        /header: expected a column outer_diameter or mean_diameter or inner_diameter/,
      ],
      [
        REQS,
        'part_number,material,wire_diameter_N,outer_diameter_mm,free_length_mm,total_coils,ends\n',
        /column "wire_diameter_N": expected a unit that fits wire_diameter \(a length\), not N/,
      ],
      [REQS, '', /expected a CSV table with a header row and at least one data row/],
      [
        inputFile('units: si\nmaterial: music-wire\nmaterial_map: { steel: unobtainium }\nload: { force: 10, length: 40 }\nenvelope: {}\n'),
        'part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends\nA,steel,1,10,40,12,closed\n',
        /material_map\.steel: expected a known material/,
      ],
    ];
    for (const [req, table, pattern] of cases) {
      const r = await cli('stock', req, inputFile(table, 'csv'));
      expect(r.code, table).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr.trim().split('\n').at(-1)).toMatch(pattern);
    }
    const missing = await cli('stock', REQS, 'examples/no-such-table.csv');
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/no-such-table\.csv: expected an existing file/);
  });

  it('accepts a kind column with compression, refuses extension rows by row (they run against an extension requirement)', async () => {
    const t = inputFile(
      'part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends,kind\nA,music-wire,1,10,47.05,12,closed & ground,compression\nB,music-wire,1,10,47.05,12,closed & ground,extension\nC,music-wire,1,10,47.05,12,closed & ground,torsion\n',
      'csv',
    );
    const j = JSON.parse((await cli('stock', REQS, t, '--json')).stdout);
    expect(j.table.checked).toBe(1);
    expect(j.bad_rows[0].message).toMatch(
      /the requirements are for compression springs: run the extension rows against an extension requirements file, kind: extension/,
    );
    expect(j.bad_rows[1].message).toMatch(/compression or extension, got "torsion"/);
  });

  it('never overwrites an output file without --force', async () => {
    const path = tempPath('exists.csv');
    await cli('stock', REQ, TABLE, '-o', path);
    expect(existsSync(path)).toBe(true);
    const again = await cli('stock', REQ, TABLE, '-o', path);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/add --force/);
  });
});

describe('README', () => {
  it('shows stock output that the stock demo really prints', async () => {
    const readme = readFileSync('README.md', 'utf8');
    const section = readme.slice(readme.indexOf('## Stock springs'));
    expect(section).toMatch(/npm run coilfront -- stock examples\/stock-dispenser\.yaml examples\/stock-springs\.csv --compare/);
    expect(section).toMatch(/invented data for the demo only/);
    const block = section.slice(section.indexOf('```\n') + 4, section.indexOf('\n```', section.indexOf('```\n') + 4));
    const out = (await cli('stock', REQ, TABLE, '--compare')).stdout;
    const shown = block.split('\n').filter((l) => l.trim() !== '...' && l.trim() !== '');
    expect(shown.length).toBeGreaterThan(5);
    for (const line of shown) expect(out, line).toContain(line);
  });
});
