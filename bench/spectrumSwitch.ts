/**
 * The switch from the recording to its spectra, from a Chromium trace (not a test): with a 48 kHz 16-bit WAV
 * of 10 and 60 minutes loaded and filtered, the page's main-thread tasks from the click on "Spectrum" until
 * the filtered recording's own spectrum is drawn (the Welch runs are in the worker). Reports the longest
 * task's thread CPU time (what the main thread itself spent; the goal: one frame, 16.7 ms) and its wall
 * duration (which on a loaded machine also counts waiting for a core), and how many tasks took more than a
 * frame of CPU. `PW_DISTS=before=<dir>,after=<dir>` alternates built directories run by run;
 * `PW_SWITCH_MINUTES=10,60` the lengths; `PW_SWITCH_RUNS` the runs per build and length (default 3).
 * Run: `npx tsx bench/spectrumSwitch.ts` (or `npm run bench -- switch`).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../e2e/support/chromium.ts';
import { serve, stopServer, traceDrag, waitForServer } from './drag.ts';
import { tasksAfterMark } from './dragTrace.ts';
import { OUTPUT_CURRENT, SPECTRUM_MEASURED, writeLongWav } from './memory.ts';
import { cell, median } from './timing.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const MARK = 'pw-bench-switch';
const FRAME_MS = 1000 / 60;

interface Run {
  longestCpu: number;
  longestWall: number;
  overFrame: number;
  tasks: number;
  seconds: number;
  load: number;
}

async function switchOnce(port: number, wav: string): Promise<Run> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [...CHROMIUM_ARGS, `--explicitly-allowed-ports=${port}`],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    await page.goto(`http://127.0.0.1:${port}/`);
    await page.getByRole('tab', { name: 'Signal' }).click();
    await page.getByTestId('recording-file-input').first().setInputFiles(wav);
    const panel = page.locator('section[aria-label="recording"]');
    await panel.getByTestId('signal-info').waitFor({ timeout: 600_000 });
    await panel.locator(OUTPUT_CURRENT).first().waitFor({ timeout: 600_000 });
    await page.waitForTimeout(1000);
    const load0 = loadavg()[0]!;
    const t0 = Date.now();
    const events = await traceDrag(page, async () => {
      await page.evaluate((m) => performance.mark(m), MARK);
      await page
        .getByRole('radiogroup', { name: 'Time region shows' })
        .getByRole('radio', { name: 'Spectrum' })
        .click({ timeout: 600_000 });
      await page.locator(SPECTRUM_MEASURED).first().waitFor({ timeout: 600_000 });
      // The level read-out's runs follow the spectra; let them finish inside the trace too.
      await page.waitForTimeout(2000);
    });
    const seconds = (Date.now() - t0) / 1000;
    const tasks = tasksAfterMark(events, MARK);
    return {
      longestCpu: Math.max(0, ...tasks.map((t) => t.cpu)),
      longestWall: Math.max(0, ...tasks.map((t) => t.wall)),
      overFrame: tasks.filter((t) => t.cpu > FRAME_MS).length,
      tasks: tasks.length,
      seconds,
      load: (load0 + loadavg()[0]!) / 2,
    };
  } finally {
    await browser.close();
  }
}

export async function benchSpectrumSwitch(): Promise<string> {
  const minutesList = (process.env.PW_SWITCH_MINUTES ?? '10,60').split(',').map(Number);
  const runs = Number(process.env.PW_SWITCH_RUNS ?? 3);
  const spec = process.env.PW_DISTS;
  const builds = spec
    ? spec.split(',').map((kv, i) => {
        const [name, dir] = kv.split('=');
        return { name: name!, dir: dir!, port: Number(process.env.PW_BENCH_PORT ?? 4420) + i };
      })
    : [{ name: 'this', dir: process.env.PW_DIST, port: Number(process.env.PW_BENCH_PORT ?? 4420) }];
  if (!spec && !process.env.PW_DIST)
    execFileSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: ROOT, stdio: 'inherit' });
  const tmp = mkdtempSync(join(tmpdir(), 'pw-switch-'));
  const servers = [];
  const rows: string[] = [];
  try {
    for (const b of builds) {
      servers.push(await serve(b));
      await waitForServer(`http://127.0.0.1:${b.port}/`, 30_000);
    }
    for (const minutes of minutesList) {
      const wav = writeLongWav(tmp, minutes);
      const results = new Map<string, Run[]>(builds.map((b) => [b.name, []]));
      for (let r = 0; r < runs; r++) {
        for (const b of builds) {
          const run = await switchOnce(b.port, wav);
          results.get(b.name)!.push(run);
          console.error(`${minutes} min, ${b.name}: ${JSON.stringify(run)}`);
        }
      }
      for (const b of builds) {
        const rs = results.get(b.name)!;
        const m = (f: (r: Run) => number) => cell(median(rs.map(f)));
        const worst = (f: (r: Run) => number) => cell(Math.max(...rs.map(f)));
        rows.push(
          `| ${minutes} | ${b.name} | ${m((r) => r.longestCpu)} | ${worst((r) => r.longestCpu)} | ${m((r) => r.longestWall)} | ${m((r) => r.overFrame)} | ${m((r) => r.tasks)} | ${m((r) => r.seconds)} | ${m((r) => r.load)} |`,
        );
      }
    }
  } finally {
    for (const s of servers) stopServer(s);
    rmSync(tmp, { recursive: true, force: true });
  }
  return [
    `Switching to the spectra of a loaded, filtered 48 kHz recording: main-thread tasks from the click until the measured "after" spectrum is drawn and 2 s more (headless Chromium, 1440×900); medians of ${runs} runs per build, builds alternated run by run.`,
    '',
    '| minutes | build | longest task CPU (ms) | worst run (ms) | longest task wall (ms) | tasks over 16.7 ms CPU | tasks | click → measured + 2 s (s) | load |',
    '| --: | --- | --: | --: | --: | --: | --: | --: | --: |',
    ...rows,
  ].join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchSpectrumSwitch());
}
