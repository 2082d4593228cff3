/**
 * findRoots against numpy.roots on the seven polynomials of degree 768 and 1024 that
 * test/core/roots/truth.test.ts checks (test/reference/fixtures/roots_truth_degree_768_1024.json): Butterworth
 * denominators at three cutoffs, two with subnormal trailing coefficients, and seeded double conjugate pairs.
 * One call per sample, ours and numpy's interleaved, median of ROUNDS: ours by this thread's processor time
 * and by the process's (process.cpuUsage, which adds V8's garbage-collector and compiler threads), numpy.roots
 * in a long-lived python3 process on one OpenBLAS thread (bench/numpy_roots.py, time.thread_time).
 *
 *   npx tsx bench/rootsHighDegree.ts [rounds]        (default 5)
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { findRoots } from '../src/core/roots/index.ts';
import { groupedSetBackwardError } from '../src/core/roots/setBackwardError.ts';
import { startNumpy } from './roots.ts';
import { median, threadCpuSpan } from './timing.ts';

interface Case {
  name: string;
  coefficients: number[];
  numpyBackwardError: number;
}

const FIXTURE = fileURLToPath(
  new URL('../test/reference/fixtures/roots_truth_degree_768_1024.json', import.meta.url),
);

function processMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

export async function benchRootsHighDegree(rounds = 5): Promise<string> {
  const cases = JSON.parse(readFileSync(FIXTURE, 'utf8')) as Case[];
  const dir = mkdtempSync(join(tmpdir(), 'polewright-roots-high-'));
  const file = join(dir, 'polys.json');
  writeFileSync(file, JSON.stringify(cases.map((c) => c.coefficients)));
  const numpy = await startNumpy(file);
  const rows: string[] = [];
  try {
    for (const c of cases) findRoots(c.coefficients); // warm up every path
    for (const [i, c] of cases.entries()) {
      const thread: number[] = [];
      const whole: number[] = [];
      const theirs: number[] = [];
      for (let r = 0; r < rounds; r++) {
        const before = processMs();
        thread.push(threadCpuSpan(() => findRoots(c.coefficients)).threadMs);
        whole.push(processMs() - before);
        theirs.push((await numpy.time(i, 1)).thread);
      }
      const [t, w, n] = [median(thread), median(whole), median(theirs)];
      rows.push(
        `| ${c.name} | ${t.toFixed(0)} | ${w.toFixed(0)} | ${n.toFixed(0)} | ${(t / n).toFixed(2)} | ${(w / n).toFixed(2)} | ${groupedSetBackwardError(c.coefficients, findRoots(c.coefficients).grouped).toExponential(1)} | ${c.numpyBackwardError.toExponential(1)} |`,
      );
    }
  } finally {
    numpy.stop();
    rmSync(dir, { recursive: true, force: true });
  }
  return [
    `findRoots vs numpy.roots (${numpy.version}, one OpenBLAS thread), Node ${process.version}; one call per`,
    `sample, interleaved, median of ${rounds}; ms of processor time (ours: this thread, and the whole process).`,
    '',
    '| fixture polynomial | ours thread (ms) | ours process (ms) | numpy (ms) | thread / numpy | process / numpy | set error | numpy set error |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  console.log(await benchRootsHighDegree(Number(process.argv[2] ?? 5)));
}
