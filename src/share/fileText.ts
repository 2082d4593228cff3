/**
 * The text of a design file from its bytes, the same in the page and on the command line: UTF-8 with or
 * without a byte-order mark, or UTF-16 (little- or big-endian) with a byte-order mark or, without one, when
 * the file starts with an ASCII character in UTF-16 (as editors that save "Unicode" text write it). Bytes
 * that are not valid in the encoding are refused, not replaced.
 */

export type FileTextResult = { ok: true; text: string; encoding: string } | { ok: false; message: string };

/** The encoding of the bytes, from their byte-order mark or their first two bytes. */
function sniff(b: Uint8Array): { label: 'utf-8' | 'utf-16le' | 'utf-16be'; skip: number } {
  if (b[0] === 0xef && b[1] === 0xbb && b[2] === 0xbf) return { label: 'utf-8', skip: 3 };
  if (b[0] === 0xff && b[1] === 0xfe) return { label: 'utf-16le', skip: 2 };
  if (b[0] === 0xfe && b[1] === 0xff) return { label: 'utf-16be', skip: 2 };
  if (b.length >= 2 && b[0]! !== 0 && b[0]! < 0x80 && b[1] === 0) return { label: 'utf-16le', skip: 0 };
  if (b.length >= 2 && b[0] === 0 && b[1]! !== 0 && b[1]! < 0x80) return { label: 'utf-16be', skip: 0 };
  return { label: 'utf-8', skip: 0 };
}

/** Decodes a design file's bytes (see the top of this file). */
export function decodeFileText(bytes: Uint8Array): FileTextResult {
  const { label, skip } = sniff(bytes);
  const body = bytes.subarray(skip);
  if (label !== 'utf-8' && body.length % 2 === 1)
    return {
      ok: false,
      message: `The file looks like ${label.toUpperCase()} text but has an odd number of bytes.`,
    };
  try {
    const text = new TextDecoder(label, { fatal: true, ignoreBOM: true }).decode(body);
    return { ok: true, text, encoding: skip > 0 ? `${label} with a byte-order mark` : label };
  } catch {
    return {
      ok: false,
      message: `The file is not valid ${label.toUpperCase()} text (a design file is UTF-8 or UTF-16 JSON).`,
    };
  }
}
