// Runs the bad-input battery (test/cli/battery.cases.ts) through the CLI in-process. For every row: the
// exit code, one line on stderr naming the field, nothing on stdout, no stack trace, no NaN, Infinity or
// undefined in anything printed (echoes of the user's own text excepted), nothing written, and the
// process-wide Object.prototype untouched. No outside values: the inputs are our own scenarios.
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';
import { BAD_CASES, GOOD_REQUIREMENTS, GOOD_SPRING, type BadCase } from './battery.cases.js';

function inputPath(c: BadCase, dir: string): string {
  if (c.file?.path) return c.file.path;
  const path = join(dir, `input.${c.file?.ext ?? 'yaml'}`);
  if (c.file?.bytes) writeFileSync(path, c.file.bytes);
  else writeFileSync(path, c.file?.text ?? stringify(c.command === 'analyze' ? GOOD_SPRING : GOOD_REQUIREMENTS));
  return path;
}

/** The output as checked for NaN, Infinity and undefined: quoted echoes of the user's input removed. */
const withoutEchoes = (text: string) => text.replace(/"(?:[^"\\]|\\.)*"/g, '""');

describe('the bad-input battery', () => {
  it('holds at least 150 cases, each with a field to name', () => {
    expect(BAD_CASES.length).toBeGreaterThanOrEqual(150);
    const names = BAD_CASES.map((c) => c.name);
    expect(new Set(names).size).toBe(names.length);
    for (const c of BAD_CASES) expect(c.field.length, c.name).toBeGreaterThan(0);
  });

  it.each(BAD_CASES.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const outDir = mkdtempSync(join(tmpdir(), 'coilfront-battery-out-'));
    const inDir = mkdtempSync(join(tmpdir(), 'coilfront-battery-in-'));
    for (const f of c.existing ?? []) writeFileSync(join(outDir, f), 'keep');
    const input = inputPath(c, inDir);
    const args = (c.args ?? []).map((a) => a.replace('{dir}', outDir).replace('{input}', input));
    // Every command is also asked for an output file: a refused input must leave it unwritten.
    if (!args.some((a) => a === '--report' || a === '-o' || a === '--output') && c.command !== 'sweep') args.push('--report', join(outDir, 'report.html'));
    const inputBefore = c.file?.path ? undefined : readFileSync(input);

    const r = await cli(c.command, input, ...args);

    expect(r.code, r.stderr).toBe(c.code);
    expect(r.stdout).toBe('');
    const lines = r.stderr.split('\n').filter((l) => l.trim() !== '');
    expect(lines, r.stderr).toHaveLength(1);
    expect(lines[0]).toMatch(/^coilfront: /);
    expect(lines[0]).toContain(c.field);
    expect(lines[0].length, 'a readable message').toBeLessThan(700);
    expect(r.stderr).not.toMatch(/\n\s+at\s|\.(ts|js):\d+/);
    expect(withoutEchoes(r.stderr)).not.toMatch(/NaN|Infinity|undefined/);
    expect(readdirSync(outDir).sort()).toEqual([...(c.existing ?? [])].sort());
    for (const f of c.existing ?? []) expect(readFileSync(join(outDir, f), 'utf8')).toBe('keep');
    if (inputBefore) expect(readFileSync(input).equals(inputBefore)).toBe(true);
    expect(Object.prototype).not.toHaveProperty('cycles');
    expect(Object.getOwnPropertyNames(Object.prototype)).not.toContain('x');
  });
});
