/** Saving a file from the page: a Blob behind an object URL on a temporary <a download>, released after a delay. */

/**
 * How long the object URL outlives the click, ms. The click starts the download synchronously, but revoking
 * at once can cancel it in some browsers; a few seconds keeps slow ones safe.
 */
export const DOWNLOAD_REVOKE_DELAY_MS = 10_000;

/** Downloads a Blob under a file name. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), DOWNLOAD_REVOKE_DELAY_MS);
}

/** Downloads text as a file of the given MIME type. */
export function downloadText(text: string, fileName: string, mime: string): void {
  downloadBlob(new Blob([text], { type: mime }), fileName);
}
