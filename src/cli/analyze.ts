// `coilfront analyze SPRING_FILE`: the complete check of one given spring.
import { loadCatalog } from '../catalogs/load.js';
import { readInputFile } from '../input/document.js';
import { readSpringCase } from '../input/springFile.js';
import { analyzeSpring } from '../model/analysis.js';
import { analysisJson, analysisText } from '../report/analysisReport.js';
import { toJson } from '../report/json.js';
import type { UnitSystem } from '../units/systems.js';
import type { Io } from './io.js';
import { checkOutputPaths, EXIT } from './io.js';

export interface AnalyzeOptions { json?: boolean; units?: UnitSystem; report?: string; force?: boolean }

export async function analyzeCommand(file: string, opts: AnalyzeOptions, io: Io): Promise<number> {
  checkOutputPaths([{ option: '--report', path: opts.report }], !!opts.force, [file]);
  const catalog = loadCatalog();
  const c = readSpringCase(readInputFile(file), catalog);
  const a = analyzeSpring(c.geometry, c.figures, c.service);
  if (opts.report) {
    // The HTML report loads only when asked for (start-up time: issue 10).
    const { writeSpringReport } = await import('../report/html/springHtml.js');
    writeSpringReport(opts.report, c, a, opts.units ?? c.system, !!opts.force);
    io.stderr(`coilfront: report written to ${opts.report}\n`);
  }
  if (opts.json) io.stdout(toJson(analysisJson(c, a, c.notes)) + '\n');
  else io.stdout(analysisText(c, a, opts.units ?? c.system, c.notes));
  return EXIT.ok;
}
