// The build after `tsc`: the catalogs read from their YAML and validated once, here, by the one
// validator (src/catalogs/load.ts, compiled), and written as JSON beside each built copy of that
// module; then the CLI bundled into dist/cli/ so that a run loads one file instead of a hundred
// modules. The YAML stays the source of truth: edit it and build again.
// Usage: node scripts/build.mjs (after tsc; `npm run build` does both).
import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { isDeepStrictEqual } from 'node:util';
import { build } from 'esbuild';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const cliDir = join(root, 'dist', 'cli');

const { loadCatalogFromYaml, PREBUILT_CATALOG } = await import(join(root, 'dist', 'src', 'catalogs', 'load.js'));
const catalog = loadCatalogFromYaml(join(root, 'catalogs'));
const json = JSON.stringify(catalog);
// JSON must give back exactly what the validator made: a field JSON cannot hold (NaN, Infinity,
// undefined, a Map) fails the build here instead of changing a figure at run time.
if (!isDeepStrictEqual(JSON.parse(json), catalog)) {
  throw new Error('build: the validated catalog does not survive JSON unchanged (a value JSON cannot hold?)');
}

// The bundle: the entry and its lazily loaded chunks (reports, CSV) side by side with the catalog.
rmSync(cliDir, { recursive: true, force: true });
mkdirSync(cliDir, { recursive: true });
await build({
  entryPoints: { coilfront: join(root, 'src', 'cli', 'main.ts') },
  outdir: cliDir,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  chunkNames: 'chunk-[hash]',
  // Not minified: minifying measured no faster to start, and a readable bundle keeps stack traces
  // (COILFRONT_DEBUG=1) and licence comments as they are.
  // CommonJS dependencies (commander, the LP solver, seedrandom) call require() for Node's
  // built-ins; an ES module has none of its own, so the bundle makes one.
  banner: { js: "import { createRequire as __coilfrontRequire } from 'node:module'; const require = __coilfrontRequire(import.meta.url);" },
  logLevel: 'warning',
});

for (const dir of [cliDir, join(root, 'dist', 'src', 'catalogs')]) writeFileSync(join(dir, PREBUILT_CATALOG), json);
const files = readdirSync(cliDir).filter((f) => f.endsWith('.js'));
console.log(`build: catalog ${(json.length / 1024).toFixed(1)} KB (${catalog.materials.length} materials, ${catalog.series.length} wire series); CLI bundle dist/cli/coilfront.js + ${files.length - 1} chunk(s)`);

