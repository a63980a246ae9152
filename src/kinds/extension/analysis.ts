// The full analysis of one extension spring: body, loops, initial tension, static and fatigue safety,
// composed from the shared wire mechanics (src/model) and this folder's loop and load-line formulas.
// Inputs and outputs SI (mm, N, MPa, kg, Hz, degC). No I/O.
import {
  INFINITE_LIFE_CYCLES,
  STATIC_SERVICE_CYCLES,
  endurancePoint,
  fullyReversedEndurance,
  type EndurancePoint,
  type EnduranceSource,
  type FatigueCriterion,
} from '../../model/fatigue.js';
import { springRate } from '../../model/rate.js';
import { shearStress } from '../../model/stress.js';
import { stressFactor, type StressCorrection } from '../../model/stressFactor.js';
import { ultimateShearStrength } from '../../model/strength.js';
import { activeCoilMass, surgeFrequency } from '../../model/surge.js';
import type { Warning } from '../../model/figures.js';
import { cycleOnLine, loopLifeCurve, offsetAlternatingStrength, yieldAlongLoadLine, type CycleOnLine } from './fatigue.js';
import { bodyLength, extensionActiveCoils, extensionMass, extensionWireLength, freeLengthInsideLoops, loopWireLength, wireVolumeOfLength } from './geometry.js';
import { initialTensionBand, initialTensionPosition, type InitialTensionBand, type InitialTensionPosition } from './initialTension.js';
import type { LoopRule } from './catalog.js';
import { loopBendingFactor, loopBendingStress, loopTorsionFactor, loopTorsionStress } from './loops.js';
import type { ExtensionMaterial } from './material.js';

export interface ExtensionGeometry {
  wireDiameter: number;
  meanDiameter: number;
  bodyCoils: number;
  loop: LoopRule;
  /** Inside height of each loop from the end of the body (what it adds to the free length). */
  loopHeight: number;
  /** r1, mean radius of the loop. */
  loopRadius: number;
  /** r2, radius of the bend from the body into the loop. */
  bendRadius: number;
  /** Fi, N. */
  initialTension: number;
}

export interface ExtensionService {
  /** Lengths inside the loops to evaluate, mm, each at or above the free length. */
  lengths: number[];
  /** Load cycles; undefined: static service; Infinity: infinite life. */
  cycles?: number;
  peened: boolean;
  criterion: FatigueCriterion;
  correction: StressCorrection;
  temperature?: number;
  forcingFrequency?: number;
  /** Surge frequency must exceed the forcing frequency this many times. */
  surgeMargin: number;
}

/** Where the stresses sit: the body, the loop's bending at A, the loop's torsion at B. */
export const EXTENSION_SITES = ['body', 'loopBending', 'loopTorsion'] as const;
export type ExtensionSite = (typeof EXTENSION_SITES)[number];

export interface ExtensionPoint {
  length: number;
  extension: number;
  force: number;
  bodyStress: number;
  loopBendingStress: number;
  loopTorsionStress: number;
}

export interface SiteFatigue extends CycleOnLine {
  endurance: EndurancePoint;
  enduranceSource: EnduranceSource;
  /** Ssu for torsion, Sut for bending. */
  ultimate: number;
  alternatingStrength: number;
  /** NaN when the cycle has no alternating stress. */
  safetyFactor: number;
}

export interface ExtensionFatigue {
  life: 'infinite' | 'finite';
  cycles: number;
  minForce: number;
  maxForce: number;
  criterion: FatigueCriterion;
  body: SiteFatigue;
  loopBending: SiteFatigue;
  loopTorsion: SiteFatigue;
  /** Body yield along the load line from the initial-tension stress (Shigley Example 10-8 (b)). */
  bodyYieldSafetyFactor: number;
  governing: ExtensionSite;
}

export interface ExtensionAnalysis {
  kind: 'extension';
  geometry: {
    wireDiameter: number;
    meanDiameter: number;
    outerDiameter: number;
    innerDiameter: number;
    springIndex: number;
    bodyCoils: number;
    activeCoils: number;
    loop: string;
    loopHeight: number;
    loopRadius: number;
    bendRadius: number;
    loopIndex: number;
    bendIndex: number;
    bodyLength: number;
    freeLength: number;
    wireLength: number;
    wireVolume: number;
    mass: number;
  };
  factors: { body: number; loopBending: number; loopTorsion: number };
  rate: number;
  initialTension: { force: number; stress: number; band: InitialTensionBand; position: InitialTensionPosition };
  material: ExtensionMaterial & { ultimateShear: number };
  points: ExtensionPoint[];
  /** Static safety factors at the longest evaluated length: allowable over stress, each site alone. */
  staticSafety: { body: number; loopBending: number; loopTorsion: number; governing: ExtensionSite };
  /** The largest force (and length) before the first site reaches its allowable. `pastAtFreeLength`:
   * the initial tension alone is above that force, so the spring is past its allowable before it is
   * pulled at all, and `length` (below the free length) is no length it can have. */
  safeExtension: { force: number; length: number; governing: ExtensionSite; pastAtFreeLength: boolean };
  fatigue: ExtensionFatigue | null;
  surge: { frequency: number };
  warnings: Warning[];
}

