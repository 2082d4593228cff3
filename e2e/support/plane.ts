/**
 * Drivers for the z-plane in end-to-end tests: find a root, turn z into screen pixels from the drawn unit
 * circle, drag a root with the mouse, and read the design through the page's read-only probe.
 */
import type { Locator, Page } from '@playwright/test';

export interface RootRef {
  kind: 'zero' | 'pole';
  index: number;
}
export interface Z {
  re: number;
  im: number;
}
interface Root extends Z {
  multiplicity: number;
}

/** The plane's SVG. */
export function planeSvg(page: Page): Locator {
  return page.locator('section[aria-label="z-plane"] svg.pw-plane-svg');
}

/** The stored root's marker (not its conjugate mirror). */
export function rootMark(page: Page, ref: RootRef): Locator {
  return planeSvg(page).locator(`g[data-kind="${ref.kind}"][data-index="${ref.index}"]:not([data-mirror])`);
}

/** The screen position of z, from the unit circle drawn in the SVG and the SVG's bounding box. */
export async function zToScreen(page: Page, z: Z): Promise<{ x: number; y: number }> {
  const svg = planeSvg(page);
  const box = await svg.boundingBox();
  if (!box) throw new Error('z-plane SVG is not visible');
  const c = await svg.locator('circle.pw-unit-circle').evaluate((el) => ({
    cx: Number(el.getAttribute('cx')),
    cy: Number(el.getAttribute('cy')),
    r: Number(el.getAttribute('r')),
  }));
  return { x: box.x + c.cx + z.re * c.r, y: box.y + c.cy - z.im * c.r };
}

/** The current design's root, read through window.__polewright. */
export async function rootAt(page: Page, ref: RootRef): Promise<Root> {
  const root = await page.evaluate(({ kind, index }) => {
    const d = window.__polewright?.design();
    return d ? (kind === 'zero' ? d.zeros : d.poles)[index] : undefined;
  }, ref);
  if (!root) throw new Error(`no ${ref.kind} ${ref.index} in the design`);
  return root;
}

/** Drags a root (its stored marker, or its mirror) to z with the mouse in `steps` moves. */
export async function dragRoot(
  page: Page,
  ref: RootRef,
  to: Z,
  opts: { steps?: number; mirror?: boolean } = {},
) {
  const root = await rootAt(page, ref);
  const from = await zToScreen(page, { re: root.re, im: opts.mirror ? -root.im : root.im });
  const target = await zToScreen(page, to);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(target.x, target.y, { steps: opts.steps ?? 12 });
  await page.mouse.up();
}

/** Clicks on a root's centre (a press picks the marker nearest the pointer, even one under another). */
export async function clickRoot(page: Page, ref: RootRef) {
  const root = await rootAt(page, ref);
  const at = await zToScreen(page, root);
  await page.mouse.click(at.x, at.y);
}
