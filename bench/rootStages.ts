/**
 * findRoots split into its stages, each timed on its own in one process (thread processor time, batches of
 * about 4 ms, median of 21): the Aberth sweeps from the starting points, the compensated polish, and the
 * conjugate pairing with the multiplicity search. Each stage starts from a copy of the state the stage
 * before it left, so the stages add up to a findRoots call (the whole call is timed beside them). Compare
 * the total with the per-call figure of bench/roots.ts.
 *
 *   npx tsx bench/rootStages.ts [family] [degrees...]       (default: Butterworth and repeated, 8–64)
 */
import { pathToFileURL } from 'node:url';
import { findRoots, DEFAULT_MAX_ITERATIONS } from '../src/core/roots/index.ts';
import { aberthIterate } from '../src/core/roots/aberth.ts';
import { startingPoints } from '../src/core/roots/start.ts';
import { polishIllConditioned } from '../src/core/roots/polish.ts';
import { symmetrizeConjugates } from '../src/core/roots/conjugate.ts';
import { findMultipleRoots, listGrouped } from '../src/core/roots/multiplicity.ts';
import { applyBalance, chooseBalance } from '../src/core/roots/balance.ts';
import { familiesNamed } from './rootFamilies.ts';
import { median, threadCpuSpan } from './timing.ts';

const TARGET_MS = 4;
const ROUNDS = 21;
const WARM_UP_MS = 2000;

/** Median ms of thread time per call of fn. */
function perCall(fn: () => void): number {
  const once = threadCpuSpan(fn).threadMs;
  const inner = Math.max(1, Math.round(TARGET_MS / Math.max(once, 1e-3)));
  const xs: number[] = [];
  for (let r = 0; r < ROUNDS; r++)
    xs.push(
      threadCpuSpan(() => {
        for (let k = 0; k < inner; k++) fn();
      }).threadMs / inner,
    );
  return median(xs);
}

/** The scaled coefficients findRoots works on (roots/balance.ts; no zero roots in these families). */
function scaled(p: Float64Array): Float64Array {
  const n = p.length - 1;
  return applyBalance(p, 0, n, chooseBalance(p, 0, n));
}

export function benchRootStages(
  families: [string, (n: number) => Float64Array][],
  degrees: number[],
): string {
  const cases = families.flatMap(([name, make]) => degrees.map((n) => ({ name, n, c: scaled(make(n)) })));
  const aberth = (c: Float64Array) => {
    const n = c.length - 1;
    const zr = new Float64Array(n);
    const zi = new Float64Array(n);
    startingPoints(c, zr, zi);
    aberthIterate(c, zr, zi, DEFAULT_MAX_ITERATIONS);
    return { zr, zi };
  };
  const polish = (c: Float64Array, zr: Float64Array, zi: Float64Array) => {
    return polishIllConditioned(c, zr, zi, symmetrizeConjugates(c, zr, zi));
  };
  const group = (c: Float64Array, zr: Float64Array, zi: Float64Array) => {
    const mate = symmetrizeConjugates(c, zr, zi);
    return listGrouped(zr, zi, findMultipleRoots(c, zr, zi, mate));
  };
  const warm = performance.now();
  while (performance.now() - warm < WARM_UP_MS)
    for (const { c } of cases) {
      findRoots(c);
      const a = aberth(c);
      polish(c, a.zr, a.zi);
      group(c, a.zr, a.zi);
    }
  const rows: string[] = [];
  for (const { name, n, c } of cases) {
    const afterAberth = aberth(c);
    const polished = { zr: afterAberth.zr.slice(), zi: afterAberth.zi.slice() };
    const sweeps = polish(c, polished.zr, polished.zi);
    const tA = perCall(() => aberth(c));
    const tP = perCall(() => polish(c, afterAberth.zr.slice(), afterAberth.zi.slice()));
    const tG = perCall(() => group(c, polished.zr.slice(), polished.zi.slice()));
    const tAll = perCall(() => findRoots(c));
    const f = (x: number) => x.toFixed(3);
    rows.push(
      `| ${name} | ${n} | ${f(tA)} | ${f(tP)} (${sweeps}) | ${f(tG)} | ${f(tA + tP + tG)} | ${f(tAll)} |`,
    );
  }
  return [
    'findRoots by stage, median ms of thread processor time per call (polish sweeps in brackets).',
    '',
    '| family | degree | start + Aberth | pairing + polish | pairing + multiplicity | sum | findRoots |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [family, ...degrees] = process.argv.slice(2);
  const families = family
    ? familiesNamed(family)
    : [...familiesNamed('Butterworth'), ...familiesNamed('repeated')];
  console.log(benchRootStages(families, degrees.length > 0 ? degrees.map(Number) : [8, 16, 32, 64]));
}
