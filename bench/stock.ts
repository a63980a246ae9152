// Stock-table throughput: how many rows per second `stock` reads and checks. The table is generated
// here from a seed (an invented range over five materials, sizes and lengths, for this benchmark only);
// the requirement is the stock demo's.
import seedrandom from 'seedrandom';
import { loadCatalog } from '../src/catalogs/load.js';
import { readInputFile } from '../src/input/document.js';
import { readRequirements } from '../src/kinds/compression/requirements.js';
import { analyzeSpring } from '../src/kinds/compression/analysis.js';
import { checkAnalysis } from '../src/kinds/compression/verify.js';
import { springServiceConditions } from '../src/kinds/compression/problem.js';
import { readMaterialMap } from '../src/stock/materialMap.js';
import { runCompressionStock as runStock } from '../src/stock/run.js';
import { readStockTable } from '../src/stock/table.js';

const REQUIREMENTS = 'examples/stock-dispenser.yaml';

/** An invented stock table of n rows, the same for the same seed. */
export function benchTable(n: number, seed = 'stock-bench'): string {
  const rng = seedrandom(seed);
  const pick = <T>(xs: T[]): T => xs[Math.floor(rng() * xs.length)];
  const materials: [string, number][] = [
    ['302 SS', 69000],
    ['17-7 PH', 75800],
    ['Music wire', 81700],
    ['Chrome silicon', 77200],
    ['Phos bronze', 41400],
  ];
  const wires = [0.5, 0.6, 0.8, 0.9, 1, 1.2, 1.5, 1.6, 2, 2.5, 3];
  const lines = ['part_number,material,wire_diameter_mm,outer_diameter_mm,free_length_mm,total_coils,ends,rate_N_per_mm,price'];
  for (let i = 0; i < n; i++) {
    const [word, G] = pick(materials);
    const d = word === 'Chrome silicon' ? pick([1.6, 2, 2.5, 3]) : pick(wires);
    const od = Number((d * (4 + 1 + rng() * 10)).toFixed(1));
    const L0 = Number((10 + rng() * 110).toFixed(1));
    const Nt = Math.max(4, (Math.round((2 * 0.45 * L0) / d) / 2) * (0.6 + 0.4 * rng()));
    const Na = Math.round(Nt * 2) / 2 - 2;
    const ends = pick(['closed & ground', 'closed & ground', 'closed', 'open']);
    const D = od - d;
    const rate = (G * d ** 4) / (8 * D ** 3 * Math.max(Na, 1));
    lines.push(`B-${i + 1},${word},${d},${od},${L0},${Math.round(Nt * 2) / 2},${ends},${rate.toPrecision(3)},${(0.3 + rng() * 3).toFixed(2)}`);
  }
  return lines.join('\n') + '\n';
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Median wall and CPU milliseconds (CPU: this process's user + system time, which a busy shared
 * machine inflates less than the wall clock). */
function time(fn: () => void, reps: number): { wall: number; cpu: number } {
  fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < reps; i++) {
    const c0 = process.cpuUsage();
    const t = performance.now();
    fn();
    wall.push(performance.now() - t);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

/** The benchmark's section of bench/results.md. */
export function stockBenchLines(rows = 10_000): string[] {
  const catalog = loadCatalog();
  const raw = readInputFile(REQUIREMENTS);
  const text = benchTable(rows);
  const map = readMaterialMap(raw, catalog);
  const parseMs = time(() => readStockTable(text, { system: 'si', materialMap: map, catalog, label: 'bench' }), 7);
  let passing = 0;
  let bad = 0;
  const total = time(() => {
    const run = runStock(raw, text, catalog, { label: 'bench' });
    passing = run.passing.length;
    bad = run.bad.length;
  }, 7);
  // The floor: the single-spring analysis and the design checks alone, on the same rows' springs.
  const req = readRequirements(raw, catalog);
  const service = springServiceConditions(req);
  const springs = runStock(raw, text, catalog, { label: 'bench' }).results.map((r) => r.verdict.spring);
  let sink = 0;
  const floor = time(() => {
    for (const s of springs) sink += checkAnalysis(analyzeSpring(s.geometry, s.figures, service), req)[0];
  }, 7);
  if (sink === 42) process.stderr.write('');
  const fmt = (v: number) => Math.round(v).toLocaleString('en-US');
  const perSecond = (ms: number) => fmt(rows / (ms / 1000));
  return [
    '## Stock tables',
    `- \`stock\` on a generated table of ${fmt(rows)} rows (invented for the benchmark, seeded) against ${REQUIREMENTS}, median of 7 after a warm-up: **${perSecond(total.wall)} rows per second** by the wall clock (${fmt(total.wall)} ms), ${perSecond(total.cpu)} by CPU time (${fmt(total.cpu)} ms). Reading the CSV into rows: ${fmt(parseMs.wall)} ms wall, ${fmt(parseMs.cpu)} ms CPU. The single-spring analysis and design checks alone on the same ${fmt(springs.length)} springs: ${fmt(floor.wall)} ms wall, ${fmt(floor.cpu)} ms CPU, so the whole command costs **${(total.cpu / floor.cpu).toFixed(1)} times the bare analysis** (CPU, same run). ${passing} rows pass; ${bad} are refused as bad rows (coils overlapping at free length). Target: 10,000 rows well under a second.`,
    '',
  ];
}

if (process.argv[1]?.endsWith('stock.js')) for (const l of stockBenchLines()) process.stderr.write(l + '\n');
