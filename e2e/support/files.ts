/**
 * Drivers for the "Share" page in end-to-end tests: open the page, save and open design files,
 * drop a file on the page, use the library, pin a reference and download pictures of the views.
 */
import { expect, type Download, type Locator, type Page } from '@playwright/test';

/** Shows the "Share" page of the side column. */
export async function openKeepShare(page: Page): Promise<void> {
  await page.getByRole('tab', { name: 'Share' }).click();
  await expect(page.getByRole('heading', { name: 'Design file' })).toBeVisible();
}

/** Clicks something that starts a download and returns the download with its bytes. */
export async function downloadOf(
  page: Page,
  click: () => Promise<void>,
): Promise<{ download: Download; bytes: Buffer }> {
  const pending = page.waitForEvent('download');
  await click();
  const download = await pending;
  return { download, bytes: await downloadBytes(download) };
}

/** The bytes of a finished download (read as a stream: the shared browser is remote to the worker). */
export async function downloadBytes(download: Download): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of await download.createReadStream()) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** Saves the design file through the page and returns its name and text. */
export async function saveDesignFile(page: Page): Promise<{ name: string; text: string }> {
  const { download, bytes } = await downloadOf(page, () =>
    page.getByRole('button', { name: 'Save file' }).click(),
  );
  return { name: download.suggestedFilename(), text: bytes.toString('utf8') };
}

/** Opens a design file through the page's file picker. */
export async function openDesignFile(page: Page, name: string, text: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Open file…' }).click();
  await (await chooser).setFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text, 'utf8') });
}

/** Drops a file with the given text on the page (on the z-plane, far from the side page's controls). */
export async function dropFile(page: Page, name: string, text: string): Promise<void> {
  const transfer = await page.evaluateHandle(
    ({ name, text }) => {
      const dt = new DataTransfer();
      dt.items.add(new File([text], name, { type: 'application/json' }));
      return dt;
    },
    { name, text },
  );
  const target = page.locator('section[aria-label="z-plane"]');
  await target.dispatchEvent('dragenter', { dataTransfer: transfer });
  await target.dispatchEvent('dragover', { dataTransfer: transfer });
  await expect(page.getByTestId('file-drop')).toBeVisible();
  await target.dispatchEvent('drop', { dataTransfer: transfer });
  await expect(page.getByTestId('file-drop')).toBeHidden();
}

/** The library entry showing exactly this name. */
export function libraryEntry(page: Page, name: string): Locator {
  return page
    .getByTestId('library-entry')
    .filter({ has: page.getByTestId('library-name').getByText(name, { exact: true }) });
}

/** Saves the current design to the library under a name. */
export async function saveToLibrary(page: Page, name: string): Promise<void> {
  await page.getByRole('textbox', { name: 'Name to save under' }).fill(name);
  await page.getByRole('button', { name: 'Save to library' }).click();
  await expect(libraryEntry(page, name)).toHaveCount(1);
}

/** Downloads a picture of a view through its panel's Picture menu. */
export async function downloadPicture(
  page: Page,
  panel: 'z-plane' | 'frequency response' | 'time response',
  format: 'SVG' | 'PNG',
): Promise<{ name: string; bytes: Buffer }> {
  const section = page.locator(`section[aria-label="${panel}"]`);
  await section.getByRole('button', { name: /^Save a picture/ }).click();
  const { download, bytes } = await downloadOf(page, () =>
    section.getByRole('menuitem', { name: new RegExp(`^${format}`) }).click(),
  );
  return { name: download.suggestedFilename(), bytes };
}

/** Width and height of a PNG, from its IHDR chunk; throws when the bytes are not a PNG. */
export function pngSize(bytes: Buffer): { width: number; height: number } {
  // PNG signature and IHDR layout: ISO/IEC 15948 (PNG), §5.2 and §11.2.2.
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  if (!bytes.subarray(0, 8).equals(signature)) throw new Error('not a PNG: the signature is missing');
  if (bytes.subarray(12, 16).toString('latin1') !== 'IHDR')
    throw new Error('not a PNG: IHDR does not come first');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
