// source: none needed. No outside values here: the dispatch on the `kind` field is coilfront's own interface (issue 7).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { KINDS, kindOf } from '../../src/kinds/index.js';
import { Check, COMPRESSION_CHECKS } from '../../src/kinds/compression/checks.js';
import { COMPRESSION_OBJECTIVES, Objective, RANK_KEYS } from '../../src/kinds/compression/objectives.js';
import { cli, inputFile } from '../helpers.js';

describe('spring kinds', () => {
  it('a document without kind is a compression spring, so every existing file keeps working', () => {
    expect(kindOf({ units: 'si' }).id).toBe('compression');
    expect(kindOf({ kind: 'compression' }).id).toBe('compression');
  });

  it('an unknown kind is refused naming the field and the kinds there are', () => {
    expect(() => kindOf({ kind: 'spiral' })).toThrow(/kind: expected one of .*compression/);
    expect(() => kindOf({ kind: 7 })).toThrow(/kind/);
  });

  it('every kind has a unique id and complete registries', () => {
    expect(new Set(KINDS.map((k) => k.id)).size).toBe(KINDS.length);
    for (const k of KINDS) {
      expect(k.checks.length).toBeGreaterThan(0);
      expect(k.objectives.length).toBeGreaterThan(0);
      expect(k.fields.length).toBeGreaterThan(0);
    }
  });

  it('kind: compression designs exactly as a file without kind (same bytes)', async () => {
    const demo = readFileSync('examples/washer-trigger.yaml', 'utf8');
    const plain = await cli('design', inputFile(demo), '--json');
    const said = await cli('design', inputFile(`kind: compression\n${demo}`), '--json');
    expect(said.code).toBe(0);
    expect(said.stdout).toBe(plain.stdout);
  });

  it('design and analyze refuse an unknown kind with exit 2 and one line', async () => {
    const r = await cli('analyze', inputFile('kind: conical\nunits: si\n'));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^coilfront: error: kind: expected one of compression/);
    expect(r.stdout).toBe('');
  });
});

describe('the compression registries', () => {
  it('Check holds each check at its index in the registry', () => {
    COMPRESSION_CHECKS.forEach((c, i) => expect(Check[c.name]).toBe(i));
    expect(Object.isFrozen(Check)).toBe(true);
  });

  it('Objective puts the ranked copy at 0 and the registry after it', () => {
    expect(Objective.rank).toBe(0);
    COMPRESSION_OBJECTIVES.forEach((o, i) => expect(Objective[o.key]).toBe(i + 1));
  });

  it('relative_cost is a frontier axis and not a rank key: one list decides both', () => {
    expect(RANK_KEYS).not.toContain('relative_cost');
    expect(COMPRESSION_OBJECTIVES.find((o) => o.key === 'relative_cost')?.frontierAxis).toBe(true);
  });
});
