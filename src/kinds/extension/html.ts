// The HTML reports of extension springs: one analysed spring, and a design run (requirements, counts,
// the feasible cloud and its front, the ranked table, the chosen spring). The sections that are
// particular to a tension spring: the force-length line that starts at the initial tension (above zero
// at the free length), the stresses of the body and both loop points, and a side view with the loops.
// Self-contained pages (src/report/html/page.ts): inline CSS and SVG, no scripts.
import { CONVENTIONS, figure, htmlTable, page } from '../../report/html/page.js';
import { generalCautions } from '../../report/cautions.js';
import { feasibleCountLabel } from '../../report/feasibleCount.js';
import { cloudPlot } from '../../report/html/plots.js';
import { FRAME, axes, esc, polyline, r2, svgOpen } from '../../report/html/svg.js';
import { formatQuantity, inUnit, quantityWriter, sig, unitSymbol } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import { EXTENSION_CAUTION, extensionWarnings, siteWords, stressPerNewton, type ExtensionAnalysis, type ExtensionService } from './analysis.js';
import type { ExtensionCandidate, ExtensionDesignRun } from './design.js';
import { EXTENSION_FRONTIER_KEYS, frontierValue, type ExtensionFrontier } from './frontier.js';
import { EXTENSION_CHECK_LABELS } from './checks.js';
import { bandFraction, extensionCandidateGrid, extensionRelaxLines, reportedExtensionChecks, safeExtensionText } from './report.js';
import type { ExtensionRequirements } from './requirements.js';
import type { ExtensionCase } from './springFile.js';
import type { SweepSummary } from '../kind.js';

/** Methods and sources particular to extension springs (the README's conventions table repeats them). */
export const EXTENSION_CONVENTIONS: [string, string][] = [
  [
    'lengths',
    'measured inside the loops; the free length of full loops L0 = (2C - 1 + Nb) d (Shigley eq. 10-39), other loops by their rule in catalogs/extension.yaml or an explicit loop_length',
  ],
  ['rate', 'k = G d^4 / (8 D^3 Na) with Na = Nb + G/E: the loops add G/E of a coil (Shigley eq. 10-40)'],
  ['force', 'F = Fi + k (L - L0): the line starts at the initial tension, above zero at the free length'],
  [
    'initial tension',
    'tau_i = K 8 Fi D / (pi d^3); preferred range 33500 / exp(0.105 C) +- 1000 (4 - (C - 3) / 6.5) psi (Shigley eq. 10-41); in design Fi = F1 - k (L1 - L0) must lie in it (or from zero to its top: initial_tension_range: makeable)',
  ],
  [
    'loop bending (A)',
    'sigma_A = F [(K)A 16 D / (pi d^3) + 4 / (pi d^2)], (K)A = (4 C1^2 - C1 - 1) / (4 C1 (C1 - 1)), C1 = 2 r1 / d (Shigley eqs. 10-34, 10-35)',
  ],
  ['loop torsion (B)', 'tau_B = (K)B 8 F D / (pi d^3), (K)B = (4 C2 - 1) / (4 C2 - 4), C2 = 2 r2 / d, default 4 (Shigley eqs. 10-36, 10-37, sec. 10-11)'],
  [
    'static allowables',
    'body torsion, loop torsion and loop bending as fractions of Sut per material class (Shigley Table 10-7); safety.static divides all three',
  ],
  [
    'loop fatigue',
    'repeated-stress fractions of Sut for the loops at 1e5/1e6/1e7 cycles (Shigley Table 10-8, after Associated Spring; from memory); load lines start at the initial-tension stress of each point',
  ],
  ['mass', 'body coils plus one coil of wire per full loop (common practice); other loops by their rule'],
];

const SHARED = new Set(['stress correction', 'tensile strength', 'fatigue', 'surge']);

/** The conventions of an extension-spring page, shared methods first. */
export function extensionConventionsSection(): string {
  const rows = [...CONVENTIONS.filter(([k]) => SHARED.has(k)), ...EXTENSION_CONVENTIONS];
  return `<h2>Conventions</h2>${htmlTable(
    ['item', 'method and source'],
    rows.map(([a, b]) => [a, b]),
    { cls: 'kv' },
  )}`;
}

/** The caution every extension-spring page carries. */
export function extensionCautionSection(): string {
  return `<h2>Extension springs let go of their load</h2><div class="cautions"><p id="extension-caution">${esc(EXTENSION_CAUTION)}</p></div>`;
}

