/**
 * The "Share" page in real Chromium: design files saved and opened again (by picker and by drop),
 * the library in this browser, markup in a name shown as text, a pinned reference with its dB difference,
 * and pictures of each view as SVG and PNG.
 */
import { expect, test, type Page } from '@playwright/test';
import { withClipboard } from './support/clipboard.ts';
import { resolveGain } from '../src/core/gainRule.ts';
import { responseZpk } from '../src/core/response/index.ts';
import type { Design } from '../src/core/model/design.ts';
import { openWorkbench, readDesign } from './support/app.ts';
import {
  frequencyPanel,
  hoverFrequency,
  parseShown,
  readFrequency,
  showDelayPlot,
  timePanel,
} from './support/charts.ts';
import {
  downloadPicture,
  dropFile,
  libraryEntry,
  openDesignFile,
  openKeepShare,
  pngSize,
  saveDesignFile,
  saveToLibrary,
} from './support/files.ts';
import { dragRoot } from './support/plane.ts';

const MARKUP = '<img src=x onerror=alert(1)>';

async function startEmpty(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Start empty' }).click();
  await expect.poll(async () => (await readDesign(page)).poles.length).toBe(0);
}

/** |H| in dB of a design at hz, by the engine (the page must show the same number). */
function levelDb(d: Design, hz: number): number {
  const gain = resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate).gain;
  const r = responseZpk(
    { zeros: d.zeros, poles: d.poles, gain },
    Float64Array.of((2 * Math.PI * hz) / d.sampleRate),
  );
  return r.magnitudeDb[0]!;
}

/** Unwrapped phase (degrees) and group delay (samples) of a design at hz, by the engine. */
function phaseDelay(d: Design, hz: number): { deg: number; samples: number } {
  const gain = resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate).gain;
  const r = responseZpk(
    { zeros: d.zeros, poles: d.poles, gain },
    Float64Array.of((2 * Math.PI * hz) / d.sampleRate),
  );
  return { deg: (r.phaseUnwrapped[0]! * 180) / Math.PI, samples: r.groupDelay[0]! };
}

test.beforeEach(async ({ page }) => {
  await openWorkbench(page);
  await openKeepShare(page);
});

test('Copy link copies the address bar, which holds the design; the next edit is a new entry; it opens the same design elsewhere', async ({
  page,
  context,
  browser,
}) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  const before = await readDesign(page);
  const entries = await page.evaluate(() => history.length);
  const status = page.getByTestId('link-status');
  const copied = await withClipboard(async () => {
    await page.getByRole('button', { name: 'Copy link' }).click();
    await expect(status).toContainText(/^Copied · \d+ characters$/);
    return page.evaluate(() => navigator.clipboard.readText());
  });
  expect(page.url()).toBe(copied);
  expect(Number(/(\d+) characters/.exec(await status.innerText())![1])).toBe(copied.length);
  expect(await page.evaluate(() => history.length)).toBe(entries);

  await startEmpty(page);
  await expect.poll(() => page.url()).not.toBe(copied);
  expect(new URL(page.url()).hash).toMatch(/^#pw2\./);
  expect(await page.evaluate(() => history.length)).toBe(entries + 1);

  const elsewhere = await browser.newContext();
  const other = await elsewhere.newPage();
  await other.goto(copied);
  await other.waitForFunction(() => window.__polewright !== undefined);
  expect(await readDesign(other)).toEqual(before);
  await elsewhere.close();
});

test('a saved design file opens again as the identical design, as one undo step', async ({ page }) => {
  const before = await readDesign(page);
  const file = await saveDesignFile(page);
  expect(file.name).toBe('hopper-scale-50-hz-hum-notches.json');
  expect(JSON.parse(file.text)).toMatchObject({ polewright: 'design', name: before.name });

  await startEmpty(page);
  await openDesignFile(page, file.name, file.text);
  await expect(page.getByTestId('file-outcome')).toContainText('Opened “Hopper scale');
  expect(await readDesign(page)).toEqual(before);

  await page.getByRole('button', { name: /Undo/ }).click();
  expect((await readDesign(page)).name).toBe('Empty design');
  await page.getByRole('button', { name: /Redo/ }).click();
  expect(await readDesign(page)).toEqual(before);
});

