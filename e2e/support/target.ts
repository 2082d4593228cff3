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
  /** The cascade section it belongs to (NaN for an FIR's quantized taps). */
  section: number;
  re: number;
  im: number;
  multiplicity: number;
}

/**
 * Every quantized root mark on the plane, read from the drawing's data attributes: of the sections
 * ('quantized-roots'), or of an FIR's quantized taps ('quantized-tap-zeros').
 */
export async function quantizedMarks(
  page: Page,
  layer: 'quantized-roots' | 'quantized-tap-zeros' = 'quantized-roots',
): Promise<QuantizedMark[]> {
  return page.locator(`[data-testid="${layer}"] [data-quantized]`).evaluateAll((els) =>
    els.map((e) => ({
      kind: e.getAttribute('data-quantized') as 'zero' | 'pole',
      section: Number(e.getAttribute('data-section') ?? NaN),
      re: Number(e.getAttribute('data-re')),
      im: Number(e.getAttribute('data-im')),
      multiplicity: Number(e.getAttribute('data-multiplicity') ?? 1),
    })),
  );
}

/** The points of an SVG path drawn with M and L commands only (the charts' line paths). */
export function pathPoints(d: string): { x: number; y: number }[] {
  return [...d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => ({
    x: Number(m[1]),
    y: Number(m[2]),
  }));
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
