// A side view of a compression spring at free length, to scale: the wire's cross-sections where the
// coils cross the top and bottom of the silhouette, and the straight runs between them. Geometry only
// (mm); the SVG writer scales it. The closed end coils of squared ends sit at a pitch of one wire
// diameter, the active coils at the spring's pitch.
import { inactiveCoils, pitch as pitchOf, type EndType } from '../geometry.js';

export interface DrawingInput {
  wireDiameter: number;
  meanDiameter: number;
  activeCoils: number;
  ends: EndType;
  freeLength: number;
}

export interface SpringDrawing {
  /** Wire cross-sections: x along the axis from 0 to the free length, y = +D/2 (top) or -D/2 (bottom). */
  sections: { x: number; y: number }[];
  /** Pitch of the active coils. */
  pitch: number;
  outerDiameter: number;
  length: number;
}

export function springDrawing(s: DrawingInput): SpringDrawing {
  const d = s.wireDiameter;
  const p = pitchOf(s.freeLength, s.activeCoils, d, s.ends);
  const q = inactiveCoils(s.ends);
  const closedEach = s.ends === 'squared' || s.ends === 'squared-ground' ? q / 2 : 0;
  const total = s.activeCoils + q;
  // Half-turn spacing along the axis at each half turn t (0 .. 2 Nt): closed coils advance d per turn.
  const halfTurns = Math.round(total * 2);
  const advance = (t: number): number => {
    const turn = t / 2;
    if (turn < closedEach) return d / 2;
    if (turn >= total - closedEach) return d / 2;
    return p / 2;
  };
  const xs: number[] = [];
  let x = 0;
  for (let t = 0; t <= halfTurns; t++) {
    xs.push(x);
    x += advance(t);
  }
  // Ground ends lose half the end wire, so the end sections' centres sit on the end planes; unground
  // ends keep the whole wire, centres d/2 inside. With the end-type table this fills L0 exactly.
  const ground = s.ends === 'plain-ground' || s.ends === 'squared-ground';
  const start = ground ? 0 : d / 2;
  const span = xs[xs.length - 1] - xs[0];
  const usable = s.freeLength - 2 * start;
  const k = span > 0 ? usable / span : 1;
  const sections = xs.map((v, t) => ({ x: start + (v - xs[0]) * k, y: ((t % 2 === 0 ? 1 : -1) * s.meanDiameter) / 2 }));
  return { sections, pitch: p, outerDiameter: s.meanDiameter + d, length: s.freeLength };
}
