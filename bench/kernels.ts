/**
 * Signal kernels against scipy, side by side: the biquad cascade (runSectionFilter vs scipy.signal.sosfilt)
 * at 1e6 and 1e7 samples and orders 2–64, and Welch's spectrum (welch vs scipy.signal.welch) at segment
 * lengths the page and the command line use, powers of two and not. Each of our runs alternates with one
 * of scipy's in a long-lived python3 process (bench/scipy_kernels.py), so both see the same machine load.
 * Both sides are timed by the processor time of the thread that does the work (ours: threadCpuMs, from
 * /proc/thread-self/schedstat; scipy's: time.thread_time(), and scipy_kernels.py checks that no other thread
 * of python worked), which leaves out V8's garbage-collector and compiler helper threads (process.cpuUsage
 * counts them, and on a loaded machine they made the same unchanged code read 0.99× and 2.08× scipy); a
 * collection on our main thread is counted, as it is a cost of our code. Wall times are given beside them,
 * with the load average at the end of each row. Before timing, each cell runs our kernel (and the before
 * tree's) for PW_KERNEL_WARMUP_MS (default 1500 ms) so V8 has optimised it: on a loaded machine a fixed
 * count of warm-up calls can run out before the optimised code arrives. The table gives medians and the
 * ratio of medians (ours / scipy: below 1 is faster).
 * Run alone: `npx tsx bench/kernels.ts` (PW_KERNEL_ROUNDS=7 sets the alternations per cell;
 * PW_KERNEL_SOS=0 leaves out the cascade; PW_KERNEL_SEGMENTS=1000,65536 runs only those Welch segments;
 * PW_KERNELS_BEFORE=<checkout> adds another checkout's kernels to the alternation, see beforeKernels).
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import { loadavg } from 'node:os';
import { PerformanceObserver, performance } from 'node:perf_hooks';
import { designIir } from '../src/core/design/index.ts';
import { zpkToSections } from '../src/core/system/index.ts';
import { createSectionFilter, runSectionFilter, welch } from '../src/core/signal/index.ts';
import { mulberry32 } from '../src/core/random.ts';
import { cell, median, threadCpuMs } from './timing.ts';

const ROUNDS = Number(process.env.PW_KERNEL_ROUNDS ?? 7);
const WARMUP_MS = Number(process.env.PW_KERNEL_WARMUP_MS ?? 1500);
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

/** One timed run: processor time of the working thread and wall time, ms. */
interface Timing {
  cpu: number;
  wall: number;
}

