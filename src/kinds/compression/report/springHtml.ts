// The HTML report of one analysed spring.
import type { SpringCase } from '../springFile.js';
import type { SpringAnalysis } from '../analysis.js';
import type { UnitSystem } from '../../../units/systems.js';
import { writeOutputFile } from '../../../report/writeFile.js';
import { springSections } from './designHtml.js';
import { CONVENTIONS, htmlTable, page } from '../../../report/html/page.js';

export function springHtml(c: SpringCase, a: SpringAnalysis, system: UnitSystem): string {
  const m = c.materialChoice.material;
  const sections = springSections(a, system, c.service, `${m.name} (${m.standard})`);
  sections.push(
    `<h2>Conventions</h2>${htmlTable(
      ['item', 'method and source'],
      CONVENTIONS.map(([x, y]) => [x, y]),
      { cls: 'kv' },
    )}`,
  );
  return page('coilfront spring analysis', `${m.name}, ${a.geometry.ends} ends. Written by coilfront.`, sections);
}

export function writeSpringReport(path: string, c: SpringCase, a: SpringAnalysis, system: UnitSystem, force: boolean): void {
  writeOutputFile(path, springHtml(c, a, system), force, '--report');
}
