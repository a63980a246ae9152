// No outside values here beyond the inch's definition (source: NIST SP 811, Appendix B.8: 1 in = 25.4 mm
// exactly, so 1 in^3 = 16387.064 mm^3).
// Wire volume is written in the volume unit of the chosen system: the LP bound of a volume-ranked design
// in the text and the HTML report, and the frontier plot's axis.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli, tempPath } from '../helpers.js';

const demo = 'examples/washer-trigger.yaml';

describe('wire volume in output', () => {
  it('the LP bound on wire volume is mm^3 in SI and in^3 in US customary, the same bound in both', async () => {
    const si = await cli('design', demo, '--rank', 'wire_volume', '--units', 'si');
    const us = await cli('design', demo, '--rank', 'wire_volume', '--units', 'us');
    const json = JSON.parse((await cli('design', demo, '--rank', 'wire_volume', '--json')).stdout);
    const siBound = /LP lower bound on wire volume[^:]*: ([\d.]+) mm\^3/.exec(si.stdout);
    const usBound = /LP lower bound on wire volume[^:]*: ([\d.e-]+) in\^3/.exec(us.stdout);
    expect(siBound).not.toBeNull();
    expect(usBound).not.toBeNull();
    expect(Number(siBound![1])).toBeCloseTo(json.lp_bound, 0);
    expect(Number(usBound![1]) * 16387.064).toBeCloseTo(json.lp_bound, 0); // mm^3 per in^3 (source: NIST SP 811, Appendix B.8)
  });

  it("the HTML report writes the bound and the frontier axis in the report's units", async () => {
    const path = tempPath('volume.html');
    const r = await cli('frontier', demo, '--x', 'wire_volume', '--units', 'us', '--report', path, '--output', tempPath('f.csv'));
    expect(r.code).toBe(0);
    const html = readFileSync(path, 'utf8');
    expect(html).toMatch(/wire volume \(in\^3\)/);
    expect(html).not.toMatch(/mm\^3/);
  });
});
