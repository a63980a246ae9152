// Every requirement check on one given spring, each with its value, its limit and its margin. The
// pass/fail of the design checks comes from src/kinds/compression/verify.ts (checkAnalysis on the full analysis of
// src/kinds/compression/analysis.ts), the same functions that re-verify every spring `design` reports; a given
// spring adds the band on its working force, and that its material and end type are ones the
// requirement allows.
import type { Requirements } from '../kinds/compression/requirements.js';
import { analyzeSpring, type ServiceConditions, type SpringAnalysis } from '../kinds/compression/analysis.js';
import { springServiceConditions } from '../kinds/compression/problem.js';
import { CHECK, CHECKS, CHECK_LABELS, activeChecks, checkAnalysis, figuresUnder, type CheckName } from '../kinds/compression/verify.js';
import type { EndType } from '../kinds/compression/geometry.js';
import type { CheckFigure, ValueKind } from '../report/checkFigure.js';
import { checkFigure } from '../kinds/compression/checkFigures.js';
import { springYieldFigures, yieldShortfall } from '../kinds/compression/tolerance/confirm.js';
import type { WorkingBand } from './band.js';
import { givenService, type GivenSpring } from './given.js';

/** A check passes when its normalised value is at most this: the tolerance of design's re-verification. */
export const PASS_TOLERANCE = 1e-6;

export const GIVEN_CHECK_LABELS = {
  working_force_min: 'working force below its band',
  working_force_max: 'working force above its band',
  material: 'material not one the requirement allows',
  ends: 'end type not one the requirement names',
} as const;
export type GivenCheckName = keyof typeof GIVEN_CHECK_LABELS;
export type AnyCheckName = CheckName | GivenCheckName;

// A check's figure, its spare and how far it misses are defined below the kinds (src/report/checkFigure.ts)
// so a kind's own reports read them too; the figures of the compression checks are checkFigures.ts's.
export { spareOf, type CheckFigure, type ValueKind } from '../report/checkFigure.js';

export interface CheckLine {
  name: AnyCheckName;
  label: string;
  /** The spring's figure and the requirement's limit, SI (text for the categorical checks). */
  value: CheckFigure['value'];
  limit: CheckFigure['limit'];
  relation: CheckFigure['relation'];
  kind: ValueKind;
  /** Normalised check value, g <= 0 passes (as src/kinds/compression/verify.ts defines it); NaN: not computable. */
  g: number;
  /** -g: how far inside its limit the spring is in the check's own normalisation (design's figure: a
   * share of the limit for most checks, of the shortest length for clash, of the deflection for
   * buckling); null for categorical checks. */
  margin: number | null;
  pass: boolean;
  note?: string;
  /** The margin reads in the check's own unit (spareOf: so many mm of coil clearance), not as a share:
   * for checks whose normalised value is not a share of the limit (clash, buckling). */
  unitMargin?: boolean;
}

/** One numeric check line from its normalised value g (g <= 0 passes; NaN: not computable): the one
 * place both kinds' judges build their lines, so margin and verdict are read the same way. */
export function numericLine<N extends string>(name: N, label: string, g: number, fig: CheckFigure): Omit<CheckLine, 'name'> & { name: N } {
  return {
    name,
    label,
    value: fig.value,
    limit: fig.limit,
    relation: fig.relation,
    kind: fig.kind,
    ...(fig.note ? { note: fig.note } : {}),
    g,
    margin: Number.isNaN(g) ? null : -g,
    pass: g <= PASS_TOLERANCE,
    ...(fig.unitMargin ? { unitMargin: true } : {}),
  };
}

/** A working length at which a given compression spring is loose: beyond its free length nothing
 * compresses it, so it carries no force there (it rattles between its seats). */
export interface LoosePoint {
  /** Which length of the requirement: the working (load) length or the operating length. */
  at: 'working' | 'operating';
  length: number;
}

/** The label of a force check that fails because the spring is loose at its length. */
export const LOOSE_LABEL = 'spring loose here: the length is beyond its free length, so it carries no force (0)';

