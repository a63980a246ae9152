import { Option } from 'commander';

/** --units; `byDefault` says what the output is in without it (a command with no input file: si). */
export const unitsOption = (byDefault = "the input file's") =>
  new Option('--units <system>', `units for the human-readable output (default: ${byDefault})`).choices(['si', 'us']);
