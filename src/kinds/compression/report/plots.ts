// The compression spring's plots as SVG strings, drawn from the same figures the CLI prints: force
// against length, the fatigue diagram and the side view to scale.
import type { SpringAnalysis } from '../analysis.js';
import { alternatingStrength, criterionLimit, fullyReversedEndurance } from '../../../model/fatigue.js';
import { inUnit, unitSymbol } from '../../../units/format.js';
import type { UnitSystem } from '../../../units/systems.js';
import { springDrawing } from './springDrawing.js';
import { FRAME, axes, polyline, r2, svgOpen } from '../../../report/html/svg.js';

/** Force against length from free length to solid, with the working points, solid and clash allowance. */
export function forceLengthPlot(a: SpringAnalysis, system: UnitSystem, clashAllowance: number): string {
  const L = (v: number) => inUnit(v, 'length', system);
  const F = (v: number) => inUnit(v, 'force', system);
  const g = a.geometry;
  const maxF = Math.max(a.solid.force, ...a.points.map((p) => p.force));
  const ax = axes(
    [L(g.solidLength) * 0.9, L(g.freeLength)],
    [0, F(maxF) * 1.05],
    `length (${unitSymbol('length', system)})`,
    `force (${unitSymbol('force', system)})`,
  );
  const out = [svgOpen('plot-force', 'force against length'), ...ax.svg];
  out.push(
    polyline(
      [
        [ax.x(L(g.freeLength)), ax.y(0)],
        [ax.x(L(g.solidLength)), ax.y(F(a.solid.force))],
      ],
      'curve',
    ),
  );
  out.push(`<line class="solid-line" x1="${r2(ax.x(L(g.solidLength)))}" y1="${ax.y.range[0]}" x2="${r2(ax.x(L(g.solidLength)))}" y2="${ax.y.range[1]}"/>`);
  out.push(`<text class="note" x="${r2(ax.x(L(g.solidLength)) + 4)}" y="${ax.y.range[1] + 12}">solid ${r2(L(g.solidLength))}</text>`);
  const maxWorking = Math.max(0, ...a.points.map((p) => p.force));
  if (maxWorking > 0) {
    const clashForce = (1 + clashAllowance) * maxWorking;
    out.push(`<line class="clash-line" x1="${ax.x.range[0]}" y1="${r2(ax.y(F(clashForce)))}" x2="${ax.x.range[1]}" y2="${r2(ax.y(F(clashForce)))}"/>`);
    out.push(
      `<text class="note" x="${ax.x.range[1] - 4}" y="${r2(ax.y(F(clashForce)) - 4)}" text-anchor="end">clash allowance: ${Math.round(clashAllowance * 100)}% over the largest working force</text>`,
    );
  }
  a.points.forEach((p, i) => {
    out.push(`<circle class="point" data-length="${p.length}" cx="${r2(ax.x(L(p.length)))}" cy="${r2(ax.y(F(p.force)))}" r="5"/>`);
    out.push(
      `<text class="note" x="${r2(ax.x(L(p.length)) + 8)}" y="${r2(ax.y(F(p.force)) + 4)}">${i === 0 ? 'working' : i === a.points.length - 1 ? 'operating' : `point ${i + 1}`}</text>`,
    );
  });
  out.push('</svg>');
  return out.join('');
}

/** The fatigue diagram in (mean, alternating) shear stress: the criterion's line through the endurance
 * point, the load line and the operating point. */
export function fatiguePlot(a: SpringAnalysis, system: UnitSystem): string {
  const fa = a.fatigue;
  if (!fa) return '';
  const S = (v: number) => inUnit(v, 'stress', system);
  const sse = fullyReversedEndurance(fa.endurance, fa.ultimateShear, fa.criterion);
  const ax = axes(
    [0, S(fa.ultimateShear)],
    [0, S(Math.max(sse, fa.alternatingStress, fa.endurance.alternating)) * 1.1],
    `mean shear stress (${unitSymbol('stress', system)})`,
    `alternating shear stress (${unitSymbol('stress', system)})`,
  );
  const out = [svgOpen('plot-fatigue', `fatigue diagram, ${fa.criterion}`), ...ax.svg];
  const line: [number, number][] = [];
  for (let i = 0; i <= 60; i++) {
    const m = (fa.ultimateShear * i) / 60;
    line.push([ax.x(S(m)), ax.y(S(Math.max(0, criterionLimit(m, fa.endurance, fa.ultimateShear, sse, fa.criterion))))]);
  }
  out.push(polyline(line, 'criterion'));
  out.push(`<circle class="endurance" cx="${r2(ax.x(S(fa.endurance.mean)))}" cy="${r2(ax.y(S(fa.endurance.alternating)))}" r="4"/>`);
  const slope = fa.meanStress > 0 ? fa.alternatingStress / fa.meanStress : Infinity;
  const limit = alternatingStrength(slope, fa.endurance, fa.ultimateShear, fa.criterion);
  const limitMean = Number.isFinite(slope) ? limit / slope : 0;
  out.push(
    polyline(
      [
        [ax.x(0), ax.y(0)],
        [ax.x(S(limitMean)), ax.y(S(limit))],
      ],
      'load-line',
    ),
  );
  out.push(`<circle id="fatigue-point" class="point" cx="${r2(ax.x(S(fa.meanStress)))}" cy="${r2(ax.y(S(fa.alternatingStress)))}" r="5"/>`);
  const sf = Number.isFinite(fa.safetyFactor) ? fa.safetyFactor.toFixed(2) : 'n/a';
  out.push(`<text class="note" x="${r2(ax.x(S(fa.meanStress)) + 8)}" y="${r2(ax.y(S(fa.alternatingStress)) - 8)}">operating point, safety factor ${sf}</text>`);
  out.push(
    `<text class="note" x="${r2(ax.x(S(fa.endurance.mean)) + 8)}" y="${r2(ax.y(S(fa.endurance.alternating)) + 14)}">${fa.enduranceSource === 'finite-life-table' ? 'finite-life' : fa.enduranceSource === 'zimmerli' ? 'Zimmerli' : 'interpolated'} endurance point</text>`,
  );
  out.push('</svg>');
  return out.join('');
}

