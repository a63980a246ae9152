// No outside values here (helpers only; each test file names the sources of its checks).
// Shared test helpers: run the CLI in-process and capture what a user would see.
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
