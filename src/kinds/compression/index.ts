// Helical compression springs as one SpringKind: what `design`, `analyze` and the library API call
// when a document says `kind: compression` or says no kind at all.
import { analyzeSpring, type SpringAnalysis } from './analysis.js';
import { serviceNotes } from '../../input/serviceNotes.js';
import { readRequirements, searchSize, type Requirements } from './requirements.js';
import { readSpringCase, type SpringCase } from './springFile.js';
import { analysisJson, analysisText } from './report/analysisReport.js';
import { candidateRecord, countsRecord, designJson, designText, limitingText } from './report/designReport.js';
import { candidateAt, chooseStrategy, runDesign, type Candidate, type DesignRun } from './design.js';
import { buildSpringProblem } from './problem.js';
import { confirmBest, confirmRun } from './tolerance/confirm.js';
import { springFileText } from './springDoc.js';
import type { SpringKind } from '../kind.js';
import { computeFrontier, reportFrontier, type Frontier, type FrontierKey } from './frontier.js';
import { COMPRESSION_CHECKS } from './checks.js';
import { COMPRESSION_FIELDS } from './fields.js';
import { COMPRESSION_OBJECTIVES } from './objectives.js';

export type CompressionKind = SpringKind<SpringCase, SpringAnalysis, Requirements, DesignRun, Candidate, Frontier>;

export const compression: CompressionKind = {
  id: 'compression',
  label: 'helical compression spring',
  readSpring: (raw, catalog) => readSpringCase(raw, catalog),
  analyse: (c) => analyzeSpring(c.geometry, c.figures, c.service),
  readRequirements: (raw, catalog) => readRequirements(raw, catalog),
  buildProblem(req) {
    const p = buildSpringProblem(req);
    return Object.assign(p, { candidateAt: (x: ArrayLike<number>, f: Float64Array) => candidateAt(p, x, f) });
  },
  // Every reported spring's yield by the seeded Monte Carlo; under min_yield, the ones it refutes leave the list.
  design: (req, _catalog, request = {}) =>
    confirmRun(runDesign(req, { strategy: request.strategy, onProgress: request.onProgress, document: request.document })),
  // A sweep's row under min_yield is the best spring design would list: confirmed by the Monte Carlo.
  search: (req, _catalog, request = {}) => {
    const run = runDesign(req, { strategy: request.strategy, onProgress: request.onProgress });
    return req.minYield !== undefined ? confirmBest(run) : run;
  },
  strategyFor: (req, _catalog, strategy) => chooseStrategy(req, buildSpringProblem(req), { strategy }),
  found: (run) => run.candidates.length > 0,
  // The axes are checked against the objectives registry before this is called (frontierAxis()).
  frontier: (req, _catalog, x, y, request = {}) => computeFrontier(req, x as FrontierKey, y as FrontierKey, request.onProgress, request.strategy),
  searchSize: (req) => searchSize(req).combinations,
  checks: COMPRESSION_CHECKS,
  objectives: COMPRESSION_OBJECTIVES,
  fields: COMPRESSION_FIELDS,
  report: {
    analysisText: (c, a, system) => analysisText(c, a, system, c.notes),
    analysisJson: (c, a) => analysisJson(c, a, c.notes),
    async analysisHtml(c, a, system) {
      const { springHtml } = await import('./report/springHtml.js');
      return springHtml(c, a, system);
    },
    designText: (run, system, showTiming) => designText(run, system, showTiming),
    designJson: (run, showTiming) => designJson(run, showTiming),
    async designHtml(run, system, shown = {}) {
      const { designHtml } = await import('./report/designHtml.js');
      return designHtml(run, system, shown.frontier ?? reportFrontier(run), shown.sweep);
    },
    candidateJson: (c) => candidateRecord(c),
    countsJson: (run) => countsRecord(run),
    limitingText: (run) => limitingText(run),
    jsonFrame: { head: {}, tail: {} },
    async writeSpecSheet(path, run, system, force, pick = 1) {
      const c = run.candidates[pick - 1];
      if (!c) return false;
      const { writeSpecSheet } = await import('./report/specSheet.js');
      writeSpecSheet(path, c, run.req, system, force);
      return true;
    },
    springFile(run, pick) {
      const c = run.candidates[pick - 1];
      if (!c) return null;
      const { text, exported } = springFileText(c, run.req, pick);
      const notes = exported.drawn.failing.length ? [`spring ${pick} as drawn fails ${exported.drawn.failing.join(', ')} (the file says so)`] : [];
      return { text, notes };
    },
    listed: (run) => run.candidates.length,
    // The same notes as `check` gives (src/input/serviceNotes.ts): a life below fatigue service, or a life
    // with one working length (no load cycle), each drops the fatigue check, and says so.
    requirementNotes: (req) => serviceNotes(req),
  },
  cautions: [],
};
