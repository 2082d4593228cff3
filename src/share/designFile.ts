/**
 * Polewright design files: JSON in our own versioned schema (see README.md in this folder), validated on
 * the way in and migrated from older versions. Numbers are written so that they read back bitwise equal.
 */
import type { Design } from '../core/model/design.ts';
import { fromDocument, toDocument, type SharedDesign, type ShareResult } from './document.ts';
import { stringifyExact } from './exactJson.ts';
import { MAX_FILE_CHARS } from './schema/limits.ts';
import { readDocument } from './schema/migrate.ts';

export { MAX_FILE_CHARS } from './schema/limits.ts';

/** Reads design-file text of any released version; on failure says what was wrong, where, what is accepted. */
export function readSharedFile(text: string): ShareResult {
  if (text.length > MAX_FILE_CHARS) {
    return {
      ok: false,
      message: `The file is ${text.length} characters; at most ${MAX_FILE_CHARS} are accepted.`,
    };
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return { ok: false, message: `The file is not valid JSON: ${(e as Error).message}` };
  }
  const r = readDocument(json);
  return r.ok ? { ok: true, value: fromDocument(r.document) } : r;
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
