// The outcome of a design run, for people (text) and machines (JSON, SI), including the honest
// account of an infeasible run: what cut the candidates, the nearest misses, and what to relax.
import type { Requirements } from '../input/requirements.js';
import { CHECK_LABELS, CHECKS, type CheckName } from '../spring/checks.js';
import { candidateAt, reportedChecks, type Candidate, type DesignRun } from '../spring/design.js';
import { formatQuantity, inUnit, quantityWriter, sig, unitSymbol } from '../units/format.js';
import { rulesOfThumb } from '../model/analysis.js';
import type { Kind } from '../units/kinds.js';
import type { UnitSystem } from '../units/systems.js';
import { cautionText } from './cautions.js';
import { SI_UNITS } from './json.js';
import { table } from './table.js';

export function candidateRecord(c: Candidate): Record<string, unknown> {
  const a = c.analysis;
  const g = a.geometry;
  const checks: Record<string, number> = {};
  CHECKS.forEach((name, i) => { if (c.checks[i] !== -1) checks[name] = c.checks[i]; });
  return {
    material: c.item.choice.material.id,
    material_name: c.item.choice.material.name,
    ends: g.ends,
    wire_diameter: g.wireDiameter,
    mean_diameter: g.meanDiameter,
    outer_diameter: g.outerDiameter,
    inner_diameter: g.innerDiameter,
    spring_index: g.springIndex,
    active_coils: g.activeCoils,
    total_coils: g.totalCoils,
    free_length: g.freeLength,
    solid_length: g.solidLength,
    pitch: g.pitch,
    rate: a.rate,
    mass: g.mass,
    wire_volume: g.wireVolume,
    relative_cost: g.mass * c.item.choice.material.relativeCost.value,
    points: a.points.map((p) => ({ length: p.length, force: p.force, stress: p.stress })),
    solid_force: a.solid.force,
    solid_stress: a.solid.stress,
    solid_outer_diameter: a.solid.outerDiameter,
    tensile_strength: a.material.tensileStrength,
    allowable_stress: a.material.allowableStress,
    static_safety_factor: a.staticSafetyFactor,
    fatigue_safety_factor: a.fatigue ? a.fatigue.safetyFactor : null,
    natural_frequency: a.surge.relevant,
    surge_ends: a.surge.ends,
    absolutely_stable: a.buckling.absolutelyStable,
    critical_deflection: a.buckling.absolutelyStable ? null : a.buckling.criticalDeflection,
    checks,
    warnings: a.warnings.map((w) => w.message),
  };
}

export function requirementsRecord(req: Requirements): Record<string, unknown> {
  return {
    materials: req.materials.map((m) => m.material.id), ends: req.ends, seating: req.seating, surge_ends: req.surgeEnds,
    working_force: req.workingForce, working_length: req.workingLength, operating_length: req.operatingLength ?? null,
    operating_force: req.operatingForce ?? null, load_tolerance: req.loadTolerance,
    max_outer_diameter: req.maxOuterDiameter ?? null, min_inner_diameter: req.minInnerDiameter ?? null,
    max_free_length: req.maxFreeLength ?? null, max_solid_length: req.maxSolidLength ?? null,
    cycles: req.cycles === undefined ? null : Number.isFinite(req.cycles) ? req.cycles : 'infinite',
    wire_sizes: req.wireSizesLabel, active_coils: req.activeCoils, coil_step: req.coilStep, index: req.index,
    safety: req.safety, allowable_stress: req.allowableStress ?? null, peened: req.peened, guided: req.guided,
    clash_allowance: req.clashAllowance, rank: req.rank,
  };
}

// Wall-clock figures break byte-for-byte reproducibility, so they appear only when asked for (--timing).

export function countsRecord(run: DesignRun, showTiming = false): Record<string, unknown> {
  const cut: Record<string, number> = {};
  for (const c of reportedChecks(run.req)) cut[c] = run.result.cutBy[c];
  return {
    strategy: run.result.strategy,
    evaluated: run.result.evaluations,
    cells: run.result.cells,
    feasible: run.result.feasibleCells,
    pruned: run.result.prunedCells,
    cut_by: cut,
    lp_bound: run.lp.value,
    lp_status: run.lp.status,
    gap: run.gap,
    ...(showTiming ? { search_ms: run.searchMs } : {}),
  };
}

export function designJson(run: DesignRun, showTiming = false): Record<string, unknown> {
  return {
    units: SI_UNITS,
    requirements: requirementsRecord(run.req),
    ...countsRecord(run, showTiming),
    candidates: run.candidates.map(candidateRecord),
    ...(run.candidates.length === 0 ? { infeasible: infeasibleRecord(run) } : {}),
  };
}

