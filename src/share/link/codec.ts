/**
 * Design links: the whole design in the URL fragment as `pw2.` + base64url of a compact binary form and its
 * check value. The prefix names the link format, so later formats can still read old links. Decoding checks
 * the check value first, so a link that was altered or cut is refused as such instead of opening another
 * design; then it is bounded (lengths are checked against the bytes left before anything is allocated) and
 * ends in the same schema check as design files, so a link can never hold what a file could not.
 *
 * Link format 2: the payload below, then its CRC-32 (crc32.ts) as 4 bytes, most significant first.
 * Link format 1 (the first release): the payload alone, with no check value; still read, with a note.
 *
 * The payload, in order (varint = unsigned LEB128; number = number.ts; string = value.ts):
 *   varint  flags: 1 name, 2 note, 4 typed coefficients, 8 extra parts
 *   number  sample rate, Hz
 *   byte    gain rule: 0 fixed (+ number k), 1 DC, 2 Nyquist, 3 frequency (+ number Hz), 4 peak
 *   roots   zeros, then poles: varint count, then per root varint ((multiplicity − 1)·4 + mode) and
 *           number re; mode 0: real (im = +0); 1: number im; 2: on the unit circle, varint zigzag ulp
 *           distance of im from sqrt((1 − re)(1 + re)) (predict.ts)
 *   string  name, string note (when flagged)
 *   typed   varint count + numbers for b, the same for a, string text (when flagged)
 *   value   an object with the extra parts: designer, mask, implementation, view, and the parts of a
 *           composed design (when flagged; a reader from before composed designs refuses such a link as
 *           having an unknown part rather than opening a cascade it cannot re-run)
 */
import type { Root } from '../../core/types.ts';
import type { GainRule } from '../../core/gainRule.ts';
import { readShared, toDocument, type SharedDesign, type ShareResult } from '../document.ts';
import { MAX_COEFFICIENTS, MAX_ORDER } from '../../core/model/limits.ts';
import { MAX_LINK_CHARS } from '../schema/limits.ts';
import type { CurrentDocument } from '../schema/migrate.ts';
import { CURRENT_VERSION } from '../schema/version.ts';
import { toBase64Url, fromBase64Url } from './base64url.ts';
import { ByteReader, ByteWriter, LinkFormatError } from './bytes.ts';
import { numberSize, readNumber, writeNumber } from './number.ts';
import { circleDelta, circleImFromDelta } from './predict.ts';
import { crc32 } from './crc32.ts';
import { readString, readValue, writeString, writeValue } from './value.ts';

/** The link format written today, and the prefix that names it. */
export const LINK_FORMAT = 2;
export const LINK_PREFIX = `pw${LINK_FORMAT}.`;
/** The first link format, without a check value: read, never written. */
export const UNCHECKED_LINK_FORMAT = 1;
/** Bytes of the check value at the end of a format-2 link. */
const CHECK_BYTES = 4;

/** The message for a link whose check value does not match: it was changed or cut on its way. */
export const ALTERED_LINK_MESSAGE =
  'The link was altered or cut: its check value does not match its contents. Copy the whole link again from where it came.';
/** The note on a link of the first format, which cannot tell whether it was damaged. */
export const UNCHECKED_LINK_NOTE =
  'This link was made by an older Polewright and has no check value, so damage to it cannot be detected: check the design before relying on it.';

const HAS_NAME = 1;
const HAS_NOTE = 2;
const HAS_TYPED = 4;
const HAS_EXTRAS = 8;
const KNOWN_FLAGS = HAS_NAME | HAS_NOTE | HAS_TYPED | HAS_EXTRAS;
/** Parts of the document carried in the extras object. */
const EXTRA_KEYS = ['designer', 'mask', 'implementation', 'view', 'parts'] as const;
const GAIN_KINDS = ['fixed', 'dc', 'nyquist', 'frequency', 'peak'] as const;

const REAL = 0;
const COMPLEX = 1;
const ON_CIRCLE = 2;

/** Bytes of a varint holding v. */
function varintSize(v: number): number {
  return v < 0x80 ? 1 : v < 0x4000 ? 2 : 3;
}

function writeRoots(w: ByteWriter, roots: readonly Root[]): void {
  w.varint(roots.length);
  for (const r of roots) {
    const delta = Object.is(r.im, 0) ? null : circleDelta(r.re, r.im);
    const mode = Object.is(r.im, 0)
      ? REAL
      : delta !== null && varintSize(delta) < numberSize(r.im)
        ? ON_CIRCLE
        : COMPLEX;
    w.varint((r.multiplicity - 1) * 4 + mode);
    writeNumber(w, r.re);
    if (mode === COMPLEX) writeNumber(w, r.im);
    if (mode === ON_CIRCLE) w.varint(delta!);
  }
}