/** Force against length inside the loops: the line from the initial tension at the free length, the
 * working points and the largest pull before the first site takes a set. */
export function extensionForcePlot(a: ExtensionAnalysis, system: UnitSystem): string {
  const L = (v: number) => inUnit(v, 'length', system);
  const F = (v: number) => inUnit(v, 'force', system);
  const g = a.geometry;
  const Fi = a.initialTension.force;
  const longest = Math.max(g.freeLength, ...a.points.map((p) => p.length));
  const safe = a.safeExtension;
  // Show the set point when it is not far beyond the working range (else the points crowd at the left).
  const showSafe =
    !safe.pastAtFreeLength && Number.isFinite(safe.length) && safe.length <= longest + 1.5 * Math.max(longest - g.freeLength, g.freeLength * 0.1);
  const end = Math.max(longest, showSafe ? safe.length : longest) + 0.08 * Math.max(longest - g.freeLength, g.freeLength * 0.1);
  const fAt = (len: number) => Fi + a.rate * (len - g.freeLength);
  const ax = axes(
    [L(g.freeLength) * 0.96, L(end)],
    [0, F(fAt(end)) * 1.05],
    `length inside the loops (${unitSymbol('length', system)})`,
    `force (${unitSymbol('force', system)})`,
  );
  const out = [svgOpen('plot-force', 'force against length inside the loops'), ...ax.svg];
  out.push(`<line class="solid-line" x1="${r2(ax.x(L(g.freeLength)))}" y1="${ax.y.range[0]}" x2="${r2(ax.x(L(g.freeLength)))}" y2="${ax.y.range[1]}"/>`);
  out.push(`<text class="note" x="${r2(ax.x(L(g.freeLength)) + 4)}" y="${ax.y.range[1] + 12}">free length ${sig(L(g.freeLength), 4)}</text>`);
  out.push(
    `<polyline id="force-line" class="curve" data-start-force="${Fi}" data-free-length="${g.freeLength}" points="${r2(ax.x(L(g.freeLength)))},${r2(ax.y(F(Fi)))} ${r2(ax.x(L(end)))},${r2(ax.y(F(fAt(end))))}"/>`,
  );
  out.push(`<circle id="initial-tension-point" class="endurance" data-force="${Fi}" cx="${r2(ax.x(L(g.freeLength)))}" cy="${r2(ax.y(F(Fi)))}" r="5"/>`);
  out.push(
    `<text class="note" x="${r2(ax.x(L(g.freeLength)) + 8)}" y="${r2(ax.y(F(Fi)) + 14)}">initial tension ${formatQuantity(Fi, 'force', system, 3)}</text>`,
  );
  if (showSafe) {
    out.push(`<line class="clash-line" x1="${ax.x.range[0]}" y1="${r2(ax.y(F(safe.force)))}" x2="${ax.x.range[1]}" y2="${r2(ax.y(F(safe.force)))}"/>`);
    out.push(`<text class="note" x="${ax.x.range[0] + 4}" y="${r2(ax.y(F(safe.force)) - 4)}">set begins: ${siteWords(safe.governing)} at its allowable</text>`);
  }
  a.points.forEach((p, i) => {
    out.push(`<circle class="point" data-length="${p.length}" data-force="${p.force}" cx="${r2(ax.x(L(p.length)))}" cy="${r2(ax.y(F(p.force)))}" r="5"/>`);
    out.push(
      `<text class="note" x="${r2(ax.x(L(p.length)) + 8)}" y="${r2(ax.y(F(p.force)) + 4)}">${i === 0 ? 'working' : i === a.points.length - 1 ? 'operating' : `point ${i + 1}`}</text>`,
    );
  });
  out.push('</svg>');
  return out.join('');
}

/** The close-wound body of a side view at free length, (Nb + 1) wire diameters long from the inside of
 * the left loop: a wire line per coil (in the wire group) and the sections at the top and the bottom of
 * each coil (in the section group). X and Y map mm to the drawing, k is its scale. */
