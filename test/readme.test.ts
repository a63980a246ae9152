// The README stays true (a property of our own docs, no outside values): its demo excerpt is what
// `design` prints today, and its two command lines exist as written.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli } from './helpers.js';

const readme = readFileSync('README.md', 'utf8');
const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { scripts: Record<string, string>; bin: Record<string, string> };

describe('README', () => {
  it('opens with the job, then the demo and test command lines', () => {
    const lines = readme.split('\n');
    expect(lines[0]).toBe('# coilfront');
    const commands = lines.filter((l) => /^ {4}npm /.test(l)).map((l) => l.trim());
    expect(commands.slice(0, 2)).toEqual(['npm ci && npm run demo', 'npm test']);
    expect(pkg.scripts.demo).toContain('analyze examples/');
    expect(pkg.scripts.demo).toContain('design examples/washer-trigger.yaml');
  });

  it("the demo script's commands all run and succeed", async () => {
    // Each step runs the installed command (package.json bin); here it runs in-process from source.
    const bin = `node ${pkg.bin.coilfront} `;
    const commands = pkg.scripts.demo.split('&&').map((c) => c.trim());
    for (const c of commands) expect(c.startsWith(bin), c).toBe(true);
    const steps = commands.map((c) => c.slice(bin.length).trim().split(/\s+/));
    expect(steps.length).toBeGreaterThanOrEqual(2);
    for (const args of steps) {
      const r = await cli(...args);
      expect(r.code, args.join(' ')).toBe(0);
      expect(r.stdout).toMatch(/Cautions:/);
    }
  });

  it('shows demo output that the demo really prints', async () => {
    const section = readme.slice(readme.indexOf('## The demo'));
    const block = section.slice(section.indexOf('```\n') + 4, section.indexOf('\n```', section.indexOf('```\n') + 4));
    const out = (await cli('design', 'examples/washer-trigger.yaml')).stdout;
    const shown = block.split('\n').filter((l) => l.trim() !== '...' && l.trim() !== '');
    expect(shown.length).toBeGreaterThan(5);
    for (const line of shown) expect(out, line).toContain(line);
  });

  it('shows the robust design (min_yield 0.99) that the command it gives really prints', async () => {
    const section = readme.slice(readme.indexOf('## The demo'));
    const command = section.indexOf('--set min_yield=0.99');
    expect(command).toBeGreaterThan(0);
    const from = section.indexOf('```\n', command) + 4;
    const block = section.slice(from, section.indexOf('\n```', from));
    const out = (await cli('design', 'examples/washer-trigger.yaml', '--set', 'min_yield=0.99')).stdout;
    const shown = block.split('\n').filter((l) => l.trim() !== '');
    expect(shown.length).toBeGreaterThan(2);
    for (const line of shown) expect(out, line).toContain(line);
  });

  it('carries the safety cautions', () => {
    expect(readme).toMatch(/verify material figures and tolerances with your spring supplier/);
    expect(readme).toMatch(/test prototypes/);
    expect(readme).toMatch(/licensed engineering practice/);
  });
});
