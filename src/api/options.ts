// What every library function takes beside its document: the options of the matching command, as
// plain values (no unit system for human output: results are the JSON records, always SI). An option
// that sets a requirement (seed, top, rank, perWire) is written into the document before it is read,
// as the command line does, so it meets the same checks; a bad one is blamed on `options.<name>`.
import type { Catalog } from '../catalogs/types.js';
import { blameOverride, withValue } from '../input/overrides.js';
import type { RankKey } from '../kinds/compression/requirements.js';
import type { StrategyChoice } from '../kinds/compression/design.js';

export interface CatalogOption {
  /** The materials and wire series to use (default: the catalogs shipped with the package). */
  catalog?: Catalog;
}

export interface SearchOptions extends CatalogOption {
  /** Search strategy (default 'auto': the grid when it is small enough, else the genetic search). */
  strategy?: StrategyChoice;
  /** Random seed of the genetic strategy (overrides the document's `seed`). */
  seed?: number | string;
  /** Called as the search advances (done of total). */
  onProgress?: (done: number, total: number) => void;
}

export interface RankedOptions extends SearchOptions {
  /** How many springs to list (overrides the document's `top`). */
  top?: number;
  /** The ranking objective (overrides the document's `rank`). */
  rank?: RankKey;
  /** The best spring of each material and wire size (overrides the document's `best_per_wire`). */
  perWire?: boolean;
}

/** A requirement set by an option: its path in the document and the option's name in messages. */
export interface Override {
  path: string[];
  option: string;
}

const REQUIREMENT_OPTIONS: readonly [keyof RankedOptions, string][] = [
  ['seed', 'seed'],
  ['top', 'top'],
  ['rank', 'rank'],
  ['perWire', 'best_per_wire'],
];

/** The document with the requirement options written in (a copy: the caller's object is never changed). */
export function withRequirementOptions(document: unknown, options: RankedOptions): { document: unknown; overrides: Override[] } {
  let doc = document;
  const overrides: Override[] = [];
  for (const [name, field] of REQUIREMENT_OPTIONS) {
    const value = options[name];
    if (value === undefined || (name === 'perWire' && value === false)) continue;
    doc = withValue(doc, [field], value);
    overrides.push({ path: [field], option: `options.${name}` });
  }
  return { document: doc, overrides };
}

/** Run read(), blaming a bad value that an option (or a command-line override) set on that option. */
export function blamed<T>(read: () => T, overrides: readonly Override[]): T {
  if (overrides.length === 0) return read();
  try {
    return read();
  } catch (e) {
    throw blameOverride(e, overrides);
  }
}
