/**
 * Every input a careless or hostile user tried, one row each: what the command line must answer (exit 0, or
 * 2 with a message saying what was wrong), and what must be true of the files afterwards (nothing written on
 * a refusal, nothing overwritten by a failed run, the input never destroyed). "internal error" appears in
 * none of them: it is only for bugs.
 */
import {
  existsSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  symlinkSync,
  linkSync,
  truncateSync,
  writeFileSync,
  statSync,
  readdirSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeWav } from '../../src/core/signal/index.ts';
import { runCli } from '../helpers/cli.ts';

const dir = mkdtempSync(join(tmpdir(), 'pw-hostile-'));
const path = (name: string) => join(dir, name);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const list = (n: number, f: (i: number) => number) =>
  Array.from({ length: n }, (_, i) => String(f(i))).join(',');

/** A WAV recording of n 16-bit samples at 48 kHz. */
function wav(n: number): Uint8Array {
  const x = Float64Array.from({ length: n }, (_, i) => 0.5 * Math.sin(i / 7));
  return writeWav({ format: 'i16', sampleRate: 48_000, channels: [x] }).bytes;
}

interface Row {
  name: string;
  /** Files to make before the run (relative names in the test's folder). */
  setup?: () => void;
  argv: () => string[];
  code: 0 | 2 | 3;
  /** What stderr must say (for a refusal: the reason). */
  says?: RegExp;
  /** What must hold afterwards. */
  then?: () => void | Promise<void>;
}

const noTemporaryFiles = () => expect(readdirSync(dir).filter((f) => f.includes('.part'))).toEqual([]);

