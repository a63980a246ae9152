#!/usr/bin/env node
// The `coilfront` command (package.json bin; scripts/build.mjs copies this file to
// dist/cli/coilfront.cjs). It runs the bundled CLI, coilfront-bundle.cjs beside it, with the V8 code
// cache the build recorded from a run of the demo, so that a start does not parse and compile the
// bundle again: about a quarter of what a run costs above a bare `node` (issue 10, bench/startup.ts).
// A cache made by another Node.js version or under other V8 flags is rejected by V8 itself and the
// bundle compiles as usual; the bundle also runs alone (`node coilfront-bundle.cjs ...`).
'use strict';
const { isAscii } = require('node:buffer');
const { readFileSync, writeFileSync } = require('node:fs');
const { createRequire } = require('node:module');
const { join } = require('node:path');
const { Script } = require('node:vm');

const bundle = join(__dirname, 'coilfront-bundle.cjs');
const cacheFile = `${bundle}.cache`;
let cachedData;
try {
  cachedData = readFileSync(cacheFile);
} catch {
  /* no cache: V8 compiles the bundle */
}
// Wrapped as Node wraps a CommonJS module, on the first line so that line numbers stay true.
// The build keeps the bundle to ASCII, which reads as Latin-1 without decoding (UTF-8 otherwise).
const bytes = readFileSync(bundle);
const source = bytes.toString(isAscii(bytes) ? 'latin1' : 'utf8');
const script = new Script(`(function (exports, require, module, __filename, __dirname) {${source}\n})`, { filename: bundle, cachedData });
if (process.env.COILFRONT_DEBUG)
  process.stderr.write(`coilfront: code cache ${cachedData === undefined ? 'absent' : script.cachedDataRejected ? 'rejected' : 'used'}\n`);
// The build runs the demo once with this set, then keeps what V8 compiled for the next starts.
if (process.env.COILFRONT_RECORD_CODE_CACHE) process.once('exit', () => writeFileSync(cacheFile, script.createCachedData()));
const module_ = { exports: {} };
script.runInThisContext()(module_.exports, createRequire(bundle), module_, bundle, __dirname);
