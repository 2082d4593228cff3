/**
 * Start-up cost of the command line: `polewright analyze` of a biquad against a bare `node -e ""`, as CPU time
 * (user + system) of the whole process, in pairs run back to back (A B A B …) so that a machine whose speed
 * drifts moves both halves of a pair alike; the figure to quote is the median of the per-pair ratios.
 * Each process is timed by bash's `times` builtin (the children's CPU, 1 ms resolution).
 * Run alone: `npx tsx bench/cli.ts [pairs]`.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { cell, median } from './timing.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIQUAD = ['analyze', '--b', '1,0,-1', '--a', '1,-1.6,0.64', '--fs', '1000'];

/** CPU seconds (user + system) of one run of the command, its output thrown away. */
function cpuSeconds(command: string[]): number {
  const r = spawnSync('bash', ['-c', '"$@" >/dev/null 2>&1 || exit 97; times', 'bench', ...command], {
    cwd: ROOT,
    encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(`${command.join(' ')} failed (${r.status}): ${r.stderr}`);
  // `times` prints the shell's own user/system line, then its children's: "0m0.071s 0m0.012s"
  const children = r.stdout.trim().split('\n').at(-1)!;
  const [user, sys] = children.split(/\s+/).map((t) => {
    const m = /^(\d+)m([\d.]+)s$/.exec(t);
    if (!m) throw new Error(`unexpected times output: ${children}`);
    return Number(m[1]) * 60 + Number(m[2]);
  });
  return user! + sys!;
}

interface Paired {
  a: number[];
  b: number[];
  ratios: number[];
}

function paired(a: string[], b: string[], pairs: number, warmup = 2): Paired {
  for (let i = 0; i < warmup; i++) {
    cpuSeconds(a);
    cpuSeconds(b);
  }
  const out: Paired = { a: [], b: [], ratios: [] };
  for (let i = 0; i < pairs; i++) {
    const ta = cpuSeconds(a);
    const tb = cpuSeconds(b);
    out.a.push(ta);
    out.b.push(tb);
    out.ratios.push(ta / tb);
  }
  return out;
}

const ms = (s: number) => cell(1000 * s);

function row(label: string, p: Paired): string {
  const r = p.ratios.slice().sort((x, y) => x - y);
  return `| ${label} | ${ms(median(p.a))} | ${ms(median(p.b))} | ${cell(median(r))} (${cell(r[0]!)}–${cell(r.at(-1)!)}) |`;
}

/** Markdown table of the command line's start-up. */
export function benchCli(pairs = 21): string {
  const node = ['node', '-e', ''];
  const rows = [
    `${pairs} pairs after 2 warm-up pairs; CPU = user + system of the whole process.`,
    '',
    '| command (A) | A median CPU (ms) | `node -e ""` median CPU (ms) | ratio A / node, median (min–max) |',
    '|---|---|---|---|',
    row(
      '`polewright analyze` of a biquad (bin/polewright.cjs, what npx runs)',
      paired(['bin/polewright.cjs', ...BIQUAD], node, pairs),
    ),
    row(
      'the same from source through tsx (before the bundle)',
      paired(['node_modules/.bin/tsx', 'bench/cliFromSource.ts', ...BIQUAD], node, Math.min(pairs, 5), 1),
    ),
    row(
      '`npx polewright analyze` (npx adds its own start-up)',
      paired(['npx', 'polewright', ...BIQUAD], node, Math.min(pairs, 7), 1),
    ),
  ];
  return rows.join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(benchCli(Number(process.argv[2] ?? 21)));
}
