// coilfront as a library: the commands as functions. Each takes the plain object a YAML or JSON input
// file holds (quantities as numbers in the document's unit system, or strings with their unit such as
// "25 lbf") and options like the command's, and returns exactly what the command prints with --json
// (SI units; null where a figure does not apply). Bad input throws an InputError whose `field` is
// the path of the offending value and `expected` says what would do.
//
//   import { design } from 'coilfront';
//   const result = design({ working_force: '25 N', working_length: '18 mm', ... }, { top: 3 });
export { design, type DesignOptions } from './api/design.js';
export { analyze, type AnalyzeOptions } from './api/analyze.js';
export { frontier, FRONTIER_AXES, type FrontierOptions } from './api/frontier.js';
export { sweep, type SweepOptions, type SweepVary } from './api/sweep.js';
export { check } from './api/check.js';
export { stock, STOCK_RANK_KEYS, type StockOptions, type StockRankKey } from './api/stock.js';
export type { CatalogOption, SearchOptions, RankedOptions } from './api/options.js';
export type * from './api/types.js';
export { InputError } from './units/parse.js';
export { CatalogError, loadCatalog } from './catalogs/load.js';
export type { Catalog } from './catalogs/types.js';
export { RANK_KEYS, type RankKey } from './kinds/compression/requirements.js';
export type { StrategyChoice } from './kinds/compression/design.js';
export type { FrontierKey } from './kinds/compression/frontier.js';
