// What to relax when no extension spring meets the requirements. The checks that cut are the ones the
// nearest misses fail (else those that cut any combination); the changes tried are the ones the checks
// registry says ease them (EXTENSION_RELAXED_BY in checks.ts), each run through the design again on the
// requirements document changed by path. A limit is moved on the grid of its value's fourth significant
// figure (the resolution the advice prints it in) and bisected down to one step, so the change given is
// the smallest at that resolution that admits a spring, and one step less does not. Every change
// listed was itself run. Values are in the file's unit system, as `--set` takes them.
import type { Catalog } from '../../catalogs/types.js';
import { withValue } from '../../input/overrides.js';
import { inUnit } from '../../units/format.js';
import type { Kind } from '../../units/kinds.js';
import type { ExtensionCatalog } from './catalog.js';
import { EXTENSION_CHECKS, extensionEasedBy, type ExtensionCheck } from './checks.js';
import { designExtension, extensionCandidateAt, type ExtensionDesignRun } from './design.js';
import { readExtensionRequirements, type ExtensionRequirements } from './requirements.js';

export interface ExtensionRelaxChange {
  /** The change as the checks registry names it (relaxedBy): the path, with the direction where a
   * path can move both ways ("operating_force (lower)"). */
  name: string;
  path: string;
  from: number | string | null;
  to: number | string;
  /** The exact `--set` argument that applies it. */
  set: string;
  /** The unit kind of a numeric change (null: a plain number or a setting). */
  unit: Kind | null;
  /** The checks that cut which this change eases (the registry's word for it). */
  eases: ExtensionCheck[];
}

/** A limit the advice moves from the requirement's value towards its loosest. */
interface NumericKnob {
  name: string;
  path: string;
  unit: Kind | null;
  /** Significant figures of the grid it moves on. */
  digits: number;
  /** The value now (SI), or undefined when the knob does not apply. */
  current(r: ExtensionRequirements): number | undefined;
  /** The loosest value tried (SI). */
  loosest(r: ExtensionRequirements, v: number): number;
  /** The value as the document holds it (the index is a [low, high] pair). */
  raw?(r: ExtensionRequirements, v: number): unknown;
  /** A fraction: its change is measured as is, not relative to its value (which may be 0). */
  absolute?: boolean;
}

/** A setting: one other value. */
interface ChoiceKnob {
  name: string;
  path: string;
  applies(r: ExtensionRequirements, catalog: Catalog): boolean;
  from(r: ExtensionRequirements): string;
  to(r: ExtensionRequirements): unknown;
}

const pair = (v: readonly number[]) => `[${v.join(', ')}]`;

/** Every change the advice knows, by the name the checks registry uses for it. The ranges stop at
 * values a spring maker still builds (index 3 to 20: common practice). */
export const NUMERIC_KNOBS: readonly NumericKnob[] = [
  {
    name: 'envelope.max_outer_diameter',
    path: 'envelope.max_outer_diameter',
    unit: 'length',
    digits: 4,
    current: (r) => r.maxOuterDiameter,
    loosest: (_r, v) => 3 * v,
  },
  { name: 'envelope.max_free_length', path: 'envelope.max_free_length', unit: 'length', digits: 4, current: (r) => r.maxFreeLength, loosest: (_r, v) => 3 * v },
  {
    name: 'envelope.max_extended_length',
    path: 'envelope.max_extended_length',
    unit: 'length',
    digits: 4,
    current: (r) => r.maxExtendedLength,
    loosest: (r) => r.operatingLength ?? r.workingLength,
  },
  {
    // A shorter stroke: the operating length towards the working length (it must stay beyond it).
    name: 'operating_length',
    path: 'operating_length',
    unit: 'length',
    digits: 4,
    current: (r) => r.operatingLength,
    loosest: (r, v) => r.workingLength + 0.1 * (v - r.workingLength),
  },
  {
    name: 'operating_force (lower)',
    path: 'operating_force',
    unit: 'force',
    digits: 4,
    current: (r) => r.operatingForce,
    loosest: (r, v) => r.workingForce + 0.1 * (v - r.workingForce),
  },
  { name: 'operating_force (higher)', path: 'operating_force', unit: 'force', digits: 4, current: (r) => r.operatingForce, loosest: (_r, v) => 2 * v },
  {
    name: 'load_tolerance',
    path: 'load_tolerance',
    unit: null,
    digits: 3,
    absolute: true,
    current: (r) => (r.operatingForce !== undefined ? r.loadTolerance : undefined),
    loosest: () => 0.5,
  },
  {
    name: 'cycles',
    path: 'cycles',
    unit: null,
    digits: 3,
    current: (r) => (r.cycles !== undefined && Number.isFinite(r.cycles) && r.cycles > 1e4 ? r.cycles : undefined),
    loosest: () => 1e4,
  },
  {
    name: 'index (lower)',
    path: 'index',
    unit: null,
    digits: 3,
    current: (r) => (r.index[0] > 3 ? r.index[0] : undefined),
    loosest: () => 3,
    raw: (r, v) => [v, r.index[1]],
  },
  {
    name: 'index (higher)',
    path: 'index',
    unit: null,
    digits: 3,
    current: (r) => (r.index[1] < 20 ? r.index[1] : undefined),
    loosest: () => 20,
    raw: (r, v) => [r.index[0], v],
  },
];

