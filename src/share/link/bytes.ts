/**
 * Byte buffers for the link codec: unsigned LEB128 varints, little-endian float64, UTF-8 strings. The
 * reader never reads past its end and never allocates more than the bytes left could describe.
 */

/** A link that cannot be read; the message says what was wrong. Thrown inside the decoder only. */
export class LinkFormatError extends Error {}

/** Largest varint accepted: 2^31 − 1, far above any count a design needs. */
const MAX_VARINT = 0x7fff_ffff;

export class ByteWriter {
  private buf = new Uint8Array(64);
  private n = 0;

  private room(k: number): void {
    if (this.n + k <= this.buf.length) return;
    const next = new Uint8Array(Math.max(this.buf.length * 2, this.n + k));
    next.set(this.buf.subarray(0, this.n));
    this.buf = next;
  }

  byte(b: number): void {
    this.room(1);
    this.buf[this.n++] = b & 0xff;
  }

  bytes(b: Uint8Array): void {
    this.room(b.length);
    this.buf.set(b, this.n);
    this.n += b.length;
  }

  /** Unsigned LEB128 of a whole number in [0, 2^31). */
  varint(v: number): void {
    if (!Number.isInteger(v) || v < 0 || v > MAX_VARINT) throw new RangeError(`varint out of range: ${v}`);
    while (v >= 0x80) {
      this.byte((v & 0x7f) | 0x80);
      v >>>= 7;
    }
    this.byte(v);
  }

  float64(v: number): void {
    const b = new Uint8Array(8);
    new DataView(b.buffer).setFloat64(0, v, true);
    this.bytes(b);
  }

  result(): Uint8Array {
    return this.buf.slice(0, this.n);
  }
}

export class ByteReader {
  private pos = 0;
  constructor(private readonly buf: Uint8Array) {}

  get remaining(): number {
    return this.buf.length - this.pos;
  }

  private need(k: number, what: string): void {
    if (k > this.remaining)
      throw new LinkFormatError(`the link ends in the middle of ${what} (it may be cut short)`);
  }

  byte(what: string): number {
    this.need(1, what);
    return this.buf[this.pos++]!;
  }

  bytes(k: number, what: string): Uint8Array {
    this.need(k, what);
    const out = this.buf.subarray(this.pos, this.pos + k);
    this.pos += k;
    return out;
  }

  varint(what: string): number {
    let v = 0;
    for (let shift = 0; shift < 35; shift += 7) {
      const b = this.byte(what);
      v += (b & 0x7f) * 2 ** shift;
      if (v > MAX_VARINT) throw new LinkFormatError(`${what} is out of range`);
      if (b < 0x80) return v;
    }
    throw new LinkFormatError(`${what} is out of range`);
  }

  /** A count of items that each take at least `minBytes`, refused if the rest of the link cannot hold them. */
  count(what: string, max: number, minBytes = 1): number {
    const n = this.varint(what);
    if (n > max) throw new LinkFormatError(`${what} is ${n}; at most ${max} are accepted`);
    if (n * minBytes > this.remaining) throw new LinkFormatError(`${what} is ${n}, more than the link holds`);
    return n;
  }

  float64(what: string): number {
    const b = this.bytes(8, what);
    return new DataView(b.buffer, b.byteOffset, 8).getFloat64(0, true);
  }
}

const utf8Encoder = new TextEncoder();
const utf8Decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });

export function encodeUtf8(s: string): Uint8Array {
  return utf8Encoder.encode(s);
}

export function decodeUtf8(b: Uint8Array, what: string): string {
  try {
    return utf8Decoder.decode(b);
  } catch {
    throw new LinkFormatError(`${what} is not valid UTF-8 text`);
  }
}
