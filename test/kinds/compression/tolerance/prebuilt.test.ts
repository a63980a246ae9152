// source: none needed. The tolerance catalog a built run loads is the JSON the build wrote from
// catalogs/tolerances.yaml after validating it (scripts/build.mjs): a property of our own build.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { catalogDirectory } from '../../../../src/catalogs/load.js';
import { PREBUILT_TOLERANCE_CATALOG, loadToleranceCatalog, loadToleranceCatalogFromYaml } from '../../../../src/kinds/compression/tolerance/catalog.js';

const validated = loadToleranceCatalogFromYaml(catalogDirectory());

describe('pre-validated tolerance catalog', () => {
  it('running from source reads the YAML (the build writes no JSON into src/)', () => {
    expect(existsSync(join('src/kinds/compression/tolerance', PREBUILT_TOLERANCE_CATALOG))).toBe(false);
    expect(loadToleranceCatalog()).toEqual(validated);
    expect(loadToleranceCatalog(catalogDirectory())).toEqual(validated);
  });

  it('holds nothing JSON would change', () => {
    expect(JSON.parse(JSON.stringify(validated))).toStrictEqual(validated);
  });

  for (const dir of ['dist/cli', 'dist/src/kinds/compression/tolerance']) {
    it(`${dir} has the validated YAML as JSON (else: npm run build)`, () => {
      const file = join(dir, PREBUILT_TOLERANCE_CATALOG);
      expect(existsSync(file), `${file} is missing: npm ci or npm run build writes it`).toBe(true);
      expect(JSON.parse(readFileSync(file, 'utf8')), `${file} is stale: npm run build after editing catalogs/tolerances.yaml`).toStrictEqual(validated);
    });
  }
});
