/**
 * What is not in the first view loads after it: the side pages and recording tools open at once when they
 * are there; the design reader, link codec and parser arrive after the first paint, and an autosaved
 * session, a link or a dropped file that needs one of them waits for it without losing anything.
 */
import { expect, test, type Page } from '@playwright/test';
import { encodeLink } from '../src/share/link/index.ts';
import { demoDesign } from '../src/store/demo.ts';
import { openWorkbench, readDesign, saveScreenshot, stabilityBanner } from './support/app.ts';
import { dropFile } from './support/files.ts';
import { quantizedMarks } from './support/target.ts';
import { DEFAULT_IMPLEMENTATION } from '../src/core/fixed/index.ts';

/** Records whether a "Loading the …" placeholder is ever put into the page from now on. */
async function watchForPlaceholders(page: Page): Promise<() => Promise<boolean>> {
  await page.evaluate(() => {
    const w = window as unknown as { __sawPlaceholder: boolean };
    w.__sawPlaceholder = document.querySelector('.pw-lazy-loading') !== null;
    new MutationObserver(() => {
      if (document.querySelector('.pw-lazy-loading')) w.__sawPlaceholder = true;
    }).observe(document.body, { childList: true, subtree: true });
  });
  return () => page.evaluate(() => (window as unknown as { __sawPlaceholder: boolean }).__sawPlaceholder);
}

