/**
 * Browser memory with a long recording (not a test): writes a 1-hour 48 kHz 16-bit WAV (invented hum and
 * pink noise, 346 MB; PW_MEMORY_FORMAT=i24, i32 or f32 writes 24-bit integer, 32-bit integer or 32-bit float samples instead), serves the built page, and reads the proportional set size (PSS: shared pages split
 * between the processes sharing them) summed over every Chromium process, from /proc, while the page reads
 * the file, filters it, computes its spectra and follows a root drag. Reports the figures above the empty
 * page (the same page before the file), and the peak sampled every 100 ms; and the gaps between animation
 * frames, and the page's long tasks, while the time region switches to the spectra of the whole recording
 * (computed in the worker).
 * Run: `npx tsx bench/memory.ts` (or `npm run bench -- memory`); PW_DIST=<dir> serves a built directory,
 * PW_MEMORY_MINUTES=60 sets the length.
 */
import { execFileSync } from 'node:child_process';
import { closeSync, mkdtempSync, openSync, readFileSync, readdirSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Page } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../e2e/support/chromium.ts';
import { makeHum, makePinkNoise, encodeWavBlock, wavHeaderBytes } from '../src/core/signal/index.ts';
import { serve, stopServer, waitForServer } from './drag.ts';
import { cell, median } from './timing.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const FS = 48000;
const MINUTES = Number(process.env.PW_MEMORY_MINUTES ?? 60);
/** The WAV's sample format: 'i16' (default), 'i24', 'i32' or 'f32'. */
const FORMAT = (process.env.PW_MEMORY_FORMAT ?? 'i16') as 'i16' | 'i24' | 'i32' | 'f32';
if (!['i16', 'i24', 'i32', 'f32'].includes(FORMAT))
  throw new Error(`bench: PW_MEMORY_FORMAT ${FORMAT}; one of i16, i24, i32, f32`);
const FORMAT_NAME = { i16: '16-bit', i24: '24-bit', i32: '32-bit integer', f32: '32-bit float' }[FORMAT];
const PORT = Number(process.env.PW_BENCH_PORT ?? 4412);

/** Writes the WAV a minute at a time (the whole signal never exists in memory here). */
export function writeLongWav(dir: string, minutes = MINUTES, format = FORMAT): string {
  const path = join(dir, `hopper-${minutes}min-${format}.wav`);
  const n = FS * 60 * minutes;
  const fd = openSync(path, 'w');
  writeSync(fd, wavHeaderBytes({ format, channelCount: 1, sampleRate: FS, frameCount: n }));
  const block = FS * 60;
  for (let m = 0; m < minutes; m++) {
    const x = makeHum(block, FS, { fundamentalHz: 50, harmonicAmplitudes: [0.2, 0.05, 0.03], driftHz: 0.1 });
    const noise = makePinkNoise(block, 100 + m, 0.05);
    for (let i = 0; i < block; i++) x[i] = x[i]! + noise[i]!;
    writeSync(fd, encodeWavBlock([x], format).bytes);
  }
  closeSync(fd);
  return path;
}

/** PIDs of a process and all its descendants. */
function processTree(root: number): number[] {
  const children = new Map<number, number[]>();
  for (const d of readdirSync('/proc')) {
    if (!/^\d+$/.test(d)) continue;
    try {
      const stat = readFileSync(`/proc/${d}/stat`, 'utf8');
      const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
      const list = children.get(ppid) ?? [];
      list.push(Number(d));
      children.set(ppid, list);
    } catch {
      // The process ended while being read.
    }
  }
  const out: number[] = [];
  const walk = (p: number) => {
    out.push(p);
    for (const c of children.get(p) ?? []) walk(c);
  };
  walk(root);
  return out;
}

/** PSS of a process (and, with `tree`, its descendants), MB. */
function pssMb(root: number, tree = true): number {
  let kb = 0;
  for (const pid of tree ? processTree(root) : [root]) {
    try {
      const m = /^Pss:\s+(\d+) kB/m.exec(readFileSync(`/proc/${pid}/smaps_rollup`, 'utf8'));
      if (m) kb += Number(m[1]);
    } catch {
      // Gone, or not ours to read.
    }
  }
  return kb / 1024;
}

/**
 * The filtered trace drawn for the current design, and the measured spectrum after the design. A build from
 * before the recording worker marks neither (it computed both on the main thread before drawing), so the
 * selectors also take the unmarked elements: the same benchmark can measure that build side by side.
 */
