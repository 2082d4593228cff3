/**
 * What the page's first view costs to load: the entry script of the built index.html and the chunks it
 * preloads (its static imports), each gzipped as a server sends it, against a budget of 150 kB
 * (FIRST_VIEW_BUDGET_KB). The rest (side pages, recording tools, design reader, link codec, parser, design
 * algorithms, exact checks) loads on first use and is prefetched after the first paint. `npm run check:first-view` runs it on dist/ after `npm run build` (a step of
 * `npm test`); `npm run bench -- bundle` prints the same figures with the later chunks.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

/**
 * Most gzipped JavaScript the first view may load, kB (1 kB = 1024 bytes): the goal of 150 kB. The exact
 * stability checks, the root finder and the designer registry's texts load after the first paint
 * (DEVELOPERS.md, "What the page loads first").
 */
export const FIRST_VIEW_BUDGET_KB = 150;

export interface ScriptSize {
  /** Path inside the build folder, e.g. assets/index-abc123.js. */
  file: string;
  /** Gzipped size (level 9), kB. */
  kb: number;
}

/** Gzipped size of a file (level 9), kB. */
export function gzipKb(path: string): number {
  return gzipSync(readFileSync(path), { level: 9 }).length / 1024;
}

/** The scripts the built page loads before it can draw: its module entry and every modulepreload. */
export function firstViewScripts(dist: string): ScriptSize[] {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const tags = html.match(/<(?:script|link)\b[^>]*>/g) ?? [];
  const files = tags
    .filter((t) => /^<script\b/.test(t) || /\brel="modulepreload"/.test(t))
    .map((t) => /(?:src|href)="\/?([^"]+\.js)"/.exec(t)?.[1])
    .filter((f): f is string => f !== undefined);
  return files.map((file) => ({ file, kb: gzipKb(join(dist, file)) }));
}

/** Every other script of the build (loaded on first use), workers left out. */
export function laterScripts(dist: string): ScriptSize[] {
  const first = new Set(firstViewScripts(dist).map((s) => s.file));
  return readdirSync(join(dist, 'assets'))
    .map((f) => `assets/${f}`)
    .filter((f) => f.endsWith('.js') && !first.has(f) && !f.includes('.worker'))
    .map((file) => ({ file, kb: gzipKb(join(dist, file)) }));
}

/** The first view's scripts, their total and whether it is within the budget. */
export function checkFirstView(dist: string, budgetKb = FIRST_VIEW_BUDGET_KB) {
  const scripts = firstViewScripts(dist);
  const totalKb = scripts.reduce((s, x) => s + x.kb, 0);
  return { scripts, totalKb, ok: scripts.length > 0 && totalKb <= budgetKb };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const dist = fileURLToPath(new URL('../dist', import.meta.url));
  if (!existsSync(join(dist, 'index.html'))) {
    console.error('No build in dist/: run `npm run build` first.');
    process.exit(1);
  }
  const r = checkFirstView(dist);
  for (const s of r.scripts) console.log(`  ${s.file.padEnd(40)} ${s.kb.toFixed(1).padStart(7)} kB`);
  console.log(
    `first view: ${r.totalKb.toFixed(1)} kB of gzipped JavaScript (budget ${FIRST_VIEW_BUDGET_KB} kB)` +
      (r.ok ? '' : ' — OVER BUDGET: move what the first paint does not need behind a dynamic import'),
  );
  process.exitCode = r.ok ? 0 : 1;
}
