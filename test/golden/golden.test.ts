// source: none needed (our own recorded outputs, no outside values). Byte-identical outputs (issue 7): the seam restructuring moves code, never output. Each case runs
// the CLI in-process and compares stdout, stderr and the exit code with the recorded files.
// Record again (only for a deliberate behaviour change, in its own commit): GOLDEN_UPDATE=1 npx vitest run test/golden
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli, tempPath } from '../helpers.js';
import { GOLDEN_CASES } from './cases.js';

const dir = 'test/golden/expected';
const update = process.env.GOLDEN_UPDATE === '1';

describe('outputs stay byte-identical', () => {
  for (const c of GOLDEN_CASES) {
    it(`coilfront ${c.args.join(' ')}`, async () => {
      const out = c.output ? tempPath(c.name) : '';
      const r = await cli(...c.args.map((a) => (a === '{out}' ? out : a)));
      // A written file is recorded instead of the streams (stderr names the temporary path).
      const recorded = c.output
        ? `exit ${r.code}\n--- ${c.args[c.args.indexOf('{out}') - 1]}\n${readFileSync(out, 'utf8')}`
        : `exit ${r.code}\n--- stderr\n${r.stderr}--- stdout\n${r.stdout}`;
      const path = join(dir, c.name);
      if (update) {
        mkdirSync(dir, { recursive: true });
        writeFileSync(path, recorded);
      }
      expect(existsSync(path), `${path} is recorded (GOLDEN_UPDATE=1 to record)`).toBe(true);
      expect(recorded === readFileSync(path, 'utf8'), `${c.name} differs from its recording`).toBe(true);
    }, 60_000);
  }
});
