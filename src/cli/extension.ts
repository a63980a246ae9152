// frontier and sweep on a document that says `kind: extension`, thin over src/kinds/extension/
// (analyze and design dispatch through the kind registry, src/kinds/index.ts). They receive the
// document with the command-line overrides already applied (and where each came from, to blame a bad
// one on it).
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { LIMITS } from '../input/limits.js';
import { blameOverride, withValue } from '../input/overrides.js';
import { loadExtensionCatalog } from '../kinds/extension/catalog.js';
import { designExtension, type ExtensionCandidate, type ExtensionDesignRun } from '../kinds/extension/design.js';
import { extensionColumns, extensionRow } from '../kinds/extension/fields.js';
import { computeExtensionFrontier, extensionFrontierKey, frontierValue } from '../kinds/extension/frontier.js';
import { buildExtensionProblem } from '../kinds/extension/problem.js';
import { extensionCandidateRecord, extensionCountsRecord, extensionLimitingText } from '../kinds/extension/report.js';
import { readExtensionRequirements, type ExtensionRequirements } from '../kinds/extension/requirements.js';
import { EXTENSION_CAUTION } from '../kinds/extension/analysis.js';
import { cautionText } from '../report/cautions.js';
import { SI_UNITS, toJson } from '../report/json.js';
import { writeOutputFile } from '../report/writeFile.js';
import { extension } from '../kinds/extension/index.js';
import { InputError } from '../units/parse.js';
import type { UnitSystem } from '../units/systems.js';
import { EXIT, type Io } from './io.js';

// The HTML report and the CSV writer load only when a command writes them (start-up time).
const html = () => import('../kinds/extension/html.js');
const csv = () => import('../report/csv.js');

/** Whether a raw document asks for an extension spring. */
export function isExtension(doc: unknown): boolean {
  return typeof doc === 'object' && doc !== null && !Array.isArray(doc) && Object.hasOwn(doc, 'kind') && (doc as Record<string, unknown>).kind === 'extension';
}

export interface ExtensionCommandOptions {
  json?: boolean; units?: UnitSystem; report?: string; force?: boolean; strategy?: string; perWire?: boolean; spec?: string; timing?: boolean; output?: string;
}

interface Override { path: string[]; option: string }

/** Options of the compression search that extension springs do not have: refused by name. */
function refuseCompressionOnly(opts: ExtensionCommandOptions): void {
  if (opts.strategy === 'genetic') throw new InputError('--strategy', 'grid or auto (extension springs are searched by the exhaustive grid)', 'genetic');
  if (opts.spec) throw new InputError('--spec', 'an option of compression springs (the specification sheet of an extension spring is not built yet)');
}

function requirementsOf(doc: unknown, overrides: readonly Override[], catalog: Catalog): ExtensionRequirements {
  try {
    return readExtensionRequirements(doc, catalog, loadExtensionCatalog(catalog.materials));
  } catch (e) {
    throw blameOverride(e, overrides);
  }
}

function notes(req: ExtensionRequirements, io: Io): void {
  for (const note of extension.report.requirementNotes(req)) io.stderr(`coilfront: note: ${note}\n`);
}

