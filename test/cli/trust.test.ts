// source: none needed; nothing here is checked against a value from outside the project.
// Issue 12's input-side behaviours that are not refusals (the refusals are rows of the battery in
// battery.cases.ts). No outside values: properties of our own CLI on our own demo scenarios.
import { readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, inputFile, tempPath } from '../helpers.js';

const demo = 'examples/washer-trigger.yaml';

describe('removing a setting is explicit', () => {
  it('--set path=none removes a limit; the JSON requirements show it gone', async () => {
    const r = await cli('design', demo, '--json', '--set', 'envelope.max_free_length=none');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.requirements.max_free_length).toBeNull();
    expect(j.requirements.max_outer_diameter).toBe(16);
  });
  it('--set path= (empty) is refused and says how to remove', async () => {
    const r = await cli('design', demo, '--set', 'envelope.max_free_length=');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('envelope.max_free_length=none');
  });
});

describe('cycles below 1e4 in design', () => {
  it('says the service is judged static, as analyze does', async () => {
    const r = await cli('design', demo, '--set', 'cycles=5000', '--top', '1');
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/cycles 5000 is below 1e4: judged as static service/);
    const a = await cli('analyze', inputFile(readFileSync('examples/valve-return-spring.yaml', 'utf8').replace('cycles: 2e6', 'cycles: 5000')));
    expect(a.stdout).toMatch(/below 1e4: judged as static service/);
  });
});

describe('files that are fine', () => {
  it('a UTF-8 byte-order mark is accepted', async () => {
    const text = readFileSync('examples/valve-return-spring.yaml', 'utf8');
    const path = tempPath('bom.yaml');
    writeFileSync(path, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(text)]));
    const plain = await cli('analyze', inputFile(text));
    const bom = await cli('analyze', path);
    expect(bom.code).toBe(0);
    expect(bom.stdout).toBe(plain.stdout);
  });
  it('the same requirements in JSON design the same springs', async () => {
    const { parse } = await import('yaml');
    const json = inputFile(JSON.stringify(parse(readFileSync(demo, 'utf8'))), 'json');
    const a = JSON.parse((await cli('design', demo, '--json')).stdout);
    const b = JSON.parse((await cli('design', json, '--json')).stdout);
    expect(b.candidates).toEqual(a.candidates);
  });
});

describe('frontier output paths', () => {
  it('a refused --report leaves -o unwritten (every path is checked first)', async () => {
    const csv = tempPath('new.csv');
    const html = tempPath('exists.html');
    writeFileSync(html, 'keep');
    const r = await cli('frontier', demo, '-o', csv, '--report', html);
    expect(r.code).toBe(2);
    expect(() => readFileSync(csv)).toThrow();
    expect(readFileSync(html, 'utf8')).toBe('keep');
  });
});

describe('the demo story agrees with its file', () => {
  it('README and the example comment give the same pin and inside diameter as the file', () => {
    const file = readFileSync(demo, 'utf8');
    const readme = readFileSync('README.md', 'utf8');
    expect(file).toMatch(/min_inner_diameter: 6\.5/);
    for (const text of [file.replace(/\n# /g, ' '), readme]) expect(text).toContain('6 mm guide pin (inside diameter at least 6.5 mm');
  });
});
