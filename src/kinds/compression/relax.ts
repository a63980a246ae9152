// What to change when no spring meets the requirements. Each requirement that can be relaxed is a
// "knob"; for each, the design is run again (the same search, a few milliseconds a run) on the
// requirements document with that one value changed, and bisection finds the smallest change that
// admits a spring. Every change reported was itself run and admitted a spring, written exactly as
// `--set path=value` would write it, so following any one entry alone works.
//
// Order of the advice (safety first): limits of the envelope and the duty, smallest relative change
// first; then settings (guided, seating, end types, peening, another material); and only when none of
// those works alone, the best pair of them and, as a last resort, margins (safety factors, never
// below 1; clash allowance, never below 10%). A safety factor is never advised below 1.
// Which checks a change eases is the checks registry's to say (relaxedBy in checks.ts).
//
// Under min_yield the search judges the yield by its estimate, and design then confirms each listed
// spring by the Monte Carlo: so every change the advice gives there is run once more as `design` runs
// it (search, then confirmation), and kept only when a spring survives; each then says the made yield
// of the best spring it admits. The yield's own knobs: a finer EN 15800 tolerance grade (1 is finer
// than 2, 2 than 3), and a lower min_yield, never below the yield the best spring reaches with no
// min_yield at all (below that the requirement asks for nothing).
import type { Catalog } from '../../catalogs/types.js';
import { FAMILIES } from '../../catalogs/types.js';
import { loadCatalog } from '../../catalogs/load.js';
import { isRecord } from '../../units/fields.js';
import { withValue } from '../../input/overrides.js';
import { readRequirements, type Requirements } from './requirements.js';
import { SEATINGS, endConditionConstant } from './buckling.js';
import { INFINITE_LIFE_CYCLES, STATIC_SERVICE_CYCLES } from '../../model/fatigue.js';
import { END_TYPES, inactiveCoils, solidLength } from './geometry.js';
import { inStrengthRange } from '../../catalogs/properties.js';
import { materialFigures } from '../../input/material.js';
import { springRate } from '../../model/rate.js';
import { CHECKS, activeChecks, type CheckName } from './verify.js';
import { admitsSpring, runDesign, type DesignRun } from './design.js';
import { easedBy } from './checks.js';
import { confirmRun } from './tolerance/confirm.js';
import { requirementsDocument } from './requirementsDoc.js';

/** limit: an envelope or duty value; setting: a choice (guided, seating, ends, peening, material);
 * margin: a safety factor or allowance, advised only when nothing else works alone. */
export type RelaxGroup = 'limit' | 'setting' | 'margin';

export interface RelaxChange {
  /** The requirement path, as `--set` takes it. */
  path: string;
  /** The value now (SI; null when the field is absent). */
  from: unknown;
  /** The value that admits a spring (SI), exactly as `--set path=to` reads it in an SI file. */
  to: unknown;
  /** The whole `--set` argument; in a US-unit file it spells out the SI unit. */
  set: string;
  /** Relative size of the change (0.05 = 5%); for a fraction such as load_tolerance, the change in
   * the fraction; null for a choice. */
  relative: number | null;
  group: RelaxGroup;
  /** The checks this change eases. */
  eases: CheckName[];
  /** Under min_yield: the made yield (Monte Carlo) of the best spring `design` lists with this change,
   * and the min_yield it ran under (met within the Monte Carlo's standard error, so reaches may sit just below). */
  reaches?: number;
  asked?: number;
}

export interface RelaxAdvice {
  /** Changes that each, applied alone, admit a spring; limits first (smallest relative change
   * first), then settings, then (only when no limit or setting works) margins. */
  single: RelaxChange[];
  /** When no limit or setting works alone: the best pair found that works together, else null. */
  pair: RelaxChange[] | null;
  /** Design runs spent on the advice. */
  runs: number;
  /** True when the run budget ran out before every knob was tried. */
  budgetSpent: boolean;
}

/** Run budget of one piece of advice: a run costs milliseconds, the whole advice well under a second. */
export const RELAX_LIMITS = { maxRuns: 160, bisectionSteps: 5, pairKnobs: 6 };

type Unit = 'mm' | 'N' | null;

