// source: none needed; nothing here is checked against a value from outside the project.
// A life with no stroke (review finding): `cycles` given without `operating_length` leaves one working
// length, which is no load cycle, so no fatigue check can be made. `check` says so; `design` said
// nothing and dropped the check. It now says so on stderr and in its JSON and HTML notes, in the same
// words as `check`, and still designs (the same file is valid for check, stock and design alike).
// Our own demo scenario (the washer trigger, invented).
import { readFileSync } from 'node:fs';
import { parse, stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { cli, inputFile, tempPath } from '../../helpers.js';

const NOTE = 'cycles given without operating_length: one working length is no load cycle (no fatigue check)';
const demo = parse(readFileSync('examples/washer-trigger.yaml', 'utf8')) as Record<string, unknown>;
const { operating_length: _l, operating_force: _f, ...noStroke } = demo;
const file = inputFile(stringify({ ...noStroke, top: 2 }));

describe('design with cycles but no operating_length', () => {
  it('notes on stderr that no fatigue check is made, as check does, and still lists springs', async () => {
    const r = await cli('design', file);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`coilfront: note: ${NOTE}`);
    expect(r.stdout).toMatch(/^\s+1\s+stainless-302/m);
    const springFile = tempPath('spring.yaml');
    const w = await cli('design', file, '--spring-file', springFile);
    expect(w.code, w.stderr).toBe(0);
    const c = await cli('check', springFile, file);
    expect(c.stderr + c.stdout).toContain(NOTE);
  });

  it('puts the note in the JSON notes and on the HTML report', async () => {
    const report = tempPath('design.html');
    const r = await cli('design', file, '--json', '--report', report);
    expect(r.code).toBe(0);
    const json = JSON.parse(r.stdout) as { notes: string[]; counts?: unknown; cut_by: Record<string, number> };
    expect(json.notes).toEqual([NOTE]);
    expect(Object.keys(json.cut_by)).not.toContain('fatigue');
    expect(readFileSync(report, 'utf8')).toContain(`Note: ${NOTE}`);
  });

  it('with the stroke given, no note, and fatigue is judged', async () => {
    const r = await cli('design', inputFile(stringify({ ...demo, top: 2 })), '--json');
    const json = JSON.parse(r.stdout) as { notes: string[]; cut_by: Record<string, number> };
    expect(r.stderr).not.toContain('no fatigue check');
    expect(json.notes).toEqual([]);
    expect(Object.keys(json.cut_by)).toContain('fatigue');
  });
});
