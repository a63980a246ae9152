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

interface NumericLimit { path: string; unit: Kind | null; current(r: ExtensionRequirements): number | undefined; loosest(r: ExtensionRequirements, v: number): number }

const NUMERIC: NumericLimit[] = [
  { path: 'envelope.max_outer_diameter', unit: 'length', current: (r) => r.maxOuterDiameter, loosest: (_r, v) => v * 3 },
  { path: 'envelope.max_free_length', unit: 'length', current: (r) => r.maxFreeLength, loosest: (_r, v) => v * 3 },
  { path: 'envelope.max_extended_length', unit: 'length', current: (r) => r.maxExtendedLength, loosest: (r) => r.operatingLength ?? r.workingLength },
  { path: 'load_tolerance', unit: null, current: (r) => (r.operatingForce !== undefined ? r.loadTolerance : undefined), loosest: () => 0.5 },
  { path: 'cycles', unit: null, current: (r) => (r.cycles !== undefined && Number.isFinite(r.cycles) && r.cycles >= 1e4 ? r.cycles : undefined), loosest: () => 1e4 },
];

/** Round v to 4 significant figures away from the requirement (so the printed value admits a spring too). */
function outward(v: number, up: boolean): number {
  if (v === 0) return 0;
  const p = Math.pow(10, Math.floor(Math.log10(Math.abs(v))) - 3);
  return (up ? Math.ceil(v / p) : Math.floor(v / p)) * p;
}

const tidy = (v: number) => Number(v.toPrecision(12));

/** The smallest single changes that admit a spring (empty when none does, or when `doc` is unknown). */
export function extensionRelaxAdvice(req: ExtensionRequirements, doc: unknown, catalog: Catalog, ext: ExtensionCatalog): { changes: ExtensionRelaxChange[]; runs: number } {
  let runs = 0;
  const admits = (path: string, value: unknown): boolean => {
    runs++;
    try {
      const r = readExtensionRequirements(withValue(doc, path.split('.'), value), catalog, ext);
      return designExtension({ ...r, top: 1 }, catalog, {}, ext).candidates.length > 0;
    } catch {
      return false;
    }
  };
  const changes: ExtensionRelaxChange[] = [];
  if (doc === undefined) return { changes, runs };
  for (const lim of NUMERIC) {
    const core = lim.current(req);
    if (core === undefined) continue;
    // In the file's units: what --set and the file take.
    const from = lim.unit ? inUnit(core, lim.unit, req.system) : core;
    const loosestCore = lim.loosest(req, core);
    const far = lim.unit ? inUnit(loosestCore, lim.unit, req.system) : loosestCore;
    const up = far > from;
    if (far === from || !admits(lim.path, tidy(far))) continue;
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
    if (!applies || !admits(path, value)) continue;
    const shown = Array.isArray(value) ? `[${value.join(', ')}]` : String(value);
    changes.push({ path, from, to: shown, set: `${path}=${Array.isArray(value) ? `[${value.join(',')}]` : shown}`, unit: null });
  }
  return { changes, runs };
}
