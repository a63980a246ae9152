// The analysis of one extension spring and the outcome of a design run, for people (text, in the chosen
// unit system) and for machines (JSON: SI, snake_case, null where a figure does not apply). Every figure
// is read from the analysis the search re-verified; nothing is computed again here.
import { loadCatalog } from '../../catalogs/load.js';
import { enduranceSourceLabel } from '../../model/fatigue.js';
import { cautionText } from '../../report/cautions.js';
import { SI_UNITS } from '../../report/json.js';
import { feasibleCompleteRecord, feasibleCountText } from '../../report/feasibleCount.js';
import { table } from '../../report/table.js';
import { formatQuantity, quantityWriter, sig, unitSymbol } from '../../units/format.js';
import type { UnitSystem } from '../../units/systems.js';
import {
  EXTENSION_CAUTIONS,
  EXTENSION_SITES,
  extensionWarnings,
  siteWords,
  stressPerNewton,
  type ExtensionAnalysis,
  type ExtensionService,
  type ExtensionSite,
  type SiteFatigue,
} from './analysis.js';
import { EXTENSION_CHECKS, EXTENSION_CHECK_LABELS, activeExtensionChecks } from './checks.js';
import { extensionCandidateAt, type ExtensionCandidate, type ExtensionDesignRun } from './design.js';
import type { ExtensionRequirements } from './requirements.js';
import { loadExtensionCatalog } from './catalog.js';
import { extensionLimitingChecks, extensionRelaxAdvice, type ExtensionRelaxAdvice, type ExtensionRelaxChange } from './relax.js';
import type { ExtensionCase } from './springFile.js';
import { bandFraction, fatigueSafety, staticSafety } from './figures.js';
import { EXTENSION_TABLE_FIELDS, extensionCandidateRecord } from './fields.js';
import { fieldGrid } from '../../report/fields.js';

/** Site names as JSON and CSV write them. */
export const SITE_KEYS: Record<ExtensionSite, string> = { body: 'body', loopBending: 'loop_bending', loopTorsion: 'loop_torsion' };
const SITE_SHORT: Record<ExtensionSite, string> = { body: 'body', loopBending: 'loop bending (A)', loopTorsion: 'loop torsion (B)' };

const orNull = (v: number | undefined): number | null => (v === undefined || !Number.isFinite(v) ? null : v);
const cyclesValue = (c: number | undefined): number | string | null => (c === undefined ? null : Number.isFinite(c) ? c : 'infinite');

export { bandFraction, fatigueSafety, staticSafety, extensionCandidateRecord };

function siteFatigueJson(s: SiteFatigue): Record<string, unknown> {
  return {
    initial_stress: s.initialStress,
    min_stress: s.minStress,
    max_stress: s.maxStress,
    alternating_stress: s.alternatingStress,
    mean_stress: s.meanStress,
    endurance_source: s.enduranceSource,
    endurance_alternating: s.endurance.alternating,
    endurance_mean: s.endurance.mean,
    ultimate_strength: s.ultimate,
    alternating_strength: s.alternatingStrength,
    safety_factor: orNull(s.safetyFactor),
  };
}

function materialJson(c: { materialChoice: ExtensionCase['materialChoice'] }, a: ExtensionAnalysis): Record<string, unknown> {
  const m = c.materialChoice.material;
  const f = a.material.figures;
  return {
    id: m.id,
    name: m.name,
    standard: m.standard,
    tensile_strength: f.tensileStrength,
    ultimate_shear_strength: a.material.ultimateShear,
    shear_modulus: f.shearModulus,
    elastic_modulus: f.elasticModulus,
    density: f.density,
    max_temperature: f.maxTemperature,
    allowable_stress: {
      body_torsion: a.material.allowables.bodyTorsion,
      loop_bending: a.material.allowables.loopBending,
      loop_torsion: a.material.allowables.loopTorsion,
    },
    allowable_source: a.material.allowableSource,
    loop_fatigue_source: a.material.loopFatigue.source,
    loop_fatigue_stated: a.material.loopFatigueStated,
    strength_source: m.strength.source,
  };
}

/** The largest pull before a set, in words: the force and its length, or, when the initial tension alone
 * is past the allowable, that the spring is past it at its free length (no length below it is one). */
