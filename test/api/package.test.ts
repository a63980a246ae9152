// No outside values here: each check is a property of our own behaviour on our own demo scenarios.
// The package as another project gets it: `npm pack` makes the tarball from the built dist/ (CI's
// `npm ci` builds it through `prepare`; locally run `npm run build` first), a scratch project installs
// it offline from the npm cache (where `npm ci` left the dependencies), then
//  - a plain .mjs script imports design and analyze from "coilfront" and its records print exactly
//    what the CLI prints with --json, the installed bin's and the source's alike;
//  - a small .ts file type-checks against the shipped declarations (and a misuse does not).
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse } from 'yaml';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../helpers.js';

const root = resolve(import.meta.dirname, '..', '..');
const demo = join(root, 'examples', 'washer-trigger.yaml');
const valve = join(root, 'examples', 'valve-return-spring.yaml');
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const quiet = { cwd: root, encoding: 'utf8' as const, stdio: ['ignore', 'pipe', 'pipe'] as ['ignore', 'pipe', 'pipe'] };

let scratch = '';
let installed = '';

beforeAll(() => {
  if (!existsSync(join(root, 'dist', 'src', 'index.js')) || !existsSync(join(root, 'dist', 'cli', 'coilfront.cjs'))) {
    throw new Error('dist/ is not built: run `npm run build` (npm ci does it through prepare)');
  }
  scratch = mkdtempSync(join(tmpdir(), 'coilfront-pack-'));
  // --ignore-scripts: pack the dist/ that is there (prepare would build it all again).
  const packed = JSON.parse(execFileSync(npm, ['pack', '--ignore-scripts', '--json', '--pack-destination', scratch], quiet)) as { filename: string }[];
  const tarball = join(scratch, packed[0].filename);
  const project = join(scratch, 'consumer');
  execFileSync('mkdir', ['-p', project]);
  execFileSync(npm, ['init', '-y'], { ...quiet, cwd: project });
  execFileSync(npm, ['install', '--prefer-offline', '--no-audit', '--no-fund', '--ignore-scripts', tarball], { ...quiet, cwd: project });
  installed = project;
}, 180_000);

afterAll(() => {
  if (scratch) rmSync(scratch, { recursive: true, force: true });
});

