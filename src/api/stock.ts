// `stock` in the library: which springs of a stock table meet the requirements. Takes the plain object
// a requirements file holds and the table (CSV text, or its rows as plain objects keyed by column name)
// and returns exactly what `coilfront stock --json` prints (the function lives in src/stock/).
export { stock, STOCK_RANK_KEYS, type StockOptions } from '../stock/index.js';
export type { StockRankKey } from '../stock/run.js';