interface Scipy {
  version: string;
  time: (request: string) => Promise<Timing>;
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
      const [cpu, wall] = (await next()).split(' ').map((v) => 1000 * Number(v));
      return { cpu: cpu!, wall: wall! };
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

/** Main-thread garbage collections seen so far (start and duration, ms), from V8's gc performance entries. */
const collections: { start: number; duration: number }[] = [];
const gcObserver = new PerformanceObserver((list) => {
  for (const e of list.getEntries()) collections.push({ start: e.startTime, duration: e.duration });
});

/** Runs fn once and times it on this thread; `spans` collects the run's interval for the GC count. */
const timed = (run: () => void, spans: [number, number][]): Timing => {
  const w0 = performance.now();
  const c0 = threadCpuMs();
  run();
  const c1 = threadCpuMs();
  const w1 = performance.now();
  spans.push([w0, w1]);
  return { cpu: c1 - c0, wall: w1 - w0 };
};

/** Runs fn until WARMUP_MS have passed (at least three calls). */
const warm = (run: () => void): void => {
  const t0 = performance.now();
  for (let i = 0; i < 3 || performance.now() - t0 < WARMUP_MS; i++) run();
};

/** Medians of one cell: ours, scipy's and the before tree's, and our main thread's collections per run. */
interface Cell {
  ours: Timing;
  scipy: Timing;
  before: Timing;
  /** Garbage collections on our main thread during our timed runs: count and ms per run. */
  gcPerRun: number;
  gcMsPerRun: number;
  load: number;
}

const medians = (ts: Timing[]): Timing =>
  ts.length
    ? { cpu: median(ts.map((t) => t.cpu)), wall: median(ts.map((t) => t.wall)) }
    : { cpu: NaN, wall: NaN };

/** Alternates ours, the before tree's (when given) and scipy's `rounds` times; medians in ms. */
async function alternate(
  ours: () => void,
  theirs: () => Promise<Timing>,
  before: (() => void) | null,
): Promise<Cell> {
  warm(ours);
  if (before) warm(before);
  await theirs();
  const a: Timing[] = [];
  const b: Timing[] = [];
  const c: Timing[] = [];
  const spans: [number, number][] = [];
  const first = collections.length;
  for (let r = 0; r < ROUNDS; r++) {
    a.push(timed(ours, spans));
    if (before) c.push(timed(before, []));
    b.push(await theirs());
  }
  await new Promise((resolve) => setTimeout(resolve, 0)); // lets the observer deliver the last entries
  const ourGc = collections.slice(first).filter((g) => spans.some(([s, e]) => g.start >= s && g.start < e));
  return {
    ours: medians(a),
    scipy: medians(b),
    before: medians(c),
    gcPerRun: ourGc.length / ROUNDS,
    gcMsPerRun: ourGc.reduce((s, g) => s + g.duration, 0) / ROUNDS,
    load: loadavg()[0]!,
  };
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
  const load0 = loadavg()
    .map((l) => l.toFixed(1))
    .join(' ');
  gcObserver.observe({ entryTypes: ['gc'] });
  const beforeHead = prev ? ' before (ms) | before / scipy | ours / before |' : '';
  const beforeRule = prev ? ' --: | --: | --: |' : '';
  const beforeCells = (c: Cell) =>
    prev
      ? ` ${cell(c.before.cpu)} | ${cell(c.before.cpu / c.scipy.cpu)} | ${cell(c.ours.cpu / c.before.cpu)} |`
      : '';
  const tail = (c: Cell) =>
    ` ${cell(c.ours.wall)} | ${cell(c.scipy.wall)} | ${cell(c.ours.wall / c.scipy.wall)} | ${cell(c.gcPerRun)} / ${cell(c.gcMsPerRun)} |${beforeCells(c)} ${c.load.toFixed(1)} |`;
  const tailHead = ` ours wall (ms) | scipy wall (ms) | ours / scipy, wall | our GCs per run / ms |${beforeHead} load |`;
  const tailRule = ` --: | --: | --: | --: |${beforeRule} --: |`;
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
        const c = await alternate(
          () => runSectionFilter(createSectionFilter(sections), xs, ys),
          () => scipy.time(`sos ${order} ${len}`),
          prev ? () => prev.runSectionFilter(prev.createSectionFilter(sections), xs, ys) : null,
        );
        const ns = (ms: number) => cell((ms * 1e6) / (len * sections.length));
        sosRows.push(
          `| ${len.toExponential(0)} | ${order} | ${cell(c.ours.cpu)} | ${cell(c.scipy.cpu)} | ${ns(c.ours.cpu)} | ${ns(c.scipy.cpu)} | ${cell(c.ours.cpu / c.scipy.cpu)} |${tail(c)}`,
        );
      }
    }
    const welchRows: string[] = [];
    const wn = WELCH_SECONDS * FS;
    const xw = x.subarray(0, wn);
    for (const seg of SEGMENTS) {
      const options = { window: 'hann', nperseg: seg, scaling: 'spectrum' } as const;
      const c = await alternate(
        () => welch(xw, FS, options),
        () => scipy.time(`welch ${seg} ${wn}`),
        prev ? () => prev.welch(xw, FS, options) : null,
      );
      welchRows.push(
        `| ${seg} | ${cell(c.ours.cpu)} | ${cell(c.scipy.cpu)} | ${cell(c.ours.cpu / c.scipy.cpu)} |${tail(c)}`,
      );
    }
    const load1 = loadavg()
      .map((l) => l.toFixed(1))
      .join(' ');
    const how = `medians of ${ROUNDS} alternated runs after ${WARMUP_MS} ms of warm-up; times are the working thread's processor time (ours: /proc/thread-self/schedstat; scipy: time.thread_time()) unless marked wall; load average (1, 5, 15 min) ${load0} at the start and ${load1} at the end, 1-min load at the end of each row in the last column`;
    return [
      `Biquad cascade, runSectionFilter vs scipy.signal.sosfilt (${scipy.version}), Node ${process.version}; Butterworth low-pass sections, ${how}.`,
      '',
      `| samples | order | ours (ms) | scipy (ms) | ours (ns per sample·section) | scipy (ns) | ours / scipy |${tailHead}`,
      `| --- | --: | --: | --: | --: | --: | --: |${tailRule}`,
      ...sosRows,
      '',
      `Welch (Hann, half overlap, 'spectrum' scaling, constant detrend) of ${WELCH_SECONDS} s at 48 kHz (${wn} samples), welch vs scipy.signal.welch, ${how}.`,
      '',
      `| segment | ours (ms) | scipy (ms) | ours / scipy |${tailHead}`,
      `| --: | --: | --: | --: |${tailRule}`,
      ...welchRows,
    ].join('\n');
  } finally {
    gcObserver.disconnect();
    scipy.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchKernels());
}