export const OUTPUT_CURRENT =
  '[data-testid="signal-output-trace"][data-state="current"], [data-testid="signal-output-trace"]:not([data-state])';
export const SPECTRUM_MEASURED =
  '[data-testid="spectrum-after"][data-measured="true"], [data-testid="spectrum-after"]:not([data-measured])';

async function settle(page: Page, ms = 1500): Promise<void> {
  await page.waitForTimeout(ms);
}

/** Runs the measurement and returns a markdown table. */
export async function benchMemory(): Promise<string> {
  const dist = process.env.PW_DIST;
  if (!dist) execFileSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: ROOT, stdio: 'inherit' });
  const tmp = mkdtempSync(join(tmpdir(), 'pw-memory-'));
  const wav = writeLongWav(tmp);
  const build = { name: 'this', dir: dist, port: PORT };
  const server = await serve(build);
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      ...CHROMIUM_ARGS,
      `--explicitly-allowed-ports=${PORT}`,
      ...(process.env.PW_MEMORY_GC ? ['--js-flags=--expose-gc'] : []),
    ],
  });
  // Playwright starts Chromium as a child of this process (Debian's /usr/bin/chromium is a script that runs
  // /usr/lib/chromium/chromium): every descendant running Chromium counts.
  const chromiumPids = () =>
    processTree(process.pid).filter((p) => {
      try {
        return readFileSync(`/proc/${p}/cmdline`, 'utf8').includes('chromium');
      } catch {
        return false;
      }
    });
  if (chromiumPids().length === 0) throw new Error('bench: Chromium process not found');
  const browserPss = () => chromiumPids().reduce((sum, p) => sum + pssMb(p, false), 0);
  /** PSS by Chromium process type (browser, renderer, gpu-process, utility, zygote), MB. */
  const byType = () => {
    const out = new Map<string, number>();
    for (const p of chromiumPids()) {
      let type = 'browser';
      try {
        type = /--type=([\w-]+)/.exec(readFileSync(`/proc/${p}/cmdline`, 'utf8'))?.[1] ?? 'browser';
      } catch {
        continue;
      }
      out.set(type, (out.get(type) ?? 0) + pssMb(p, false));
    }
    return [...out].map(([t, mb]) => `${t} ${mb.toFixed(0)}`).join(', ');
  };
  let peak = 0;
  const sampler = setInterval(() => (peak = Math.max(peak, browserPss())), 100);
  // PW_MEMORY_DETAIL: the renderer's PSS every second beside the page's progress lines (which runs are on).
  let detailPage: Page | null = null;
  const t00 = Date.now();
  const detail = process.env.PW_MEMORY_DETAIL
    ? setInterval(() => {
        const mb = browserPss().toFixed(0);
        void detailPage
          ?.evaluate(() =>
            [...document.querySelectorAll('.pw-signal-note, [role=status]')]
              .map((e) => (e.textContent ?? '').slice(0, 60))
              .join(' | '),
          )
          .then((notes) =>
            console.error(`  t=${((Date.now() - t00) / 1000).toFixed(0)} s ${mb} MB: ${notes}`),
          )
          .catch(() => undefined);
      }, 1000)
    : null;
  const rows: string[] = [];
  let gaps: number[] = [];
  let longTasks: number[] = [];
  try {
    await waitForServer(`http://127.0.0.1:${PORT}/`, 30_000);
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    detailPage = page;
    // PW_MEMORY_DETAIL: collect garbage in the page and its workers (diagnostics: what is garbage, what is kept).
    const gcAll = async () => {
      for (const w of page.workers()) await w.evaluate('gc()').catch(() => undefined);
      await page.evaluate('gc()').catch(() => undefined);
      await new Promise((r) => setTimeout(r, 500));
    };
    await page.goto(`http://127.0.0.1:${PORT}/`);
    await settle(page);
    const empty = browserPss();
    peak = empty;
    const row = async (stage: string, ms: number | null) => {
      const now = browserPss();
      peak = Math.max(peak, now);
      if (process.env.PW_MEMORY_DETAIL) {
        console.error(`${stage}: ${byType()}`);
        if (process.env.PW_MEMORY_GC) await gcAll();
        console.error(`  after gc: ${(browserPss() - empty).toFixed(0)} MB; ${byType()}`);
      }
      rows.push(
        `| ${stage} | ${ms === null ? '–' : (ms / 1000).toFixed(1)} | ${(now - empty).toFixed(0)} | ${(peak - empty).toFixed(0)} |`,
      );
    };
    rows.push(`| empty page (${empty.toFixed(0)} MB PSS) | – | 0 | 0 |`);
    let t0 = Date.now();
    await page.getByRole('tab', { name: 'Signal' }).click();
    await page.getByTestId('recording-file-input').first().setInputFiles(wav);
    const panel = page.locator('section[aria-label="recording"]');
    await panel.getByTestId('signal-info').waitFor({ timeout: 600_000 });
    await row(
      `read the ${MINUTES}-minute WAV (${(FS * 60 * MINUTES).toLocaleString('en')} samples)`,
      Date.now() - t0,
    );
    t0 = Date.now();
    await panel.locator(OUTPUT_CURRENT).first().waitFor({ timeout: 600_000 });
    await row('filtered through the design (demo notches)', Date.now() - t0);
    // Frame gaps while the page switches to the spectra and they are computed (in the worker).
    // A script string: tsx names the inner function with a helper the page does not have.
    await page.evaluate(`(() => {
      const w = window;
      w.__gaps = [];
      w.__gapsStop = false;
      w.__longTasks = [];
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) w.__longTasks.push(e.duration);
      }).observe({ type: 'longtask' });
      let last = performance.now();
      function frame(t) {
        w.__gaps.push(t - last);
        last = t;
        if (!w.__gapsStop) requestAnimationFrame(frame);
      }
      requestAnimationFrame(frame);
    })()`);
    t0 = Date.now();
    await page
      .getByRole('radiogroup', { name: 'Time region shows' })
      .getByRole('radio', { name: 'Spectrum' })
      // A build that computes the spectra on the main thread answers the click only when they are done.
      .click({ timeout: 600_000 });
    await page.locator(SPECTRUM_MEASURED).first().waitFor({ timeout: 600_000 });
    await row('spectra before and after (Welch, 65 536-sample segments)', Date.now() - t0);
    [gaps, longTasks] = await page.evaluate(() => {
      const w = window as unknown as { __gaps: number[]; __gapsStop: boolean; __longTasks: number[] };
      w.__gapsStop = true;
      return [w.__gaps, w.__longTasks];
    });
    await page
      .getByRole('radiogroup', { name: 'Time region shows' })
      .getByRole('radio', { name: 'Recording' })
      .click();
    t0 = Date.now();
    const pole = await page.evaluate(() => window.__polewright!.design().poles[0]!);
    const at = await page.evaluate((z) => {
      const svg = document.querySelector('svg.pw-plane-svg')!;
      const c = svg.querySelector('circle.pw-unit-circle')!;
      const box = svg.getBoundingClientRect();
      const r = Number(c.getAttribute('r'));
      return {
        x: box.left + Number(c.getAttribute('cx')) + z.re * r,
        y: box.top + Number(c.getAttribute('cy')) - z.im * r,
      };
    }, pole);
    await page.mouse.move(at.x, at.y);
    await page.mouse.down();
    await page.mouse.move(at.x - 20, at.y - 10, { steps: 30 });
    await page.mouse.up();
    await panel.locator(OUTPUT_CURRENT).first().waitFor({ timeout: 600_000 });
    await row('a 30-step root drag, then the whole recording filtered again', Date.now() - t0);
    await settle(page, 3000);
    await row('settled', null);
  } finally {
    clearInterval(sampler);
    if (detail) clearInterval(detail);
    await browser.close();
    stopServer(server);
    rmSync(tmp, { recursive: true, force: true });
  }
  return [
    `Browser memory (PSS of every Chromium process, from /proc) with a ${MINUTES}-minute 48 kHz ${FORMAT_NAME} WAV, headless Chromium, 1440×900; MB above the empty page.`,
    '',
    '| stage | time (s) | now (MB) | peak so far (MB) |',
    '| --- | --: | --: | --: |',
    ...rows,
    '',
    `Switching the time region to the spectra (computed in the worker, ${(FS * 60 * MINUTES).toLocaleString('en')} samples): ${gaps.length} frames, gap between frames median ${cell(median(gaps))} ms, longest ${cell(Math.max(...gaps))} ms, ${gaps.filter((g) => g > 1.5 * (1000 / 60)).length} gaps longer than a frame and a half (25 ms); main-thread tasks of 50 ms or more (the browser's long-task timing): ${longTasks.length}${longTasks.length ? `, longest ${cell(Math.max(...longTasks))} ms` : ''}. A gap also counts the time the page waited for a core on a loaded machine; a long task is the page's own work.`,
  ].join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchMemory());
}
