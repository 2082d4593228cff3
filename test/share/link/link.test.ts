import { crc32 as zlibCrc32 } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { runDesigner } from '../../../src/core/design/index.ts';
import { DEFAULT_IMPLEMENTATION } from '../../../src/core/fixed/index.ts';
import { compressRoots } from '../../../src/core/system/index.ts';
import { toDocument, type SharedDesign } from '../../../src/share/document.ts';
import { toBase64Url, fromBase64Url } from '../../../src/share/link/base64url.ts';
import { ByteWriter } from '../../../src/share/link/bytes.ts';
import { encodePayload, withCheck } from '../../../src/share/link/codec.ts';
import { crc32 } from '../../../src/share/link/crc32.ts';
import { decodeLink, encodeLink, linkFragment, linkUrl } from '../../../src/share/link/index.ts';
import { writeNumber } from '../../../src/share/link/number.ts';
import { demoDesign } from '../../../src/store/demo.ts';
import { MAX_LINK_CHARS } from '../../../src/share/schema/limits.ts';
import { bitwiseDifference } from '../arbitraries.ts';

/** An order-8 classical low-pass at 48 kHz, as the designer produces it. */
function order8(family: 'butterworth' | 'elliptic'): SharedDesign {
  const r = runDesigner({
    kind: 'iir',
    fs: 48000,
    family,
    response: 'lowpass',
    order: 8,
    edgesHz: [1000],
    rippleDb: 0.5,
    attenuationDb: 60,
  });
  if (!r.ok) throw new Error(r.error.message);
  const { zeros, poles, gain } = r.value.zpk;
  return {
    design: {
      sampleRate: 48000,
      zeros: compressRoots(zeros),
      poles: compressRoots(poles),
      gainRule: { kind: 'fixed', value: gain },
      name: '',
      note: '',
    },
    view: {},
  };
}

