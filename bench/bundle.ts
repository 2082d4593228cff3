/**
 * What the page's first view loads, gzipped, against the goal of 150 kB (build/firstView.ts, also checked
 * by `npm test`), and every chunk loaded later (side pages, recording tools, design reader, link codec,
 * parser, picture writer), prefetched after the first paint. Reads an existing build (`npm run build`
 * first). Run alone: `npx tsx bench/bundle.ts`.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { checkFirstView, FIRST_VIEW_BUDGET_KB, laterScripts } from '../build/firstView.ts';
import { cell } from './timing.ts';

const DIST = fileURLToPath(new URL('../dist', import.meta.url));
const name = (f: string) => f.replace(/-[\w-]{8}\.js$/, '.js');

export function benchBundle(): string {
  if (!existsSync(join(DIST, 'index.html'))) return 'No build in dist/: run `npm run build` first.';
  const first = checkFirstView(DIST);
  const rows = [
    '| first view (entry and preloaded chunks) | gzip (kB) |',
    '|---|---|',
    ...first.scripts.map((s) => `| ${name(s.file)} | ${cell(s.kb)} |`),
    `| **total** (goal ≤ ${FIRST_VIEW_BUDGET_KB}) | **${cell(first.totalKb)}** |`,
    '',
    '| loaded on first use, prefetched after the first paint | gzip (kB) |',
    '|---|---|',
    ...laterScripts(DIST).map((s) => `| ${name(s.file)} | ${cell(s.kb)} |`),
  ];
  return rows.join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) console.log(benchBundle());