export function safeExtensionText(a: ExtensionAnalysis, force: (v: number) => string, length: (v: number) => string): string {
  const s = a.safeExtension;
  if (s.pastAtFreeLength)
    return `none: the spring is already past its allowable at its free length (initial tension ${force(a.initialTension.force)} above the ${force(s.force)} that ${siteWords(s.governing)} allows)`;
  return `${force(s.force)} at ${length(s.length)} (${siteWords(s.governing)} reaches its allowable first)`;
}

/** The whole analysis as JSON (SI). */
export function extensionAnalysisRecord(a: ExtensionAnalysis, correction: string): Record<string, unknown> {
  const g = a.geometry;
  const it = a.initialTension;
  const fa = a.fatigue;
  return {
    geometry: {
      wire_diameter: g.wireDiameter,
      mean_diameter: g.meanDiameter,
      outer_diameter: g.outerDiameter,
      inner_diameter: g.innerDiameter,
      spring_index: g.springIndex,
      body_coils: g.bodyCoils,
      active_coils: g.activeCoils,
      loop: g.loop,
      loop_height: g.loopHeight,
      loop_radius: g.loopRadius,
      bend_radius: g.bendRadius,
      loop_index: g.loopIndex,
      bend_index: g.bendIndex,
      body_length: g.bodyLength,
      free_length: g.freeLength,
      wire_length: g.wireLength,
      wire_volume: g.wireVolume,
    },
    rate: a.rate,
    mass: g.mass,
    stress_factors: { method: correction, body: a.factors.body, loop_bending: a.factors.loopBending, loop_torsion: a.factors.loopTorsion },
    initial_tension: {
      force: it.force,
      stress: it.stress,
      preferred_low: it.band.low,
      preferred_middle: it.band.middle,
      preferred_high: it.band.high,
      position: it.position,
      band_fraction: orNull(bandFraction(a)),
    },
    points: a.points.map((p) => ({
      length: p.length,
      extension: p.extension,
      force: p.force,
      body_stress: p.bodyStress,
      loop_bending_stress: p.loopBendingStress,
      loop_torsion_stress: p.loopTorsionStress,
    })),
    safety_factors: {
      static: {
        body: orNull(a.staticSafety.body),
        loop_bending: orNull(a.staticSafety.loopBending),
        loop_torsion: orNull(a.staticSafety.loopTorsion),
        governing: a.points.length ? SITE_KEYS[a.staticSafety.governing] : null,
      },
      fatigue: fa
        ? {
            body: orNull(fa.body.safetyFactor),
            loop_bending: orNull(fa.loopBending.safetyFactor),
            loop_torsion: orNull(fa.loopTorsion.safetyFactor),
            governing: SITE_KEYS[fa.governing],
          }
        : null,
    },
    // Past the allowable at the free length, there is no length to give (it would lie below the free length).
    safe_extension: {
      force: a.safeExtension.force,
      length: a.safeExtension.pastAtFreeLength ? null : a.safeExtension.length,
      governing: SITE_KEYS[a.safeExtension.governing],
      past_allowable_at_free_length: a.safeExtension.pastAtFreeLength,
    },
    fatigue: fa && {
      life: fa.life,
      cycles: cyclesValue(fa.cycles),
      criterion: fa.criterion,
      min_force: fa.minForce,
      max_force: fa.maxForce,
      body: siteFatigueJson(fa.body),
      loop_bending: siteFatigueJson(fa.loopBending),
      loop_torsion: siteFatigueJson(fa.loopTorsion),
      body_yield_safety_factor: orNull(fa.bodyYieldSafetyFactor),
      governing: SITE_KEYS[fa.governing],
    },
    natural_frequency: a.surge.frequency,
  };
}

export function extensionAnalysisJson(c: ExtensionCase, a: ExtensionAnalysis): Record<string, unknown> {
  return {
    units: SI_UNITS,
    kind: 'extension',
    material: materialJson(c, a),
    ...extensionAnalysisRecord(a, c.service.correction),
    warnings: extensionWarnings(a, c.service),
    notes: c.notes,
  };
}

const positionWords = {
  inside: 'inside the preferred range',
  above: 'ABOVE the preferred range (hard to wind)',
  below: 'below the preferred range (hard to hold to tolerance)',
} as const;

