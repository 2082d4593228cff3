/**
 * The exact stability verdict for typed coefficients (src/core/stability/coefficients.ts) at degree 200
 * and above: how long it takes, and which stage decided (certified inclusion from the double roots, the
 * same after exact-evaluation refinement, or the exact Schur–Cohn recursion). Run standalone with
 * `npx tsx bench/stability.ts`.
 */
import { pathToFileURL } from 'node:url';
import { polyFromRoots } from '../src/core/poly.ts';
import type { Root } from '../src/core/types.ts';
import { stabilityOfCoefficients } from '../src/core/stability/coefficients.ts';
import { mulberry32 } from '../src/core/random.ts';
import { butterworth } from './rootFamilies.ts';

/** n/2 seeded conjugate pairs with radii in [0.5, 0.99]: a stable denominator, multiplied out. */
function stableRandom(n: number): Float64Array {
  const u = mulberry32(77 + n);
  const roots: Root[] = [];
  for (let k = 0; k < n / 2; k++) {
    const r = 0.5 + 0.49 * u();
    const t = Math.PI * u();
    roots.push({ re: r * Math.cos(t), im: r * Math.sin(t), multiplicity: 1 });
  }
  return polyFromRoots(roots);
}

/** Gaussian random coefficients (about half the roots outside the circle). */
function gaussian(n: number): Float64Array {
  const u = mulberry32(99 + n);
  return Float64Array.from(
    { length: n + 1 },
    () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u()),
  );
}

/** z^n − 1: n roots exactly on the unit circle (marginal). */
function comb(n: number): Float64Array {
  const c = new Float64Array(n + 1);
  c[0] = 1;
  c[n] = -1;
  return c;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1]!;
}

const CASES: [string, () => Float64Array][] = [
  ['stable, random pairs inside 0.99', () => stableRandom(200)],
  ['Gaussian coefficients', () => gaussian(200)],
  ['z^200 − 1 (marginal)', () => comb(200)],
  ['Butterworth low-pass, cut-off 0.5', () => butterworth(200, 0.5)],
  ['Butterworth low-pass, cut-off 0.2', () => butterworth(200, 0.2)],
  ['stable, random pairs inside 0.99, degree 400', () => stableRandom(400)],
];

/** Markdown table: median milliseconds per verdict at degree 200 (and one at 400), with how it was decided. */
export function benchStability(): string {
  const rows: string[] = [];
  for (const [name, make] of CASES) {
    const a = make();
    const first = stabilityOfCoefficients(a);
    const times: number[] = [];
    const cpu: number[] = [];
    const rounds = 7;
    for (let r = 0; r < rounds; r++) {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      stabilityOfCoefficients(a);
      times.push(performance.now() - t0);
      const used = process.cpuUsage(c0);
      cpu.push((used.user + used.system) / 1000);
    }
    rows.push(
      `| ${name} | ${a.length - 1} | ${first.verdict} | ${first.method} | ${median(times).toFixed(1)} | ${median(cpu).toFixed(1)} |`,
    );
  }
  return [
    'stabilityOfCoefficients on multiplied-out denominators; median of 7 calls, wall and processor time.',
    '',
    '| denominator | degree | verdict | decided by | wall ms | processor ms |',
    '| --- | ---: | --- | --- | ---: | ---: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) console.log(benchStability());
