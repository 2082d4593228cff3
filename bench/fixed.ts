/**
 * Fixed-point throughput on ten minutes at 48 kHz (28.8 million samples): the bit-exact cascade in process
 * (FixedRun, with its two float64 comparison cascades) for several word lengths and both structures, and
 * `simulate --fixed` streaming a 10-minute 16-bit WAV file to a WAV of output codes in a child process.
 * Run alone: `npx tsx bench/fixed.ts`.
 */
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  FixedRun,
  type ImplementationSettings,
} from '../src/core/fixed/index.ts';
import { makeHum, makePinkNoise, writeWav } from '../src/core/signal/index.ts';
import type { Zpk } from '../src/core/types.ts';
import { writeSharedFile } from '../src/share/designFile.ts';
import { cell } from './timing.ts';
import { cliRun } from './signal.ts';

const FS = 48000;
const SECONDS = 600;
const N = FS * SECONDS;

/**
 * Notches at 50, 150 and 250 Hz with poles 20 Hz wide at 48 kHz: three sections. (The hopper design's 4 Hz
 * width puts the poles 2.6e-4 from the circle at this rate, and 16-bit coefficients move them onto it.)
 */
function hopper48k(): Zpk {
  const pair = (f: number, r: number) => ({
    re: r * Math.cos((2 * Math.PI * f) / FS),
    im: r * Math.sin((2 * Math.PI * f) / FS),
    multiplicity: 1,
  });
  const r = 1 - (20 * Math.PI) / FS;
  return {
    zeros: [50, 150, 250].map((f) => pair(f, 1)),
    poles: [50, 150, 250].map((f) => pair(f, r)),
    gain: 1,
  };
}

/** Markdown tables of the fixed-point benchmarks. */
export async function benchFixed(): Promise<string> {
  const zpk = hopper48k();
  const x = makeHum(N, FS, { harmonicAmplitudes: [0.2, 0.05, 0.03] });
  const p = makePinkNoise(N, 1, 0.05);
  for (let i = 0; i < N; i++) x[i] = x[i]! + p[i]!;
  const rows = [
    '| in process, 28.8 M samples, 3 sections | time (s) | M samples/s | overflows |',
    '|---|---|---|---|',
  ];
  const cases: [string, Partial<ImplementationSettings>, number][] = [
    ['16-bit words, DF2T (default)', {}, N],
    ['16-bit words, DF1', { structure: 'df1' }, N],
    [
      '24-bit data, 24-bit coefficients, DF2T',
      { dataWordLength: 24, wordLength: 24, accumulatorBits: 56 },
      N,
    ],
    // D + W > 50 bits needs the BigInt path: timed on one minute, scaled in the rate column.
    [
      '32-bit words, 64-bit accumulator (BigInt path; 1 min timed)',
      { dataWordLength: 32, wordLength: 32, accumulatorBits: 64 },
      FS * 60,
    ],
  ];
  for (const [name, over, count] of cases) {
    const built = buildImplementation(zpk, FS, { ...DEFAULT_IMPLEMENTATION, ...over });
    if (!built.ok) throw new Error(built.error.message);
    const run = new FixedRun(built.value);
    const t0 = performance.now();
    for (let i = 0; i < count; i += FS) run.pushValues(x.subarray(i, Math.min(count, i + FS)));
    const s = (performance.now() - t0) / 1000;
    rows.push(
      `| ${name} | ${cell(count === N ? s : (s * N) / count)} | ${cell(count / s / 1e6)} | ${run.report().overflowCount} |`,
    );
  }

  const dir = mkdtempSync(join(tmpdir(), 'pw-bench-fixed-'));
  try {
    const input = join(dir, 'ten-minutes.wav');
    writeFileSync(input, writeWav({ format: 'i16', sampleRate: FS, channels: [x] }).bytes);
    const design = join(dir, 'hopper48k.json');
    writeFileSync(
      design,
      writeSharedFile({
        design: {
          sampleRate: FS,
          zeros: zpk.zeros,
          poles: zpk.poles,
          gainRule: { kind: 'fixed', value: 1 },
          name: 'hum notches at 48 kHz',
          note: '',
        },
        view: {},
      }),
    );
    const size = statSync(input).size / (1024 * 1024);
    const idle = cliRun(['--idle']);
    const wav = cliRun(['simulate', design, '--fixed', '--input', input, '--output', join(dir, 'out.wav')]);
    const json = cliRun([
      'simulate',
      design,
      '--fixed',
      '--input',
      input,
      '--output',
      join(dir, 'out.wav'),
      '--json',
    ]);
    const df1 = cliRun([
      'simulate',
      design,
      '--fixed',
      '--structure',
      'df1',
      '--input',
      input,
      '--output',
      join(dir, 'out.wav'),
    ]);
    const rate = (ms: number) => cell(N / ((ms - idle.ms) / 1000) / 1e6);
    rows.push(
      '',
      `| command line (child process, ${cell(size)} MB 16-bit WAV in, WAV of codes out) | time (ms) | M samples/s after start-up | peak RSS (MB) |`,
      '|---|---|---|---|',
      `| node + tsx start-up only | ${cell(idle.ms)} | – | ${cell(idle.maxRssMb)} |`,
      `| simulate --fixed --output out.wav (16-bit, DF2T) | ${cell(wav.ms)} | ${rate(wav.ms)} | ${cell(wav.maxRssMb)} |`,
      `| the same with --json (report, limit-cycle check) | ${cell(json.ms)} | ${rate(json.ms)} | ${cell(json.maxRssMb)} |`,
      `| simulate --fixed --structure df1 --output out.wav | ${cell(df1.ms)} | ${rate(df1.ms)} | ${cell(df1.maxRssMb)} |`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return rows.join('\n');
}

const self = process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1];
if (self) console.log(await benchFixed());
