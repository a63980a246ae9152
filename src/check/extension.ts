// `check` of a given extension spring against extension requirements: every check of the extension
// kind (src/kinds/extension/checks.ts, the same `checkExtension` that re-verifies every spring its design
// reports) on the full analysis of the spring under the requirement's service, plus what a given spring
// adds: its working force within the band of `working_tolerance` (the initial tension of a made spring
// fixes that force, so it is checked, not solved), a material the requirement allows, and the loop type
// the requirement names.
import type { Catalog } from '../catalogs/types.js';
import { isRecord } from '../units/fields.js';
import { analyzeExtension, extensionWarnings, type ExtensionAnalysis } from '../kinds/extension/analysis.js';
import { EXTENSION_CAUTIONS } from '../kinds/extension/analysis.js';
import {
  EXTENSION_CHECKS,
  EXTENSION_CHECK_LABELS,
  activeExtensionChecks,
  checkExtension,
  extensionService,
  type ExtensionCheck,
} from '../kinds/extension/checks.js';
import { loadExtensionCatalog } from '../kinds/extension/catalog.js';
import { initialTensionHalfWidth, initialTensionMiddle } from '../kinds/extension/initialTension.js';
import { readExtensionRequirements, type ExtensionRequirements } from '../kinds/extension/requirements.js';
import { readExtensionSpring, type ExtensionCase } from '../kinds/extension/springFile.js';
import { cautionText, cautionsOf } from '../report/cautions.js';
import { SI_UNITS } from '../report/json.js';
import { table } from '../report/table.js';
import { formatQuantity, quantityWriter, sig } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import { bandText, workingBand, type WorkingBand } from './band.js';
import { serviceNotes } from '../input/serviceNotes.js';
import { numericLine, type CheckLine } from './judge.js';
import { bandRecord, checkLineRecord, failureText, writeMargin, writeValue } from './report.js';

/** A check line of any kind (the compression lines name their checks by a closed list). */
export type GivenLine = Omit<CheckLine, 'name'> & { name: string };

/** A working length below the free length: the coils are closed there and the loops hang slack, so
 * the spring pulls nothing (not the initial tension, and never a negative force). */
export interface SlackPoint {
  at: 'working' | 'operating';
  length: number;
}

export const SLACK_LABEL = 'spring slack here: the length is below its free length, so it pulls nothing (0)';
const SLACK_FATIGUE_LABEL = 'not judged: the spring goes slack every cycle and takes its load up with a jerk, which no fatigue criterion covers';

export interface ExtensionVerdict {
  spring: ExtensionCase;
  analysis: ExtensionAnalysis;
  /** The requirement's lengths at which the spring is slack (below its free length): force 0 there. */
  slack: SlackPoint[];
  pass: boolean;
  lines: GivenLine[];
  failing: GivenLine[];
  limiting: GivenLine | null;
}

export interface ExtensionCheckOutcome {
  kind: 'extension';
  req: ExtensionRequirements;
  band: WorkingBand;
  verdict: ExtensionVerdict;
  notes: string[];
}

type Figure = Pick<GivenLine, 'value' | 'limit' | 'relation' | 'kind'> & { note?: string };

