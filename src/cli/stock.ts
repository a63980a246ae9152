// `coilfront stock REQ_FILE CATALOG.csv`: which springs of a stock table meet the requirements.
import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { Option } from 'commander';
import { loadCatalog } from '../catalogs/load.js';
import { toJson } from '../report/json.js';
import { writeOutputFile } from '../report/writeFile.js';
import { stockReport, writeStockReport } from '../stock/html.js';
import { stockCsv, stockJson, stockText } from '../stock/report.js';
import { runStock, STOCK_RANK_KEYS, type StockRankKey } from '../stock/run.js';
import { InputError, parseFraction, parseNumber } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import type { StrategyChoice } from '../kinds/compression/design.js';
import { checkOutputPaths, EXIT, type Io } from './io.js';
import { addOverrideOptions, rawWithOverrides, type CommonOptions } from './searchCommands.js';

interface StockCliOptions extends CommonOptions {
  json?: boolean;
  units?: UnitSystem;
  rank?: StockRankKey;
  top?: string;
  misses?: string;
  rateDeviation?: string;
  compare?: boolean;
  strategy?: StrategyChoice;
  seed?: string;
  output?: string;
  report?: string;
  force?: boolean;
}

/** At most this many bad rows are listed on stderr; all of them are in --json and the report. */
const BAD_ROWS_SHOWN = 50;

function readTable(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new InputError(path, code === 'ENOENT' ? 'an existing file (not found)' : `a readable file (${code ?? 'unreadable'})`);
  }
}

export function stockCommand(reqFile: string, tableFile: string, opts: StockCliOptions, io: Io): number {
  // Every output path is checked before any work: a refused --report must not leave --output written.
  checkOutputPaths(
    [
      { option: '--output', path: opts.output },
      { option: '--report', path: opts.report },
    ],
    !!opts.force,
    [reqFile, tableFile],
  );
  // --rank and --top are the stock listing's (price is a stock-only key); the rest override the requirements.
  const requirements = rawWithOverrides(reqFile, { ...opts, rank: undefined, top: undefined });
  const run = runStock(requirements, readTable(tableFile), loadCatalog(), {
    units: opts.units,
    rank: opts.rank,
    label: tableFile,
    compare: !!opts.compare,
    strategy: opts.strategy,
    top: opts.top !== undefined ? parseNumber(opts.top, '--top', { integer: true, positive: true, max: 100000 }) : undefined,
    misses: opts.misses !== undefined ? parseNumber(opts.misses, '--misses', { integer: true, nonNegative: true, max: 1000 }) : undefined,
    rateDeviation: opts.rateDeviation !== undefined ? parseFraction(opts.rateDeviation, '--rate-deviation') : undefined,
  });
  const system = opts.units ?? run.req.system;
  for (const b of run.bad.slice(0, BAD_ROWS_SHOWN))
    io.stderr(`coilfront: ${tableFile} line ${b.line}${b.partNumber ? ` (${b.partNumber})` : ''}, ${b.field}: ${b.message}; row skipped\n`);
  if (run.bad.length > BAD_ROWS_SHOWN) io.stderr(`coilfront: ... and ${run.bad.length - BAD_ROWS_SHOWN} more bad rows (all in --json)\n`);
  if (opts.output) {
    writeOutputFile(opts.output, stockCsv(run, system), !!opts.force, '--output');
    io.stderr(`coilfront: ${run.results.length} checked rows written to ${opts.output}\n`);
  }
  if (opts.report) {
    writeStockReport(opts.report, stockReport(run, system, tableFile), !!opts.force);
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.json) io.stdout(toJson(stockJson(run)) + '\n');
  else io.stdout(stockText(run, system, tableFile));
  if (run.passing.length === 0) {
    if (opts.json) io.stderr('coilfront: no stock row meets every requirement (see "near_misses" in the JSON)\n');
    return EXIT.infeasible;
  }
  return EXIT.ok;
}

export function registerStockCommand(program: Command, io: Io, setCode: (c: number) => void): void {
  addOverrideOptions(
    program
      .command('stock')
      .description('check every row of a stock spring table against the requirements: the rows that pass, ranked, and the best near misses with what they fail')
      .argument('<requirements-file>', "YAML or JSON requirements file (as `design` reads; material_map maps the table's material words to catalog ids)")
      .argument('<table.csv>', 'stock table: a header row, then one spring per row (see README)')
      .option('--json', 'machine-readable output on stdout (always SI units)')
      .addOption(
        new Option(
          '--units <system>',
          "unit system of the table's plain numbers and of the human-readable output (default: SI table, output in the requirements file's units)",
        ).choices(['si', 'us']),
      )
      .addOption(new Option('--rank <key>', "ranking of the passing rows (default: the file's rank)").choices([...STOCK_RANK_KEYS]))
      .option('--top <n>', "how many passing rows to list (default: the file's top)")
      .option('--misses <n>', 'how many near misses to list (default 5)')
      .option('--rate-deviation <fraction>', "note rows whose table rate differs from coilfront's by more than this (default 10%)")
      .option('--compare', 'also run `design` and show the best custom spring beside the best stock one')
      .addOption(new Option('--strategy <name>', 'search strategy of --compare').choices(['auto', 'grid', 'genetic']).default('auto'))
      .option('--seed <n>', "random seed of --compare's genetic strategy (overrides the file)")
      .option('-o, --output <file.csv>', 'also write every checked row as CSV (units in the column names)')
      .option(
        '--report <file.html>',
        'also write a self-contained HTML report (under --compare: for compression springs the design report with a stock section, for extension springs the stock report with the comparison)',
      )
      .option('--force', 'overwrite existing output files'),
  ).action((reqFile: string, tableFile: string, opts: StockCliOptions) => setCode(stockCommand(reqFile, tableFile, opts, io)));
}
