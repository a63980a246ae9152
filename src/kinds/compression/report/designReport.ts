// The outcome of a design run, for people (text) and machines (JSON, SI), including the honest
// account of an infeasible run: what cut the candidates, the nearest misses, and what to relax.
import type { Requirements } from '../requirements.js';
import { CHECK_LABELS, CHECKS, type CheckName } from '../verify.js';
import { candidateAt, reportedChecks, type Candidate, type DesignRun } from '../design.js';
import { limitingCheck, outward, relaxAdvice, type RelaxAdvice, type RelaxChange } from '../relax.js';
import { formatQuantity, groupedCount, inUnit, quantityWriter, sig, unitSymbol, yieldPercent } from '../../../units/format.js';
import { rulesOfThumb } from '../analysis.js';
import type { Kind } from '../../../units/kinds.js';
import type { UnitSystem } from '../../../units/systems.js';
import { cautionText } from '../../../report/cautions.js';
import { SI_UNITS } from '../../../report/json.js';
import { feasibleCompleteRecord, feasibleCountText } from '../../../report/feasibleCount.js';
import { strengthBasisOf, strengthBasisSummary } from '../../../input/material.js';
import { table } from '../../../report/table.js';
import { fieldGrid, fieldRecord } from '../../../report/fields.js';
import { COMPRESSION_JSON_FIELDS, COMPRESSION_TABLE_FIELDS, TABLE_NOTE } from '../fields.js';
import type { CandidateYield } from '../tolerance/springYield.js';
import { shortfallText, spareOf } from '../../../report/checkFigure.js';
import { serviceNotes } from '../../../input/serviceNotes.js';
import { checkFigure } from '../checkFigures.js';

/** One candidate as JSON (SI), rendered from the compression fields registry; with its yield at the
 * tolerances where the run was confirmed. */
export function candidateRecord(c: Candidate, y?: CandidateYield): Record<string, unknown> {
  return fieldRecord(COMPRESSION_JSON_FIELDS, y ? { ...c, yield: y } : c);
}

export function requirementsRecord(req: Requirements): Record<string, unknown> {
  return {
    materials: req.materials.map((m) => m.material.id),
    ends: req.ends,
    seating: req.seating,
    surge_ends: req.surgeEnds,
    strength_basis: req.strengthBasis,
    strength_sources: Object.fromEntries(req.materials.map((m) => [m.material.id, strengthBasisOf(m).source])),
    working_force: req.workingForce,
    working_length: req.workingLength,
    operating_length: req.operatingLength ?? null,
    operating_force: req.operatingForce ?? null,
    load_tolerance: req.loadTolerance,
    max_outer_diameter: req.maxOuterDiameter ?? null,
    min_inner_diameter: req.minInnerDiameter ?? null,
    max_free_length: req.maxFreeLength ?? null,
    max_solid_length: req.maxSolidLength ?? null,
    cycles: req.cycles === undefined ? null : Number.isFinite(req.cycles) ? req.cycles : 'infinite',
    wire_sizes: req.wireSizesLabel,
    active_coils: req.activeCoils,
    coil_step: req.coilStep,
    index: req.index,
    safety: req.safety,
    allowable_stress: req.allowableStress ?? null,
    peened: req.peened,
    guided: req.guided,
    clash_allowance: req.clashAllowance,
    rank: req.rank,
    tolerance_grade: req.tolerance.grade,
    min_yield: req.minYield ?? null,
  };
}

// Wall-clock figures break byte-for-byte reproducibility, so they appear only when asked for (--timing).

export function countsRecord(run: DesignRun, showTiming = false): Record<string, unknown> {
  const cut: Record<string, number> = {};
  for (const c of reportedChecks(run.req)) cut[c] = run.result.cutBy[c];
  return {
    strategy: run.result.strategy,
    evaluated: run.result.evaluations,
    cells: run.result.cells,
    feasible: run.result.feasibleCells,
    pruned: run.result.prunedCells,
    ...feasibleCompleteRecord(run.result),
    cut_by: cut,
    lp_bound: run.lp.value,
    lp_status: run.lp.status,
    gap: run.gap,
    ...(showTiming ? { search_ms: run.searchMs } : {}),
  };
}

