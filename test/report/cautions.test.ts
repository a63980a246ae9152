// source: none needed; the cautions are coilfront's own words, checked against each other (text, JSON,
// library, README), for both spring kinds.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { analyze, check, design, frontier, stock, sweep } from '../../src/index.js';
import { loadCatalog } from '../../src/catalogs/load.js';
import { cautionsOf, cautionText, generalCautions } from '../../src/report/cautions.js';
import { extension } from '../../src/kinds/extension/index.js';
import { compression } from '../../src/kinds/compression/index.js';
import { cli } from '../helpers.js';

const read = (path: string): Record<string, unknown> => parse(readFileSync(path, 'utf8'));
const demo = 'examples/washer-trigger.yaml';
const valve = 'examples/valve-return-spring.yaml';
const dispenser = 'examples/stock-dispenser.yaml';
const table = 'examples/stock-springs.csv';
const bin = 'examples/extension-pedal-bin.yaml';
const binSpring = 'examples/extension-pedal-bin-spring.yaml';

/** The lines of the "Cautions:" block a text output ends with (stdout or stderr). */
function textCautions(text: string): string[] {
  const at = text.lastIndexOf('Cautions:\n');
  expect(at, 'a Cautions: block').toBeGreaterThanOrEqual(0);
  return text
    .slice(at + 'Cautions:\n'.length)
    .split('\n')
    .filter((l) => l.startsWith('  - '))
    .map((l) => l.slice(4));
}

const COMMANDS: { kind: 'compression' | 'extension'; args: string[] }[] = [
  { kind: 'compression', args: ['design', demo] },
  { kind: 'compression', args: ['analyze', valve] },
  { kind: 'compression', args: ['frontier', demo] },
  { kind: 'compression', args: ['sweep', demo, '--vary', 'envelope.max_outer_diameter=14:16:2'] },
  { kind: 'compression', args: ['check', valve, demo] },
  { kind: 'compression', args: ['stock', dispenser, table] },
  { kind: 'extension', args: ['design', bin] },
  { kind: 'extension', args: ['analyze', binSpring] },
  { kind: 'extension', args: ['frontier', bin] },
  { kind: 'extension', args: ['sweep', bin, '--vary', 'envelope.max_outer_diameter=12:14:2'] },
  { kind: 'extension', args: ['check', binSpring, bin] },
];

describe('every result carries the cautions of its kind', () => {
  for (const { kind, args } of COMMANDS) {
    it(`${args[0]} of ${kind === 'extension' ? 'an' : 'a'} ${kind} spring: --json holds the lines the text output ends with`, async () => {
      const text = await cli(...args);
      const json = await cli(...args, '--json');
      const record = JSON.parse(json.stdout) as { cautions?: unknown };
      const shown = textCautions(text.stdout + text.stderr);
      expect(record.cautions).toStrictEqual(shown);
      expect(record.cautions).toStrictEqual(cautionsOf(kind === 'extension' ? extension : compression));
      expect(json.stdout + json.stderr).not.toMatch(/Cautions:/);
    });
  }

  it('the library returns them as the command prints them, for both kinds', () => {
    const both = (r: { cautions?: unknown }, kind: typeof compression | typeof extension) => expect(r.cautions).toStrictEqual(cautionsOf(kind));
    both(design(read(demo)), compression);
    both(analyze(read(valve)), compression);
    both(frontier(read(demo)), compression);
    both(sweep(read(demo), { vary: 'envelope.max_outer_diameter=14:16:2' }), compression);
    both(check(read(valve), read(demo)), compression);
    both(stock(read(dispenser), readFileSync(table, 'utf8')), compression);
    both(design(read(bin)), extension);
    both(analyze(read(binSpring)), extension);
    both(check(read(binSpring), read(bin)), extension);
  });
});

describe('the wording fits the kind', () => {
  it('a compression spring is compressed, an extension spring stretched, and only the extension adds the draw-bar caution', () => {
    expect(generalCautions('compression').join(' ')).toMatch(/a compressed spring stores energy/);
    expect(generalCautions('extension').join(' ')).toMatch(/a stretched spring stores energy/);
    expect(cautionsOf(extension).join(' ')).not.toMatch(/compressed spring/);
    expect(cautionsOf(extension).at(-1)).toMatch(/draw-bar arrangement or fit a guard/);
    expect(cautionsOf(compression).join(' ')).not.toMatch(/draw-bar/);
    expect(cautionText(extension).split('\n')).toStrictEqual(['Cautions:', ...cautionsOf(extension).map((c) => `  - ${c}`)]);
  });

  it('the extension text and HTML outputs never call the spring compressed', async () => {
    for (const args of [
      ['design', bin],
      ['analyze', binSpring],
      ['check', binSpring, bin],
    ]) {
      const r = await cli(...args);
      expect(r.stdout + r.stderr, args.join(' ')).not.toMatch(/compressed spring/);
    }
    const spring = extension.readSpring(read(binSpring), loadCatalog());
    const html = await extension.report.analysisHtml!(spring, extension.analyse(spring), 'si');
    expect(html).toMatch(/a stretched spring stores energy/);
    expect(html).not.toMatch(/compressed spring/);
  });

  it('the README says where the cautions are, and the JSON has them there', () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(readme).toMatch(/every `--json` output \(and every library result\) holds them as `cautions`/);
  });
});