interface NumericKnob {
  kind: 'number';
  path: string;
  group: RelaxGroup;
  eases: CheckName[];
  from: number;
  /** The value after a relative change r >= 0 (the change grows with r). */
  at(r: number): number;
  /** The largest r tried. */
  maxR: number;
  /** Round a value to 4 significant digits in the direction that relaxes (so rounding only helps). */
  direction: 1 | -1;
  unit: Unit;
  /** The value as the document holds it (a list for index and active_coils). */
  raw(v: number): unknown;
  fromRaw: unknown;
}

interface ChoiceKnob {
  kind: 'choice';
  path: string;
  group: RelaxGroup;
  eases: CheckName[];
  fromRaw: unknown;
  toRaw: unknown;
}

type Knob = NumericKnob | ChoiceKnob;

/** v rounded to `digits` significant digits in the given direction (up: +1). */
export const outward = (v: number, direction: 1 | -1, digits = 4): number => {
  if (v === 0 || !Number.isFinite(v)) return v;
  const e = Math.floor(Math.log10(Math.abs(v))) - (digits - 1);
  const scale = 10 ** e;
  const n = direction > 0 ? Math.ceil(v / scale - 1e-9) : Math.floor(v / scale + 1e-9);
  return Number((n * scale).toPrecision(digits + 1));
};

function linear(
  path: string,
  group: RelaxGroup,
  eases: CheckName[],
  from: number,
  direction: 1 | -1,
  target: number,
  unit: Unit,
  opts: { raw?: (v: number) => unknown; fromRaw?: unknown; absolute?: boolean } = {},
): NumericKnob | null {
  // r is the relative change (or, for a fraction, the absolute one); target the most relaxed value tried.
  const scale = opts.absolute ? 1 : Math.abs(from);
  const maxR = (direction * (target - from)) / scale;
  if (!(maxR > 1e-9) || !Number.isFinite(maxR)) return null;
  return {
    kind: 'number',
    path,
    group,
    eases,
    from,
    maxR,
    direction,
    unit,
    at: (r) => outward(from + direction * r * scale, direction, 4),
    raw: opts.raw ?? ((v) => v),
    fromRaw: opts.fromRaw ?? from,
  };
}

/** Where each envelope limit stops binding: the largest outer diameter (a generous 25% over the free
 * outer diameter for the growth at solid), free length (the softest coil meeting the working force) and
 * solid length any spring of the request's wires, index and coil range can have. Raising a limit past
 * its value cannot admit a spring that a smaller raise does not, so the advice tries up to there. */
export function envelopeReach(req: Requirements): { outerDiameter: number; freeLength: number; solidLength: number } {
  const reach = { outerDiameter: 0, freeLength: 0, solidLength: 0 };
  const nMax = req.activeCoils[1];
  for (const m of req.materials)
    for (const d of req.wireSizes(m)) {
      if (m.tensileStrength === undefined && !inStrengthRange(m.material, d)) continue;
      const D = req.index[1] * d;
      const k = springRate(materialFigures(m, d, req.setRemoved).shearModulus, d, D, nMax, req.directShear);
      reach.outerDiameter = Math.max(reach.outerDiameter, 1.25 * (D + d));
      reach.freeLength = Math.max(reach.freeLength, req.workingLength + req.workingForce / k);
      for (const e of req.ends) reach.solidLength = Math.max(reach.solidLength, solidLength(d, nMax + inactiveCoils(e), e));
    }
  return reach;
}

/** Every knob that can relax these requirements, with the range tried. The envelope limits are tried up
 * to where they stop binding (envelopeReach), at least to twice their value; the other ranges stop at
 * values a spring maker still builds (index 3 to 20, at least 2 active coils: common practice). */