/** The lines that show one analysed spring (shared by `analyze` and the chosen spring of `design`). */
export function extensionAnalysisLines(a: ExtensionAnalysis, service: ExtensionService, correction: string, system: UnitSystem): string[] {
  const g = a.geometry;
  const L = (v: number) => formatQuantity(v, 'length', system);
  const F = (v: number) => formatQuantity(v, 'force', system);
  const S = (v: number) => formatQuantity(v, 'stress', system);
  const out: string[] = [];
  out.push('Geometry (lengths inside the loops)');
  out.push(
    table([
      ['wire diameter d', L(g.wireDiameter), 'mean diameter D', L(g.meanDiameter)],
      ['outer diameter', L(g.outerDiameter), 'inner diameter', L(g.innerDiameter)],
      ['spring index C', sig(g.springIndex), 'body stress factor', `${sig(a.factors.body)} (${correction})`],
      ['body coils Nb', sig(g.bodyCoils), 'active coils Na = Nb + G/E', sig(g.activeCoils)],
      ['body length (Nb + 1) d', L(g.bodyLength), 'free length L0', L(g.freeLength)],
      [
        `${g.loop} loops: height each`,
        L(g.loopHeight),
        'loop radius r1',
        `${L(g.loopRadius)} (C1 = ${sig(g.loopIndex, 3)}, (K)A = ${sig(a.factors.loopBending)})`,
      ],
      ['bend radius r2', `${L(g.bendRadius)} (C2 = ${sig(g.bendIndex, 3)}, (K)B = ${sig(a.factors.loopTorsion)})`, 'wire length', L(g.wireLength)],
      ['rate k', formatQuantity(a.rate, 'rate', system), 'mass', formatQuantity(g.mass, 'mass', system)],
      ['natural frequency', `${sig(a.surge.frequency)} Hz (both ends fixed)`, '', ''],
    ]),
  );
  out.push('');
  const it = a.initialTension;
  out.push('Initial tension');
  out.push(
    table([
      ['initial tension Fi', F(it.force), 'its stress tau_i', S(it.stress)],
      [
        'preferred range at this index',
        `${S(it.band.low)} to ${S(it.band.high)}`,
        'position',
        `${positionWords[it.position]}${Number.isFinite(bandFraction(a)) ? `, ${sig(bandFraction(a) * 100, 3)}% of the way up` : ''}`,
      ],
    ]),
  );
  out.push('');
  const m = a.material;
  out.push('Material at this diameter');
  out.push(
    table([
      ['tensile strength Sut', S(m.figures.tensileStrength), 'ultimate shear Ssu', S(m.ultimateShear)],
      ['allowable, body torsion', S(m.allowables.bodyTorsion), 'shear modulus G', S(m.figures.shearModulus)],
      ['allowable, loop bending (A)', S(m.allowables.loopBending), 'elastic modulus E', S(m.figures.elasticModulus)],
      ['allowable, loop torsion (B)', S(m.allowables.loopTorsion), 'max temperature', formatQuantity(m.figures.maxTemperature, 'temperature', system)],
    ]),
  );
  out.push(`  allowables: ${m.allowableSource}`);
  out.push('');
  out.push('Working points');
  const rows: string[][] = [['', 'length', 'extension', 'force', 'body stress', 'loop bending (A)', 'loop torsion (B)']];
  // At the free length the spring already carries its initial tension.
  const per = stressPerNewton(g.wireDiameter, g.meanDiameter, a.factors.body, a.factors.loopBending, a.factors.loopTorsion);
  rows.push(['free', L(g.freeLength), L(0), F(it.force), S(per.body * it.force), S(per.loopBending * it.force), S(per.loopTorsion * it.force)]);
  a.points.forEach((p, i) =>
    rows.push([`point ${i + 1}`, L(p.length), L(p.extension), F(p.force), S(p.bodyStress), S(p.loopBendingStress), S(p.loopTorsionStress)]),
  );
  out.push(table(rows));
  if (a.points.length) {
    const s = a.staticSafety;
    out.push(
      `  static safety factors at the longest length: body ${sig(s.body, 3)}, loop bending ${sig(s.loopBending, 3)}, loop torsion ${sig(s.loopTorsion, 3)} (${siteWords(s.governing)} governs)`,
    );
  }
  out.push(`  largest pull before a set: ${safeExtensionText(a, F, L)}`);
  out.push('');
  const fa = a.fatigue;
  if (fa) {
    out.push(
      `Fatigue (${fa.life === 'infinite' ? 'infinite life' : `${sig(fa.cycles, 3)} cycles`}, ${fa.criterion}; load line from the initial-tension stress; body: ${enduranceSourceLabel(fa.body.enduranceSource, service.peened)})`,
    );
    const fr: string[][] = [['site', 'initial stress', 'alternating', 'mean', 'alternating strength', 'safety factor']];
    for (const site of EXTENSION_SITES) {
      const x = fa[site];
      fr.push([
        SITE_SHORT[site],
        S(x.initialStress),
        S(x.alternatingStress),
        S(x.meanStress),
        S(x.alternatingStrength),
        Number.isFinite(x.safetyFactor) ? sig(x.safetyFactor, 3) : 'n/a (no alternation)',
      ]);
    }
    out.push(table(fr));
    out.push(`  ${siteWords(fa.governing)} governs; body yield along the load line: safety factor ${sig(fa.bodyYieldSafetyFactor, 3)}`);
  } else {
    out.push('Fatigue: static service (no cycle count, fewer than 1e4 cycles, or a single length)');
  }
  return out;
}

