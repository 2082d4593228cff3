/** Reads a design file the user picked or dropped, refusing oversized files before reading them. */
import { MAX_FILE_BYTES, readSharedFileBytes, tooLarge } from '../../../share/designFile.ts';
import type { ShareResult } from '../../../share/document.ts';
import { readWhenReady } from '../../../share/schema/reader.ts';

/** The design in a file, or a message naming the file and saying what was wrong. */
export async function readDesignBlob(file: File): Promise<ShareResult> {
  const label = `“${file.name}”`;
  if (file.size > MAX_FILE_BYTES)
    return { ok: false, message: `${label} was not opened. ${tooLarge(file.size)}` };
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await file.arrayBuffer());
  } catch (e) {
    return { ok: false, message: `${label} could not be read: ${(e as Error).message}` };
  }
  let r: ShareResult;
  try {
    r = await readWhenReady(() => readSharedFileBytes(bytes));
  } catch (e) {
    return {
      ok: false,
      message: `${label} could not be read: part of the page did not load (${(e as Error).message}). Reload the page to try again.`,
    };
  }
  return r.ok ? r : { ok: false, message: `${label} was not opened. ${r.message}` };
}
