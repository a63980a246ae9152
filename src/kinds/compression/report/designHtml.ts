// The HTML design report: requirements and counts, the feasible cloud and its front with the chosen
// spring marked, the ranked table, the chosen spring's force-length and fatigue diagrams and its
// drawing to scale, the sweep when one was run, conventions and cautions.
import type { Requirements } from '../requirements.js';
import { rulesOfThumb, type ServiceConditions, type SpringAnalysis } from '../analysis.js';
import type { Candidate, DesignRun } from '../design.js';
import { reportedChecks } from '../design.js';
import { CHECK_LABELS, type CheckName } from '../verify.js';
import { FRONTIER_KEYS, type Frontier } from '../frontier.js';
import { formatQuantity, inUnit, quantityWriter, sig, unitSymbol } from '../../../units/format.js';
import type { UnitSystem } from '../../../units/systems.js';
import { writeOutputFile } from '../../../report/writeFile.js';
import { CONVENTIONS, figure, htmlTable, page } from '../../../report/html/page.js';
import { cloudPlot, sweepPlot } from '../../../report/html/plots.js';
import { fatiguePlot, forceLengthPlot, sideView } from './plots.js';
import { candidateGrid, relaxLines, yieldNote } from './designReport.js';
import { fieldNotes } from '../../../report/fields.js';
import { feasibleCountLabel } from '../../../report/feasibleCount.js';
import { COMPRESSION_FIELDS, TABLE_NOTE } from '../fields.js';
import { surgeEndsLabel } from '../../../model/surge.js';
import { strengthBasisSummary } from '../../../input/material.js';
import { esc } from '../../../report/html/svg.js';
import { serviceNotes } from '../../../input/serviceNotes.js';

export interface SweepSummary {
  name: string;
  rows: { value: number; best: Candidate | null }[];
}

function requirementRows(req: Requirements, system: UnitSystem): string[][] {
  const L = (v: number | undefined) => (v === undefined ? '-' : formatQuantity(v, 'length', system));
  const F = (v: number | undefined) => (v === undefined ? '-' : formatQuantity(v, 'force', system));
  return [
    ['material', req.materials.map((m) => m.material.id).join(', ')],
    ['end types', req.ends.join(', ')],
    ['seating (buckling)', req.seating],
    ['tensile strength', strengthBasisSummary(req.materials).replace(/^tensile strength: /, '')],
    ['working load', `${F(req.workingForce)} at ${L(req.workingLength)}`],
    [
      'operating point',
      req.operatingLength === undefined
        ? '-'
        : `${req.operatingForce === undefined ? 'free force' : F(req.operatingForce)} at ${L(req.operatingLength)}${req.loadTolerance ? `, tolerance ${sig(req.loadTolerance * 100, 3)}%` : ''}`,
    ],
    ['largest outer diameter (bore)', L(req.maxOuterDiameter)],
    ['smallest inner diameter (rod)', L(req.minInnerDiameter)],
    ['largest free length', L(req.maxFreeLength)],
    ['largest solid length', L(req.maxSolidLength)],
    ['cycles', req.cycles === undefined ? 'static' : Number.isFinite(req.cycles) ? req.cycles.toExponential(1) : 'infinite'],
    ['wire sizes', req.wireSizesLabel],
    ['active coils', `${req.activeCoils[0]} to ${req.activeCoils[1]} by ${req.coilStep}`],
    ['spring index', `${req.index[0]} to ${req.index[1]}`],
    ['safety factors', `static ${req.safety.static}, fatigue ${req.safety.fatigue}, surge ${req.safety.surge}`],
    ['clash allowance', `${sig(req.clashAllowance * 100, 3)}%`],
    ['ranked by', req.rank.replace('_', ' ')],
  ];
}

