// The plots every kind's reports share, as SVG strings: the cloud of feasible springs with its front,
// and a sweep's best value per step. A kind's own diagrams live in its folder (src/kinds/<kind>/).
import { axes, esc, polyline, r2, svgOpen } from './svg.js';

export interface CloudPoint {
  x: number;
  y: number;
}

/** Feasible springs on two objectives, the Pareto front, and the chosen spring. */
export function cloudPlot(
  cloud: CloudPoint[],
  front: CloudPoint[],
  chosen: CloudPoint,
  xLabel: string,
  yLabel: string,
  chosenData: Record<string, string>,
): string {
  const xs = cloud.map((p) => p.x).concat(chosen.x);
  const ys = cloud.map((p) => p.y).concat(chosen.y);
  const a = axes([Math.min(...xs), Math.max(...xs)], [Math.min(...ys), Math.max(...ys)], xLabel, yLabel);
  const out = [svgOpen('plot-cloud', `feasible springs: ${yLabel} against ${xLabel}`), ...a.svg];
  out.push('<g class="cloud">');
  // Thin a very large cloud for file size: every point still counts in the front.
  const stride = Math.max(1, Math.ceil(cloud.length / 4000));
  for (let i = 0; i < cloud.length; i += stride) out.push(`<circle cx="${r2(a.x(cloud[i].x))}" cy="${r2(a.y(cloud[i].y))}" r="2"/>`);
  out.push('</g>');
  const sorted = [...front].sort((p, q) => p.x - q.x);
  out.push(
    polyline(
      sorted.map((p) => [a.x(p.x), a.y(p.y)]),
      'front',
    ),
  );
  for (const p of sorted) out.push(`<circle class="front-point" cx="${r2(a.x(p.x))}" cy="${r2(a.y(p.y))}" r="3.5"/>`);
  const data = Object.entries(chosenData)
    .map(([k, v]) => ` data-${k}="${esc(v)}"`)
    .join('');
  out.push(`<circle id="chosen-spring" class="chosen"${data} cx="${r2(a.x(chosen.x))}" cy="${r2(a.y(chosen.y))}" r="7"/>`);
  out.push(`<text class="note" x="${r2(a.x(chosen.x) + 10)}" y="${r2(a.y(chosen.y) - 10)}">chosen</text>`);
  out.push('</svg>');
  return out.join('');
}

/** Best value per sweep step; steps with no feasible spring are marked on the axis. */
export function sweepPlot(points: { x: number; y: number | null }[], xLabel: string, yLabel: string): string {
  const ok = points.filter((p): p is { x: number; y: number } => p.y !== null);
  const xs = points.map((p) => p.x);
  const ys = ok.length ? ok.map((p) => p.y) : [0, 1];
  const ax = axes([Math.min(...xs), Math.max(...xs)], [Math.min(...ys) * 0.95, Math.max(...ys) * 1.05], xLabel, yLabel);
  const out = [svgOpen('plot-sweep', `${yLabel} against ${xLabel}`), ...ax.svg];
  out.push(
    polyline(
      ok.map((p) => [ax.x(p.x), ax.y(p.y)]),
      'curve',
    ),
  );
  for (const p of ok) out.push(`<circle class="point" cx="${r2(ax.x(p.x))}" cy="${r2(ax.y(p.y))}" r="4"/>`);
  for (const p of points.filter((q) => q.y === null))
    out.push(`<text class="none" x="${r2(ax.x(p.x))}" y="${ax.y.range[0] - 6}" text-anchor="middle">none</text>`);
  out.push('</svg>');
  return out.join('');
}
