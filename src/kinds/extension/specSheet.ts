// The specification sheet of one extension spring (`design --spec`, `analyze --spec`): one printable page
// a spring maker can quote from and inspect against, on the shared sheet of src/report/html/sheet.ts.
// What it states: the spring and its loops as made, the toleranced figures (one force at its length, the
// free length inside the loops and the outer diameter to DIN 2097 grade 2 where a source gives them;
// see ./tolerances.ts), the figures left to the maker as references (the initial tension, the rate, the
// coils), the stresses and safety factors of the body and both loop points, the life, and the cautions.
// Every spring figure is read from the fields registry (./fields.ts) or the analysis the design re-verified:
// nothing is computed again here. What no source gives is written "to be agreed with the spring maker".
import type { Material } from '../../catalogs/types.js';
import { generalCautions } from '../../report/cautions.js';
import { sheetDocument, sheetPercent, sheetRow, sheetTable, sheetWriters, type SheetWriters } from '../../report/html/sheet.js';
import { esc, r2 } from '../../report/html/svg.js';
import { formatQuantity, quantityWriter, sig } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import { InputError } from '../../units/parse.js';
import { workingBand, type BandSource } from '../../input/workingBand.js';
import { EXTENSION_CAUTION, EXTENSION_SITES, extensionWarnings, siteWords, type ExtensionService, type ExtensionSite } from './analysis.js';
import type { ExtensionCandidate } from './design.js';
import { EXTENSION_FIELDS, EXTENSION_JSON_FIELDS } from './fields.js';
import { closeWoundBody } from './html.js';
import { bandFraction } from './figures.js';
import type { ExtensionRequirements } from './requirements.js';
import type { ExtensionCase } from './springFile.js';
import type { ExtensionAnalysis } from './analysis.js';
import { EXTENSION_TOLERANCE_GRADE, TO_BE_AGREED, coilDiameterTolerance, freeLengthTolerance, loopPositionTolerance } from './tolerances.js';

export interface ExtensionSheetInput {
  /** The spring: a designed one, or a spring file's (extensionSheetSpring). */
  spring: ExtensionCandidate;
  /** The lengths it works at (the first the working length, the last the operating length), its life. */
  service: ExtensionService;
  system: UnitSystem;
  /** The requirement it was designed to (design --spec); absent for a spring file (analyze --spec). */
  requirements?: ExtensionRequirements;
  /** How the spring file was read (an assumed bend radius...). */
  notes?: readonly string[];
  part?: string;
}

/** A spring file's spring as the fields registry reads a spring (its checks and objectives are a design's: none). */
export function extensionSheetSpring(c: ExtensionCase, a: ExtensionAnalysis): ExtensionCandidate {
  return {
    item: { choice: c.materialChoice, wireDiameter: c.geometry.wireDiameter, material: c.material },
    geometry: c.geometry,
    analysis: a,
    checks: new Float64Array(0),
    objectives: new Float64Array(0),
  };
}

/** A figure of the fields registry, the one the tables, CSV and JSON show. */
export function sheetFigure(c: ExtensionCandidate, name: string): number {
  const f = EXTENSION_FIELDS.find((x) => x.name === name) ?? EXTENSION_JSON_FIELDS.find((x) => x.name === name);
  if (!f) throw new Error(`the extension specification sheet reads no field '${name}'; please report this`);
  const v = f.read(c);
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new Error(`the extension field '${name}' has no figure for this spring; please report this`);
  return v;
}

/** A sheet needs a force at a length to tolerance: a spring file without lengths or forces has none. */
export function assertSpecifiable(service: ExtensionService): void {
  if (service.lengths.length === 0)
    throw new InputError('--spec', 'a spring file with lengths or forces (the sheet tolerances the force at the working length)');
}

const LOOP_WORDS: Record<string, string> = {
  full: 'height = ID',
  half: 'height about 2/3 ID',
  extended: 'on a straight reach',
};

const SITE_HEAD: Record<ExtensionSite, string> = { body: 'body (torsion)', loopBending: 'loop, A (bending)', loopTorsion: 'loop, B (torsion)' };
const SITE_SHORT: Record<ExtensionSite, string> = { body: 'body', loopBending: 'loop A', loopTorsion: 'loop B' };

