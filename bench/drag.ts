/**
 * Scripted drag benchmark (not a test): serves one or more production builds with `vite preview`, opens each
 * in headless Debian Chromium and drags a pole pair along an arc with real (CDP) mouse events, one move per
 * frame, in every side tab, with the |H| shading off and on, without and with a 10-minute 48 kHz recording
 * loaded, at several orders. Reports per move the main-thread work read from a Chromium trace (steadier than
 * wall time on a shared machine) beside the wall-clock figures of the in-page probe, and the load average.
 *
 * Run: `npx tsx bench/drag.ts` (or `npm run bench -- drag`) builds the working tree and measures it.
 * `PW_DIST=<dir>` serves that already built directory instead; `PW_DISTS=before=<dir>,after=<dir>` serves
 * several and alternates between them configuration by configuration in one session, so a comparison sees
 * the same machine load. Narrower runs: PW_DRAG_ORDERS=8,32, PW_DRAG_TABS=system,design,
 * PW_DRAG_RECORDING=off|on, PW_DRAG_SHADING=off|on, PW_DRAG_TARGET=off|on (default off: whether the design carries
 * 16-bit target settings, so the quantized filter is drawn; a comma list alternates them drag by drag), PW_DRAG_STEPS=120, PW_BENCH_PORT=4412 (first port), PW_DRAG_TRACE_DIR=<dir> keeps the traces, PW_DRAG_CSS='<rules>' tries extra style rules.
 */
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { get } from 'node:http';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../e2e/support/chromium.ts';
import { installDragProbe, nextSample, zToClient, type DragSample } from './dragPage.ts';
import { TRACE_CATEGORIES, tasksAfterMark, workPerMove, type TraceEvent } from './dragTrace.ts';
import { cell, median, percentile } from './timing.ts';
import { runDesigner, type DesignerSpec } from '../src/core/design/index.ts';
import { maskFromDesigner } from '../src/core/mask/index.ts';
import { encodeLink } from '../src/share/link/codec.ts';
import { DEFAULT_IMPLEMENTATION } from '../src/core/fixed/index.ts';
import type { Design } from '../src/core/model/design.ts';
import { makeHum, makePinkNoise, writeWav } from '../src/core/signal/index.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const POLE = 'svg.pw-plane-svg g[data-kind="pole"][data-index="0"]:not([data-mirror])';
const FS = 48000;
const RECORDING_SECONDS = 600;
export const TABS = ['system', 'design', 'target', 'signal', 'share'] as const;
export const TAB_LABEL: Record<(typeof TABS)[number], string> = {
  system: 'System',
  design: 'Design',
  target: 'Target',
  signal: 'Signal',
  share: 'Share',
};

const env = (k: string) => process.env[k]?.trim() || undefined;
const list = (k: string, all: readonly string[]) => env(k)?.split(',') ?? [...all];
const STEPS = Number(env('PW_DRAG_STEPS') ?? 120);
/**
 * Orders to drag at; 'auto' is an auto-order elliptic design (the costliest designer to run again);
 * 'fir128' an order-128 equiripple FIR low-pass, whose dragged zero takes its reciprocal partner along; 'fir512'
 * (any 'firN' above 128) an order-N least-squares FIR low-pass with the same bands (the equiripple exchange does
 * not settle there), whose quantized-tap zeros, with a target set, are found in a worker.
 */
type Order = number | 'auto' | `fir${number}`;
const ORDERS: Order[] = list('PW_DRAG_ORDERS', ['2', '8', '32', '64', 'fir128']).map((o) =>
  o === 'auto' || /^fir\d+$/.test(o) ? (o as Order) : Number(o),
);
const TAB_IDS = list('PW_DRAG_TABS', TABS) as (typeof TABS)[number][];
const RECORDING = list('PW_DRAG_RECORDING', ['off', 'on']);
const SHADING = list('PW_DRAG_SHADING', ['off', 'on']);
const TARGETS = list('PW_DRAG_TARGET', ['off']);
const FIRST_PORT = Number(env('PW_BENCH_PORT') ?? 4412);