/** Stress per newton at each site (every stress here is proportional to the force). */
export function stressPerNewton(
  d: number,
  D: number,
  factorBody: number,
  factorA: number,
  factorB: number,
): { body: number; loopBending: number; loopTorsion: number } {
  return { body: shearStress(1, D, d, factorBody), loopBending: loopBendingStress(1, D, d, factorA), loopTorsion: loopTorsionStress(1, D, d, factorB) };
}

function governingOf(v: Record<ExtensionSite, number>, low: boolean): ExtensionSite {
  let best: ExtensionSite = 'body';
  for (const s of EXTENSION_SITES) if (low ? v[s] < v[best] : v[s] > v[best]) best = s;
  return best;
}

interface SiteData {
  sse: number;
  sinesAlternating: number;
  point: EndurancePoint;
  source: EnduranceSource;
  ultimate: number;
}

/** The endurance data of a site: its point on the life curve and the criterion's line through it. */
function siteData(point: EndurancePoint, source: EnduranceSource, ultimate: number, criterion: FatigueCriterion): SiteData {
  return { sse: fullyReversedEndurance(point, ultimate, criterion), sinesAlternating: point.alternating, point, source, ultimate };
}

function siteFatigue(cycle: CycleOnLine, site: SiteData, criterion: FatigueCriterion): SiteFatigue {
  const strength = offsetAlternatingStrength(cycle.slope, cycle.initialStress, site.sse, site.sinesAlternating, site.ultimate, criterion);
  return {
    ...cycle,
    endurance: site.point,
    enduranceSource: site.source,
    ultimate: site.ultimate,
    alternatingStrength: strength,
    safetyFactor: cycle.alternatingStress > 0 ? strength / cycle.alternatingStress : NaN,
  };
}

