/**
 * Work that is not saved is never silent, and tabs keep their own work: a full or blocked browser storage
 * gives a lasting notice with the design one click away as a file; two pages of one browser keep their own
 * sessions across reloads, and each says when the other changed the same design.
 */
import { expect, test, type Page } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { downloadBytes } from './support/files.ts';

const nameField = (page: Page) => page.getByRole('textbox', { name: 'Design name' });

async function rename(page: Page, name: string): Promise<void> {
  await nameField(page).fill(name);
  await nameField(page).press('Enter');
  await expect(nameField(page)).toHaveValue(name);
}

/**
 * Fills this site's storage until only `room` characters are left (keys and values count), as another tab or
 * a big library would; the saved sessions go first, so that even the design alone no longer fits.
 */
async function fillStorage(page: Page, room: number): Promise<void> {
  await page.evaluate((left) => {
    for (const key of Object.keys(localStorage))
      if (key.startsWith('polewright.session')) localStorage.removeItem(key);
    let lo = 0;
    let hi = 20_000_000;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      try {
        localStorage.setItem('filler', 'x'.repeat(mid));
        lo = mid;
      } catch {
        hi = mid;
      }
    }
    localStorage.setItem('filler', 'x'.repeat(Math.max(0, lo - left)));
  }, room);
}

test('a full storage gives a lasting notice that downloads the design, and goes when space is back', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  await rename(page, 'Saved before the storage filled');
  await page.waitForTimeout(600);
  await fillStorage(page, 50);
  await rename(page, 'Changed while the storage is full');
  const notice = page.getByRole('alert').filter({ hasText: 'not saved' });
  await expect(notice).toContainText('browser storage is full');
  await saveScreenshot(page, testInfo, 'storage-full-notice');
  // It stays (errors do not fade) and its button downloads the design as a file.
  await page.waitForTimeout(1000);
  await expect(notice).toBeVisible();
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    notice.getByRole('button', { name: 'Download the design' }).click(),
  ]);
  const file = JSON.parse((await downloadBytes(download)).toString('utf8'));
  expect(file.name).toBe('Changed while the storage is full');
  expect(file.zeros).toEqual((await readDesign(page)).zeros);
  // Space again: the next change is saved, the notice goes, and a reload keeps the change.
  await page.evaluate(() => localStorage.removeItem('filler'));
  await rename(page, 'Saved again');
  await expect(notice).toHaveCount(0);
  await expect(page.getByRole('status').filter({ hasText: 'Autosave works again' })).toBeVisible();
  await page.reload();
  await expect(nameField(page)).toHaveValue('Saved again');
});

test('blocked storage is said at once, with the download', async ({ browser }) => {
  const context = await browser.newContext();
  await context.addInitScript(() => {
    Object.defineProperty(window, 'localStorage', {
      get() {
        throw new DOMException('The operation is insecure.', 'SecurityError');
      },
    });
  });
  const page = await context.newPage();
  await openWorkbench(page);
  const notice = page.getByRole('alert').filter({ hasText: 'not being saved' });
  await expect(notice).toContainText('does not let the workbench use its storage');
  await expect(notice.getByRole('button', { name: 'Download the design' })).toBeVisible();
  await context.close();
});

test('two pages in one browser keep their own work and say when the other changed it', async ({
  browser,
}, testInfo) => {
  const context = await browser.newContext();
  const a = await context.newPage();
  await openWorkbench(a);
  await rename(a, 'Work of A');
  await a.waitForTimeout(600);
  // A second page continues the newest work, then goes its own way.
  const b = await context.newPage();
  await openWorkbench(b);
  await expect(nameField(b)).toHaveValue('Work of A');
  await rename(b, 'Work of B');
  const told = a.getByRole('status').filter({ hasText: 'Another tab changed this design' });
  await expect(told).toContainText('“Work of B”');
  await saveScreenshot(a, testInfo, 'other-tab-notice');
  // A takes B's version (one undo step), then undoes it: its own copy is back.
  await told.getByRole('button', { name: "Open the other tab's version" }).click();
  await expect(nameField(a)).toHaveValue('Work of B');
  await a.getByRole('button', { name: 'Undo' }).click();
  await expect(nameField(a)).toHaveValue('Work of A');
  // B changes again; A keeps its own copy, and from then on neither tab reports the other.
  await rename(b, 'Work of B, later');
  await told.getByRole('button', { name: "Keep this tab's copy" }).click();
  await expect(told).toHaveCount(0);
  await rename(a, 'Work of A, later');
  await rename(b, 'Work of B, last');
  await a.waitForTimeout(800);
  await expect(a.getByRole('status').filter({ hasText: 'Another tab' })).toHaveCount(0);
  await expect(b.getByRole('status').filter({ hasText: 'Another tab' })).toHaveCount(0);
  // A reload of each restores its own work.
  await a.reload();
  await b.reload();
  await expect(nameField(a)).toHaveValue('Work of A, later');
  await expect(nameField(b)).toHaveValue('Work of B, last');
  await context.close();
});
