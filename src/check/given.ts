// A given spring (an existing part, a stock row, an exported design) put under a set of requirements.
// The spring file says what the spring is: material, geometry, ends, and the processes it went through
// (peened, set removed). The requirements say how it is used: lengths, cycles, seating, temperature,
// criteria. Where a spring file also states a service condition, the requirement's governs and a note
// says so when the two differ.
import type { SpringCase } from '../kinds/compression/springFile.js';
import type { Requirements } from '../kinds/compression/requirements.js';
import { materialFigures, type MaterialChoice } from '../input/material.js';
import type { MaterialFigures, ServiceConditions, SpringGeometry } from '../kinds/compression/analysis.js';
import { springServiceConditions } from '../kinds/compression/problem.js';
import { isRecord } from '../units/fields.js';

export interface GivenSpring {
  choice: MaterialChoice;
  geometry: SpringGeometry;
  figures: MaterialFigures;
  peened: boolean;
  setRemoved: boolean;
}

/** The service conditions of a given spring: the requirement's, with the spring's own peening. */
export function givenService(req: Requirements, spring: GivenSpring): ServiceConditions {
  return { ...springServiceConditions(req), peened: spring.peened };
}

const same = (a: unknown, b: unknown): boolean => {
  if (typeof a === 'number' && typeof b === 'number') return a === b || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => same(v, b[i]));
  return a === b;
};

/** Spring-file fields that are service conditions, and where the parsed value sits. */
const SERVICE_FIELDS: [string, (s: ServiceConditions) => unknown][] = [
  ['lengths', (s) => s.lengths],
  ['forces', (s) => s.lengths],
  ['cycles', (s) => s.cycles],
  ['seating', (s) => s.seating],
  ['temperature', (s) => s.temperature],
  ['forcing_frequency', (s) => s.forcingFrequency],
  ['fatigue_criterion', (s) => s.criterion],
  ['stress_factor', (s) => s.correction],
  ['direct_shear_rate', (s) => s.directShear],
  ['clash_allowance', (s) => s.clashAllowance],
  ['coil_gap_rule', (s) => s.gapRule],
  ['surge_margin', (s) => s.surgeMargin],
];

/** The spring of a parsed spring file, with the processes the file states (else the requirement's). */
export function givenFromCase(c: SpringCase, raw: unknown, req: Requirements): { spring: GivenSpring; notes: string[] } {
  const doc = isRecord(raw) ? raw : {};
  const stated = (key: string) => doc[key] !== undefined && doc[key] !== null;
  const setRemoved = stated('set_removed') ? c.setRemoved : req.setRemoved;
  const peened = stated('peened') ? c.service.peened : req.peened;
  const figures = setRemoved === c.setRemoved ? c.figures : materialFigures(c.materialChoice, c.geometry.wireDiameter, setRemoved);
  const spring: GivenSpring = { choice: c.materialChoice, geometry: c.geometry, figures, peened, setRemoved };
  const notes = [...c.notes.filter((n) => !/judged as static service/.test(n))];
  const service = givenService(req, spring);
  const differ = SERVICE_FIELDS.filter(([key, get]) => stated(key) && !same(get(c.service), get(service))).map(([key]) => key);
  if (differ.length)
    notes.push(
      `the spring file's ${differ.join(', ')} differ${differ.length === 1 ? 's' : ''} from the requirement's: the requirement's service conditions are used`,
    );
  return { spring, notes };
}
