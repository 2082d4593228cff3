/**
 * findRoots of the working tree against findRoots of another revision, in one process, alternating batches
 * (thread processor time, bench/timing.ts), with both results' set backward errors and whether the reported
 * roots are bit-identical. For speed work on the root finder: each change measured against the commit before
 * it on the same machine load.
 *
 *   npx tsx bench/rootsCompare.ts REV [family] [degrees...]     e.g.  npx tsx bench/rootsCompare.ts HEAD~1 b 8 16 32 64
 *
 * REV's src/ is unpacked with `git archive` into a temporary folder and this tree's src/ copied beside it, so
 * both sides are loaded the same way. The copy loaded first runs faster: on identical code the second read
 * 2–10 % slower (30 % at Butterworth 8), so run it both ways (AFTER_FIRST=1 loads the working tree's copy
 * first) and read the two ratios together.
 */
import { execSync } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { RootsResult } from '../src/core/roots/index.ts';
import { groupedSetBackwardError } from '../src/core/roots/setBackwardError.ts';
import { familiesNamed } from './rootFamilies.ts';
import { median, threadCpuSpan } from './timing.ts';

type Find = (p: Float64Array) => RootsResult;

/** Processor time aimed at for one batch, ms. */
const TARGET_MS = 4;
/** Batches of each side per case. */
const ROUNDS = 21;
/** Warm-up of both sides over all cases before timing, ms of wall time. */
const WARM_UP_MS = 3000;

function sameRoots(a: RootsResult, b: RootsResult): boolean {
  if (a.grouped.length !== b.grouped.length) return false;
  return a.grouped.every((g, k) => {
    const h = b.grouped[k]!;
    return Object.is(g.re, h.re) && Object.is(g.im, h.im) && g.multiplicity === h.multiplicity;
  });
}

/** Milliseconds of thread time per call over a batch of `inner` calls. */
function batch(find: Find, p: Float64Array, inner: number): number {
  return (
    threadCpuSpan(() => {
      for (let k = 0; k < inner; k++) find(p);
    }).threadMs / inner
  );
}

export async function compareRoots(rev: string, family = '', degrees = [8, 16, 32, 64]): Promise<string> {
  const root = fileURLToPath(new URL('..', import.meta.url));
  const dir = mkdtempSync(join(tmpdir(), 'polewright-compare-'));
  try {
    const load = async (folder: string) =>
      (
        (await import(pathToFileURL(join(dir, folder, 'src/core/roots/index.ts')).href)) as {
          findRoots: Find;
        }
      ).findRoots;
    mkdirSync(join(dir, 'before'));
    execSync(`git archive ${rev} src | tar -x -C ${join(dir, 'before')}`, { cwd: root });
    cpSync(join(root, 'src'), join(dir, 'after', 'src'), { recursive: true });
    const afterFirst = process.env.AFTER_FIRST === '1';
    const first = await load(afterFirst ? 'after' : 'before');
    const second = await load(afterFirst ? 'before' : 'after');
    const [findThere, findHere] = afterFirst ? [second, first] : [first, second];
    const cases = familiesNamed(family).flatMap(([name, make]) =>
      degrees.map((n) => ({ name, n, p: make(n) })),
    );
    const warm = performance.now();
    while (performance.now() - warm < WARM_UP_MS)
      for (const c of cases) {
        findHere(c.p);
        findThere(c.p);
      }
    const rows: string[] = [];
    for (const { name, n, p } of cases) {
      const here = findHere(p);
      const there = findThere(p);
      const inner = Math.max(1, Math.round(TARGET_MS / batch(findThere, p, 1)));
      const a: number[] = [];
      const b: number[] = [];
      for (let r = 0; r < ROUNDS; r++) {
        // Alternate which side goes first, so neither always follows the other's garbage.
        if (r % 2) {
          a.push(batch(findThere, p, inner));
          b.push(batch(findHere, p, inner));
        } else {
          b.push(batch(findHere, p, inner));
          a.push(batch(findThere, p, inner));
        }
      }
      const ma = median(a);
      const mb = median(b);
      rows.push(
        `| ${name} | ${n} | ${ma.toFixed(4)} | ${mb.toFixed(4)} | ${(mb / ma).toFixed(3)} | ${median(a.map((x, k) => b[k]! / x)).toFixed(3)} | ${groupedSetBackwardError(p, there.grouped).toExponential(1)} | ${groupedSetBackwardError(p, here.grouped).toExponential(1)} | ${sameRoots(here, there) ? 'yes' : 'no'} |`,
      );
    }
    return [
      `findRoots of ${rev} (before) and of the working tree (after, loaded ${afterFirst ? 'first' : 'second'}), ${ROUNDS} alternated batches of about ${TARGET_MS} ms each;`,
      'median ms of thread processor time per call; ratio of medians and median of per-round ratios.',
      '',
      '| family | degree | before (ms) | after (ms) | after / before | per-round ratio | set error before | set error after | bit-identical |',
      '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | --- |',
      ...rows,
    ].join('\n');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [rev, family, ...degrees] = process.argv.slice(2);
  if (!rev) throw new Error('usage: npx tsx bench/rootsCompare.ts REV [family] [degrees...]');
  console.log(await compareRoots(rev, family ?? '', degrees.length > 0 ? degrees.map(Number) : undefined));
}
