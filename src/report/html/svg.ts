// Minimal SVG writing: escaped text, numbers rounded for size, axes with ticks and labels.
import { niceDomain, scaleLinear, type LinearScale } from './scale.js';

export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export const r2 = (v: number): string => (Number.isFinite(v) ? String(Math.round(v * 100) / 100) : '0');

export function tickLabel(v: number): string {
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e5 || a < 1e-3) return v.toExponential(1);
  return String(Number(v.toPrecision(4)));
}

export interface Frame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export const FRAME: Frame = { width: 560, height: 340, left: 64, right: 18, top: 16, bottom: 46 };

export interface Axes {
  x: LinearScale;
  y: LinearScale;
  svg: string[];
}

/** Scales over the data extents (made nice) and the axis lines, ticks and labels. */
export function axes(xExtent: [number, number], yExtent: [number, number], xLabel: string, yLabel: string, frame = FRAME): Axes {
  const x = scaleLinear(niceDomain(xExtent[0], xExtent[1]), [frame.left, frame.width - frame.right]);
  const y = scaleLinear(niceDomain(yExtent[0], yExtent[1]), [frame.height - frame.bottom, frame.top]);
  const svg: string[] = [];
  const x0 = frame.left;
  const y0 = frame.height - frame.bottom;
  svg.push(`<g class="axis">`);
  svg.push(`<line x1="${x0}" y1="${y0}" x2="${frame.width - frame.right}" y2="${y0}"/><line x1="${x0}" y1="${y0}" x2="${x0}" y2="${frame.top}"/>`);
  for (const t of x.ticks(6))
    svg.push(
      `<line class="grid" x1="${r2(x(t))}" y1="${y0}" x2="${r2(x(t))}" y2="${frame.top}"/><text x="${r2(x(t))}" y="${y0 + 16}" text-anchor="middle">${tickLabel(t)}</text>`,
    );
  for (const t of y.ticks(5))
    svg.push(
      `<line class="grid" x1="${x0}" y1="${r2(y(t))}" x2="${frame.width - frame.right}" y2="${r2(y(t))}"/><text x="${x0 - 6}" y="${r2(y(t) + 4)}" text-anchor="end">${tickLabel(t)}</text>`,
    );
  svg.push(`<text class="label" x="${(x0 + frame.width - frame.right) / 2}" y="${frame.height - 8}" text-anchor="middle">${esc(xLabel)}</text>`);
  svg.push(`<text class="label" transform="translate(14 ${(frame.top + y0) / 2}) rotate(-90)" text-anchor="middle">${esc(yLabel)}</text>`);
  svg.push(`</g>`);
  return { x, y, svg };
}

export function svgOpen(id: string, title: string, frame = FRAME): string {
  return `<svg id="${id}" class="plot" viewBox="0 0 ${frame.width} ${frame.height}" role="img" aria-label="${esc(title)}" xmlns="http://www.w3.org/2000/svg"><title>${esc(title)}</title>`;
}

export function polyline(points: [number, number][], cls: string): string {
  return `<polyline class="${cls}" points="${points.map(([a, b]) => `${r2(a)},${r2(b)}`).join(' ')}"/>`;
}
