/** Reads a design file the user picked or dropped, refusing oversized files before reading them. */
import { MAX_FILE_CHARS, readSharedFile } from '../../../share/designFile.ts';
import type { ShareResult } from '../../../share/document.ts';

/** Largest file read, bytes: UTF-8 takes at most 3 bytes per UTF-16 unit the loader accepts. */
export const MAX_FILE_BYTES = MAX_FILE_CHARS * 3;

/** The design in a file, or a message naming the file and saying what was wrong. */
export async function readDesignBlob(file: File): Promise<ShareResult> {
  const label = `“${file.name}”`;
  if (file.size > MAX_FILE_BYTES) {
    return {
      ok: false,
      message: `${label} is ${Math.round(file.size / 1e6)} MB; a design file is at most ${MAX_FILE_BYTES / 1e6} MB.`,
    };
  }
  let text: string;
  try {
    text = await file.text();
  } catch (e) {
    return { ok: false, message: `${label} could not be read: ${(e as Error).message}` };
  }
  const r = readSharedFile(text);
  return r.ok ? r : { ok: false, message: `${label} was not opened. ${r.message}` };
}
