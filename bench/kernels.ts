/**
 * Signal kernels against scipy, side by side: the biquad cascade (runSectionFilter vs scipy.signal.sosfilt)
 * at 1e6 and 1e7 samples and orders 2–64, and Welch's spectrum (welch vs scipy.signal.welch) at segment
 * lengths the page and the command line use, powers of two and not. Each of our runs alternates with one
 * of scipy's in a long-lived python3 process (bench/scipy_kernels.py), so both see the same machine load,
 * and both are timed by their process's CPU time (steadier than wall time on a shared machine); the table
 * gives medians and the ratio of medians (ours / scipy: below 1 is faster).
 * Run alone: `npx tsx bench/kernels.ts` (PW_KERNEL_ROUNDS=7 sets the alternations per cell;
 * PW_KERNELS_BEFORE=<checkout> adds another checkout's kernels to the alternation, see beforeKernels).
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import { loadavg } from 'node:os';
import { designIir } from '../src/core/design/index.ts';
import { zpkToSections } from '../src/core/system/index.ts';
import { createSectionFilter, runSectionFilter, welch } from '../src/core/signal/index.ts';
import { mulberry32 } from '../src/core/random.ts';
import { cell, median } from './timing.ts';

const ROUNDS = Number(process.env.PW_KERNEL_ROUNDS ?? 7);
const FS = 48000;
const ORDERS = [2, 8, 32, 64];
/** PW_KERNEL_SOS=0 leaves the cascade out (a Welch-only run). */
const SOS_LENGTHS = process.env.PW_KERNEL_SOS === '0' ? [] : [1e6, 1e7];
/**
 * Segment lengths: the page's powers of two, audio rates and round numbers, primes (PW_KERNEL_SEGMENTS, a
 * comma-separated list, runs only those).
 */
const SEGMENTS = process.env.PW_KERNEL_SEGMENTS
  ? process.env.PW_KERNEL_SEGMENTS.split(',').map(Number)
  : [256, 1024, 4096, 8192, 65536, 1000, 6000, 44100, 48000, 10007, 4099, 30011];
const WELCH_SECONDS = 60;

interface Scipy {
  version: string;
  time: (request: string) => Promise<number>;
  stop: () => void;
}

async function startScipy(signalFile: string, sectionsFile: string): Promise<Scipy> {
  const script = join(fileURLToPath(new URL('.', import.meta.url)), 'scipy_kernels.py');
  const child = spawn('python3', [script, signalFile, sectionsFile], { stdio: ['pipe', 'pipe', 'inherit'] });
  const lines = createInterface({ input: child.stdout })[Symbol.asyncIterator]();
  const next = async (): Promise<string> => {
    const r = await lines.next();
    if (r.done) throw new Error('bench: scipy_kernels.py ended early (is python3 with scipy installed?)');
    return r.value;
  };
  const version = (await next()).replace('ready ', '');
  return {
    version,
    time: async (request) => {
      child.stdin.write(`${request}\n`);
      return 1000 * Number(await next());
    },
    stop: () => child.stdin.end('quit\n'),
  };
}

/** The cascade and Welch kernels of one tree (ours, or PW_KERNELS_BEFORE's). */
interface Kernels {
  createSectionFilter: typeof createSectionFilter;
  runSectionFilter: typeof runSectionFilter;
  welch: typeof welch;
}

/**
 * PW_KERNELS_BEFORE=<checkout>: the same kernels from another checkout of the project (the commit before a
 * change, e.g. `git archive` into a folder with node_modules linked), run in the same alternation.
 */
async function beforeKernels(): Promise<Kernels | null> {
  const dir = process.env.PW_KERNELS_BEFORE?.trim();
  if (!dir) return null;
  return (await import(join(dir, 'src/core/signal/index.ts'))) as Kernels;
}

const cpuMs = (run: () => void): number => {
  const t0 = process.cpuUsage();
  run();
  const d = process.cpuUsage(t0);
  return (d.user + d.system) / 1000;
};

/** Alternates ours, the before tree's (when given) and scipy's `rounds` times; medians in ms. */
async function alternate(
  ours: () => void,
  theirs: () => Promise<number>,
  before: (() => void) | null,
): Promise<[number, number, number]> {
  ours();
  before?.();
  await theirs();
  const a: number[] = [];
  const b: number[] = [];
  const c: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    a.push(cpuMs(ours));
    if (before) c.push(cpuMs(before));
    b.push(await theirs());
  }
  return [median(a), median(b), before ? median(c) : NaN];
}

