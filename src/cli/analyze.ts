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
  spec?: string;
  force?: boolean;
}

export async function analyzeCommand(file: string, opts: AnalyzeOptions, io: Io): Promise<number> {
  checkOutputPaths(
    [
      { option: '--report', path: opts.report },
      { option: '--spec', path: opts.spec },
    ],
    !!opts.force,
    [file],
  );
  const o = analyzeDocument(readInputFile(file));
  const { kind, spring: c, analysis: a } = o;
  const system = opts.units ?? c.system;
  if (opts.report && !kind.report.analysisHtml) throw new InputError('--report', `a report of a kind that has one (the ${kind.label} report is not built yet)`);
  if (opts.spec && !kind.report.analysisSpecSheet)
    throw new InputError(
      '--spec',
      `a spring of a kind specified from its spring file (a ${kind.label}'s sheet comes from design --spec, which knows its working force and tolerance grade)`,
    );
  // The HTML loads only when asked for (start-up time: issue 10); both pages are made before either is
  // written, so a sheet refused leaves no report behind.
  const report = opts.report ? await kind.report.analysisHtml!(c, a, system) : undefined;
  const spec = opts.spec ? await kind.report.analysisSpecSheet!(c, a, system) : undefined;
  if (opts.report && report !== undefined) {
    writeOutputFile(opts.report, report, !!opts.force, '--report');
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.spec && spec !== undefined) {
    writeOutputFile(opts.spec, spec, !!opts.force, '--spec');
    io.stderr(`coilfront: specification sheet written to ${opts.spec}\n`);
  }
  if (opts.json) io.stdout(toJson(analysisResult(o)) + '\n');
  else io.stdout(kind.report.analysisText(c, a, opts.units ?? c.system));
  return EXIT.ok;
}
