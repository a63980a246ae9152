// Notes on the requirement's service that change which checks run, for both kinds: a cycle count
// below the fatigue range is static service, and a life with a single working length is no load cycle.
import { STATIC_SERVICE_CYCLES } from '../model/fatigue.js';

/** What the requirement's service means for the checks, said once (a life with one length is no cycle). */
export function serviceNotes(req: { cycles?: number; operatingLength?: number }): string[] {
  if (req.cycles === undefined) return [];
  if (req.cycles < STATIC_SERVICE_CYCLES)
    return [`cycles ${req.cycles} is below ${STATIC_SERVICE_CYCLES.toExponential(0).replace('+', '')}: judged as static service (no fatigue check)`];
  if (req.operatingLength === undefined) return ['cycles given without operating_length: one working length is no load cycle (no fatigue check)'];
  return [];
}