export function closeWoundBody(
  g: ExtensionAnalysis['geometry'],
  X: (v: number) => number,
  Y: (v: number) => number,
  k: number,
): { wire: string[]; sections: string[] } {
  const d = g.wireDiameter;
  const ry = g.meanDiameter / 2;
  const sw = r2(Math.max(1, d * k));
  const rs = r2(Math.max(0.8, (d * k) / 2));
  const start = g.loopHeight + d / 2;
  const coils = Math.max(1, Math.round(g.bodyCoils));
  const step = (g.bodyLength - d) / coils;
  const wire: string[] = [];
  const sections: string[] = [];
  for (let i = 0; i <= coils; i++) {
    const xt = start + i * step;
    if (i < coils) wire.push(`<line x1="${r2(X(xt))}" y1="${r2(Y(ry))}" x2="${r2(X(xt + step / 2))}" y2="${r2(Y(-ry))}" stroke-width="${sw}"/>`);
    sections.push(`<circle cx="${r2(X(xt))}" cy="${r2(Y(ry))}" r="${rs}"/>`);
    if (i < coils) sections.push(`<circle cx="${r2(X(xt + step / 2))}" cy="${r2(Y(-ry))}" r="${rs}"/>`);
  }
  return { wire, sections };
}

/** Side view to scale: the close-wound body and a loop at each end, the free length inside the loops
 * and the outer diameter dimensioned. */
export function extensionSideView(a: ExtensionAnalysis, system: UnitSystem): string {
  const g = a.geometry;
  const d = g.wireDiameter;
  const h = g.loopHeight;
  const W = FRAME.width;
  const H = 260;
  const margin = 60;
  const spanX = g.freeLength + 2 * d;
  const k = Math.min((W - 2 * margin) / spanX, (H - 2 * margin) / g.outerDiameter);
  const x0 = (W - g.freeLength * k) / 2;
  const cy = H / 2 - 10;
  const X = (v: number) => x0 + v * k;
  const Y = (v: number) => cy - v * k;
  const sw = r2(Math.max(1, d * k));
  const out = [
    `<svg id="plot-drawing" class="plot" viewBox="0 0 ${W} ${H}" role="img" aria-label="side view to scale, with the loops" xmlns="http://www.w3.org/2000/svg" data-scale="${r2(k)}" data-body-coils="${g.bodyCoils}"><title>side view to scale, with the loops</title>`,
  ];
  // Each loop: the wire's centre line an ellipse whose inside edge is the loop's inside (x = 0 or L0),
  // as tall as the coil's mean diameter.
  const rx = (h + d) / 2;
  const ry = g.meanDiameter / 2;
  out.push('<g class="wire">');
  for (const [id, cx] of [
    ['loop-left', h / 2],
    ['loop-right', g.freeLength - h / 2],
  ] as const) {
    out.push(
      `<ellipse id="${id}" class="loop" cx="${r2(X(cx))}" cy="${r2(cy)}" rx="${r2(rx * k)}" ry="${r2(ry * k)}" fill="none" stroke="currentColor" style="stroke: var(--front)" stroke-width="${sw}"/>`,
    );
  }
  const body = closeWoundBody(g, X, Y, k);
  out.push(...body.wire, '</g><g class="section">', ...body.sections);
  out.push('</g>');
  const Ls = (v: number) => `${Number(inUnit(v, 'length', system).toPrecision(4))} ${unitSymbol('length', system)}`;
  const yDim = Y(-g.outerDiameter / 2) + 26;
  out.push(
    `<g class="dim"><line x1="${r2(X(0))}" y1="${r2(yDim)}" x2="${r2(X(g.freeLength))}" y2="${r2(yDim)}"/><line x1="${r2(X(0))}" y1="${r2(yDim - 6)}" x2="${r2(X(0))}" y2="${r2(yDim + 6)}"/><line x1="${r2(X(g.freeLength))}" y1="${r2(yDim - 6)}" x2="${r2(X(g.freeLength))}" y2="${r2(yDim + 6)}"/>`,
  );
  out.push(`<text x="${r2(X(g.freeLength / 2))}" y="${r2(yDim + 16)}" text-anchor="middle">free length inside the loops ${Ls(g.freeLength)}</text>`);
  const xDim = X(g.freeLength) + 22;
  out.push(`<line x1="${r2(xDim)}" y1="${r2(Y(g.outerDiameter / 2))}" x2="${r2(xDim)}" y2="${r2(Y(-g.outerDiameter / 2))}"/>`);
  out.push(`<text transform="translate(${r2(xDim + 14)} ${r2(cy)}) rotate(-90)" text-anchor="middle">OD ${Ls(g.outerDiameter)}</text>`);
  out.push(
    `<text x="${r2(X(0))}" y="${r2(Y(g.outerDiameter / 2) - 10)}">wire ${Ls(g.wireDiameter)}, ${sig(g.bodyCoils, 4)} body coils, ${g.loop} loops ${Ls(h)} high</text></g>`,
  );
  out.push('</svg>');
  return out.join('');
}

