/**
 * Sharing in real Chromium: a link opens the identical design in a fresh browser, a reload keeps the design
 * and its undo history, a bad link leaves the design alone with a message, and markup in a name stays text.
 * Against the production build it also checks that the Content-Security-Policy is in place and silent.
 */
import { expect, test, type Page } from '@playwright/test';
import { DEFAULT_IMPLEMENTATION } from '../src/core/fixed/index.ts';
import { toDocument, type SharedDesign } from '../src/share/document.ts';
import { toBase64Url } from '../src/share/link/base64url.ts';
import { encodePayload } from '../src/share/link/codec.ts';
import { encodeLink } from '../src/share/link/index.ts';
import { demoDesign } from '../src/store/demo.ts';
import { bitwiseDifference } from '../test/share/arbitraries.ts';
import { openWorkbench, readDesign } from './support/app.ts';

/** A design with every part a link carries, and numbers that only survive bit-exact transport. */
function richDesign(name = 'Shared notch'): SharedDesign {
  const demo = demoDesign();
  return {
    design: {
      ...demo,
      name,
      note: 'Sent as a link; <b>not bold</b>.',
      zeros: [...demo.zeros, { re: -0, im: 0, multiplicity: 2 }],
      gainRule: { kind: 'fixed', value: 0.1 + 0.2 },
      designer: { kind: 'harmonicNotch', fs: 2000, f0: 50, harmonics: [1, 3, 5], q: 30 },
      mask: { regions: [{ id: 'hum', kind: 'stop', fromHz: 48, toHz: 52, upperDb: -40, label: 'mains' }] },
      implementation: { ...DEFAULT_IMPLEMENTATION, wordLength: 20 },
    },
    view: { frequencyAxis: 'log', timeInput: 'step' },
  };
}

/** Console errors and CSP violations seen on the page. */
function watchConsole(page: Page): string[] {
  const seen: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || /Content Security Policy|Refused to/.test(m.text())) seen.push(m.text());
  });
  page.on('pageerror', (e) => seen.push(e.message));
  return seen;
}

const canUndo = (page: Page) => page.evaluate(() => window.__polewright!.canUndo());

