// Reading a YAML or JSON input file into a plain object, with one clear message when it is malformed.
import { readFileSync } from 'node:fs';
import { parseDocument } from 'yaml';
import { InputError } from '../units/parse.js';

export function readInputFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new InputError(path, code === 'ENOENT' ? 'an existing file (not found)' : `a readable file (${code ?? 'unreadable'})`);
  }
  return parseText(text, path);
}

export function parseText(text: string, label: string): unknown {
  if (label.toLowerCase().endsWith('.json')) {
    try {
      return JSON.parse(text);
    } catch (e) {
      throw new InputError(label, 'well-formed YAML or JSON', (e as Error).message);
    }
  }
  // YAML 1.2 is a superset of JSON, so one parser reads both.
  const doc = parseDocument(text, { prettyErrors: false, uniqueKeys: true });
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    const where = e.linePos?.[0] ? ` at line ${e.linePos[0].line}, column ${e.linePos[0].col}` : '';
    const what = /Map keys must be unique/.test(e.message) ? 'each field given once (a field is repeated)' : 'well-formed YAML or JSON';
    throw new InputError(`${label}${where}`, what, e.message.split('\n')[0].replace(/ at line \d+, column \d+.*$/, ''));
  }
  return doc.toJS();
}