const ROWS: Row[] = [
  {
    name: 'design comb at 48 kHz with 50 Hz spacing (order 960, 961 mask regions) writes a file analyze reads',
    argv: () => [
      'design',
      'comb',
      '--fs',
      '48000',
      '--f0',
      '50',
      '--q',
      '30',
      '--teeth',
      'notch',
      '--out',
      path('c.json'),
    ],
    code: 0,
    then: async () => {
      const r = await runCli(['analyze', path('c.json')]);
      expect(r.code, r.stderr).toBe(0);
    },
  },
  {
    name: 'design comb of order 2000 is refused, naming the least spacing, and writes nothing',
    argv: () => ['design', 'comb', '--fs', '2000', '--f0', '1', '--q', '30', '--out', path('c2000.json')],
    code: 2,
    says: /order 2000.*at most 1024.*1\.953125 Hz or more/,
    then: () => expect(existsSync(path('c2000.json'))).toBe(false),
  },
  {
    name: 'link --b with 66 values (an FIR whose origin pole has multiplicity 65)',
    argv: () => ['link', '--b', list(66, () => 0.01)],
    code: 0,
  },
  {
    name: 'link --b with 1026 values (order 1025) is refused at the 1026th value',
    argv: () => ['link', '--b', list(1026, () => 0.01)],
    code: 2,
    says: /the list b has 1026 values.*at most 1025/,
  },
  {
    name: 'analyze --b with 60 000 coefficients is refused at once',
    argv: () => ['analyze', '--b', list(60_000, () => 0)],
    code: 2,
    says: /at most 1025 values|characters long/,
  },
  {
    name: 'analyze of 1025 coefficients (order 1024) works',
    argv: () => ['analyze', '--b', list(1025, (i) => Math.sin(i) / 10), '--json'],
    code: 0,
  },
  {
    // It works, and says that 16-bit codes cannot hold it: most sections' numerators round to 0.
    // an FIR exports as its taps (core/export/firC.ts): 1025 taps fit Q0.15 and 37 accumulator bits hold
    // any input (Σ|taps|·2^15 < 2^36), so nothing to warn about
    name: 'export of an order-1024 FIR works, as its 1025 taps',
    argv: () => ['export', '--b', list(1025, (i) => Math.cos(i * 1.3) / 20), '--out', path('fir.h')],
    code: 0,
    says: /FIR of 1025 taps/,
    then: () => expect(readFileSync(path('fir.h'), 'utf8')).toMatch(/#define PW_FILTER_TAPS 1025\n/),
  },
  {
    name: '--eq of degree 4096 is refused before any work',
    argv: () => ['analyze', '--eq', 'y[n] = x[n] + 0.5 y[n-4096]'],
    code: 2,
    says: /offset up to 1024/,
  },
  {
    name: 'a 200 MB design file is refused before it is read',
    setup: () => {
      writeFileSync(path('big.json'), '');
      truncateSync(path('big.json'), 200e6);
    },
    argv: () => ['analyze', path('big.json')],
    code: 2,
    says: /200\.0 MB; a design file is at most/,
  },
  {
    name: 'simulate --input-rate 0 is refused (it printed NaN)',
    setup: () => writeFileSync(path('x.csv'), '0.5\n0.25\n1\n'),
    argv: () => ['simulate', '--b', '1,1', '--input', path('x.csv'), '--input-rate', '0'],
    code: 2,
    says: /--input-rate must be a rate above 0/,
  },
  {
    name: 'simulate --input-rate -5 is refused',
    argv: () => ['simulate', '--b', '1,1', '--input', 'impulse', '--input-rate', '-5', '--samples', '4'],
    code: 2,
    says: /--input-rate must be a rate above 0/,
  },
  {
    name: 'a CSV with a 1e-12 s step streamed to WAV is refused (no WAV rate) and leaves no file',
    setup: () =>
      writeFileSync(
        path('tiny.csv'),
        'time,value\n' + Array.from({ length: 50 }, (_, i) => `${i * 1e-12},${(i % 5) / 10}`).join('\n'),
      ),
    argv: () => ['simulate', '--b', '1,1', '--input', path('tiny.csv'), '--output', path('tiny.wav')],
    code: 2,
    says: /a WAV file stores a sample rate of 1 to 4294967295/,
    then: () => {
      expect(existsSync(path('tiny.wav'))).toBe(false);
      noTemporaryFiles();
    },
  },
  {
    name: 'link --fs 1e300 is refused (sample rate beyond 1 GHz)',
    argv: () => ['link', '--b', '1', '--fs', '1e300'],
    code: 2,
    says: /sampleRate.*at most 1000000000 Hz/,
  },
  {
    name: '--fs 0x10 is not read as 16 Hz',
    argv: () => ['analyze', '--b', '1', '--fs', '0x10'],
    code: 2,
    says: /--fs must be a number; got "0x10"/,
  },
  {
    name: 'a design file in UTF-8 with a byte-order mark opens',
    setup: () => writeFileSync(path('bom.json'), '\ufeff' + readFileSync(path('c.json'), 'utf8')),
    argv: () => ['analyze', path('bom.json')],
    code: 0,
  },
  {
    name: 'a design file in UTF-16 (little-endian, with a mark) opens',
    setup: () =>
      writeFileSync(
        path('u16.json'),
        Buffer.from('\ufeff' + readFileSync(path('c.json'), 'utf8'), 'utf16le'),
      ),
    argv: () => ['analyze', path('u16.json')],
    code: 0,
  },
  {
    name: 'a second "poles" key is refused with its line and column',
    setup: () => {
      const text = readFileSync(path('c.json'), 'utf8');
      writeFileSync(path('dup.json'), text.replace('"poles":', '"poles": [],\n  "poles":'));
    },
    argv: () => ['analyze', path('dup.json')],
    code: 2,
    says: /the key "poles" is given twice in one object, at line \d+, column 3 \(first at line \d+/,
  },
  {
    name: 'simulate --output keeps a good result when a later run fails on a truncated input',
    setup: () => {
      writeFileSync(path('good.wav'), wav(4000));
      writeFileSync(path('cut.wav'), wav(4000).subarray(0, 1001));
    },
    argv: () => ['simulate', '--b', '1,1', '--input', path('cut.wav'), '--output', path('result.wav')],
    code: 2,
    says: /cut\.wav/,
    then: () => {
      expect(readFileSync(path('result.wav')).equals(readFileSync(path('kept.wav')))).toBe(true);
      noTemporaryFiles();
    },
  },
  {
    name: 'an output that is a symbolic link to the input is refused and the input stays',
    setup: () => symlinkSync(path('good.wav'), path('alias.wav')),
    argv: () => ['simulate', '--b', '1,1', '--input', path('good.wav'), '--output', path('alias.wav')],
    code: 2,
    says: /same file as the input/,
    then: () => expect(readFileSync(path('good.wav')).equals(Buffer.from(wav(4000)))).toBe(true),
  },
  {
    name: 'simulate --fixed keeps a good result when a later run fails on a truncated input',
    setup: () => writeFileSync(path('fixed-kept.csv'), 'a good result\n'),
    argv: () => [
      'simulate',
      '--fixed',
      '--b',
      '0.5,0.5',
      '--input',
      path('cut.wav'),
      '--output',
      path('fixed-kept.csv'),
    ],
    code: 2,
    says: /cut\.wav/,
    then: () => {
      expect(readFileSync(path('fixed-kept.csv'), 'utf8')).toBe('a good result\n');
      noTemporaryFiles();
    },
  },
  {
    name: 'simulate --fixed refuses an output that is a link to its input',
    argv: () => [
      'simulate',
      '--fixed',
      '--b',
      '0.5,0.5',
      '--input',
      path('good.wav'),
      '--output',
      path('alias.wav'),
    ],
    code: 2,
    says: /same file as the input/,
  },
  {
    name: 'simulate --fixed --input-rate 0 is refused',
    argv: () => ['simulate', '--fixed', '--b', '0.5,0.5', '--input', path('x.csv'), '--input-rate', '0'],
    code: 2,
    says: /--input-rate must be a rate above 0/,
  },
  {
    name: 'spectrum --input-rate -5 is refused',
    argv: () => ['spectrum', path('x.csv'), '--input-rate', '-5'],
    code: 2,
    says: /--input-rate must be a rate above 0/,
  },
  {
    name: 'an output that is a hard link to the input is refused',
    setup: () => linkSync(path('good.wav'), path('hard.wav')),
    argv: () => ['simulate', '--b', '1,1', '--input', path('good.wav'), '--output', path('hard.wav')],
    code: 2,
    says: /same file as the input/,
  },
  {
    name: 'export over its own design file is refused',
    argv: () => ['export', path('c.json'), '--format', 'json', '--out', path('c.json')],
    code: 2,
    says: /same file as the input/,
    then: async () => expect((await runCli(['analyze', path('c.json')])).code).toBe(0),
  },
  {
    name: 'an output that is a folder is refused',
    argv: () => ['design', 'notch', '--fs', '1000', '--f0', '50', '--q', '10', '--out', dir],
    code: 2,
    says: /is a folder/,
  },
];

describe('the command line on hostile and careless input', () => {
  it('makes the result the failed-run case keeps', async () => {
    writeFileSync(path('good.wav'), wav(4000));
    const r = await runCli([
      'simulate',
      '--b',
      '1,1',
      '--input',
      path('good.wav'),
      '--output',
      path('result.wav'),
    ]);
    expect(r.code, r.stderr).toBe(0);
    writeFileSync(path('kept.wav'), readFileSync(path('result.wav')));
    expect(statSync(path('result.wav')).size).toBeGreaterThan(8000);
  });

  for (const row of ROWS) {
    it(row.name, async () => {
      row.setup?.();
      const r = await runCli(row.argv());
      expect(r.stderr).not.toMatch(/internal error/);
      expect(r.code, r.stderr).toBe(row.code);
      if (row.says) expect(r.stderr).toMatch(row.says);
      await row.then?.();
    });
  }
});
