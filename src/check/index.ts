// `check` in the library: one given spring against a set of requirements. Takes the plain objects a
// spring file and a requirements file hold (units inside them as in the files) and returns exactly
// what `coilfront check --json` prints.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { isRecord } from '../input/fields.js';
import { readRequirements, type Requirements } from '../kinds/compression/requirements.js';
import { readSpringCase } from '../kinds/compression/springFile.js';
import { sanitize } from '../report/json.js';
import { workingBand, type WorkingBand } from './band.js';
import { givenFromCase } from './given.js';
import { judge, makeJudge, type Verdict } from './judge.js';
import { checkJson } from './report.js';

export interface CheckOutcome { req: Requirements; band: WorkingBand; verdict: Verdict; notes: string[] }

/** Whether a requirements document names its end types (otherwise the default does not restrict a given spring). */
export function endsStated(rawRequirements: unknown): boolean {
  return isRecord(rawRequirements) && rawRequirements.ends !== undefined && rawRequirements.ends !== null;
}

export function checkDocuments(spring: unknown, requirements: unknown, catalog: Catalog = loadCatalog()): CheckOutcome {
  const req = readRequirements(requirements, catalog);
  const c = readSpringCase(spring, catalog);
  const band = workingBand(req);
  const { spring: given, notes } = givenFromCase(c, spring, req);
  const verdict = judge(given, makeJudge(req, band, endsStated(requirements)));
  return { req, band, verdict, notes };
}

/** The JSON record of `check` (SI units; no NaN or Infinity: a figure that does not apply is null). */
export function check(spring: unknown, requirements: unknown, options: { catalog?: Catalog } = {}): Record<string, unknown> {
  const o = checkDocuments(spring, requirements, options.catalog);
  return sanitize(checkJson(o.verdict, o.band, o.notes)) as Record<string, unknown>;
}

export { workingBand, type WorkingBand } from './band.js';
export { judge, makeJudge, PASS_TOLERANCE, type Verdict, type CheckLine } from './judge.js';
