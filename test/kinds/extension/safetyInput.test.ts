// Extension requirements and spring files refuse a safety factor or surge margin below 1, as compression
// ones do (test/cli/battery.cases.ts): below 1 the spring would be designed past its own allowable.
// No outside values: the inputs are the pedal-bin demo, a scenario of our own (source: none needed).
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadCatalog } from '../../../src/catalogs/load.js';
import { readExtensionRequirements } from '../../../src/kinds/extension/requirements.js';
import { readExtensionSpring } from '../../../src/kinds/extension/springFile.js';
import { InputError } from '../../../src/units/parse.js';
import { cli, inputFile } from '../../helpers.js';

const catalog = loadCatalog();
const demo = () => parse(readFileSync('examples/extension-pedal-bin.yaml', 'utf8')) as Record<string, unknown>;

describe('extension safety factors below 1', () => {
  it.each([
    ['static', 0.8],
    ['fatigue', 0.99],
    ['surge', 0.5],
  ] as const)('refuses safety.%s = %s, naming the field', (key, value) => {
    const doc = { ...demo(), safety: { [key]: value } };
    expect(() => readExtensionRequirements(doc, catalog)).toThrow(InputError);
    expect(() => readExtensionRequirements(doc, catalog)).toThrow(`safety.${key}: expected a number of at least 1`);
  });

  it('accepts a safety factor of exactly 1 (designing to the allowable itself)', () => {
    const req = readExtensionRequirements({ ...demo(), safety: { static: 1, fatigue: 1, surge: 1 } }, catalog);
    expect(req.safety).toEqual({ static: 1, fatigue: 1, surge: 1 });
  });

  it('refuses a spring file surge_margin below 1', () => {
    const spring = {
      kind: 'extension',
      units: 'si',
      material: 'music-wire',
      wire_diameter: 1.2,
      outer_diameter: 10,
      body_coils: 20,
      loop: 'full',
      initial_tension: 5,
      lengths: [60, 75],
      surge_margin: 0.5,
    };
    expect(() => readExtensionSpring(spring, catalog)).toThrow('surge_margin: expected a number of at least 1');
  });

  it('the CLI refuses it with exit 2 and one line naming the field, nothing on stdout', async () => {
    const r = await cli('design', inputFile(readFileSync('examples/extension-pedal-bin.yaml', 'utf8') + 'safety: { static: 0.8 }\n'));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain('safety.static: expected a number of at least 1');
  });
});