export const CHOICE_KNOBS: readonly ChoiceKnob[] = [
  {
    name: 'initial_tension_range',
    path: 'initial_tension_range',
    applies: (r) => r.initialTensionRange === 'preferred',
    from: (r) => r.initialTensionRange,
    to: () => 'makeable',
  },
  {
    name: 'body_coils (higher)',
    path: 'body_coils',
    applies: (r) => r.bodyCoils[1] < 1000,
    from: (r) => pair(r.bodyCoils),
    to: (r) => [r.bodyCoils[0], Math.min(1000, 2 * r.bodyCoils[1])],
  },
  {
    name: 'body_coils (lower)',
    path: 'body_coils',
    applies: (r) => r.bodyCoils[0] > 1,
    from: (r) => pair(r.bodyCoils),
    to: (r) => [Math.max(1, Math.floor(r.bodyCoils[0] / 2)), r.bodyCoils[1]],
  },
  {
    name: 'material',
    path: 'material',
    applies: (r, catalog) => r.materials.length < catalog.materials.length,
    from: (r) => r.materials.map((m) => m.material.id).join(', '),
    to: () => 'any',
  },
];

/** The names of every change the advice can try (what relaxedBy entries may name). */
export const EXTENSION_RELAX_NAMES: readonly string[] = [...NUMERIC_KNOBS, ...CHOICE_KNOBS].map((k) => k.name);

const tidy = (v: number) => Number(v.toPrecision(12));

/** The checks that keep the closest springs out, most often failed first (then by the least
 * violation): those the nearest misses fail. Without misses, the checks that cut any combination,
 * most first. Cheap (no design runs): also the limiting check of a sweep row. */
export function extensionLimitingChecks(run: ExtensionDesignRun): ExtensionCheck[] {
  const count = new Map<ExtensionCheck, { n: number; least: number }>();
  for (const m of run.result.nearestMisses) {
    const g = extensionCandidateAt(run.problem, m.x, m.f).checks;
    EXTENSION_CHECKS.forEach((c, i) => {
      if (!(g[i] > 1e-9)) return;
      const s = count.get(c) ?? { n: 0, least: Infinity };
      count.set(c, { n: s.n + 1, least: Math.min(s.least, g[i]) });
    });
  }
  if (count.size) return [...count].sort((a, b) => b[1].n - a[1].n || a[1].least - b[1].least).map(([c]) => c);
  return EXTENSION_CHECKS.filter((c) => (run.result.cutBy[c] ?? 0) > 0).sort((a, b) => run.result.cutBy[b] - run.result.cutBy[a]);
}