/** The sections that show one spring: its figures, force-length, fatigue and drawing. */
export function springSections(a: SpringAnalysis, system: UnitSystem, service: ServiceConditions, heading: string): string[] {
  const clashAllowance = service.clashAllowance;
  const g = a.geometry;
  const L = (v: number) => formatQuantity(v, 'length', system);
  const S = (v: number) => formatQuantity(v, 'stress', system);
  const kv = [
    ['wire / mean / outer diameter', `${L(g.wireDiameter)} / ${L(g.meanDiameter)} / ${L(g.outerDiameter)}`],
    ['active / total coils, ends', `${g.activeCoils} / ${g.totalCoils}, ${g.ends}`],
    ['free / solid length', `${L(g.freeLength)} / ${L(g.solidLength)}`],
    ['rate', formatQuantity(a.rate, 'rate', system)],
    ['stress at solid', `${S(a.solid.stress)} (${a.solid.solidSafe ? 'solid-safe' : 'not solid-safe'})`],
    ['static safety factor', sig(a.staticSafetyFactor, 3)],
    ['fatigue safety factor', a.fatigue ? sig(a.fatigue.safetyFactor, 3) : 'static service'],
    [
      'buckling',
      a.buckling.absolutelyStable
        ? 'absolutely stable'
        : `critical deflection ${L(a.buckling.criticalDeflection)}${a.buckling.buckles ? ' (buckles: guide it)' : ''}`,
    ],
    ['surge frequency', `${sig(a.surge.relevant, 4)} Hz (${surgeEndsLabel(a.surge.ends)})`],
    ['mass', formatQuantity(g.mass, 'mass', system)],
  ];
  const out = [`<h2>${esc(heading)}</h2>`, htmlTable(['figure', 'value'], kv, { cls: 'kv' })];
  const warnings = rulesOfThumb(a, service, quantityWriter(system));
  if (warnings.length) out.push(`<ul class="warn">${warnings.map((w) => `<li>${esc(w.message)}</li>`).join('')}</ul>`);
  out.push('<div class="grid2">');
  out.push(
    figure(
      forceLengthPlot(a, system, clashAllowance),
      'Force against length from free length to solid; the working and operating points, the solid length and the clash allowance.',
    ),
  );
  out.push(
    figure(
      fatiguePlot(a, system),
      a.fatigue ? `Fatigue diagram (${a.fatigue.criterion}): the criterion through the endurance point, the load line and the operating point.` : '',
    ),
  );
  out.push('</div>');
  out.push(figure(sideView(a, system), 'Side view at free length, to scale.'));
  return out;
}

function conventionsSection(): string {
  const notes = fieldNotes(COMPRESSION_FIELDS).map((n) => [n.slice(0, n.indexOf(':')), n.slice(n.indexOf(':') + 2)]);
  return `<h2>Conventions</h2>${htmlTable(['item', 'method and source'], [...CONVENTIONS.map(([a, b]) => [a, b]), ...notes], { cls: 'kv' })}`;
}

/** `extra`: sections of another command placed before the conventions (the stock section of `stock --compare`). */
/** The report draws the frontier it is given (reportFrontier(run) for a design run), never searching
 * again itself; a run with no spring has none. */
