/**
 * Scripted drag benchmark (not a test): builds the page, serves it with `vite preview` on port 4190, opens it
 * in headless Debian Chromium, loads an order-32 design through the system entry and drags a pole pair
 * along a 300-step arc with real (CDP) mouse events, one move per frame. Reports the frame cost and the
 * time from pointer event to every view updated, with the |H| shading off and on.
 * Run: `npx tsx bench/drag.ts` (or `npm run bench -- drag`).
 */
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { chromium, type Page } from '@playwright/test';
import { installDragProbe, nextSample, zToClient, type DragSample } from './dragPage.ts';
import { cell, median, percentile } from './timing.ts';

const PORT = 4190;
const STEPS = 300;
const ROOT = fileURLToPath(new URL('..', import.meta.url));
const POLE = 'svg.pw-plane-svg g[data-kind="pole"][data-index="0"]:not([data-mirror])';

/** Order 32: 16 zero pairs on the unit circle and 16 pole pairs at radius 0.9–0.97, spread over the band. */
function order32Text(): string {
  const zeros: string[] = [];
  const poles: string[] = [];
  for (let i = 0; i < 16; i++) {
    zeros.push(`1∠${(7 + 10.5 * i).toFixed(1)}°`);
    poles.push(`${(0.9 + 0.004 * i).toFixed(3)}∠${(4 + 10.5 * i).toFixed(1)}°`);
  }
  return `zeros: ${zeros.join(', ')}; poles: ${poles.join(', ')}; gain: 1`;
}

async function waitForServer(url: string, ms: number): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`vite preview did not answer on ${url}`);
}

async function dragOnce(page: Page): Promise<DragSample[]> {
  await page.evaluate(installDragProbe, POLE);
  const arc = (i: number) => {
    const w = ((4 + (60 * i) / STEPS) * Math.PI) / 180;
    return { re: 0.9 * Math.cos(w), im: 0.9 * Math.sin(w) };
  };
  const from = await page.evaluate(zToClient, arc(0));
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.evaluate(() => (window.__dragBench!.samples.length = 0));
  for (let i = 1; i <= STEPS; i++) {
    const p = await page.evaluate(zToClient, arc(i));
    await page.mouse.move(p.x, p.y);
    await page.evaluate(nextSample, i);
  }
  await page.mouse.up();
  const samples = await page.evaluate(() => window.__dragBench!.samples);
  await page.keyboard.press('Control+z');
  return samples;
}

function row(label: string, s: DragSample[]): string {
  const col = (k: 'frame' | 'handler' | 'painted') => s.map((x) => x[k]);
  const drawn = s.filter((x) => x.drawn).length;
  return `| ${label} | ${cell(median(col('frame')))} | ${cell(percentile(col('frame'), 95))} | ${cell(median(col('handler')))} | ${cell(percentile(col('handler'), 95))} | ${cell(median(col('painted')))} | ${cell(percentile(col('painted'), 95))} | ${drawn}/${s.length} |`;
}

/** Runs the benchmark and returns a markdown table (times in ms). */
export async function benchDrag(): Promise<string> {
  execFileSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: ROOT, stdio: 'inherit' });
  const server: ChildProcess = spawn(
    'npx',
    ['vite', 'preview', '--port', String(PORT), '--strictPort', '--host', '127.0.0.1'],
    {
      cwd: ROOT,
      stdio: 'ignore',
      detached: true,
    },
  );
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  try {
    await waitForServer(`http://127.0.0.1:${PORT}/`, 30_000);
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    await page.goto(`http://127.0.0.1:${PORT}/`);
    await page.getByLabel('System text').fill(order32Text());
    await page.getByRole('button', { name: 'Apply' }).click();
    await page.waitForFunction(() => window.__polewright?.design().poles.length === 16);
    const off = await dragOnce(page);
    await page.getByLabel('|H| shading').check();
    const on = await dragOnce(page);
    const version = browser.version();
    return [
      `Order-32 design (16 zero pairs, 16 pole pairs), ${STEPS}-step drag of a pole pair, one mouse move per frame, headless Chromium ${version} (software rendering), 1440×900. Times in ms.`,
      '',
      '| run | frame median | frame p95 | event→views rendered median | p95 | event→frame painted median | p95 | updates drawn |',
      '| --- | --- | --- | --- | --- | --- | --- | --- |',
      row('|H| shading off', off),
      row('|H| shading on (64×64 while dragging)', on),
      '',
      'frame: from the first pointermove listener to a task posted from the next animation frame (after style, layout, paint); event→views rendered: to the end of the React render of every panel; event→frame painted: from the event timestamp. Goal: frame p95 < 16.7 ms, every update drawn.',
    ].join('\n');
  } finally {
    await browser.close();
    if (server.pid) process.kill(-server.pid, 'SIGTERM');
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchDrag());
}