/** The figure and limit behind each extension check, for people; the verdict itself is checkExtension's. */
function figureOf(name: ExtensionCheck, a: ExtensionAnalysis, req: ExtensionRequirements): Figure {
  const geo = a.geometry;
  const allow = a.material.allowables;
  const sf = req.safety.static;
  const last = a.points.reduce((m, p) => (p.force > m.force ? p : m), a.points[0]);
  const mid = initialTensionMiddle(geo.springIndex);
  const half = initialTensionHalfWidth(geo.springIndex);
  const fatigue = (s: 'body' | 'loopBending' | 'loopTorsion'): Figure => ({
    value: a.fatigue ? a.fatigue[s].safetyFactor : null,
    limit: req.safety.fatigue,
    relation: '>=',
    kind: 'number',
    note: 'fatigue safety factor',
  });
  const F2 = a.points[a.points.length - 1].force;
  switch (name) {
    case 'index_min':
      return { value: geo.springIndex, limit: req.index[0], relation: '>=', kind: 'number' };
    case 'index_max':
      return { value: geo.springIndex, limit: req.index[1], relation: '<=', kind: 'number' };
    case 'outer_diameter':
      return { value: geo.outerDiameter, limit: req.maxOuterDiameter ?? null, relation: '<=', kind: 'length' };
    case 'free_length':
      return { value: geo.freeLength, limit: req.maxFreeLength ?? null, relation: '<=', kind: 'length', note: 'inside the loops' };
    case 'working_extension':
      return { value: geo.freeLength, limit: req.workingLength, relation: '<=', kind: 'length', note: 'free length against the working length' };
    case 'initial_tension_min':
      return {
        value: a.initialTension.stress,
        limit: req.initialTensionRange === 'preferred' ? mid - half : 0,
        relation: '>=',
        kind: 'stress',
        note: `initial-tension stress (${req.initialTensionRange} range; margin as a share of the range's middle)`,
      };
    case 'initial_tension_max':
      return {
        value: a.initialTension.stress,
        limit: mid + half,
        relation: '<=',
        kind: 'stress',
        note: "initial-tension stress (margin as a share of the range's middle)",
      };
    case 'body_stress':
      return {
        value: last.bodyStress,
        limit: allow.bodyTorsion / sf,
        relation: '<=',
        kind: 'stress',
        note: sf !== 1 ? `allowable / static safety factor ${sf}` : 'body torsion allowable',
      };
    case 'loop_bending_stress':
      return {
        value: last.loopBendingStress,
        limit: allow.loopBending / sf,
        relation: '<=',
        kind: 'stress',
        note: sf !== 1 ? `allowable / static safety factor ${sf}` : 'loop bending allowable',
      };
    case 'loop_torsion_stress':
      return {
        value: last.loopTorsionStress,
        limit: allow.loopTorsion / sf,
        relation: '<=',
        kind: 'stress',
        note: sf !== 1 ? `allowable / static safety factor ${sf}` : 'loop torsion allowable',
      };
    case 'body_fatigue':
      return fatigue('body');
    case 'loop_bending_fatigue':
      return fatigue('loopBending');
    case 'loop_torsion_fatigue':
      return fatigue('loopTorsion');
    case 'operating_force_min':
      return { value: F2, limit: req.operatingForce! * (1 - req.loadTolerance), relation: '>=', kind: 'force' };
    case 'operating_force_max':
      return { value: F2, limit: req.operatingForce! * (1 + req.loadTolerance), relation: '<=', kind: 'force' };
    case 'extended_stress':
      return {
        value: req.maxExtendedLength ?? null,
        // Past the allowable already at the free length, no stretch is within it: the free length is the limit.
        limit: a.safeExtension.pastAtFreeLength ? a.geometry.freeLength : a.safeExtension.length,
        relation: '<=',
        kind: 'length',
        note: a.safeExtension.pastAtFreeLength
          ? 'the spring is past its allowable at its free length (its initial tension alone): no stretch is within every allowable'
          : 'the largest extended length against the longest stretch within every allowable',
      };
    case 'surge':
      return { value: a.surge.frequency, limit: req.forcingFrequency ? req.safety.surge * req.forcingFrequency : null, relation: '>=', kind: 'frequency' };
    case 'temperature':
      return { value: req.temperature ?? null, limit: a.material.figures.maxTemperature, relation: '<=', kind: 'temperature' };
  }
}

