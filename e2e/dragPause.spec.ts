/** Side-column parts that pause during a root drag keep their text, say so, and catch up on release. */
import { expect, test } from '@playwright/test';
import { applySystem, openWorkbench } from './support/app.ts';
import { rootAt, zToScreen } from './support/plane.ts';

test('the written-out forms keep their text during a drag and show the moved system on release', async ({
  page,
}) => {
  await openWorkbench(page);
  await applySystem(page, 'zeros: 1∠40°; poles: 0.9∠30°; gain: 1');
  const forms = page.getByTestId('system-forms');
  const before = await forms.locator('dd').allTextContents();
  const from = await zToScreen(page, await rootAt(page, { kind: 'pole', index: 0 }));
  const to = await zToScreen(page, { re: 0.5 * Math.cos(1), im: 0.5 * Math.sin(1) });
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 8 });
  await expect(page.getByTestId('forms-paused')).toHaveText('updates on release');
  expect(await forms.locator('dd').allTextContents()).toEqual(before);
  await page.mouse.up();
  await expect(page.getByTestId('forms-paused')).toHaveCount(0);
  const after = await forms.locator('dd').allTextContents();
  expect(after).toHaveLength(before.length);
  expect(after.every((t, i) => t !== before[i])).toBe(true);
});
