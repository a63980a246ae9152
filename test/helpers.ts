// No outside values here (helpers only; each test file names the sources of its checks).
// Shared test helpers: run the CLI in-process and capture what a user would see.
import fc from 'fast-check';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { run } from '../src/cli/run.js';

export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
}

export async function cli(...args: string[]): Promise<CliResult> {
  let stdout = '';
  let stderr = '';
  const code = await run(args, {
    stdout: (t) => {
      stdout += t;
    },
    stderr: (t) => {
      stderr += t;
    },
    interactive: false,
  });
  return { code, stdout, stderr };
}

const dir = mkdtempSync(join(tmpdir(), 'coilfront-test-'));
let n = 0;

/** Write a temporary input file and return its path. */
export function inputFile(text: string, ext = 'yaml'): string {
  const path = join(dir, `input-${++n}.${ext}`);
  writeFileSync(path, text);
  return path;
}

export function tempPath(name: string): string {
  return join(dir, `${++n}-${name}`);
}

export const relClose = (actual: number, expected: number, rel: number): boolean => Math.abs(actual - expected) <= rel * Math.abs(expected);

/** A space of compression requirements for property tests (scenarios of our own making): a working
 * force at a working length, a stroke to an operating length (with an operating force when the rate is
 * fixed), a bore, and the choices drawn from; each test keeps its own ranges. */
export interface RequirementSpace {
  force: [number, number];
  length: [number, number];
  /** The stroke as a share of the working length. */
  stroke: [number, number];
  /** The operating force as a multiple of the working force. */
  forceRise: [number, number];
  od: [number, number];
  materials: string[];
  ends: string[];
  seatings: string[];
  cycles: (number | string | undefined)[];
  tolerances: number[];
  /** Draw peened and guided too (else they stay at their defaults). */
  peenedAndGuided: boolean;
  /** max_free_length as a multiple of the working length. */
  freeLengthFactor: number;
  coilStep: number;
  top: number;
}

/** The drawn case (its figures, for tests that build on them) and the requirements document it stands for. */
export function requirementSpace(space: RequirementSpace) {
  const range = ([min, max]: [number, number]) => fc.double({ min, max, noNaN: true });
  const arb = fc.record({
    force: range(space.force),
    length: range(space.length),
    stroke: range(space.stroke),
    rateFixed: fc.boolean(),
    forceRise: range(space.forceRise),
    od: range(space.od),
    material: fc.constantFrom(...space.materials),
    ends: fc.constantFrom(...space.ends),
    seating: fc.constantFrom(...space.seatings),
    cycles: fc.constantFrom(...space.cycles),
    peened: space.peenedAndGuided ? fc.boolean() : fc.constant(undefined),
    solidSafe: fc.boolean(),
    tolerance: fc.constantFrom(...space.tolerances),
    guided: space.peenedAndGuided ? fc.boolean() : fc.constant(undefined),
  });
  type Case = typeof arb extends fc.Arbitrary<infer T> ? T : never;
  const doc = (r: Case): Record<string, unknown> => {
    const out: Record<string, unknown> = {
      units: 'si',
      material: r.material,
      ends: r.ends,
      seating: r.seating,
      load: { force: r.force, length: r.length },
      operating_length: r.length * (1 - r.stroke),
      envelope: { max_outer_diameter: r.od, max_free_length: r.length * space.freeLengthFactor },
      ...(r.peened !== undefined ? { peened: r.peened } : {}),
      solid_safe: r.solidSafe,
      ...(r.guided !== undefined ? { guided: r.guided } : {}),
      load_tolerance: r.tolerance,
      coil_step: space.coilStep,
      top: space.top,
    };
    if (r.rateFixed) out.operating_force = r.force * r.forceRise;
    if (r.cycles !== undefined) out.cycles = r.cycles;
    return out;
  };
  return { arb, doc };
}