test('a broken or foreign file gives a message and leaves the design untouched', async ({ page }) => {
  const before = await readDesign(page);
  const canUndo = await page.evaluate(() => window.__polewright!.canUndo());
  await openDesignFile(page, 'broken.json', '{"polewright": "design", "version": 2,');
  await expect(page.getByRole('alert').filter({ hasText: 'broken.json' })).toContainText('not valid JSON');
  await openDesignFile(
    page,
    'negative-rate.json',
    JSON.stringify({
      polewright: 'design',
      version: 2,
      sampleRate: -5,
      zeros: [],
      poles: [],
      gainRule: { kind: 'dc' },
    }),
  );
  const alert = page.getByRole('alert').filter({ hasText: 'negative-rate.json' });
  await expect(alert).toContainText('sampleRate');
  await expect(alert).toContainText('Your design is unchanged');
  expect(await readDesign(page)).toEqual(before);
  expect(await page.evaluate(() => window.__polewright!.canUndo())).toBe(canUndo);
});

test('a design file dropped anywhere on the page opens; a bad one is refused with a notice', async ({
  page,
}) => {
  const before = await readDesign(page);
  const file = await saveDesignFile(page);
  await startEmpty(page);
  await dropFile(page, file.name, file.text);
  await expect(page.getByTestId('notice').filter({ hasText: 'from hopper-scale' })).toBeVisible();
  expect(await readDesign(page)).toEqual(before);

  await dropFile(page, 'notes.json', 'just some notes');
  await expect(page.getByTestId('notice').filter({ hasText: 'notes.json' })).toContainText('unchanged');
  expect(await readDesign(page)).toEqual(before);
});

test('library: save as, rename, open and delete (with a confirmation); it survives a reload', async ({
  page,
}) => {
  const demo = await readDesign(page);
  await saveToLibrary(page, 'Hopper A');
  await startEmpty(page);
  await saveToLibrary(page, 'Blank');

  // Names are unique: saving or renaming onto a taken name says so and offers to replace.
  await page.getByRole('textbox', { name: 'Name to save under' }).fill('Hopper A');
  await page.getByRole('button', { name: 'Save to library' }).click();
  await expect(page.getByTestId('library-outcome')).toContainText('already in the library');
  await expect(page.getByRole('button', { name: 'Replace it' })).toBeVisible();

  await page.getByRole('button', { name: 'Rename Blank' }).click();
  await page.getByRole('textbox', { name: 'New name for Blank' }).fill('Hopper A');
  await page.getByRole('button', { name: 'Rename', exact: true }).click();
  await expect(page.getByTestId('library-entry').getByRole('alert')).toContainText('already in the library');
  await page.getByRole('textbox', { name: 'New name for Blank' }).fill('Blank slate');
  await page.getByRole('textbox', { name: 'New name for Blank' }).press('Enter');
  await expect(libraryEntry(page, 'Blank slate')).toHaveCount(1);
  await expect(libraryEntry(page, 'Blank')).toHaveCount(0);

  await page.getByRole('button', { name: 'Open Hopper A' }).click();
  expect(await readDesign(page)).toEqual({ ...demo, name: 'Hopper A' });

  await page.getByRole('button', { name: 'Delete Blank slate' }).click();
  await page.getByRole('button', { name: 'Keep' }).click();
  await expect(libraryEntry(page, 'Blank slate')).toHaveCount(1);
  await page.getByRole('button', { name: 'Delete Blank slate' }).click();
  await libraryEntry(page, 'Blank slate').getByRole('button', { name: 'Delete', exact: true }).click();
  await expect(libraryEntry(page, 'Blank slate')).toHaveCount(0);

  await page.reload();
  await openKeepShare(page);
  await expect(page.getByTestId('library-name')).toHaveText(['Hopper A']);
});