/**
 * An order-N Butterworth low-pass at 48 kHz (N/2 pole pairs, N zeros at z = −1) designed by the engine with
 * its requirement (pass band to 4 kHz, stop band from 8 kHz), so the designer's status and the mask are live.
 */
function designOfOrder(order: Order): Design {
  const spec: DesignerSpec =
    typeof order === 'string' && order.startsWith('fir')
      ? ({
          kind: 'iir',
          fs: FS,
          family: order === 'fir128' ? 'equiripple' : 'leastsquares',
          response: 'lowpass',
          order: Number(order.slice(3)),
          passbandHz: [4000],
          stopbandHz: [5000],
          rippleDb: 1,
          attenuationDb: 60,
        } as DesignerSpec)
      : order === 'auto'
        ? {
            kind: 'iir',
            fs: FS,
            family: 'elliptic',
            response: 'lowpass',
            order: 'auto',
            passbandHz: [4000],
            stopbandHz: [4400],
            rippleDb: 0.5,
            attenuationDb: 80,
          }
        : {
            kind: 'iir',
            fs: FS,
            family: 'butterworth',
            response: 'lowpass',
            order: order as number,
            edgesHz: [6000],
            passbandHz: [4000],
            stopbandHz: [8000],
            rippleDb: 1,
            attenuationDb: 40,
          };
  const r = runDesigner(spec);
  if (!r.ok) throw new Error(`bench design of order ${order}: ${r.error.message}`);
  const mask = maskFromDesigner(spec);
  return {
    sampleRate: FS,
    zeros: r.value.zpk.zeros,
    poles: r.value.zpk.poles,
    gainRule: { kind: 'fixed', value: r.value.zpk.gain },
    name: `Bench order ${order}`,
    note: r.value.note,
    designer: spec,
    ...(mask ? { mask } : {}),
  };
}

/** Ten minutes at 48 kHz, 16-bit: 50 Hz hum with harmonics over pink noise (invented), in a temporary file. */
export function writeRecording(dir: string): string {
  const n = FS * RECORDING_SECONDS;
  const hum = makeHum(n, FS, { fundamentalHz: 50, harmonicAmplitudes: [0.2, 0.05, 0.03], driftHz: 0.1 });
  const noise = makePinkNoise(n, 7, 0.05);
  for (let i = 0; i < n; i++) hum[i] = hum[i]! + noise[i]!;
  const { bytes } = writeWav({ format: 'i16', sampleRate: FS, channels: [hum] });
  const path = join(dir, 'hopper-10min.wav');
  writeFileSync(path, bytes);
  return path;
}

/** True when something answers 200 at the address (node:http, since fetch refuses some local ports). */
function answers(url: string): Promise<boolean> {
  return new Promise<boolean>((resolve) => {
    const req = get(url, (res) => {
      res.resume();
      resolve(res.statusCode === 200);
    });
    req.on('error', () => resolve(false));
  });
}

