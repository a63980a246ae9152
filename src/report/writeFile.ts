// Writing an output file atomically (a temporary file beside it, then a rename), never replacing an
// existing file unless asked to.
import { existsSync, renameSync, unlinkSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../units/parse.js';

export function writeOutputFile(path: string, content: string, force: boolean, option: string): void {
  if (existsSync(path) && !force) throw new InputError(option, `a file that does not exist yet (${path} exists; add --force to replace it)`);
  if (!existsSync(dirname(path) || '.')) throw new InputError(option, `a path in an existing folder (${dirname(path)} not found)`);
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`);
  try {
    writeFileSync(tmp, content);
    renameSync(tmp, path);
  } catch (e) {
    if (existsSync(tmp)) unlinkSync(tmp);
    throw new InputError(option, `a writable path (${(e as NodeJS.ErrnoException).code ?? 'write failed'})`);
  }
}
