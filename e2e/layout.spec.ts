/**
 * A layout that does not jump: the plane and the plots keep their boxes whatever the side column shows (each
 * tab, an unstable verdict, a note or none, a cross-hair read-out) and whether the design is the demo or
 * empty; at 1440×900, 1280×720 and 800 px wide no two parts overlap (the floating verdict included) and the
 * side column is at most one scroll away.
 */
import { expect, test, type Page } from '@playwright/test';
import { applySystem, openWorkbench, saveScreenshot } from './support/app.ts';
import { frequencyCursor } from './support/charts.ts';

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}
const REGIONS = {
  plane: 'section[aria-label="z-plane"]',
  frequency: 'section[aria-label="frequency response"]',
  time: 'section[aria-label="time response"]',
  side: 'aside[aria-label="System and checks"]',
  header: 'header.pw-header',
  note: '.pw-app > .pw-note-line',
  caution: '.pw-caution',
  chip: '.pw-verdict-chip',
} as const;
/** The regions whose boxes must not move. */
const STEADY = ['plane', 'frequency', 'time', 'side'] as const;

/** Boxes of the regions in page coordinates (scroll included), rounded to the pixel. */
async function boxes(page: Page): Promise<Record<string, Box>> {
  return page.evaluate((regions) => {
    const out: Record<string, Box> = {};
    for (const [name, sel] of Object.entries(regions)) {
      const el = document.querySelector(sel);
      if (!el) continue;
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      out[name] = {
        x: Math.round(r.x + scrollX),
        y: Math.round(r.y + scrollY),
        width: Math.round(r.width),
        height: Math.round(r.height),
      };
    }
    return out;
  }, REGIONS);
}

const SIZES = [
  { width: 1440, height: 900 },
  { width: 1280, height: 720 },
  { width: 800, height: 900 },
];

for (const size of SIZES) {
  test(`boxes at ${size.width}×${size.height}`, async ({ page }, info) => {
    await page.setViewportSize(size);
    await openWorkbench(page);
    const states: [string, () => Promise<void>][] = [
      ['demo', async () => {}],
      ...['Design', 'Target', 'Signal', 'Share', 'System'].map(
        (tab) =>
          [`tab ${tab}`, () => page.getByRole('tab', { name: tab }).click()] as [string, () => Promise<void>],
      ),
      ['empty', () => page.getByRole('button', { name: 'Start empty' }).click()],
      ['unstable', () => applySystem(page, 'y[n] = 2 y[n-1] + x[n]')],
      ['demo again', () => page.getByRole('button', { name: 'Demo design' }).click()],
      [
        'cross-hair',
        async () => {
          await frequencyCursor(page).focus();
        },
      ],
    ];
    let first: Record<string, Box> | null = null;
    for (const [name, act] of states) {
      await act();
      await page.waitForTimeout(150);
      const now = await boxes(page);
      first ??= now;
      for (const region of STEADY) expect(now[region], `${region} after "${name}"`).toEqual(first[region]);
      // No two parts overlap, the floating verdict chip included (where it shows).
      const names = Object.keys(now);
      for (const a of names)
        for (const b of names)
          if (a < b) expect(overlap(now[a]!, now[b]!), `${a} and ${b} after "${name}"`).toBe(false);
      // Nothing needed is more than one scroll away: the page is at most two screens tall, nothing is wider
      // than the screen, and the side column starts on the first screen.
      const doc = await page.evaluate(() => ({
        h: document.documentElement.scrollHeight,
        w: document.documentElement.scrollWidth,
      }));
      expect(doc.w).toBeLessThanOrEqual(size.width);
      expect(doc.h).toBeLessThanOrEqual(2 * size.height);
      expect(now.side!.y).toBeLessThan(size.height);
      if (name === 'empty' || name === 'tab Target')
        await saveScreenshot(page, info, `layout-${size.width}-${name.replace(' ', '-')}`);
    }
    await saveScreenshot(page, info, `layout-${size.width}`);
  });
}

/** Whether two boxes share any area (touching edges do not count). */
function overlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}
