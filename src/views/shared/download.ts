/** Downloads a Blob under a file name: an object URL on a temporary <a download>, released right after. */
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
  // The click has started the download synchronously; a short delay keeps slow browsers safe.
  window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
