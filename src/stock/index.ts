// `stock` in the library: which rows of a stock table meet the requirements. Takes the plain object a
// requirements file holds and the table (CSV text, or its rows as plain objects keyed by column name)
// and returns exactly what `coilfront stock --json` prints.
import { loadCatalog } from '../catalogs/load.js';
import type { Catalog } from '../catalogs/types.js';
import { sanitize } from '../report/json.js';
import { stockJson } from './report.js';
import { runStock, type StockOptions } from './run.js';

export function stock(
  requirements: unknown,
  table: string | Record<string, unknown>[],
  options: StockOptions & { catalog?: Catalog } = {},
): Record<string, unknown> {
  const run = runStock(requirements, table, options.catalog ?? loadCatalog(), options);
  return sanitize(stockJson(run)) as Record<string, unknown>;
}

export { runStock, STOCK_RANK_KEYS, DEFAULT_RATE_DEVIATION, type StockOptions, type StockRun, type RowResult } from './run.js';
export { readStockTable, type StockRow, type BadRow } from './table.js';
