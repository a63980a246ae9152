// The catalog the CLI loads at run time is the JSON the build wrote from the YAML after validating
// it (scripts/build.mjs); the YAML stays the source of truth. A property of our own build, no
// outside values.
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { catalogDirectory, loadCatalog, loadCatalogFromYaml, PREBUILT_CATALOG } from '../../src/catalogs/load.js';

const fromYaml = loadCatalogFromYaml(catalogDirectory());
const built = ['dist/cli', 'dist/src/catalogs'].map((dir) => join(dir, PREBUILT_CATALOG));

describe('pre-validated catalog', () => {
  it('from source, loadCatalog reads and validates the YAML (no JSON beside src/)', () => {
    expect(existsSync(join('src/catalogs', PREBUILT_CATALOG))).toBe(false);
    expect(loadCatalog()).toEqual(fromYaml);
  });

  it('the validated catalog survives JSON exactly: every number, string and flag', () => {
    expect(JSON.parse(JSON.stringify(fromYaml))).toStrictEqual(fromYaml);
  });

  it.each(built)('%s, written by the build, equals the validated YAML (if not: npm run build)', (file) => {
    expect(existsSync(file), `${file} is missing: npm ci or npm run build writes it`).toBe(true);
    expect(JSON.parse(readFileSync(file, 'utf8')), `${file} is stale: run npm run build after editing catalogs/*.yaml`).toStrictEqual(fromYaml);
  });

  describe('a YAML error still names the file (the validator runs at build time on the same files)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coilfront-catalog-'));
    afterAll(() => rmSync(dir, { recursive: true, force: true }));
    it('rejects a malformed materials.yaml', () => {
      writeFileSync(join(dir, 'materials.yaml'), 'materials: [\n');
      writeFileSync(join(dir, 'wire-series.yaml'), readFileSync(join(catalogDirectory(), 'wire-series.yaml')));
      expect(() => loadCatalogFromYaml(dir)).toThrow(/materials\.yaml: not valid YAML/);
      expect(() => loadCatalog(dir)).toThrow(/materials\.yaml: not valid YAML/);
    });
  });
});