function roundTrip(shared: SharedDesign): SharedDesign {
  const r = decodeLink(encodeLink(shared));
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe('link round trip', () => {
  it('gives back the demo design bit for bit', () => {
    const shared = { design: demoDesign(), view: { timeInput: 'step' as const, responsePoints: 4096 } };
    expect(bitwiseDifference(roundTrip(shared), shared)).toBeNull();
  });

  it('keeps −0, subnormals and the largest double', () => {
    const shared: SharedDesign = {
      design: {
        sampleRate: 5e-324,
        zeros: [{ re: -0, im: -0, multiplicity: 1 }],
        poles: [{ re: Number.MAX_VALUE, im: 0, multiplicity: 64 }],
        gainRule: { kind: 'fixed', value: -0 },
        name: 'x',
        note: '',
      },
      view: {},
    };
    const back = roundTrip(shared);
    expect(Object.is(back.design.zeros[0]!.im, -0)).toBe(true);
    expect(Object.is(back.design.zeros[0]!.re, -0)).toBe(true);
    expect(bitwiseDifference(back, shared)).toBeNull();
  });

  it('carries the designer and typed coefficients', () => {
    const shared = order8('butterworth');
    shared.design.designer = {
      kind: 'iir',
      fs: 48000,
      family: 'butterworth',
      response: 'lowpass',
      order: 8,
      edgesHz: [1000],
    };
    shared.design.typed = { b: [1, 0, -1], a: [1, -1.6, 0.64], text: 'b = [1, 0, -1]; a = [1, -1.6, 0.64]' };
    expect(bitwiseDifference(roundTrip(shared), shared)).toBeNull();
  });

  it('carries a requirement mask and implementation settings', () => {
    const shared = order8('elliptic');
    shared.design.mask = {
      regions: [
        { id: 'pass', kind: 'pass', fromHz: 0, toHz: 1000, lowerDb: -0.5 },
        { id: 'stop', kind: 'stop', fromHz: 1500, toHz: 24000, upperDb: -60, label: 'alias band' },
      ],
    };
    shared.design.implementation = { ...DEFAULT_IMPLEMENTATION, wordLength: 18, fractionBits: 15 };
    const back = roundTrip(shared);
    expect(bitwiseDifference(back, shared)).toBeNull();
    expect(back.design.implementation?.wordLength).toBe(18);
  });

  it('is compact: an order-8 design fits in about 200 characters', () => {
    // Butterworth: eight zeros at −1 and four pole pairs; elliptic: four zero pairs on the circle too.
    const butter = encodeLink(order8('butterworth'));
    const ellip = encodeLink(order8('elliptic'));
    expect(butter.length).toBeLessThan(140);
    expect(ellip.length).toBeLessThan(200);
  });

  it('writes short decimals in a few bytes and other doubles as 8 raw bytes', () => {
    const size = (x: number) => {
      const w = new ByteWriter();
      writeNumber(w, x);
      return w.result().length;
    };
    expect(size(0.64)).toBe(3); // tag + "0.64" in four nibbles
    expect(size(-0)).toBe(1);
    expect(size(Math.PI)).toBe(9);
  });
});

describe('link text', () => {
  it('is found in a full URL, a #fragment or a bare fragment', () => {
    const frag = encodeLink({ design: demoDesign(), view: {} });
    expect(linkFragment(`http://127.0.0.1:5173/#${frag}`)).toBe(frag);
    expect(linkFragment(`#${frag}`)).toBe(frag);
    expect(linkFragment(frag)).toBe(frag);
    expect(linkFragment('design.json')).toBeNull();
    expect(linkUrl('http://h/x#old', { design: demoDesign(), view: {} })).toBe(`http://h/x#${frag}`);
  });

  it('base64url matches the RFC 4648 test vectors without padding', () => {
    // RFC 4648 §10: "foobar" → Zm9vYmFy, "fo" → Zm8
    const enc = (s: string) => toBase64Url(new TextEncoder().encode(s));
    expect(enc('foobar')).toBe('Zm9vYmFy');
    expect(enc('fo')).toBe('Zm8');
    expect(enc('f')).toBe('Zg');
    expect(new TextDecoder().decode(fromBase64Url('Zm9vYg')!)).toBe('foob');
    expect(fromBase64Url('Zm9vY')).toBeNull(); // impossible length
    expect(fromBase64Url('Zh')).toBeNull(); // non-zero leftover bits
    expect(fromBase64Url('Zm+v')).toBeNull(); // '+' is not in the URL alphabet
  });
});

describe('hostile links', () => {
  const good = encodeLink({ design: demoDesign(), view: {} });
  /** A link of hand-made payload bytes with a correct check value, so the checks behind it are reached. */
  const checked = (bytes: Uint8Array) => 'pw2.' + toBase64Url(withCheck(bytes));
  const bytesLink = (bytes: number[]) => checked(Uint8Array.from(bytes));
  const message = (text: string) => {
    const r = decodeLink(text);
    expect(r.ok).toBe(false);
    return r.ok ? '' : r.message;
  };

  it('refuses a truncated link as altered or cut', () => {
    for (const n of [4, 5, 8, 40, good.length - 2])
      expect(message(good.slice(0, n))).toMatch(/^The link was altered or cut/);
  });

  it('refuses a newer link format and an unknown one', () => {
    expect(message('#pw3.AAAA')).toMatch(/newer Polewright/);
    expect(message('#pw0.AAAA')).toMatch(/does not exist/);
  });

  it('opens a link of the first format (no check value) with a note saying damage cannot be detected', () => {
    const old = 'pw1.' + toBase64Url(encodePayload(toDocument({ design: demoDesign(), view: {} })));
    const r = decodeLink(old);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(bitwiseDifference(r.value.design, demoDesign())).toBeNull();
    expect(r.notes).toEqual([expect.stringMatching(/no check value/)]);
    // A link of today's format has no such note.
    expect(decodeLink(good)).not.toHaveProperty('notes');
  });

  it('refuses degree 10^6 before allocating anything', () => {
    // flags 0, fs "1", gain DC, then a zero count of 10^6 with nothing after it.
    const w = new ByteWriter();
    w.varint(0);
    writeNumber(w, 1);
    w.byte(1);
    w.varint(1_000_000);
    expect(message(checked(w.result()))).toMatch(/at most 1024/);
  });

  it('refuses a multiplicity beyond the limit and an order beyond 1024', () => {
    const w = new ByteWriter();
    w.varint(0);
    writeNumber(w, 1);
    w.byte(1);
    w.varint(1);
    w.varint((100_000_000 - 1) * 4); // one real zero of multiplicity 10^8
    writeNumber(w, 0.5);
    w.varint(0);
    expect(message(checked(w.result()))).toMatch(/zeros\.0\.multiplicity/);
  });

  it('refuses 10^9 time samples through the shared view', () => {
    const shared = { design: demoDesign(), view: { timeSamples: 1e9 } };
    expect(message(encodeLink(shared))).toMatch(/view\.timeSamples/);
  });

  it('refuses a huge string length without reading it', () => {
    expect(message(bytesLink([1, 0x11, 0x1f, 1, 0, 0, 0xfe, 0xff, 0xff, 0x7f]))).toMatch(/name/);
  });

  it('refuses an oversized link before decoding', () => {
    expect(message('pw2.' + 'A'.repeat(MAX_LINK_CHARS))).toMatch(new RegExp(`at most ${MAX_LINK_CHARS}`));
  });

  it('refuses trailing bytes, unknown header bits and non-finite numbers', () => {
    expect(message(good + 'AAAA')).toMatch(/altered or cut/);
    const payload = encodePayload(toDocument({ design: demoDesign(), view: {} }));
    expect(message(checked(Uint8Array.from([...payload, 0, 0, 0])))).toMatch(/unexpected bytes/);
    expect(message(bytesLink([0x40]))).toMatch(/does not know/);
    const w = new ByteWriter();
    w.varint(0);
    w.byte(0);
    w.float64(Infinity);
    w.byte(1);
    w.varint(0);
    w.varint(0);
    expect(message(checked(w.result()))).toMatch(/sampleRate/);
  });

  it('keeps a field called __proto__ a plain field and refuses it', () => {
    // A designer object whose only field is "__proto__" holding {polluted: true}.
    const w = new ByteWriter();
    w.varint(8);
    writeNumber(w, 1);
    w.byte(1);
    w.varint(0);
    w.varint(0);
    const lit = (s: string) => {
      const b = new TextEncoder().encode(s);
      w.varint(b.length * 2);
      w.bytes(b);
    };
    w.byte(0xf5); // object, 1 field: designer = { __proto__: { polluted: true } }
    w.varint(1);
    w.varint(0 * 2 + 1); // dictionary word 0, "designer"
    w.byte(0xf5);
    w.varint(1);
    lit('__proto__');
    w.byte(0xf5);
    w.varint(1);
    lit('polluted');
    w.byte(0xf2);
    expect(message(checked(w.result()))).toMatch(/designer/);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('CRC-32', () => {
  it('matches the check value of the algorithm and zlib on random bytes', () => {
    // The standard check value of CRC-32 (ISO-HDLC) for the ASCII bytes "123456789", from memory.
    expect(crc32(new TextEncoder().encode('123456789'))).toBe(0xcbf43926);
    expect(crc32(new Uint8Array(0))).toBe(0);
    let seed = 7;
    for (let n = 1; n < 600; n += 37) {
      const bytes = Uint8Array.from({ length: n }, () => (seed = (seed * 1103515245 + 12345) >>> 0) >>> 24);
      expect(crc32(bytes)).toBe(zlibCrc32(bytes)); // node:zlib crc32 (Node ≥ 20.15), an outside reference
    }
  });
});
