/**
 * JSON text that keeps every number bitwise: like JSON.stringify (shortest round-trip decimals), except that
 * negative zero is written as -0 (JSON.stringify writes 0, and JSON.parse reads -0 back as −0).
 */

/** Serialises plain data (objects, arrays, strings, finite numbers, booleans, null); `indent` as JSON.stringify's. */
export function stringifyExact(value: unknown, indent = 0): string {
  return write(value, indent > 0 ? ' '.repeat(indent) : '', '');
}

function write(value: unknown, step: string, pad: string): string {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new RangeError(`cannot write ${value} as JSON`);
    return Object.is(value, -0) ? '-0' : String(value);
  }
  if (typeof value === 'string' || typeof value === 'boolean' || value === null) return JSON.stringify(value);
  const inner = pad + step;
  const open = step ? `\n${inner}` : '';
  const close = step ? `\n${pad}` : '';
  const sep = step ? `,\n${inner}` : ',';
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    return `[${open}${value.map((v) => write(v, step, inner)).join(sep)}${close}]`;
  }
  if (typeof value === 'object') {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined);
    if (entries.length === 0) return '{}';
    const colon = step ? ': ' : ':';
    return `{${open}${entries.map(([k, v]) => JSON.stringify(k) + colon + write(v, step, inner)).join(sep)}${close}}`;
  }
  throw new TypeError(`cannot write a ${typeof value} as JSON`);
}
