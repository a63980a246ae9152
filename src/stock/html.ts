// The stock section of an HTML report (the one renderer of ./render.ts, for either kind), and a report
// of its own when no design report carries it: the section, then the best stock spring's own diagrams.
import { givenService } from '../check/given.js';
import { COMPRESSION_STOCK_VIEW } from './report.js';
import type { AnyStockRun, StockRun } from './run.js';
import { EXTENSION_STOCK_VIEW, type ExtensionStockRun } from './extension.js';
import { renderStockSection } from './render.js';
import { extensionCautionSection, extensionConventionsSection, extensionSpringSections } from '../kinds/extension/html.js';
import { extensionService } from '../kinds/extension/checks.js';
import type { UnitSystem } from '../units/systems.js';
import { writeOutputFile } from '../report/writeFile.js';
import { designHtml, springSections } from '../kinds/compression/report/designHtml.js';
import { reportFrontier } from '../kinds/compression/frontier.js';
import { CONVENTIONS, htmlTable, page } from '../report/html/page.js';

export function stockSection(run: StockRun, system: UnitSystem, tableLabel: string): string[] {
  return renderStockSection(COMPRESSION_STOCK_VIEW, run, system, tableLabel);
}

/** The HTML report of a stock run (--report): under --compare, for a compression table, the design
 * report with the stock section under it; else the stock report, which carries the comparison. */
export function stockReport(run: AnyStockRun, system: UnitSystem, tableLabel: string): string {
  if (run.kind === 'compression' && run.compare)
    return designHtml(run.compare.run, system, reportFrontier(run.compare.run), undefined, stockSection(run, system, tableLabel));
  return stockHtml(run, system, tableLabel);
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
  const out = renderStockSection(EXTENSION_STOCK_VIEW, run, system, tableLabel);
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