export interface Verdict {
  spring: GivenSpring;
  analysis: SpringAnalysis;
  /** The requirement's lengths at which the spring is loose (beyond its free length): force 0 there. */
  loose: LoosePoint[];
  pass: boolean;
  /** The names of the failing checks, in report order. */
  failingNames: AnyCheckName[];
  /** Sum of the failing checks' normalised values (a categorical failure counts 1): how far from passing. */
  violation: number;
  /** Every check with its figure, limit and margin (built when first read: a table of many rows needs only the verdicts). */
  readonly lines: CheckLine[];
  readonly failing: CheckLine[];
  /** The check with the smallest margin. */
  readonly limiting: CheckLine | null;
}

/** What is fixed per requirement, computed once for many springs. */
export interface Judge {
  req: Requirements;
  /** The requirement's service conditions, built once. */
  service: ServiceConditions;
  band: WorkingBand;
  active: boolean[];
  allowedMaterials: Set<string>;
  /** The end types the requirement names explicitly; null when it leaves them to the default. */
  allowedEnds: EndType[] | null;
}

export function makeJudge(req: Requirements, band: WorkingBand, endsStated: boolean): Judge {
  return {
    req,
    band,
    service: springServiceConditions(req),
    active: activeChecks(req),
    allowedMaterials: new Set(req.materials.map((m) => m.material.id)),
    allowedEnds: endsStated ? req.ends : null,
  };
}

const passes = (g: number) => g <= PASS_TOLERANCE;

class JudgedSpring implements Verdict {
  pass = true;
  failingNames: AnyCheckName[] = [];
  violation = 0;
  private built: { lines: CheckLine[]; failing: CheckLine[]; limiting: CheckLine | null } | null = null;

  constructor(
    readonly spring: GivenSpring,
    readonly analysis: SpringAnalysis,
    private readonly j: Judge,
    /** checkAnalysis's values, then the working band's low and high sides. */
    private readonly g: Float64Array,
    private readonly materialOk: boolean,
    private readonly endsOk: boolean | null,
    /** The Monte Carlo yield of the made springs, when min_yield asks for it. */
    readonly madeYield: number | null = null,
    readonly loose: LoosePoint[] = [],
  ) {
    const fail = (name: AnyCheckName, by: number) => {
      this.pass = false;
      this.failingNames.push(name);
      this.violation += by;
    };
    const n = CHECKS.length;
    if (!passes(g[n])) fail('working_force_min', Number.isNaN(g[n]) ? 1 : g[n]);
    if (!passes(g[n + 1])) fail('working_force_max', Number.isNaN(g[n + 1]) ? 1 : g[n + 1]);
    for (let i = 0; i < n; i++) if (j.active[i] && !passes(g[i])) fail(CHECKS[i], Number.isNaN(g[i]) ? 1 : g[i]);
    if (!materialOk) fail('material', 1);
    if (endsOk === false) fail('ends', 1);
  }