/** CSS of the extension drawing: the loops are ellipses. */
const STYLE = `svg .wire ellipse { fill: none; stroke: #2f5f7f; }
body { font-size: 7.8pt; }
col.k { width: 24%; } col.v { width: 21%; }
.cols { grid-template-columns: 40% 1fr; }
.loads col.k { width: 30%; } .loads col.v { width: 26%; }
`;

/** Side view at free length, to scale: the close-wound body, a loop at each end, the free length inside
 * the loops, the outer diameter and the left loop's height dimensioned. */
export function extensionSheetView(a: ExtensionAnalysis, w: SheetWriters, odText: string, l0Text: string): string {
  const g = a.geometry;
  const d = g.wireDiameter;
  const h = g.loopHeight;
  const W = 340;
  const H = 150;
  const k = Math.min((W - 70) / (g.freeLength + 2 * d), (H - 78) / g.outerDiameter);
  const x0 = 22 + d * k;
  // Room above and below the centre for the rotated OD label, however slender the spring is drawn.
  const cy = Math.max(30 + (g.outerDiameter * k) / 2, 72);
  const X = (v: number) => x0 + v * k;
  const Y = (v: number) => cy - v * k;
  const sw = r2(Math.max(1, d * k));
  const ry = g.meanDiameter / 2;
  const out = [
    `<svg id="spec-view" viewBox="0 0 ${W} ${H}" role="img" aria-label="side view at free length, with the loops" xmlns="http://www.w3.org/2000/svg" data-body-coils="${g.bodyCoils}"><title>side view at free length, with the loops</title><g class="wire">`,
  ];
  for (const cx of [h / 2, g.freeLength - h / 2])
    out.push(`<ellipse class="loop" cx="${r2(X(cx))}" cy="${r2(cy)}" rx="${r2(((h + d) / 2) * k)}" ry="${r2(ry * k)}" stroke-width="${sw}"/>`);
  const body = closeWoundBody(g, X, Y, k);
  out.push(...body.wire, '</g><g class="section">', ...body.sections);
  out.push('</g><g class="dim">');
  const tick = (x: number, y: number) => `<line x1="${r2(x)}" y1="${r2(y - 5)}" x2="${r2(x)}" y2="${r2(y + 5)}"/>`;
  // Free length inside the loops, below the spring.
  const yL = Y(-g.outerDiameter / 2) + 16;
  out.push(`<line x1="${r2(X(0))}" y1="${r2(yL)}" x2="${r2(X(g.freeLength))}" y2="${r2(yL)}"/>${tick(X(0), yL)}${tick(X(g.freeLength), yL)}`);
  out.push(`<text x="${r2(X(g.freeLength / 2))}" y="${r2(yL + 12)}" text-anchor="middle">L0 inside the loops ${esc(l0Text)}</text>`);
  // The left loop's height, above the spring.
  const yH = Y(g.outerDiameter / 2) - 8;
  out.push(`<line x1="${r2(X(0))}" y1="${r2(yH)}" x2="${r2(X(h))}" y2="${r2(yH)}"/>${tick(X(0), yH)}${tick(X(h), yH)}`);
  out.push(`<text x="${r2(X(0))}" y="${r2(yH - 7)}">loop height ${esc(w.free(h))}</text>`);
  // Outer diameter at the right end.
  const xd = X(g.freeLength) + 10;
  const half = g.outerDiameter / 2;
  out.push(
    `<line x1="${r2(xd)}" y1="${r2(Y(half))}" x2="${r2(xd)}" y2="${r2(Y(-half))}"/><line x1="${r2(xd - 5)}" y1="${r2(Y(half))}" x2="${r2(xd + 5)}" y2="${r2(Y(half))}"/><line x1="${r2(xd - 5)}" y1="${r2(Y(-half))}" x2="${r2(xd + 5)}" y2="${r2(Y(-half))}"/>`,
  );
  out.push(`<text transform="translate(${r2(xd + 12)} ${r2(cy)}) rotate(-90)" text-anchor="middle">OD ${esc(odText)}</text>`);
  out.push('</g></svg>');
  return out.join('');
}

const BAND_WORDS: Record<BandSource, string> = {
  working_tolerance: "the requirement's working_tolerance",
  load_tolerance: "the requirement's load_tolerance",
  default: "coilfront's default 2% (the requirement gives no tolerance): agree it with the maker",
};

