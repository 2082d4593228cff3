/** The side pages and recording tools load after the first view, and open at once when they are there. */
import { expect, test, type Page } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';

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
