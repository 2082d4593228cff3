/** Drivers for the Target page (sections, fixed point, exports) and its layers on the plane and magnitude plot. */
import { expect, type Download, type Page } from '@playwright/test';

/** Opens the side column's Target page. */
export async function openTarget(page: Page): Promise<void> {
  await page.getByRole('tab', { name: 'Target' }).click();
  await expect(page.getByRole('heading', { name: 'Fixed point' })).toBeVisible();
}

/** Types a coefficient word length and commits it with Enter. */
export async function setCoefficientBits(page: Page, bits: number): Promise<void> {
  const field = page.getByRole('textbox', { name: 'Coefficients' });
  await field.fill(String(bits));
  await field.press('Enter');
  await expect(field).toHaveValue(String(bits));
}

/** A quantized root drawn on the plane (each conjugate is its own mark). */
export interface QuantizedMark {
  kind: 'zero' | 'pole';
  section: number;
  re: number;
  im: number;
}

/** Every quantized root mark on the plane, read from the drawing's data attributes. */
export async function quantizedMarks(page: Page): Promise<QuantizedMark[]> {
  return page.locator('[data-testid="quantized-roots"] [data-quantized]').evaluateAll((els) =>
    els.map((e) => ({
      kind: e.getAttribute('data-quantized') as 'zero' | 'pole',
      section: Number(e.getAttribute('data-section')),
      re: Number(e.getAttribute('data-re')),
      im: Number(e.getAttribute('data-im')),
    })),
  );
}

/** Chooses an export format (C header, JSON, CSV) and returns the preview's text. */
export async function exportPreview(page: Page, format: 'C header' | 'JSON' | 'CSV'): Promise<string> {
  await page.getByRole('radiogroup', { name: 'Export format' }).getByRole('radio', { name: format }).click();
  const preview = page.getByTestId('export-preview');
  await expect(preview).toBeVisible();
  return (await preview.textContent()) ?? '';
}

/** Clicks the export's Download button and waits for the file the browser receives. */
export async function downloadExport(page: Page): Promise<Download> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: /^Download / }).click(),
  ]);
  return download;
}
