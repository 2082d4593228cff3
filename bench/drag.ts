/**
 * Scripted drag benchmark (not a test): builds the page, serves it with `vite preview` on port 4190, opens it
 * in headless Debian Chromium, loads an order-32 design through the system entry and drags a pole pair
 * along a 300-step arc with real (CDP) mouse events, one move per frame. Reports the frame cost and the
 * time from pointer event to every view updated, with the |H| shading off and on.
 * Run: `npx tsx bench/drag.ts` (or `npm run bench -- drag`). With PW_DIST=<dir> it serves that already built
 * directory instead of building, so two builds can be measured alternately in one session.
 */
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { get } from 'node:http';
import { fileURLToPath } from 'node:url';
import { chromium, type Page } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../e2e/support/chromium.ts';
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

/** Resolves once the server answers 200 (node:http, since fetch refuses port 4190 as a "bad port"). */
async function waitForServer(url: string, ms: number): Promise<void> {
  const until = Date.now() + ms;
  const ok = () =>
    new Promise<boolean>((resolve) => {
      const req = get(url, (res) => {
        res.resume();
        resolve(res.statusCode === 200);
      });
      req.on('error', () => resolve(false));
    });
  while (Date.now() < until) {
    if (await ok()) return;
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

type Metric = 'work' | 'script' | 'render' | 'latency';

function row(label: string, s: DragSample[]): string {
  const stats = (k: Metric) => {
    const xs = s.map((x) => x[k]);
    return `${cell(median(xs))} | ${cell(percentile(xs, 95))}`;
  };
  const drawn = s.filter((x) => x.drawn).length;
  return `| ${label} | ${stats('work')} | ${stats('script')} | ${stats('render')} | ${stats('latency')} | ${drawn}/${s.length} |`;
}

/** Runs the benchmark and returns a markdown table (times in ms). */
export async function benchDrag(): Promise<string> {
  const dist = process.env.PW_DIST;
  if (!dist) {
    execFileSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: ROOT, stdio: 'inherit' });
  }
  const server: ChildProcess = spawn(
    'npx',
    [
      'vite',
      'preview',
      '--port',
      String(PORT),
      '--strictPort',
      '--host',
      '127.0.0.1',
      ...(dist ? ['--outDir', dist] : []),
    ],
    {
      cwd: ROOT,
      stdio: 'ignore',
      detached: true,
    },
  );
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      ...CHROMIUM_ARGS,
      // 4190 is on Chromium's list of restricted ports; allow it for this local server only.
      `--explicitly-allowed-ports=${PORT}`,
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
      '| shading | frame work median | p95 | script median | p95 | render+paint median | p95 | event→painted median | p95 | updates drawn |',
      '| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |',
      row('off', off),
      row('on (64-cell grid while dragging)', on),
      '',
      'frame work = script (first pointermove listener → React render of every panel done) + render+paint (animation-frame callback → task posted from it, after style, layout and paint); idle time waiting for the frame is left out. event→painted: from the event timestamp to the end of that paint. Goal: frame work p95 < 16.7 ms, every update drawn.',
    ].join('\n');
  } finally {
    await browser.close();
    if (server.pid) process.kill(-server.pid, 'SIGTERM');
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchDrag());
}
