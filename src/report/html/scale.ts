// Linear scales and "nice" tick values for the report's plots, after d3-scale's scaleLinear and
// d3-array's ticks: data in, numbers out, no DOM.

export interface LinearScale {
  (v: number): number;
  domain: [number, number];
  range: [number, number];
  ticks(count?: number): number[];
}

/** Tick step of 1, 2 or 5 times a power of ten giving about `count` ticks over [a, b]. */
export function tickStep(a: number, b: number, count: number): number {
  const raw = Math.abs(b - a) / Math.max(1, count);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const err = raw / power;
  return power * (err >= 7.5 ? 10 : err >= 3.5 ? 5 : err >= 1.5 ? 2 : 1);
}

export function ticks(a: number, b: number, count = 5): number[] {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const step = tickStep(lo, hi, count);
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

/** Extend [a, b] outwards to whole tick steps (an empty span grows around its value). */
export function niceDomain(a: number, b: number, count = 5): [number, number] {
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  if (hi === lo) {
    const pad = Math.abs(lo) > 0 ? Math.abs(lo) * 0.1 : 1;
    lo -= pad;
    hi += pad;
  }
  const step = tickStep(lo, hi, count);
  return [Math.floor(lo / step) * step, Math.ceil(hi / step) * step];
}

export function scaleLinear(domain: [number, number], range: [number, number]): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const k = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  const s = ((v: number) => r0 + (v - d0) * k) as LinearScale;
  s.domain = domain;
  s.range = range;
  s.ticks = (count = 5) => ticks(d0, d1, count);
  return s;
}