/** A suggestion per check that was, somewhere, the only failing check. */
export function relaxSuggestions(run: DesignRun, system: UnitSystem): { check: CheckName; message: string; amount: number }[] {
  const req = run.req;
  const L = (v: number) => formatQuantity(v, 'length', system);
  const out: { check: CheckName; message: string; amount: number }[] = [];
  for (const name of reportedChecks(req) as CheckName[]) {
    const g = run.result.soleViolation[name];
    if (!Number.isFinite(g)) continue;
    const pct = `${sig(g * 100, 3)}%`;
    let message: string;
    switch (name) {
      case 'outer_diameter': message = `raise envelope.max_outer_diameter from ${L(req.maxOuterDiameter!)} to ${L(req.maxOuterDiameter! * (1 + g))}`; break;
      case 'outer_diameter_at_solid': message = `raise envelope.max_outer_diameter from ${L(req.maxOuterDiameter!)} to ${L(req.maxOuterDiameter! * (1 + g))} (the coils grow when closed)`; break;
      case 'inner_diameter': message = `lower envelope.min_inner_diameter from ${L(req.minInnerDiameter!)} to ${L(req.minInnerDiameter! * (1 - g))}`; break;
      case 'free_length': message = `raise envelope.max_free_length from ${L(req.maxFreeLength!)} to ${L(req.maxFreeLength! * (1 + g))}`; break;
      case 'solid_length': message = `raise envelope.max_solid_length from ${L(req.maxSolidLength!)} to ${L(req.maxSolidLength! * (1 + g))}`; break;
      case 'index_min': message = `lower index[0] from ${req.index[0]} to ${sig(req.index[0] * (1 - g), 3)}`; break;
      case 'index_max': message = `raise index[1] from ${req.index[1]} to ${sig(req.index[1] * (1 + g), 3)}`; break;
      case 'static_stress': message = req.allowableStress !== undefined
        ? `raise allowable_stress by ${pct} or choose a stronger material`
        : `lower safety.static from ${req.safety.static} to ${sig(req.safety.static / (1 + g), 3)} or choose a stronger material`; break;
      case 'fatigue': message = `lower safety.fatigue from ${req.safety.fatigue} to ${sig(req.safety.fatigue * (1 - g), 3)}, shot-peen (peened: true), or choose a material with better fatigue strength`; break;
      case 'clash': message = `give the spring ${L(g * (req.operatingLength ?? req.workingLength))} more room at the shortest length (a longer operating length or a smaller clash_allowance)`; break;
      case 'operating_force_min':
      case 'operating_force_max': message = `widen load_tolerance to at least ${sig((req.loadTolerance + g) * 100, 3)}%`; break;
      case 'temperature': message = 'choose a material rated for the service temperature'; break;
      default: message = `relax the ${name.replace(/_/g, ' ')} limit by ${pct}`;
    }
    out.push({ check: name, message, amount: g });
  }
  return out.sort((a, b) => a.amount - b.amount);
}

function infeasibleRecord(run: DesignRun): Record<string, unknown> {
  return {
    nearest_misses: run.result.nearestMisses.map((m) => {
      const c = candidateAt(run.problem, m.x, m.f);
      return { ...candidateRecord(c), violation: m.violation, failing_checks: failing(c) };
    }),
    relax: relaxSuggestions(run, 'si').map((s) => ({ check: s.check, by: s.amount, suggestion: s.message })),
  };
}

function failing(c: Candidate): Record<string, number> {
  const out: Record<string, number> = {};
  CHECKS.forEach((name, i) => { if (c.checks[i] > 1e-9) out[name] = c.checks[i]; });
  return out;
}

const num = (v: number, kind: Kind, system: UnitSystem, digits = 4) => sig(inUnit(v, kind, system), digits);

/** The ranked-candidate columns, shared by the terminal table and the HTML report. */
export function candidateGrid(cands: Candidate[], system: UnitSystem): { header: string[]; rows: string[][] } {
  const u = (k: Kind) => unitSymbol(k, system);
  const header = [
    '#', 'material', `d ${u('length')}`, `D ${u('length')}`, `OD ${u('length')}`, `ID ${u('length')}`, 'Na', 'Nt', 'ends',
    `L0 ${u('length')}`, `Ls ${u('length')}`, `k ${u('rate')}`, `forces ${u('force')}`, `tau max ${u('stress')}`, 'SF static', 'SF fatigue', `mass ${u('mass')}`,
  ];
  const rows = cands.map((c, i) => {
    const a = c.analysis;
    const g = a.geometry;
    const tauMax = Math.max(...a.points.map((p) => p.stress));
    return [
      String(i + 1), c.item.choice.material.id, num(g.wireDiameter, 'length', system), num(g.meanDiameter, 'length', system),
      num(g.outerDiameter, 'length', system), num(g.innerDiameter, 'length', system), sig(g.activeCoils, 4), sig(g.totalCoils, 4), g.ends,
      num(g.freeLength, 'length', system), num(g.solidLength, 'length', system), num(a.rate, 'rate', system),
      a.points.map((p) => num(p.force, 'force', system, 3)).join(' / '), num(tauMax, 'stress', system),
      sig(a.staticSafetyFactor, 3), a.fatigue ? sig(a.fatigue.safetyFactor, 3) : '-', num(g.mass, 'mass', system, 3),
    ];
  });
  return { header, rows };
}