describe('the packed package', () => {
  it('ships the library, its declarations and the CLI, and nothing of the tests or the bench', () => {
    const pkg = join(installed, 'node_modules', 'coilfront');
    for (const f of ['package.json', 'dist/src/index.js', 'dist/src/index.d.ts', 'dist/src/api/design.d.ts', 'dist/cli/coilfront.cjs', 'README.md'])
      expect(existsSync(join(pkg, f)), f).toBe(true);
    for (const f of ['dist/bench', 'dist/test', 'src', 'test']) expect(existsSync(join(pkg, f)), f).toBe(false);
  });

  it('imported from "coilfront" by a plain script, returns what the CLI prints with --json', async () => {
    writeFileSync(
      join(installed, 'demo.json'),
      JSON.stringify({ requirements: parse(readFileSync(demo, 'utf8')), spring: parse(readFileSync(valve, 'utf8')) }),
    );
    writeFileSync(
      join(installed, 'consumer.mjs'),
      [
        "import { readFileSync } from 'node:fs';",
        "import { design, analyze, InputError } from 'coilfront';",
        "const { requirements, spring } = JSON.parse(readFileSync('demo.json', 'utf8'));",
        'let refused = null;',
        "try { design({ ...requirements, load: { force: 'twenty', length: 35 } }); } catch (e) { refused = { isInputError: e instanceof InputError, field: e.field, expected: e.expected }; }",
        'process.stdout.write(JSON.stringify({ design: design(requirements), analyze: analyze(spring), refused }));',
      ].join('\n'),
    );
    const out = JSON.parse(execFileSync(process.execPath, ['consumer.mjs'], { ...quiet, cwd: installed }));
    const fromSource = { design: await cli('design', demo, '--json'), analyze: await cli('analyze', valve, '--json') };
    const bin = join(installed, 'node_modules', 'coilfront', 'dist', 'cli', 'coilfront.cjs');
    const fromBin = {
      design: execFileSync(process.execPath, [bin, 'design', demo, '--json'], quiet),
      analyze: execFileSync(process.execPath, [bin, 'analyze', valve, '--json'], quiet),
    };
    for (const key of ['design', 'analyze'] as const) {
      const printed = JSON.stringify(out[key], null, 2) + '\n';
      expect(printed).toBe(fromSource[key].stdout);
      expect(printed).toBe(fromBin[key]);
    }
    expect(out.design.candidates.length).toBeGreaterThan(0);
    expect(out.refused).toMatchObject({ isInputError: true, field: 'load.force' });
    expect(out.refused.expected).toMatch(/force/);
  }, 120_000);

  it("runs the README's library example as written", () => {
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    const section = readme.slice(readme.indexOf('## Library'));
    const code = section.slice(section.indexOf('```js\n') + 6, section.indexOf('\n```', section.indexOf('```js\n')));
    expect(code).toContain("from 'coilfront'");
    writeFileSync(join(installed, 'readme-example.mjs'), code);
    const lines = execFileSync(process.execPath, ['readme-example.mjs'], { ...quiet, cwd: installed })
      .trim()
      .split('\n');
    expect(lines).toHaveLength(3);
    expect(lines[0]).toMatch(/^stainless-302 [\d.]+ [\d.]+ [\d.e-]+$/);
    expect(Number(lines[1])).toBeGreaterThan(0);
    expect(lines[2]).toMatch(/^load\.force - a force/);
  }, 120_000);

  it('type-checks a TypeScript consumer against the shipped declarations, and refuses a misuse', () => {
    writeFileSync(
      join(installed, 'tsconfig.json'),
      JSON.stringify({
        compilerOptions: {
          target: 'ES2022',
          module: 'NodeNext',
          moduleResolution: 'NodeNext',
          strict: true,
          noEmit: true,
          skipLibCheck: false,
          types: ['node'],
          typeRoots: [join(root, 'node_modules', '@types')],
        },
        files: ['consumer.ts'],
      }),
    );
    const consumer = [
      "import { analyze, design, frontier, sweep, check, stock, InputError, type CandidateRecord, type DesignResult, type RankKey } from 'coilfront';",
      "const rank: RankKey = 'mass';",
      "const result: DesignResult = design({ units: 'si', material: 'music-wire', load: { force: '20 N', length: '35 mm' } }, { top: 2, rank, strategy: 'grid', seed: 1 });",
      'const best: CandidateRecord | undefined = result.candidates[0];',
      'const od: number = best ? best.outer_diameter : 0;',
      'const lp: number | null = result.lp_bound;',
      'const rate: number = analyze({ wire_diameter: 1 }).rate;',
      "const axes: string = frontier({}, { x: 'mass', y: 'free_length' }).x;",
      "const rows: number = sweep({}, { vary: 'envelope.max_outer_diameter=14:24:1' }).rows.length;",
      'const verdict: Record<string, unknown> = check({}, {});',
      "const listed: Record<string, unknown> = stock({}, 'part_number\\n', { rank: 'price' });",
      'const e: InputError = new InputError("load.force", "a force");',
      'const field: string = e.field + e.expected;',
      'export const used = [od, lp, rate, axes, rows, verdict, listed, field];',
    ];
    const tsc = join(root, 'node_modules', 'typescript', 'bin', 'tsc');
    writeFileSync(join(installed, 'consumer.ts'), consumer.join('\n'));
    const ok = spawnSync(process.execPath, [tsc, '-p', installed], { encoding: 'utf8' });
    expect(ok.stdout + ok.stderr).toBe('');
    expect(ok.status).toBe(0);
    // A misuse the declarations must catch: a rank key that does not exist, a record field that is not a number.
    writeFileSync(
      join(installed, 'consumer.ts'),
      [
        consumer[0],
        "design({}, { rank: 'cheapest' });",
        'const n: number = design({}).requirements;',
        'export const used = [n, analyze, frontier, sweep, check, stock, InputError];',
        'export type T = [CandidateRecord, DesignResult, RankKey];',
      ].join('\n'),
    );
    const bad = spawnSync(process.execPath, [tsc, '-p', installed], { encoding: 'utf8' });
    expect(bad.status).not.toBe(0);
    expect(bad.stdout).toMatch(/consumer\.ts\(2,.*'"cheapest"'/);
    expect(bad.stdout).toMatch(/consumer\.ts\(3,/);
  }, 240_000);
});