export async function extensionFrontier(doc: unknown, overrides: readonly Override[], opts: ExtensionCommandOptions & { x: string; y: string }, io: Io): Promise<number> {
  refuseCompressionOnly(opts);
  const x = extensionFrontierKey(opts.x, '--x');
  const y = extensionFrontierKey(opts.y, '--y');
  const catalog = loadCatalog();
  const req = requirementsOf(doc, overrides, catalog);
  notes(req, io);
  const system = opts.units ?? req.system;
  const fr = computeExtensionFrontier(req, catalog, x, y);
  if (opts.json) {
    io.stdout(toJson({ units: SI_UNITS, kind: 'extension', x, y, feasible: fr.cloud.length, ...extensionCountsRecord(fr.run),
      frontier: fr.front.map((c) => ({ [x]: frontierValue(c, x), [y]: frontierValue(c, y), ...extensionCandidateRecord(c) })), caution: EXTENSION_CAUTION }) + '\n');
  } else {
    const text = (await csv()).toCsv(['rank', ...extensionColumns(system)], fr.front.map((c, i) => [i + 1, ...extensionRow(c, system)]));
    if (opts.output) {
      writeOutputFile(opts.output, text, !!opts.force, '--output');
      io.stderr(`coilfront: ${fr.front.length} springs on the ${x} / ${y} frontier (of ${fr.cloud.length} feasible) written to ${opts.output}\n`);
    } else io.stdout(text);
  }
  if (opts.report) {
    writeOutputFile(opts.report, (await html()).extensionDesignHtml(fr.run, system, catalog, fr), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (!opts.json) io.stderr(`${cautionText()}\n  - ${EXTENSION_CAUTION}\n`);
  return fr.front.length ? EXIT.ok : EXIT.infeasible;
}

export interface ExtensionSweepRow { value: number; run: ExtensionDesignRun; best: ExtensionCandidate | null; limiting: string | null }

/** Every value read before any search runs (a bad one refused at once, blamed on --vary), and the whole
 * sweep bounded like one search. */
export function runExtensionSweep(base: unknown, overrides: readonly Override[], path: string[], values: number[], catalog: Catalog, io: Io | null): ExtensionSweepRow[] {
  const ext = loadExtensionCatalog(catalog.materials);
  const reqs = values.map((value) => {
    try {
      return readExtensionRequirements(withValue(base, path, value), catalog, ext);
    } catch (e) {
      const byVary = blameOverride(e, [{ path, option: '--vary' }]);
      if (byVary !== e && e instanceof InputError) throw new InputError(`--vary ${e.field}=${value}`, e.expected);
      throw blameOverride(e, overrides);
    }
  });
  const problems = reqs.map((r) => buildExtensionProblem(r, catalog, ext));
  const total = problems.reduce((n, p, i) => n + p.stock.length * (Math.floor((reqs[i].bodyCoils[1] - reqs[i].bodyCoils[0]) / reqs[i].coilStep + 1e-9) + 1), 0);
  if (total > LIMITS.combinations) {
    throw new InputError('--vary', `a sweep of at most ${LIMITS.combinations.toLocaleString('en-US')} combinations in all; ${values.length} values make ${total.toLocaleString('en-US')} (a larger step, or a smaller search)`);
  }
  return reqs.map((req, i) => {
    const run = designExtension(req, catalog, { problem: problems[i] }, ext);
    if (io?.interactive) io.stderr(`\rsweep ${i + 1}/${values.length}`);
    return { value: values[i], run, best: run.candidates[0] ?? null, limiting: run.candidates.length ? null : extensionLimitingText(run) };
  });
}

export async function extensionSweep(base: unknown, overrides: readonly Override[], path: string[], values: number[], opts: ExtensionCommandOptions, io: Io): Promise<number> {
  refuseCompressionOnly(opts);
  const catalog = loadCatalog();
  const rows = runExtensionSweep(base, overrides, path, values, catalog, io);
  if (io.interactive) io.stderr('\r' + ' '.repeat(30) + '\r');
  const fileSystem = rows[0]?.run.req.system ?? 'si';
  const system = opts.units ?? fileSystem;
  const name = path.join('.');
  if (opts.json) {
    io.stdout(toJson({ units: SI_UNITS, kind: 'extension', vary: name, note: `${name} values are as given on the command line, in the file's unit system`,
      rows: rows.map((r) => ({ value: r.value, feasible: r.run.result.feasibleCells, best: r.best ? extensionCandidateRecord(r.best) : null, limiting_check: r.limiting })), caution: EXTENSION_CAUTION }) + '\n');
  } else {
    const cols = extensionColumns(system);
    const text = (await csv()).toCsv([`${name} (${fileSystem === 'us' ? 'in/lbf/psi' : 'mm/N/MPa'})`, 'feasible_combinations', ...cols, 'limiting_check'],
      rows.map((r) => [r.value, r.run.result.feasibleCells, ...(r.best ? extensionRow(r.best, system) : cols.map((_, i) => (i === 0 ? 'none' : null))), r.limiting]));
    if (opts.output) {
      writeOutputFile(opts.output, text, !!opts.force, '--output');
      io.stderr(`coilfront: ${rows.length} runs of ${name} written to ${opts.output}\n`);
    } else io.stdout(text);
  }
  if (opts.report) {
    const shown = rows.find((r) => r.best)?.run ?? rows[0].run;
    writeOutputFile(opts.report, (await html()).extensionDesignHtml(shown, system, catalog, undefined, { name, rows }), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (!opts.json) io.stderr(`${cautionText()}\n  - ${EXTENSION_CAUTION}\n`);
  return rows.some((r) => r.best) ? EXIT.ok : EXIT.infeasible;
}
