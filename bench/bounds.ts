/**
 * Bounded work: the largest inputs the command line accepts (order 1024, 1025 coefficients, the largest design
 * file and link) and inputs it refuses at the door (60 000 coefficients, degree 4096, a 200 MB file), each run
 * in-process through the CLI's main(). Goal: every accepted case under a second, every refusal immediate.
 */
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../src/cli/main.ts';
import { writeSharedFile } from '../src/share/designFile.ts';
import { decodeLink, encodeLink } from '../src/share/link/index.ts';
import { readSharedFile } from '../src/share/designFile.ts';
import { mulberry32 } from '../src/core/random.ts';
import { worstCaseDesign } from '../test/share/worstCase.ts';
import { cell, median, timeMs } from './timing.ts';

async function cli(argv: string[]): Promise<number> {
  return main(argv, { stdout: () => {}, stderr: () => {} });
}

/**
 * Median wall and processor milliseconds of an async CLI run, over `runs` runs. On a shared machine the
 * processor time (this process's user + system time) says what the work costs; the wall time what it felt like.
 */
async function timeCli(argv: string[], runs = 3): Promise<{ ms: number; cpu: number; code: number }> {
  let code = await cli(argv); // warm up
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    code = await cli(argv);
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { ms: median(wall), cpu: median(cpu), code };
}

/** Markdown table of the bounded-work cases. */
export async function benchBounds(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'pw-bounds-'));
  const rand = mulberry32(18);
  const taps = (n: number) => Array.from({ length: n }, () => String(rand() - 0.5)).join(',');
  const fir = taps(1025);
  const delay = [...Array.from({ length: 1024 }, () => '0'), '1'].join(',');
  const comb = join(dir, 'comb.json');
  await cli(['design', 'comb', '--fs', '48000', '--f0', String(48000 / 1024), '--q', '30', '--out', comb]);
  const eq1024 = `y[n] = x[n] + 0.5 y[n-1024]`;
  const eq4096 = `y[n] = x[n] + 0.5 y[n-4096]`;
  const big = join(dir, 'big.json');
  writeFileSync(big, '');
  truncateSync(big, 200e6);
  const rows = ['| case | exit | wall (ms, median) | processor (ms, median) |', '|---|---|---|---|'];
  const cases: [string, string[]][] = [
    ['analyze, 1025 random coefficients (order 1024)', ['analyze', '--b', fir, '--json']],
    ['analyze, a pure delay of 1024 samples', ['analyze', '--b', delay, '--json']],
    ['export C, 1025-tap FIR (order 1024)', ['export', '--b', fir]],
    ['export C, notch comb of order 1024', ['export', comb]],
    ['analyze, --eq of degree 1024', ['analyze', '--eq', eq1024, '--json']],
    ['refused: --b with 60 000 coefficients', ['analyze', '--b', taps(60_000)]],
    ['refused: --eq of degree 4096', ['analyze', '--eq', eq4096]],
    ['refused: a 200 MB design file', ['analyze', big]],
  ];
  for (const [name, argv] of cases) {
    const r = await timeCli(argv);
    rows.push(`| ${name} | ${r.code} | ${cell(r.ms)} | ${cell(r.cpu)} |`);
  }
  // The longest file is the one full of control characters, the longest link the one full of 3-byte characters.
  const file = writeSharedFile({ design: worstCaseDesign('\u0001'), view: {} });
  const link = encodeLink({ design: worstCaseDesign('€'), view: {} });
  rows.push(
    `| read the largest design file (${(file.length / 1e6).toFixed(2)} M characters) | – | ${cell(timeMs(() => readSharedFile(file), 1000, 3))} | – |`,
    `| open the largest link (${(link.length / 1e6).toFixed(2)} M characters) | – | ${cell(timeMs(() => decodeLink(link), 1000, 3))} | – |`,
  );
  rmSync(dir, { recursive: true, force: true });
  return rows.join('\n');
}

if (import.meta.url === `file://${process.argv[1]}`)
  console.log('## Bounded work\n\n' + (await benchBounds()) + '\n');
