/**
 * Benchmark of findRoots against numpy.roots on four families of real polynomials (random, FIR low-pass,
 * clustered Butterworth denominators, repeated roots) at degrees 8…1024. numpy is timed by
 * bench/numpy_roots.py in a long-lived python3 process on exactly the same coefficients, and its
 * measurements are interleaved with ours because the machine is shared and noisy; figures are medians.
 * Run standalone with `npx tsx bench/roots.ts`; `npx tsx bench/roots.ts Butterworth 512 1024` runs only the
 * named family (case-insensitive prefix) at the given degrees.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { findRoots, rootsBackwardError } from '../src/core/roots/index.ts';
import { groupedSetBackwardError, setBackwardError } from '../src/core/roots/setBackwardError.ts';
import { familiesNamed } from './rootFamilies.ts';
import { median, threadCpuSpan } from './timing.ts';

const DEGREES = [8, 16, 32, 64, 128, 256, 512, 1024];
/** Processor time aimed at for one measurement (a batch of calls), in milliseconds. */
const TARGET_MS = 4;
/** Warm-up before anything is timed, and before each case of degree ≤ 64, in milliseconds of wall time. */
const WARM_UP_MS = 3000;
const SETTLE_MS = 300;

/**
 * Mean milliseconds per call over a batch: wall time and the processor time of the thread that made the
 * calls (threadCpuSpan here, time.thread_time in numpy's process). Thread time is the figure compared: it
 * leaves out the time the process waits for a core on a loaded machine (wall time does not) and V8's
 * garbage-collector and compiler helper threads (process.cpuUsage does not), while numpy.roots runs wholly
 * on its calling thread (OpenBLAS limited to one thread).
 */
export interface Timing {
  wall: number;
  thread: number;
}

/** Mean milliseconds per findRoots call over a batch of `inner` calls. */
function timeOurs(p: Float64Array, inner: number): Timing {
  const { wallMs, threadMs } = threadCpuSpan(() => {
    for (let k = 0; k < inner; k++) findRoots(p);
  });
  return { wall: wallMs / inner, thread: threadMs / inner };
}

export interface NumpyServer {
  version: string;
  time: (i: number, inner: number) => Promise<Timing>;
  roots: (i: number) => Promise<{ re: number[]; im: number[] }>;
  stop: () => void;
}

/** A python3 process answering timing and root requests for numpy.roots (see bench/numpy_roots.py). */
export async function startNumpy(file: string): Promise<NumpyServer> {
  const script = join(fileURLToPath(new URL('.', import.meta.url)), 'numpy_roots.py');
  const child = spawn('python3', [script, file], {
    stdio: ['pipe', 'pipe', 'inherit'],
    env: { ...process.env, OPENBLAS_NUM_THREADS: '1', OMP_NUM_THREADS: '1' },
  });
  const lines = createInterface({ input: child.stdout })[Symbol.asyncIterator]();
  const next = async (): Promise<string> => {
    const r = await lines.next();
    if (r.done) throw new Error('bench: numpy_roots.py ended early (is python3 with numpy installed?)');
    return r.value;
  };
  const [, threads, ...name] = (await next()).split(' ');
  const version = name.join(' ');
  if (threads !== '1')
    console.error(`bench: numpy's process runs ${threads} threads; its thread time may miss work`);
  return {
    version,
    time: async (i, inner) => {
      child.stdin.write(`${i} ${inner}\n`);
      const [wall, thread] = (await next()).split(' ').map(Number);
      return { wall: 1000 * wall!, thread: 1000 * thread! };
    },
    roots: async (i) => {
      child.stdin.write(`roots ${i}\n`);
      return JSON.parse(await next()) as { re: number[]; im: number[] };
    },
    stop: () => {
      child.stdin.end('quit\n');
    },
  };
}

