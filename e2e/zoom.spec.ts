/**
 * Zooming the response plots in frequency and the time plot in samples: the wheel, a dragged span, keys, the
 * buttons and a double click; the response is evaluated on the band shown (a 4 Hz-wide notch inspected to
 * ±0.01 Hz), the magnitude axis follows it, and the zoom travels in the address but is not an undo step.
 */
import { expect, test, type Locator, type Page } from '@playwright/test';
import { decodeLink } from '../src/share/link/index.ts';
import { openWorkbench, saveScreenshot } from './support/app.ts';
import {
  axisLabels,
  frequencyCursor,
  frequencyPanel,
  parseShown,
  readFrequency,
  timeCursor,
  timePanel,
} from './support/charts.ts';
import { humRecording, loadRecording, openSignalPage, recordingPanel } from './support/signal.ts';

/** The band the frequency plots show, Hz, or null for the whole axis. */
async function band(page: Page): Promise<[number, number] | null> {
  const v = await frequencyPanel(page).locator('svg.pw-chart').first().getAttribute('data-band');
  return v === 'all' || v === null ? null : (v.split(' ').map(Number) as [number, number]);
}
async function sampleSpan(page: Page): Promise<[number, number] | null> {
  const v = await timePanel(page).locator('svg.pw-chart').first().getAttribute('data-span');
  return v === 'all' || v === null ? null : (v.split(' ').map(Number) as [number, number]);
}
/** The screen x of an axis value on a slider area spanning [aria-valuemin, aria-valuemax] linearly. */
async function xOf(area: Locator, value: number, shift = 0): Promise<{ x: number; y: number }> {
  const box = (await area.boundingBox())!;
  const lo = Number(await area.getAttribute('aria-valuemin'));
  const hi = Number(await area.getAttribute('aria-valuemax'));
  return { x: box.x + ((value - lo + shift) / (hi - lo)) * box.width, y: box.y + 30 };
}

test('zoom to the 50 Hz notch by wheel, drag and keys, down to ±0.01 Hz; reset; the zoom is in the link, not in undo', async ({
  page,
}, info) => {
  await openWorkbench(page);
  const area = frequencyCursor(page);
  expect(await band(page)).toBeNull();

  // Wheel over 50 Hz: zooms in about the pointer.
  const at50 = await xOf(area, 50);
  await page.mouse.move(at50.x, at50.y);
  for (let i = 0; i < 3; i++) await page.mouse.wheel(0, -100);
  // polled: each wheel step reaches the plot on a later frame
  await expect
    .poll(async () => {
      const now = await band(page);
      return now ? now[1] - now[0] : Infinity;
    })
    .toBeLessThan(1000 / 3);
  let b = (await band(page))!;
  expect(b[0]).toBeLessThan(50);
  expect(b[1]).toBeGreaterThan(50);
  await saveScreenshot(page, info, 'zoom-wheel');

  // Drag across 46…54 Hz on the magnitude plot: that span is shown.
  const from = await xOf(area, 46);
  const to = await xOf(area, 54);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 8 });
  await expect(frequencyPanel(page).getByTestId('zoom-band')).toBeVisible();
  await saveScreenshot(page, info, 'zoom-selecting');
  await page.mouse.up();
  await expect.poll(async () => (await band(page))?.[0]).toBeCloseTo(46, 0);
  b = (await band(page))!;
  expect(b[1]).toBeCloseTo(54, 0);
  await expect(frequencyPanel(page).getByTestId('zoom-span-frequency')).toContainText('Hz');
  // Ticks carry the decimals the step needs.
  const ticks = await axisLabels(page, 'x');
  expect(new Set(ticks).size).toBe(ticks.length);
  await saveScreenshot(page, info, 'zoom-46-54');

  // Keys: put the cross-hair on 50 Hz with the pointer, then + zooms about it until ±0.01 Hz is on screen.
  await page.mouse.move(at50.x, at50.y);
  await page.mouse.move((await xOf(area, 50)).x, at50.y);
  await area.focus();
  const centre = Number(await area.getAttribute('aria-valuenow'));
  expect(Math.abs(centre - 50)).toBeLessThan(0.1);
  for (let i = 0; i < 30; i++) {
    const now = (await band(page))!;
    if (now[1] - now[0] <= 0.02) break;
    await page.keyboard.press('+');
  }
  await expect
    .poll(async () => {
      const now = (await band(page))!;
      return now[1] - now[0];
    })
    .toBeLessThanOrEqual(0.02);
  b = (await band(page))!;
  expect(b[0]).toBeLessThan(centre);
  expect(b[1]).toBeGreaterThan(centre);
  // The magnitude axis follows the band: a 4 Hz-wide notch is below −40 dB within ±0.01 Hz of 50 Hz, and
  // only an evaluation on the band itself (not the whole-axis grid, 0.49 Hz apart) shows that.
  const magnitudeTop = Math.max(...(await axisLabels(page, 'magnitude')).map(parseShown));
  expect(magnitudeTop).toBeLessThan(-30);
  // The read-out tells points 0.02/400 Hz apart.
  await page.keyboard.press('End');
  const edge = await readFrequency(page);
  expect(edge.hz).toBeCloseTo(b[1], 4);
  expect(edge.db).toBeLessThan(-40);
  await saveScreenshot(page, info, 'zoom-notch-0.01Hz');

  // The zoom is view state: in the address (link), never an undo step.
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  await expect
    .poll(() => {
      const r = decodeLink(new URL(page.url()).hash);
      return r.ok ? (r.value.view.frequencySpan?.[1] ?? 0) - (r.value.view.frequencySpan?.[0] ?? 0) : -1;
    })
    .toBeLessThanOrEqual(0.02);
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect
    .poll(async () => ((await band(page)) ?? [0, 1e9])[1] - ((await band(page)) ?? [0, 0])[0])
    .toBeLessThanOrEqual(0.02);

  // 0 on the focused plot, the button and a double click each show the whole axis again.
  await frequencyCursor(page).focus();
  await page.keyboard.press('0');
  await expect.poll(() => band(page)).toBeNull();
  await page.getByRole('button', { name: 'Zoom in (frequency)' }).click();
  await expect.poll(() => band(page)).not.toBeNull();
  await page.getByRole('button', { name: 'Show all (frequency)' }).click();
  await expect.poll(() => band(page)).toBeNull();
  await page.mouse.move(at50.x, at50.y);
  await page.mouse.wheel(0, -100);
  await expect.poll(() => band(page)).not.toBeNull();
  await frequencyCursor(page).dblclick();
  await expect.poll(() => band(page)).toBeNull();
});