/** Resolves once the server answers 200. */
export async function waitForServer(url: string, ms: number): Promise<void> {
  const until = Date.now() + ms;
  const ok = () => answers(url);
  while (Date.now() < until) {
    if (await ok()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`vite preview did not answer on ${url}`);
}

export interface Build {
  name: string;
  dir: string | undefined;
  port: number;
  server?: ChildProcess;
}

/** Serves a build with vite preview (in its own process group); refuses a port something already answers on. */
export async function serve(b: Build): Promise<ChildProcess> {
  if (await answers(`http://127.0.0.1:${b.port}/`))
    throw new Error(`bench: port ${b.port} is already serving something; stop it or set PW_BENCH_PORT`);
  return spawnPreview(b);
}

function spawnPreview(b: Build): ChildProcess {
  return spawn(
    'npx',
    [
      'vite',
      'preview',
      '--port',
      String(b.port),
      '--strictPort',
      '--host',
      '127.0.0.1',
      ...(b.dir ? ['--outDir', b.dir] : []),
    ],
    { cwd: ROOT, stdio: 'ignore', detached: true },
  );
}

/** Stops a server started by serve() (its whole process group), if it is still running. */
export function stopServer(server: ChildProcess): void {
  try {
    if (server.pid) process.kill(-server.pid, 'SIGTERM');
  } catch {
    // Already gone.
  }
}

/** Reads a trace returned as a stream by Tracing.end. */
export async function traceDrag(page: Page, drag: () => Promise<void>): Promise<TraceEvent[]> {
  const cdp = await page.context().newCDPSession(page);
  const done = new Promise<string>((resolve) =>
    cdp.once('Tracing.tracingComplete', (e) => resolve(e.stream!)),
  );
  await cdp.send('Tracing.start', { categories: TRACE_CATEGORIES, transferMode: 'ReturnAsStream' });
  await drag();
  await cdp.send('Tracing.end');
  const handle = await done;
  let text = '';
  for (;;) {
    const chunk = await cdp.send('IO.read', { handle });
    text += chunk.base64Encoded ? Buffer.from(chunk.data, 'base64').toString('utf8') : chunk.data;
    if (chunk.eof) break;
  }
  await cdp.send('IO.close', { handle });
  await cdp.detach();
  const keep = env('PW_DRAG_TRACE_DIR');
  if (keep) writeFileSync(join(keep, `trace-${Date.now()}.json`), text);
  const parsed = JSON.parse(text) as TraceEvent[] | { traceEvents: TraceEvent[] };
  return Array.isArray(parsed) ? parsed : parsed.traceEvents;
}

interface Result {
  samples: DragSample[];
  /** Main-thread CPU and task wall time per move, from the trace. */
  cpu: number[];
  wall: number[];
  load: number;
  /** Main-thread CPU of the release (mouse up and the 400 ms after it): all tasks, and the longest one. */
  release: { cpu: number; longest: number };
}

/**
 * What a drag moves: pole 0, or for an FIR (every pole at the origin) the first zero of a quadruplet inside
 * the circle (its reciprocal partner moves with it).
 */
function dragTarget(): { kind: 'pole' | 'zero'; index: number } {
  const d = window.__polewright!.design();
  if (!d.poles.every((p) => p.re === 0 && p.im === 0)) return { kind: 'pole', index: 0 };
  const index = d.zeros.findIndex((z) => {
    const r2 = z.re * z.re + z.im * z.im;
    return (
      z.im > 0 && r2 < 0.98 && d.zeros.some((w) => Math.hypot(w.re - z.re / r2, w.im - z.im / r2) < 1e-6)
    );
  });
  return { kind: 'zero', index };
}

/** One drag of pole 0, or of an FIR's quadruplet zero (see the file comment), with the trace of it. */
export async function dragOnce(
  page: Page,
  hooks: { moves?: (run: () => Promise<void>) => Promise<void> } = {},
): Promise<Result & { events: TraceEvent[] }> {
  const target = await page.evaluate(dragTarget);
  if (target.index < 0) throw new Error('bench: the FIR design has no quadruplet of zeros to drag');
  await page.evaluate(
    installDragProbe,
    target.kind === 'pole'
      ? POLE
      : `svg.pw-plane-svg g[data-kind="zero"][data-index="${target.index}"]:not([data-mirror])`,
  );
  // From the root where it is, along its own circle 40° up and back (every step a new place).
  const pole = await page.evaluate((t) => {
    const d = window.__polewright!.design();
    return (t.kind === 'pole' ? d.poles : d.zeros)[t.index]!;
  }, target);
  const r = Math.hypot(pole.re, pole.im);
  const theta = Math.atan2(pole.im, pole.re);
  const arc = Array.from({ length: STEPS + 1 }, (_, i) => {
    const up = 1 - Math.abs((2 * i) / STEPS - 1);
    const w = Math.min(theta + ((40 * Math.PI) / 180) * up, (175 * Math.PI) / 180);
    return { re: r * Math.cos(w), im: r * Math.sin(w) };
  });
  const points = await page.evaluate(zToClient, arc);
  await page.mouse.move(points[0]!.x, points[0]!.y);
  await page.mouse.down();
  await page.evaluate(() => (window.__dragBench!.samples.length = 0));
  const load0 = loadavg()[0]!;
  const moves = async () => {
    for (let i = 1; i <= STEPS; i++) {
      await page.mouse.move(points[i]!.x, points[i]!.y);
      await page.evaluate(nextSample, i);
    }
  };
  const events = await traceDrag(page, () => (hooks.moves ? hooks.moves(moves) : moves()));
  const load = (load0 + loadavg()[0]!) / 2;
  // The release: what the page does once the drag ends (the quantized filter drawn again, if a target is set).
  const releaseEvents = await traceDrag(page, async () => {
    await page.evaluate(() => performance.mark('pw-bench-release'));
    await page.mouse.up();
    await page.waitForTimeout(400);
  });
  const releaseTasks = tasksAfterMark(releaseEvents, 'pw-bench-release');
  const release = {
    cpu: releaseTasks.reduce((a, t) => a + t.cpu, 0),
    longest: Math.max(0, ...releaseTasks.map((t) => t.cpu)),
  };
  const samples = await page.evaluate(() => window.__dragBench!.samples);
  await page.keyboard.press('Control+z');
  // Let the release's own work (refinement, background jobs) finish before the next drag starts.
  await page.waitForTimeout(400);
  const { cpu, wall } = workPerMove(events);
  return {
    samples,
    cpu: cpu.slice(0, samples.length),
    wall: wall.slice(0, samples.length),
    load,
    release,
    events,
  };
}

/** A page of the build at the order, with the 10-minute recording loaded when given. */
export async function openPage(
  browser: Browser,
  b: Build,
  order: Order,
  recording: string | null,
  target = false,
): Promise<Page> {
  const css = env('PW_DRAG_CSS');
  // PW_DRAG_CSS: extra style rules to try (the page's content security policy is bypassed for them).
  const context = await browser.newContext({
    viewport: { width: 1440, height: 900 },
    bypassCSP: css !== undefined,
  });
  const page = await context.newPage();
  const design = target
    ? { ...designOfOrder(order), implementation: DEFAULT_IMPLEMENTATION }
    : designOfOrder(order);
  const link = encodeLink({ design, view: {} });
  await page.goto(`http://127.0.0.1:${b.port}/#${link}`);
  await page.waitForFunction((n) => window.__polewright?.design().poles.length === n, design.poles.length);
  if (css) await page.addStyleTag({ content: css });
  if (recording) {
    await page.getByRole('tab', { name: 'Signal' }).click();
    await page.getByTestId('recording-file-input').first().setInputFiles(recording);
    await page
      .locator('section[aria-label="recording"]')
      .getByTestId('signal-info')
      .waitFor({ timeout: 120_000 });
    await page.waitForTimeout(1000);
  }
  return page;
}

const stats = (xs: number[]) => `${cell(median(xs))} | ${cell(percentile(xs, 95))}`;

function row(
  build: string,
  order: number | string,
  tab: string,
  shading: string,
  rec: string,
  target: string,
  r: Result,
): string {
  const drawn = r.samples.filter((x) => x.drawn).length;
  const probe = (k: 'work' | 'latency') => stats(r.samples.map((x) => x[k]));
  const release = `${cell(r.release.cpu)} | ${cell(r.release.longest)}`;
  return `| ${build} | ${rec} | ${order} | ${tab} | ${shading} | ${target} | ${stats(r.cpu)} | ${stats(r.wall)} | ${probe('work')} | ${probe('latency')} | ${drawn}/${r.samples.length} | ${release} | ${r.load.toFixed(1)} |`;
}

/**
 * The builds a page benchmark compares, from port `firstPort` on: PW_DISTS=name=dir,… (built folders), else
 * this tree's (PW_DIST names a build folder; without it the tree is built now).
 */
export function buildsFromEnv(firstPort: number): Build[] {
  const many = env('PW_DISTS');
  if (many)
    return many.split(',').map((pair, i) => {
      const [name, dir] = pair.split('=');
      return { name: name!, dir, port: firstPort + i };
    });
  const dir = env('PW_DIST');
  if (!dir) execFileSync('npx', ['vite', 'build', '--logLevel', 'error'], { cwd: ROOT, stdio: 'inherit' });
  return [{ name: 'this', dir, port: firstPort }];
}

/** Serves every build and opens one browser that may reach their ports. */
export async function serveBuilds(builds: Build[]): Promise<Browser> {
  for (const b of builds) b.server = await serve(b);
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [...CHROMIUM_ARGS, `--explicitly-allowed-ports=${builds.map((b) => b.port).join(',')}`],
  });
}

