// source: none needed. The deviates a built CLI reads for the default seed are the ones the Monte Carlo
// computes (scripts/build.mjs writes them): a property of our own build.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { DEVIATES_TABLE_FILE, DEVIATES_TABLE_LENGTH, DEVIATES_TABLE_SEED, computeDeviates } from '../../../../src/kinds/compression/tolerance/monteCarlo.js';
import { CONFIRM_SAMPLES } from '../../../../src/kinds/compression/tolerance/confirm.js';
import { TOLERANCED } from '../../../../src/kinds/compression/tolerance/model.js';

const computed = computeDeviates(DEVIATES_TABLE_SEED, DEVIATES_TABLE_LENGTH);

describe("the default seed's table of deviates", () => {
  it("covers a design's confirmation of one spring with the default seed", () => {
    expect(DEVIATES_TABLE_SEED).toBe('1');
    expect(DEVIATES_TABLE_LENGTH).toBe(CONFIRM_SAMPLES * TOLERANCED.length);
  });

  it("is the polar method's deviates of seedrandom('1'), taken in turn", () => {
    const uniform = seedrandom(DEVIATES_TABLE_SEED);
    for (let m = 0; m < 2000;) {
      const u = 2 * uniform() - 1;
      const v = 2 * uniform() - 1;
      const s = u * u + v * v;
      if (s >= 1 || s === 0) continue;
      const f = Math.sqrt((-2 * Math.log(s)) / s);
      expect(computed[m++]).toBe(u * f);
      expect(computed[m++]).toBe(v * f);
    }
  });

  it('running from source computes them (the build writes no table into src/)', () => {
    expect(existsSync(join('src/kinds/compression/tolerance', DEVIATES_TABLE_FILE))).toBe(false);
  });

  it('dist/cli has them, bit for bit (else: npm run build)', () => {
    const file = join('dist/cli', DEVIATES_TABLE_FILE);
    expect(existsSync(file), `${file} is missing: npm ci or npm run build writes it`).toBe(true);
    const bytes = readFileSync(file);
    expect(bytes.length).toBe(DEVIATES_TABLE_LENGTH * 8);
    for (let i = 0; i < DEVIATES_TABLE_LENGTH; i++)
      if (bytes.readDoubleLE(i * 8) !== computed[i]) expect.fail(`${file} differs from the computed deviates at ${i}: npm run build`);
  });
});
