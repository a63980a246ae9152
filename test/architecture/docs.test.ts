// source: none needed (no outside values here): the layout the README and DEVELOPERS.md show is the one src/ has (issue 7:
// "the layout shows the kinds and the registries at a glance"), and DEVELOPERS.md gives each folder
// the layer this test folder enforces.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LAYER } from './layers.js';

const dirs = (d: string) =>
  readdirSync(d)
    .filter((n) => statSync(join(d, n)).isDirectory())
    .sort();
/** Every folder of src/ and, below src/kinds/, every folder of a kind: what the layout must show. */
const actual = [
  ...dirs('src').map((d) => `src/${d}/`),
  ...dirs('src/kinds').flatMap((k) => [`src/kinds/${k}/`, ...dirs(`src/kinds/${k}`).map((d) => `src/kinds/${k}/${d}/`)]),
].sort();

/** The folders a layout block names: `src/x/` lines (several on a line, comma-separated; a second may
 * drop the `src/`), and indented `name/` lines below src/kinds/ (two spaces: a kind, four: its folder). */
function shown(doc: string, opening: string): { path: string; layer?: number }[] {
  const start = doc.indexOf(opening);
  const block = doc.slice(start, doc.indexOf('```', start + opening.length));
  const out: { path: string; layer?: number }[] = [];
  let kind = '';
  for (const line of block.split('\n')) {
    const top = /^(src\/[a-z]+\/(?:, (?:src\/)?[a-z]+\/)*)\s+(?:(\d)\s+)?\S/.exec(line);
    if (top) {
      for (const p of top[1].split(', ')) out.push({ path: p.startsWith('src/') ? p : `src/${p}`, layer: top[2] === undefined ? undefined : Number(top[2]) });
      continue;
    }
    const nested = /^( {2}| {4})([a-z]+\/)\s/.exec(line);
    if (!nested) continue;
    if (nested[1].length === 2) out.push({ path: (kind = `src/kinds/${nested[2]}`) });
    else out.push({ path: `${kind}${nested[2]}` });
  }
  return out;
}

describe('the documented layout', () => {
  it("the README's architecture section names every folder of src/ and of each kind, and no other", () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(
      shown(readme, '```\nsrc/units/')
        .map((s) => s.path)
        .sort(),
    ).toEqual(actual);
  });

  it('DEVELOPERS.md names the same folders, each top folder with the layer the architecture test enforces', () => {
    const dev = readFileSync('DEVELOPERS.md', 'utf8');
    const rows = shown(dev, '```\nsrc/units/');
    expect(rows.map((s) => s.path).sort()).toEqual(actual);
    for (const r of rows.filter((r) => r.path.split('/').length === 3)) expect(r.layer, r.path).toBe(LAYER[r.path.split('/')[1]]);
  });
});