export interface ExtensionRelaxAdvice {
  /** Changes that each, applied alone, admit a spring: limits (smallest relative change first), then settings. */
  changes: ExtensionRelaxChange[];
  /** When no single change works: the pair with the smallest total change that admits a spring when
   * applied together (neither does alone, or it would be a single change), else null. */
  pair: ExtensionRelaxChange[] | null;
  /** Design runs spent on the advice. */
  runs: number;
}

/** Runs the pair search may spend (an extension design run costs tens of milliseconds). */
export const PAIR_RUN_BUDGET = 32;

type Entry = readonly [string, unknown];

/**
 * The smallest single changes that admit a spring (empty when none does, or when `doc` is unknown);
 * when none does, the best pair (after compression's relax.ts: one common step along both). `cut`:
 * the checks to ease (extensionLimitingChecks of the run); every change the registry names for any of
 * them is tried. Absent, every active check's.
 */
export function extensionRelaxAdvice(
  req: ExtensionRequirements,
  doc: unknown,
  catalog: Catalog,
  ext: ExtensionCatalog,
  cut: readonly ExtensionCheck[] = EXTENSION_CHECKS,
): ExtensionRelaxAdvice {
  let runs = 0;
  const seen = new Map<string, boolean>();
  const admitsAll = (set: readonly Entry[]): boolean => {
    const key = JSON.stringify(set);
    const known = seen.get(key);
    if (known !== undefined) return known;
    runs++;
    let ok: boolean;
    try {
      const changed = set.reduce((d, [path, value]) => withValue(d, path.split('.'), value), doc);
      const r = readExtensionRequirements(changed, catalog, ext);
      ok = designExtension({ ...r, top: 1 }, catalog, {}, ext).candidates.length > 0;
    } catch {
      // A value the reader refuses admits nothing.
      ok = false;
    }
    seen.set(key, ok);
    return ok;
  };
  const changes: ExtensionRelaxChange[] = [];
  const knobs: PairKnob[] = [];
  if (doc === undefined) return { changes, pair: null, runs };
  const eases = (name: string) => extensionEasedBy(name).filter((c) => cut.includes(c));
  const limits: { change: ExtensionRelaxChange; relative: number }[] = [];
  for (const k of NUMERIC_KNOBS) {
    const core = k.current(req);
    const e = eases(k.name);
    if (core === undefined || !e.length) continue;
    const grid = new Grid(k, req, core);
    if (grid.steps < 1) continue;
    const entry = (n: number): Entry => [k.path, grid.raw(n)];
    knobs.push({ grid, entry, change: (n) => grid.change(n, e) });
    if (!admitsAll([entry(grid.steps)])) continue;
    // The requirement itself admits nothing (step 0); bisect to the first step that admits.
    let bad = 0;
    let good = grid.steps;
    while (good - bad > 1) {
      const mid = Math.floor((bad + good) / 2);
      if (admitsAll([entry(mid)])) good = mid;
      else bad = mid;
    }
    limits.push({ change: grid.change(good, e), relative: grid.relative(good) });
  }
  limits.sort((a, b) => a.relative - b.relative);
  changes.push(...limits.map((l) => l.change));
  for (const k of CHOICE_KNOBS) {
    const e = eases(k.name);
    if (!k.applies(req, catalog) || !e.length) continue;
    const value = k.to(req);
    const shown = Array.isArray(value) ? pair(value) : String(value);
    const change: ExtensionRelaxChange = {
      name: k.name,
      path: k.path,
      from: k.from(req),
      to: shown,
      set: `${k.path}=${Array.isArray(value) ? `[${value.join(',')}]` : shown}`,
      unit: null,
      eases: e,
    };
    knobs.push({ value: [k.path, value], change: () => change });
    if (admitsAll([[k.path, value]])) changes.push(change);
  }
  const best = changes.length ? null : bestPair(knobs, admitsAll, () => runs);
  return { changes, pair: best, runs };
}

/** A limit's values on the grid of its fourth (or third) significant figure, in the file's units:
 * step n is the requirement's value moved n steps towards the loosest. */
