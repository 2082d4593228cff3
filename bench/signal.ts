/**
 * Real-signal benchmarks on ten minutes at 48 kHz (28.8 million samples): generating, filtering (one shot
 * and in 1-second blocks), Welch spectrum, WAV encode/decode, and the streaming command line on a
 * 10-minute 16-bit WAV file in a temporary folder. Memory is read from process.memoryUsage after each stage
 * (after a forced collection when run with --expose-gc) and, for the command line, from the child
 * process's peak resident set (process.resourceUsage().maxRSS).
 * Run alone: `npx tsx bench/signal.ts`.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  WelchAccumulator,
  createSectionFilter,
  makeHum,
  makePinkNoise,
  readWav,
  readWavChunked,
  runSectionFilter,
  welch,
  writeWav,
} from '../src/core/signal/index.ts';
import type { Section } from '../src/core/types.ts';
import { cell } from './timing.ts';
import { hzToOmega } from '../src/core/units.ts';

const FS = 48000;
const SECONDS = 600;
const N = FS * SECONDS;
const MB = 1024 * 1024;

/** A 50 Hz hum remover: notches at 50, 100 and 150 Hz (pole radius 0.999), as three sections. */
function humNotches(): Section[] {
  return [50, 100, 150].map((f) => {
    const w = hzToOmega(f, FS);
    const r = 0.999;
    return [1, -2 * Math.cos(w), 1, 1, -2 * r * Math.cos(w), r * r];
  });
}

function collect(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

function memory(): { rss: number; heap: number; buffers: number } {
  const m = process.memoryUsage();
  return { rss: m.rss / MB, heap: m.heapUsed / MB, buffers: m.arrayBuffers / MB };
}

/** Runs fn once, returning its result, wall time and resident memory after it (MB). */
async function stage<T>(
  fn: () => T | Promise<T>,
): Promise<{ value: T; ms: number; rss: number; buffers: number }> {
  collect();
  const t0 = performance.now();
  const value = await fn();
  const ms = performance.now() - t0;
  const m = memory();
  return { value, ms, rss: m.rss, buffers: m.buffers };
}

/** The command line filtering a 10-minute file in a child process: time and the child's peak RSS. */
export function cliRun(args: string[]): { ms: number; maxRssMb: number } {
  const root = fileURLToPath(new URL('..', import.meta.url));
  const t0 = performance.now();
  const r = spawnSync('npx', ['tsx', 'bench/signal.ts', '--cli-child', ...args], {
    cwd: root,
    encoding: 'utf8',
  });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`child failed: ${r.stderr}`);
  const last = r.stdout.trim().split('\n').at(-1)!;
  return { ms, maxRssMb: (JSON.parse(last) as { maxRssKb: number }).maxRssKb / 1024 };
}

