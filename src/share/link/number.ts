/**
 * Numbers in a link, bitwise exact and short: each value is written either as its shortest round-trip
 * decimal (ECMAScript Number::toString) packed four bits per character, or as its raw IEEE-754 float64
 * bytes, whichever is shorter; negative zero has its own tag. A user-typed 0.64 takes 3 bytes, a designed
 * pole coordinate 9.
 */
import { LinkFormatError, type ByteReader, type ByteWriter } from './bytes.ts';

/** Tag bytes. Decimal tags are DECIMAL_TAG + number of characters (1…MAX_DECIMAL_CHARS). */
export const FLOAT64_TAG = 0x00;
export const NEGATIVE_ZERO_TAG = 0x01;
export const DECIMAL_TAG = 0x10;
/** Longest decimal worth packing: 14 characters take 1 + 7 bytes, one less than a float64. */
export const MAX_DECIMAL_CHARS = 14;
/** Whether a byte is a number tag (the generic value codec uses the other bytes for its own tags). */
export function isNumberTag(tag: number): boolean {
  return (
    tag === FLOAT64_TAG ||
    tag === NEGATIVE_ZERO_TAG ||
    (tag > DECIMAL_TAG && tag <= DECIMAL_TAG + MAX_DECIMAL_CHARS)
  );
}

/** The 4-bit alphabet of decimals; 0xF pads an odd count. */
const DIGITS = '0123456789.-e+';
const PAD = 0xf;
const DECIMAL = /^-?\d+(\.\d+)?(e[+-]\d+)?$/;

/** Bytes writeNumber uses for x. */
export function numberSize(x: number): number {
  if (Object.is(x, -0)) return 1;
  const len = String(x).length;
  return len > MAX_DECIMAL_CHARS ? 9 : 1 + Math.ceil(len / 2);
}

/** Writes a finite number. */
export function writeNumber(w: ByteWriter, x: number): void {
  if (!Number.isFinite(x)) throw new RangeError(`cannot put ${x} in a link`);
  if (Object.is(x, -0)) {
    w.byte(NEGATIVE_ZERO_TAG);
    return;
  }
  const s = String(x);
  if (s.length > MAX_DECIMAL_CHARS) {
    w.byte(FLOAT64_TAG);
    w.float64(x);
    return;
  }
  w.byte(DECIMAL_TAG + s.length);
  for (let i = 0; i < s.length; i += 2) {
    const hi = DIGITS.indexOf(s[i]!);
    const lo = i + 1 < s.length ? DIGITS.indexOf(s[i + 1]!) : PAD;
    w.byte((hi << 4) | lo);
  }
}

/** Reads the rest of a number whose tag byte has been read. */
export function readNumberAfterTag(r: ByteReader, tag: number, what: string): number {
  if (tag === NEGATIVE_ZERO_TAG) return -0;
  if (tag === FLOAT64_TAG) return r.float64(what);
  const len = tag - DECIMAL_TAG;
  if (!(len >= 1 && len <= MAX_DECIMAL_CHARS)) throw new LinkFormatError(`${what} has an unknown number tag`);
  const packed = r.bytes(Math.ceil(len / 2), what);
  let s = '';
  for (let i = 0; i < len; i++) {
    const nib = i % 2 === 0 ? packed[i >> 1]! >> 4 : packed[i >> 1]! & 0xf;
    const c = DIGITS[nib];
    if (c === undefined) throw new LinkFormatError(`${what} is not a number`);
    s += c;
  }
  if (len % 2 === 1 && (packed[len >> 1]! & 0xf) !== PAD)
    throw new LinkFormatError(`${what} is not a number`);
  if (!DECIMAL.test(s)) throw new LinkFormatError(`${what} ("${s}") is not a number`);
  const v = Number(s);
  if (!Number.isFinite(v)) throw new LinkFormatError(`${what} (${s}) is not a finite number`);
  return v;
}

/** Reads a number (tag and body). */
export function readNumber(r: ByteReader, what: string): number {
  return readNumberAfterTag(r, r.byte(what), what);
}
