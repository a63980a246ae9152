// The stock section of an HTML report: the passing rows ranked, the near misses with what they fail,
// the rows each check cut, the table's rates beside coilfront's, the bad rows, and the comparison with
// the best custom spring when one was run; then the best stock spring's own diagrams.
import { bandText } from '../check/band.js';
import { givenService } from '../check/given.js';
import { compareRows, compareSummary, missText, stockGrid, STOCK_NOTE } from './report.js';
import type { AnyStockRun, StockRun } from './run.js';
import { extensionStockGrid, EXTENSION_STOCK_NOTE, type ExtensionStockRun } from './extension.js';
import { extensionCautionSection, extensionConventionsSection, extensionSpringSections } from '../kinds/extension/html.js';
import { extensionService } from '../kinds/extension/checks.js';
import { failureText } from '../check/report.js';
import { sig } from '../units/format.js';
import type { UnitSystem } from '../units/systems.js';
import { writeOutputFile } from '../report/writeFile.js';
import { springSections } from '../kinds/compression/report/designHtml.js';
import { CONVENTIONS, htmlTable, page } from '../report/html/page.js';
import { esc } from '../report/html/svg.js';

export function stockSection(run: StockRun, system: UnitSystem, tableLabel: string): string[] {
  const out: string[] = [];
  out.push('<h2>Stock springs</h2>');
  out.push(
    htmlTable(
      ['item', 'value'],
      [
        ['table', tableLabel],
        ['rows', `${run.table.total} (${run.results.length} checked, ${run.bad.length} bad)`],
        ['working force band', bandText(run.band, system)],
        ['pass every check', `${run.passing.length}${run.passing.length ? `, ranked by ${run.rank.replace('_', ' ')}` : ''}`],
      ],
      { cls: 'kv' },
    ),
  );
  if (run.passing.length) {
    const t = stockGrid(run.passing.slice(0, run.top), system, true);
    out.push(htmlTable(t.header, t.cells, { bestFirst: true }));
  } else out.push('<p>No row passes every check.</p>');
  if (run.misses.length) {
    out.push('<h2>Best near misses</h2>');
    const t = stockGrid(run.misses, system, false);
    out.push(htmlTable(t.header, t.cells));
    out.push(`<ul>${run.misses.map((r) => `<li>${esc(missText(r, system))}</li>`).join('')}</ul>`);
  }
  const cut = Object.entries(run.failedBy).sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]));
  if (cut.length)
    out.push(
      htmlTable(
        ['check', 'rows failing it'],
        cut.map(([n, c]) => [n, String(c)]),
        { cls: 'kv' },
      ),
    );
  const rates = run.results.filter((r) => r.rateDeviation !== null && Math.abs(r.rateDeviation) > run.rateDeviationLimit);
  if (rates.length) {
    out.push(
      `<p>The table's rate differs from coilfront's by more than ${sig(run.rateDeviationLimit * 100, 3)}% on ${rates.length} rows (a catalogue rate is a nominal with its own tolerance; the checks use coilfront's): ${esc(
        rates
          .slice(0, 12)
          .map((r) => `${r.row.partNumber} ${r.rateDeviation! >= 0 ? '+' : ''}${sig(r.rateDeviation! * 100, 3)}%`)
          .join(', '),
      )}${rates.length > 12 ? ', ...' : ''}.</p>`,
    );
  }
  if (run.bad.length) {
    out.push('<h2>Bad rows (skipped)</h2>');
    out.push(
      htmlTable(
        ['line', 'part', 'column', 'what was expected'],
        run.bad.slice(0, 50).map((b) => [String(b.line), b.partNumber ?? '-', b.field, b.message]),
      ),
    );
  }
  const rows = compareRows(run, system);
  if (rows) {
    out.push('<h2>Stock against custom</h2>');
    out.push(htmlTable(rows[0], rows.slice(1), { cls: '' }));
    out.push(`<p>${esc(compareSummary(run))}</p>`);
  }
  out.push(`<p>${esc(STOCK_NOTE)}</p>`);
  return out;
}

/** A report of its own when no design was run: the stock section and the best stock spring in full. */
export function stockHtml(run: AnyStockRun, system: UnitSystem, tableLabel: string): string {
  if (run.kind === 'extension') return extensionStockHtml(run, system, tableLabel);
  const sections = stockSection(run, system, tableLabel);
  const best = run.passing[0];
  if (best)
    sections.push(
      ...springSections(best.verdict.analysis, system, givenService(run.req, best.verdict.spring), `The best stock spring: ${best.row.partNumber}`),
    );
  sections.push(
    `<h2>Conventions</h2>${htmlTable(
      ['item', 'method and source'],
      CONVENTIONS.map(([a, b]) => [a, b]),
      { cls: 'kv' },
    )}`,
  );
  return page('coilfront stock report', `Stock table ${tableLabel} against the requirements. Written by coilfront.`, sections);
}

export function writeStockReport(path: string, html: string, force: boolean): void {
  writeOutputFile(path, html, force, '--report');
}

/** The same for a table of extension springs: the rows against the extension requirement, the best
 * one in full (force line from its initial tension, loop stresses, side view), the caution. */
export function extensionStockHtml(run: ExtensionStockRun, system: UnitSystem, tableLabel: string): string {
  const out: string[] = [
    '<h2>Stock extension springs</h2>',
    htmlTable(
      ['item', 'value'],
      [
        ['table', tableLabel],
        ['rows', `${run.table.total} (${run.results.length} checked, ${run.bad.length} bad)`],
        ['working force band', bandText(run.band, system)],
        ['pass every check', `${run.passing.length}${run.passing.length ? `, ranked by ${run.rank.replace('_', ' ')}` : ''}`],
      ],
      { cls: 'kv' },
    ),
  ];
  if (run.passing.length) {
    const t = extensionStockGrid(run.passing.slice(0, run.top), system, true);
    out.push(htmlTable(t.header, t.cells, { bestFirst: true }));
  } else out.push('<p>No row passes every check.</p>');
  if (run.misses.length) {
    out.push('<h2>Best near misses</h2>');
    const t = extensionStockGrid(run.misses, system, false);
    out.push(htmlTable(t.header, t.cells));
    out.push(
      `<ul>${run.misses.map((r) => `<li>${esc(`${r.row.partNumber} (line ${r.row.line}) fails ${r.verdict.failing.map((l) => failureText(l, system)).join('; ')}`)}</li>`).join('')}</ul>`,
    );
  }
  const cut = Object.entries(run.failedBy).sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]));
  if (cut.length)
    out.push(
      htmlTable(
        ['check', 'rows failing it'],
        cut.map(([n, c]) => [n, String(c)]),
        { cls: 'kv' },
      ),
    );
  if (run.bad.length) {
    out.push('<h2>Bad rows (skipped)</h2>');
    out.push(
      htmlTable(
        ['line', 'part', 'column', 'what was expected'],
        run.bad.slice(0, 50).map((b) => [String(b.line), b.partNumber ?? '-', b.field, b.message]),
      ),
    );
  }
  out.push(`<p>${esc(EXTENSION_STOCK_NOTE)}</p>`);
  const best = run.passing[0];
  if (best)
    out.push(
      ...extensionSpringSections(
        best.verdict.analysis,
        { ...extensionService(run.req), peened: false },
        system,
        `The best stock spring: ${best.row.partNumber}`,
      ),
    );
  out.push(extensionConventionsSection(), extensionCautionSection());
  return page('coilfront extension stock report', `Stock table ${tableLabel} against the extension requirements. Written by coilfront.`, out);
}