/** Runs the benchmark and returns two markdown tables. */
export async function benchKernels(): Promise<string> {
  const n = Math.max(SOS_LENGTHS.at(-1) ?? 0, WELCH_SECONDS * FS);
  const next = mulberry32(3);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = 0.3 * Math.sin((2 * Math.PI * 50 * i) / FS) + (next() - 0.5);
  const cascades: Record<string, number[][]> = {};
  for (const order of ORDERS) {
    const zpk = designIir({ family: 'butterworth', response: 'lowpass', order, edgesHz: [6000], fs: FS });
    cascades[String(order)] = zpkToSections(zpk);
  }
  const dir = mkdtempSync(join(tmpdir(), 'pw-kernels-'));
  const signalFile = join(dir, 'x.f64');
  const sectionsFile = join(dir, 'sections.json');
  writeFileSync(signalFile, new Uint8Array(x.buffer));
  writeFileSync(sectionsFile, JSON.stringify(cascades));
  const scipy = await startScipy(signalFile, sectionsFile);
  const prev = await beforeKernels();
  const load0 = loadavg()[0]!;
  try {
    const sosRows: string[] = [];
    const out = new Float64Array(SOS_LENGTHS.at(-1) ?? 0);
    for (const len of SOS_LENGTHS) {
      for (const order of ORDERS) {
        const sections = cascades[String(order)]!.map(
          (s) => s as [number, number, number, number, number, number],
        );
        const xs = x.subarray(0, len);
        const ys = out.subarray(0, len);
        const [ours, theirs, was] = await alternate(
          () => runSectionFilter(createSectionFilter(sections), xs, ys),
          () => scipy.time(`sos ${order} ${len}`),
          prev ? () => prev.runSectionFilter(prev.createSectionFilter(sections), xs, ys) : null,
        );
        const ns = (ms: number) => cell((ms * 1e6) / (len * sections.length));
        sosRows.push(
          `| ${len.toExponential(0)} | ${order} | ${cell(ours)} | ${cell(theirs)} | ${ns(ours)} | ${ns(theirs)} | ${cell(ours / theirs)} |${prev ? ` ${cell(was)} | ${cell(was / theirs)} |` : ''}`,
        );
      }
    }
    const welchRows: string[] = [];
    const wn = WELCH_SECONDS * FS;
    const xw = x.subarray(0, wn);
    for (const seg of SEGMENTS) {
      const options = { window: 'hann', nperseg: seg, scaling: 'spectrum' } as const;
      const [ours, theirs, was] = await alternate(
        () => welch(xw, FS, options),
        () => scipy.time(`welch ${seg} ${wn}`),
        prev ? () => prev.welch(xw, FS, options) : null,
      );
      welchRows.push(
        `| ${seg} | ${cell(ours)} | ${cell(theirs)} | ${cell(ours / theirs)} |${prev ? ` ${cell(was)} | ${cell(was / theirs)} |` : ''}`,
      );
    }
    const load = ((load0 + loadavg()[0]!) / 2).toFixed(1);
    return [
      `Biquad cascade, runSectionFilter vs scipy.signal.sosfilt (${scipy.version}), Node ${process.version}; Butterworth low-pass sections, medians of ${ROUNDS} alternated runs (process CPU time), load average ${load}.`,
      '',
      `| samples | order | ours (ms) | scipy (ms) | ours (ns per sample·section) | scipy (ns) | ours / scipy |${prev ? ' before (ms) | before / scipy |' : ''}`,
      `| --- | --: | --: | --: | --: | --: | --: |${prev ? ' --: | --: |' : ''}`,
      ...sosRows,
      '',
      `Welch (Hann, half overlap, 'spectrum' scaling, constant detrend) of ${WELCH_SECONDS} s at 48 kHz (${wn} samples), welch vs scipy.signal.welch, medians of ${ROUNDS} alternated runs (process CPU time).`,
      '',
      `| segment | ours (ms) | scipy (ms) | ours / scipy |${prev ? ' before (ms) | before / scipy |' : ''}`,
      `| --: | --: | --: | --: |${prev ? ' --: | --: |' : ''}`,
      ...welchRows,
    ].join('\n');
  } finally {
    scipy.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchKernels());
}