test('after the first view the side pages and recording tools are prefetched, and open with no placeholder', async ({
  page,
}) => {
  const scripts: string[] = [];
  page.on('request', (r) => {
    if (r.resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
  });
  await openWorkbench(page);
  // the prefetch after the first paint fetches every lazily loaded part
  await expect
    .poll(() =>
      ['DesignPage', 'TargetPage', 'SignalPage', 'SharePage', 'SignalPanel'].filter(
        (n) => !scripts.some((s) => s.includes(n)),
      ),
    )
    .toEqual([]);
  await page.waitForLoadState('networkidle');
  const sawPlaceholder = await watchForPlaceholders(page);
  for (const [tab, content] of [
    [
      'Design',
      page
        .getByRole('tabpanel')
        .getByRole('button', { name: /design/i })
        .first(),
    ],
    ['Target', page.getByRole('tabpanel').getByRole('heading').first()],
    ['Signal', page.getByRole('tabpanel').getByRole('button').first()],
    ['Share', page.getByRole('tabpanel').getByRole('button').first()],
  ] as const) {
    await page.getByRole('tab', { name: tab }).click();
    await expect(content).toBeVisible();
  }
  expect(await sawPlaceholder()).toBe(false);
});

test('a page whose code has not arrived says so, and one that cannot be fetched says why and keeps the design', async ({
  page,
}, testInfo) => {
  let release: () => void = () => undefined;
  const held = new Promise<void>((r) => (release = r));
  await page.route(/DesignPage-[\w-]+\.js$/, async (route) => {
    await held;
    await route.continue();
  });
  await page.route(/TargetPage-[\w-]+\.js$/, (route) => route.abort('connectionfailed'));
  await openWorkbench(page);
  const before = await readDesign(page);

  await page.getByRole('tab', { name: 'Design' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Loading the Design page…' })).toBeVisible();
  release();
  await expect(page.getByRole('status').filter({ hasText: 'Loading the Design page…' })).toHaveCount(0);
  await expect(page.getByRole('tabpanel').getByRole('button').first()).toBeVisible();

  await page.getByRole('tab', { name: 'Target' }).click();
  await expect(
    page.getByRole('alert').filter({ hasText: 'The Target page could not be loaded' }),
  ).toBeVisible();
  await saveScreenshot(page, testInfo, 'target-page-not-loaded');
  expect(await readDesign(page)).toEqual(before);
});

/** A design document of the first release (version 1): only the full design reader reads it. */
const FIRST_RELEASE_DESIGN = {
  polewright: 'design',
  version: 1,
  name: 'Loom tension: 19 Hz sway notch (first release)',
  note: '',
  sampleRate: 500,
  zeros: [{ re: 0.9716317329146739, im: 0.23649899702372468, multiplicity: 1 }],
  poles: [{ re: 0.9424827809272337, im: 0.22940402711301294, multiplicity: 1 }],
  gainRule: { kind: 'dc' },
};

/** Holds every request for a script whose name starts with `chunk` until the returned function is called. */
async function holdChunk(page: Page, chunk: string): Promise<() => void> {
  let release: () => void = () => undefined;
  const held = new Promise<void>((r) => (release = r));
  await page.route(new RegExp(`/${chunk}-[\\w-]+\\.js$`), async (route) => {
    await held;
    await route.continue();
  });
  return release;
}

test('the design reader, link codec, system parser and design algorithms are not in the first view and arrive after it', async ({
  page,
}) => {
  const scripts: string[] = [];
  page.on('request', (r) => {
    if (r.resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
  });
  const release = await holdChunk(page, 'migrate');
  const releaseEngine = await holdChunk(page, 'engine');
  await openWorkbench(page);
  // The first view is drawn while the design reader and the design algorithms are still held back.
  await expect(page.getByRole('textbox', { name: 'System text' })).toBeVisible();
  release();
  releaseEngine();
  await expect
    .poll(() =>
      ['migrate', 'link', 'readEntry', 'engine'].filter((n) => !scripts.some((s) => s.includes(`/${n}-`))),
    )
    .toEqual([]);
  // The parser came with the prefetch: Apply reads at once.
  await page.getByRole('textbox', { name: 'System text' }).fill('b = [1, 0, -1]\na = [1, -0.5, 0.25]');
  await page.getByRole('button', { name: 'Apply' }).click();
  await expect(page.getByTestId('read-as')).toBeVisible();
  expect((await readDesign(page)).typed?.b).toEqual([1, 0, -1]);
});

test('the first view draws while the exact stability test is held back, says it is checking, then gives the verdict', async ({
  page,
}, testInfo) => {
  const release = await holdChunk(page, 'exactChecks');
  await openWorkbench(page);
  const banner = stabilityBanner(page);
  // Drawn: the plots and the side column are there, and the banner promises nothing yet.
  await expect(page.getByRole('region', { name: 'z-plane' })).toBeVisible();
  await expect(page.getByTestId('plot-magnitude').locator('path[clip-path]').first()).toBeVisible();
  await expect(page.getByRole('textbox', { name: 'System text' })).toBeVisible();
  await expect(banner.getByRole('status')).toHaveText('Checking stability…');
  await expect(banner).toHaveClass(/checking/);
  await page.waitForTimeout(400);
  await expect(banner).not.toContainText('Stable');
  await saveScreenshot(page, testInfo, 'stability-checking');
  release();
  await expect(banner.getByRole('status')).toHaveText('Stable');
  await expect(banner).toHaveClass(/pw-stability-stable/);
  await expect(banner).toContainText('largest pole radius');
  await saveScreenshot(page, testInfo, 'stability-checked');
});

test('when the exact stability test cannot be fetched the banner says so, and Try again brings the verdict', async ({
  page,
}, testInfo) => {
  await page.route(/\/exactChecks-[\w-]+\.js$/, (route) => route.abort('connectionfailed'));
  await openWorkbench(page);
  const banner = stabilityBanner(page);
  await expect(banner.getByRole('status')).toHaveText('Stability not checked');
  await expect(banner).toContainText('could not be fetched');
  await saveScreenshot(page, testInfo, 'stability-not-checked');
  await page.unroute(/\/exactChecks-[\w-]+\.js$/);
  await banner.getByRole('button', { name: 'Try again' }).click();
  await expect(banner.getByRole('status')).toHaveText('Stable');
});

test('a reload restores the autosaved session; one only the full reader can read waits for it and is never overwritten', async ({
  page,
}, testInfo) => {
  // What the workbench wrote itself comes back at once.
  await openWorkbench(page);
  await page.getByRole('textbox', { name: 'Design name' }).fill('Kept across the reload');
  await page.getByRole('textbox', { name: 'Design name' }).press('Enter');
  await expect
    .poll(() =>
      page.evaluate(() => Object.keys(localStorage).some((k) => k.startsWith('polewright.session.'))),
    )
    .toBe(true);
  await page.evaluate(() => window.dispatchEvent(new Event('pagehide')));
  const kept = await readDesign(page);
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect(await readDesign(page)).toEqual(kept);

  // This tab's session holding a first-release design: the page waits for the full reader before drawing.
  const tab = await page.evaluate(() => sessionStorage.getItem('polewright.tab'));
  const session = JSON.stringify({
    polewright: 'session',
    version: 2,
    tab,
    lineage: 'loom-line',
    savedAt: Date.now(),
    view: { timeStyle: 'line' },
    design: FIRST_RELEASE_DESIGN,
    past: [],
    future: [],
  });
  await page.evaluate(
    ([key, text]) => localStorage.setItem(key!, text!),
    [`polewright.session.${tab}`, session],
  );
  const release = await holdChunk(page, 'migrate');
  await page.reload({ waitUntil: 'domcontentloaded' });
  await page.waitForTimeout(700);
  await expect(page.getByRole('heading', { name: 'Polewright' })).toHaveCount(0);
  expect(await page.evaluate((key) => localStorage.getItem(key), `polewright.session.${tab}`)).toBe(session);
  release();
  await expect(page.getByRole('heading', { name: 'Polewright' })).toBeVisible();
  await page.waitForFunction(() => window.__polewright !== undefined);
  const restored = await readDesign(page);
  expect(restored.name).toBe(FIRST_RELEASE_DESIGN.name);
  expect(restored.zeros).toEqual(FIRST_RELEASE_DESIGN.zeros);
  // From then on it is saved as usual, in the current version.
  await expect
    .poll(() => page.evaluate((key) => localStorage.getItem(key), `polewright.session.${tab}`))
    .toContain('"version":2,"name":"Loom tension');
  await saveScreenshot(page, testInfo, 'restored-first-release-session');
});

test('a link opens once its codec arrives, and a dropped file waits for the design reader when it needs it', async ({
  page,
}) => {
  const shared = { design: { ...demoDesign(), name: 'Opened while the codec loaded' }, view: {} };
  const releaseLink = await holdChunk(page, 'link');
  const releaseReader = await holdChunk(page, 'migrate');
  await page.goto(`/#${encodeLink(shared)}`);
  await page.waitForTimeout(500);
  await expect(page.getByRole('heading', { name: 'Polewright' })).toHaveCount(0);
  releaseLink();
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect((await readDesign(page)).name).toBe('Opened while the codec loaded');
  await expect(page.getByRole('status').filter({ hasText: 'from the link' })).toBeVisible();

  // A first-release file needs the full reader, which is still held: it opens when the reader comes.
  await dropFile(page, 'loom.json', JSON.stringify(FIRST_RELEASE_DESIGN));
  await page.waitForTimeout(300);
  expect((await readDesign(page)).name).toBe('Opened while the codec loaded');
  releaseReader();
  await expect(page.getByTestId('notice').filter({ hasText: 'from loom.json' })).toBeVisible();
  expect((await readDesign(page)).name).toBe(FIRST_RELEASE_DESIGN.name);
});

test("an FIR's quantized taps wait for their code: the keys say they are loading, then the zeros and curve are drawn", async ({
  page,
}) => {
  // A 4-sample moving average at 1 kHz (zeros at −1 and ±j, three poles at the origin) with 16-bit taps set.
  const design = {
    ...demoDesign(),
    name: 'Smoothing with a target',
    sampleRate: 1000,
    zeros: [
      { re: -1, im: 0, multiplicity: 1 },
      { re: 0, im: 1, multiplicity: 1 },
    ],
    poles: [{ re: 0, im: 0, multiplicity: 3 }],
    gainRule: { kind: 'fixed' as const, value: 0.25 },
    implementation: DEFAULT_IMPLEMENTATION,
  };
  delete (design as { mask?: unknown }).mask;
  delete (design as { designer?: unknown }).designer;
  const release = await holdChunk(page, 'FirQuantizedViews');
  await page.goto(`/#${encodeLink({ design, view: {} })}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(page.getByTestId('quantized-tap-zeros-waiting')).toHaveText('◇ quantized taps: loading…');
  await expect(page.getByTestId('quantized-tap-trace-waiting')).toHaveText('dashed quantized line: loading…');
  await page.waitForTimeout(300);
  await expect(page.getByTestId('quantized-tap-zeros')).toHaveCount(0);
  await expect(page.getByTestId('quantized-tap-trace')).toHaveCount(0);
  release();
  await expect(page.getByTestId('quantized-tap-zeros')).toBeVisible();
  await expect(page.getByTestId('quantized-tap-trace')).toBeVisible();
  await expect(page.getByTestId('quantized-tap-zeros-waiting')).toHaveCount(0);
  // 0.25 is exact in 16 bits: the quantized zeros are the design's, −1 and ±j
  const marks = await quantizedMarks(page, 'quantized-tap-zeros');
  expect(marks.map((m) => [m.re, m.im].map((v) => Math.round(v * 1e9) / 1e9 + 0))).toEqual(
    expect.arrayContaining([
      [-1, 0],
      [0, 1],
      [0, -1],
    ]),
  );
  expect(marks).toHaveLength(3);
});