export function judgeExtension(spring: ExtensionCase, raw: unknown, req: ExtensionRequirements, band: WorkingBand, loopStated: boolean): ExtensionVerdict {
  const doc = isRecord(raw) ? raw : {};
  // The requirement's service conditions govern; the spring's own peening is a fact of the part.
  const service = { ...extensionService(req), peened: doc.peened !== undefined && doc.peened !== null ? spring.service.peened : req.peened };
  // A length below the free length is analysed at the free length, then shown at its own length with no pull.
  const L0 = analyzeExtension(spring.geometry, spring.material, { ...service, lengths: [] }).geometry.freeLength;
  const slack: SlackPoint[] = [];
  service.lengths.forEach((length, i) => {
    if (length < L0) slack.push({ at: i === 0 ? 'working' : 'operating', length });
  });
  const a = analyzeExtension(spring.geometry, spring.material, { ...service, lengths: service.lengths.map((L) => Math.max(L, L0)) });
  if (slack.length)
    a.points = a.points.map((p, i) =>
      service.lengths[i] < L0 ? { length: service.lengths[i], extension: 0, force: 0, bodyStress: 0, loopBendingStress: 0, loopTorsionStress: 0 } : p,
    );
  const g = checkExtension(a, req);
  const slackAt = (at: SlackPoint['at']) => slack.some((p) => p.at === at);
  const fatigueSites = new Set<string>(['body_fatigue', 'loop_bending_fatigue', 'loop_torsion_fatigue']);
  const active = activeExtensionChecks(req);
  const F1 = a.points[0].force;
  const lines: GivenLine[] = [];
  const numeric = (name: string, label: string, gv: number, fig: Figure): GivenLine => numericLine(name, label, gv, fig);
  lines.push(
    numeric('working_force_min', slackAt('working') ? SLACK_LABEL : 'working force below its band', (band.low - F1) / band.force, {
      value: F1,
      limit: band.low,
      relation: '>=',
      kind: 'force',
    }),
  );
  lines.push(
    numeric('working_force_max', 'working force above its band', (F1 - band.high) / band.force, { value: F1, limit: band.high, relation: '<=', kind: 'force' }),
  );
  EXTENSION_CHECKS.forEach((name, i) => {
    if (!active[i]) return;
    // Slack in the cycle: the fatigue figures would assume a cycle the spring never runs; they fail, named.
    if (slack.length && fatigueSites.has(name)) lines.push({ ...numeric(name, SLACK_FATIGUE_LABEL, NaN, figureOf(name, a, req)), value: null });
    else
      lines.push(
        numeric(name, name === 'operating_force_min' && slackAt('operating') ? SLACK_LABEL : EXTENSION_CHECK_LABELS[name], g[i], figureOf(name, a, req)),
      );
  });
  const id = spring.materialChoice.material.id;
  const allowed = [...new Set(req.materials.map((m) => m.material.id))];
  const materialOk = allowed.includes(id);
  lines.push({
    name: 'material',
    label: 'material not one the requirement allows',
    value: id,
    limit: allowed.join(', '),
    relation: 'in',
    kind: 'text',
    g: materialOk ? -1 : 1,
    margin: null,
    pass: materialOk,
  });
  if (loopStated) {
    const loopOk = spring.geometry.loop.id === req.loop.id;
    lines.push({
      name: 'loop',
      label: 'loop type not the one the requirement names',
      value: spring.geometry.loop.id,
      limit: req.loop.id,
      relation: 'in',
      kind: 'text',
      g: loopOk ? -1 : 1,
      margin: null,
      pass: loopOk,
    });
  }
  const failing = lines.filter((l) => !l.pass);
  let limiting: GivenLine | null = null;
  for (const l of lines) if (l.margin !== null && (limiting === null || l.margin < limiting.margin!)) limiting = l;
  return { spring, analysis: a, slack, pass: failing.length === 0, lines, failing, limiting };
}

export function checkExtensionDocuments(spring: unknown, requirements: unknown, catalog: Catalog): ExtensionCheckOutcome {
  const ext = loadExtensionCatalog(catalog.materials);
  const req = readExtensionRequirements(requirements, catalog, ext);
  const c = readExtensionSpring(spring, catalog, ext);
  const band = workingBand(req);
  const loopStated = isRecord(requirements) && requirements.loop !== undefined && requirements.loop !== null;
  const notes = [...c.notes.filter((n) => !/judged as static service/.test(n)), ...serviceNotes(req)];
  const doc = isRecord(spring) ? spring : {};
  const differ = ['lengths', 'forces', 'cycles', 'temperature', 'forcing_frequency', 'fatigue_criterion', 'stress_factor'].filter(
    (k) => doc[k] !== undefined && doc[k] !== null,
  );
  if (differ.length)
    notes.push(`the spring file's ${differ.join(', ')} ${differ.length === 1 ? 'is' : 'are'} not used: the requirement's service conditions are`);
  return { kind: 'extension', req, band, verdict: judgeExtension(c, spring, req, band, loopStated), notes };
}

/** What a slack spring means, in words. (No free length is suggested: an extension spring's is fixed by
 * its body coils and loops, so the way out is another spring, which `design` finds.) */
