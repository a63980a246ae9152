#!/usr/bin/env node
import { run } from './run.js';
import { processIo } from './io.js';

run(process.argv.slice(2), processIo).then((code) => {
  process.exitCode = code;
});
