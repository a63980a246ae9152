// `check` in the library: one given spring against a set of requirements, every check with its margin.
// Takes the plain objects a spring file and a requirements file hold and returns exactly what
// `coilfront check --json` prints (the function lives with the checks, in src/check/).
export { check, checkDocuments, type CheckOutcome } from '../check/index.js';
