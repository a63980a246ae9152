// The specification sheet of one compression spring: a single printable page (A4 or Letter) a spring
// maker can quote from and inspect against. Self-contained HTML: inline CSS and SVG, no scripts, no
// fonts or links. It states what is toleranced (one force at its length, the controlled diameter by
// its EN 15800 grade, the wire by its standard), what is left to the maker (the free length, given as
// a reference), the service the spring is made for, and the cautions.
import type { Material } from '../../../catalogs/types.js';
import type { Requirements } from '../requirements.js';
import type { MaterialFigures, SpringAnalysis, SpringGeometry } from '../analysis.js';
import { CHECK_LABELS, shortestLength, type CheckName } from '../verify.js';
import { workingBand, type WorkingBand } from '../../../input/workingBand.js';
import { loadToleranceCatalog, type ToleranceGrade } from '../tolerance/catalog.js';
import { CONFIRM_SAMPLES } from '../tolerance/confirm.js';
import type { SpringTolerances } from '../tolerance/model.js';
import { controlledDiameter } from '../tolerance/precision.js';
import { specifySpring, type SpecSheetInput, type SpecifiedSpring } from '../tolerance/specify.js';
import { formatQuantity } from '../../../units/format.js';
import { sheetDocument, sheetPercent, sheetRow, sheetTable, sheetWriters, type SheetWriters } from '../../../report/html/sheet.js';
import type { UnitSystem } from '../../../units/systems.js';
import { CAUTIONS } from '../../../report/cautions.js';
import { writeOutputFile } from '../../../report/writeFile.js';
import { springDrawing } from './springDrawing.js';
import { esc, r2 } from '../../../report/html/svg.js';

/** The force bands on the sheet: each the requirement's own, so a spring the maker delivers inside the
 * sheet's bands meets the requirement (EN 15800 practice: a force at a length with its tolerance). The
 * working force's is the band `check` judges (src/input/workingBand.ts); the operating force's the
 * requirement's operating force with its load tolerance, when the requirement gives one. */
export interface SheetForceBands {
  working: WorkingBand;
  operating: { force: number; tolerance: number; low: number; high: number } | null;
  /** The force tolerance of the tolerance grade, relative, when wider than the working band (agree it with the maker). */
  gradeWider: number | null;
}

export function sheetForceBands(req: Requirements, t: SpringTolerances): SheetForceBands {
  const working = workingBand(req);
  const lt = req.loadTolerance;
  const operating =
    req.operatingForce !== undefined
      ? { force: req.operatingForce, tolerance: lt, low: req.operatingForce * (1 - lt), high: req.operatingForce * (1 + lt) }
      : null;
  const grade = t.workingForce.halfWidth / req.workingForce;
  return { working, operating, gradeWider: grade > working.tolerance * (1 + 1e-9) ? grade : null };
}

/** Largest solid length, EN 13906-1 (from memory): Nt d_max with ground ends, (Nt + 1.5) d_max unground. */
export function largestSolidLength(a: SpringAnalysis, t: SpringTolerances): number {
  const dMax = a.geometry.wireDiameter + t.wireDiameter.halfWidth;
  const ground = a.geometry.ends === 'squared-ground' || a.geometry.ends === 'plain-ground';
  return (ground ? a.geometry.totalCoils : a.geometry.totalCoils + 1.5) * dMax;
}

