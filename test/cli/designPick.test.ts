// source: none needed (which option the refusal points to).
// --pick past the list points to the option that lists more (audit finding 14: the washer trigger's
// per-wire list has one row, and the message said "--top lists more" though --top 20 still lists one
// row; --variants is what lists more).
import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, tempPath } from '../helpers.js';

describe('design --pick beyond the list', () => {
  it('a per-wire list that ends with its wires points to --variants, and writes nothing', async () => {
    const out = tempPath('p.yaml');
    const r = await cli('design', 'examples/washer-trigger.yaml', '--pick', '2', '--top', '20', '--spring-file', out);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--pick: expected a rank from 1 to 1 \(.*--variants lists every feasible spring\)/);
    expect(r.stderr).not.toMatch(/--top lists more/);
    expect(existsSync(out)).toBe(false);
  });

  it('a full list points to --top', async () => {
    const r = await cli('design', 'examples/washer-trigger.yaml', '--variants', '--top', '10', '--pick', '12', '--spring-file', tempPath('p.yaml'));
    expect(r.stderr).toMatch(/--pick: expected a rank from 1 to 10 \(the springs listed; --top lists more\)/);
    const ext = await cli('design', 'examples/extension-pedal-bin.yaml', '--pick', '6', '--spec', tempPath('p.html'));
    expect(ext.stderr).toMatch(/--pick: expected a rank from 1 to 5 \(the springs listed; --top lists more\)/);
  });

  it('a list of every feasible spring says so, pointing nowhere', async () => {
    const r = await cli('design', 'examples/washer-trigger.yaml', '--variants', '--top', '1000', '--pick', '30', '--spring-file', tempPath('p.yaml'));
    expect(r.stderr).toMatch(/--pick: expected a rank from 1 to 20 \(every feasible spring the search found is listed\)/);
  });
});
