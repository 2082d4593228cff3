/**
 * Design files are read the same way in the page and on the command line: UTF-8 with or without a mark,
 * UTF-16 in either byte order with a mark or starting with an ASCII character; invalid bytes are refused.
 * Node's Buffer encoders are the outside reference for the bytes of each encoding.
 */
import { describe, expect, it } from 'vitest';
import { decodeFileText } from '../../src/share/fileText.ts';
import { readSharedFileBytes, writeSharedFile } from '../../src/share/designFile.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { bitwiseDifference } from './arbitraries.ts';

const text = writeSharedFile({ design: { ...demoDesign(), name: 'Kühlschrank ☃ 𝄞' }, view: {} });
const be = (s: string) => Buffer.from(s, 'utf16le').swap16();

describe('design file text', () => {
  const forms: [string, Uint8Array][] = [
    ['UTF-8', Buffer.from(text, 'utf8')],
    ['UTF-8 with a mark', Buffer.from('\ufeff' + text, 'utf8')],
    ['UTF-16LE with a mark', Buffer.from('\ufeff' + text, 'utf16le')],
    ['UTF-16BE with a mark', be('\ufeff' + text)],
    ['UTF-16LE without a mark', Buffer.from(text, 'utf16le')],
    ['UTF-16BE without a mark', be(text)],
  ];
  it.each(forms)('%s opens the same design', (_, bytes) => {
    const t = decodeFileText(bytes);
    expect(t.ok && t.text).toBe(text);
    const r = readSharedFileBytes(bytes);
    if (!r.ok) throw new Error(r.message);
    expect(bitwiseDifference(r.value.design, { ...demoDesign(), name: 'Kühlschrank ☃ 𝄞' })).toBeNull();
  });

  it('refuses invalid UTF-8 and a torn UTF-16 file', () => {
    expect(decodeFileText(Uint8Array.from([0x7b, 0xff, 0x7d]))).toMatchObject({
      ok: false,
      message: expect.stringMatching(/not valid UTF-8/),
    });
    expect(decodeFileText(Uint8Array.from([0xff, 0xfe, 0x7b, 0x00, 0x7d]))).toMatchObject({
      ok: false,
      message: expect.stringMatching(/odd number of bytes/),
    });
  });
});