/** Runs the benchmark and returns a markdown table of median times, backward errors and time ratios. */
export async function benchRoots(family = '', degrees: readonly number[] = DEGREES): Promise<string> {
  const cases = familiesNamed(family).flatMap(([name, make]) =>
    degrees.map((n) => ({ name, n, p: make(n) })),
  );
  const dir = mkdtempSync(join(tmpdir(), 'polewright-roots-'));
  const file = join(dir, 'polys.json');
  writeFileSync(file, JSON.stringify(cases.map((c) => Array.from(c.p))));
  const numpy = await startNumpy(file);
  const rows: string[] = [];
  // Let the JIT compile every path (closed forms aside) before anything is timed: by time, not by count, since
  // on a loaded machine the optimising compiler's thread waits for a core and a fixed count of calls can end
  // before the optimised code arrives (then the first rounds time the baseline code, 2-3x slower).
  const warm = performance.now();
  for (let k = 0; k < 20 || performance.now() - warm < WARM_UP_MS; k++)
    for (const c of cases) if (c.n <= 64) findRoots(c.p);
  try {
    for (const [i, { name, n, p }] of cases.entries()) {
      const res = findRoots(p);
      const berr = rootsBackwardError(p, res.re, res.im);
      const setErr = groupedSetBackwardError(p, res.grouped);
      const theirRoots = await numpy.roots(i);
      const numpyBerr = rootsBackwardError(p, theirRoots.re, theirRoots.im);
      const numpySetErr = setBackwardError(p, theirRoots.re, theirRoots.im);
      // A single call of each sizes the batches; at high degree it also counts as the first sample.
      // Settle the JIT and GC after the big cases.
      const settle = performance.now();
      if (n <= 64) for (let k = 0; k < 50 || performance.now() - settle < SETTLE_MS; k++) findRoots(p);
      const oursOnce = timeOurs(p, 1);
      const numpyOnce = await numpy.time(i, 1);
      // Batches sized by processor time: a single call's wall time can include a wait for a core.
      const innerOurs = Math.max(1, Math.round(TARGET_MS / oursOnce.thread));
      const innerNumpy = Math.max(1, Math.round(TARGET_MS / numpyOnce.thread));
      const big = innerOurs === 1 && innerNumpy === 1;
      const ours: Timing[] = big ? [oursOnce] : [];
      const theirs: Timing[] = big ? [numpyOnce] : [];
      const rounds = n >= 512 ? 5 : n >= 128 ? 11 : 21;
      while (ours.length < rounds) {
        ours.push(timeOurs(p, innerOurs));
        theirs.push(await numpy.time(i, innerNumpy));
      }
      const to = median(ours.map((t) => t.thread));
      const tn = median(theirs.map((t) => t.thread));
      const wo = median(ours.map((t) => t.wall));
      const wn = median(theirs.map((t) => t.wall));
      const ms = (x: number) => (x < 10 ? x.toFixed(3) : x.toFixed(1));
      rows.push(
        `| ${name} | ${n} | ${ms(to)} | ${berr.toExponential(1)} | ${setErr.toExponential(1)} | ${res.iterations}${res.converged ? '' : ' (not converged)'} | ${ms(tn)} | ${numpyBerr.toExponential(1)} | ${numpySetErr.toExponential(1)} | ${(to / tn).toFixed(2)} | ${ms(wo)} | ${ms(wn)} | ${(wo / wn).toFixed(2)} |`,
      );
    }
  } finally {
    numpy.stop();
    rmSync(dir, { recursive: true, force: true });
  }
  return [
    `findRoots vs numpy.roots (${numpy.version}, OpenBLAS limited to one thread), Node ${process.version};`,
    "ours, numpy: median ms per call of the calling thread's processor time (batches of about 4 ms, interleaved);",
    'wall: the same batches in wall time; root error = max over roots of |p(z)| / Σ|a_k||z|^k; set error =',
    'max_k |a_k − q_k| / max_k |a_k| with q = a_0·Π(z − r_i) over the reported set (repeated roots merged)',
    'multiplied out in double-double; sweeps = Aberth + polish sweeps of ours.',
    '',
    '| family | degree | ours (ms) | root error | set error | sweeps | numpy (ms) | numpy root error | numpy set error | ours / numpy | ours wall | numpy wall | wall ratio |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [family, ...degrees] = process.argv.slice(2);
  console.log(await benchRoots(family, degrees.length > 0 ? degrees.map(Number) : DEGREES));
}