export function analyzeExtension(g: ExtensionGeometry, m: ExtensionMaterial, s: ExtensionService): ExtensionAnalysis {
  const d = g.wireDiameter;
  const D = g.meanDiameter;
  const C = D / d;
  const f = m.figures;
  const K = stressFactor(C, s.correction);
  const C1 = (2 * g.loopRadius) / d;
  const C2 = (2 * g.bendRadius) / d;
  const KA = loopBendingFactor(C1);
  const KB = loopTorsionFactor(C2);
  const Na = extensionActiveCoils(g.bodyCoils, f.shearModulus, f.elasticModulus);
  const k = springRate(f.shearModulus, d, D, Na);
  const L0 = freeLengthInsideLoops(d, g.bodyCoils, g.loopHeight);
  const per = stressPerNewton(d, D, K, KA, KB);
  const Fi = g.initialTension;
  const tauI = per.body * Fi;
  const band = initialTensionBand(C);
  const sut = f.tensileStrength;
  const ssu = ultimateShearStrength(sut);
  const allow = m.allowables;

  const points: ExtensionPoint[] = s.lengths.map((length) => {
    const force = Fi + k * (length - L0);
    return {
      length,
      extension: length - L0,
      force,
      bodyStress: per.body * force,
      loopBendingStress: per.loopBending * force,
      loopTorsionStress: per.loopTorsion * force,
    };
  });
  const forces = points.map((p) => p.force);
  const maxForce = forces.length ? Math.max(...forces) : Fi;
  const minForce = forces.length ? Math.min(...forces) : Fi;
  const staticValues = {
    body: allow.bodyTorsion / (per.body * maxForce),
    loopBending: allow.loopBending / (per.loopBending * maxForce),
    loopTorsion: allow.loopTorsion / (per.loopTorsion * maxForce),
  };
  const safeForces = { body: allow.bodyTorsion / per.body, loopBending: allow.loopBending / per.loopBending, loopTorsion: allow.loopTorsion / per.loopTorsion };
  const safeSite = governingOf(safeForces, true);
  const safeForce = safeForces[safeSite];

  let fatigue: ExtensionFatigue | null = null;
  if (s.cycles !== undefined && s.cycles >= STATIC_SERVICE_CYCLES && points.length >= 1) {
    const cycles = s.cycles;
    const bodyCycle = cycleOnLine(tauI, per.body * minForce, per.body * maxForce);
    const { point, source } = endurancePoint(cycles, s.peened, f.zimmerli, f.finiteLife, sut, s.criterion);
    const body = siteFatigue(bodyCycle, siteData(point, source, ssu, s.criterion), s.criterion);
    const aCycle = cycleOnLine(per.loopBending * Fi, per.loopBending * minForce, per.loopBending * maxForce);
    const bCycle = cycleOnLine(per.loopTorsion * Fi, per.loopTorsion * minForce, per.loopTorsion * maxForce);
    const a = loopLifeCurve(cycles, f.zimmerli, m.loopFatigue.loopBending, sut, true, s.criterion);
    const b = loopLifeCurve(cycles, f.zimmerli, m.loopFatigue.loopTorsion, sut, false, s.criterion);
    const loopBending = siteFatigue(aCycle, siteData(a.point, a.source, sut, s.criterion), s.criterion);
    const loopTorsion = siteFatigue(bCycle, siteData(b.point, b.source, ssu, s.criterion), s.criterion);
    const nf = { body: body.safetyFactor, loopBending: loopBending.safetyFactor, loopTorsion: loopTorsion.safetyFactor };
    fatigue = {
      life: cycles >= INFINITE_LIFE_CYCLES ? 'infinite' : 'finite',
      cycles,
      minForce,
      maxForce,
      criterion: s.criterion,
      body,
      loopBending,
      loopTorsion,
      bodyYieldSafetyFactor: yieldAlongLoadLine(bodyCycle, allow.bodyTorsion),
      governing: governingOf({ body: nan(nf.body), loopBending: nan(nf.loopBending), loopTorsion: nan(nf.loopTorsion) }, true),
    };
  }

  const loopWire = loopWireLength(g.loop, d, D, g.loopHeight);
  const wireLength = extensionWireLength(g.bodyCoils, D, loopWire);
  const surge = surgeFrequency(k, activeCoilMass(d, D, Na, f.density), false);
  const a: ExtensionAnalysis = {
    kind: 'extension',
    geometry: {
      wireDiameter: d,
      meanDiameter: D,
      outerDiameter: D + d,
      innerDiameter: D - d,
      springIndex: C,
      bodyCoils: g.bodyCoils,
      activeCoils: Na,
      loop: g.loop.id,
      loopHeight: g.loopHeight,
      loopRadius: g.loopRadius,
      bendRadius: g.bendRadius,
      loopIndex: C1,
      bendIndex: C2,
      bodyLength: bodyLength(d, g.bodyCoils),
      freeLength: L0,
      wireLength,
      wireVolume: wireVolumeOfLength(d, wireLength),
      mass: extensionMass(d, wireLength, f.density),
    },
    factors: { body: K, loopBending: KA, loopTorsion: KB },
    rate: k,
    initialTension: { force: Fi, stress: tauI, band, position: initialTensionPosition(tauI, band) },
    material: { ...m, ultimateShear: ssu },
    points,
    staticSafety: { ...staticValues, governing: governingOf(staticValues, true) },
    safeExtension: { force: safeForce, length: L0 + (safeForce - Fi) / k, governing: safeSite, pastAtFreeLength: safeForce < Fi },
    fatigue,
    surge: { frequency: surge },
    warnings: [],
  };
  a.warnings = extensionWarnings(a, s);
  return a;
}

/** A NaN safety factor (no alternation) never governs. */
const nan = (v: number) => (Number.isNaN(v) ? Infinity : v);

const SITE_WORDS: Record<ExtensionSite, string> = {
  body: 'the body',
  loopBending: 'the loop in bending (point A)',
  loopTorsion: "the loop's bend in torsion (point B)",
};
export function siteWords(site: ExtensionSite): string {
  return SITE_WORDS[site];
}

/** How a warning writes its stresses and temperatures (the report passes its unit system's writer). */
export interface WarningWriter {
  stress(v: number): string;
  temperature(v: number): string;
  force(v: number): string;
  length(v: number): string;
}
const n = (v: number, p = 4) => Number(v.toPrecision(p)).toString();
const SI_WRITER: WarningWriter = { stress: (v) => `${n(v)} MPa`, temperature: (v) => `${n(v)} degC`, force: (v) => `${n(v)} N`, length: (v) => `${n(v)} mm` };

/** A loop radius more than this share off the coil's mean radius D/2 is warned about (common practice: a
 * loop formed from the end coil keeps about the coil's radius). */
export const LOOP_RADIUS_NEAR = 0.1;

/** The rules of thumb a designer checks by habit; each broken one becomes a warning (SI figures unless
 * a writer for another unit system is given). */
