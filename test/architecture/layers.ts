// source: none needed (no outside values here): the layers of src/ that test/architecture/ enforces and the docs show.
//
// Layers, lowest first (a unit may import its own layer or any lower one):
//   0 units                 quantities, unit systems, and the field reader of input documents
//   1 model, search         shared wire mechanics; the search engine (knows nothing of springs)
//   2 catalogs              materials and wire series, validated
//   3 input                 reading documents, materials, overrides, the defaults every kind shares
//   4 report                the rendering every kind shares: text tables, JSON and CSV helpers, the
//                           cautions, output files, the HTML page, SVG axes and the generic plots
//   5 kinds, kinds/<kind>   the spring-kind seam and one folder per kind, each with its own reports,
//                           drawing and (compression) tolerance model: kinds/compression/tolerance/
//                           holds the made-spring scatter and yield of compression springs
//   6 check, stock          one given spring or a stock table against requirements
//   7 api, . (src/index.ts) the library API and the package's entry, which re-exports it
//   8 cli                   the command line, thin over the rest
export const LAYER: Record<string, number> = {
  units: 0,
  model: 1,
  search: 1,
  catalogs: 2,
  input: 3,
  report: 4,
  kinds: 5,
  check: 6,
  stock: 6,
  api: 7,
  '.': 7,
  cli: 8,
};
