// `stock`: every row of a stock table through the same checks as `check` (the full analysis of
// src/kinds/compression/analysis.ts, the verdicts of src/kinds/compression/verify.ts, the working-force band), the passing
// rows ranked like `design`, the rows that fail closest, and optionally the best custom spring beside them.
import type { Catalog } from '../catalogs/types.js';
import { endsStated } from '../check/index.js';
import { workingBand, type WorkingBand } from '../check/band.js';
import type { GivenSpring } from '../check/given.js';
import { findMaterial } from '../catalogs/load.js';
import { materialFigures, strengthRangeNote, type MaterialChoice } from '../input/material.js';
import type { MaterialFigures } from '../kinds/compression/analysis.js';
import { inactiveCoils, solidLength } from '../kinds/compression/geometry.js';
import { judge, makeJudge, type Judge, type Verdict } from '../check/judge.js';
import { readRequirements, type Requirements } from '../kinds/compression/requirements.js';
import { shortestLength } from '../kinds/compression/verify.js';
import { runDesign, type Candidate, type DesignRun } from '../kinds/compression/design.js';
import { confirmRun } from '../kinds/compression/tolerance/confirm.js';
import { readMaterialMap } from './materialMap.js';
import { RowError, readStockTable, type BadRow, type StockRow, type StockTable } from './table.js';
import { runExtensionStock, type ExtensionStockRun } from './extension.js';
import { DEFAULT_RATE_DEVIATION, settleRows, type StockOptions, type StockRankKey } from './shared.js';
import { comparison, type StockComparison } from './render.js';
import { kindOf } from '../kinds/index.js';

export { STOCK_RANK_KEYS, DEFAULT_RATE_DEVIATION, type StockRankKey, type StockOptions } from './shared.js';

/** A table's solid length this much above coilfront's makes the clash check optimistic: say so. */
export const SOLID_LENGTH_DEVIATION = 0.02;

/** One checked row. A table may hold many thousands: each keeps the few numbers that rank and count it,
 * and its full verdict is judged again when first read (for the rows shown, or every row of the CSV). */
export class RowResult {
  readonly pass: boolean;
  readonly failingNames: readonly string[];
  readonly violation: number;
  /** The row's value of the ranking objective (lower is better). */
  readonly rankValue: number;
  /** coilfront's rate, N/mm. */
  readonly rate: number;
  /** (table rate - coilfront's rate) / coilfront's rate, when the table gives a rate. */
  readonly rateDeviation: number | null;
  /** The maker's stated limits (max deflection, max load) the requirement's stroke goes beyond. */
  readonly beyondMakerLimits: string[];
  private judged: Verdict | null = null;

  constructor(
    readonly row: StockRow,
    private readonly spring: GivenSpring,
    private readonly j: Judge,
    v: Verdict,
    rank: StockRankKey,
    /** The row's own notes: figures outside a sourced range, the table's figures beside coilfront's. */
    readonly notes: string[],
    rateLimit: number,
  ) {
    const a = v.analysis;
    this.pass = v.pass;
    this.failingNames = v.failingNames;
    this.violation = v.violation;
    this.rankValue = rankValue(v, row, rank);
    this.rate = a.rate;
    this.rateDeviation = row.tableRate !== undefined ? (row.tableRate - a.rate) / a.rate : null;
    if (this.rateDeviation !== null && Math.abs(this.rateDeviation) > rateLimit)
      notes.push(`the table's rate differs from coilfront's by ${(this.rateDeviation * 100).toFixed(1)}% (more than ${(rateLimit * 100).toFixed(0)}%)`);
    if (row.tableSolidLength !== undefined && row.tableSolidLength > a.geometry.solidLength * (1 + SOLID_LENGTH_DEVIATION)) {
      notes.push(
        `the table's solid length is ${((row.tableSolidLength / a.geometry.solidLength - 1) * 100).toFixed(1)}% above coilfront's: the clash check used coilfront's`,
      );
    }
    this.beyondMakerLimits = [];
    if (row.maxDeflection !== undefined && a.geometry.freeLength - shortestLength(j.req) > row.maxDeflection) this.beyondMakerLimits.push('max_deflection');
    if (row.maxLoad !== undefined && a.points.reduce((m, p) => Math.max(m, p.force), 0) > row.maxLoad) this.beyondMakerLimits.push('max_load');
  }

  get verdict(): Verdict {
    this.judged ??= judge(this.spring, this.j);
    return this.judged;
  }
}

/** The best custom spring beside the stock rows: the design run, its best candidate, and that
 * candidate judged as a stock row is (`custom`). */
export interface Comparison extends StockComparison<Verdict> {
  run: DesignRun;
  candidate: Candidate | null;
}

export interface StockRun {
  kind: 'compression';
  req: Requirements;
  band: WorkingBand;
  table: StockTable;
  /** Bad rows of the table and rows the analysis refused (free length at or below solid...). */
  bad: BadRow[];
  rank: StockRankKey;
  rateDeviationLimit: number;
  results: RowResult[];
  passing: RowResult[];
  misses: RowResult[];
  top: number;
  failedBy: Record<string, number>;
  compare: Comparison | null;
}

