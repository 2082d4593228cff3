/**
 * What the page's first view loads: the entry script of dist/index.html and the chunks it preloads (the
 * static imports), gzipped, against the goal of 150 kB; and every chunk loaded later (side pages, recording
 * tools, picture writer), prefetched after the first paint. Reads an existing build (`npm run build` first).
 * Run alone: `npx tsx bench/bundle.ts`.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { cell } from './timing.ts';

const DIST = fileURLToPath(new URL('../dist', import.meta.url));
const GOAL_KB = 150;

const gz = (file: string) => gzipSync(readFileSync(join(DIST, file)), { level: 9 }).length / 1024;

export function benchBundle(): string {
  if (!existsSync(join(DIST, 'index.html'))) return 'No build in dist/: run `npm run build` first.';
  const html = readFileSync(join(DIST, 'index.html'), 'utf8');
  const first = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
  const later = readdirSync(join(DIST, 'assets'))
    .filter((f) => f.endsWith('.js') && !first.includes(`assets/${f}`) && !f.includes('.worker'))
    .map((f) => `assets/${f}`);
  const total = first.reduce((s, f) => s + gz(f), 0);
  const rows = [
    '| first view (entry and preloaded chunks) | gzip (kB) |',
    '|---|---|',
    ...first.map((f) => `| ${f.replace(/-[\w-]{8}\.js$/, '.js')} | ${cell(gz(f))} |`),
    `| **total** (goal ≤ ${GOAL_KB}) | **${cell(total)}** |`,
    '',
    '| loaded on first use, prefetched after the first paint | gzip (kB) |',
    '|---|---|',
    ...later.map((f) => `| ${f.replace(/-[\w-]{8}\.js$/, '.js')} | ${cell(gz(f))} |`),
  ];
  return rows.join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) console.log(benchBundle());