/** Runs the benchmark and returns a markdown table (times in ms). */
export async function benchDrag(): Promise<string> {
  const builds = buildsFromEnv(FIRST_PORT);
  const tmp = mkdtempSync(join(tmpdir(), 'pw-drag-'));
  const recording = RECORDING.includes('on') ? writeRecording(tmp) : null;
  const browser = await serveBuilds(builds);
  const rows: string[] = [];
  try {
    for (const b of builds) await waitForServer(`http://127.0.0.1:${b.port}/`, 30_000);
    for (const rec of RECORDING) {
      for (const order of ORDERS) {
        const pages = new Map<string, Page>();
        for (const b of builds)
          for (const t of TARGETS)
            pages.set(
              `${b.name} ${t}`,
              await openPage(browser, b, order, rec === 'on' ? recording : null, t === 'on'),
            );
        for (const tab of TAB_IDS) {
          for (const shading of SHADING) {
            for (const b of builds) {
              for (const t of TARGETS) {
                const page = pages.get(`${b.name} ${t}`)!;
                await page.getByRole('tab', { name: TAB_LABEL[tab] }).click();
                await page.getByLabel('|H| shading').setChecked(shading === 'on');
                const r = await dragOnce(page);
                const label = order === 'auto' ? `auto (${2 * designOfOrder('auto').poles.length})` : order;
                const line = row(b.name, label, tab, shading, rec, t, r);
                rows.push(line);
                console.error(line);
              }
            }
          }
        }
        for (const p of pages.values()) await p.context().close();
      }
    }
    const version = browser.version();
    return [
      `${STEPS}-step drag of a pole pair (40° along its circle and back) of an order-N Butterworth low-pass (designer and mask live), or for fir128 (firN) of a zero quadruplet (its stored zero inside the circle, the reciprocal following) of an order-128 equiripple (order-N least-squares) FIR low-pass, one mouse move per frame, headless Chromium ${version} (software rendering), 1440×900; recording: a 10-minute 48 kHz 16-bit WAV loaded and shown before/after. Times in ms; load = 1-minute load average during the drag.`,
      '',
      '| build | recording | order | tab | shading | target | main-thread CPU median | p95 | main-thread tasks (wall) median | p95 | probe frame work median | p95 | event→painted median | p95 | drawn | release CPU | longest release task | load |',
      '| --- | --- | --: | --- | --- | --- | --: | --: | --: | --: | --: | --: | --: | --: | --- | --: | --: | --: |',
      ...rows,
      '',
      'main-thread CPU = the thread CPU time of the renderer main thread’s tasks per move in the Chromium trace (input dispatch, React, the animation frame, style, layout, paint and the main-thread side of the compositor commit; the probe’s own read-out included, the benchmark’s DevTools calls left out); main-thread tasks (wall) = the same tasks’ durations, which also count preemption by other work on a loaded machine. probe frame work = script + render+paint by the in-page stopwatches (idle time excluded). target on = the design carries 16-bit target settings (the quantized filter drawn when no root is dragged); release CPU = the main thread’s CPU from the mouse up to 400 ms after it, with its longest task. Goal: main-thread p95 ≤ 16.7 ms (stretch 8.3 ms), every update drawn.',
    ].join('\n');
  } finally {
    await browser.close();
    for (const b of builds) if (b.server) stopServer(b.server);
    rmSync(tmp, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchDrag());
}
