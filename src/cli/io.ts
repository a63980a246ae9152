// Where a command writes: data to stdout, progress and diagnostics to stderr. Injected so that tests
// run commands in-process and read exactly what a user would see.
export interface Io {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** stderr is a terminal: progress bars are welcome. */
  interactive: boolean;
}

export const processIo: Io = {
  stdout: (t) => { process.stdout.write(t); },
  stderr: (t) => { process.stderr.write(t); },
  interactive: Boolean(process.stderr.isTTY),
};

/** Exit codes: 0 done, 1 nothing feasible, 2 bad input, 3 internal error. */
export const EXIT = { ok: 0, infeasible: 1, input: 2, internal: 3 } as const;

export class CliExit extends Error {
  constructor(readonly code: number, message = '') {
    super(message);
  }
}