export function designJson(run: DesignRun, showTiming = false): Record<string, unknown> {
  return {
    units: SI_UNITS,
    requirements: requirementsRecord(run.req),
    // What the requirements mean for the checks (a life with no stroke is no fatigue check), as on stderr.
    notes: serviceNotes(run.req),
    ...countsRecord(run, showTiming),
    candidates: run.candidates.map((c, i) => candidateRecord(c, run.yields?.[i])),
    ...(run.refused?.length ? { refused_by_monte_carlo: run.refused.map((r) => candidateRecord(r.candidate, r.yield)) } : {}),
    ...(run.candidates.length === 0 ? { infeasible: infeasibleRecord(run) } : {}),
  };
}

// The advice is worked out once per run (it re-runs the design a few dozen times) and shared by the
// text, the JSON and the HTML report of that run.
const adviceCache = new WeakMap<DesignRun, RelaxAdvice>();

export function adviceFor(run: DesignRun): RelaxAdvice {
  let a = adviceCache.get(run);
  if (!a) {
    a = relaxAdvice(run);
    adviceCache.set(run, a);
  }
  return a;
}

const UNIT_KIND: Record<string, Kind> = {
  'envelope.max_outer_diameter': 'length',
  'envelope.min_inner_diameter': 'length',
  'envelope.max_free_length': 'length',
  'envelope.max_solid_length': 'length',
  operating_length: 'length',
  operating_force: 'force',
};

const pct = (r: number) => `${sig(r * 100, 3)}%`;

/** The `--set` argument in the user's units, with its unit whatever the file's system: a length or force
 * in mm or N (the exact value), or under --units us in in or lbf, rounded outward as the figure beside
 * it is (so it admits a spring too). */
function setArgument(c: RelaxChange, kind: Kind | undefined, system: UnitSystem): string {
  if (!kind || typeof c.to !== 'number' || typeof c.from !== 'number') return c.set;
  const shown = system === 'si' ? c.to : Number(sig(outward(inUnit(c.to, kind, system), c.to > c.from ? 1 : -1, 4), 4));
  return `${c.path}=${shown} ${unitSymbol(kind, system)}`;
}

