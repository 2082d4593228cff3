'use strict';
/**
 * The bundled `polewright` command line: dist-cli/polewright.cjs, one CommonJS file built by esbuild from
 * src/cli/main.ts, and dist-cli/inputs.json, the project files it was built from (plus package-lock.json).
 * `npm ci` builds it (the prepare script); bin/polewright.cjs rebuilds it first when any of those files is newer
 * than the bundle, so the command never runs stale code. See DEVELOPERS.md, "The command line".
 */
const fs = require('node:fs');
const path = require('node:path');

const ROOT = path.join(__dirname, '..');
const OUT = path.join(ROOT, 'dist-cli');
const BUNDLE = path.join(OUT, 'polewright.cjs');
const INPUTS = path.join(OUT, 'inputs.json');

/** True when the bundle exists and no file it was built from changed after it. */
function bundleIsFresh(root = ROOT) {
  const out = path.join(root, 'dist-cli');
  const built = fs.statSync(path.join(out, 'polewright.cjs'), { throwIfNoEntry: false });
  if (!built) return false;
  let inputs;
  try {
    inputs = JSON.parse(fs.readFileSync(path.join(out, 'inputs.json'), 'utf8'));
  } catch {
    return false;
  }
  for (const file of inputs) {
    const s = fs.statSync(path.join(root, file), { throwIfNoEntry: false });
    if (!s || s.mtimeMs > built.mtimeMs) return false;
  }
  return true;
}

/** Builds the bundle with esbuild (a dev dependency); writes through temporary files, then renames. */
function buildCli(root = ROOT) {
  const esbuild = require('esbuild');
  const out = path.join(root, 'dist-cli');
  fs.mkdirSync(out, { recursive: true });
  const result = esbuild.buildSync({
    stdin: {
      contents: "export { main } from './src/cli/main.ts';",
      resolveDir: root,
      loader: 'ts',
      sourcefile: 'cli-entry.ts',
    },
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    minifySyntax: true,
    minifyWhitespace: true,
    legalComments: 'none',
    metafile: true,
    write: false,
    logLevel: 'error',
  });
  const inputs = Object.keys(result.metafile.inputs)
    .filter((f) => !f.startsWith('node_modules/') && f !== 'cli-entry.ts')
    .concat(['package-lock.json', 'scripts/cli-bundle.cjs'])
    .sort();
  const tag = `${process.pid}.${Date.now()}`;
  const write = (file, data) => {
    fs.writeFileSync(`${file}.${tag}`, data);
    fs.renameSync(`${file}.${tag}`, file);
  };
  write(path.join(out, 'polewright.cjs'), result.outputFiles[0].contents);
  write(path.join(out, 'inputs.json'), JSON.stringify(inputs, null, 1) + '\n');
  return { bytes: result.outputFiles[0].contents.length, inputs: inputs.length };
}

module.exports = { ROOT, OUT, BUNDLE, INPUTS, bundleIsFresh, buildCli };

if (require.main === module) {
  const { bytes, inputs } = buildCli();
  console.log(`dist-cli/polewright.cjs: ${(bytes / 1024).toFixed(0)} kB from ${inputs} project files`);
}