const cyclesWords = (c: number | undefined) => (c === undefined ? 'static' : Number.isFinite(c) ? c.toExponential(1).replace('e+', 'e') : 'infinite life');

/** The sheet as one HTML document. */
export function extensionSpecSheetHtml(input: ExtensionSheetInput): string {
  const { spring: c, service, system, requirements: req } = input;
  assertSpecifiable(service);
  const a = c.analysis;
  const m: Material = c.item.choice.material;
  const w = sheetWriters(system);
  const S = (v: number) => formatQuantity(v, 'stress', system);
  const fig = (name: string) => sheetFigure(c, name);
  const d = fig('wire_diameter');
  const D = fig('mean_diameter');
  const OD = fig('outer_diameter');
  const C = fig('spring_index');
  const Nb = fig('body_coils');
  const Na = fig('active_coils');
  const L0 = fig('free_length');
  const Fi = fig('initial_tension');
  const tauI = fig('initial_tension_stress');
  const k = fig('rate');
  const F1 = fig('working_force');
  const g = a.geometry;
  const points = a.points;
  const L1 = points[0].length;
  const last = points[points.length - 1];

  const diaTol = coilDiameterTolerance(D, C);
  const lenTol = freeLengthTolerance(L0, C);
  const posTol = loopPositionTolerance(Nb);
  const odText = diaTol ? `${w.dia(OD)} ± ${w.tol(diaTol.halfWidth)}` : w.dia(OD);
  const l0Text = lenTol ? `${w.free(L0)} ± ${w.tol(lenTol.halfWidth)}` : w.free(L0);
  const grade = `DIN 2097 grade ${EXTENSION_TOLERANCE_GRADE}`;

  const bore = req?.maxOuterDiameter !== undefined ? `; bore ${w.dia(req.maxOuterDiameter)}` : '';
  const spring = [
    sheetRow('material', m.name, m.standard),
    sheetRow('wire diameter d', w.dia(d), `tolerance per ${m.standard}`),
    sheetRow('outer diameter OD', odText, diaTol ? `${grade}${bore}` : `tolerance ${TO_BE_AGREED} (outside DIN 2097: D 0.63-200 mm, index 4-20)${bore}`),
    sheetRow('mean / inner diameter', `${w.dia(D)} / ${w.dia(fig('inner_diameter'))}`, `index C ${C.toFixed(2)}; references`),
    sheetRow('free length L0', l0Text, `inside the loops; ${lenTol ? grade : `tolerance ${TO_BE_AGREED}`}; body (Nb + 1) d = ${w.free(g.bodyLength)}`),
    sheetRow('body coils Nb', String(Number(Nb.toFixed(2))), 'close-wound, either hand; reference if two forces are toleranced'),
    sheetRow('active coils Na', Na.toFixed(2), 'Nb + G/E (Shigley eq. 10-40); for information'),
    sheetRow('mass', formatQuantity(fig('mass'), 'mass', system), 'for information'),
  ];

  const loops = [
    sheetRow('loop type', `${g.loop}, both ends`, LOOP_WORDS[g.loop] ?? ''),
    sheetRow('loop orientation', 'in line (0°)', posTol ? `± ${posTol.halfWidth}° (commercial practice)` : 'tolerance to be agreed'),
    sheetRow('loop height h', w.free(fig('loop_height')), 'inside; reference'),
    sheetRow('loop radius r1', w.dia(fig('loop_radius')), `C1 ${g.loopIndex.toFixed(2)}, (K)A ${a.factors.loopBending.toFixed(3)}`),
    sheetRow(
      'bend radius r2',
      w.dia(fig('bend_radius')),
      `C2 ${g.bendIndex.toFixed(2)}${g.bendIndex < 4 ? ' (below 4)' : ''}, (K)B ${a.factors.loopTorsion.toFixed(3)}`,
    ),
    sheetRow('opening, protrusion', 'to be agreed', 'with the spring maker'),
  ];

  const band = a.initialTension.band;
  const frac = bandFraction(a);
  // The working force is held to the band `check` accepts it in (src/input/workingBand.ts), the
  // operating force to the requirement's own band: both are what the maker inspects.
  const wb = req ? workingBand(req) : undefined;
  const f1 = wb
    ? sheetRow(
        'working force F1',
        `${w.F(F1)} ± ${sheetPercent(wb.tolerance)}`,
        `at L1 = ${w.free(L1)}: ${w.F(wb.low)} to ${w.F(wb.high)}, ${BAND_WORDS[wb.source]}`,
      )
    : sheetRow('working force F1', w.F(F1), `at L1 = ${w.free(L1)}; tolerance ${TO_BE_AGREED}`);
  const loads = [
    sheetRow(
      'initial tension Fi',
      `${w.F(Fi)} reference`,
      `stress ${S(tauI)}; preferred ${S(band.low)} to ${S(band.high)} (Shigley eq. 10-41): ${a.initialTension.position}${Number.isFinite(frac) ? `, ${sig(frac * 100, 3)}% up` : ''}`,
    ),
    f1,
  ];
  const edgeNotes: string[] = [];
  if (points.length > 1) {
    const F2 = fig('operating_force');
    const at = `at L2 = ${w.free(last.length)}`;
    if (req?.operatingForce !== undefined) {
      const lo = req.operatingForce * (1 - req.loadTolerance);
      const hi = req.operatingForce * (1 + req.loadTolerance);
      loads.push(
        sheetRow(
          'operating force F2',
          `${w.F(lo)} to ${w.F(hi)}`,
          `${at}: ${w.F(req.operatingForce)} ± ${sheetPercent(req.loadTolerance)} required; this spring ${w.F(F2)}`,
        ),
      );
      if (hi > lo && Math.min(F2 - lo, hi - F2) < 0.05 * (hi - lo))
        edgeNotes.push(`F2 ${w.F(F2)} sits at the edge of its band (${w.F(lo)} to ${w.F(hi)}): agree the rate or the body coils with the maker`);
    } else loads.push(sheetRow('operating force F2', `${w.F(F2)} reference`, `${at}; for information`));
  } else loads.push(sheetRow('operating force F2', 'none', 'one working length'));
  loads.push(sheetRow('rate k', formatQuantity(k, 'rate', system), 'reference'));
  const safe = a.safeExtension;
  loads.push(sheetRow('largest pull before a set', `${w.F(safe.force)} at ${w.free(safe.length)}`, `${siteWords(safe.governing)} at its static allowable`));
  loads.push(
    req?.maxExtendedLength !== undefined
      ? sheetRow(
          'maximum extended length',
          w.free(req.maxExtendedLength),
          `extension ${w.free(req.maxExtendedLength - L0)}: the longest stretch, reached without a set`,
        )
      : sheetRow('maximum extended length', w.free(safe.length), 'not stated: a set begins beyond it'),
  );

  const fa = a.fatigue;
  const nf = (v: number) => (Number.isFinite(v) ? v.toFixed(2) : 'n/a');
  const stressFields: Record<ExtensionSite, [string, string]> = {
    body: ['body_stress', 'body_safety_factor'],
    loopBending: ['loop_bending_stress', 'loop_bending_safety_factor'],
    loopTorsion: ['loop_torsion_stress', 'loop_torsion_safety_factor'],
  };
  const allow = a.material.allowables;
  const allowOf: Record<ExtensionSite, number> = { body: allow.bodyTorsion, loopBending: allow.loopBending, loopTorsion: allow.loopTorsion };
  const cells = (f: (s: ExtensionSite) => string) => EXTENSION_SITES.map((s) => `<td>${esc(f(s))}</td>`).join('');
  const stressRows = [
    `<tr><th></th>${EXTENSION_SITES.map((s) => `<th>${esc(SITE_HEAD[s])}</th>`).join('')}</tr>`,
    `<tr><th>${esc(`stress at ${w.free(last.length)}`)}</th>${cells((s) => S(fig(stressFields[s][0])))}</tr>`,
    `<tr><th>static safety factor</th>${cells((s) => `${fig(stressFields[s][1]).toFixed(2)} (allowable ${S(allowOf[s])})`)}</tr>`,
  ];
  if (fa) stressRows.push(`<tr><th>fatigue safety factor</th>${cells((s) => nf(fa[s].safetyFactor))}</tr>`);
  const stresses = `<table class="grid4"><colgroup><col class="k"><col><col><col></colgroup>${stressRows.join('')}</table>`;

  const svc = [
    sheetRow(
      'load cycles',
      cyclesWords(service.cycles),
      fa
        ? `${fa.criterion}, ${fa.life} life, ${w.F(fa.minForce)} to ${w.F(fa.maxForce)}; lowest fatigue safety factor ${nf(fa[fa.governing].safetyFactor)} (${SITE_SHORT[fa.governing]})`
        : 'static: no fatigue check',
    ),
    sheetRow('shot peening', service.peened ? 'yes' : 'no', service.peened ? 'credited to the body only: the loops are judged unpeened' : ''),
    sheetRow('finish', 'to be agreed', 'with the maker: a coating or oil if corrosion matters'),
    sheetRow(
      'temperature',
      service.temperature !== undefined ? formatQuantity(service.temperature, 'temperature', system) : 'not given',
      `material maximum ${formatQuantity(a.material.figures.maxTemperature, 'temperature', system)}; natural frequency ${sig(fig('natural_frequency'), 4)} Hz${service.forcingFrequency ? ` (forcing ${sig(service.forcingFrequency, 4)} Hz)` : ''}`,
    ),
  ];

  const toleranced = `F1${req?.operatingForce !== undefined ? ', F2' : ''}, L0, OD and the loop orientation as stated above (${grade}; forces ${wb ? "to the requirement's bands" : TO_BE_AGREED})`;
  const warnings = [...edgeNotes, ...extensionWarnings(a, service, quantityWriter(system)).map((x) => x.message), ...(input.notes ?? [])];

  const unitsLine = system === 'us' ? 'Dimensions in inches, forces in lbf' : 'Dimensions in mm, forces in N';
  const title = input.part ? `Extension spring: ${input.part}` : 'Extension spring specification';
  const F = (v: number) => esc(w.F(v));
  const footer = req
    ? `Written by coilfront. Requirements: ${F(req.workingForce)} at ${esc(w.free(req.workingLength))}${
        req.operatingLength !== undefined
          ? `, ${req.operatingForce !== undefined ? `${F(req.operatingForce)} ± ${esc(sheetPercent(req.loadTolerance))} at ` : 'stretched to '}${esc(w.free(req.operatingLength))}`
          : ''
      }${req.maxOuterDiameter !== undefined ? `, bore ${esc(w.dia(req.maxOuterDiameter))}` : ''}${req.maxFreeLength !== undefined ? `, L0 at most ${esc(w.free(req.maxFreeLength))}` : ''}.`
    : `Written by coilfront from a spring file: lengths ${points.map((p) => esc(w.free(p.length))).join(', ')} inside the loops.`;

  return sheetDocument({
    title,
    subtitle: `${m.name} (${m.standard}), ${g.loop} loops. ${unitsLine}, lengths inside the loops; ${grade} where stated.`,
    stamp: 'written by coilfront',
    style: STYLE,
    sections: [
      `<section><h2>Spring</h2>${sheetTable(spring)}</section>`,
      `<div class="cols">
<section><h2>Side view at free length (to scale)</h2>${extensionSheetView(a, w, odText, l0Text)}</section>
<section class="loads"><h2>Loops</h2>${sheetTable(loops)}</section>
</div>`,
      `<section><h2>Loads</h2>${sheetTable(loads)}</section>`,
      `<section><h2>Stresses and safety factors (body: ${service.correction === 'wahl' ? 'Wahl' : 'Bergstrasser'}; loops: Shigley eqs. 10-34 to 10-37)</h2>${stresses}</section>`,
      `<section><h2>Service</h2>${sheetTable(svc)}</section>`,
      `${warnings.length ? `<p class="note warn">${warnings.map(esc).join('<br>')}</p>` : ''}`,
      `<p class="note">Toleranced: ${esc(toleranced)}. References, varied by the maker to meet them: Fi, k, Nb, Na, D, ID, h, r1, r2. Practice: tolerance one force and leave the initial tension a reference (the maker sets it in coiling to meet the force), or two forces and the body coils a reference too. EN 15800 is for compression springs; DIN 2097's coil-diameter and free-length figures are as spring makers reproduce it (confirm them with the maker); its force, loop-opening and protrusion tables are not reproduced here: ${TO_BE_AGREED}. Catalogue extension springs are commonly held to about ± 10% on load (common practice).</p>`,
    ],
    cautions: [...generalCautions('extension'), EXTENSION_CAUTION],
    footer,
  });
}
