#!/usr/bin/env node
'use strict';
// The `polewright` command: runs the bundled command line (dist-cli/polewright.cjs, built by `npm ci`), after
// rebuilding it if a source changed since (scripts/cli-bundle.cjs). V8's compiled code for the bundle is kept
// beside it (dist-cli/polewright.v8cache), which makes start-up close to that of a bare `node`.
const fs = require('node:fs');
const path = require('node:path');
const vm = require('node:vm');
const Module = require('node:module');
const { BUNDLE, OUT, bundleIsFresh, buildCli } = require('../scripts/cli-bundle.cjs');

if (!bundleIsFresh()) {
  try {
    buildCli();
  } catch (e) {
    const missing = e && e.code === 'MODULE_NOT_FOUND';
    process.stderr.write(
      missing
        ? 'polewright: the bundled command line is missing or out of date, and esbuild (a dev dependency) is not installed to rebuild it: run npm ci.\n'
        : `polewright: could not rebuild the command line: ${e && e.message}\n`,
    );
    process.exit(1);
  }
}

const cacheFile = path.join(OUT, 'polewright.v8cache');
let cachedData;
try {
  cachedData = fs.readFileSync(cacheFile);
} catch {
  cachedData = undefined;
}
const script = new vm.Script(Module.wrap(fs.readFileSync(BUNDLE, 'utf8')), { filename: BUNDLE, cachedData });
const bundle = { exports: {} };
script.runInThisContext()(bundle.exports, require, bundle, BUNDLE, OUT);

bundle.exports
  .main(process.argv.slice(2), {
    stdout: (s) => process.stdout.write(s),
    stderr: (s) => process.stderr.write(s),
  })
  .then((code) => {
    process.exitCode = code;
    if (cachedData === undefined || script.cachedDataRejected) {
      // compiled after the run, so the cache holds the functions a command needs, not only the top level
      try {
        const tmp = `${cacheFile}.${process.pid}`;
        fs.writeFileSync(tmp, script.createCachedData());
        fs.renameSync(tmp, cacheFile);
      } catch {
        // a read-only checkout: run without the cache
      }
    }
  });