export function slackNotes(v: ExtensionVerdict, system: UnitSystem): string[] {
  const L = (x: number) => formatQuantity(x, 'length', system);
  return v.slack.map(
    (p) =>
      `the spring is slack at the ${p.at} length: ${L(p.length)} is below its free length ${L(v.analysis.geometry.freeLength)} inside the loops, so it pulls nothing there (taken as 0, never negative)`,
  );
}

export function extensionCheckJson(v: ExtensionVerdict, band: WorkingBand, notes: string[]): Record<string, unknown> {
  const a = v.analysis;
  const geo = a.geometry;
  const m = v.spring.materialChoice.material;
  return {
    units: SI_UNITS,
    kind: 'extension',
    pass: v.pass,
    failing: v.failing.map((l) => ({ name: l.name, by: l.margin === null ? null : -l.margin })),
    limiting_check: v.limiting ? { name: v.limiting.name, margin: v.limiting.margin } : null,
    working_band: bandRecord(band),
    spring: {
      material: m.id,
      material_name: m.name,
      loop: geo.loop,
      wire_diameter: geo.wireDiameter,
      mean_diameter: geo.meanDiameter,
      outer_diameter: geo.outerDiameter,
      spring_index: geo.springIndex,
      body_coils: geo.bodyCoils,
      active_coils: geo.activeCoils,
      free_length: geo.freeLength,
      initial_tension: a.initialTension.force,
      initial_tension_stress: a.initialTension.stress,
      rate: a.rate,
      mass: geo.mass,
      points: a.points.map((p) => ({
        length: p.length,
        force: p.force,
        body_stress: p.bodyStress,
        loop_bending_stress: p.loopBendingStress,
        loop_torsion_stress: p.loopTorsionStress,
      })),
    },
    checks: v.lines.map((l) => checkLineRecord(l)),
    slack: v.slack,
    notes: [...notes, ...slackNotes(v, 'si')],
    warnings: a.warnings.map((w) => w.message),
    cautions: cautionsOf(EXTENSION_CAUTIONS),
  };
}

export function extensionCheckText(o: ExtensionCheckOutcome, system: UnitSystem): string {
  const v = o.verdict;
  const a = v.analysis;
  const geo = a.geometry;
  const L = (x: number) => formatQuantity(x, 'length', system);
  const m = v.spring.materialChoice.material;
  const out: string[] = [];
  out.push(
    `Check of a given extension spring: ${m.id} (${m.name}), wire ${L(geo.wireDiameter)}, OD ${L(geo.outerDiameter)}, ${sig(geo.bodyCoils, 4)} body coils, ${geo.loop} loops, free length ${L(geo.freeLength)} inside the loops, initial tension ${formatQuantity(a.initialTension.force, 'force', system)}; rate ${formatQuantity(a.rate, 'rate', system)}`,
  );
  out.push(`Working force band: ${bandText(o.band, system)}`);
  out.push('');
  const rows = [['check', 'spring', '', 'limit', 'margin', 'verdict', '']];
  for (const l of v.lines)
    rows.push([
      l.name,
      writeValue(l.value, l.kind, system),
      l.relation,
      writeValue(l.limit, l.kind, system),
      writeMargin(l.margin),
      l.pass ? 'pass' : 'FAIL',
      l.pass ? (l.note ?? '') : l.label,
    ]);
  out.push(table(rows));
  out.push('');
  out.push(
    v.pass
      ? `Result: all ${v.lines.length} checks pass${v.limiting ? `; the smallest margin is ${v.limiting.name} at ${writeMargin(v.limiting.margin)}` : ''}.`
      : `Result: FAILS ${v.failing.length} of ${v.lines.length} checks: ${v.failing.map((l) => failureText(l, system)).join('; ')}.`,
  );
  const warnings = extensionWarnings(a, extensionService(o.req), quantityWriter(system)).map((w) => w.message);
  const all = [...slackNotes(v, system), ...o.notes, ...warnings];
  if (all.length) {
    out.push('');
    out.push('Notes:');
    for (const n of all) out.push(`  ! ${n}`);
  }
  out.push('');
  out.push(cautionText(EXTENSION_CAUTIONS));
  return out.join('\n') + '\n';
}
