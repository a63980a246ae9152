// source: none needed (the reference is the seedrandom package itself): the Monte Carlo's uniform stream
// is seedrandom's default generator written over typed arrays, and must give the very same numbers.
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { Arc4Stream } from '../../../../src/kinds/compression/tolerance/arc4Stream.js';

const long = (n: number) => Array.from({ length: n }, (_, i) => String.fromCharCode(32 + ((i * 37) % 95))).join('');

describe('Arc4Stream gives the numbers seedrandom(seed)() gives', () => {
  it.each(['1', '0', '2026', '', 'washer-trigger', 'Grade 2 \u00e9\u6f22\ud83d\ude00', long(256), long(300), long(1000)])(
    'seed %j, 20,000 uniforms',
    (seed) => {
      const reference = seedrandom(seed);
      const stream = new Arc4Stream(seed);
      const out = new Float64Array(20_000);
      stream.fill(out);
      for (let m = 0; m < out.length; m++) if (out[m] !== reference()) expect.fail(`seed ${JSON.stringify(seed)}: uniform ${m} differs`);
    },
  );

  it('the seed of the Monte Carlo (1): the first 1,000,000 uniforms, drawn in uneven pieces and one by one', () => {
    const reference = seedrandom('1');
    const stream = new Arc4Stream('1');
    const buffer = new Float64Array(4099);
    let drawn = 0;
    for (let piece = 1; drawn < 1_000_000; piece = (piece * 7 + 3) % buffer.length) {
      stream.fill(buffer, piece);
      for (let m = 0; m < piece; m++, drawn++) if (buffer[m] !== reference()) expect.fail(`uniform ${drawn} differs`);
      if (stream.next() !== reference()) expect.fail(`uniform ${drawn} (one by one) differs`);
      drawn++;
    }
  });

  it('seeds given as numbers are read as seedrandom reads their string (the Monte Carlo passes String(seed))', () => {
    for (const seed of [1, 7, 123456789]) {
      const reference = seedrandom(String(seed));
      const stream = new Arc4Stream(String(seed));
      for (let m = 0; m < 1000; m++) expect(stream.next()).toBe(reference());
    }
  });

  it('every uniform lies in [0, 1)', () => {
    const out = new Float64Array(100_000);
    new Arc4Stream('edge').fill(out);
    expect(out.every((u) => u >= 0 && u < 1)).toBe(true);
  });
});
