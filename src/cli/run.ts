// The command line: commander parses, thin commands call the core, errors become one clear line.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command, CommanderError } from 'commander';
import { unitsOption } from './options.js';
import { CatalogError } from '../catalogs/load.js';
import { InputError } from '../units/parse.js';
import { analyzeCommand } from './analyze.js';
import { materialsCommand } from './materials.js';
import { CliExit, EXIT, type Io } from './io.js';
import { registerSearchCommands } from './searchCommands.js';
import { registerFrontierCommand } from './frontier.js';
import { registerSweepCommand } from './sweep.js';
import { registerCheckCommand } from './check.js';
import { registerStockCommand } from './stock.js';

export function packageVersion(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 5; i++) {
    try {
      const pkg = JSON.parse(readFileSync(join(dir, 'package.json'), 'utf8')) as { name?: string; version?: string };
      if (pkg.name === 'coilfront' && pkg.version) return pkg.version;
    } catch {
      /* keep walking up */
    }
    dir = join(dir, '..');
  }
  return '0.0.0';
}

export function buildProgram(io: Io, setCode: (c: number) => void): Command {
  const program = new Command('coilfront');
  program
    .description(
      'Design and check helical compression and extension springs (kind: extension in the file): analyse one spring, or search standard wire sizes and coil counts for the lightest springs that meet your requirements.',
    )
    .version(packageVersion(), '-V, --version')
    // A usage mistake is one line, like every other bad input, with the pointer to --help on it.
    .configureOutput({
      writeOut: io.stdout,
      writeErr: io.stderr,
      outputError: (text, write) => write(`coilfront: ${text.trim().replace(/\n+/g, ' ')} (run coilfront --help for usage)\n`),
    })
    .exitOverride();

  program
    .command('analyze')
    .description('analyse one given spring in full: geometry, rate, stresses, solid, fatigue, buckling, surge, warnings')
    .argument('<spring-file>', 'YAML or JSON spring file (see README)')
    .option('--json', 'machine-readable output on stdout (always SI units)')
    .addOption(unitsOption())
    .option('--report <file.html>', 'also write a self-contained HTML report')
    .option(
      '--spec <file.html>',
      "also write the spring's one-page specification sheet, where its kind has one from a spring file (else design --spec writes it)",
    )
    .option('--force', 'overwrite existing output files')
    .action(async (file: string, opts) => setCode(await analyzeCommand(file, opts, io)));

  program
    .command('materials')
    .description('list the catalog materials and wire-size series, with their sources')
    .option('--json', 'machine-readable output (SI units)')
    .addOption(unitsOption('si'))
    .action((opts) => setCode(materialsCommand(opts, io)));

  registerSearchCommands(program, io, setCode);
  registerFrontierCommand(program, io, setCode);
  registerSweepCommand(program, io, setCode);
  registerCheckCommand(program, io, setCode);
  registerStockCommand(program, io, setCode);
  return program;
}

/** Run the CLI on argv (without node and script) and return the exit code. */
export async function run(argv: string[], io: Io): Promise<number> {
  let code: number = EXIT.ok;
  const program = buildProgram(io, (c) => {
    code = c;
  });
  try {
    await program.parseAsync(argv, { from: 'user' });
    return code;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return EXIT.ok;
      return EXIT.input;
    }
    if (e instanceof InputError || e instanceof CatalogError) {
      io.stderr(`coilfront: error: ${e.message}\n`);
      return EXIT.input;
    }
    if (e instanceof CliExit) {
      if (e.message) io.stderr(`coilfront: ${e.message}\n`);
      return e.code;
    }
    io.stderr(`coilfront: internal error: ${(e as Error).message}\n`);
    if (process.env.COILFRONT_DEBUG) io.stderr(`${(e as Error).stack}\n`);
    return EXIT.internal;
  }
}
