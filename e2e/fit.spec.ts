/** After Apply or Open, the plane shows every root with the unit circle, without pressing "Fit roots". */
import { expect, test, type Page } from '@playwright/test';
import { applySystem, openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { openDesignFile, openKeepShare, saveDesignFile } from './support/files.ts';
import { planeSvg, rootMark } from './support/plane.ts';
import { chooseKind, designerForm, fillField, openDesignPage } from './support/design.ts';

/** Whether the marker's box lies inside the plane's SVG box. */
async function insidePlane(page: Page, what: ReturnType<typeof rootMark>): Promise<boolean> {
  const plane = await planeSvg(page).boundingBox();
  const box = await what.boundingBox();
  if (!plane || !box) return false;
  return (
    box.x >= plane.x &&
    box.y >= plane.y &&
    box.x + box.width <= plane.x + plane.width &&
    box.y + box.height <= plane.y + plane.height
  );
}

test('a pole at z = 2 applied or opened is in view together with the unit circle', async ({ page }, info) => {
  await openWorkbench(page);
  await applySystem(page, 'y[n] = 2 y[n-1] + x[n] + x[n-1]');
  const d = await readDesign(page);
  expect(d.poles.map((p) => p.re)).toEqual([expect.closeTo(2, 12)]);
  const pole = rootMark(page, { kind: 'pole', index: 0 });
  await expect.poll(() => insidePlane(page, pole)).toBe(true);
  expect(await insidePlane(page, planeSvg(page).locator('circle.pw-unit-circle'))).toBe(true);
  await saveScreenshot(page, info, 'fit-after-apply');

  // Back to the plain unit-circle view, which leaves z = 2 outside, then open the design from its file.
  await openKeepShare(page);
  const file = await saveDesignFile(page);
  await page.getByRole('button', { name: 'Whole unit circle' }).click();
  await expect.poll(() => insidePlane(page, pole)).toBe(false);
  await page.getByRole('button', { name: 'Demo design' }).click();
  // The same file with the pole moved to z = −3 (and no typed coefficients, which would disagree).
  const doc = JSON.parse(file.text) as { poles: { re: number }[]; typed?: unknown };
  doc.poles[0]!.re = -3;
  delete doc.typed;
  await openDesignFile(page, file.name, JSON.stringify(doc));
  await expect.poll(async () => (await readDesign(page)).poles[0]?.re).toBe(-3);
  await expect.poll(() => insidePlane(page, pole)).toBe(true);
  expect(await insidePlane(page, planeSvg(page).locator('circle.pw-unit-circle'))).toBe(true);
  await saveScreenshot(page, info, 'fit-after-open');
});

test('a part added to the design is framed with the unit circle, as after Apply', async ({ page }, info) => {
  await openWorkbench(page);
  const circle = planeSvg(page).locator('circle.pw-unit-circle');
  // Zoomed in on the middle of the plane: the unit circle runs off its edges.
  const zoomIn = page
    .getByRole('group', { name: 'Zoom', exact: true })
    .getByRole('button', { name: 'Zoom in' });
  for (let i = 0; i < 4; i++) await zoomIn.click();
  await expect.poll(() => insidePlane(page, circle)).toBe(false);
  await openDesignPage(page);
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '300');
  await fillField(page, '−3 dB width', '4');
  await designerForm(page).getByRole('button', { name: 'Add to the design' }).click();
  await expect(page.getByTestId('design-parts').getByTestId('design-part')).toHaveCount(2);
  await expect.poll(() => insidePlane(page, circle)).toBe(true);
  const d = await readDesign(page);
  for (const [kind, list] of [
    ['zero', d.zeros],
    ['pole', d.poles],
  ] as const)
    for (let i = 0; i < list.length; i++)
      expect(await insidePlane(page, rootMark(page, { kind, index: i }))).toBe(true);
  await saveScreenshot(page, info, 'fit-after-adding-a-part');
});