  private build() {
    if (this.built) return this.built;
    const { j, g, analysis } = this;
    const req = j.req;
    const n = CHECKS.length;
    const F1 = analysis.points[0].force;
    const lines: CheckLine[] = [];
    const numeric = (name: AnyCheckName, label: string, gv: number, fig: CheckFigure): CheckLine => numericLine(name, label, gv, fig);
    const looseAt = (at: LoosePoint['at']) => this.loose.some((p) => p.at === at);
    lines.push(
      numeric('working_force_min', looseAt('working') ? LOOSE_LABEL : GIVEN_CHECK_LABELS.working_force_min, g[n], {
        value: F1,
        limit: j.band.low,
        relation: '>=',
        kind: 'force',
      }),
    );
    lines.push(numeric('working_force_max', GIVEN_CHECK_LABELS.working_force_max, g[n + 1], { value: F1, limit: j.band.high, relation: '<=', kind: 'force' }));
    CHECKS.forEach((name, i) => {
      if (!j.active[i]) return;
      const label = name === 'operating_force_min' && looseAt('operating') ? LOOSE_LABEL : CHECK_LABELS[name];
      lines.push(numeric(name, label, g[CHECK[name]], checkFigure(name, analysis, req, this.madeYield)));
    });
    const id = this.spring.choice.material.id;
    lines.push({
      name: 'material',
      label: GIVEN_CHECK_LABELS.material,
      value: id,
      limit: [...j.allowedMaterials].join(', '),
      relation: 'in',
      kind: 'text',
      g: this.materialOk ? -1 : 1,
      margin: null,
      pass: this.materialOk,
    });
    if (this.endsOk !== null) {
      lines.push({
        name: 'ends',
        label: GIVEN_CHECK_LABELS.ends,
        value: this.spring.geometry.ends,
        limit: j.allowedEnds!.join(', '),
        relation: 'in',
        kind: 'text',
        g: this.endsOk ? -1 : 1,
        margin: null,
        pass: this.endsOk,
      });
    }
    let limiting: CheckLine | null = null;
    for (const l of lines) if (l.margin !== null && (limiting === null || l.margin < limiting.margin!)) limiting = l;
    this.built = { lines, failing: lines.filter((l) => !l.pass), limiting };
    return this.built;
  }

  get lines(): CheckLine[] {
    return this.build().lines;
  }
  get failing(): CheckLine[] {
    return this.build().failing;
  }
  get limiting(): CheckLine | null {
    return this.build().limiting;
  }
}

/** The service a given spring sees: the requirement's, with the spring's peening, and every length
 * beyond its free length taken at the free length (the spring stands there unloaded: it is loose). */
function servedAs(spring: GivenSpring, j: Judge): { service: ServiceConditions; loose: LoosePoint[] } {
  const service = spring.peened === j.service.peened ? j.service : givenService(j.req, spring);
  const L0 = spring.geometry.freeLength;
  const loose: LoosePoint[] = [];
  service.lengths.forEach((length, i) => {
    if (length > L0) loose.push({ at: i === 0 ? 'working' : 'operating', length });
  });
  if (loose.length === 0) return { service, loose };
  return { service: { ...service, lengths: service.lengths.map((L) => Math.min(L, L0)) }, loose };
}

export function judge(spring: GivenSpring, j: Judge): Verdict {
  // A requirement-level allowable_stress is the allowable of every figure, as in design (figuresUnder).
  const { service, loose } = servedAs(spring, j);
  const analysis = analyzeSpring(spring.geometry, figuresUnder(j.req, spring.figures), service);
  // A loose point stands at the requirement's length with no deflection and no force (the analysis took it at the free length).
  if (loose.length)
    analysis.points = analysis.points.map((p, i) =>
      j.service.lengths[i] > spring.geometry.freeLength ? { ...p, length: j.service.lengths[i], deflection: 0 } : p,
    );
  const design = checkAnalysis(analysis, j.req);
  const g = new Float64Array(CHECKS.length + 2);
  g.set(design);
  const F1 = analysis.points[0].force;
  // min_yield: the made springs' yield by the same Monte Carlo, seed and rule as design's confirmation.
  let madeYield: number | null = null;
  if (j.active[CHECK.yield] && j.req.minYield !== undefined) {
    const y = springYieldFigures({ geometry: spring.geometry, figures: analysis.material, material: spring.choice.material }, j.req);
    madeYield = y.monteCarlo.yield;
    g[CHECK.yield] = yieldShortfall(y.monteCarlo, j.req.minYield);
  }
  g[CHECKS.length] = (j.band.low - F1) / j.band.force;
  g[CHECKS.length + 1] = (F1 - j.band.high) / j.band.force;
  return new JudgedSpring(
    spring,
    analysis,
    j,
    g,
    j.allowedMaterials.has(spring.choice.material.id),
    j.allowedEnds ? j.allowedEnds.includes(spring.geometry.ends) : null,
    madeYield,
    loose,
  );
}