export function extensionWarnings(a: ExtensionAnalysis, s: ExtensionService, q: WarningWriter = SI_WRITER): Warning[] {
  const w: Warning[] = [];
  const g = a.geometry;
  if (g.springIndex < 4 || g.springIndex > 12)
    w.push({
      code: 'index',
      message: `spring index ${n(g.springIndex)} is outside 4 to 12 (common practice): ${g.springIndex < 4 ? 'hard to coil, high curvature stress' : 'prone to tangling, poor tolerances'}`,
    });
  const half = g.meanDiameter / 2;
  if (Math.abs(g.loopRadius - half) > LOOP_RADIUS_NEAR * half)
    w.push({
      code: 'loop-radius',
      message: `loop radius r1 ${q.length(g.loopRadius)} is ${n((100 * Math.abs(g.loopRadius - half)) / half, 2)}% off the coil's mean radius D/2 ${q.length(half)}: the loop stresses take D/2 as the loop's moment arm (Shigley eq. 10-34), true of a loop formed from the end coil; ask the maker how the loop is formed`,
    });
  if (g.bendIndex < 4)
    w.push({
      code: 'bend-index',
      message: `bend index C2 = 2 r2 / d = ${n(g.bendIndex)} is below 4: the tight bend into the loop raises the torsion there (Shigley sec. 10-11)`,
    });
  const it = a.initialTension;
  if (it.position === 'above')
    w.push({
      code: 'initial-tension',
      message: `initial-tension stress ${q.stress(it.stress)} is above the preferred range ${q.stress(it.band.low)} to ${q.stress(it.band.high)} for index ${n(g.springIndex)}: hard to make`,
    });
  if (it.position === 'below')
    w.push({
      code: 'initial-tension',
      message: `initial-tension stress ${q.stress(it.stress)} is below the preferred range ${q.stress(it.band.low)} to ${q.stress(it.band.high)} for index ${n(g.springIndex)}: hard to hold to tolerance`,
    });
  const safe = a.safeExtension;
  if (safe.pastAtFreeLength)
    w.push({
      code: 'overstress',
      message: `the initial tension ${q.force(a.initialTension.force)} is above the ${q.force(safe.force)} that ${SITE_WORDS[safe.governing]} allows: the spring is past its allowable at its free length and will take a set or break when made`,
    });
  for (const site of EXTENSION_SITES) {
    const v = a.staticSafety[site];
    if (Number.isFinite(v) && v < 1)
      w.push({
        code: 'overstress',
        message: `at the longest evaluated length the stress in ${SITE_WORDS[site]} is ${n(1 / v)} times its static allowable: the spring will take a set or break there`,
      });
  }
  if (a.fatigue) {
    for (const site of EXTENSION_SITES) {
      const v = a.fatigue[site].safetyFactor;
      if (Number.isFinite(v) && v < 1)
        w.push({
          code: 'fatigue',
          message: `fatigue safety factor of ${SITE_WORDS[site]} is ${n(v)}, below 1: expect it to break before ${a.fatigue.life === 'infinite' ? 'infinite life' : `${a.fatigue.cycles.toExponential(0)} cycles`}`,
        });
    }
    if (!a.material.loopFatigueStated)
      w.push({
        code: 'loop-fatigue-data',
        message: "the loops' fatigue fractions are published for music wire and 302 stainless: for this material they are an estimate",
      });
    if (s.peened) w.push({ code: 'loops-unpeened', message: 'peening is credited to the body only: the loops are judged with unpeened data' });
  }
  if (s.forcingFrequency && s.forcingFrequency > 0 && a.surge.frequency < s.surgeMargin * s.forcingFrequency)
    w.push({
      code: 'surge',
      message: `surge frequency ${n(a.surge.frequency)} Hz is less than ${s.surgeMargin} times the forcing frequency ${n(s.forcingFrequency)} Hz (common practice)`,
    });
  if (s.temperature !== undefined && s.temperature > a.material.figures.maxTemperature)
    w.push({
      code: 'temperature',
      message: `service temperature ${q.temperature(s.temperature)} exceeds the material's maximum ${q.temperature(a.material.figures.maxTemperature)}: expect relaxation, and the initial tension is the first to go`,
    });
  return w;
}

/** The caution an extension spring needs wherever users see its results. */
export const EXTENSION_CAUTION =
  'An extension spring that breaks lets go of its load. Where a failure could hurt someone, use a compression spring in a draw-bar arrangement or fit a guard, follow the applicable codes and licensed engineering practice, verify the design with the spring maker and test prototypes.';

/** The extension kind as the cautions see it (src/report/cautions.ts): its id and its own caution. */
export const EXTENSION_CAUTIONS = { id: 'extension', cautions: [EXTENSION_CAUTION] } as const;
