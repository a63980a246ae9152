// `check` in the library: one given spring against a set of requirements. Takes the plain objects a
// spring file and a requirements file hold (units inside them as in the files) and returns exactly
// what `coilfront check --json` prints.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { isRecord } from '../units/fields.js';
import { readRequirements, type Requirements } from '../kinds/compression/requirements.js';
import { readSpringCase } from '../kinds/compression/springFile.js';
import { sanitize } from '../report/json.js';
import { workingBand, type WorkingBand } from './band.js';
import { givenFromCase } from './given.js';
import { judge, makeJudge, type Verdict } from './judge.js';
import { checkJson, checkText } from './report.js';
import { kindOf } from '../kinds/index.js';
import { InputError } from '../units/parse.js';
import { serviceNotes } from '../input/serviceNotes.js';
import { checkExtensionDocuments, extensionCheckJson, extensionCheckText, type ExtensionCheckOutcome } from './extension.js';
import type { UnitSystem } from '../units/systems.js';

export interface CheckOutcome {
  req: Requirements;
  band: WorkingBand;
  verdict: Verdict;
  notes: string[];
}

/** Whether a requirements document names its end types (otherwise the default does not restrict a given spring). */
export function endsStated(rawRequirements: unknown): boolean {
  return isRecord(rawRequirements) && rawRequirements.ends !== undefined && rawRequirements.ends !== null;
}

/** The kind both files are of (through the kind registry); a spring of one kind under requirements of another is refused by `kind`. */
export function givenKind(spring: unknown, requirements: unknown): string {
  const s = kindOf(spring).id;
  const r = kindOf(requirements).id;
  if (s !== r)
    throw new InputError(
      'kind',
      `the same kind in the spring file and the requirements file (the spring file is ${s}, the requirements ${r}; a missing kind means compression)`,
      s,
    );
  return s;
}

/** `check` of either kind: the compression verdict, or the extension one (src/check/extension.ts). */
export function checkAnyDocuments(
  spring: unknown,
  requirements: unknown,
  catalog: Catalog = loadCatalog(),
): (CheckOutcome & { kind: 'compression' }) | ExtensionCheckOutcome {
  if (givenKind(spring, requirements) === 'extension') return checkExtensionDocuments(spring, requirements, catalog);
  return { kind: 'compression', ...checkDocuments(spring, requirements, catalog) };
}

export function checkDocuments(spring: unknown, requirements: unknown, catalog: Catalog = loadCatalog()): CheckOutcome {
  const req = readRequirements(requirements, catalog);
  const c = readSpringCase(spring, catalog);
  const band = workingBand(req);
  const { spring: given, notes } = givenFromCase(c, spring, req);
  notes.push(...serviceNotes(req));
  const verdict = judge(given, makeJudge(req, band, endsStated(requirements)));
  return { req, band, verdict, notes };
}

export type AnyCheckOutcome = ReturnType<typeof checkAnyDocuments>;

/** The record `check --json` prints for an outcome of either kind (before sanitising). */
export function checkOutcomeJson(o: AnyCheckOutcome): Record<string, unknown> {
  return o.kind === 'extension' ? extensionCheckJson(o.verdict, o.band, o.notes) : checkJson(o.verdict, o.band, o.notes);
}

/** The text `check` prints for an outcome of either kind. */
export function checkOutcomeText(o: AnyCheckOutcome, system: UnitSystem): string {
  return o.kind === 'extension' ? extensionCheckText(o, system) : checkText(o.verdict, o.req, o.band, o.notes, system);
}

/** The JSON record of `check` (SI units; no NaN or Infinity: a figure that does not apply is null). */
export function check(spring: unknown, requirements: unknown, options: { catalog?: Catalog } = {}): Record<string, unknown> {
  return sanitize(checkOutcomeJson(checkAnyDocuments(spring, requirements, options.catalog))) as Record<string, unknown>;
}

export { workingBand, type WorkingBand } from './band.js';
export { judge, makeJudge, PASS_TOLERANCE, type Verdict, type CheckLine } from './judge.js';
export { checkExtensionDocuments, judgeExtension, type ExtensionCheckOutcome, type ExtensionVerdict } from './extension.js';
