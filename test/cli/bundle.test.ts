import { describe, it, expect } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, mkdirSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runCli } from '../helpers/cli.ts';

const require = createRequire(import.meta.url);
const { bundleIsFresh } = require('../../scripts/cli-bundle.cjs') as {
  bundleIsFresh: (root: string) => boolean;
};
const ROOT = fileURLToPath(new URL('../..', import.meta.url));

describe('the bundled command line', () => {
  it('is stale when a file it was built from is newer, missing, or the bundle itself is missing', () => {
    const root = mkdtempSync(join(tmpdir(), 'pw-bundle-'));
    try {
      mkdirSync(join(root, 'dist-cli'));
      mkdirSync(join(root, 'src'));
      const source = join(root, 'src', 'a.ts');
      const bundle = join(root, 'dist-cli', 'polewright.cjs');
      expect(bundleIsFresh(root)).toBe(false); // nothing built yet
      writeFileSync(source, 'export {}');
      writeFileSync(bundle, '');
      writeFileSync(join(root, 'dist-cli', 'inputs.json'), JSON.stringify(['src/a.ts']));
      utimesSync(source, 1000, 1000);
      utimesSync(bundle, 2000, 2000);
      expect(bundleIsFresh(root)).toBe(true);
      utimesSync(source, 3000, 3000); // edited after the build
      expect(bundleIsFresh(root)).toBe(false);
      utimesSync(source, 1000, 1000);
      writeFileSync(join(root, 'dist-cli', 'inputs.json'), JSON.stringify(['src/a.ts', 'src/gone.ts']));
      expect(bundleIsFresh(root)).toBe(false); // a source it was built from disappeared
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });

  it('prints exactly what the sources print', async () => {
    const argv = ['analyze', '--b', '1,0,-1', '--a', '1,-1.6,0.64', '--fs', '1000'];
    const ours = await runCli(argv);
    const out = execFileSync('node', ['bin/polewright.cjs', ...argv], { cwd: ROOT, encoding: 'utf8' });
    expect(out).toBe(ours.stdout);
    expect(out).toContain('stability');
  });
});
