import { Option } from 'commander';

export const unitsOption = () => new Option('--units <system>', "units for the human-readable output (default: the input file's)").choices(['si', 'us']);