function readRoots(r: ByteReader, what: string): Root[] {
  const n = r.count(`the number of ${what}`, MAX_ORDER, 2);
  const out: Root[] = [];
  for (let i = 0; i < n; i++) {
    const h = r.varint(`${what}[${i}]`);
    const mode = h % 4;
    const re = readNumber(r, `${what}[${i}].re`);
    let im = 0;
    if (mode === COMPLEX) im = readNumber(r, `${what}[${i}].im`);
    else if (mode === ON_CIRCLE) {
      im = circleImFromDelta(re, r.varint(`${what}[${i}].im`));
      if (!Number.isFinite(im))
        throw new LinkFormatError(`${what}[${i}] is marked as on the unit circle but is not`);
    } else if (mode !== REAL) throw new LinkFormatError(`${what}[${i}] has an unknown form`);
    out.push({ re, im, multiplicity: Math.floor(h / 4) + 1 });
  }
  return out;
}

function writeNumbers(w: ByteWriter, values: readonly number[]): void {
  w.varint(values.length);
  for (const v of values) writeNumber(w, v);
}

function readNumbers(r: ByteReader, what: string): number[] {
  const n = r.count(`the number of coefficients in ${what}`, MAX_COEFFICIENTS);
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(readNumber(r, `${what}[${i}]`));
  return out;
}

/** The binary payload of a current-version document. */
export function encodePayload(doc: CurrentDocument): Uint8Array {
  const w = new ByteWriter();
  const extras: Record<string, unknown> = {};
  for (const key of EXTRA_KEYS) if (doc[key] !== undefined) extras[key] = doc[key];
  const hasExtras = Object.keys(extras).length > 0;
  w.varint(
    (doc.name ? HAS_NAME : 0) |
      (doc.note ? HAS_NOTE : 0) |
      (doc.typed ? HAS_TYPED : 0) |
      (hasExtras ? HAS_EXTRAS : 0),
  );
  writeNumber(w, doc.sampleRate);
  const rule = doc.gainRule;
  w.byte(GAIN_KINDS.indexOf(rule.kind));
  if (rule.kind === 'fixed') writeNumber(w, rule.value);
  if (rule.kind === 'frequency') writeNumber(w, rule.hz);
  writeRoots(w, doc.zeros);
  writeRoots(w, doc.poles);
  if (doc.name) writeString(w, doc.name);
  if (doc.note) writeString(w, doc.note);
  if (doc.typed) {
    writeNumbers(w, doc.typed.b);
    writeNumbers(w, doc.typed.a);
    writeString(w, doc.typed.text);
  }
  if (hasExtras) writeValue(w, extras);
  return w.result();
}

/** A document-shaped object from a payload, not yet validated (readShared does that). */
export function decodePayload(bytes: Uint8Array): Record<string, unknown> {
  const r = new ByteReader(bytes);
  const flags = r.varint('the header');
  if ((flags & ~KNOWN_FLAGS) !== 0)
    throw new LinkFormatError('the header names parts this version does not know');
  const sampleRate = readNumber(r, 'the sample rate');
  const kind = GAIN_KINDS[r.byte('the gain rule')];
  let gainRule: GainRule;
  if (kind === undefined) throw new LinkFormatError('the gain rule is of an unknown kind');
  else if (kind === 'fixed') gainRule = { kind, value: readNumber(r, 'the gain') };
  else if (kind === 'frequency') gainRule = { kind, hz: readNumber(r, 'the gain-rule frequency') };
  else gainRule = { kind };
  const zeros = readRoots(r, 'zeros');
  const poles = readRoots(r, 'poles');
  const name = flags & HAS_NAME ? readString(r, 'the name') : '';
  const note = flags & HAS_NOTE ? readString(r, 'the note') : '';
  const doc: Record<string, unknown> = {
    polewright: 'design',
    version: CURRENT_VERSION,
    name,
    note,
    sampleRate,
    zeros,
    poles,
    gainRule,
  };
  if (flags & HAS_TYPED) {
    const b = readNumbers(r, 'b');
    const a = readNumbers(r, 'a');
    doc.typed = { b, a, text: readString(r, 'the typed text') };
  }
  if (flags & HAS_EXTRAS) {
    const extras = readValue(r, 'the extra parts');
    if (typeof extras !== 'object' || extras === null || Array.isArray(extras)) {
      throw new LinkFormatError('the extra parts are not a set of named fields');
    }
    for (const [key, value] of Object.entries(extras)) {
      if (!(EXTRA_KEYS as readonly string[]).includes(key))
        throw new LinkFormatError(`the link has an unknown part "${key}"`);
      doc[key] = value;
    }
  }
  if (r.remaining > 0) throw new LinkFormatError(`the link has ${r.remaining} unexpected bytes at its end`);
  return doc;
}

