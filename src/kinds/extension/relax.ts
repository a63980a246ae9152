// What to relax when no extension spring meets the requirements: for each limit or setting that can
// ease the checks that cut, the smallest change that admits a spring, found by running the design again
// (the limit at its loosest first, then bisected) on the requirements document changed by path. Every
// change listed was itself run. Values are in the file's unit system, as `--set` takes them.
import type { Catalog } from '../../catalogs/types.js';
import { withValue } from '../../input/overrides.js';
import { inUnit } from '../../units/format.js';
import type { Kind } from '../../units/kinds.js';
import type { ExtensionCatalog } from './catalog.js';
import { designExtension } from './design.js';
import { readExtensionRequirements, type ExtensionRequirements } from './requirements.js';

export interface ExtensionRelaxChange {
  path: string;
  from: number | string | null;
  to: number | string;
  /** The exact `--set` argument that applies it. */
  set: string;
  /** The unit kind of a numeric change (null: a plain number or a setting). */
  unit: Kind | null;
}

interface NumericLimit {
  path: string;
  unit: Kind | null;
  current(r: ExtensionRequirements): number | undefined;
  loosest(r: ExtensionRequirements, v: number): number;
}

const NUMERIC: NumericLimit[] = [
  { path: 'envelope.max_outer_diameter', unit: 'length', current: (r) => r.maxOuterDiameter, loosest: (_r, v) => v * 3 },
  { path: 'envelope.max_free_length', unit: 'length', current: (r) => r.maxFreeLength, loosest: (_r, v) => v * 3 },
  { path: 'envelope.max_extended_length', unit: 'length', current: (r) => r.maxExtendedLength, loosest: (r) => r.operatingLength ?? r.workingLength },
  { path: 'load_tolerance', unit: null, current: (r) => (r.operatingForce !== undefined ? r.loadTolerance : undefined), loosest: () => 0.5 },
  {
    path: 'cycles',
    unit: null,
    current: (r) => (r.cycles !== undefined && Number.isFinite(r.cycles) && r.cycles >= 1e4 ? r.cycles : undefined),
    loosest: () => 1e4,
  },
];

/** Round v to 4 significant figures away from the requirement (so the printed value admits a spring too). */
function outward(v: number, up: boolean): number {
  if (v === 0) return 0;
  const p = Math.pow(10, Math.floor(Math.log10(Math.abs(v))) - 3);
  return (up ? Math.ceil(v / p) : Math.floor(v / p)) * p;
}

const tidy = (v: number) => Number(v.toPrecision(12));

export interface ExtensionRelaxAdvice {
  /** Changes that each, applied alone, admit a spring. */
  changes: ExtensionRelaxChange[];
  /** When no single change works: the pair with the smallest total change that admits a spring when
   * applied together (neither does alone, or it would be a single change), else null. */
  pair: ExtensionRelaxChange[] | null;
  /** Design runs spent on the advice. */
  runs: number;
}

/** Runs the pair search may spend (an extension design run costs tens of milliseconds). */
export const PAIR_RUN_BUDGET = 32;

/** The smallest single changes that admit a spring (empty when none does, or when `doc` is unknown);
 * when none does, the best pair (after compression's relax.ts: one common step along both). */