/** The stresses at each point: body, loop bending at A, loop torsion at B, with their allowables. */
function stressTable(a: ExtensionAnalysis, system: UnitSystem): string {
  const S = (v: number) => formatQuantity(v, 'stress', system);
  const L = (v: number) => formatQuantity(v, 'length', system);
  const F = (v: number) => formatQuantity(v, 'force', system);
  const g = a.geometry;
  const per = stressPerNewton(g.wireDiameter, g.meanDiameter, a.factors.body, a.factors.loopBending, a.factors.loopTorsion);
  const allow = a.material.allowables;
  const rows = [
    [
      'free length (initial tension)',
      L(g.freeLength),
      F(a.initialTension.force),
      S(per.body * a.initialTension.force),
      S(per.loopBending * a.initialTension.force),
      S(per.loopTorsion * a.initialTension.force),
    ],
    ...a.points.map((p, i) => [
      i === 0 ? 'working' : i === a.points.length - 1 ? 'operating' : `point ${i + 1}`,
      L(p.length),
      F(p.force),
      S(p.bodyStress),
      S(p.loopBendingStress),
      S(p.loopTorsionStress),
    ]),
    ['allowable (static)', '', '', S(allow.bodyTorsion), S(allow.loopBending), S(allow.loopTorsion)],
  ];
  if (a.points.length)
    rows.push(['static safety factor', '', '', sig(a.staticSafety.body, 3), sig(a.staticSafety.loopBending, 3), sig(a.staticSafety.loopTorsion, 3)]);
  if (a.fatigue) {
    const fa = a.fatigue;
    const nf = (v: number) => (Number.isFinite(v) ? sig(v, 3) : 'n/a');
    rows.push([
      `fatigue safety factor (${fa.life === 'infinite' ? 'infinite life' : `${sig(fa.cycles, 3)} cycles`}, ${fa.criterion})`,
      '',
      '',
      nf(fa.body.safetyFactor),
      nf(fa.loopBending.safetyFactor),
      nf(fa.loopTorsion.safetyFactor),
    ]);
  }
  return `<div id="loop-stresses">${htmlTable(['', 'length', 'force', 'body (torsion)', 'loop, A (bending)', 'loop, B (torsion)'], rows)}</div>`;
}

/** The sections that show one extension spring. */
export function extensionSpringSections(a: ExtensionAnalysis, service: ExtensionService, system: UnitSystem, heading: string): string[] {
  const g = a.geometry;
  const L = (v: number) => formatQuantity(v, 'length', system);
  const S = (v: number) => formatQuantity(v, 'stress', system);
  const it = a.initialTension;
  const frac = bandFraction(a);
  const kv = [
    ['wire / mean / outer diameter', `${L(g.wireDiameter)} / ${L(g.meanDiameter)} / ${L(g.outerDiameter)}`],
    ['spring index', sig(g.springIndex, 4)],
    ['body / active coils', `${sig(g.bodyCoils, 4)} / ${sig(g.activeCoils, 4)}`],
    ['loops', `${g.loop}, ${L(g.loopHeight)} high; r1 ${L(g.loopRadius)} (C1 ${sig(g.loopIndex, 3)}), r2 ${L(g.bendRadius)} (C2 ${sig(g.bendIndex, 3)})`],
    ['free length inside the loops', L(g.freeLength)],
    ['rate', formatQuantity(a.rate, 'rate', system)],
    [
      'initial tension',
      `${formatQuantity(it.force, 'force', system)}, stress ${S(it.stress)}; preferred ${S(it.band.low)} to ${S(it.band.high)}: ${it.position}${Number.isFinite(frac) ? ` (${sig(frac * 100, 3)}% up the range)` : ''}`,
    ],
    ['largest pull before a set', safeExtensionText(a, (v) => formatQuantity(v, 'force', system), L)],
    ['natural frequency', `${sig(a.surge.frequency, 4)} Hz`],
    ['mass', formatQuantity(g.mass, 'mass', system)],
  ];
  const out = [`<h2>${esc(heading)}</h2>`, htmlTable(['figure', 'value'], kv, { cls: 'kv' })];
  const warnings = extensionWarnings(a, service, quantityWriter(system));
  if (warnings.length) out.push(`<ul class="warn">${warnings.map((w) => `<li>${esc(w.message)}</li>`).join('')}</ul>`);
  out.push('<h2>Body and loop stresses</h2>');
  out.push(stressTable(a, system));
  out.push('<div class="grid2">');
  out.push(
    figure(
      extensionForcePlot(a, system),
      'Force against length inside the loops: the line starts at the initial tension at the free length (an extension spring pulls before it stretches), through the working and operating points; the dashed level is where the first site reaches its static allowable.',
    ),
  );
  out.push(figure(extensionSideView(a, system), 'Side view at free length, to scale: the close-wound body and its two loops.'));
  out.push('</div>');
  return out;
}