function cautionLines(): string[] {
  return [cautionText(EXTENSION_CAUTIONS)];
}

export function extensionAnalysisText(c: ExtensionCase, a: ExtensionAnalysis, system: UnitSystem): string {
  const m = c.materialChoice.material;
  const out: string[] = [];
  out.push(`Extension spring analysis: ${m.name} (${m.standard}), ${a.geometry.loop} loops`);
  out.push('');
  out.push(...extensionAnalysisLines(a, c.service, c.service.correction, system));
  out.push('');
  const all = [...c.notes, ...extensionWarnings(a, c.service, quantityWriter(system)).map((w) => w.message)];
  out.push(all.length ? 'Warnings' : 'Warnings: none');
  for (const w of all) out.push(`  ! ${w}`);
  out.push('');
  out.push(...cautionLines());
  return out.join('\n') + '\n';
}

// ---- design ----

export function extensionRequirementsRecord(req: ExtensionRequirements): Record<string, unknown> {
  return {
    kind: 'extension',
    materials: req.materials.map((m) => m.material.id),
    loop: req.loop.id,
    loop_length: req.loopLength ?? null,
    bend_index: req.bendIndex,
    working_force: req.workingForce,
    working_length: req.workingLength,
    operating_length: req.operatingLength ?? null,
    operating_force: req.operatingForce ?? null,
    load_tolerance: req.loadTolerance,
    max_outer_diameter: req.maxOuterDiameter ?? null,
    max_free_length: req.maxFreeLength ?? null,
    max_extended_length: req.maxExtendedLength ?? null,
    cycles: cyclesValue(req.cycles),
    wire_sizes: req.wireSizesLabel,
    body_coils: req.bodyCoils,
    coil_step: req.coilStep,
    index: req.index,
    initial_tension_range: req.initialTensionRange,
    safety: req.safety,
    peened: req.peened,
    fatigue_criterion: req.criterion,
    stress_factor: req.correction,
    rank: req.rank,
    best_per_wire: req.bestPerWire,
  };
}

/** The checks these requirements ask for, in registry order. */
export function reportedExtensionChecks(req: ExtensionRequirements): string[] {
  const on = activeExtensionChecks(req);
  return EXTENSION_CHECKS.filter((_, i) => on[i]);
}

export function extensionCountsRecord(run: ExtensionDesignRun): Record<string, unknown> {
  const r = run.result;
  const cut: Record<string, number> = {};
  for (const c of reportedExtensionChecks(run.req)) cut[c] = r.cutBy[c] ?? 0;
  return {
    strategy: r.strategy,
    evaluated: r.evaluations,
    cells: r.cells,
    feasible: r.feasibleCells,
    pruned: r.prunedCells,
    ...feasibleCompleteRecord(r),
    cut_by: cut,
  };
}

/** The check that limits an infeasible run (the one its nearest misses fail most: relax.ts), in a few words. */
export function extensionLimitingText(run: ExtensionDesignRun): string {
  const best = extensionLimitingChecks(run)[0];
  return best ? `${best}: ${EXTENSION_CHECK_LABELS[best]}` : 'no wire stock fits';
}

function failingChecks(c: ExtensionCandidate): Record<string, number> {
  const out: Record<string, number> = {};
  EXTENSION_CHECKS.forEach((name, i) => {
    if (c.checks[i] > 1e-9) out[name] = c.checks[i];
  });
  return out;
}