class Grid {
  readonly from: number;
  readonly step: number;
  readonly dir: 1 | -1;
  readonly steps: number;
  constructor(
    readonly knob: NumericKnob,
    readonly req: ExtensionRequirements,
    core: number,
  ) {
    const inFile = (v: number) => (knob.unit ? inUnit(v, knob.unit, req.system) : v);
    this.from = inFile(core);
    const far = inFile(knob.loosest(req, core));
    this.dir = far > this.from ? 1 : -1;
    // The grid of the value's own magnitude (a fraction, of its loosest: a load tolerance may be 0).
    const base = knob.absolute ? Math.abs(far) : Math.abs(this.from);
    this.step = base > 0 && Number.isFinite(base) ? 10 ** (Math.floor(Math.log10(base)) - (knob.digits - 1)) : 0;
    // The last step stops at the loosest value (never beyond it).
    this.steps = this.step > 0 ? Math.floor(Math.abs(far - this.from) / this.step + 1e-9) : 0;
  }

  value(n: number): number {
    return tidy(this.from + this.dir * n * this.step);
  }

  raw(n: number): unknown {
    return this.knob.raw ? this.knob.raw(this.req, this.value(n)) : this.value(n);
  }

  relative(n: number): number {
    const d = Math.abs(this.value(n) - this.from);
    return this.knob.absolute ? d : d / Math.max(Math.abs(this.from), 1e-12);
  }

  change(n: number, eases: ExtensionCheck[]): ExtensionRelaxChange {
    const v = this.value(n);
    const raw = this.raw(n);
    const set = Array.isArray(raw) ? `${this.knob.path}=[${raw.join(',')}]` : `${this.knob.path}=${v}`;
    return { name: this.knob.name, path: this.knob.path, from: tidy(this.from), to: v, set, unit: this.knob.unit, eases };
  }
}

/** A limit (moved step by step) or a setting (one value). */
type PairKnob = { grid: Grid; entry: (n: number) => Entry; change: (n: number) => ExtensionRelaxChange } | { value: Entry; change: () => ExtensionRelaxChange };

/** Relative size of a change (a setting counts 25%, as in compression's advice). */
function sizeOf(c: ExtensionRelaxChange): number {
  if (typeof c.to !== 'number' || typeof c.from !== 'number') return 0.25;
  const d = Math.abs(c.to - c.from);
  return c.path === 'load_tolerance' ? d : d / Math.max(Math.abs(c.from), 1e-12);
}

/** Pairs of knobs, both moved by one common share t of the way to their loosest (bisected) or a
 * setting with a limit; the pair of least total relative change wins. Every pair reported was run. */
function bestPair(knobs: PairKnob[], admitsAll: (set: readonly Entry[]) => boolean, spent: () => number): ExtensionRelaxChange[] | null {
  const start = spent();
  const stepAt = (k: PairKnob, t: number) => ('grid' in k ? Math.max(1, Math.ceil(t * k.grid.steps)) : 0);
  const entry = (k: PairKnob, t: number): Entry => ('grid' in k ? k.entry(stepAt(k, t)) : k.value);
  const at = (k: PairKnob, t: number) => k.change(stepAt(k, t));
  let best: { cost: number; changes: ExtensionRelaxChange[] } | null = null;
  for (let i = 0; i < knobs.length; i++) {
    for (let j = i + 1; j < knobs.length; j++) {
      if (spent() - start >= PAIR_RUN_BUDGET) return best?.changes ?? null;
      const a = knobs[i];
      const b = knobs[j];
      if (a.change(1).path === b.change(1).path) continue;
      const both = (t: number) => admitsAll([entry(a, t), entry(b, t)]);
      if (!both(1)) continue;
      let lo = 0;
      let hi = 1;
      // Settings have no in-between: only a pair with a limit in it is bisected.
      if ('grid' in a || 'grid' in b) {
        for (let n = 0; n < 4; n++) {
          const mid = (lo + hi) / 2;
          if (both(mid)) hi = mid;
          else lo = mid;
        }
      }
      const changes = [at(a, hi), at(b, hi)];
      const cost = changes.reduce((c, x) => c + sizeOf(x), 0);
      if (!best || cost < best.cost) best = { cost, changes };
    }
  }
  return best?.changes ?? null;
}