/** A side view at free length, to scale, with the controlled diameter and the free length dimensioned. */
export function specSideView(a: SpringAnalysis, controlled: 'outer' | 'inner', w: SheetWriters, diaTol: string): string {
  const g = a.geometry;
  const dwg = springDrawing({ wireDiameter: g.wireDiameter, meanDiameter: g.meanDiameter, activeCoils: g.activeCoils, ends: g.ends, freeLength: g.freeLength });
  const W = 340;
  const H = 150;
  const k = Math.min((W - 80) / g.freeLength, (H - 70) / g.outerDiameter);
  const x0 = 24;
  const cy = 26 + (g.outerDiameter * k) / 2;
  const X = (v: number) => x0 + v * k;
  const Y = (v: number) => cy - v * k;
  const out = [
    `<svg id="spec-view" viewBox="0 0 ${W} ${H}" role="img" aria-label="side view at free length" xmlns="http://www.w3.org/2000/svg"><title>side view at free length</title><g class="wire">`,
  ];
  const s = dwg.sections;
  for (let i = 0; i + 1 < s.length; i++)
    out.push(
      `<line x1="${r2(X(s[i].x))}" y1="${r2(Y(s[i].y))}" x2="${r2(X(s[i + 1].x))}" y2="${r2(Y(s[i + 1].y))}" stroke-width="${r2(Math.max(1, g.wireDiameter * k))}"/>`,
    );
  out.push('</g><g class="section">');
  for (const p of s) out.push(`<circle cx="${r2(X(p.x))}" cy="${r2(Y(p.y))}" r="${r2(Math.max(0.8, (g.wireDiameter * k) / 2))}"/>`);
  out.push('</g><g class="dim">');
  // Free length below the spring.
  const yL = Y(-g.outerDiameter / 2) + 18;
  const xa = X(0);
  const xb = X(g.freeLength);
  out.push(
    `<line x1="${r2(xa)}" y1="${r2(yL)}" x2="${r2(xb)}" y2="${r2(yL)}"/><line x1="${r2(xa)}" y1="${r2(yL - 5)}" x2="${r2(xa)}" y2="${r2(yL + 5)}"/><line x1="${r2(xb)}" y1="${r2(yL - 5)}" x2="${r2(xb)}" y2="${r2(yL + 5)}"/>`,
  );
  out.push(`<text x="${r2((xa + xb) / 2)}" y="${r2(yL + 13)}" text-anchor="middle">L0 (${w.free(g.freeLength)}) reference</text>`);
  // Controlled diameter at the right end: outer edges for OD, inner edges for ID.
  const half = controlled === 'outer' ? g.outerDiameter / 2 : g.innerDiameter / 2;
  const xd = xb + 16;
  out.push(
    `<line x1="${r2(xd)}" y1="${r2(Y(half))}" x2="${r2(xd)}" y2="${r2(Y(-half))}"/><line x1="${r2(xd - 5)}" y1="${r2(Y(half))}" x2="${r2(xd + 5)}" y2="${r2(Y(half))}"/><line x1="${r2(xd - 5)}" y1="${r2(Y(-half))}" x2="${r2(xd + 5)}" y2="${r2(Y(-half))}"/>`,
  );
  if (controlled === 'inner')
    out.push(
      `<line x1="${r2(xb)}" y1="${r2(Y(half))}" x2="${r2(xd)}" y2="${r2(Y(half))}" stroke-dasharray="2 2"/><line x1="${r2(xb)}" y1="${r2(Y(-half))}" x2="${r2(xd)}" y2="${r2(Y(-half))}" stroke-dasharray="2 2"/>`,
    );
  out.push(
    `<text transform="translate(${r2(xd + 12)} ${r2(cy)}) rotate(-90)" text-anchor="middle">${controlled === 'outer' ? 'OD' : 'ID'} ${esc(w.dia(controlled === 'outer' ? g.outerDiameter : g.innerDiameter))} ${esc(diaTol)}</text>`,
  );
  out.push(`<text x="${r2(xa)}" y="${r2(Y(g.outerDiameter / 2) - 8)}">d ${esc(w.dia(g.wireDiameter))}, ${g.totalCoils} total coils, ${g.ends} ends</text>`);
  out.push('</g></svg>');
  return out.join('');
}

const CHECK_WORDS = (name: CheckName | null) => (name ? CHECK_LABELS[name] : 'none');

