// Helical extension springs as one SpringKind: what `analyze`, `design` and the library API call when a
// document says `kind: extension`. Everything here is read from this folder's modules; the registries
// (checks, objectives, fields) are the lists the search and the reports already use.
import { loadCatalog } from '../../catalogs/load.js';
import { writeOutputFile } from '../../report/writeFile.js';
import { STATIC_SERVICE_CYCLES } from '../../model/fatigue.js';
import type { CheckDefinition, ObjectiveDefinition, SpringKind, Trend } from '../kind.js';
import { EXTENSION_CAUTIONS, analyzeExtension, type ExtensionAnalysis } from './analysis.js';
import { loadExtensionCatalog } from './catalog.js';
import { EXTENSION_CHECKS, EXTENSION_CHECK_LABELS, EXTENSION_RELAXED_BY, activeExtensionChecks, type ExtensionCheck } from './checks.js';
import { chooseExtensionStrategy, designExtension, extensionCandidateAt, type ExtensionCandidate, type ExtensionDesignRun } from './design.js';
import { EXTENSION_FIELDS } from './fields.js';
import { computeExtensionFrontier, extensionReportFrontier, type ExtensionFrontier, type ExtensionFrontierKey } from './frontier.js';
import { buildExtensionProblem, combinations } from './problem.js';
import {
  extensionAnalysisJson,
  extensionAnalysisText,
  extensionCandidateRecord,
  extensionCountsRecord,
  extensionDesignJson,
  extensionDesignText,
  extensionLimitingText,
} from './report.js';
import { readExtensionRequirements, type ExtensionRequirements } from './requirements.js';
import { readExtensionSpring, type ExtensionCase } from './springFile.js';

const inc: Trend = 1;
const dec: Trend = -1;
const unk: Trend = 0;
/** The stresses are monotone in the mean diameter only when the force is fixed (no stroke): problem.ts. */
const stressTrend = (r: ExtensionRequirements): Trend => (r.operatingLength === undefined ? inc : unk);

const CHECK_TRENDS: Record<ExtensionCheck, (r: ExtensionRequirements) => Trend> = {
  index_min: () => dec,
  index_max: () => inc,
  outer_diameter: () => inc,
  free_length: () => inc,
  working_extension: () => inc,
  initial_tension_min: () => unk,
  initial_tension_max: () => unk,
  body_stress: stressTrend,
  loop_bending_stress: stressTrend,
  loop_torsion_stress: stressTrend,
  body_fatigue: () => unk,
  loop_bending_fatigue: () => unk,
  loop_torsion_fatigue: () => unk,
  operating_force_min: () => inc,
  operating_force_max: () => dec,
  extended_stress: () => unk,
  surge: () => inc,
  temperature: () => inc,
};

/** The checks of an extension spring, in the order of the search's g[] (checks.ts, XC). */
export const EXTENSION_CHECK_DEFINITIONS: readonly CheckDefinition<ExtensionRequirements>[] = EXTENSION_CHECKS.map((name, i) => ({
  name,
  label: EXTENSION_CHECK_LABELS[name],
  trend: CHECK_TRENDS[name],
  active: (r: ExtensionRequirements) => activeExtensionChecks(r)[i],
  relaxedBy: EXTENSION_RELAXED_BY[name],
}));