test('a design name with markup shows as text in the header, the library, the reference and pictures', async ({
  page,
}) => {
  let dialogs = 0;
  page.on('dialog', (d) => {
    dialogs++;
    void d.dismiss();
  });
  const name = page.getByRole('textbox', { name: 'Design name' });
  await name.fill(MARKUP);
  await name.press('Enter');
  expect((await readDesign(page)).name).toBe(MARKUP);
  await expect(page.getByRole('textbox', { name: 'Name to save under' })).toHaveValue(MARKUP);
  await page.getByRole('button', { name: 'Save to library' }).click();
  await expect(libraryEntry(page, MARKUP)).toHaveCount(1);
  await expect(page.getByTestId('library-name')).toHaveText([MARKUP]);
  await page.getByRole('button', { name: 'Pin as reference' }).click();
  await expect(page.getByTestId('reference-status')).toContainText(MARKUP);
  const svg = (await downloadPicture(page, 'z-plane', 'SVG')).bytes.toString('utf8');
  expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;');
  expect(svg).not.toContain('<img');
  await expect(name).toHaveValue(MARKUP);
  expect(await page.locator('img[src="x"]').count()).toBe(0);
  expect(dialogs).toBe(0);
});

test('a pinned reference stays drawn in every plot while a root is dragged, with its values and differences', async ({
  page,
}) => {
  const reference = await readDesign(page);
  const canUndo = await page.evaluate(() => window.__polewright!.canUndo());
  await page.getByRole('button', { name: 'Pin as reference' }).click();
  await expect(page.getByTestId('reference-status')).toContainText(reference.name);
  // Pinning is view state: no undo step.
  expect(await page.evaluate(() => window.__polewright!.canUndo())).toBe(canUndo);
  const marks = page.getByTestId('reference-roots').locator('circle, path');
  await expect(marks).toHaveCount(12); // 3 zero pairs and 3 pole pairs, mirrors included
  const trace = page.getByTestId('reference-trace').locator('path');
  const traceBefore = await trace.getAttribute('d');
  expect(traceBefore?.length).toBeGreaterThan(100);

  await dragRoot(page, { kind: 'pole', index: 0 }, { re: 0.8, im: 0.25 });
  const current = await readDesign(page);
  expect(current.poles[0]).not.toEqual(reference.poles[0]);
  await expect(marks).toHaveCount(12);
  // Still drawn (its pixels move only as far as the magnitude axis re-fits to the new design).
  expect((await trace.getAttribute('d'))?.length).toBeGreaterThan(100);

  await hoverFrequency(page, 100);
  const shown = await readFrequency(page);
  const refText = await frequencyPanel(page).getByTestId('freq-read-ref-db').innerText();
  const diffText = await frequencyPanel(page).getByTestId('freq-read-ref-diff').innerText();
  // The engine's own numbers at the cross-hair frequency, to the digits shown (4 and 3 significant).
  const refDb = levelDb(reference, shown.hz);
  const curDb = levelDb(current, shown.hz);
  expect(parseShown(refText)).toBeCloseTo(refDb, Math.abs(refDb) < 1 ? 4 : 2);
  expect(Math.abs(parseShown(diffText.replace(/^\+/, '')) - (curDb - refDb))).toBeLessThan(
    Math.abs(curDb - refDb) * 5e-3 + 1e-6,
  );
  expect(Math.abs(curDb - refDb)).toBeGreaterThan(0.1);

  // Phase (unwrapped, the default view) and group delay (samples), with the design's differences.
  const read = (id: string) => frequencyPanel(page).getByTestId(`freq-read-ref-${id}`).innerText();
  const refPd = phaseDelay(reference, shown.hz);
  const curPd = phaseDelay(current, shown.hz);
  const near = (shownText: string, want: number) =>
    expect(Math.abs(parseShown(shownText.replace(/^\+/, '')) - want)).toBeLessThan(
      Math.abs(want) * 5e-3 + 1e-3,
    );
  near(await read('phase'), refPd.deg);
  near(await read('phase-diff'), curPd.deg - refPd.deg);
  near(await read('delay'), refPd.samples);
  near(await read('delay-diff'), curPd.samples - refPd.samples);
  expect(await read('delay')).toContain('samples');

  // The reference is drawn faintly in the phase and delay plots and in the time plot too.
  const phaseTrace = page.getByTestId('reference-trace-phase').locator('path');
  expect((await phaseTrace.getAttribute('d'))?.length).toBeGreaterThan(100);
  await showDelayPlot(page);
  const delayTrace = page.getByTestId('reference-trace-delay').locator('path');
  expect((await delayTrace.getAttribute('d'))?.length).toBeGreaterThan(100);
  const timeTrace = timePanel(page).getByTestId('reference-time-trace');
  await expect(timeTrace).toContainText('reference');
  expect((await timeTrace.locator('path').getAttribute('d'))?.length).toBeGreaterThan(50);

  await page.getByRole('button', { name: 'Unpin' }).click();
  await expect(page.getByTestId('reference-trace')).toHaveCount(0);
  await expect(page.getByTestId('reference-roots')).toHaveCount(0);
  await expect(page.getByTestId('reference-trace-delay')).toHaveCount(0);
  await expect(page.getByTestId('reference-time-trace')).toHaveCount(0);
  await expect(frequencyPanel(page).getByTestId('freq-read-ref-db')).toHaveCount(0);
});

