/**
 * Nothing half-typed is lost: a design name or note still being typed (no Enter, the field still focused)
 * when the page is reloaded or the tab closed is in the design the next page opens.
 */
import { expect, test, type Page } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';

const nameField = (page: Page) => page.getByRole('textbox', { name: 'Design name' });
const noteField = (page: Page) => page.getByRole('textbox', { name: 'About this design' });

test('a name and a note being typed survive a reload', async ({ page }, testInfo) => {
  await openWorkbench(page);
  await nameField(page).click();
  await nameField(page).fill('');
  await page.keyboard.type('Pump skid bracket notch');
  await noteField(page).click();
  await noteField(page).fill('');
  await page.keyboard.type('3.15 kHz bracket resonance; check on the skid before');
  // The name was committed when the note took the focus; the note is still being typed.
  await expect(noteField(page)).toBeFocused();
  expect((await readDesign(page)).note).not.toContain('bracket resonance');
  await saveScreenshot(page, testInfo, 'drafts-mid-typing');
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(nameField(page)).toHaveValue('Pump skid bracket notch');
  await expect(noteField(page)).toHaveValue('3.15 kHz bracket resonance; check on the skid before');
  // The typed note is one undo step, as Enter would have made it.
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(noteField(page)).toHaveValue(/grain-hopper/);
  await expect(nameField(page)).toHaveValue('Pump skid bracket notch');
  await saveScreenshot(page, testInfo, 'drafts-after-reload-and-undo');
});

test('a name being typed when the tab is closed is there in the next tab', async ({ context }) => {
  const page = await context.newPage();
  await openWorkbench(page);
  await nameField(page).click();
  await nameField(page).fill('');
  await page.keyboard.type('Bench interface, 60 Hz loop');
  await expect(nameField(page)).toBeFocused();
  await page.close({ runBeforeUnload: true });
  // A new tab continues the newest session of this browser.
  const next = await context.newPage();
  await openWorkbench(next);
  await expect(nameField(next)).toHaveValue('Bench interface, 60 Hz loop');
});

test('an empty design offers its note field, and Escape brings the note back', async ({ page }, testInfo) => {
  await openWorkbench(page);
  await page.getByRole('button', { name: 'Start empty' }).click();
  await expect(noteField(page)).toHaveValue('');
  await expect(noteField(page)).toHaveAttribute('placeholder', /Add a note/);
  await noteField(page).click();
  await page.keyboard.type('first line');
  await page.keyboard.press('Shift+Enter');
  await page.keyboard.type('second line');
  await page.keyboard.press('Enter');
  expect((await readDesign(page)).note).toBe('first line\nsecond line');
  await noteField(page).click();
  await page.keyboard.type(' and more');
  await page.keyboard.press('Escape');
  await expect(noteField(page)).toHaveValue('first line\nsecond line');
  await saveScreenshot(page, testInfo, 'drafts-note-two-lines');
});

test('a half-typed system in the entry box survives a reload and a switch of side page', async ({ page }) => {
  await openWorkbench(page);
  const box = page.getByRole('textbox', { name: 'System text' });
  await box.click();
  await page.keyboard.type('y[n] = 0.9 y[n-1] + x[n] - x[n-');
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(box).toHaveValue('y[n] = 0.9 y[n-1] + x[n] - x[n-');
  await page.getByRole('tab', { name: 'Design' }).click();
  await page.getByRole('tab', { name: 'System' }).click();
  await expect(box).toHaveValue('y[n] = 0.9 y[n-1] + x[n] - x[n-');
  // Typed text is not the design until applied.
  expect((await readDesign(page)).name).toMatch(/Hopper scale/);
});
