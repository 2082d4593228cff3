/** Saves text as a file through a Blob and a temporary <a download> (no server round trip). */
export function downloadText(text: string, fileName: string, mime: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Revoke after the click has been handled; revoking at once can cancel the download in some browsers.
  window.setTimeout(() => URL.revokeObjectURL(url), 0);
}