export function candidateTable(cands: Candidate[], system: UnitSystem): string {
  const { header, rows } = candidateGrid(cands, system);
  return table([header, ...rows]);
}

export function countsText(run: DesignRun, system: UnitSystem, showTiming = false): string {
  const r = run.result;
  const lines: string[] = [];
  lines.push(`Searched ${r.cells} combinations of material, wire, ends and coil count (${run.problem.stock.length} wire stock items) with the ${r.strategy} strategy: ${r.evaluations} candidate evaluations${showTiming ? ` in ${sig(run.searchMs, 3)} ms` : ''}.`);
  const skipped = run.req.bestPerWire ? 'could not beat the best found for its wire' : `could not enter the top ${run.req.top}`;
  lines.push(`Feasible combinations: ${r.feasibleCells}${r.prunedCells ? `; ${r.prunedCells} skipped because their lightest possible spring ${skipped}` : ''}.`);
  const cut = reportedChecks(run.req).filter((c) => r.cutBy[c] > 0).map((c) => [c, String(r.cutBy[c]), CHECK_LABELS[c as CheckName]]);
  if (cut.length) {
    lines.push('Combinations cut, by the check that failed worst:');
    lines.push(table(cut.sort((a, b) => Number(b[1]) - Number(a[1]))));
  }
  if (run.lp.status === 'bound' && run.lp.value !== null) {
    const kind: Kind = run.req.rank === 'mass' ? 'mass' : 'length';
    const bound = run.req.rank === 'mass' ? formatQuantity(run.lp.value, kind, system) : `${sig(inUnit(run.lp.value, 'length', system) * (system === 'us' ? 1 / (25.4 * 25.4) : 1), 4)} ${system === 'us' ? 'in^3' : 'mm^3'}`;
    lines.push(`LP lower bound on ${run.req.rank.replace('_', ' ')} (log-space relaxation): ${bound}${run.gap !== null ? `; the best spring is ${sig(run.gap * 100, 3)}% above it` : ''}.`);
  } else if (run.lp.status === 'infeasible') {
    lines.push('LP relaxation: infeasible. Even with continuous wire sizes and coil counts no spring meets the stress, rate, envelope and solid-length relations together.');
  }
  return lines.join('\n');
}

export function designText(run: DesignRun, system: UnitSystem, showTiming = false): string {
  const out: string[] = [];
  const req = run.req;
  out.push(`Spring design: ${formatQuantity(req.workingForce, 'force', system)} at ${formatQuantity(req.workingLength, 'length', system)}` +
    (req.operatingLength !== undefined ? `, stroke to ${formatQuantity(req.operatingLength, 'length', system)}${req.operatingForce !== undefined ? ` at ${formatQuantity(req.operatingForce, 'force', system)}` : ''}` : '') +
    `; ranked by ${req.rank.replace('_', ' ')}${req.bestPerWire ? ', the best spring of each material and wire size' : ''}`);
  out.push('');
  if (run.candidates.length) {
    out.push(candidateTable(run.candidates, system));
    out.push('');
    out.push(countsText(run, system, showTiming));
    const warn = rulesOfThumb(run.candidates[0].analysis, run.problem.service(), quantityWriter(system));
    if (warn.length) {
      out.push('');
      out.push('Notes on the best spring:');
      for (const w of warn) out.push(`  ! ${w.message}`);
    }
  } else {
    out.push(infeasibleText(run, system));
  }
  out.push('');
  out.push(cautionText());
  return out.join('\n') + '\n';
}

export function infeasibleText(run: DesignRun, system: UnitSystem): string {
  const out: string[] = [];
  out.push('No spring meets every requirement.');
  out.push('');
  out.push(countsText(run, system));
  const misses = run.result.nearestMisses.map((m) => candidateAt(run.problem, m.x, m.f));
  if (misses.length) {
    out.push('');
    out.push('Nearest misses (least total violation) and the checks they fail:');
    out.push(candidateTable(misses, system));
    misses.forEach((c, i) => {
      const f = Object.entries(failing(c)).map(([k, v]) => `${k} by ${sig(v * 100, 3)}%`).join(', ');
      out.push(`  #${i + 1} fails: ${f}`);
    });
  }
  const sugg = relaxSuggestions(run, system);
  out.push('');
  if (sugg.length) {
    out.push('What to relax (each alone admits at least one spring that was evaluated):');
    for (const s of sugg) out.push(`  - ${s.message}`);
  } else {
    out.push('No single limit, relaxed alone, admits a spring: several checks fail together. Consider another material, a wider coil range, or a larger envelope.');
  }
  return out.join('\n');
}

