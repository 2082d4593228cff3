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
import { setBackwardError } from '../src/core/roots/setBackwardError.ts';
import { polyFromRoots } from '../src/core/poly.ts';
import type { Root } from '../src/core/types.ts';
import { mulberry32 } from '../src/core/random.ts';

const DEGREES = [8, 16, 32, 64, 128, 256, 512, 1024];
/** Wall time aimed at for one measurement (a batch of calls), in milliseconds. */
const TARGET_MS = 4;
/** Warm-up before anything is timed, and before each case of degree ≤ 64, in milliseconds of wall time. */
const WARM_UP_MS = 3000;
const SETTLE_MS = 300;

function randomPoly(n: number): Float64Array {
  const u = mulberry32(1000 + n);
  return Float64Array.from(
    { length: n + 1 },
    () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u()),
  );
}

/** Windowed-sinc (Hamming) low-pass with n + 1 taps, cutoff 0.3 of Nyquist, unit gain at DC. */
function firLowPass(n: number): Float64Array {
  const cutoff = 0.3;
  const h = Float64Array.from({ length: n + 1 }, (_, k) => {
    const t = k - n / 2;
    const sinc = t === 0 ? cutoff : Math.sin(Math.PI * cutoff * t) / (Math.PI * t);
    return sinc * (0.54 - 0.46 * Math.cos((2 * Math.PI * k) / n));
  });
  const sum = h.reduce((s, v) => s + v, 0);
  return h.map((v) => v / sum);
}

/** Denominator of an order-n digital Butterworth low-pass, cutoff 0.2 of Nyquist, by the bilinear transform. */
function butterworth(n: number): Float64Array {
  const wc = Math.tan((Math.PI * 0.2) / 2);
  const poles: Root[] = [];
  for (let k = 0; k < n; k++) {
    const th = (Math.PI * (2 * k + n + 1)) / (2 * n);
    const sr = wc * Math.cos(th);
    const si = wc * Math.sin(th);
    if (si < -1e-12) continue;
    // z = (1 + s) / (1 - s)
    const dr = 1 - sr;
    const dd = dr * dr + si * si;
    const zr = ((1 + sr) * dr - si * si) / dd;
    const zi = (si * dr + (1 + sr) * si) / dd;
    poles.push({ re: zr, im: Math.abs(zi) < 1e-12 ? 0 : zi, multiplicity: 1 });
  }
  return polyFromRoots(poles);
}

/** n/4 seeded conjugate pairs, each a double root, moduli 0.3…1.2. */
function repeatedRoots(n: number): Float64Array {
  const u = mulberry32(5000 + n);
  const roots: Root[] = [];
  for (let k = 0; k < n / 4; k++) {
    const r = 0.3 + 0.9 * u();
    const a = 0.1 + (Math.PI - 0.2) * u();
    roots.push({ re: r * Math.cos(a), im: r * Math.sin(a), multiplicity: 2 });
  }
  return polyFromRoots(roots);
}

const FAMILIES: [string, (n: number) => Float64Array][] = [
  ['random', randomPoly],
  ['FIR low-pass', firLowPass],
  ['Butterworth', butterworth],
  ['repeated', repeatedRoots],
];

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** Mean milliseconds per call over a batch: wall time and processor time (the whole process, all threads). */
interface Timing {
  wall: number;
  cpu: number;
}

/** Mean milliseconds per findRoots call over a batch of `inner` calls. */
function timeOurs(p: Float64Array, inner: number): Timing {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  for (let k = 0; k < inner; k++) findRoots(p);
  const wall = (performance.now() - t0) / inner;
  const used = process.cpuUsage(c0);
  return { wall, cpu: (used.user + used.system) / 1000 / inner };
}

interface NumpyServer {
  version: string;
  time: (i: number, inner: number) => Promise<Timing>;
  roots: (i: number) => Promise<{ re: number[]; im: number[] }>;
  stop: () => void;
}

