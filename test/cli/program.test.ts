// The command line as a program (no outside values; each check is a property of our CLI): help,
// version, progress on a terminal only, JSON for every command.
import { describe, expect, it } from 'vitest';
import { run } from '../../src/cli/run.js';
import { cli } from '../helpers.js';

describe('coilfront program', () => {
  it('--version prints the package version', async () => {
    const r = await cli('--version');
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it('--help lists the commands and the options', async () => {
    const r = await cli('--help');
    expect(r.code).toBe(0);
    for (const c of ['analyze', 'design', 'frontier', 'sweep']) expect(r.stdout).toContain(c);
    const d = await cli('design', '--help');
    for (const o of ['--json', '--units', '--set', '--max-od', '--strategy', '--report']) expect(d.stdout).toContain(o);
  });

  it('an unknown command exits 2 with a hint', async () => {
    const r = await cli('desing', 'x.yaml');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/unknown command/);
  });

  it('shows a progress bar on stderr only when stderr is a terminal; stdout carries only the result', async () => {
    let out = '';
    let err = '';
    const code = await run(['design', 'examples/washer-trigger.yaml', '--json'], {
      stdout: (t) => {
        out += t;
      },
      stderr: (t) => {
        err += t;
      },
      interactive: true,
    });
    expect(code).toBe(0);
    expect(err).toMatch(/searching \[#+ *\] \d+%/);
    expect(() => JSON.parse(out)).not.toThrow();
    const quiet = await cli('design', 'examples/washer-trigger.yaml', '--json');
    expect(quiet.stderr).toBe('');
  });

  it('frontier and sweep speak JSON too, in SI', async () => {
    const f = await cli('frontier', 'examples/washer-trigger.yaml', '--x', 'mass', '--y', 'fatigue_safety', '--json');
    expect(f.code).toBe(0);
    const fj = JSON.parse(f.stdout);
    expect(fj.units.mass).toBe('kg');
    expect(fj.frontier.length).toBeGreaterThan(1);
    // Maximising the fatigue safety factor against mass: along the front, both rise together.
    for (let i = 1; i < fj.frontier.length; i++) {
      expect(fj.frontier[i].mass).toBeGreaterThanOrEqual(fj.frontier[i - 1].mass);
      expect(fj.frontier[i].fatigue_safety).toBeGreaterThan(fj.frontier[i - 1].fatigue_safety);
    }
    const s = await cli('sweep', 'examples/washer-trigger.yaml', '--vary', 'envelope.max_free_length=50:60:5', '--json');
    expect(s.code).toBe(0);
    const sj = JSON.parse(s.stdout);
    expect(sj.rows).toHaveLength(3);
    expect(s.stdout).not.toMatch(/NaN|Infinity/);
  });

  it('US output writes inches, pounds-force and kpsi (stresses)', async () => {
    const r = await cli('design', 'examples/washer-trigger.yaml', '--units', 'us', '--top', '3');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/d in\s+D in\s+OD in/);
    expect(r.stdout).toMatch(/forces lbf/);
    expect(r.stdout).toMatch(/tau max kpsi/);
  });

  it('materials lists every catalog material and series with its source; JSON carries every source', async () => {
    const r = await cli('materials');
    expect(r.code).toBe(0);
    for (const id of ['music-wire', 'stainless-302', 'en10270-1-dm', 'steel-wire-gauge']) expect(r.stdout).toContain(id);
    expect(r.stdout).toMatch(/cost: the relative cost of the wire per unit mass, hard-drawn carbon steel = 1\.0/);
    const j = JSON.parse((await cli('materials', '--json')).stdout);
    expect(j.materials.length).toBeGreaterThanOrEqual(10);
    for (const m of j.materials) for (const src of Object.values(m.sources)) expect(String(src).length).toBeGreaterThan(3);
    expect(j.wire_series.every((s: { source: string }) => s.source.length > 3)).toBe(true);
  });
});