/** The nearest misses of an infeasible run, analysed as the reported springs are (they fail by definition). */
function nearestMisses(run: ExtensionDesignRun): ExtensionCandidate[] {
  return run.result.nearestMisses.map((m) => extensionCandidateAt(run.problem, m.x, m.f));
}

// The advice is worked out once per run (it re-runs the design a few dozen times) and shared by the
// text, the JSON and the HTML report of that run.
const adviceCache = new WeakMap<ExtensionDesignRun, ExtensionRelaxAdvice>();

export function extensionAdviceFor(run: ExtensionDesignRun): ExtensionRelaxAdvice {
  let a = adviceCache.get(run);
  if (!a) {
    const catalog = loadCatalog();
    a = extensionRelaxAdvice(run.req, run.document, catalog, loadExtensionCatalog(catalog.materials), extensionLimitingChecks(run));
    adviceCache.set(run, a);
  }
  return a;
}

/** One change in words, in the file's units, with the exact `--set` that applies it. */
export function describeExtensionChange(c: ExtensionRelaxChange, fileSystem: UnitSystem): string {
  const arg = /[\s{}[\]]/.test(c.set) ? `"${c.set}"` : c.set;
  if (typeof c.to === 'number' && typeof c.from === 'number') {
    const show = (v: number) => (c.unit ? `${sig(v, 4)} ${unitSymbol(c.unit, fileSystem)}` : c.path === 'load_tolerance' ? `${sig(v * 100, 3)}%` : String(v));
    return `${c.to > c.from ? 'raise' : 'lower'} ${c.path} from ${show(c.from)} to ${show(c.to)} [--set ${arg}]`;
  }
  return `set ${c.path} to ${c.to}${c.from !== null ? ` (was ${c.from})` : ''} [--set ${arg}]`;
}

export function extensionRelaxLines(run: ExtensionDesignRun): string[] {
  if (run.document === undefined) return [`Limiting check: ${extensionLimitingText(run)}.`];
  const a = extensionAdviceFor(run);
  if (!a.changes.length && a.pair) {
    return [
      `Limiting check: ${extensionLimitingText(run)}. No single change of a limit or setting admits a spring; these two together do (run together; neither alone does; values in the file's units):`,
      ...a.pair.map((c) => `  - ${describeExtensionChange(c, run.req.system)}`),
    ];
  }
  if (!a.changes.length)
    return [
      `Limiting check: ${extensionLimitingText(run)}. No single change of a limit or setting tried, and no pair of them (${a.runs} runs), admits a spring: reconsider the loads, the stroke or the space.`,
    ];
  return [
    `Limiting check: ${extensionLimitingText(run)}. The smallest single changes that admit a spring (each was run; values in the file's units):`,
    ...a.changes.map((c) => `  - ${describeExtensionChange(c, run.req.system)}`),
  ];
}

const adviceRecord = (c: ExtensionRelaxChange, system: UnitSystem) => ({
  path: c.path,
  from: c.from,
  to: c.to,
  set: c.set,
  suggestion: describeExtensionChange(c, system),
});

// Wall-clock figures break byte-for-byte reproducibility, so they appear only when asked for (--timing).
export function extensionDesignJson(run: ExtensionDesignRun, showTiming = false): Record<string, unknown> {
  const misses = run.candidates.length ? [] : nearestMisses(run);
  return {
    units: SI_UNITS,
    kind: 'extension',
    requirements: extensionRequirementsRecord(run.req),
    ...extensionCountsRecord(run),
    ...(showTiming ? { search_ms: run.searchMs } : {}),
    candidates: run.candidates.map(extensionCandidateRecord),
    ...(run.candidates.length === 0
      ? {
          infeasible: {
            limiting_check: extensionLimitingText(run),
            relax: run.document === undefined ? null : extensionAdviceFor(run).changes.map((c) => adviceRecord(c, run.req.system)),
            relax_pair: run.document === undefined ? null : (extensionAdviceFor(run).pair?.map((c) => adviceRecord(c, run.req.system)) ?? null),
            relax_runs: run.document === undefined ? 0 : extensionAdviceFor(run).runs,
            nearest_misses: misses.map((c, i) => ({
              ...extensionCandidateRecord(c),
              violation: run.result.nearestMisses[i].violation,
              failing_checks: failingChecks(c),
            })),
          },
        }
      : {}),
  };
}

