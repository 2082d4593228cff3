/** A stable fingerprint of a design and its implementation settings: FNV-1a 64 of a canonical JSON text. */
import type { Implementation } from '../fixed/index.ts';

/** JSON with object keys sorted at every level and numbers in their shortest round-trip form. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

/** UTF-8 bytes of a string (surrogate pairs joined), without relying on a platform encoder. */
function utf8(s: string): number[] {
  const out: number[] = [];
  for (const ch of s) {
    const c = ch.codePointAt(0)!;
    if (c < 0x80) out.push(c);
    else if (c < 0x800) out.push(0xc0 | (c >> 6), 0x80 | (c & 63));
    else if (c < 0x10000) out.push(0xe0 | (c >> 12), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
    else out.push(0xf0 | (c >> 18), 0x80 | ((c >> 12) & 63), 0x80 | ((c >> 6) & 63), 0x80 | (c & 63));
  }
  return out;
}

const FNV64_OFFSET = 0xcbf29ce484222325n;
const FNV64_PRIME = 0x100000001b3n;
const MASK64 = (1n << 64n) - 1n;

/** FNV-1a 64-bit hash (Fowler, Noll, Vo) of the UTF-8 bytes of s, as 16 lowercase hex digits. */
export function fnv1a64(s: string): string {
  let h = FNV64_OFFSET;
  for (const byte of utf8(s)) h = ((h ^ BigInt(byte)) * FNV64_PRIME) & MASK64;
  return h.toString(16).padStart(16, '0');
}

/** Hash of the design (zeros, poles, gain, sample rate) and the implementation settings it was exported with. */
export function designHash(impl: Implementation): string {
  const { zeros, poles, gain } = impl.zpk;
  return fnv1a64(
    canonicalJson({ zpk: { zeros, poles, gain }, sampleRate: impl.sampleRate, settings: impl.settings }),
  );
}
