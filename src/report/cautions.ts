// The cautions printed with every result: springs store energy and fail in fatigue. The same lines, in
// the same words, go to the text output, the --json output (`cautions`, an array of strings), the
// library's results and the HTML pages; each spring kind adds its own after the general ones
// (SpringKind.cautions: the extension kind's draw-bar / guard caution).

/** How the energy-storing state of a spring of each kind is named; a kind not listed reads "a loaded spring". */
const LOADED: Readonly<Record<string, string>> = {
  compression: 'a compressed spring',
  extension: 'a stretched spring',
};

/** The general cautions, worded for a spring kind (its id, `compression` by default). */
export function generalCautions(kind = 'compression'): string[] {
  const loaded = Object.hasOwn(LOADED, kind) ? LOADED[kind] : 'a loaded spring';
  return [
    'coilfront computes from published formulas and catalog data, some of it marked "from memory": verify material figures and tolerances with your spring supplier.',
    'Build and test prototypes under the real load cycle, temperature and environment before release.',
    `For safety-critical uses follow the applicable codes and standards and licensed engineering practice; ${loaded} stores energy and can release it violently.`,
  ];
}

/** The general cautions of a compression spring (the spec sheet and spring files of that kind). */
export const CAUTIONS: readonly string[] = Object.freeze(generalCautions('compression'));

/** A kind as the cautions see it: its id and its own cautions (SpringKind has both). */
export interface CautionKind {
  readonly id: string;
  readonly cautions: readonly string[];
}

const COMPRESSION: CautionKind = { id: 'compression', cautions: [] };

/** Every caution of a kind, general ones first: what `cautions` holds in every JSON output. */
export function cautionsOf(kind: CautionKind = COMPRESSION): string[] {
  return [...generalCautions(kind.id), ...kind.cautions];
}

/** The cautions as the text outputs end with them. */
export function cautionText(kind: CautionKind = COMPRESSION): string {
  return ['Cautions:', ...cautionsOf(kind).map((c) => `  - ${c}`)].join('\n');
}

/** A JSON record with the cautions of its kind as its last field. */
export function withCautions<T extends object>(record: T, kind: CautionKind = COMPRESSION): T & { cautions: string[] } {
  return { ...record, cautions: cautionsOf(kind) };
}
