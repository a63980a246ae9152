// source: none needed (the counts are compared with each other and with the same search run unpruned).
// A count of feasible springs is shown only as what it is: the whole space's count where the search
// judged every combination, else "feasible among those evaluated" with the skipped count beside it.
// Without the label a pruned count can grow with a longer life (audit finding 5: pedal bin, cycles
// 2e5 -> 6e5 -> 1e6 gave 18 -> 25 -> 21 while the true counts fall 95 -> 77).
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

const PEDAL_BIN = 'examples/extension-pedal-bin.yaml';

function csvRows(text: string): string[][] {
  return text
    .trim()
    .split('\n')
    .map((l) => l.split(','));
}

describe('feasible counts under pruning', () => {
  it('sweep CSV: the count is labelled feasible_evaluated with the skipped count beside it, and a note says rows are not comparable', async () => {
    const r = await cli('sweep', PEDAL_BIN, '--vary', 'cycles=200000:1000000:400000');
    expect(r.code).toBe(0);
    const [header, ...rows] = csvRows(r.stdout);
    expect(header).not.toContain('feasible_combinations');
    expect(header.slice(1, 3)).toEqual(['feasible_evaluated', 'skipped']);
    expect(rows).toHaveLength(3);
    for (const row of rows) expect(Number(row[2])).toBeGreaterThan(0);
    expect(r.stderr).toContain('rows are not comparable by it, and a row with more is not an easier requirement');
  });

  it('sweep JSON rows: feasible with pruned and feasible_complete beside it; complete counts never grow with the life', async () => {
    const r = await cli('sweep', PEDAL_BIN, '--vary', 'cycles=200000:1000000:400000', '--json');
    const rows = JSON.parse(r.stdout).rows as { feasible: number; pruned: number; feasible_complete: boolean }[];
    for (const row of rows) {
      expect(row.pruned).toBeGreaterThan(0);
      expect(row.feasible_complete).toBe(false);
    }
    // The same sweep unpruned (every feasible spring listed): the counts are whole and fall with the life.
    const full = await cli('sweep', PEDAL_BIN, '--vary', 'cycles=200000:1000000:400000', '--json', '--variants', '--top', '1000');
    const whole = JSON.parse(full.stdout).rows as { feasible: number; pruned: number; feasible_complete: boolean }[];
    expect(whole.map((w) => w.feasible_complete)).toEqual([true, true, true]);
    expect(whole[0].feasible).toBe(95);
    for (let i = 1; i < whole.length; i++) expect(whole[i].feasible).toBeLessThanOrEqual(whole[i - 1].feasible);
  });

  it('design text and JSON of a pruned grid say the count is of the combinations evaluated', async () => {
    const text = await cli('design', PEDAL_BIN);
    expect(text.stdout).toMatch(
      /Feasible among the combinations evaluated: 18; 1613 skipped unevaluated because .*\(so not the count of every feasible spring\)\./,
    );
    const json = JSON.parse((await cli('design', PEDAL_BIN, '--json')).stdout);
    expect(json).toMatchObject({ feasible: 18, pruned: 1613, feasible_complete: false });
  });

  it('a grid that skipped nothing gives the whole count, unlabelled', async () => {
    const json = JSON.parse((await cli('design', 'examples/washer-trigger.yaml', '--json')).stdout);
    expect(json).toMatchObject({ strategy: 'grid', pruned: 0, feasible_complete: true });
    expect((await cli('design', 'examples/washer-trigger.yaml')).stdout).toContain(`Feasible combinations: ${json.feasible}.`);
  });

  it("stock --compare's design count says whether it is whole (pruned extension design: no; grouped compression grid: yes)", async () => {
    const ext = JSON.parse((await cli('stock', 'examples/stock-extension-tray.yaml', 'examples/stock-extension-springs.csv', '--compare', '--json')).stdout);
    expect(ext.compare).toMatchObject({ design_feasible_complete: false });
    const comp = JSON.parse((await cli('stock', 'examples/stock-dispenser.yaml', 'examples/stock-springs.csv', '--compare', '--json')).stdout);
    expect(comp.compare).toMatchObject({ design_feasible_complete: true });
  });

  it('a genetic run counts only what it evaluated, and says so', async () => {
    const r = await cli('design', 'examples/washer-trigger.yaml', '--strategy', 'genetic', '--seed', '7');
    expect(r.stdout).toMatch(/Feasible among the combinations the genetic search evaluated: \d+/);
    const json = JSON.parse((await cli('design', 'examples/washer-trigger.yaml', '--strategy', 'genetic', '--seed', '7', '--json')).stdout);
    expect(json.feasible_complete).toBe(false);
  });
});
