// Reading a YAML or JSON input file into a plain object, with one clear message when it is malformed:
// the message names the file, the line, and (for a repeated or malformed value) the field by its path.
// Whatever the bytes, the outcome is a document or an InputError: never a hang, a crash or a guess.
import { readFileSync, statSync } from 'node:fs';
import { isMap, isScalar, isSeq, LineCounter, parseDocument, visit, type Document } from 'yaml';
import { InputError } from '../units/parse.js';

/** Input files are a page of settings; anything this large is the wrong file. */
export const MAX_INPUT_BYTES = 1 << 20;
/** Deeper than any requirements or spring file can be (they nest three levels). */
export const MAX_DEPTH = 32;

export function readInputFile(path: string): unknown {
  let bytes: Buffer;
  try {
    const st = statSync(path);
    if (st.isDirectory()) throw new InputError(path, 'a YAML or JSON file (this is a folder)');
    // To two decimals, never down to the limit itself: 1.05 MiB, not 1.0; a byte over reads 1.01 MiB.
    if (st.size > MAX_INPUT_BYTES)
      throw new InputError(
        path,
        `an input file of at most 1 MiB (this one is ${Math.max(1.01, Math.round((st.size / (1 << 20)) * 100) / 100).toFixed(2)} MiB)`,
      );
    bytes = readFileSync(path);
  } catch (e) {
    if (e instanceof InputError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    throw new InputError(path, code === 'ENOENT' ? 'an existing file (not found)' : `a readable file (${code ?? 'unreadable'})`);
  }
  return parseText(decodeText(bytes, path), path);
}

/** UTF-8 text from file bytes (a UTF-8 byte-order mark is dropped); anything else is refused by name. */
export function decodeText(bytes: Uint8Array, label: string): string {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw new InputError(label, 'UTF-8 text (this file is UTF-16: save it as UTF-8)');
  }
  const nul = bytes.indexOf(0);
  if (nul >= 0)
    throw new InputError(
      `${label} at line ${lineOfByte(bytes, nul)}`,
      'UTF-8 text (the file holds a NUL byte: binary data, or UTF-16 without a byte-order mark?)',
    );
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  } catch {
    let bad = 0;
    // Find the first byte the strict decoder chokes on, to give its line.
    for (let lo = 0, hi = bytes.length; lo < hi;) {
      const mid = (lo + hi) >> 1;
      try {
        new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, mid));
        lo = mid + 1;
        bad = mid;
      } catch {
        hi = mid;
      }
    }
    throw new InputError(`${label} at line ${lineOfByte(bytes, bad)}`, 'UTF-8 text (invalid UTF-8 bytes: save the file as UTF-8)');
  }
}

