// The extension catalog the CLI loads at run time is the JSON the build wrote from
// catalogs/extension.yaml after validating it against the materials (scripts/build.mjs), as for the
// main catalog. A property of our own build, no outside values.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { catalogDirectory, loadCatalog } from '../../../src/catalogs/load.js';
import { loadExtensionCatalog, loadExtensionCatalogFromYaml, PREBUILT_EXTENSION_CATALOG } from '../../../src/kinds/extension/catalog.js';

const fromYaml = loadExtensionCatalogFromYaml(catalogDirectory(), loadCatalog().materials);
const built = ['dist/cli', 'dist/src/kinds/extension'].map((dir) => join(dir, PREBUILT_EXTENSION_CATALOG));

describe('pre-validated extension catalog', () => {
  it('from source, the YAML is read and validated (no JSON beside src/)', () => {
    expect(existsSync(join('src/kinds/extension', PREBUILT_EXTENSION_CATALOG))).toBe(false);
    expect(loadExtensionCatalog(loadCatalog().materials)).toEqual(fromYaml);
  });

  it('the validated catalog survives JSON exactly', () => {
    expect(JSON.parse(JSON.stringify(fromYaml))).toStrictEqual(fromYaml);
  });

  it.each(built)('%s, written by the build, equals the validated YAML (if not: npm run build)', (file) => {
    expect(existsSync(file), `${file} is missing: npm ci or npm run build writes it`).toBe(true);
    expect(JSON.parse(readFileSync(file, 'utf8')), `${file} is stale: run npm run build after editing catalogs/extension.yaml`).toStrictEqual(fromYaml);
  });
});