/** Markdown table of the signal benchmarks. */
export async function benchSignal(): Promise<string> {
  const rows: string[] = [
    '| stage (10 min at 48 kHz, mono) | time (ms) | RSS after (MB) | typed arrays (MB) |',
    '|---|---|---|---|',
  ];
  const add = (name: string, s: { ms: number; rss: number; buffers: number }) =>
    rows.push(`| ${name} | ${cell(s.ms)} | ${cell(s.rss)} | ${cell(s.buffers)} |`);
  collect();
  const base = memory();
  rows.push(`| baseline | – | ${cell(base.rss)} | ${cell(base.buffers)} |`);

  const gen = await stage(() => {
    const x = makeHum(N, FS, { harmonicAmplitudes: [0.2, 0.05, 0.03] });
    const p = makePinkNoise(N, 1, 0.05);
    for (let i = 0; i < N; i++) x[i] = x[i]! + p[i]!;
    return x;
  });
  add('generate hum + pink noise', gen);
  const x = gen.value;
  const sections = humNotches();

  const oneShot = await stage(() => runSectionFilter(createSectionFilter(sections), x));
  add('filter, 3 sections, one shot (new output array)', oneShot);
  const blocks = await stage(() => {
    const f = createSectionFilter(sections);
    const buf = new Float64Array(FS);
    let check = 0;
    for (let p = 0; p < N; p += FS) {
      buf.set(x.subarray(p, p + FS));
      runSectionFilter(f, buf, buf);
      check += buf[0]!;
    }
    return check;
  });
  add('filter, 3 sections, 1 s blocks in place', blocks);

  const spec = await stage(() => welch(x, FS, { nperseg: 8192, scaling: 'spectrum' }));
  add('Welch, Hann, nperseg 8192, 50 % overlap', spec);
  const specBlocks = await stage(() => {
    const acc = new WelchAccumulator(FS, { nperseg: 8192, scaling: 'spectrum' });
    for (let p = 0; p < N; p += FS) acc.push(x.subarray(p, p + FS));
    return acc.result();
  });
  add('Welch, same, fed in 1 s blocks', specBlocks);
  const specOdd = await stage(() => welch(x, FS, { nperseg: 6000, scaling: 'spectrum' }));
  add('Welch, nperseg 6000 (Bluestein)', specOdd);

  const wav = await stage(() => writeWav({ format: 'i16', sampleRate: FS, channels: [oneShot.value] }));
  add('encode WAV i16 (57.6 MB)', wav);
  const dec = await stage(() => readWav(wav.value.bytes));
  add('decode WAV i16 at once', dec);
  const decChunked = await stage(() => readWavChunked(wav.value.bytes, { chunkBytes: 1 << 20 }));
  add('decode WAV i16 in 1 MiB steps (worker path)', decChunked);

  const dir = mkdtempSync(join(tmpdir(), 'pw-bench-'));
  try {
    const input = join(dir, 'ten-minutes.wav');
    writeFileSync(input, writeWav({ format: 'i16', sampleRate: FS, channels: [x] }).bytes);
    const size = statSync(input).size / MB;
    const b = sections.map((s) => s.slice(0, 3));
    // The CLI takes one transfer function: the three notches multiplied out.
    const mul = (p: number[], q: number[]) => {
      const out = new Array<number>(p.length + q.length - 1).fill(0);
      p.forEach((pv, i) => q.forEach((qv, j) => (out[i + j] = out[i + j]! + pv * qv)));
      return out;
    };
    const bAll = b.reduce(mul);
    const aAll = sections.map((s) => s.slice(3)).reduce(mul);
    const idle = cliRun(['--idle']);
    const cli = cliRun([
      'simulate',
      '--b',
      bAll.join(','),
      '--a',
      aAll.join(','),
      '--input',
      input,
      '--output',
      join(dir, 'out.wav'),
    ]);
    const csv = cliRun([
      'simulate',
      '--b',
      bAll.join(','),
      '--a',
      aAll.join(','),
      '--input',
      input,
      '--output',
      join(dir, 'out.csv'),
    ]);
    rows.push(
      '',
      `| command line (child process, ${cell(size)} MB WAV in) | time (ms) | peak RSS (MB) |`,
      '|---|---|---|',
      `| node + tsx start-up only | ${cell(idle.ms)} | ${cell(idle.maxRssMb)} |`,
      `| simulate --output out.wav (i16, streaming) | ${cell(cli.ms)} | ${cell(cli.maxRssMb)} |`,
      `| simulate --output out.csv (streaming, ${cell(statSync(join(dir, 'out.csv')).size / MB)} MB text) | ${cell(csv.ms)} | ${cell(csv.maxRssMb)} |`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return rows.join('\n');
}

async function child(argv: string[]): Promise<void> {
  if (argv[0] !== '--idle') {
    const { main } = await import('../src/cli/main.ts');
    const code = await main(argv, { stdout: () => undefined, stderr: (s) => process.stderr.write(s) });
    if (code !== 0) process.exit(code);
  }
  console.log(JSON.stringify({ maxRssKb: process.resourceUsage().maxRSS }));
}

const self = process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1];
if (self) {
  const at = process.argv.indexOf('--cli-child');
  if (at >= 0) await child(process.argv.slice(at + 1));
  else console.log(await benchSignal());
}