test('a link opens the identical design in a fresh browser', async ({ browser }) => {
  const shared = richDesign();
  const context = await browser.newContext();
  const page = await context.newPage();
  const problems = watchConsole(page);
  await page.goto(`/#${encodeLink(shared)}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  const design = await readDesign(page);
  expect(bitwiseDifference(design, shared.design)).toBeNull();
  expect(Object.is(design.zeros.at(-1)!.re, -0)).toBe(true);
  // The fragment stays (the address bar holds the open design), the previous design (the demo) is one
  // undo away, and the page says so.
  expect(new URL(page.url()).hash).toBe(`#${encodeLink(shared)}`);
  expect(await canUndo(page)).toBe(true);
  await expect(page.getByRole('status').filter({ hasText: 'from the link' })).toBeVisible();
  expect(problems).toEqual([]);
  await context.close();
});

test('a reload restores the design and its undo history', async ({ page }) => {
  const shared = richDesign('Before reload');
  await page.goto(`/#${encodeLink(shared)}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  const name = page.getByRole('textbox', { name: 'Design name' });
  await name.fill('Renamed after opening');
  await name.press('Enter');
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(name).toHaveValue('Renamed after opening');
  const restored = await readDesign(page);
  expect(bitwiseDifference({ ...restored, name: shared.design.name }, shared.design)).toBeNull();
  const undo = page.getByRole('button', { name: 'Undo' });
  await undo.click();
  await expect(name).toHaveValue('Before reload');
  await undo.click();
  expect(bitwiseDifference(await readDesign(page), demoDesign())).toBeNull();
  await expect(undo).toBeDisabled();
});

test('a malformed link shows a message and keeps the previous design', async ({ page }) => {
  await openWorkbench(page);
  const before = await readDesign(page);
  const good = encodeLink(richDesign());
  for (const bad of ['#pw1.AAAA', `#${good.slice(0, 50)}`, '#pw1.%3Cscript%3E', '#pw9.AAAA']) {
    await page.evaluate((h) => (window.location.hash = h), bad);
    await expect(page.getByRole('alert').last()).toContainText('could not be opened');
    expect(bitwiseDifference(await readDesign(page), before)).toBeNull();
  }
  // One character changed in the middle: the check value catches it, where it would open another design.
  const i = Math.floor(good.length / 2);
  const altered = good.slice(0, i) + (good[i] === 'Q' ? 'R' : 'Q') + good.slice(i + 1);
  await page.evaluate((h) => (window.location.hash = h), `#${altered}`);
  await expect(page.getByRole('alert').last()).toContainText('The link was altered or cut');
  expect(bitwiseDifference(await readDesign(page), before)).toBeNull();
  expect(await canUndo(page)).toBe(false);
  // On load, too: the restored design stays.
  await page.goto('about:blank');
  await page.goto('/#pw1.not-a-design');
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(page.getByRole('alert')).toContainText('unchanged');
  expect(bitwiseDifference(await readDesign(page), before)).toBeNull();
});

test('a link of the first format (no check value) opens with a note that stays', async ({ page }) => {
  const shared = richDesign('Old link');
  const old = 'pw1.' + toBase64Url(encodePayload(toDocument(shared)));
  await page.goto(`/#${old}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect(bitwiseDifference(await readDesign(page), shared.design)).toBeNull();
  const note = page.getByRole('status').filter({ hasText: 'no check value' });
  await expect(note).toContainText('damage to it cannot be detected');
  await page.waitForTimeout(9000);
  await expect(note).toBeVisible();
});

test('markup in a design name and note shows as text', async ({ page }) => {
  let dialogs = 0;
  page.on('dialog', (d) => {
    dialogs++;
    void d.dismiss();
  });
  const shared = richDesign('<img src=x onerror=alert(1)>');
  shared.design.note = '<script>alert(2)</script><img src=y onerror=alert(3)>';
  await page.goto(`/#${encodeLink(shared)}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(page.getByRole('textbox', { name: 'Design name' })).toHaveValue(
    '<img src=x onerror=alert(1)>',
  );
  await expect(page.getByLabel('About this design')).toHaveValue(shared.design.note);
  await expect(page.getByRole('status').filter({ hasText: 'from the link' })).toContainText(
    '<img src=x onerror=alert(1)>',
  );
  expect(await page.locator('img[src="x"], img[src="y"]').count()).toBe(0);
  expect(await page.locator('script', { hasText: 'alert' }).count()).toBe(0);
  expect(dialogs).toBe(0);
});

test('the built page carries the Content-Security-Policy and runs under it', async ({ page }) => {
  test.skip(
    !!process.env.PW_DEV,
    'the development server needs inline scripts; the policy is for the built page',
  );
  const problems = watchConsole(page);
  await openWorkbench(page);
  const csp = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
  expect(csp).toContain("default-src 'self'");
  expect(csp).not.toContain('unsafe-eval');
  expect(csp).not.toContain('unsafe-inline');
  // Exercise the parts that validate input (zod) and draw (SVG styles) under the policy.
  await page.evaluate((h) => (window.location.hash = h), `#${encodeLink(richDesign())}`);
  await expect(page.getByRole('status').filter({ hasText: 'from the link' })).toBeVisible();
  expect(problems).toEqual([]);
});

test('the server sends the policy as a header that forbids framing and sniffing', async ({
  page,
  baseURL,
}) => {
  const response = await page.goto('/');
  const headers = response!.headers();
  const csp = headers['content-security-policy'] ?? '';
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("default-src 'self'");
  expect(csp).toContain("object-src 'none'");
  expect(csp).not.toContain('unsafe-eval');
  expect(headers['x-content-type-options']).toBe('nosniff');
  expect(headers['x-frame-options']).toBe('DENY');
  // The built page's header is as strict as its <meta> tag; the development server relaxes only scripts
  // and styles inline (hot reload) and its WebSocket.
  if (!process.env.PW_DEV) expect(csp).not.toContain('unsafe-inline');
  // Another page cannot show the workbench in a frame.
  const framing = await page.context().newPage();
  await framing.route('http://framing.test/', (r) =>
    r.fulfill({ contentType: 'text/html', body: `<iframe src="${baseURL}/"></iframe>` }),
  );
  await framing.goto('http://framing.test/');
  await expect
    .poll(
      () =>
        framing
          .frames()
          .find((f) => f !== framing.mainFrame())
          ?.url() ?? '',
    )
    .toMatch(/^chrome-error:/);
  await framing.close();
});