export function extensionAnalysisHtml(c: ExtensionCase, a: ExtensionAnalysis, system: UnitSystem): string {
  const m = c.materialChoice.material;
  const sections = extensionSpringSections(a, c.service, system, `${m.name} (${m.standard})`);
  if (c.notes.length) sections.push(`<h2>Notes</h2><ul>${c.notes.map((n) => `<li>${esc(n)}</li>`).join('')}</ul>`);
  sections.push(extensionConventionsSection(), extensionCautionSection());
  return page('coilfront extension spring analysis', `${m.name}, ${a.geometry.loop} loops. Written by coilfront.`, sections, generalCautions('extension'));
}

function requirementRows(req: ExtensionRequirements, system: UnitSystem): string[][] {
  const L = (v: number | undefined) => (v === undefined ? '-' : formatQuantity(v, 'length', system));
  const F = (v: number | undefined) => (v === undefined ? '-' : formatQuantity(v, 'force', system));
  return [
    ['material', req.materials.map((m) => m.material.id).join(', ')],
    ['loops', `${req.loop.id}${req.loopLength !== undefined ? `, ${L(req.loopLength)} high` : ''}; bend index C2 ${req.bendIndex}`],
    ['working load', `${F(req.workingForce)} at ${L(req.workingLength)} inside the loops`],
    [
      'operating point',
      req.operatingLength === undefined
        ? '-'
        : `${req.operatingForce === undefined ? 'free force' : F(req.operatingForce)} at ${L(req.operatingLength)}${req.loadTolerance ? `, tolerance ${sig(req.loadTolerance * 100, 3)}%` : ''}`,
    ],
    ['largest outer diameter (bore)', L(req.maxOuterDiameter)],
    ['largest free length', L(req.maxFreeLength)],
    ['largest extended length', L(req.maxExtendedLength)],
    ['cycles', req.cycles === undefined ? 'static' : Number.isFinite(req.cycles) ? req.cycles.toExponential(1) : 'infinite'],
    ['wire sizes', req.wireSizesLabel],
    ['body coils', `${req.bodyCoils[0]} to ${req.bodyCoils[1]} by ${req.coilStep}`],
    ['spring index', `${req.index[0]} to ${req.index[1]}`],
    ['initial tension range', req.initialTensionRange === 'preferred' ? 'preferred (the published band)' : "makeable (from zero to the band's top)"],
    ['safety factors', `static ${req.safety.static}, fatigue ${req.safety.fatigue}, surge ${req.safety.surge}`],
    ['ranked by', req.rank.replace('_', ' ')],
  ];
}

export type ExtensionSweepSummary = SweepSummary<ExtensionCandidate>;

/** The report draws the frontier it is given (extensionReportFrontier(run) for a design run), never
 * searching again itself; a run with no spring has none. */
