/**
 * Polewright design files: JSON in our own versioned schema (see README.md in this folder), validated on
 * the way in and migrated from older versions. Numbers are written so that they read back bitwise equal.
 */
import type { Design } from '../core/model/design.ts';
import { fromDocument, toDocument, type SharedDesign, type ShareResult } from './document.ts';
import { stringifyExact } from './exactJson.ts';
import { MAX_FILE_BYTES, MAX_FILE_CHARS, MAX_FILE_DEPTH } from './schema/limits.ts';
import { decodeFileText } from './fileText.ts';
import { parseStrictJson } from './strictJson.ts';
import { readDocumentNow } from './schema/reader.ts';

export { MAX_FILE_BYTES, MAX_FILE_CHARS } from './schema/limits.ts';

/**
 * Reads design-file text of any released version; on failure says what was wrong, where, what is accepted.
 * The JSON is read strictly: a key given twice in one object is refused with its place (strictJson.ts).
 */
export function readSharedFile(text: string): ShareResult {
  if (text.length > MAX_FILE_CHARS) {
    return {
      ok: false,
      message: `The file is ${text.length} characters; at most ${MAX_FILE_CHARS} are accepted.`,
    };
  }
  const json = parseStrictJson(text, MAX_FILE_DEPTH);
  if (!json.ok) return { ok: false, message: `The file is not valid JSON: ${json.message}.` };
  const r = readDocumentNow(json.value);
  return r.ok ? { ok: true, value: fromDocument(r.document) } : r;
}

/**
 * Reads a design file from its bytes, as the page and the command line both do: the size is checked first,
 * then the text is decoded (UTF-8 or UTF-16, fileText.ts) and read as above.
 */
export function readSharedFileBytes(bytes: Uint8Array): ShareResult {
  if (bytes.length > MAX_FILE_BYTES) return { ok: false, message: tooLarge(bytes.length) };
  const text = decodeFileText(bytes);
  return text.ok ? readSharedFile(text.text) : text;
}

/** The message for a file of `bytes` bytes, above MAX_FILE_BYTES. */
export function tooLarge(bytes: number): string {
  return `The file is ${(bytes / 1e6).toFixed(1)} MB; a design file is at most ${(MAX_FILE_BYTES / 1e6).toFixed(1)} MB.`;
}

/** Writes a design (and its shared view settings) as current-version file text. */
export function writeSharedFile(shared: SharedDesign): string {
  return stringifyExact(toDocument(shared), 2) + '\n';
}

/** Reads design-file text, keeping only the design. */
export function readDesignFile(text: string): { ok: true; design: Design } | { ok: false; message: string } {
  const r = readSharedFile(text);
  return r.ok ? { ok: true, design: r.value.design } : r;
}

/** Writes a design as current-version file text, without view settings. */
export function writeDesignFile(design: Design): string {
  return writeSharedFile({ design, view: {} });
}
