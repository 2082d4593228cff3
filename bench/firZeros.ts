/**
 * The main thread's work when the quantized taps of a long FIR change (not a test): serves one or more
 * production builds with `vite preview`, opens each with a long FIR carrying 16-bit target settings and
 * types the coefficient word on the Target page, 12 and 16 bits in turn, tracing the main thread from each
 * Enter until the plane's key names the new word with its zeros drawn, plus 300 ms (the Target page's own
 * work on the new taps is in there on every build). On a build that finds the zeros on the page the root finding
 * of the new taps is in those tasks; on one that finds them in a worker it is not.
 *
 * Run: `PW_DISTS=before=<dir>,after=<dir> npx tsx bench/firZeros.ts` (or PW_DIST=<dir>; nothing: builds the
 * working tree). PW_ZEROS_ORDERS=512,1024 (512: the designer's least-squares low-pass; 1024: a Hamming-window
 * sinc low-pass typed as taps), PW_ZEROS_STEPS=8 key presses per build and order, PW_BENCH_PORT=4412.
 */
import { loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { Browser, Page } from '@playwright/test';
import { runDesigner, type DesignerSpec } from '../src/core/design/index.ts';
import { DEFAULT_IMPLEMENTATION } from '../src/core/fixed/index.ts';
import type { Design } from '../src/core/model/design.ts';
import { tfToZpk } from '../src/core/system/fromCoefficients.ts';
import type { Zpk } from '../src/core/types.ts';
import { encodeLink } from '../src/share/link/codec.ts';
import { buildsFromEnv, serveBuilds, stopServer, traceDrag, waitForServer, type Build } from './drag.ts';
import { tasksAfterMark } from './dragTrace.ts';
import { cell, median } from './timing.ts';

const env = (k: string) => process.env[k];
const ORDERS = (env('PW_ZEROS_ORDERS') ?? '512,1024').split(',').map(Number);
const STEPS = Number(env('PW_ZEROS_STEPS') ?? 8);
const FS = 48000;

/** The FIR of the order at 48 kHz with 16-bit target settings (see the file comment). */
function longFir(order: number): Design {
  if (order <= 512) {
    const spec = {
      kind: 'iir',
      fs: FS,
      family: 'leastsquares',
      response: 'lowpass',
      order,
      passbandHz: [4000],
      stopbandHz: [5000],
      rippleDb: 1,
      attenuationDb: 60,
    } as DesignerSpec;
    const r = runDesigner(spec);
    if (!r.ok) throw new Error(r.error.message);
    return asDesign(order, r.value.zpk);
  }
  // a Hamming-window sinc low-pass, cut-off 4.5 kHz (common practice), typed as its taps
  const fc = 4500 / FS;
  const b = Array.from({ length: order + 1 }, (_, n) => {
    const k = n - order / 2;
    const sinc = k === 0 ? 2 * fc : Math.sin(2 * Math.PI * fc * k) / (Math.PI * k);
    return sinc * (0.54 - 0.46 * Math.cos((2 * Math.PI * n) / order));
  });
  return asDesign(order, tfToZpk({ b, a: [1] }));
}

/** The roots as a design at 48 kHz with 16-bit target settings. */
function asDesign(order: number, z: Zpk): Design {
  return {
    sampleRate: FS,
    zeros: z.zeros,
    poles: z.poles,
    gainRule: { kind: 'fixed', value: z.gain },
    name: `Bench FIR order ${order}`,
    note: '',
    implementation: DEFAULT_IMPLEMENTATION,
  };
}

/** Waits until the plane draws the zeros of the taps of the given word. */
async function zerosDrawn(page: Page, bits: number): Promise<void> {
  await page
    .getByTestId('quantized-tap-zeros-key')
    .filter({ hasText: `zeros of the ${bits}-bit` })
    .waitFor({ timeout: 60_000 });
}

interface Step {
  longest: number;
  cpu: number;
}

async function measure(browser: Browser, b: Build, order: number): Promise<Step[]> {
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  const design = longFir(order);
  await page.goto(`http://127.0.0.1:${b.port}/#${encodeLink({ design, view: {} })}`);
  await zerosDrawn(page, 16);
  await page.getByRole('tab', { name: 'Target' }).click();
  const field = page.getByRole('textbox', { name: 'Coefficients' });
  await page.waitForTimeout(500);
  const steps: Step[] = [];
  for (let i = 0; i < STEPS; i++) {
    const bits = i % 2 === 0 ? 12 : 16;
    await field.fill(String(bits));
    const events = await traceDrag(page, async () => {
      await page.evaluate(() => performance.mark('pw-bench-zeros'));
      await field.press('Enter');
      await zerosDrawn(page, bits);
      await page.waitForTimeout(300);
    });
    const tasks = tasksAfterMark(events, 'pw-bench-zeros');
    steps.push({
      longest: Math.max(0, ...tasks.map((t) => t.cpu)),
      cpu: tasks.reduce((a, t) => a + t.cpu, 0),
    });
    await page.waitForTimeout(300);
  }
  await page.close();
  return steps;
}

export async function benchFirZeros(): Promise<string> {
  const builds = buildsFromEnv(Number(env('PW_BENCH_PORT') ?? 4412));
  const browser = await serveBuilds(builds);
  const rows: string[] = [];
  try {
    for (const b of builds) await waitForServer(`http://127.0.0.1:${b.port}/`, 30_000);
    for (const order of ORDERS) {
      // builds alternated per order, so both see the same load
      for (const b of builds) {
        const load0 = loadavg()[0]!;
        const steps = await measure(browser, b, order);
        const load = (load0 + loadavg()[0]!) / 2;
        const line = `| ${b.name} | ${order} | ${cell(median(steps.map((s) => s.longest)))} | ${cell(Math.max(...steps.map((s) => s.longest)))} | ${cell(median(steps.map((s) => s.cpu)))} | ${load.toFixed(1)} |`;
        rows.push(line);
        console.error(line);
      }
    }
    return [
      `The coefficient word of a long FIR typed on the Target page, 12 and 16 bits in turn, ${STEPS} changes per row, headless Chromium ${browser.version()}; main-thread CPU from the Enter until the new zeros are drawn plus 300 ms (ms).`,
      '',
      '| build | order | longest task median | longest task max | all tasks median | load |',
      '| --- | --: | --: | --: | --: | --: |',
      ...rows,
    ].join('\n');
  } finally {
    await browser.close();
    for (const b of builds) if (b.server) stopServer(b.server);
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  console.log(await benchFirZeros());
}
