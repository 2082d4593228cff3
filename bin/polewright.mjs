#!/usr/bin/env node
// Runs the TypeScript command line straight from source through tsx, so there is no build step to remember.
import { tsImport } from 'tsx/esm/api';

const { main } = await tsImport('../src/cli/main.ts', import.meta.url);
const code = await main(process.argv.slice(2), {
  stdout: (s) => process.stdout.write(s),
  stderr: (s) => process.stderr.write(s),
});
process.exitCode = code;