function knobs(req: Requirements, doc: Record<string, unknown>, catalog: Catalog, nominalYield: number | null): Knob[] {
  const reach = envelopeReach(req);
  const on = activeChecks(req);
  const active = (c: CheckName) => on[CHECKS.indexOf(c)];
  const out: (Knob | null)[] = [];
  const env = 'envelope.';
  if (req.maxOuterDiameter !== undefined)
    out.push(
      linear(
        `${env}max_outer_diameter`,
        'limit',
        easedBy(`${env}max_outer_diameter`),
        req.maxOuterDiameter,
        1,
        Math.max(2 * req.maxOuterDiameter, reach.outerDiameter),
        'mm',
      ),
    );
  if (req.minInnerDiameter !== undefined)
    out.push(linear(`${env}min_inner_diameter`, 'limit', easedBy(`${env}min_inner_diameter`), req.minInnerDiameter, -1, 0.1 * req.minInnerDiameter, 'mm'));
  if (req.maxFreeLength !== undefined)
    out.push(
      linear(`${env}max_free_length`, 'limit', easedBy(`${env}max_free_length`), req.maxFreeLength, 1, Math.max(2 * req.maxFreeLength, reach.freeLength), 'mm'),
    );
  if (req.maxSolidLength !== undefined)
    out.push(
      linear(
        `${env}max_solid_length`,
        'limit',
        easedBy(`${env}max_solid_length`),
        req.maxSolidLength,
        1,
        Math.max(2 * req.maxSolidLength, reach.solidLength),
        'mm',
      ),
    );
  if (req.operatingLength !== undefined) {
    // A shorter stroke: the operating length moves toward the working length (it must stay below it).
    out.push(
      linear(
        'operating_length',
        'limit',
        easedBy('operating_length'),
        req.operatingLength,
        1,
        req.operatingLength + 0.9 * (req.workingLength - req.operatingLength),
        'mm',
      ),
    );
  }
  if (req.operatingForce !== undefined) {
    const of = req.operatingForce;
    out.push(linear('operating_force', 'limit', easedBy('operating_force (lower)'), of, -1, req.workingForce + 0.1 * (of - req.workingForce), 'N'));
    out.push(linear('operating_force', 'limit', easedBy('operating_force (higher)'), of, 1, 2 * of, 'N'));
    out.push(linear('load_tolerance', 'limit', easedBy('load_tolerance'), req.loadTolerance, 1, 0.5, null, { absolute: true }));
  }
  if (active('fatigue') && req.cycles !== undefined) {
    // Fewer cycles: log-spaced toward static service; r is the share of the life given up.
    const from = Number.isFinite(req.cycles) ? req.cycles : INFINITE_LIFE_CYCLES;
    if (from > STATIC_SERVICE_CYCLES) {
      const k = linear('cycles', 'limit', easedBy('cycles'), from, -1, STATIC_SERVICE_CYCLES, null, {
        fromRaw: Number.isFinite(req.cycles) ? req.cycles : 'infinite',
      });
      if (k) out.push({ ...k, at: (r) => outward(from * (1 - r), -1, 3) });
    }
  }
  const [lo, hi] = req.index;
  if (lo > 3) out.push(linear('index', 'limit', easedBy('index (lower)'), lo, -1, 3, null, { raw: (v) => [v, hi], fromRaw: [lo, hi] }));
  if (hi < 20) out.push(linear('index', 'limit', easedBy('index (higher)'), hi, 1, 20, null, { raw: (v) => [lo, v], fromRaw: [lo, hi] }));
  const [nLo, nHi] = req.activeCoils;
  if (nLo > 2) out.push(linear('active_coils', 'limit', easedBy('active_coils (lower)'), nLo, -1, 2, null, { raw: (v) => [v, nHi], fromRaw: [nLo, nHi] }));
  out.push(
    linear('active_coils', 'limit', easedBy('active_coils (higher)'), nHi, 1, Math.max(3 * nHi, nLo + 1), null, { raw: (v) => [nLo, v], fromRaw: [nLo, nHi] }),
  );

  if (active('yield') && req.minYield !== undefined && nominalYield !== null && nominalYield < req.minYield) {
    // A lower min_yield, down to the yield the best spring reaches without one (absolute steps: a fraction).
    out.push(linear('min_yield', 'limit', easedBy('min_yield'), req.minYield, -1, nominalYield, null, { absolute: true }));
  }

  // Settings.
  if (active('yield')) {
    // Each finer EN 15800 grade, the nearest first (the advice keeps only the coarsest that works).
    for (let g = req.tolerance.grade - 1; g >= 1; g--)
      out.push({ kind: 'choice', path: 'tolerance_grade', group: 'setting', eases: easedBy('tolerance_grade'), fromRaw: req.tolerance.grade, toRaw: g });
  }
  if (active('buckling')) {
    out.push({ kind: 'choice', path: 'guided', group: 'setting', eases: easedBy('guided'), fromRaw: false, toRaw: true });
    const alpha = endConditionConstant(req.seating);
    for (const s of SEATINGS)
      if (endConditionConstant(s) < alpha)
        out.push({ kind: 'choice', path: 'seating', group: 'setting', eases: easedBy('seating'), fromRaw: req.seating, toRaw: s });
  }
  // Any other end type (the run's springs show which one).
  const moreEnds = END_TYPES.filter((e) => !req.ends.includes(e));
  if (moreEnds.length)
    out.push({ kind: 'choice', path: 'ends', group: 'setting', eases: easedBy('ends'), fromRaw: [...req.ends], toRaw: [...req.ends, ...moreEnds] });
  if (active('fatigue') && !req.peened) out.push({ kind: 'choice', path: 'peened', group: 'setting', eases: easedBy('peened'), fromRaw: false, toRaw: true });
  // Another material: the other members of the families chosen, one by one (the closest
  // substitutes), then each other family as a whole.
  const materialNow = doc.material;
  const ids = new Set(req.materials.map((m) => m.material.id));
  const families = new Set(req.materials.map((m) => m.material.family));
  const eases = easedBy('material');
  for (const m of catalog.materials) {
    if (families.has(m.family) && !ids.has(m.id)) out.push({ kind: 'choice', path: 'material', group: 'setting', eases, fromRaw: materialNow, toRaw: m.id });
  }
  for (const f of FAMILIES) {
    if (families.has(f) || !catalog.materials.some((m) => m.family === f)) continue;
    out.push({ kind: 'choice', path: 'material', group: 'setting', eases, fromRaw: materialNow, toRaw: { family: f } });
  }

  // Margins: last, and never below their floors.
  if (req.allowableStress === undefined && req.safety.static > 1)
    out.push(linear('safety.static', 'margin', easedBy('safety.static'), req.safety.static, -1, 1, null));
  if (active('fatigue') && req.safety.fatigue > 1) out.push(linear('safety.fatigue', 'margin', easedBy('safety.fatigue'), req.safety.fatigue, -1, 1, null));
  // A surge margin of 1 is resonance; 10 is already below the usual 13 to 20 (common practice).
  if (active('surge') && req.safety.surge > 10) out.push(linear('safety.surge', 'margin', easedBy('safety.surge'), req.safety.surge, -1, 10, null));
  if (req.clashAllowance > 0.1)
    out.push(linear('clash_allowance', 'margin', easedBy('clash_allowance'), req.clashAllowance, -1, 0.1, null, { absolute: true }));
  if (req.solidSafe) out.push({ kind: 'choice', path: 'solid_safe', group: 'margin', eases: easedBy('solid_safe'), fromRaw: true, toRaw: false });
  if (req.gapRule) out.push({ kind: 'choice', path: 'coil_gap_rule', group: 'margin', eases: easedBy('coil_gap_rule'), fromRaw: true, toRaw: false });
  return out.filter((k): k is Knob => k !== null);
}