/** A python3 process answering timing and root requests for numpy.roots (see bench/numpy_roots.py). */
async function startNumpy(file: string): Promise<NumpyServer> {
  const script = join(fileURLToPath(new URL('.', import.meta.url)), 'numpy_roots.py');
  const child = spawn('python3', [script, file], { stdio: ['pipe', 'pipe', 'inherit'] });
  const lines = createInterface({ input: child.stdout })[Symbol.asyncIterator]();
  const next = async (): Promise<string> => {
    const r = await lines.next();
    if (r.done) throw new Error('bench: numpy_roots.py ended early (is python3 with numpy installed?)');
    return r.value;
  };
  const version = (await next()).replace('ready ', '');
  return {
    version,
    time: async (i, inner) => {
      child.stdin.write(`${i} ${inner}\n`);
      const [wall, cpu] = (await next()).split(' ').map(Number);
      return { wall: 1000 * wall!, cpu: 1000 * cpu! };
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
  const cases = FAMILIES.filter(([name]) => name.toLowerCase().startsWith(family.toLowerCase())).flatMap(
    ([name, make]) => degrees.map((n) => ({ name, n, p: make(n) })),
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
      const reported = res.grouped.flatMap((g) => new Array<Root>(g.multiplicity).fill(g));
      const setErr = setBackwardError(
        p,
        reported.map((g) => g.re),
        reported.map((g) => g.im),
      );
      const theirRoots = await numpy.roots(i);
      const numpyBerr = rootsBackwardError(p, theirRoots.re, theirRoots.im);
      const numpySetErr = setBackwardError(p, theirRoots.re, theirRoots.im);
      // A single call of each sizes the batches; at high degree it also counts as the first sample.
      // Settle the JIT and GC after the big cases.
      const settle = performance.now();
      if (n <= 64) for (let k = 0; k < 50 || performance.now() - settle < SETTLE_MS; k++) findRoots(p);
      const oursOnce = timeOurs(p, 1);
      const numpyOnce = await numpy.time(i, 1);
      const innerOurs = Math.max(1, Math.round(TARGET_MS / oursOnce.wall));
      const innerNumpy = Math.max(1, Math.round(TARGET_MS / numpyOnce.wall));
      const big = innerOurs === 1 && innerNumpy === 1;
      const ours: Timing[] = big ? [oursOnce] : [];
      const theirs: Timing[] = big ? [numpyOnce] : [];
      const rounds = n >= 512 ? 5 : 11;
      while (ours.length < rounds) {
        ours.push(timeOurs(p, innerOurs));
        theirs.push(await numpy.time(i, innerNumpy));
      }
      const mo = median(ours.map((t) => t.wall));
      const mn = median(theirs.map((t) => t.wall));
      const co = median(ours.map((t) => t.cpu));
      const cn = median(theirs.map((t) => t.cpu));
      rows.push(
        `| ${name} | ${n} | ${mo.toFixed(3)} | ${berr.toExponential(1)} | ${setErr.toExponential(1)} | ${res.iterations}${res.converged ? '' : ' (not converged)'} | ${mn.toFixed(3)} | ${numpyBerr.toExponential(1)} | ${numpySetErr.toExponential(1)} | ${(mo / mn).toFixed(2)} | ${(co / cn).toFixed(2)} |`,
      );
    }
  } finally {
    numpy.stop();
    rmSync(dir, { recursive: true, force: true });
  }
  return [
    `findRoots vs numpy.roots (${numpy.version}), Node ${process.version}; median ms per call;`,
    'root error = max over roots of |p(z)| / Σ|a_k||z|^k; set error = max_k |a_k − q_k| / max_k |a_k| with',
    'q = a_0·Π(z − r_i) over the reported set (repeated roots merged) multiplied out in double-double;',
    'sweeps = Aberth + polish sweeps of ours; ours / numpy in wall time and in processor time (medians of each,',
    'both processes counted whole, all threads).',
    '',
    '| family | degree | ours (ms) | root error | set error | sweeps | numpy (ms) | numpy root error | numpy set error | ours / numpy | ours / numpy, processor |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [family, ...degrees] = process.argv.slice(2);
  console.log(await benchRoots(family, degrees.length > 0 ? degrees.map(Number) : DEGREES));
}
