import type { DesignRun } from '../../spring/design.js';
import type { UnitSystem } from '../../units/systems.js';
import type { Frontier, SweepRow } from '../../cli/searchCommands.js';

export function writeDesignReport(_path: string, _run: DesignRun, _system: UnitSystem, _force: boolean, _frontier?: Frontier, _sweep?: { name: string; rows: SweepRow[] }): void {
  throw new Error('HTML reports are not built yet');
}