export function designHtml(run: DesignRun, system: UnitSystem, frontier: Frontier | null, sweep?: SweepSummary, extra: string[] = []): string {
  const req = run.req;
  const sections: string[] = [];
  sections.push('<h2>Requirements</h2>');
  sections.push(htmlTable(['requirement', 'value'], requirementRows(req, system), { cls: 'kv' }));
  const notes = serviceNotes(req);
  if (notes.length) sections.push(`<p class="note warn">${notes.map((n) => `Note: ${esc(n)}`).join('<br>')}</p>`);
  const r = run.result;
  const counts = [
    ['strategy', r.strategy],
    ['combinations', String(r.cells)],
    ['candidate evaluations', String(r.evaluations)],
    [feasibleCountLabel(r), String(r.feasibleCells)],
    ['pruned by the incumbent bound', String(r.prunedCells)],
    ...reportedChecks(req)
      .filter((c) => r.cutBy[c] > 0)
      .map((c) => [`cut: ${CHECK_LABELS[c as CheckName]}`, String(r.cutBy[c])]),
    ['LP lower bound', run.lp.value !== null ? formatQuantity(run.lp.value, req.rank === 'mass' ? 'mass' : 'volume', system) : run.lp.status],
    ['gap of the best spring to the bound', run.gap !== null ? `${sig(run.gap * 100, 3)}%` : '-'],
  ];
  sections.push(htmlTable(['count', 'value'], counts, { cls: 'kv' }));
  const best = run.candidates[0];
  if (!best) {
    sections.push('<h2>No feasible spring</h2>');
    const lines = relaxLines(run, system);
    // Paragraphs for the headings, one list per run of items.
    sections.push(
      lines
        .map((l) => (l.startsWith('  - ') ? `<li>${esc(l.slice(4))}</li>` : `<p>${esc(l)}</p>`))
        .join('\n')
        .replace(/(<li>[\s\S]*?<\/li>)(?=\n<p>|$)/g, '<ul>$1</ul>'),
    );
  } else {
    const fr = frontier;
    if (!fr) throw new Error('designHtml: a run with springs is drawn with its frontier (reportFrontier); please report this');
    const kx = FRONTIER_KEYS[fr.x];
    const ky = FRONTIER_KEYS[fr.y];
    const label = (k: typeof kx, key: string) => (k.kind ? `${k.label} (${unitSymbol(k.kind, system)})` : k.label);
    const conv = (k: typeof kx, v: number) => (k.kind ? inUnit(v, k.kind, system) : v);
    const pt = (c: Candidate) => ({ x: conv(kx, kx.sign * c.objectives[kx.objective]), y: conv(ky, ky.sign * c.objectives[ky.objective]) });
    const cloud = fr.cloud.map((p) => ({ x: conv(kx, p.x), y: conv(ky, p.y) }));
    sections.push('<h2>Feasible springs and the trade-off front</h2>');
    sections.push(
      figure(
        cloudPlot(cloud, fr.front.map(pt), pt(best), label(kx, fr.x), label(ky, fr.y), {
          material: best.item.choice.material.id,
          wire: String(best.geometry.wireDiameter),
          'mean-diameter': String(best.geometry.meanDiameter),
          'active-coils': String(best.geometry.activeCoils),
          ends: best.geometry.ends,
        }),
        `${cloud.length} feasible springs (each combination of material, wire, ends and coils at its smallest feasible mean diameter); the line joins the ${fr.front.length} non-dominated ones; the ring marks the chosen spring, first in the table below.`,
      ),
    );
    sections.push('<h2>Ranked candidates</h2>');
    // With the yield at the tolerances where the run was confirmed (design and its API), as the text has it.
    const t = candidateGrid(run.candidates, system, run.yields);
    // class ranked: set tighter when printed, so that every column fits an A4 or Letter page.
    // A check's name may break after its underscores (a zero-width space), so that the column of the
    // check that limits the yield narrows on a printed page.
    const rows = t.rows.map((r) => r.map((cell) => cell.replace(/_/g, '_\u200b')));
    sections.push(htmlTable(t.header, rows, { bestFirst: true, cls: 'ranked' }));
    sections.push(...[TABLE_NOTE, ...yieldNote(run)].map((line) => `<p class="note">${esc(line)}</p>`));
    sections.push(...springSections(best.analysis, system, run.problem.service(), 'The chosen spring'));
  }
  if (sweep) {
    const pts = sweep.rows.map((row) => ({ x: row.value, y: row.best ? inUnit(row.best.analysis.geometry.mass, 'mass', system) : null }));
    sections.push('<h2>Envelope sweep</h2>');
    sections.push(
      figure(
        sweepPlot(pts, `${sweep.name} (as given)`, `best mass (${unitSymbol('mass', system)})`),
        'The lightest feasible spring for each value; "none" where nothing fits.',
      ),
    );
  }
  sections.push(...extra);
  sections.push(conventionsSection());
  const subtitle = `${formatQuantity(req.workingForce, 'force', system)} at ${formatQuantity(req.workingLength, 'length', system)}${req.operatingLength !== undefined ? `, stroke to ${formatQuantity(req.operatingLength, 'length', system)}` : ''}. Written by coilfront.`;
  return page('coilfront design report', subtitle, sections);
}

export function writeDesignReport(path: string, run: DesignRun, system: UnitSystem, force: boolean, frontier: Frontier | null, sweep?: SweepSummary): void {
  writeOutputFile(path, designHtml(run, system, frontier, sweep), force, '--report');
}
