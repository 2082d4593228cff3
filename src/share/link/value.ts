/**
 * The open-ended parts of a link (designer, view, mask, implementation) as a compact binary JSON: one tag
 * byte per value, numbers as in number.ts (their tags double as value tags), strings from the dictionary
 * when they are in it. Reading is bounded in depth and in the number of values.
 */
import { MAX_TYPED_TEXT_CHARS } from '../../core/model/limits.ts';
import { MAX_VALUE_DEPTH, MAX_VALUE_NODES } from '../schema/limits.ts';
import { ByteReader, ByteWriter, LinkFormatError, decodeUtf8, encodeUtf8 } from './bytes.ts';
import { LINK_DICTIONARY, dictionaryIndex } from './dictionary.ts';
import { isNumberTag, readNumberAfterTag, writeNumber } from './number.ts';

const NULL = 0xf0;
const FALSE = 0xf1;
const TRUE = 0xf2;
const STRING = 0xf3;
const ARRAY = 0xf4;
const OBJECT = 0xf5;
/** Most UTF-8 bytes of one string: every character of the longest text (the typed text) at up to 3 bytes. */
const MAX_STRING_BYTES = MAX_TYPED_TEXT_CHARS * 3;

/** Writes a string: odd header = dictionary index, even header = literal UTF-8 of (header / 2) bytes. */
export function writeString(w: ByteWriter, s: string): void {
  const i = dictionaryIndex(s);
  if (i !== undefined) {
    w.varint(i * 2 + 1);
    return;
  }
  const b = encodeUtf8(s);
  w.varint(b.length * 2);
  w.bytes(b);
}

export function readString(r: ByteReader, what: string): string {
  const h = r.varint(what);
  if (h % 2 === 1) {
    const s = LINK_DICTIONARY[(h - 1) / 2];
    if (s === undefined)
      throw new LinkFormatError(`${what} refers to an unknown word (a newer link format?)`);
    return s;
  }
  const n = h / 2;
  if (n > MAX_STRING_BYTES)
    throw new LinkFormatError(`${what} is ${n} bytes long; at most ${MAX_STRING_BYTES} are accepted`);
  return decodeUtf8(r.bytes(n, what), what);
}

/** Writes plain data: null, booleans, finite numbers, strings, arrays, objects (undefined fields skipped). */
export function writeValue(w: ByteWriter, v: unknown): void {
  if (v === null) w.byte(NULL);
  else if (v === false) w.byte(FALSE);
  else if (v === true) w.byte(TRUE);
  else if (typeof v === 'number') writeNumber(w, v);
  else if (typeof v === 'string') {
    w.byte(STRING);
    writeString(w, v);
  } else if (Array.isArray(v)) {
    w.byte(ARRAY);
    w.varint(v.length);
    for (const item of v) writeValue(w, item);
  } else if (typeof v === 'object') {
    const entries = Object.entries(v).filter(([, x]) => x !== undefined);
    w.byte(OBJECT);
    w.varint(entries.length);
    for (const [k, x] of entries) {
      writeString(w, k);
      writeValue(w, x);
    }
  } else throw new TypeError(`cannot put a ${typeof v} in a link`);
}

/** Reads one value, at most MAX_VALUE_DEPTH deep and MAX_VALUE_NODES values in all. */
export function readValue(r: ByteReader, what: string): unknown {
  const budget = { nodes: 0 };
  return read(r, what, 0, budget);
}

function read(r: ByteReader, what: string, depth: number, budget: { nodes: number }): unknown {
  if (++budget.nodes > MAX_VALUE_NODES)
    throw new LinkFormatError(`${what} has more than ${MAX_VALUE_NODES} values`);
  if (depth > MAX_VALUE_DEPTH)
    throw new LinkFormatError(`${what} is nested more than ${MAX_VALUE_DEPTH} deep`);
  const tag = r.byte(what);
  if (isNumberTag(tag)) return readNumberAfterTag(r, tag, what);
  switch (tag) {
    case NULL:
      return null;
    case FALSE:
      return false;
    case TRUE:
      return true;
    case STRING:
      return readString(r, what);
    case ARRAY: {
      const n = r.count(`the length of a list in ${what}`, MAX_VALUE_NODES);
      const out: unknown[] = [];
      for (let i = 0; i < n; i++) out.push(read(r, `${what}[${i}]`, depth + 1, budget));
      return out;
    }
    case OBJECT: {
      const n = r.count(`the number of fields in ${what}`, MAX_VALUE_NODES, 2);
      const out: Record<string, unknown> = {};
      for (let i = 0; i < n; i++) {
        const key = readString(r, `a field name in ${what}`);
        if (Object.hasOwn(out, key)) throw new LinkFormatError(`${what} has the field "${key}" twice`);
        // defineProperty, so that a field called __proto__ stays a plain field.
        const value = read(r, `${what}.${key}`, depth + 1, budget);
        Object.defineProperty(out, key, { value, enumerable: true, writable: true, configurable: true });
      }
      return out;
    }
    default:
      throw new LinkFormatError(`${what} has an unknown value tag ${tag}`);
  }
}
