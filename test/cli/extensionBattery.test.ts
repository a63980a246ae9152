// source: none needed; nothing here is checked against a value from outside the project.
// Bad input in extension-spring files and options, through the CLI in-process, under the contract of
// the standing battery (test/cli/battery.test.ts): the exit code, one line on stderr naming the field or
// option, nothing on stdout, no stack trace, no NaN/Infinity/undefined, nothing written. No outside
// values: the inputs are our own demo scenario (the pedal bin).
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';
import { changed } from './battery.cases.js';

const SPRING = parse(readFileSync('examples/extension-pedal-bin-spring.yaml', 'utf8')) as Record<string, unknown>;
const REQ = parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8')) as Record<string, unknown>;
const DELETE = undefined;

interface Case {
  name: string;
  command: 'analyze' | 'design' | 'frontier' | 'sweep';
  change?: Record<string, unknown>;
  args?: string[];
  code?: number;
  field: string;
}

const spring = (name: string, change: Record<string, unknown>, field: string): Case => ({ name: `spring: ${name}`, command: 'analyze', change, field });
const req = (name: string, change: Record<string, unknown>, field: string, command: Case['command'] = 'design'): Case => ({
  name: `requirements: ${name}`,
  command,
  change,
  field,
});

const CASES: Case[] = [
  spring('kind is not a spring kind', { kind: 'helical' }, 'kind'),
  spring('kind is a number', { kind: 5 }, 'kind'),
  spring('loop type unknown', { loop: 'hook' }, 'loop'),
  spring('extended loop without its length', { loop: 'extended' }, 'loop_length'),
  spring('loop_length and free_length both', { loop_length: 7, free_length: 50 }, 'loop_length, free_length'),
  spring('free length inside the body', { free_length: 20 }, 'free_length'),
  spring('initial tension missing', { initial_tension: DELETE }, 'initial_tension'),
  spring('initial tension negative', { initial_tension: -3 }, 'initial_tension'),
  spring('initial tension a length', { initial_tension: '5 mm' }, 'initial_tension'),
  spring('initial tension not a number', { initial_tension: 'tight' }, 'initial_tension'),
  spring('body coils missing', { body_coils: DELETE }, 'body_coils'),
  spring('body coils zero', { body_coils: 0 }, 'body_coils'),
  spring('bend radius below half the wire', { bend_radius: 0.3 }, 'bend_radius'),
  spring('loop radius below half the wire', { loop_radius: 0.1 }, 'loop_radius'),
  spring('a length shorter than the free length', { lengths: [60, 40] }, 'lengths[1]'),
  spring('a force below the initial tension', { lengths: DELETE, forces: [3, 30] }, 'forces[0]'),
  spring('lengths and forces both', { forces: [30] }, 'lengths, forces'),
  spring('mean and outer diameter both', { outer_diameter: 9.5 }, 'mean_diameter'),
  spring('a compression field (ends)', { ends: 'squared' }, 'ends'),
  spring('a compression field (active_coils)', { active_coils: 29 }, 'active_coils'),
  spring('cycles negative', { cycles: -5 }, 'cycles'),
  req('kind misspelt', { kind: 'extention' }, 'kind'),
  req('bend index below 1.5', { bend_index: 1 }, 'bend_index'),
  req('bend index a word', { bend_index: 'four' }, 'bend_index'),
  req('bend index absurd', { bend_index: 100 }, 'bend_index'),
  req('initial-tension range unknown', { initial_tension_range: 'tight' }, 'initial_tension_range'),
  req('loop type unknown', { loop: 'crochet' }, 'loop'),
  req('extended loop without its length', { loop: 'extended' }, 'loop_length'),
  req('operating length shorter than the working length', { operating_length: 50 }, 'operating_length'),
  req('operating force below the working force', { operating_force: 10 }, 'operating_force'),
  req('largest extended length inside the stroke', { 'envelope.max_extended_length': 70 }, 'envelope.max_extended_length'),
  req('body coils reversed', { body_coils: [40, 5] }, 'body_coils'),
  req('body coils one number', { body_coils: [5] }, 'body_coils'),
  req('coil step zero', { coil_step: 0 }, 'coil_step'),
  req('index too small for the loop formulas', { index: [1.5, 12] }, 'index[0]'),
  // The bounds compression requirements have, through the same shared readers (src/input/readers.ts,
  // limits in src/input/limits.ts): the review found every one of these accepted (or a crash, exit 1).
  req("wire sizes below the material's range", { wire_sizes: [0.01, 1] }, 'wire_sizes[0]'),
  req("wire sizes above the material's range", { wire_sizes: [1, 20] }, 'wire_sizes[1]'),
  req('wire sizes an unknown series', { wire_sizes: 'imperial' }, 'wire_sizes'),
  req('coil step finer than a hundredth of a turn', { coil_step: 0.001 }, 'coil_step'),
  req('coil step huge', { coil_step: 1e6 }, 'coil_step'),
  req('coil step as a word', { coil_step: 'fine' }, 'coil_step'),
  req('body coils beyond 1000', { body_coils: [5, 1e7] }, 'body_coils[1]'),
  req('body coils below one turn', { body_coils: [0.5, 10] }, 'body_coils[0]'),
  req('index upper bound absurd', { index: [4, 500] }, 'index[1]'),
  req('index reversed', { index: [12, 4] }, 'index'),
  req('index empty', { index: [] }, 'index'),
  req('diameter resolution 1e-9', { diameter_resolution: 1e-9 }, 'diameter_resolution'),
  req('diameter resolution 1e-4 mm', { diameter_resolution: '0.0001 mm' }, 'diameter_resolution'),
  req('diameter resolution zero', { diameter_resolution: 0 }, 'diameter_resolution'),
  req('diameter resolution huge', { diameter_resolution: '1 m' }, 'diameter_resolution'),
  req('diameter resolution as a force', { diameter_resolution: '0.01 N' }, 'diameter_resolution'),
  req('seed not whole', { seed: 1.5 }, 'seed'),
  req('seed beyond what a double holds exactly', { seed: 1e300 }, 'seed'),
  req('seed as a word', { seed: 'lucky' }, 'seed'),
  req('a compression rank key', { rank: 'relative_cost' }, 'rank'),
  req('a compression envelope field', { 'envelope.min_inner_diameter': 5 }, 'envelope.min_inner_diameter'),
  req('load missing', { load: DELETE }, 'load'),
  req('load force missing', { 'load.force': DELETE }, 'load.force'),
  req('load force a stress', { 'load.force': '20 MPa' }, 'load.force'),
  req('load tolerance 100%', { load_tolerance: '100%' }, 'load_tolerance'),
  req('frontier: a bad loop type', { loop: 'crochet' }, 'loop', 'frontier'),
  // The shared readers (src/input/readers.ts): the same rules as for compression requirements.
  req('material override with E below 2G', { material: { like: 'music-wire', elastic_modulus: '100 GPa' } }, 'material.elastic_modulus'),
  req(
    'material override in a list, E above 3G',
    { material: ['music-wire', { like: 'music-wire', elastic_modulus: '300 GPa' }] },
    'material[1].elastic_modulus',
  ),
  req('safety.static below 1', { 'safety.static': 0.8 }, 'safety.static'),
  req('safety.surge unknown key', { 'safety.sure': 2 }, 'safety.sure'),
  req('sweep: a bad bend index', { bend_index: 0 }, 'bend_index', 'sweep'),
  { name: 'option: --min-id is a compression limit', command: 'design', args: ['--min-id', '5'], field: '--min-id' },
  {
    name: 'option: --strategy grid on a space too large for the grid',
    command: 'design',
    change: { material: 'any', body_coils: [3, 1000], coil_step: 0.01 },
    args: ['--strategy', 'grid'],
    field: 'coil_step',
  },
  { name: 'option: --pick beyond the springs --spec can write', command: 'design', args: ['--spec', '{dir}/spec.html', '--pick', '99'], field: '--pick' },
  {
    name: 'option: analyze --spec of a spring without lengths or forces (no force to tolerance)',
    command: 'analyze',
    change: { lengths: undefined },
    args: ['--spec', '{dir}/spec.html'],
    field: '--spec',
  },
  { name: 'option: frontier --x of compression springs only', command: 'frontier', args: ['--x', 'fatigue_safety'], field: '--x' },
  { name: 'option: frontier --y of compression springs only', command: 'frontier', args: ['--y', 'static_safety'], field: '--y' },
  { name: 'option: sweep --vary of a bad bend index', command: 'sweep', args: ['--vary', 'bend_index=0:1:0.5'], field: '--vary' },
  {
    name: 'option: --set a bad initial_tension_range',
    command: 'design',
    args: ['--set', 'initial_tension_range=loose'],
    field: '--set initial_tension_range',
  },
];

