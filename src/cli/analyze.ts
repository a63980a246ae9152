// `coilfront analyze SPRING_FILE`: the complete check of one given spring (a thin layer over the
// library's analyze, src/api/analyze.ts, which dispatches on the kind).
import { analysisResult, analyzeDocument } from '../api/analyze.js';
import { readInputFile } from '../input/document.js';
import { writeOutputFile } from '../report/writeFile.js';
import { InputError } from '../units/parse.js';
import { toJson } from '../report/json.js';
import type { UnitSystem } from '../units/systems.js';
import type { Io } from './io.js';
import { checkOutputPaths, EXIT } from './io.js';

export interface AnalyzeOptions {
  json?: boolean;
  units?: UnitSystem;
  report?: string;
  force?: boolean;
}

export async function analyzeCommand(file: string, opts: AnalyzeOptions, io: Io): Promise<number> {
  checkOutputPaths([{ option: '--report', path: opts.report }], !!opts.force, [file]);
  const o = analyzeDocument(readInputFile(file));
  const { kind, spring: c, analysis: a } = o;
  if (opts.report) {
    // The HTML report loads only when asked for (start-up time: issue 10).
    if (!kind.report.analysisHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
    writeOutputFile(opts.report, await kind.report.analysisHtml(c, a, opts.units ?? c.system), !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.json) io.stdout(toJson(analysisResult(o)) + '\n');
  else io.stdout(kind.report.analysisText(c, a, opts.units ?? c.system));
  return EXIT.ok;
}
