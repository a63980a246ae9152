// `analyze` in the library: the full analysis of one given spring. Takes the plain object a spring
// file holds and returns exactly what `coilfront analyze --json` prints.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { kindOf } from '../kinds/index.js';
import type { AnySpringKind, InUnits } from '../kinds/kind.js';
import { withCautions } from '../report/cautions.js';
import { sanitize } from '../report/json.js';
import type { CatalogOption } from './options.js';
import type { AnalysisResult } from './types.js';

export type AnalyzeOptions = CatalogOption;

/** A spring read by the kind its document names, and its analysis. */
export interface SpringAnalysisOf {
  kind: AnySpringKind;
  spring: InUnits;
  analysis: unknown;
}

/** Read a spring document through its kind (src/kinds/index.ts) and analyse it; throws InputError naming the field. */
export function analyzeDocument(spring: unknown, catalog: Catalog = loadCatalog()): SpringAnalysisOf {
  const kind = kindOf(spring);
  const c = kind.readSpring(spring, catalog);
  return { kind, spring: c, analysis: kind.analyse(c) };
}

/** The JSON record of an analysis, as `analyze --json` prints it. */
export function analysisResult(o: SpringAnalysisOf): AnalysisResult {
  return sanitize(withCautions(o.kind.report.analysisJson(o.spring, o.analysis), o.kind)) as AnalysisResult;
}

export function analyze(spring: unknown, options: AnalyzeOptions = {}): AnalysisResult {
  return analysisResult(analyzeDocument(spring, options.catalog));
}