function lineOfByte(bytes: Uint8Array, at: number): number {
  let line = 1;
  for (let i = 0; i < at && i < bytes.length; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

export function parseText(text: string, label: string): unknown {
  if (text.length > MAX_INPUT_BYTES) throw new InputError(label, 'an input file of at most 1 MiB');
  const isJson = label.toLowerCase().endsWith('.json');
  let jsonValue: unknown;
  if (isJson) {
    try {
      jsonValue = JSON.parse(text);
    } catch (e) {
      // The YAML reader (YAML 1.2 reads JSON) usually finds the line; V8's own message has none.
      const lines = new LineCounter();
      let where = '';
      try {
        const doc = parseDocument(text, { prettyErrors: false, lineCounter: lines, logLevel: 'error' });
        if (doc.errors.length) where = ` at line ${lines.linePos(doc.errors[0].pos[0]).line}`;
      } catch {
        /* keep the message without a line */
      }
      const offset = jsonErrorOffset((e as Error).message, text);
      if (offset !== undefined) where = ` at line ${lineOfOffset(text, offset)}`;
      throw new InputError(`${label}${where}`, 'well-formed JSON', firstLine((e as Error).message));
    }
    if (jsonValue === null || typeof jsonValue !== 'object' || Array.isArray(jsonValue))
      throw new InputError(label, 'a mapping of fields ({ "key": value }) at the top of the file', jsonValue);
  }
  const lines = new LineCounter();
  let doc: Document;
  try {
    doc = parseDocument(text, { prettyErrors: false, uniqueKeys: true, lineCounter: lines, logLevel: 'error' });
  } catch (e) {
    if (/call stack/i.test((e as Error).message)) throw new InputError(label, `at most ${MAX_DEPTH} levels of nesting`);
    throw new InputError(label, `well-formed ${isJson ? 'JSON' : 'YAML or JSON'}`, firstLine((e as Error).message));
  }
  const lineAt = (offset: number) => lines.linePos(offset).line;
  const dup = doc.errors.find((e) => e.code === 'DUPLICATE_KEY');
  if (dup) {
    const field = duplicateField(doc);
    throw new InputError(`${label} at line ${lineAt(dup.pos[0])}`, `each field given once (${field ?? 'a field'} is repeated)`);
  }
  // A JSON file's syntax is JSON's: the YAML reader is only asked about repeated keys.
  if (doc.errors.some((e) => /call stack/i.test(e.message))) throw new InputError(label, `at most ${MAX_DEPTH} levels of nesting`);
  if (!isJson && doc.errors.length > 0) {
    const e = doc.errors[0];
    throw new InputError(`${label} at line ${lineAt(e.pos[0])}`, 'well-formed YAML or JSON', firstLine(e.message).replace(/ at line \d+, column \d+.*$/, ''));
  }
  try {
    checkTree(doc, label, lineAt);
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(label, `at most ${MAX_DEPTH} levels of nesting`);
  }
  if (isJson) return jsonValue;
  let value: unknown;
  try {
    value = doc.toJS({ maxAliasCount: 100 });
  } catch (e) {
    const msg = (e as Error).message;
    if (/excessive alias/i.test(msg)) throw new InputError(label, 'YAML whose aliases expand to a reasonable size (an alias bomb?)', firstLine(msg));
    throw new InputError(label, 'well-formed YAML or JSON', firstLine(msg));
  }
  if (value === null || value === undefined) throw new InputError(label, 'a mapping of fields (key: value); the file is empty');
  // A list or a lone value is no input file: said here, where the file's name is known.
  if (typeof value !== 'object' || Array.isArray(value)) throw new InputError(label, 'a mapping of fields (key: value) at the top of the file', value);
  return value;
}

function firstLine(message: string): string {
  return message.split('\n')[0];
}

/** Where V8's JSON.parse stopped: its message gives a position, or quotes the text around the token, or
 * says the input ended. */
function jsonErrorOffset(message: string, text: string): number | undefined {
  const at = /at position (\d+)/.exec(message);
  if (at) return Number(at[1]);
  if (/end of JSON input/.test(message)) return text.length;
  const quoted = /Unexpected token '(.)', (?:\.\.\.)?"([\s\S]*?)"(?:\.\.\.)? is not valid JSON/.exec(message);
  if (quoted) {
    const start = text.indexOf(quoted[2]);
    const inside = quoted[2].indexOf(quoted[1]);
    if (start >= 0 && inside >= 0) return start + inside;
  }
  return undefined;
}

function lineOfOffset(text: string, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < text.length; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** The dotted path of the first key that appears twice in one mapping. */
function duplicateField(doc: Document): string | undefined {
  let found: string | undefined;
  visit(doc, {
    Map(_, map, ancestors) {
      const seen = new Set<string>();
      for (const pair of map.items) {
        const key = String(isScalar(pair.key) ? pair.key.value : pair.key);
        if (seen.has(key)) {
          found = [...pathOf(ancestors), key].join('.');
          return visit.BREAK;
        }
        seen.add(key);
      }
      return undefined;
    },
  });
  return found;
}

/** Field path of a node from its ancestors: keys of mappings, [i] of lists. */
function pathOf(ancestors: readonly unknown[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < ancestors.length; i++) {
    const a = ancestors[i] as { key?: unknown; value?: unknown };
    const next = ancestors[i + 1];
    if (isSeq(a) && next !== undefined) {
      const idx = a.items.indexOf(next as never);
      if (idx >= 0 && out.length) out[out.length - 1] += `[${idx}]`;
    } else if (a && typeof a === 'object' && 'key' in a && 'value' in a && !isMap(a)) {
      out.push(String(isScalar(a.key) ? a.key.value : a.key));
    }
  }
  return out;
}

/** Depth, and numbers only in decimal: 0x10, 0o17 and 0b1 are read by YAML but are never what a spring file means. */
function checkTree(doc: Document, label: string, lineAt: (offset: number) => number): void {
  visit(doc, {
    Scalar(_, node, ancestors) {
      if (ancestors.length > 2 * MAX_DEPTH) {
        throw new InputError(`${label} at line ${lineAt(node.range?.[0] ?? 0)}`, `at most ${MAX_DEPTH} levels of nesting`);
      }
      if (typeof node.value === 'number' && (node.format === 'HEX' || node.format === 'OCT' || node.format === 'BIN')) {
        const field = pathOf(ancestors).join('.') || label;
        throw new InputError(`${field} (${label} line ${lineAt(node.range?.[0] ?? 0)})`, 'a decimal number (no hex, octal or binary)', node.source);
      }
      return undefined;
    },
    Alias(_, node) {
      if (!node.resolve(doc))
        throw new InputError(`${label} at line ${lineAt(node.range?.[0] ?? 0)}`, `an alias to an anchor set before it (no &${node.source} above)`);
      return undefined;
    },
    Collection(_, node, ancestors) {
      if (ancestors.length > 2 * MAX_DEPTH) {
        throw new InputError(`${label} at line ${lineAt(node.range?.[0] ?? 0)}`, `at most ${MAX_DEPTH} levels of nesting`);
      }
      return undefined;
    },
  });
}
