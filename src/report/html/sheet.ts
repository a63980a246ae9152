// The one-page specification sheet every spring kind writes (`design --spec`): a printable page (A4 or
// Letter) a spring maker can quote from and inspect against. Self-contained HTML: inline CSS and SVG, no
// scripts, fonts or links. Each kind fills the sections (src/kinds/<kind>/...specSheet.ts); the page,
// its tables, its dimension writers and its cautions block are shared here.
import { INCH_MM } from '../../units/kinds.js';
import { formatQuantity, unitSymbol } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import { esc } from './svg.js';

const STYLE = `
@page { margin: 10mm 12mm; }
* { box-sizing: border-box; }
html { background: #fff; }
body { margin: 0; color: #111; font: 8.2pt/1.25 system-ui, -apple-system, "Segoe UI", Roboto, Arial, sans-serif; }
.sheet { width: 184mm; margin: 0 auto; }
header { display: flex; justify-content: space-between; align-items: flex-end; border-bottom: 1.6pt solid #111; padding-bottom: 1.5mm; margin-bottom: 1.5mm; }
h1 { font-size: 13pt; margin: 0; }
header p { margin: 0.6mm 0 0; color: #333; }
h2 { font-size: 8.6pt; margin: 2mm 0 0.8mm; text-transform: uppercase; letter-spacing: 0.05em; border-bottom: 0.6pt solid #777; }
table { border-collapse: collapse; width: 100%; table-layout: fixed; font-variant-numeric: tabular-nums; }
col.k { width: 22%; } col.v { width: 31%; }
td, th { padding: 0.35mm 1.2mm; border-bottom: 0.4pt solid #ccc; vertical-align: top; text-align: left; }
th { font-weight: 600; color: #333; }
td.v { font-weight: 600; }
td.n { color: #444; }
.cols { display: grid; grid-template-columns: 44% 1fr; gap: 4mm; align-items: start; }
.loads col.k { width: 30%; } .loads col.v { width: 30%; }
svg { width: 100%; height: auto; display: block; }
svg .wire line { stroke: #2f5f7f; stroke-linecap: round; }
svg .section circle { fill: #b4542c; }
svg .dim line { stroke: #222; stroke-width: 0.8; }
svg text { font-size: 10px; fill: #111; font-family: inherit; }
.note { color: #444; font-size: 7.8pt; margin: 1mm 0 0; }
.warn { color: #8a2f0f; font-weight: 600; }
.cautions { border-left: 1.6mm solid #a4441f; padding: 1mm 2.5mm; margin-top: 1mm; }
.cautions ul { margin: 0; padding-left: 4mm; }
footer { margin-top: 2mm; color: #555; font-size: 7.4pt; }
@media screen { body { padding: 8mm 0; background: #eee; } .sheet { background: #fff; padding: 10mm 12mm; width: 210mm; box-shadow: 0 0 4mm #aaa; } }
`;

/** How a sheet writes its figures: at the precision a drawing carries (diameters to 0.01 mm or 0.001 in,
 * lengths to 0.1 mm or 0.01 in, tolerances one place finer), forces as everywhere else. */
export interface SheetWriters {
  dia: (v: number) => string;
  free: (v: number) => string;
  tol: (v: number) => string;
  F: (v: number) => string;
}

export function sheetWriters(system: UnitSystem): SheetWriters {
  const unit = unitSymbol('length', system);
  const fixed = (v: number, mmDecimals: number, inDecimals: number) =>
    system === 'us' ? `${(v / INCH_MM).toFixed(inDecimals)} ${unit}` : `${v.toFixed(mmDecimals)} ${unit}`;
  return {
    dia: (v) => fixed(v, 2, 3),
    free: (v) => fixed(v, 1, 2),
    tol: (v) => fixed(v, 3, 4),
    F: (v) => formatQuantity(v, 'force', system),
  };
}

/** A table of rows (label, value, note) in the sheet's three columns. */
export const sheetTable = (rows: string[]) => `<table><colgroup><col class="k"><col class="v"><col></colgroup>${rows.join('')}</table>`;

/** A share as a percentage at three figures (5%, 12.5%). */
export const sheetPercent = (v: number) => `${Number((v * 100).toPrecision(3))}%`;

export function sheetRow(label: string, value: string, note = ''): string {
  return `<tr><th>${esc(label)}</th><td class="v">${esc(value)}</td><td class="n">${esc(note)}</td></tr>`;
}

export interface SheetDocument {
  title: string;
  /** The line under the title (material, ends or loops, units, the tolerance standard). */
  subtitle: string;
  /** The top-right corner: a date, or who wrote it. */
  stamp: string;
  /** The body, in order: each an HTML block. */
  sections: readonly string[];
  cautions: readonly string[];
  /** The footer line, HTML (its figures escaped by the caller). */
  footer: string;
  /** CSS a kind adds after the shared style (its drawing's marks). */
  style?: string;
}

/** The sheet as one HTML document. */
export function sheetDocument(d: SheetDocument): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(d.title)}</title>
<style>${STYLE}${d.style ?? ''}</style>
</head>
<body>
<div class="sheet">
<header><div><h1>${esc(d.title)}</h1><p>${esc(d.subtitle)}</p></div><p>${esc(d.stamp)}</p></header>
${d.sections.join('\n')}
<h2>Cautions</h2>
<div class="cautions"><ul>${d.cautions.map((c) => `<li>${esc(c)}</li>`).join('')}</ul></div>
<footer>${d.footer}</footer>
</div>
</body>
</html>
`;
}