/** The objectives, in the order of the search's f[1..] (problem.ts, XO). */
export const EXTENSION_OBJECTIVE_DEFINITIONS = [
  { key: 'mass', label: 'mass', unit: 'mass', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  { key: 'wire_volume', label: 'wire volume', unit: 'volume', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  { key: 'outer_diameter', label: 'outer diameter', unit: 'length', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  { key: 'free_length', label: 'free length inside the loops', unit: 'length', sign: 1, trend: 1, rankable: true, frontierAxis: true, lpBound: false },
  {
    key: 'safety_factor',
    label: 'safety factor (lowest of body, loops, static and fatigue)',
    unit: null,
    sign: -1,
    trend: 0,
    rankable: true,
    frontierAxis: true,
    lpBound: false,
  },
  { key: 'relative_cost', label: 'relative cost (mass x cost factor)', unit: null, sign: 1, trend: 1, rankable: false, frontierAxis: true, lpBound: false },
] as const satisfies readonly ObjectiveDefinition[];

export type ExtensionKind = SpringKind<ExtensionCase, ExtensionAnalysis, ExtensionRequirements, ExtensionDesignRun, ExtensionCandidate, ExtensionFrontier>;

export const extension: ExtensionKind = {
  id: 'extension',
  label: 'helical extension spring',
  readSpring: (raw, catalog) => readExtensionSpring(raw, catalog, loadExtensionCatalog(catalog.materials)),
  analyse: (c) => analyzeExtension(c.geometry, c.material, c.service),
  readRequirements: (raw, catalog) => readExtensionRequirements(raw, catalog, loadExtensionCatalog(catalog.materials)),
  buildProblem(req, catalog) {
    const p = buildExtensionProblem(req, catalog, loadExtensionCatalog(catalog.materials));
    return Object.assign(p, { candidateAt: (x: ArrayLike<number>, f: Float64Array) => extensionCandidateAt(p, x, f) });
  },
  design: (req, catalog, request = {}) =>
    designExtension(
      req,
      catalog,
      { strategy: request.strategy, onProgress: request.onProgress, document: request.document },
      loadExtensionCatalog(catalog.materials),
    ),
  search: (req, catalog, request = {}) =>
    designExtension(req, catalog, { strategy: request.strategy, onProgress: request.onProgress }, loadExtensionCatalog(catalog.materials)),
  strategyFor: (req, catalog, strategy) =>
    chooseExtensionStrategy(req, buildExtensionProblem(req, catalog, loadExtensionCatalog(catalog.materials)), { strategy }),
  found: (run) => run.candidates.length > 0,
  // The axes are checked against the objectives registry before this is called (frontierAxis()).
  frontier: (req, catalog, x, y, request = {}) =>
    computeExtensionFrontier(
      req,
      catalog,
      x as ExtensionFrontierKey,
      y as ExtensionFrontierKey,
      request.onProgress,
      undefined,
      loadExtensionCatalog(catalog.materials),
      request.strategy,
    ),
  searchSize: (req, catalog) => combinations(buildExtensionProblem(req, catalog, loadExtensionCatalog(catalog.materials))),
  checks: EXTENSION_CHECK_DEFINITIONS,
  objectives: EXTENSION_OBJECTIVE_DEFINITIONS,
  fields: EXTENSION_FIELDS,
  report: {
    analysisText: (c, a, system) => extensionAnalysisText(c, a, system),
    analysisJson: (c, a) => extensionAnalysisJson(c, a),
    async analysisHtml(c, a, system) {
      const { extensionAnalysisHtml } = await import('./html.js');
      return extensionAnalysisHtml(c, a, system);
    },
    designText: (run, system, showTiming) => extensionDesignText(run, system, showTiming),
    designJson: (run, showTiming) => extensionDesignJson(run, showTiming),
    async designHtml(run, system, shown = {}) {
      const { extensionDesignHtml } = await import('./html.js');
      return extensionDesignHtml(run, system, shown.frontier ?? extensionReportFrontier(run, loadCatalog()), shown.sweep);
    },
    async analysisSpecSheet(c, a, system) {
      const { extensionSheetSpring, extensionSpecSheetHtml } = await import('./specSheet.js');
      return extensionSpecSheetHtml({ spring: extensionSheetSpring(c, a), service: c.service, system, notes: c.notes });
    },
    async writeSpecSheet(path, run, system, force, pick = 1) {
      const c = run.candidates[pick - 1];
      if (!c) return false;
      const { extensionSpecSheetHtml } = await import('./specSheet.js');
      writeOutputFile(path, extensionSpecSheetHtml({ spring: c, service: run.problem.service(), system, requirements: run.req }), force, '--spec');
      return true;
    },
    listed: (run) => run.candidates.length,
    candidateJson: (c) => extensionCandidateRecord(c),
    countsJson: (run) => extensionCountsRecord(run),
    limitingText: (run) => extensionLimitingText(run),
    jsonFrame: { head: { kind: 'extension' }, tail: {} },
    requirementNotes(req) {
      const notes: string[] = [];
      if (req.cycles !== undefined && req.cycles < STATIC_SERVICE_CYCLES)
        notes.push(`cycles ${req.cycles} is below ${STATIC_SERVICE_CYCLES.toExponential(0).replace('+', '')}: judged as static service (no fatigue check)`);
      if (req.cycles !== undefined && req.cycles >= STATIC_SERVICE_CYCLES && req.operatingLength === undefined)
        notes.push('cycles given without operating_length: one working length is no load cycle (no fatigue check)');
      return notes;
    },
  },
  cautions: EXTENSION_CAUTIONS.cautions,
};
