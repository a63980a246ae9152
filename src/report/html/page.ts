// The report page: one self-contained HTML file (inline CSS and SVG, no scripts, fonts or network),
// readable on screen in a light or dark theme and printed on A4 or Letter.
import { CAUTIONS } from '../cautions.js';
import { esc } from './svg.js';

const STYLE = `
:root { --ink: #1d2329; --muted: #5b6670; --paper: #fbfaf7; --panel: #ffffff; --rule: #d9d5cc; --accent: #b4542c; --cloud: #8aa3b5; --front: #2f6f8f; --ok: #3f7d4e; --warn: #a4441f; }
@media (prefers-color-scheme: dark) {
  :root { --ink: #e7e4dc; --muted: #a7a39a; --paper: #16191c; --panel: #1f2327; --rule: #3a3f45; --accent: #f08a5d; --cloud: #5d7a8e; --front: #7cc0e0; --ok: #7fc28f; --warn: #f0a07a; }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink); font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; }
main { max-width: 1100px; margin: 0 auto; padding: 24px 28px 48px; }
h1 { font-size: 1.55rem; margin: 0 0 4px; letter-spacing: 0.01em; }
h2 { font-size: 1.12rem; margin: 30px 0 10px; padding-bottom: 4px; border-bottom: 2px solid var(--accent); }
.sub { color: var(--muted); margin: 0 0 16px; }
.grid2 { display: grid; grid-template-columns: repeat(auto-fit, minmax(420px, 1fr)); gap: 18px; }
figure { margin: 0; background: var(--panel); border: 1px solid var(--rule); border-radius: 6px; padding: 10px; }
figcaption { color: var(--muted); font-size: 0.86rem; margin-top: 4px; }
table { border-collapse: collapse; width: 100%; background: var(--panel); font-size: 0.86rem; font-variant-numeric: tabular-nums; }
th, td { border-bottom: 1px solid var(--rule); padding: 4px 8px; text-align: right; white-space: nowrap; }
th:first-child, td:first-child, td.text, th.text { text-align: left; }
thead th { color: var(--muted); font-weight: 600; }
tr.best td { background: color-mix(in srgb, var(--accent) 12%, transparent); }
.kv td:first-child { color: var(--muted); }
.kv td { text-align: left; white-space: normal; }
.kv td:first-child { width: 32%; }
.scroll { overflow-x: auto; }
.warn { color: var(--warn); }
p.note { color: var(--muted); font-size: 0.86rem; margin: 4px 0 0; }
.cautions { border-left: 4px solid var(--warn); padding: 8px 14px; background: var(--panel); }
svg.plot { width: 100%; height: auto; display: block; }
#plot-drawing { max-width: 760px; margin: 0 auto; }
svg .axis line { stroke: var(--muted); stroke-width: 1; }
svg .axis line.grid { stroke: var(--rule); stroke-width: 0.6; }
svg text { fill: var(--ink); font-size: 11px; font-family: inherit; }
svg text.label { font-size: 12px; fill: var(--muted); }
svg text.note { font-size: 11px; fill: var(--muted); }
svg .cloud circle { fill: var(--cloud); opacity: 0.55; }
svg .front { fill: none; stroke: var(--front); stroke-width: 2; }
svg .front-point { fill: var(--front); }
svg .chosen { fill: none; stroke: var(--accent); stroke-width: 3; }
svg .curve, svg .criterion { fill: none; stroke: var(--front); stroke-width: 2.2; }
svg .load-line { fill: none; stroke: var(--muted); stroke-dasharray: 5 4; }
svg .point { fill: var(--accent); }
svg .endurance { fill: var(--ok); }
svg .solid-line { stroke: var(--warn); stroke-dasharray: 4 3; }
svg .clash-line { stroke: var(--ok); stroke-dasharray: 6 3; }
svg .wire line { stroke: var(--front); stroke-linecap: round; opacity: 0.85; }
svg .section circle { fill: var(--accent); }
svg .dim line { stroke: var(--muted); }
svg text.none { fill: var(--warn); }
@media print {
  @page { size: A4; margin: 14mm; }
  body { background: #fff; color: #000; font-size: 10.5pt; }
  main { max-width: none; padding: 0; }
  .grid2 { grid-template-columns: 1fr 1fr; }
  figure, table, .cautions { break-inside: avoid; }
  .scroll { overflow: visible; }
  table.ranked { font-size: 6pt; }
  table.ranked th, table.ranked td { padding: 1px 2px; white-space: normal; }
  h2 { break-after: avoid; }
}
`;

/** A self-contained page; `cautions` are the general ones of its spring kind (compression unless given). */
export function page(title: string, subtitle: string, sections: string[], cautions: readonly string[] = CAUTIONS): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="color-scheme" content="light dark">
<title>${esc(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
<h1>${esc(title)}</h1>
<p class="sub">${esc(subtitle)}</p>
${sections.join('\n')}
<h2>Cautions</h2>
<div class="cautions"><ul>${cautions.map((c) => `<li>${esc(c)}</li>`).join('')}</ul></div>
</main>
</body>
</html>
`;
}

export function htmlTable(header: string[], rows: string[][], opts: { bestFirst?: boolean; cls?: string } = {}): string {
  const head = `<thead><tr>${header.map((h, i) => `<th${i === 0 ? ' class="text"' : ''}>${esc(h)}</th>`).join('')}</tr></thead>`;
  const body = rows.map((r, i) => `<tr${opts.bestFirst && i === 0 ? ' class="best"' : ''}>${r.map((c) => `<td>${esc(c)}</td>`).join('')}</tr>`).join('');
  return `<div class="scroll"><table${opts.cls ? ` class="${opts.cls}"` : ''}>${head}<tbody>${body}</tbody></table></div>`;
}

export function figure(svg: string, caption: string): string {
  return svg ? `<figure>${svg}<figcaption>${esc(caption)}</figcaption></figure>` : '';
}

export const CONVENTIONS: [string, string][] = [
  ['stress correction', 'Bergstrasser K = (4C+2)/(4C-3) by default, Wahl on request (EN 13906-1 uses the Bergstrasser form)'],
  ['rate', 'k = G d^4 / (8 D^3 Na), Castigliano; optional direct-shear factor'],
  [
    'tensile strength',
    "Sut = A / d^m per material and diameter range (Shigley Table 10-4) or tabulated (EN 10270-1); with strength_basis: minimum the standard's tabulated minimum (ASTM A228 for music wire)",
  ],
  ['static allowable', 'fraction of Sut per material class (Shigley Table 10-6), times the static safety factor'],
  [
    'fatigue',
    "one continuous, non-increasing life curve per material: finite-life fractions of Sut at 1e5/1e6/1e7 cycles (Associated Spring design handbook, from memory), knee at 1e7 the lower of that and Zimmerli's endurance for spring steels; Gerber, Goodman or Sines criterion; Ssu = 0.67 Sut",
  ],
  ['buckling', 'critical deflection after Shigley eqs. 10-10 to 10-13 with end constant alpha'],
  ['surge', 'f = 1/2 sqrt(k / m_active) (both ends on plates) or 1/4 (one end free), chosen by surge_ends, not by the buckling seating'],
  ['clash', 'solid force at least (1 + clash allowance) times the largest working force; optional EN 13906-1 coil-gap sum'],
];
