/**
 * Whatever `polewright design` writes is a design the workbench and the other commands open: random designer
 * requests either fail with a usage error (exit 2, nothing written) or write a file that `analyze` reads and
 * `link` turns into a link that opens the same design bit for bit.
 */
import fc from 'fast-check';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readSharedFile } from '../../../src/share/designFile.ts';
import { decodeLink } from '../../../src/share/link/index.ts';
import { bitwiseDifference } from '../../share/arbitraries.ts';
import { runCli } from '../../helpers/cli.ts';

const num = fc.oneof(
  fc.double({ min: 0.01, max: 30_000, noNaN: true }).map((v) => String(v)),
  fc.constantFrom('0', '-5', '1e300', '48000', '2', '0.5'),
);

const request = fc.oneof(
  fc
    .record({
      fs: fc.constantFrom(2000, 48_000, 1e9),
      n: fc.integer({ min: 2, max: 2200 }),
      teeth: fc.constantFrom('notch', 'peak'),
    })
    .map(({ fs, n, teeth }) => [
      'comb',
      '--fs',
      String(fs),
      '--f0',
      String(fs / n),
      '--q',
      '30',
      '--teeth',
      teeth,
    ]),
  fc
    .record({ h: fc.integer({ min: 1, max: 70 }), f0: num })
    .map(({ h, f0 }) => [
      'harmonic-notch',
      '--fs',
      '48000',
      '--f0',
      f0,
      '--harmonics',
      Array.from({ length: h }, (_, i) => i + 1).join(','),
      '--bandwidth',
      '1',
    ]),
  fc
    .record({ fs: num, f0: num, bw: num })
    .map(({ fs, f0, bw }) => ['notch', '--fs', fs, '--f0', f0, '--bandwidth', bw]),
  fc
    .record({ order: fc.integer({ min: 1, max: 70 }), family: fc.constantFrom('butterworth', 'elliptic') })
    .map(({ order, family }) => [
      'bandpass',
      '--fs',
      '1000',
      '--family',
      family,
      '--order',
      String(order),
      '--edge',
      '100,200',
      '--ripple',
      '0.5',
      '--attenuation',
      '60',
    ]),
);

describe('polewright design only writes designs that reopen', () => {
  it('for random requests', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-design-'));
    try {
      await fc.assert(
        fc.asyncProperty(request, async (argv) => {
          const out = join(dir, 'd.json');
          rmSync(out, { force: true });
          const r = await runCli(['design', ...argv, '--out', out]);
          if (r.code !== 0) {
            expect(r.code, r.stderr).toBe(2);
            expect(existsSync(out), 'nothing is written on a refusal').toBe(false);
            return;
          }
          const text = readFileSync(out, 'utf8');
          const file = readSharedFile(text);
          if (!file.ok) throw new Error(`${argv.join(' ')}: ${file.message}`);
          const analyze = await runCli(['analyze', out, '--json']);
          expect(analyze.code, analyze.stderr).toBe(0);
          const link = await runCli(['link', out]);
          expect(link.code, link.stderr).toBe(0);
          const opened = decodeLink(link.stdout.trim());
          if (!opened.ok) throw new Error(opened.message);
          expect(bitwiseDifference(opened.value.design, file.value.design)).toBeNull();
        }),
        { seed: 18_002, numRuns: 60 },
      );
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 300_000);
});
