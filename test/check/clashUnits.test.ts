// source: none needed; nothing here is checked against a value from outside the project.
// The clash check reads in one unit everywhere (review finding): the check command measures it in
// millimetres (or inches) of coil clearance to solid (`spare` in its JSON), so design's nearest-miss
// lines, its JSON and stock's smallest-margin column give that same figure, never a share of the
// shortest length. Scenarios of our own: the cramped tripod clip of the goldens and the dispenser
// stock demo (both invented).
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../src/catalogs/load.js';
import { check } from '../../src/check/index.js';
import { readRequirements } from '../../src/kinds/compression/requirements.js';
import { candidateAt, runDesign } from '../../src/kinds/compression/design.js';
import { springDocument } from '../../src/kinds/compression/springDoc.js';
import { formatQuantity } from '../../src/units/format.js';
import { cli } from '../helpers.js';

const catalog = loadCatalog();
const CLIP = 'test/golden/inputs/cramped-clip.yaml';

type Line = { name: string; spare: number | null; pass: boolean };
type CheckOut = { checks: Line[]; failing: { name: string; spare: number | null }[]; limiting_check: { name: string; spare: number | null } | null };

const raw = parse(readFileSync(CLIP, 'utf8')) as Record<string, unknown>;
const req = readRequirements(raw, catalog);
const run = runDesign(req, { strategy: 'grid' });
const misses = run.result.nearestMisses.map((m) => candidateAt(run.problem, m.x, m.f));
// What the check command says of each miss, and its clash line (mm of coil clearance, negative when
// short); null where the miss is no spring a file can state (coils overlapping at free length).
const checked = misses.map((c) => {
  try {
    return check(springDocument(c, req), raw, { catalog }) as unknown as CheckOut;
  } catch {
    return null;
  }
});
const checkSpare = checked.map((out) => out?.checks.find((l) => l.name === 'clash') ?? null);

describe('clash in the unit of the check, in every output', () => {
  it('the scenario has nearest misses that fail clash (else the test proves nothing)', () => {
    expect(run.candidates).toEqual([]);
    expect(checkSpare.filter((l) => l && !l.pass).length).toBeGreaterThanOrEqual(1);
  });

  it("design's nearest-miss lines give the check's clearance shortfall in mm (SI) and in (US), not a %", async () => {
    for (const units of ['si', 'us'] as const) {
      const r = await cli('design', CLIP, '--units', units);
      const lines = r.stdout.split('\n').filter((l) => /^ {2}#\d+ fails:/.test(l));
      expect(lines).toHaveLength(misses.length);
      lines.forEach((l, i) => {
        const c = checkSpare[i];
        if (!c) return expect(l).toMatch(/clash by [\d.]+ (mm|in)\b/);
        if (c.pass) return expect(l).not.toContain('clash');
        expect(l).toContain(`clash by ${formatQuantity(-c.spare!, 'length', units)}`);
        expect(l).not.toMatch(/clash by [\d.]+%/);
      });
    }
  });

  it("design's JSON gives each miss's failing spare as the check's JSON does (SI)", async () => {
    const r = await cli('design', CLIP, '--json');
    const json = JSON.parse(r.stdout) as {
      infeasible: { nearest_misses: { failing_checks: Record<string, number>; failing_spare: Record<string, number> }[] };
    };
    json.infeasible.nearest_misses.forEach((m, i) => {
      expect(Object.keys(m.failing_spare)).toEqual(Object.keys(m.failing_checks));
      const c = checkSpare[i];
      if (!c || c.pass) return;
      expect(m.failing_spare.clash).toBeCloseTo(c.spare!, 9);
      expect(m.failing_spare.clash).toBeLessThan(0);
    });
  });
});

describe("stock's smallest-margin column and check's JSON", () => {
  it('shows clash in mm where clash is the smallest margin, as the miss line below it does', async () => {
    const r = await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv');
    const row = r.stdout.split('\n').find((l) => /^\s+\d+\s+SS-110-110-040/.test(l));
    expect(row, r.stdout).toBeDefined();
    const cell = row!.match(/clash ([-+][\d.]+ \w+)\s*$/);
    expect(cell, row).not.toBeNull();
    expect(cell![1]).toMatch(/^-[\d.]+ mm$/);
    const miss = r.stdout.split('\n').find((l) => l.includes('SS-110-110-040 (line') && l.includes('fails clash'))!;
    expect(miss).toContain(`fails clash by ${cell![1].slice(1)} (`);
  });

  it('check --json gives the limiting check and each failing check their spare in the check unit', () => {
    const out = checked[checkSpare.findIndex((l) => l && !l.pass)]!;
    const clash = out.checks.find((l) => l.name === 'clash')!;
    expect(out.failing.find((f) => f.name === 'clash')?.spare).toBe(clash.spare);
    expect(out.limiting_check).not.toBeNull();
    expect(out.limiting_check!.spare).toBe(out.checks.find((l) => l.name === out.limiting_check!.name)!.spare);
  });
});