export function rankValue(v: Verdict, row: StockRow, key: StockRankKey): number {
  const a = v.analysis;
  switch (key) {
    case 'mass':
      return a.geometry.mass;
    case 'wire_volume':
      return a.geometry.wireVolume;
    case 'outer_diameter':
      return a.geometry.outerDiameter;
    case 'free_length':
      return a.geometry.freeLength;
    case 'safety_factor':
      return -Math.min(a.staticSafetyFactor, a.fatigue && Number.isFinite(a.fatigue.safetyFactor) ? a.fatigue.safetyFactor : Infinity);
    case 'price':
      return row.price ?? Infinity;
  }
}

/** Material figures per material and wire diameter: a stock range repeats a few wire sizes many times. */
type FiguresCache = Map<string, { choice: MaterialChoice; figures: MaterialFigures; note: string | undefined }>;

/** The spring of a row, as readSpringCase would read the row's spring file (the property test holds the
 * two together); built directly because a table may hold many thousands of rows. */
function rowSpring(row: StockRow, catalog: Catalog, cache: FiguresCache): { spring: GivenSpring; notes: string[] } {
  const d = row.wireDiameter;
  const key = `${row.material}@${d}`;
  let entry = cache.get(key);
  if (!entry) {
    const choice: MaterialChoice = { material: findMaterial(catalog, row.material)! };
    entry = { choice, figures: materialFigures(choice, d, false), note: strengthRangeNote(choice, d) };
    cache.set(key, entry);
  }
  const { field, value } = row.diameter;
  const D = field === 'mean_diameter' ? value : field === 'outer_diameter' ? value - d : value + d;
  if (!(D > d)) throw new RowError(row.columnOf[field], `a diameter that leaves a mean diameter above the wire diameter, got ${value}`);
  const Q = inactiveCoils(row.ends);
  const Na = row.coils.field === 'active_coils' ? row.coils.value : row.coils.value - Q;
  if (!(Na > 0)) throw new RowError(row.columnOf[row.coils.field], `more total coils than the ${Q} inactive coils of ${row.ends} ends, got ${row.coils.value}`);
  const Ls = solidLength(d, Na + Q, row.ends);
  if (row.freeLength <= Ls)
    throw new RowError(
      row.columnOf.free_length,
      `a free length above the solid length ${Number(Ls.toPrecision(4))} mm (the coils overlap at free length), got ${Number(row.freeLength.toPrecision(6))} mm`,
    );
  const spring: GivenSpring = {
    choice: entry.choice,
    figures: entry.figures,
    geometry: { wireDiameter: d, meanDiameter: D, activeCoils: Na, ends: row.ends, freeLength: row.freeLength },
    peened: false,
    setRemoved: false,
  };
  return { spring, notes: entry.note ? [entry.note] : [] };
}

function rowResult(row: StockRow, catalog: Catalog, j: Judge, rank: StockRankKey, rateLimit: number, cache: FiguresCache): RowResult {
  const { spring, notes } = rowSpring(row, catalog, cache);
  return new RowResult(row, spring, j, judge(spring, j), rank, notes, rateLimit);
}

export function givenCustom(c: Candidate, req: Requirements): GivenSpring {
  return { choice: c.item.choice, geometry: c.geometry, figures: c.item.figures, peened: req.peened, setRemoved: req.setRemoved };
}

/** A stock run of either kind: the requirements' kind says which springs the table holds. */
export type AnyStockRun = StockRun | ExtensionStockRun;

export function runStock(rawRequirements: unknown, input: string | Record<string, unknown>[], catalog: Catalog, o: StockOptions = {}): AnyStockRun {
  return kindOf(rawRequirements).id === 'extension'
    ? runExtensionStock(rawRequirements, input, catalog, o)
    : runCompressionStock(rawRequirements, input, catalog, o);
}

export function runCompressionStock(rawRequirements: unknown, input: string | Record<string, unknown>[], catalog: Catalog, o: StockOptions = {}): StockRun {
  const req = readRequirements(rawRequirements, catalog);
  const label = o.label ?? 'stock table';
  const table = readStockTable(input, { system: o.units ?? 'si', materialMap: readMaterialMap(rawRequirements, catalog), catalog, label });
  const band = workingBand(req);
  const j = makeJudge(req, band, endsStated(rawRequirements));
  const rateLimit = o.rateDeviation ?? DEFAULT_RATE_DEVIATION;
  const bad = [...table.bad];
  const results: RowResult[] = [];
  const cache: FiguresCache = new Map();
  const rank = o.rank ?? req.rank;
  for (const row of table.rows) {
    try {
      results.push(rowResult(row, catalog, j, rank, rateLimit, cache));
    } catch (e) {
      if (!(e instanceof RowError)) throw e;
      bad.push({ line: row.line, partNumber: row.partNumber, field: e.field, message: `expected ${e.message}` });
    }
  }
  const { passing, misses, failedBy } = settleRows(results, bad, label, o.misses);
  let compare: Comparison | null = null;
  if (o.compare) {
    // As the design command runs it: under min_yield each listed spring confirmed by the Monte Carlo.
    const searched = runDesign(req, { strategy: o.strategy });
    const run = req.minYield !== undefined ? confirmRun(searched) : searched;
    compare = comparison(run, (c) => judge(givenCustom(c, req), j), req.workingForce);
  }
  return {
    kind: 'compression',
    req,
    band,
    table,
    bad,
    rank,
    rateDeviationLimit: rateLimit,
    results,
    passing,
    misses,
    top: o.top ?? req.top,
    failedBy,
    compare,
  };
}