export function extensionRelaxAdvice(req: ExtensionRequirements, doc: unknown, catalog: Catalog, ext: ExtensionCatalog): ExtensionRelaxAdvice {
  let runs = 0;
  const admitsAll = (set: readonly (readonly [string, unknown])[]): boolean => {
    runs++;
    try {
      const changed = set.reduce((d, [path, value]) => withValue(d, path.split('.'), value), doc);
      const r = readExtensionRequirements(changed, catalog, ext);
      return designExtension({ ...r, top: 1 }, catalog, {}, ext).candidates.length > 0;
    } catch {
      return false;
    }
  };
  const admits = (path: string, value: unknown): boolean => admitsAll([[path, value]]);
  const changes: ExtensionRelaxChange[] = [];
  const knobs: PairKnob[] = [];
  if (doc === undefined) return { changes, pair: null, runs };
  for (const lim of NUMERIC) {
    const core = lim.current(req);
    if (core === undefined) continue;
    // In the file's units: what --set and the file take.
    const from = lim.unit ? inUnit(core, lim.unit, req.system) : core;
    const loosestCore = lim.loosest(req, core);
    const far = lim.unit ? inUnit(loosestCore, lim.unit, req.system) : loosestCore;
    const up = far > from;
    if (far === from) continue;
    knobs.push({ path: lim.path, unit: lim.unit, from, far, up });
    if (!admits(lim.path, tidy(far))) continue;
    // Bisect between the failing requirement and the admitting far end.
    let bad = from;
    let good = far;
    for (let i = 0; i < 6; i++) {
      const mid = (bad + good) / 2;
      if (admits(lim.path, tidy(mid))) good = mid;
      else bad = mid;
    }
    let to = outward(good, up);
    if (lim.path === 'cycles') to = Math.floor(good);
    if (!admits(lim.path, tidy(to))) to = good;
    changes.push({ path: lim.path, from: tidy(from), to: tidy(to), set: `${lim.path}=${tidy(to)}`, unit: lim.unit });
  }
  const settings: [string, unknown, string | null, boolean][] = [
    ['initial_tension_range', 'makeable', req.initialTensionRange, req.initialTensionRange === 'preferred'],
    ['body_coils', [req.bodyCoils[0], req.bodyCoils[1] * 2], `[${req.bodyCoils.join(', ')}]`, true],
    ['material', 'any', req.materials.map((m) => m.material.id).join(', '), req.materials.length < catalog.materials.length],
  ];
  for (const [path, value, from, applies] of settings) {
    if (!applies) continue;
    const shown = Array.isArray(value) ? `[${value.join(', ')}]` : String(value);
    const change: ExtensionRelaxChange = { path, from, to: shown, set: `${path}=${Array.isArray(value) ? `[${value.join(',')}]` : shown}`, unit: null };
    knobs.push({ path, value, change });
    if (admits(path, value)) changes.push(change);
  }
  const pair = changes.length ? null : bestPair(knobs, admitsAll, () => runs);
  return { changes, pair, runs };
}

/** A limit (moved from the requirement's value towards its loosest) or a setting (one value). */
type PairKnob = { path: string; unit: Kind | null; from: number; far: number; up: boolean } | { path: string; value: unknown; change: ExtensionRelaxChange };

/** The limit moved a fraction t of the way to its loosest, as the change that sets it. */
function limitAt(k: Extract<PairKnob, { far: number }>, t: number): ExtensionRelaxChange {
  let to = outward(k.from + t * (k.far - k.from), k.up);
  if (k.path === 'cycles') to = Math.floor(k.from + t * (k.far - k.from));
  return { path: k.path, from: tidy(k.from), to: tidy(to), set: `${k.path}=${tidy(to)}`, unit: k.unit };
}

/** Relative size of a change (a setting counts 25%, as in compression's advice). */
function sizeOf(c: ExtensionRelaxChange): number {
  return typeof c.to === 'number' && typeof c.from === 'number' ? Math.abs(c.to - c.from) / Math.max(Math.abs(c.from), 1e-12) : 0.25;
}

/** Pairs of knobs, both moved by one common fraction t of the way to their loosest (bisected) or a
 * setting with a limit; the pair of least total relative change wins. Every pair reported was run. */
function bestPair(knobs: PairKnob[], admitsAll: (set: readonly (readonly [string, unknown])[]) => boolean, spent: () => number): ExtensionRelaxChange[] | null {
  const start = spent();
  const entry = (c: ExtensionRelaxChange) => [c.path, c.to] as const;
  const at = (k: PairKnob, t: number): ExtensionRelaxChange => ('change' in k ? k.change : limitAt(k, t));
  const raw = (k: PairKnob, t: number): readonly [string, unknown] => ('change' in k ? [k.path, k.value] : entry(limitAt(k, t)));
  let best: { cost: number; changes: ExtensionRelaxChange[] } | null = null;
  for (let i = 0; i < knobs.length; i++) {
    for (let j = i + 1; j < knobs.length; j++) {
      if (spent() - start >= PAIR_RUN_BUDGET) return best?.changes ?? null;
      const a = knobs[i];
      const b = knobs[j];
      const both = (t: number) => admitsAll([raw(a, t), raw(b, t)]);
      if (!both(1)) continue;
      let lo = 0;
      let hi = 1;
      // Settings have no in-between: only a pair with a limit in it is bisected.
      if (!('change' in a && 'change' in b)) {
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