test('the time plot zooms in samples the same way', async ({ page }, info) => {
  await openWorkbench(page);
  const area = timeCursor(page);
  expect(await sampleSpan(page)).toBeNull();
  const from = await xOf(area, 10, 0.5);
  const to = await xOf(area, 40, 0.5);
  await page.mouse.move(from.x, from.y + 40);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y + 40, { steps: 6 });
  await page.mouse.up();
  await expect.poll(async () => (await sampleSpan(page))?.[0]).toBeCloseTo(10, 0);
  expect((await sampleSpan(page))![1]).toBeCloseTo(40, 0);
  await expect(timePanel(page).getByTestId('zoom-span-samples')).toHaveText(/n 1\d–[34]\d/);
  await saveScreenshot(page, info, 'time-zoom-10-40');

  // Wheel out, keys pan and reset.
  const mid = await xOf(area, 25);
  await page.mouse.move(mid.x, mid.y + 40);
  await page.mouse.wheel(0, 100);
  // polled: the wheel's zoom reaches the plot on a later frame, and a loaded machine can be a frame behind
  await expect
    .poll(async () => {
      const s = await sampleSpan(page);
      return s ? s[1] - s[0] : 0;
    })
    .toBeGreaterThan(35);
  const wider = (await sampleSpan(page))!;
  await area.focus();
  await page.keyboard.press('>');
  await expect.poll(async () => (await sampleSpan(page))?.[0] ?? -Infinity).toBeGreaterThan(wider[0]);
  await page.keyboard.press('0');
  await expect.poll(() => sampleSpan(page)).toBeNull();
  await page.getByRole('button', { name: 'Zoom in (samples)' }).click();
  await expect.poll(() => sampleSpan(page)).not.toBeNull();
  await area.dblclick();
  await expect.poll(() => sampleSpan(page)).toBeNull();
});

test('the recording zooms with the same piece: wheel, drag pans, keys, double click shows all', async ({
  page,
}, info) => {
  await openWorkbench(page);
  const rec = humRecording({ sampleRate: 2000, seconds: 4, humHz: 50, humAmplitudes: [0.1], format: 'i16' });
  await openSignalPage(page);
  await loadRecording(page, rec.path);
  const area = recordingPanel(page).locator('rect.pw-signal-pan');
  /** The visible span in seconds, from the plot's value text ("0.000 s to 4.000 s"). */
  const span = async (): Promise<[number, number]> => {
    const [a, b] = (await area.getAttribute('aria-valuetext'))!.split(' to ');
    return [parseShown(a!), parseShown(b!)];
  };
  const whole = await span();
  const box = (await area.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.wheel(0, -100);
  await expect.poll(async () => (await span())[1] - (await span())[0]).toBeLessThan(whole[1] - whole[0]);
  const zoomed = await span();
  // A drag to the left shows later samples.
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 4, box.y + box.height / 2, { steps: 5 });
  await page.mouse.up();
  await expect.poll(async () => (await span())[0]).toBeGreaterThan(zoomed[0]);
  await saveScreenshot(page, info, 'recording-zoomed');
  await area.focus();
  await page.keyboard.press('0');
  await expect.poll(span).toEqual(whole);
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.wheel(0, -100);
  await expect.poll(async () => (await span())[1]).toBeLessThan(whole[1]);
  await area.dblclick();
  await expect.poll(span).toEqual(whole);
});