/** A value as YAML text for `--set`. */
function yamlText(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(yamlText).join(', ')}]`;
  if (isRecord(v))
    return `{ ${Object.entries(v)
      .map(([k, x]) => `${k}: ${yamlText(x)}`)
      .join(', ')} }`;
  return String(v);
}

/** The design runs of one piece of advice, memoised and counted. */
class Prober {
  runs = 0;
  private readonly seen = new Map<string, boolean>();
  private readonly confirmed = new Map<string, number | null>();
  constructor(
    readonly doc: Record<string, unknown>,
    readonly catalog: Catalog,
    readonly system: Requirements['system'],
    readonly run: (req: Requirements) => boolean,
    readonly confirmYield: (req: Requirements) => number | null,
  ) {}

  /** One run on the document with these changes, memoised by the changes; a value the reader refuses
   * (say, an operating force at the working force) admits nothing. */
  private probe<T>(memo: Map<string, T>, changes: { path: string; value: unknown }[], run: (req: Requirements) => T, none: T): T {
    const key = JSON.stringify(changes);
    if (memo.has(key)) return memo.get(key)!;
    let doc: Record<string, unknown> = this.doc;
    let out = none;
    try {
      for (const c of changes) doc = withValue(doc, c.path.split('.'), c.value);
      const req = readRequirements(doc, this.catalog);
      this.runs++;
      out = run(req);
    } catch {
      out = none;
    }
    memo.set(key, out);
    return out;
  }

  /** The made yield of the best spring `design` lists with these changes (search, then the Monte
   * Carlo), or null when it lists none. Always run (never cut by the budget): it guards the advice. */
  confirm(changes: { path: string; value: unknown }[]): number | null {
    return this.probe(this.confirmed, changes, this.confirmYield, null);
  }

  /** The value as the document must hold it: in a US-unit file, quantities spell out their SI unit. */
  docValue(k: Knob, raw: unknown): unknown {
    return k.kind === 'number' && k.unit && this.system !== 'si' && typeof raw === 'number' ? `${raw} ${k.unit}` : raw;
  }

  get spent(): boolean {
    return this.runs >= RELAX_LIMITS.maxRuns;
  }

  admits(changes: { path: string; value: unknown }[]): boolean | null {
    if (!this.seen.has(JSON.stringify(changes)) && this.spent) return null;
    return this.probe(this.seen, changes, this.run, false);
  }
}

/** The value each change puts in the document (for running it again). */
const docValues = new WeakMap<RelaxChange, unknown>();

function change(p: Prober, k: Knob, toRaw: unknown, relative: number | null): RelaxChange {
  const docValue = p.docValue(k, toRaw);
  const c: RelaxChange = { path: k.path, from: k.fromRaw, to: toRaw, set: `${k.path}=${yamlText(docValue)}`, relative, group: k.group, eases: k.eases };
  docValues.set(c, docValue);
  return c;
}

const assignments = (cs: RelaxChange[]) => cs.map((c) => ({ path: c.path, value: docValues.get(c) }));

/** The smallest r in (0, maxR] that admits a spring, or null. */
function smallestChange(p: Prober, k: NumericKnob, ladder: number[], others: { path: string; value: unknown }[] = []): number | null {
  const admits = (r: number) => p.admits([...others, { path: k.path, value: p.docValue(k, k.raw(k.at(r))) }]);
  if (admits(k.maxR) !== true) return null;
  let lo = 0;
  let hi = k.maxR;
  for (const r of ladder) {
    if (r >= hi) break;
    const ok = admits(r);
    if (ok === null) return hi;
    if (ok) {
      hi = r;
      break;
    }
    lo = r;
  }
  for (let i = 0; i < RELAX_LIMITS.bisectionSteps; i++) {
    const mid = (lo + hi) / 2;
    // Stop when the rounded values no longer differ.
    if (k.at(mid) === k.at(hi) || k.at(mid) === k.at(lo)) break;
    const ok = admits(mid);
    if (ok === null) break;
    if (ok) hi = mid;
    else lo = mid;
  }
  return hi;
}

function relativeOf(k: NumericKnob, v: number): number {
  return k.path === 'load_tolerance' || k.path === 'clash_allowance' || k.path === 'min_yield' ? Math.abs(v - k.from) : Math.abs(v - k.from) / Math.abs(k.from);
}

/** The ladder of relative changes tried before bisecting: a hint from the search first, when it has one. */
function ladderFor(k: NumericKnob, run: DesignRun | null): number[] {
  const base = [0.02, 0.08, 0.32, 1.28].map((x) => x * Math.min(1, k.maxR));
  const hints = run ? k.eases.map((c) => run.result.soleViolation[c]).filter((g) => Number.isFinite(g) && g > 0 && g < k.maxR) : [];
  const hint = hints.length ? Math.min(...hints) : null;
  return hint !== null ? [hint, ...base.filter((x) => x > hint)] : base;
}

export interface RelaxOptions {
  /** The requirements document the run was read from (with every override applied); rebuilt from
   * the requirements when absent. */
  document?: unknown;
  catalog?: Catalog;
  /** Whether a set of requirements admits a spring (a design run); injectable for tests. */
  admits?: (req: Requirements) => boolean;
  /** Under min_yield: the made yield of the best spring a whole design run lists (search, then the
   * Monte Carlo confirmation), null when it lists none; injectable for tests. */
  confirmYield?: (req: Requirements) => number | null;
}

/** A whole design run as the command runs it (search, then each listed spring confirmed by the Monte
 * Carlo): the made yield of the best spring it lists, or null when it lists none. */
export function confirmedBestYield(req: Requirements): number | null {
  const run = confirmRun(runDesign(req));
  return run.candidates.length ? run.yields![0].monteCarlo.yield : null;
}

/** Steps toward the far end of a knob's range when its smallest change (found on the estimate) is
 * refused by the Monte Carlo: the share of the remaining range added. */
const CONFIRM_STEPS = [0, 0.25, 0.5, 1];

/** Advice for an infeasible run: the smallest single changes that admit a spring, else the best pair. */
export function relaxAdvice(run: DesignRun, opts: RelaxOptions = {}): RelaxAdvice {
  const catalog = opts.catalog ?? loadCatalog();
  const given = opts.document ?? run.document;
  const doc = isRecord(given) ? given : requirementsDocument(run.req);
  const confirmYield = opts.confirmYield ?? confirmedBestYield;
  const p = new Prober(doc, catalog, isRecord(given) ? run.req.system : 'si', opts.admits ?? admitsSpring, confirmYield);
  const yieldOn = run.req.minYield !== undefined;
  // The yield the best spring reaches with no min_yield: the floor of a lower min_yield.
  const nominalYield = yieldOn ? (p.runs++, confirmYield({ ...run.req, minYield: undefined })) : null;
  const all = knobs(run.req, doc, catalog, nominalYield);
  const found: RelaxChange[] = [];
  /** The change as design runs it: under min_yield kept only when the Monte Carlo confirms a spring. */
  const confirmed = (cs: RelaxChange[]): RelaxChange[] | null => {
    if (!yieldOn) return cs;
    const y = p.confirm(assignments(cs));
    if (y === null) return null;
    const asked = Number(cs.find((c) => c.path === 'min_yield')?.to ?? run.req.minYield);
    return cs.map((c) => ({ ...c, reaches: y, asked }));
  };
  const tryKnob = (k: Knob): RelaxChange | null => {
    if (k.kind === 'choice') return p.admits([{ path: k.path, value: k.toRaw }]) ? (confirmed([change(p, k, k.toRaw, null)])?.[0] ?? null) : null;
    const r = smallestChange(p, k, ladderFor(k, run));
    if (r === null) return null;
    for (const step of yieldOn ? CONFIRM_STEPS : [0]) {
      const v = k.at(r + step * (k.maxR - r));
      const c = confirmed([change(p, k, k.raw(v), relativeOf(k, v))]);
      if (c) return c[0];
    }
    return null;
  };
  for (const k of all.filter((k) => k.group !== 'margin')) {
    // A finer tolerance grade than one that already works only costs more.
    if (k.path === 'tolerance_grade' && found.some((c) => c.path === 'tolerance_grade')) continue;
    const c = tryKnob(k);
    if (c) found.push(c);
  }
  const byRelative = (a: RelaxChange, b: RelaxChange) => (a.relative ?? Infinity) - (b.relative ?? Infinity);
  const limits = found.filter((c) => c.group === 'limit').sort(byRelative);
  const settings = found.filter((c) => c.group === 'setting');
  let single = [...limits, ...settings];
  let pair: RelaxChange[] | null = null;
  if (!single.length) {
    const best = bestPair(
      p,
      all.filter((k) => k.group !== 'margin'),
      run,
    );
    pair = best && confirmed(best);
    const margins: RelaxChange[] = [];
    for (const k of all.filter((k) => k.group === 'margin')) {
      const c = tryKnob(k);
      if (c) margins.push(c);
    }
    single = margins.sort(byRelative);
  }
  return { single, pair, runs: p.runs, budgetSpent: p.spent };
}

/** Pairs of the most promising knobs, each pair relaxed by a common relative change; the pair with
 * the smallest total change wins (a choice counts as a change of 25%). */
function bestPair(p: Prober, ks: Knob[], run: DesignRun): RelaxChange[] | null {
  // Most promising first: the knobs tied to the checks that cut the most combinations.
  const cut = (k: Knob) => Math.max(0, ...k.eases.map((c) => run.result.cutBy[c] ?? 0));
  const numeric = ks.filter((k): k is NumericKnob => k.kind === 'number').sort((a, b) => cut(b) - cut(a));
  const choices = ks.filter((k): k is ChoiceKnob => k.kind === 'choice' && !(k.path === 'material' && typeof k.toRaw === 'string'));
  const pool: Knob[] = [...numeric.slice(0, RELAX_LIMITS.pairKnobs), ...choices];
  let best: { cost: number; changes: RelaxChange[] } | null = null;
  for (let i = 0; i < pool.length; i++) {
    for (let j = i + 1; j < pool.length; j++) {
      const a = pool[i];
      const b = pool[j];
      if (a.path === b.path) continue;
      const result = pairChange(p, a, b);
      if (result && (!best || result.cost < best.cost)) best = result;
      if (p.spent) return best?.changes ?? null;
    }
  }
  return best?.changes ?? null;
}

function pairChange(p: Prober, a: Knob, b: Knob): { cost: number; changes: RelaxChange[] } | null {
  if (a.kind === 'choice' && b.kind === 'choice') {
    return p.admits([
      { path: a.path, value: a.toRaw },
      { path: b.path, value: b.toRaw },
    ])
      ? { cost: 0.5, changes: [change(p, a, a.toRaw, null), change(p, b, b.toRaw, null)] }
      : null;
  }
  if (a.kind === 'choice' || b.kind === 'choice') {
    const c = (a.kind === 'choice' ? a : b) as ChoiceKnob;
    const n = (a.kind === 'choice' ? b : a) as NumericKnob;
    const r = smallestChange(
      p,
      n,
      [0.08, 0.32].map((x) => x * n.maxR),
      [{ path: c.path, value: c.toRaw }],
    );
    if (r === null) return null;
    const v = n.at(r);
    return { cost: 0.25 + relativeOf(n, v), changes: [change(p, n, n.raw(v), relativeOf(n, v)), change(p, c, c.toRaw, null)] };
  }
  // Both numeric: one common relative change, each clipped at its own range.
  const na = a as NumericKnob;
  const nb = b as NumericKnob;
  const maxR = Math.max(na.maxR, nb.maxR);
  const both = (r: number) => [
    { path: na.path, value: p.docValue(na, na.raw(na.at(Math.min(r, na.maxR)))) },
    { path: nb.path, value: p.docValue(nb, nb.raw(nb.at(Math.min(r, nb.maxR)))) },
  ];
  if (p.admits(both(maxR)) !== true) return null;
  let lo = 0;
  let hi = maxR;
  for (const r of [0.08, 0.32].map((x) => x * maxR)) {
    const ok = p.admits(both(r));
    if (ok === null) break;
    if (ok) {
      hi = r;
      break;
    }
    lo = r;
  }
  for (let i = 0; i < RELAX_LIMITS.bisectionSteps; i++) {
    const mid = (lo + hi) / 2;
    const ok = p.admits(both(mid));
    if (ok === null) break;
    if (ok) hi = mid;
    else lo = mid;
  }
  const va = na.at(Math.min(hi, na.maxR));
  const vb = nb.at(Math.min(hi, nb.maxR));
  return {
    cost: relativeOf(na, va) + relativeOf(nb, vb),
    changes: [change(p, na, na.raw(va), relativeOf(na, va)), change(p, nb, nb.raw(vb), relativeOf(nb, vb))],
  };
}

/** The check that limits an infeasible run, cheaply (no extra runs): the one that alone failed by
 * the least somewhere, else the one that cut the most combinations. For sweeps, where a full piece
 * of advice per row would cost a second each. */
export function limitingCheck(run: DesignRun): CheckName | null {
  const on = activeChecks(run.req);
  const names = CHECKS.filter((_, i) => on[i]);
  const sole = names.filter((c) => Number.isFinite(run.result.soleViolation[c])).sort((a, b) => run.result.soleViolation[a] - run.result.soleViolation[b]);
  if (sole.length) return sole[0];
  const cut = names.filter((c) => (run.result.cutBy[c] ?? 0) > 0).sort((a, b) => run.result.cutBy[b] - run.result.cutBy[a]);
  return cut[0] ?? null;
}
