// The registry of spring kinds: the `kind` field of a spring or requirements document picks one
// (absent: compression, so every file written before there were kinds keeps working). Adding a kind
// is its folder plus one line here.
import { InputError } from '../units/parse.js';
import { compression } from './compression/index.js';
import { extension } from './extension/index.js';
import type { AnySpringKind } from './kind.js';

export const KINDS: readonly AnySpringKind[] = [compression, extension];

export const DEFAULT_KIND = 'compression';

export function kindById(id: string): AnySpringKind | undefined {
  return KINDS.find((k) => k.id === id);
}

/** The kind a raw document asks for; a bad `kind` value is refused naming the field. */
export function kindOf(raw: unknown): AnySpringKind {
  const given =
    typeof raw === 'object' && raw !== null && !Array.isArray(raw) && Object.hasOwn(raw, 'kind') ? (raw as Record<string, unknown>).kind : undefined;
  const id = given ?? DEFAULT_KIND;
  const kind = typeof id === 'string' ? kindById(id) : undefined;
  if (!kind) throw new InputError('kind', `one of ${KINDS.map((k) => k.id).join(' | ')} (default ${DEFAULT_KIND})`, given);
  return kind;
}