const withoutEchoes = (text: string) => text.replace(/"(?:[^"\\]|\\.)*"/g, '""');

describe('extension bad-input battery', () => {
  it.each(CASES.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const base = c.command === 'analyze' ? SPRING : REQ;
    const doc = c.change
      ? changed(base, Object.fromEntries(Object.entries(c.change).map(([k, v]) => [k, v === undefined ? Symbol.for('coilfront-test-delete') : v])))
      : base;
    const outDir = mkdtempSync(join(tmpdir(), 'coilfront-xbattery-out-'));
    const input = join(mkdtempSync(join(tmpdir(), 'coilfront-xbattery-in-')), 'input.yaml');
    writeFileSync(input, stringify(stripDeleted(doc)));
    const args = (c.args ?? []).map((a) => a.replace('{dir}', outDir));
    if (c.command === 'sweep' && !args.includes('--vary')) args.push('--vary', 'envelope.max_outer_diameter=12:14:1');
    args.push('--report', join(outDir, 'report.html'));
    const r = await cli(c.command, input, ...args);
    expect(r.code, r.stderr).toBe(c.code ?? 2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.split('\n').filter((l) => l.trim() !== '');
    expect(lines, r.stderr).toHaveLength(1);
    expect(lines[0]).toMatch(/^coilfront: /);
    expect(lines[0]).toContain(c.field);
    expect(r.stderr).not.toMatch(/\n\s+at\s|\.(ts|js):\d+/);
    expect(withoutEchoes(r.stderr)).not.toMatch(/NaN|Infinity|undefined/);
    expect(readdirSync(outDir)).toEqual([]);
  });
});

/** Remove the fields marked for deletion. */
function stripDeleted(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(stripDeleted);
  if (v && typeof v === 'object')
    return Object.fromEntries(
      Object.entries(v)
        .filter(([, x]) => x !== Symbol.for('coilfront-test-delete'))
        .map(([k, x]) => [k, stripDeleted(x)]),
    );
  return v;
}
