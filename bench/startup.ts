// Whole-command start-up (issue 10): `coilfront design` on the demo, from process start to exit, against
// a bare `node -e 0`, as interleaved runs (one of each per round, the order rotating) so that the
// machine's drift hits every command alike; medians, and the median of the per-round ratios.
// `npm run bench` runs it after bench/run.ts and it writes its own section of bench/results.md.
// Figures only: nothing here is a test assertion.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse as parseYaml } from 'yaml';

const DEMO = 'examples/washer-trigger.yaml';
const ROUNDS = Number(process.env.STARTUP_ROUNDS ?? 21);
const RESULTS = 'bench/results.md';
const HEADING = '## Whole-command start-up';

// History, measured once and kept here because the code it measured is gone: the figures before the
// bundle, the pre-validated catalog and the code cache.
const BEFORE =
  'Before (commit 1f66dd6, 2026-12-02: unbundled modules, YAML catalogs parsed and validated at every start, every module loaded): ' +
  '3.99x `node -e 0` (304 ms against 76 ms, 15 interleaved pairs, medians). Whole-process instruction counts (valgrind callgrind, same machine, same day): ' +
  '`node -e 0` 499 M; before 1,826 M (3.66x); the ES-module bundle with split chunks 1,075 M; the CommonJS bundle without the code cache 1,062 M, with it 910 M (1.82x).';

const YIELD_SPEEDUP =
  "Yield shown for every listed spring (2026-12-02, against commit 8686427; the same 20,000-sample Monte Carlo, same seed, outputs byte for byte the same): the polar transform written into the sampling loop, the tolerance catalog pre-validated into tolerance-catalog.json at build time, the sample count written without toLocaleString (whose first call loads ICU, about 12 ms). Whole process (21 interleaved pairs with `node -e 0`, medians, load average 2.5 to 3.5): before 3.21x wall, 3.32x CPU (213 ms against 63 ms); after 2.27x wall, 2.37x CPU (141 ms against 61 ms); after against before, paired: 0.73x wall, 0.71x CPU. Samples per second through the made-spring checks (washer-trigger's best spring, 200,000 samples, median of 5, warm): 1.37 M before, 1.54 M after (1.12x; medians of 7 processes each, interleaved, 0.87 M to 1.74 M run to run on the busy machine). Cold, the 20,000 samples of one listed spring in a fresh process: 49 ms before, 55 ms after (medians of 7; 46 to 102 ms, no difference above the noise): most of the cold cost is the time before the JIT optimises the loop, and most of the whole-process gain is the catalog and ICU.";

// This session's change, measured once against the build it started from (commit f92bc04) and kept here
// as history like the lines above.
const COLD_SAMPLING =
  "Cold sampling and a lighter load (2026-12-02, against commit f92bc04; outputs byte for byte the same, goldens untouched): the Monte Carlo's uniforms come from seedrandom's own generator written over a typed array (src/kinds/compression/tolerance/arc4Stream.ts, checked number for number against the seedrandom package), its deviates and verdicts run in batches of 64 samples, and the default seed's first 100,000 deviates (a design's 20,000 samples x 5 quantities) are computed at build time by the same code into dist/cli/deviates-seed-1.f64 (800 KB), which the built command reads (other seeds compute them); in the bundle, child_process and crypto are stand-ins loaded on first use; the bundle is kept to ASCII and read as Latin-1 (no UTF-8 decoding of 1.2 MB); a design no longer loads perf_hooks for its one timing. Whole process (21 interleaved pairs each, medians, load 5.6 to 7): before 2.24x wall, 2.35x CPU `node -e 0`; after 2.07x wall, 2.12x CPU; after against before, paired: 0.89x wall, 0.91x CPU. Instructions (valgrind callgrind, two runs each, less the random-length prime test of OpenSSL's start): `node -e 0` 494 M; before 975 to 979 M (1.98x); after 825 to 843 M (1.69x). The Monte Carlo of one listed spring alone, in a fresh process with V8 single-threaded (so that its compiler's work is counted where it happens): 246 M instructions before, 220 M with the new generator and batches, 166 M with the table. What keeps the ratio near 2x: V8 compiling and running cold the grid search and the made-spring checks (their optimised code arrives after some thousands of the 20,000 samples on a busy machine) and deserialising the 700 KB code cache.";

/** The targets table's "before this session" column for this target. */
const BEFORE_SESSION = '2.27x wall, 2.37x CPU (commit f92bc04, load 2.5 to 3.5); 2.24x wall, 2.35x CPU re-measured beside this build at load 6';