export function extensionDesignHtml(run: ExtensionDesignRun, system: UnitSystem, frontier: ExtensionFrontier | null, sweep?: ExtensionSweepSummary): string {
  const req = run.req;
  const r = run.result;
  const sections: string[] = ['<h2>Requirements</h2>', htmlTable(['requirement', 'value'], requirementRows(req, system), { cls: 'kv' })];
  const counts = [
    ['strategy', r.strategy],
    ['combinations', String(r.cells)],
    ['candidate evaluations', String(r.evaluations)],
    [feasibleCountLabel(r), String(r.feasibleCells)],
    ['pruned by the incumbent bound', String(r.prunedCells)],
    ...reportedExtensionChecks(req)
      .filter((c) => (r.cutBy[c] ?? 0) > 0)
      .map((c) => [`cut: ${EXTENSION_CHECK_LABELS[c as keyof typeof EXTENSION_CHECK_LABELS]}`, String(r.cutBy[c])]),
  ];
  sections.push(htmlTable(['count', 'value'], counts, { cls: 'kv' }));
  const best = run.candidates[0];
  if (!best) {
    sections.push('<h2>No feasible spring</h2>');
    const lines = extensionRelaxLines(run);
    sections.push(
      `<p>${esc(lines[0])}</p>${
        lines.length > 1
          ? `<ul>${lines
              .slice(1)
              .map((l) => `<li>${esc(l.slice(4))}</li>`)
              .join('')}</ul>`
          : ''
      }`,
    );
  } else {
    const fr = frontier;
    if (!fr) throw new Error('extensionDesignHtml: a run with springs is drawn with its frontier (extensionReportFrontier); please report this');
    const kx = EXTENSION_FRONTIER_KEYS[fr.x];
    const ky = EXTENSION_FRONTIER_KEYS[fr.y];
    const label = (k: typeof kx) => (k.kind ? `${k.label} (${unitSymbol(k.kind, system)})` : k.label);
    const conv = (k: typeof kx, v: number) => (k.kind ? inUnit(v, k.kind, system) : v);
    const pt = (c: ExtensionCandidate) => ({ x: conv(kx, frontierValue(c, fr.x)), y: conv(ky, frontierValue(c, fr.y)) });
    const cloud = fr.cloud.map((p) => ({ x: conv(kx, p.x), y: conv(ky, p.y) }));
    sections.push('<h2>Feasible springs and the trade-off front</h2>');
    sections.push(
      figure(
        cloudPlot(cloud, fr.front.map(pt), pt(best), label(kx), label(ky), {
          material: best.item.choice.material.id,
          wire: String(best.geometry.wireDiameter),
          'mean-diameter': String(best.geometry.meanDiameter),
          'body-coils': String(best.geometry.bodyCoils),
        }),
        `${cloud.length} feasible springs (each combination of material, wire and body coils at its smallest feasible mean diameter); the line joins the ${fr.front.length} non-dominated ones; the ring marks the chosen spring, first in the table below.`,
      ),
    );
    sections.push('<h2>Ranked candidates</h2>');
    const t = extensionCandidateGrid(run.candidates, system);
    sections.push(htmlTable(t.header, t.rows, { bestFirst: true }));
    sections.push(...extensionSpringSections(best.analysis, run.problem.service(), system, 'The chosen spring'));
  }
  if (sweep) {
    const pts = sweep.rows.map((row) => ({ x: row.value, y: row.best ? inUnit(row.best.analysis.geometry.mass, 'mass', system) : null }));
    const ok = pts.filter((p) => p.y !== null) as { x: number; y: number }[];
    sections.push('<h2>Envelope sweep</h2>');
    if (ok.length) {
      const ax = axes(
        [Math.min(...pts.map((p) => p.x)), Math.max(...pts.map((p) => p.x))],
        [Math.min(...ok.map((p) => p.y)) * 0.95, Math.max(...ok.map((p) => p.y)) * 1.05],
        `${sweep.name} (as given)`,
        `best mass (${unitSymbol('mass', system)})`,
      );
      const svg = [
        svgOpen('plot-sweep', `best mass against ${sweep.name}`),
        ...ax.svg,
        polyline(
          ok.map((p) => [ax.x(p.x), ax.y(p.y)]),
          'curve',
        ),
        ...ok.map((p) => `<circle class="point" cx="${r2(ax.x(p.x))}" cy="${r2(ax.y(p.y))}" r="4"/>`),
        ...pts.filter((p) => p.y === null).map((p) => `<text class="none" x="${r2(ax.x(p.x))}" y="${ax.y.range[0] - 6}" text-anchor="middle">none</text>`),
        '</svg>',
      ].join('');
      sections.push(figure(svg, 'The lightest feasible spring for each value; "none" where nothing fits.'));
    } else sections.push('<p>No value of the sweep admits a spring.</p>');
  }
  sections.push(extensionConventionsSection(), extensionCautionSection());
  const F = (v: number) => formatQuantity(v, 'force', system);
  const L = (v: number) => formatQuantity(v, 'length', system);
  const subtitle = `Extension spring: ${F(req.workingForce)} at ${L(req.workingLength)} inside the loops${req.operatingLength !== undefined ? `, stretched to ${L(req.operatingLength)}` : ''}. Written by coilfront.`;
  return page('coilfront extension spring design report', subtitle, sections, generalCautions('extension'));
}