/** The sheet as one HTML document. */
export function specSheetHtml(input: SpecSheetInput): string {
  const { analysis: a, requirements: req, material: m, tolerances: t } = input;
  const system = req.system;
  const w = sheetWriters(system);
  const g = a.geometry;
  const controlled = controlledDiameter(req);
  const diaTol = `± ${w.tol(t.meanDiameter.halfWidth)}`;
  const bands = sheetForceBands(req, t);
  const wb = bands.working;
  const L1 = req.workingLength;
  // The maker meets the working force by adjusting the free length: the forces are those of the
  // spring's rate with F1 met, whatever the rounding of the reference free length.
  const F1 = req.workingForce;
  const operating = req.operatingLength !== undefined ? { length: req.operatingLength, force: F1 + a.rate * (L1 - req.operatingLength) } : undefined;
  const shortest = shortestLength(req);
  const lsMax = largestSolidLength(a, t);
  const direction = input.coilingDirection === 'left' ? 'left hand' : input.coilingDirection === 'right' ? 'right hand' : "optional (maker's choice)";
  const envelope =
    controlled === 'outer'
      ? req.maxOuterDiameter !== undefined
        ? `works in a bore of ${w.dia(req.maxOuterDiameter)}`
        : 'no bore given'
      : `works over a rod of ${w.dia(req.minInnerDiameter!)}`;

  const spring = [
    sheetRow('material', m.name, m.standard),
    sheetRow('wire diameter d', `${w.dia(g.wireDiameter)} ± ${w.tol(t.wireDiameter.halfWidth)}`, t.wireDiameter.source),
    sheetRow(
      controlled === 'outer' ? 'outer diameter OD (controlled)' : 'inner diameter ID (controlled)',
      `${w.dia(controlled === 'outer' ? g.outerDiameter : g.innerDiameter)} ${diaTol}`,
      `EN 15800 grade ${t.grade}; ${envelope}`,
    ),
    sheetRow('mean diameter D', w.dia(g.meanDiameter), `index ${g.springIndex.toFixed(2)}`),
    sheetRow(
      'free length L0',
      `${w.free(g.freeLength)} reference`,
      `adjusted by the maker to meet the working force (about ± ${w.free(t.freeLength.halfWidth)})`,
    ),
    sheetRow('total / active coils', `${g.totalCoils} / ${g.activeCoils}`, `active coils ± ${t.activeCoils.halfWidth} held by the coiler`),
    sheetRow('ends', g.ends.replace('-', ', '), g.ends.includes('ground') ? 'ground square to the axis' : 'not ground'),
    sheetRow('coiling direction', direction, ''),
    sheetRow('largest solid length', w.free(lsMax), `EN 13906-1 rule with d max (from memory); shortest working length ${w.free(shortest)}`),
  ];
  const ob = bands.operating;
  const loads = [
    sheetRow(
      'working force F1',
      `${w.F(F1)} ± ${sheetPercent(wb.tolerance)}`,
      `at length L1 = ${w.free(L1)}: ${w.F(wb.low)} to ${w.F(wb.high)}, ${wb.source === 'default' ? "coilfront's default 2% (the requirement gives no tolerance): agree it with the maker" : `the requirement's ${wb.source}`}`,
    ),
    !operating
      ? sheetRow('operating force F2', 'none', 'static spring: one working length')
      : ob
        ? sheetRow(
            'operating force F2',
            ob.tolerance > 0 ? `${w.F(ob.force)} ± ${sheetPercent(ob.tolerance)}` : w.F(ob.force),
            `at length L2 = ${w.free(operating.length)}: ${ob.tolerance > 0 ? `${w.F(ob.low)} to ${w.F(ob.high)} required` : 'exact in the requirements (load_tolerance 0): agree a tolerance with the maker'}; this spring as drawn ${w.F(a.points[a.points.length - 1].force)}`,
          )
        : sheetRow(
            'operating force F2',
            `${w.F(operating.force)} reference`,
            `at length L2 = ${w.free(operating.length)}; for information (the requirements give no operating force)`,
          ),
    sheetRow('rate', formatQuantity(a.rate, 'rate', system), 'for information'),
  ];
  const service = [
    sheetRow('set removal', req.setRemoved ? 'yes' : 'no', req.setRemoved ? 'the allowable stress assumes the set is removed' : ''),
    sheetRow('shot peening', req.peened ? 'yes' : 'no', req.peened ? 'the fatigue strength assumes peened wire' : ''),
    sheetRow('finish', input.finish ?? 'to be agreed', input.finish ? '' : 'state a coating or oil if corrosion matters'),
    sheetRow(
      'temperature',
      req.temperature !== undefined ? formatQuantity(req.temperature, 'temperature', system) : 'not given',
      m.maxTemperature ? `material maximum ${formatQuantity(m.maxTemperature.value, 'temperature', system)}` : '',
    ),
    sheetRow(
      'load cycles',
      req.cycles === undefined ? 'static' : Number.isFinite(req.cycles) ? req.cycles.toExponential(1).replace('e+', 'e') : 'infinite life',
      a.fatigue ? `fatigue safety factor ${a.fatigue.safetyFactor.toFixed(2)} (${a.fatigue.criterion})` : '',
    ),
    sheetRow('static safety factor', a.staticSafetyFactor.toFixed(2), `at the shortest working length`),
  ];
  const y = input.yield;
  const quality = [
    sheetRow('tolerance grade', `EN 15800 grade ${t.grade}`, t.grade === 1 ? 'fine' : t.grade === 2 ? 'medium' : 'coarse'),
    sheetRow('standards', [...t.standards, 'EN 13906-1'].join(', '), 'tolerances, wire, calculation'),
    sheetRow('shear modulus spread', `± ${sheetPercent(t.shearModulus.halfWidth / a.material.shearModulus)}`, t.shearModulus.source),
  ];
  if (y) {
    quality.push(sheetRow('yield (estimate)', sheetPercent(y.estimate), 'first order, the working force met at adjustment'));
    if (y.monteCarlo)
      quality.push(
        sheetRow(
          'yield (Monte Carlo)',
          sheetPercent(y.monteCarlo.yield),
          `${y.monteCarlo.samples} samples${y.seed !== undefined ? `, seed ${y.seed}` : ''}; limiting: ${CHECK_WORDS(y.monteCarlo.limiting)}`,
        ),
      );
  }
  const notes = [...t.notes];
  if (bands.gradeWider !== null)
    notes.push(
      `the working-force band ± ${sheetPercent(wb.tolerance)} is tighter than the force tolerance of EN 15800 grade ${t.grade} (± ${sheetPercent(bands.gradeWider)}): agree it with the maker`,
    );
  if (lsMax >= shortest)
    notes.push(`the largest solid length ${w.free(lsMax)} reaches the shortest working length ${w.free(shortest)}: agree the solid length with the maker`);
  const title = input.part ? `Compression spring: ${input.part}` : 'Compression spring specification';
  const unitsLine = system === 'us' ? 'Dimensions in inches, forces in lbf' : 'Dimensions in mm, forces in N';
  return sheetDocument({
    title,
    subtitle: `${m.name} (${m.standard}), ${g.ends} ends, ${unitsLine}. Tolerances to EN 15800 grade ${t.grade} unless stated.`,
    stamp: input.date ?? 'written by coilfront',
    sections: [
      `<section><h2>Spring</h2>${sheetTable(spring)}</section>`,
      `<div class="cols">
<section><h2>Side view at free length (to scale)</h2>${specSideView(a, controlled, w, diaTol)}</section>
<section class="loads"><h2>Loads</h2>${sheetTable(loads)}</section>
</div>`,
      `<section><h2>Service</h2>${sheetTable(service)}</section>`,
      `<section><h2>Tolerances and yield</h2>${sheetTable(quality)}
${notes.length ? `<p class="note warn">${notes.map(esc).join('<br>')}</p>` : ''}</section>`,
      `<p class="note">The maker may vary the free length to meet the working force at its length; the forces are toleranced at their lengths by the requirement's own bands, so a spring inside them meets the requirement. Figures marked "from memory" in the sources could not be checked against the publication: confirm them with the maker.</p>`,
    ],
    cautions: CAUTIONS,
    footer: `Written by coilfront. Requirements: working force ${esc(w.F(req.workingForce))} at ${esc(w.free(L1))}${req.operatingForce !== undefined && req.operatingLength !== undefined ? `, operating force ${esc(w.F(req.operatingForce))} ± ${esc(sheetPercent(req.loadTolerance))} at ${esc(w.free(req.operatingLength))}` : ''}.`,
  });
}

/** Write the sheet of a reported spring (as drawn, at the requirement's tolerance grade and overrides,
 * or grade `grade` when given, seeded Monte Carlo with as many samples as the design's confirmation). */
export function writeSpecSheet(
  path: string,
  c: { geometry: SpringGeometry; item: { figures: MaterialFigures; choice: { material: Material } } },
  req: Requirements,
  system: UnitSystem,
  force: boolean,
  grade?: ToleranceGrade,
): SpecifiedSpring {
  const shown = { ...req, system };
  const spec = specifySpring(
    loadToleranceCatalog(),
    grade === undefined ? req.tolerance : { grade, overrides: {} },
    { geometry: c.geometry, figures: c.item.figures, material: c.item.choice.material },
    shown,
    { samples: CONFIRM_SAMPLES },
  );
  writeOutputFile(path, specSheetHtml(spec.sheet), force, '--spec');
  return spec;
}