const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { bin: Record<string, string> };
const bin = pkg.bin.coilfront;
const scratch = mkdtempSync(join(tmpdir(), 'coilfront-startup-'));
// The same requirements as JSON: what the run costs without a YAML parser.
const demoJson = join(scratch, 'washer-trigger.json');
writeFileSync(demoJson, JSON.stringify(parseYaml(readFileSync(DEMO, 'utf8'))));

interface Subject {
  key: string;
  label: string;
  args: string[];
}
const bundle = bin.replace(/coilfront\.cjs$/, 'coilfront-bundle.cjs');
const subjects: Subject[] = [
  { key: 'node', label: '`node -e 0` (the yardstick)', args: ['-e', '0'] },
  { key: 'design', label: `\`coilfront design ${DEMO}\` (the built command, \`${bin}\`: bundle + code cache)`, args: [bin, 'design', DEMO] },
  { key: 'json', label: 'the same requirements as a JSON file (no YAML to parse)', args: [bin, 'design', demoJson] },
  { key: 'nocache', label: `the bundle alone, without the code cache (\`${bundle}\`)`, args: [bundle, 'design', DEMO] },
  {
    key: 'modules',
    label: 'the unbundled modules (`dist/src/cli/main.js`, tsc output; it reads the catalog JSON too)',
    args: ['dist/src/cli/main.js', 'design', DEMO],
  },
];

function once(s: Subject): number {
  const t = performance.now();
  const r = spawnSync(process.execPath, s.args, { stdio: 'ignore' });
  const ms = performance.now() - t;
  if (r.status !== 0) throw new Error(`${s.args.join(' ')} exited ${r.status}`);
  return ms;
}

const loadAtStart = loadavg()[0];
const times = new Map<string, number[]>(subjects.map((s) => [s.key, []]));
for (const s of subjects) once(s); // warm-up: file cache, not counted
for (let round = 0; round < ROUNDS; round++) {
  for (let i = 0; i < subjects.length; i++) {
    const s = subjects[(round + i) % subjects.length];
    times.get(s.key)!.push(once(s));
  }
}
rmSync(scratch, { recursive: true, force: true });

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};
const ratio = (key: string) => median(times.get(key)!.map((t, i) => t / times.get('node')![i]));
const ms = (key: string) => median(times.get(key)!).toFixed(0);

const lines = [
  HEADING,
  `${ROUNDS} rounds, each running every command below once in rotating order after one warm-up each; wall time from spawn to exit, median; the ratio is the median of the per-round ratios to \`node -e 0\`. Load average when the runs began: ${loadAtStart.toFixed(1)} on ${availableParallelism()} cores (a busy machine stretches every start: compare ratios measured at a similar load).`,
  '',
  '| command | median wall | ratio to `node -e 0` |',
  '|---|---|---|',
  ...subjects.map((s) => `| ${s.label} | ${ms(s.key)} ms | ${s.key === 'node' ? '1' : ratio(s.key).toFixed(2)} |`),
  '',
  `Target: \`design\` on the demo at most 2x \`node -e 0\` (moonshot 1.5x): **${ratio('design').toFixed(2)}x** in this run.`,
  '',
  BEFORE,
  '',
  YIELD_SPEEDUP,
  '',
  COLD_SAMPLING,
];
const text = lines.join('\n') + '\n';
process.stderr.write(text);

// The start-up row of the targets table at the top (bench/run.ts writes it as "see below"): this run's ratio.
const TARGET_ROW = '| whole `design` on the demo at most 2x `node -e 0` |';
const designRatio = ratio('design');
const verdict =
  designRatio <= 1.5
    ? 'met (and the 1.5x moonshot)'
    : designRatio <= 1.9
      ? 'met'
      : designRatio <= 2
        ? 'met in this run, at the edge (a busy machine moves it by a tenth)'
        : 'not met';
const targetRow = `${TARGET_ROW} **${designRatio.toFixed(2)}x** wall (${ROUNDS} interleaved rounds, medians, load ${loadAtStart.toFixed(1)}; "Whole-command start-up" below) | ${BEFORE_SESSION} | ${verdict} |`;

// Replace this section of bench/results.md (bench/run.ts writes the rest), or add it at the end.
let results = '';
try {
  results = readFileSync(RESULTS, 'utf8');
} catch {
  /* a first run */
}
const start = results.indexOf(HEADING);
if (start >= 0) {
  const next = results.indexOf('\n## ', start + HEADING.length);
  results = results.slice(0, start) + text + (next >= 0 ? results.slice(next + 1) : '');
} else {
  results = (results ? results.replace(/\n*$/, '\n\n') : '') + text;
}
results = results
  .split('\n')
  .map((line) => (line.startsWith(TARGET_ROW) ? targetRow : line))
  .join('\n');
writeFileSync(RESULTS, results);