/** One change in words, in the user's units, with the exact `--set` that applies it. */
export function describeChange(c: RelaxChange, system: UnitSystem): string {
  const kind = UNIT_KIND[c.path];
  c = { ...c, set: setArgument(c, kind, system) };
  const arg = /[\s{}[\]]/.test(c.set) ? `"${c.set}"` : c.set;
  // Under min_yield every change was confirmed by the Monte Carlo: say what the best spring then reaches.
  const reach =
    c.reaches === undefined
      ? ''
      : `; the best spring then reaches a made yield of ${yieldPercent(c.reaches)}${c.asked !== undefined && c.reaches < c.asked ? ` (min_yield ${yieldPercent(c.asked)} met within the Monte Carlo's standard error)` : ''}`;
  const tail = `${reach} [--set ${arg}]`;
  if (c.path === 'tolerance_grade')
    return `order the finer EN 15800 tolerance grade ${String(c.to)} instead of ${String(c.from)} (tighter tolerances: a dearer spring)${tail}`;
  if (typeof c.to === 'number' && typeof c.from === 'number') {
    const up = c.to > c.from;
    const fraction = c.path === 'load_tolerance' || c.path === 'clash_allowance' || c.path === 'min_yield';
    const show = (v: number) =>
      kind ? formatQuantity(v, kind, system) : fraction ? pct(v) : c.path === 'cycles' ? String(Number(v.toPrecision(4))) : sig(v, 4);
    // The new value is shown rounded in the relaxing direction, so the figure read off the screen
    // admits a spring too (the --set value is exact).
    const showTo = (v: number) =>
      kind
        ? `${sig(outward(inUnit(v, kind, system), up ? 1 : -1, 4), 4)} ${unitSymbol(kind, system)}`
        : fraction
          ? `${sig(outward(v * 100, up ? 1 : -1, 4), 4)}%`
          : c.path === 'cycles'
            ? String(v)
            : sig(v, 6);
    const notes = [
      ...(fraction ? [] : [`${up ? '+' : '-'}${pct(c.relative ?? 0)}`]),
      ...(c.path === 'operating_length' ? ['a shorter stroke'] : c.path === 'cycles' ? ['a shorter service life'] : []),
    ];
    return `${up ? 'raise' : 'lower'} ${c.path} from ${show(c.from)} to ${showTo(c.to)}${notes.length ? ` (${notes.join(', ')})` : ''}${tail}`;
  }
  if (c.path === 'cycles' && typeof c.to === 'number') return `lower cycles from infinite life to ${c.to} (a finite service life)${tail}`;
  if ((c.path === 'index' || c.path === 'active_coils') && Array.isArray(c.to) && Array.isArray(c.from)) {
    const i = c.to[0] !== c.from[0] ? 0 : 1;
    const [a, b] = [Number(c.from[i]), Number(c.to[i])];
    return `${b > a ? 'raise' : 'lower'} ${c.path}[${i}] from ${sig(a, 4)} to ${sig(b, 4)} (${b > a ? '+' : '-'}${pct(c.relative ?? 0)})${tail}`;
  }
  switch (c.path) {
    case 'guided':
      return `guide the spring on a rod or in a bore so it cannot buckle (guided: true)${tail}`;
    case 'seating':
      return `seat the ends ${String(c.to)} instead of ${String(c.from)} (more stable against buckling)${tail}`;
    case 'ends':
      return `allow other end types too (ends: ${(c.to as string[]).join(', ')})${tail}`;
    case 'peened':
      return `shot-peen the spring (peened: true)${tail}`;
    case 'material':
      return typeof c.to === 'string' ? `use ${c.to} instead${tail}` : `use a material of the ${(c.to as { family: string }).family} family${tail}`;
    case 'solid_safe':
      return `accept a spring that takes a set when closed solid (solid_safe: false)${tail}`;
    case 'coil_gap_rule':
      return `drop the EN 13906-1 coil-gap rule (coil_gap_rule: false)${tail}`;
    default:
      return `set ${c.path} to ${JSON.stringify(c.to)}${tail}`;
  }
}

/** The advice as lines of text: what works alone, else the best pair and the last resort. */
export function relaxLines(run: DesignRun, system: UnitSystem): string[] {
  const a = adviceFor(run);
  const out: string[] = [];
  const alone = a.single.filter((c) => c.group !== 'margin');
  const margins = a.single.filter((c) => c.group === 'margin');
  if (alone.length) {
    out.push('What to relax (each change alone admits a spring; each was tried by running the design again), smallest change first:');
    for (const c of alone) out.push(`  - ${describeChange(c, system)}`);
    return out;
  }
  out.push(
    'No single change of a limit or setting admits a spring (envelope limits tried up to where they stop binding, the operating force to twice its value, the other limits over the ranges a spring maker builds).',
  );
  if (a.pair) {
    out.push('These two changes together admit one (tried):');
    for (const c of a.pair) out.push(`  - ${describeChange(c, system)}`);
  } else out.push(`No pair of changes tried (${a.runs} runs) admits one either: reconsider the loads, the stroke or the space.`);
  if (margins.length) {
    out.push('As a last resort, a smaller margin (never a safety factor below 1; confirm with tests):');
    for (const c of margins) out.push(`  - ${describeChange(c, system)}`);
  }
  return out;
}

function infeasibleRecord(run: DesignRun): Record<string, unknown> {
  const a = adviceFor(run);
  const entry = (c: RelaxChange) => ({
    path: c.path,
    from: c.from,
    to: c.to,
    set: c.set,
    relative_change: c.relative,
    group: c.group,
    eases: c.eases,
    ...(c.reaches !== undefined ? { best_made_yield: c.reaches } : {}),
    suggestion: describeChange(c, 'si'),
  });
  return {
    nearest_misses: run.result.nearestMisses.map((m) => {
      const c = candidateAt(run.problem, m.x, m.f);
      return { ...candidateRecord(c), violation: m.violation, failing_checks: failing(c), failing_spare: failingSpare(c, run.req) };
    }),
    relax: a.single.map(entry),
    relax_pair: a.pair ? a.pair.map(entry) : null,
    relax_runs: a.runs,
  };
}

/** The check that limits an infeasible run, in a few words (for sweeps: no extra runs). */
export function limitingText(run: DesignRun): string {
  const c = limitingCheck(run);
  return c ? `${c}: ${CHECK_LABELS[c]}` : 'no wire stock fits';
}

function failing(c: Candidate): Record<string, number> {
  const out: Record<string, number> = {};
  CHECKS.forEach((name, i) => {
    if (c.checks[i] > 1e-9) out[name] = c.checks[i];
  });
  return out;
}

/** A miss's failing checks as the check command judges them (src/check/judge.ts): the figure, the
 * limit and so the shortfall in the check's own unit (clash: mm of coil clearance, not a share). */
function failingLines(c: Candidate, req: Requirements) {
  return Object.entries(failing(c)).map(([name, g]) => ({ name, g, margin: -g, ...checkFigure(name as CheckName, c.analysis, req, null) }));
}

/** Per failing check, its margin in its own unit (SI; negative: short by so much), as `spare` in the check JSON. */
function failingSpare(c: Candidate, req: Requirements): Record<string, number | null> {
  return Object.fromEntries(failingLines(c, req).map((l) => [l.name, spareOf(l)]));
}

/** The ranked-candidate columns, shared by the terminal table and the HTML report: rendered from the
 * compression fields registry; the yield columns where the yields are given. */
export function candidateGrid(cands: Candidate[], system: UnitSystem, yields?: CandidateYield[]): { header: string[]; rows: string[][] } {
  return fieldGrid(COMPRESSION_TABLE_FIELDS, yields ? cands.map((c, i) => ({ ...c, yield: yields[i] })) : cands, system);
}

export { yieldPercent };

/** What the yield column means, under the table. */
export function yieldNote(run: DesignRun): string[] {
  if (!run.yields) return [];
  const req = run.req;
  const n = run.yields[0]?.monteCarlo.samples ?? 0;
  const lines = [
    `Yield: the share of made springs that pass every check, EN 15800 grade ${req.tolerance.grade}${Object.keys(req.tolerance.overrides).length ? ' with the given tolerances' : ''}, each tolerance taken as 3 sigma, the free length adjusted to the working force; seeded Monte Carlo of ${groupedCount(n)} springs (seed ${req.seed}).` +
      (req.minYield !== undefined
        ? ` min_yield ${yieldPercent(req.minYield)}: the search required it by its estimate; the Monte Carlo (the figure shown) confirms each listed spring to within its standard error, and \`coilfront check\` with the same seed prints the same figure for the same spring and judges it by the same rule (standard error about ${sig(Math.sqrt((req.minYield * (1 - req.minYield)) / Math.max(n, 1)) * 100, 2)}%).`
        : ' Add min_yield (such as 0.99) to design for it.'),
  ];
  for (const r of run.refused ?? []) {
    lines.push(
      `Refused: a ${r.candidate.item.choice.material.id} spring of d ${formatQuantity(r.candidate.geometry.wireDiameter, 'length', req.system)}, Na ${r.candidate.geometry.activeCoils} passed the search by its yield estimate (${yieldPercent(r.yield.estimate)}) but the Monte Carlo gives ${yieldPercent(r.yield.monteCarlo.yield)} +- ${sig(r.yield.monteCarlo.standardError * 100, 2)}%, below min_yield by more than its standard error: it is left out${run.grouped ? ' (its other coil counts: --variants)' : ''}.`,
    );
  }
  return lines;
}

export function candidateTable(cands: Candidate[], system: UnitSystem, yields?: CandidateYield[]): string {
  const { header, rows } = candidateGrid(cands, system, yields);
  return table([header, ...rows]);
}

export function countsText(run: DesignRun, system: UnitSystem, showTiming = false): string {
  const r = run.result;
  const lines: string[] = [];
  lines.push(
    `Searched ${r.cells} combinations of material, wire, ends and coil count (${run.problem.stock.length} wire stock items) with the ${r.strategy} strategy: ${r.evaluations} candidate evaluations${showTiming ? ` in ${sig(run.searchMs, 3)} ms` : ''}.`,
  );
  lines.push(feasibleCountText(r, `their lightest possible spring could not enter the top ${run.req.top}`));
  const cut = reportedChecks(run.req)
    .filter((c) => r.cutBy[c] > 0)
    .map((c) => [c, String(r.cutBy[c]), CHECK_LABELS[c as CheckName]]);
  if (cut.length) {
    lines.push('Combinations cut, by the check that failed worst:');
    lines.push(table(cut.sort((a, b) => Number(b[1]) - Number(a[1]))));
  }
  if (run.lp.status === 'bound' && run.lp.value !== null) {
    const bound = formatQuantity(run.lp.value, run.req.rank === 'mass' ? 'mass' : 'volume', system);
    lines.push(
      `LP lower bound on ${run.req.rank.replace('_', ' ')} (log-space relaxation): ${bound}${run.gap !== null ? `; the best spring is ${sig(run.gap * 100, 3)}% above it` : ''}.`,
    );
  } else if (run.lp.status === 'infeasible') {
    lines.push(
      'LP relaxation: infeasible. Even with continuous wire sizes and coil counts no spring meets the stress, rate, envelope and solid-length relations together.',
    );
  }
  return lines.join('\n');
}

/** What each row of the grouped list stands for, in the header. */
function groupedHeader(run: DesignRun): string {
  const total = run.result.feasibleCells;
  const rows = run.candidates.length;
  return `; the best spring of each material, wire size and end type: ${rows} row${rows === 1 ? '' : 's'} for ${total} feasible spring${total === 1 ? '' : 's'} (column "of": the feasible coil counts each row stands for; --variants lists them all)`;
}

export function designText(run: DesignRun, system: UnitSystem, showTiming = false): string {
  const out: string[] = [];
  const req = run.req;
  out.push(
    `Spring design: ${formatQuantity(req.workingForce, 'force', system)} at ${formatQuantity(req.workingLength, 'length', system)}` +
      (req.operatingLength !== undefined
        ? `, stroke to ${formatQuantity(req.operatingLength, 'length', system)}${req.operatingForce !== undefined ? ` at ${formatQuantity(req.operatingForce, 'force', system)}` : ''}`
        : '') +
      `; ranked by ${req.rank.replace('_', ' ')}${run.grouped ? groupedHeader(run) : req.bestPerWire ? ', the best springs the genetic search found (not grouped)' : ', every feasible spring (--variants)'}`,
  );
  if (req.strengthBasis === 'minimum') out.push(strengthBasisSummary(req.materials));
  out.push('');
  if (run.candidates.length) {
    out.push(candidateTable(run.candidates, system, run.yields));
    out.push(TABLE_NOTE);
    out.push(...yieldNote(run));
    out.push('');
    out.push(countsText(run, system, showTiming));
    const warn = rulesOfThumb(run.candidates[0].analysis, run.problem.service(), quantityWriter(system));
    if (warn.length) {
      out.push('');
      out.push('Notes on the best spring:');
      for (const w of warn) out.push(`  ! ${w.message}`);
    }
  } else {
    // Springs the estimate admitted and the Monte Carlo refused are named before the account of the cut.
    if (run.refused?.length) out.push(...yieldNote(run).slice(1), '');
    out.push(infeasibleText(run, system));
  }
  out.push('');
  out.push(cautionText());
  return out.join('\n') + '\n';
}

export function infeasibleText(run: DesignRun, system: UnitSystem): string {
  const out: string[] = [];
  out.push('No spring meets every requirement.');
  out.push('');
  out.push(countsText(run, system));
  const misses = run.result.nearestMisses.map((m) => candidateAt(run.problem, m.x, m.f));
  if (misses.length) {
    out.push('');
    out.push('Nearest misses (least total violation) and the checks they fail:');
    out.push(candidateTable(misses, system));
    misses.forEach((c, i) => {
      const f = failingLines(c, run.req)
        .map((l) => `${l.name} ${shortfallText(l, system) ?? `by ${sig(l.g * 100, 3)}%`}`)
        .join(', ');
      out.push(`  #${i + 1} fails: ${f}`);
    });
  }
  out.push('');
  out.push(...relaxLines(run, system));
  return out.join('\n');
}
