// `coilfront check SPRING_FILE REQ_FILE`: every requirement check on one given spring, with margins.
import type { Command } from 'commander';
import { loadCatalog } from '../catalogs/load.js';
import { checkAnyDocuments, checkOutcomeJson, checkOutcomeText } from '../check/index.js';
import { readInputFile } from '../input/document.js';
import { toJson } from '../report/json.js';
import type { UnitSystem } from '../units/systems.js';
import { EXIT, type Io } from './io.js';
import { unitsOption } from './options.js';
import { addOverrideOptions, rawWithOverrides, type CommonOptions } from './searchCommands.js';

interface CheckOptions extends CommonOptions {
  json?: boolean;
  units?: UnitSystem;
}

export function checkCommand(springFile: string, reqFile: string, opts: CheckOptions, io: Io): number {
  const spring = readInputFile(springFile);
  const requirements = rawWithOverrides(reqFile, opts);
  const o = checkAnyDocuments(spring, requirements, loadCatalog());
  const system = opts.units ?? o.req.system;
  io.stdout(opts.json ? toJson(checkOutcomeJson(o)) + '\n' : checkOutcomeText(o, system));
  if (!o.verdict.pass) {
    io.stderr(`coilfront: the spring fails ${o.verdict.failing.map((l) => l.name).join(', ')}\n`);
    return EXIT.infeasible;
  }
  return EXIT.ok;
}

export function registerCheckCommand(program: Command, io: Io, setCode: (c: number) => void): void {
  addOverrideOptions(
    program
      .command('check')
      .description(
        'run every requirement check on one given spring (an existing part, a stock spring, an exported design) and print each with its margin; exit 1 if any fails',
      )
      .argument('<spring-file>', 'YAML or JSON spring file (as `analyze` reads)')
      .argument('<requirements-file>', 'YAML or JSON requirements file (as `design` reads)')
      .option('--json', 'machine-readable output on stdout (always SI units)')
      .addOption(unitsOption()),
  ).action((springFile: string, reqFile: string, opts: CheckOptions) => setCode(checkCommand(springFile, reqFile, opts, io)));
}