/** The ranked-candidate columns, shared by the terminal table and the HTML report: rendered from the
 * extension fields registry. */
export function extensionCandidateGrid(cands: ExtensionCandidate[], system: UnitSystem): { header: string[]; rows: string[][] } {
  return fieldGrid(EXTENSION_TABLE_FIELDS, cands, system);
}

export function extensionCountsText(run: ExtensionDesignRun, showTiming = false): string {
  const r = run.result;
  const lines: string[] = [];
  lines.push(
    `Searched ${r.cells} combinations of material, wire and body coil count (${run.problem.stock.length} wire stock items) with the ${r.strategy} strategy: ${r.evaluations} candidate evaluations${showTiming ? ` in ${sig(run.searchMs, 3)} ms` : ''}.`,
  );
  lines.push(
    feasibleCountText(
      r,
      `their lightest possible spring ${run.req.bestPerWire ? 'could not beat the best found for its wire' : `could not enter the top ${run.req.top}`}`,
    ),
  );
  const cut = reportedExtensionChecks(run.req)
    .filter((c) => (r.cutBy[c] ?? 0) > 0)
    .map((c) => [c, String(r.cutBy[c]), EXTENSION_CHECK_LABELS[c as keyof typeof EXTENSION_CHECK_LABELS]]);
  if (cut.length) {
    lines.push('Combinations cut, by the check that failed worst:');
    lines.push(table(cut.sort((a, b) => Number(b[1]) - Number(a[1]))));
  }
  return lines.join('\n');
}

export function extensionDesignHeading(req: ExtensionRequirements, system: UnitSystem): string {
  const F = (v: number) => formatQuantity(v, 'force', system);
  const L = (v: number) => formatQuantity(v, 'length', system);
  return (
    `Extension spring design: ${F(req.workingForce)} at ${L(req.workingLength)} inside the loops` +
    (req.operatingLength !== undefined
      ? `, stretched to ${L(req.operatingLength)}${req.operatingForce !== undefined ? ` at ${F(req.operatingForce)}` : ''}`
      : '') +
    `; ${req.loop.id} loops; ranked by ${req.rank.replace('_', ' ')}${req.bestPerWire ? ', the best spring of each material and wire size' : ''}`
  );
}

export function extensionDesignText(run: ExtensionDesignRun, system: UnitSystem, showTiming = false): string {
  const out: string[] = [];
  out.push(extensionDesignHeading(run.req, system));
  out.push('');
  if (run.candidates.length) {
    const t = extensionCandidateGrid(run.candidates, system);
    out.push(table([t.header, ...t.rows]));
    out.push('  Fi band: where the initial-tension stress sits in its preferred range (0% its bottom, 100% its top); stresses at the longest working length;');
    out.push('  A: the loop in bending, B: the bend into the loop in torsion.');
    out.push('');
    out.push(extensionCountsText(run, showTiming));
    out.push('');
    const best = run.candidates[0];
    out.push('The best spring');
    out.push(
      ...extensionAnalysisLines(best.analysis, run.problem.service(), run.req.correction, system)
        .flatMap((l) => l.split('\n'))
        .map((l) => (l ? `  ${l}` : l)),
    );
    const warn = extensionWarnings(best.analysis, run.problem.service(), quantityWriter(system));
    if (warn.length) {
      out.push('');
      out.push('Notes on the best spring:');
      for (const w of warn) out.push(`  ! ${w.message}`);
    }
  } else {
    out.push('No spring meets every requirement.');
    out.push('');
    out.push(extensionCountsText(run));
    const misses = nearestMisses(run);
    if (misses.length) {
      out.push('');
      out.push('Nearest misses (least total violation) and the checks they fail:');
      const t = extensionCandidateGrid(misses, system);
      out.push(table([t.header, ...t.rows]));
      misses.forEach((c, i) => {
        const f = Object.entries(failingChecks(c))
          .map(([k, v]) => `${k} by ${sig(v * 100, 3)}%`)
          .join(', ');
        out.push(`  #${i + 1} fails: ${f}`);
      });
    }
    out.push('');
    out.push(...extensionRelaxLines(run));
  }
  out.push('');
  out.push(...cautionLines());
  return out.join('\n') + '\n';
}
