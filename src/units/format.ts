// Writing quantities for people: core (SI) values into the chosen system with a sensible number
// of significant figures. Non-finite values never reach output: they are written as a dash.
import type { Kind } from './kinds.js';
import { outputUnit, readableUnit, type UnitSystem } from './systems.js';

export function sig(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return '-';
  // Round to the significant figures first, then choose the decimals from the rounded value: 19.96
  // at 3 figures is 20.0, so it prints like 20.5 (not "19.96" -> "20.00", one figure too many).
  const r = Number(v.toPrecision(digits));
  if (r === 0) return '0';
  const a = Math.abs(r);
  if (a >= 1e6 || a < 1e-4) return r.toExponential(digits - 1);
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(a) + 1e-12));
  return r.toFixed(Math.min(decimals, 8));
}

/** A whole count with its thousands grouped by commas (20,000), as en-US writes it, without the
 * locale machinery: the first toLocaleString of a process loads the ICU data, about 12 ms, as long as
 * a design's whole search. */
export function groupedCount(n: number): string {
  if (!Number.isSafeInteger(n)) return Number.isFinite(n) ? String(n) : '-';
  return String(n).replace(/\B(?=(\d{3})+$)/g, ',');
}

/** A yield as a percentage: one decimal (or `decimals`), rounded down, so that a yield printed as
 * reaching min_yield does reach it and nothing reads 100% while any sampled spring failed. Design, the
 * spring file and `check` all print yields through this one function (binary noise is cleaned first:
 * 0.29 is 29.0%, not 28.9%). */
export function yieldPercent(y: number, decimals = 1): string {
  if (y >= 1) return '100%';
  const scale = 10 ** (decimals + 2);
  const t = Math.floor(Number((y * scale).toPrecision(12))) / 10 ** decimals;
  return `${t.toFixed(decimals)}%`;
}

/** A figure for people, in the unit its size reads best in (5.63 g, 73.4 kpsi, 11.5 Mpsi). */
export function formatQuantity(core: number, kind: Kind, system: UnitSystem, digits = 4): string {
  const u = readableUnit(system, kind, core);
  return `${sig(u.fromCore(core), digits)} ${u.symbol}`;
}

export function inUnit(core: number, kind: Kind, system: UnitSystem): number {
  return outputUnit(system, kind).fromCore(core);
}

export function unitSymbol(kind: Kind, system: UnitSystem): string {
  return outputUnit(system, kind).symbol;
}

/** Writers for warnings in the chosen system. */
export function quantityWriter(system: UnitSystem): {
  stress(v: number): string;
  length(v: number): string;
  temperature(v: number): string;
  force(v: number): string;
} {
  return {
    stress: (v) => formatQuantity(v, 'stress', system),
    force: (v) => formatQuantity(v, 'force', system),
    length: (v) => formatQuantity(v, 'length', system),
    temperature: (v) => formatQuantity(v, 'temperature', system),
  };
}
