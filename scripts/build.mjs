// The build after `tsc`: the catalogs read from their YAML and validated once, here, by the one
// validator (src/catalogs/load.ts, compiled), and written as JSON beside each built copy of that
// module; then the CLI bundled into dist/cli/ so that a run loads one file instead of a hundred
// modules, with a V8 code cache so that it is not compiled again at each start. The YAML stays the
// source of truth: edit it and build again.
// Usage: node scripts/build.mjs (after tsc; `npm run build` does both).
import { spawnSync } from 'node:child_process';
import { isAscii } from 'node:buffer';
import { chmodSync, copyFileSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { isDeepStrictEqual } from 'node:util';
import { build } from 'esbuild';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(import.meta.url);

// Node's child_process and crypto cost a start about as much as all of coilfront's own modules (they
// pull in net, stream, dgram, the OpenSSL bindings...), and a run hardly ever uses them: commander
// requires child_process for subcommands run as separate programs (coilfront has none), the LP solver
// for an external solver it is never asked for, seedrandom crypto to seed itself when given no seed
// (coilfront always gives one). In the bundle each of them is a stand-in with every export of the real
// module as a getter that requires it on first use: same behaviour, no cost until then.
const LAZY_BUILTINS = ['child_process', 'crypto'];
const lazyBuiltins = {
  name: 'lazy-builtins',
  setup(b) {
    const filter = new RegExp(`^(node:)?(${LAZY_BUILTINS.join('|')})$`);
    b.onResolve({ filter }, (args) =>
      args.namespace === 'lazy-builtin' ? { path: args.path, external: true } : { path: args.path.replace(/^node:/, ''), namespace: 'lazy-builtin' },
    );
    b.onLoad({ filter: /.*/, namespace: 'lazy-builtin' }, (args) => {
      const names = Object.keys(require(`node:${args.path}`));
      const getters = names.map((n) => `  ${JSON.stringify(n)}: { enumerable: true, get: () => load()[${JSON.stringify(n)}] },`);
      return {
        contents: `let real;\nconst load = () => (real ??= require('node:${args.path}'));\nObject.defineProperties(module.exports, {\n${getters.join('\n')}\n});\n`,
        loader: 'js',
      };
    });
  },
};
const cliDir = join(root, 'dist', 'cli');

const { loadCatalogFromYaml, PREBUILT_CATALOG } = await import(join(root, 'dist', 'src', 'catalogs', 'load.js'));
const catalog = loadCatalogFromYaml(join(root, 'catalogs'));
const json = JSON.stringify(catalog);
// JSON must give back exactly what the validator made: a field JSON cannot hold (NaN, Infinity,
// undefined, a Map) fails the build here instead of changing a figure at run time.
if (!isDeepStrictEqual(JSON.parse(json), catalog)) {
  throw new Error('build: the validated catalog does not survive JSON unchanged (a value JSON cannot hold?)');
}

// The bundle: one CommonJS file, run by the launcher (scripts/launcher.cjs) with a V8 code cache.
// The HTML report and the CSV writer, imported with import() in src/cli/, stay in the file but are
// evaluated only when a command asks for them.
rmSync(cliDir, { recursive: true, force: true });
mkdirSync(cliDir, { recursive: true });
const bundle = join(cliDir, 'coilfront-bundle.cjs');
await build({
  entryPoints: [join(root, 'src', 'cli', 'main.ts')],
  outfile: bundle,
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  // The modules find files beside themselves through import.meta.url (the catalog JSON, package.json).
  define: { 'import.meta.url': '__coilfrontModuleUrl' },
  banner: { js: "var __coilfrontModuleUrl = require('node:url').pathToFileURL(__filename).href;" },
  // Not minified: minifying measured no faster to start, and a readable bundle keeps stack traces
  // (COILFRONT_DEBUG=1) and licence comments as they are.
  plugins: [lazyBuiltins],
  logLevel: 'warning',
});
// The launcher wraps the bundle in a function: a #! line inside it would not parse. And the bundle is
// kept to ASCII, so that the launcher can read it as Latin-1, a plain copy, instead of decoding UTF-8
// (about 20 M instructions for 1.2 MB, 4% of a bare node start): esbuild escapes non-ASCII characters
// in strings but leaves them in regular expression literals, where \uXXXX means the same character.
const source = readFileSync(bundle, 'utf8')
  .replace(/^#![^\n]*\n/, '')
  .replace(/[^\x00-\x7f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
if (!isAscii(Buffer.from(source))) throw new Error('build: the bundle is not ASCII after escaping');
writeFileSync(bundle, source);
const launcher = join(cliDir, 'coilfront.cjs');
copyFileSync(join(root, 'scripts', 'launcher.cjs'), launcher);
chmodSync(launcher, 0o755);

for (const dir of [cliDir, join(root, 'dist', 'src', 'catalogs')]) writeFileSync(join(dir, PREBUILT_CATALOG), json);

// The extension-spring catalog the same way, validated against the materials just read.
const { loadExtensionCatalogFromYaml, PREBUILT_EXTENSION_CATALOG } = await import(join(root, 'dist', 'src', 'kinds', 'extension', 'catalog.js'));
const extension = loadExtensionCatalogFromYaml(join(root, 'catalogs'), catalog.materials);
const extensionJson = JSON.stringify(extension);
if (!isDeepStrictEqual(JSON.parse(extensionJson), extension)) {
  throw new Error('build: the validated extension catalog does not survive JSON unchanged (a value JSON cannot hold?)');
}
for (const dir of [cliDir, join(root, 'dist', 'src', 'kinds', 'extension')]) writeFileSync(join(dir, PREBUILT_EXTENSION_CATALOG), extensionJson);

// The tolerance catalog the same way (the yield of every listed spring reads it).
const { loadToleranceCatalogFromYaml, PREBUILT_TOLERANCE_CATALOG } = await import(join(root, 'dist', 'src', 'kinds', 'compression', 'tolerance', 'catalog.js'));
const tolerance = loadToleranceCatalogFromYaml(join(root, 'catalogs'));
const toleranceJson = JSON.stringify(tolerance);
if (!isDeepStrictEqual(JSON.parse(toleranceJson), tolerance)) {
  throw new Error('build: the validated tolerance catalog does not survive JSON unchanged (a value JSON cannot hold?)');
}
for (const dir of [cliDir, join(root, 'dist', 'src', 'kinds', 'compression', 'tolerance')]) writeFileSync(join(dir, PREBUILT_TOLERANCE_CATALOG), toleranceJson);

// The default seed's first standard normal deviates, computed once here by the module that would
// compute them at every run (src/kinds/compression/tolerance/monteCarlo.ts reads them when present):
// each listed spring's Monte Carlo then starts without the generator's cold start.
const { computeDeviates, DEVIATES_TABLE_SEED, DEVIATES_TABLE_LENGTH, DEVIATES_TABLE_FILE } = await import(
  join(root, 'dist', 'src', 'kinds', 'compression', 'tolerance', 'monteCarlo.js')
);
const deviates = computeDeviates(DEVIATES_TABLE_SEED, DEVIATES_TABLE_LENGTH);
const table = Buffer.alloc(deviates.length * 8);
deviates.forEach((z, i) => table.writeDoubleLE(z, i * 8));
writeFileSync(join(cliDir, DEVIATES_TABLE_FILE), table);

// The code cache: what V8 compiled during one run of the demo, for the next starts to reuse.
const record = spawnSync(process.execPath, [launcher, 'design', join(root, 'examples', 'washer-trigger.yaml')], {
  env: { ...process.env, COILFRONT_RECORD_CODE_CACHE: '1' },
  stdio: ['ignore', 'ignore', 'inherit'],
});
if (record.status !== 0) throw new Error(`build: the bundled CLI failed on the demo (exit ${record.status})`);
const cacheKb = (readFileSync(`${bundle}.cache`).length / 1024).toFixed(0);
console.log(
  `build: catalog ${(json.length / 1024).toFixed(1)} KB (${catalog.materials.length} materials, ${catalog.series.length} wire series); CLI dist/cli/coilfront.cjs running coilfront-bundle.cjs (${(readFileSync(bundle).length / 1024).toFixed(0)} KB) with a ${cacheKb} KB code cache`,
);
