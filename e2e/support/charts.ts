/**
 * Drivers for the frequency and time views in end-to-end tests: point the cross-hair at a frequency or a
 * sample, read the values the page shows, read axis labels, and pick settings.
 */
import { expect, type Locator, type Page } from '@playwright/test';

/** The frequency view's section. */
export function frequencyPanel(page: Page): Locator {
  return page.locator('section[aria-label="frequency response"]');
}

/** The time view's section. */
export function timePanel(page: Page): Locator {
  return page.locator('section[aria-label="time response"]');
}

/** A number as the page prints it: true minus signs, ∞, units and exponents allowed. */
export function parseShown(text: string): number {
  const t = text.trim().replace(/−/g, '-');
  if (/^-∞/.test(t)) return -Infinity;
  if (/^∞/.test(t)) return Infinity;
  const m = /^-?[\d.]+(e-?\d+)?/.exec(t);
  if (!m) throw new Error(`not a number on the page: "${text}"`);
  const v = Number(m[0]);
  return /\bkHz\b/.test(t) ? v * 1000 : v;
}

/** The cross-hair area of the frequency plots (a slider whose value is the cross-hair frequency). */
export function frequencyCursor(page: Page): Locator {
  return frequencyPanel(page).getByRole('slider', { name: 'Cross-hair frequency' });
}

/** Moves the mouse to the frequency hz (Hz) over the magnitude plot, on a linear or log axis. */
export async function hoverFrequency(page: Page, hz: number): Promise<void> {
  const area = frequencyCursor(page);
  const box = await area.boundingBox();
  if (!box) throw new Error('frequency plots are not visible');
  const lo = Number(await area.getAttribute('aria-valuemin'));
  const hi = Number(await area.getAttribute('aria-valuemax'));
  const log =
    (await frequencyPanel(page).getByRole('radio', { name: 'log' }).getAttribute('aria-checked')) === 'true';
  const t = log ? Math.log(hz / lo) / Math.log(hi / lo) : (hz - lo) / (hi - lo);
  await page.mouse.move(box.x + t * box.width, box.y + 20);
}

/** The exact frequency under the cross-hair (full precision, from the slider's value). */
export async function cursorHz(page: Page): Promise<number> {
  return Number(await frequencyCursor(page).getAttribute('aria-valuenow'));
}

/** The values the frequency read-out shows, parsed. */
export async function readFrequency(page: Page) {
  const text = (id: string) => frequencyPanel(page).getByTestId(`freq-read-${id}`).innerText();
  const phase = await text('phase');
  const delay = await text('delay');
  const [phaseDeg, phaseRad] = phase.split('=').map(parseShown) as [number, number];
  const [delaySamples, delayMs] = delay.split('=').map(parseShown) as [number, number];
  return {
    hz: parseShown(await text('hz')),
    db: parseShown(await text('db')),
    linear: parseShown(await text('linear')),
    phaseDeg,
    phaseRad,
    delaySamples,
    delayMs,
  };
}

/** The labels of one plot's y axis (magnitude, phase or delay) or of the frequency axis ('x'). */
export async function axisLabels(page: Page, plot: 'magnitude' | 'phase' | 'delay' | 'x'): Promise<string[]> {
  const panel = frequencyPanel(page);
  const texts =
    plot === 'x'
      ? panel.locator('svg.pw-chart > .pw-chart-axis-bottom text')
      : panel.getByTestId(`plot-${plot}`).locator('.pw-chart-axis text');
  return texts.allTextContents();
}

/** Clicks a choice in a labelled group of choices (a radio group), e.g. ('Phase', 'wrapped'). */
export async function choose(scope: Locator, group: string, option: string): Promise<void> {
  const radio = scope
    .getByRole('radiogroup', { name: group })
    .getByRole('radio', { name: option, exact: true });
  await radio.click();
  await expect(radio).toHaveAttribute('aria-checked', 'true');
}

/** Makes sure the group-delay plot is on screen (a short panel shows phase or delay in turn). */
export async function showDelayPlot(page: Page): Promise<void> {
  const tabs = frequencyPanel(page).getByRole('radiogroup', { name: 'Second plot' });
  if ((await tabs.count()) > 0) await choose(frequencyPanel(page), 'Second plot', 'Group delay');
}

/** The cross-hair area of the time plot (a slider whose value is the sample index). */
export function timeCursor(page: Page): Locator {
  return timePanel(page).getByRole('slider', { name: 'Sample under the cross-hair' });
}

/** The values the time read-out shows, parsed. */
export async function readTime(page: Page) {
  const text = (id: string) => timePanel(page).getByTestId(`time-read-${id}`).innerText();
  return {
    n: parseShown(await text('n')),
    t: await text('t'),
    x: parseShown(await text('x')),
    y: parseShown(await text('y')),
  };
}

/** Moves the mouse over sample n of the time plot. */
export async function hoverSample(page: Page, n: number): Promise<void> {
  const area = timeCursor(page);
  const box = await area.boundingBox();
  if (!box) throw new Error('time plot is not visible');
  const count = Number(await area.getAttribute('aria-valuemax')) + 1;
  await page.mouse.move(box.x + ((n + 0.5) / count) * box.width, box.y + box.height / 2);
}