const VIEWS = [
  { panel: 'z-plane', slug: 'z-plane', svg: 'svg.pw-plane-svg', labels: ['Re z', 'Im z', '200 Hz'] },
  {
    panel: 'frequency response',
    slug: 'frequency',
    svg: '.pw-chart-box > svg.pw-chart',
    labels: ['Frequency (Hz)', 'Magnitude (dB)', 'Phase (°), unwrapped'],
  },
  {
    panel: 'time response',
    slug: 'time',
    svg: '.pw-chart-box svg.pw-chart',
    labels: ['Sample n', 'Amplitude', 'Time (ms)'],
  },
] as const;

test('each view downloads as an SVG with its axis labels and title, and as a 2× PNG', async ({ page }) => {
  await page.getByRole('checkbox', { name: '|H| shading' }).check();
  for (const v of VIEWS) {
    const box = await page.locator(`section[aria-label="${v.panel}"] ${v.svg}`).boundingBox();
    const svg = await downloadPicture(page, v.panel, 'SVG');
    expect(svg.name).toBe(`hopper-scale-50-hz-hum-notches-${v.slug}.svg`);
    const text = svg.bytes.toString('utf8');
    expect(text.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    for (const label of v.labels) expect(text).toContain(`>${label}<`);
    expect(text).toContain('Hopper scale: 50 Hz hum notches');
    expect(text).toContain('sample rate 2 kHz');
    expect(text).not.toContain('var(--');
    const wellFormed = await page.evaluate(
      (t) => new DOMParser().parseFromString(t, 'image/svg+xml').querySelector('parsererror') === null,
      text,
    );
    expect(wellFormed).toBe(true);

    const png = await downloadPicture(page, v.panel, 'PNG');
    expect(png.name).toBe(`hopper-scale-50-hz-hum-notches-${v.slug}.png`);
    const size = pngSize(png.bytes);
    expect(size.width).toBe(2 * Math.ceil(box!.width));
    expect(size.height).toBeGreaterThan(2 * box!.height);
    expect(size.height).toBeLessThan(2 * box!.height + 2 * 60);
    expect(png.bytes.length).toBeGreaterThan(10_000);
  }
  // The shading travels with the plane: embedded under the drawing in the SVG.
  const plane = (await downloadPicture(page, 'z-plane', 'SVG')).bytes.toString('utf8');
  expect(plane).toMatch(/<image [^>]*href="data:image\/png;base64,/);
});