/** The payload followed by its CRC-32 (4 bytes, most significant first). */
export function withCheck(payload: Uint8Array): Uint8Array {
  const out = new Uint8Array(payload.length + CHECK_BYTES);
  out.set(payload);
  new DataView(out.buffer).setUint32(payload.length, crc32(payload), false);
  return out;
}

/** The payload of checked bytes, or null when the check value does not match (or is missing). */
export function checkedPayload(bytes: Uint8Array): Uint8Array | null {
  if (bytes.length < CHECK_BYTES) return null;
  const payload = bytes.subarray(0, bytes.length - CHECK_BYTES);
  const stored = new DataView(bytes.buffer, bytes.byteOffset, bytes.length).getUint32(payload.length, false);
  return stored === crc32(payload) ? payload : null;
}

/** The fragment text (without '#') of a design: `pw2.` and the checked payload in base64url. */
export function encodeLink(shared: SharedDesign): string {
  return LINK_PREFIX + toBase64Url(withCheck(encodePayload(toDocument(shared))));
}

/** A full link: the page address with the design in its fragment. */
export function linkUrl(base: string, shared: SharedDesign): string {
  const hash = base.indexOf('#');
  return `${hash >= 0 ? base.slice(0, hash) : base}#${encodeLink(shared)}`;
}

const LINK_TEXT = /^pw(\d{1,6})\./;

/** The design fragment in a full URL, a '#fragment' or a bare fragment; null if the text holds none. */
export function linkFragment(text: string): string | null {
  const t = text.trim();
  const hash = t.indexOf('#');
  const frag = hash >= 0 ? t.slice(hash + 1) : t;
  return LINK_TEXT.test(frag) ? frag : null;
}

/** Reads a link (full URL, '#fragment' or bare fragment); every failure comes back as a message. */
export function decodeLink(text: string): ShareResult {
  if (text.length > MAX_LINK_CHARS) {
    return {
      ok: false,
      message: `The link is ${text.length} characters long; at most ${MAX_LINK_CHARS} are accepted.`,
    };
  }
  const frag = linkFragment(text);
  if (frag === null)
    return {
      ok: false,
      message: `This is not a Polewright design link (it should contain "#${LINK_PREFIX}").`,
    };
  const format = Number(LINK_TEXT.exec(frag)![1]);
  if (format !== LINK_FORMAT && format !== UNCHECKED_LINK_FORMAT) {
    return format > LINK_FORMAT
      ? {
          ok: false,
          message: `This link was made by a newer Polewright (link format ${format}); this one reads formats ${UNCHECKED_LINK_FORMAT} and ${LINK_FORMAT}.`,
        }
      : {
          ok: false,
          message: `Link format ${format} does not exist; this Polewright reads formats ${UNCHECKED_LINK_FORMAT} and ${LINK_FORMAT}.`,
        };
  }
  const checked = format === LINK_FORMAT;
  const body = frag.slice(frag.indexOf('.') + 1);
  const bytes = fromBase64Url(body);
  if (!bytes)
    return {
      ok: false,
      message: checked
        ? `${ALTERED_LINK_MESSAGE} (It has characters outside A–Z, a–z, 0–9, "-" and "_", or a cut-off end.)`
        : 'The link is damaged: it has characters outside A–Z, a–z, 0–9, "-" and "_", or a cut-off end.',
    };
  const payload = checked ? checkedPayload(bytes) : bytes;
  if (!payload) return { ok: false, message: ALTERED_LINK_MESSAGE };
  let doc: Record<string, unknown>;
  try {
    doc = decodePayload(payload);
  } catch (e) {
    if (e instanceof LinkFormatError) return { ok: false, message: `The link cannot be read: ${e.message}.` };
    throw e;
  }
  const r = readShared(doc);
  if (!r.ok)
    return {
      ok: false,
      message: r.message.replace('Not a valid Polewright design', 'The link holds an invalid design'),
    };
  return checked ? r : { ...r, notes: [UNCHECKED_LINK_NOTE] };
}