/** Side view to scale with the free length, outer diameter and wire diameter dimensioned. */
export function sideView(a: SpringAnalysis, system: UnitSystem): string {
  const g = a.geometry;
  const dwg = springDrawing({ wireDiameter: g.wireDiameter, meanDiameter: g.meanDiameter, activeCoils: g.activeCoils, ends: g.ends, freeLength: g.freeLength });
  const W = FRAME.width;
  const H = 260;
  const margin = 60;
  const k = Math.min((W - 2 * margin) / g.freeLength, (H - 2 * margin) / g.outerDiameter);
  const x0 = (W - g.freeLength * k) / 2;
  const cy = H / 2 - 10;
  const X = (v: number) => x0 + v * k;
  const Y = (v: number) => cy - v * k;
  const out = [
    `<svg id="plot-drawing" class="plot" viewBox="0 0 ${W} ${H}" role="img" aria-label="side view to scale" xmlns="http://www.w3.org/2000/svg" data-scale="${r2(k)}" data-coils="${g.totalCoils}"><title>side view to scale</title>`,
  ];
  const s = dwg.sections;
  out.push('<g class="wire">');
  for (let i = 0; i + 1 < s.length; i++)
    out.push(
      `<line x1="${r2(X(s[i].x))}" y1="${r2(Y(s[i].y))}" x2="${r2(X(s[i + 1].x))}" y2="${r2(Y(s[i + 1].y))}" stroke-width="${r2(Math.max(1, g.wireDiameter * k))}"/>`,
    );
  out.push('</g><g class="section">');
  for (const p of s) out.push(`<circle cx="${r2(X(p.x))}" cy="${r2(Y(p.y))}" r="${r2(Math.max(0.8, (g.wireDiameter * k) / 2))}"/>`);
  out.push('</g>');
  const L = (v: number) => `${Number(inUnit(v, 'length', system).toPrecision(4))} ${unitSymbol('length', system)}`;
  const yDim = Y(-g.outerDiameter / 2) + 26;
  out.push(
    `<g class="dim"><line x1="${r2(X(0))}" y1="${r2(yDim)}" x2="${r2(X(g.freeLength))}" y2="${r2(yDim)}"/><line x1="${r2(X(0))}" y1="${r2(yDim - 6)}" x2="${r2(X(0))}" y2="${r2(yDim + 6)}"/><line x1="${r2(X(g.freeLength))}" y1="${r2(yDim - 6)}" x2="${r2(X(g.freeLength))}" y2="${r2(yDim + 6)}"/>`,
  );
  out.push(`<text x="${r2(X(g.freeLength / 2))}" y="${r2(yDim + 16)}" text-anchor="middle">free length ${L(g.freeLength)}</text>`);
  const xDim = X(g.freeLength) + 22;
  out.push(`<line x1="${r2(xDim)}" y1="${r2(Y(g.outerDiameter / 2))}" x2="${r2(xDim)}" y2="${r2(Y(-g.outerDiameter / 2))}"/>`);
  out.push(`<text transform="translate(${r2(xDim + 14)} ${r2(cy)}) rotate(-90)" text-anchor="middle">OD ${L(g.outerDiameter)}</text>`);
  out.push(
    `<text x="${r2(X(0))}" y="${r2(Y(g.outerDiameter / 2) - 10)}">wire ${L(g.wireDiameter)}, ${g.totalCoils} total / ${g.activeCoils} active coils, ${g.ends}</text></g>`,
  );
  out.push('</svg>');
  return out.join('');
}
