// Where a command writes: data to stdout, progress and diagnostics to stderr. Injected so that tests
// run commands in-process and read exactly what a user would see.
import { accessSync, constants, statSync, type Stats } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { InputError } from '../units/parse.js';
export interface Io {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** stderr is a terminal: progress bars are welcome. */
  interactive: boolean;
}

export const processIo: Io = {
  stdout: (t) => {
    process.stdout.write(t);
  },
  stderr: (t) => {
    process.stderr.write(t);
  },
  interactive: Boolean(process.stderr.isTTY),
};

/** Exit codes: 0 done, 1 nothing feasible, 2 bad input, 3 internal error. */
export const EXIT = { ok: 0, infeasible: 1, input: 2, internal: 3 } as const;

export class CliExit extends Error {
  constructor(
    readonly code: number,
    message = '',
  ) {
    super(message);
  }
}

/**
 * Check every output path of a command before anything is computed or written: a refused second file
 * must not leave the first one written. Each existing file needs --force; a folder is never replaced;
 * the folder must exist and be writable; two outputs (or an output and the input) must differ.
 */
export function checkOutputPaths(outputs: readonly { option: string; path?: string }[], force: boolean, inputs: readonly string[] = []): void {
  const claimed = new Map<string, string>();
  for (const i of inputs) claimed.set(resolve(i), 'the input file');
  for (const { option, path } of outputs) {
    if (path === undefined) continue;
    if (path.trim() === '') throw new InputError(option, 'a file name', path);
    const full = resolve(path);
    const other = claimed.get(full);
    if (other) throw new InputError(option, `a file other than ${other}`, path);
    claimed.set(full, option);
    let st: Stats | undefined;
    try {
      st = statSync(full);
    } catch {
      st = undefined;
    }
    if (st?.isDirectory()) throw new InputError(option, `a file name (${path} is a folder)`);
    if (st && !force) throw new InputError(option, `a file that does not exist yet (${path} exists; add --force to replace it)`);
    const dir = dirname(full);
    let dirStat: Stats | undefined;
    try {
      dirStat = statSync(dir);
    } catch {
      dirStat = undefined;
    }
    if (!dirStat?.isDirectory()) throw new InputError(option, `a path in an existing folder (${dirname(path)} not found)`);
    try {
      accessSync(dir, constants.W_OK);
    } catch {
      throw new InputError(option, `a path in a writable folder (${dirname(path)} is not writable)`);
    }
  }
}
