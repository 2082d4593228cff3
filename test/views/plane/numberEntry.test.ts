import { describe, it, expect } from 'vitest';
import { parseCartesian, parsePolar, parseUserNumber } from '../../../src/views/plane/numberEntry.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('parseUserNumber', () => {
  it('accepts plain, signed, Unicode-minus and exponent forms', () => {
    expect(parseUserNumber(' 0.95 ')).toBe(0.95);
    expect(parseUserNumber('\u22120.5')).toBe(-0.5);
    expect(parseUserNumber('1e-3')).toBe(0.001);
    expect(parseUserNumber('.5')).toBe(0.5);
  });
  it('rejects empty text, words, hex and half numbers', () => {
    for (const t of ['', ' ', 'abc', '0x10', '1.2.3', '1e', '--1', 'Infinity'])
      expect(parseUserNumber(t)).toBeNull();
  });
});

describe('parsePolar', () => {
  it('reads radius and angle in Hz at the sample rate', () => {
    const p = parsePolar('0.9', '250', 'hz', 2000); // 250 Hz at 2 kHz = π/4
    expect(p.ok).toBe(true);
    if (p.ok) expectClose([p.value.re, p.value.im], [0.9 * Math.SQRT1_2, 0.9 * Math.SQRT1_2], { abs: 1e-12 });
  });
  it('reads degrees and radians', () => {
    const d = parsePolar('1', '90', 'deg', 1000);
    const r = parsePolar('1', String(Math.PI / 2), 'rad', 1000);
    expect(d.ok && r.ok).toBe(true);
    if (d.ok && r.ok)
      expectClose([d.value.re, d.value.im, r.value.re, r.value.im], [0, 1, 0, 1], { abs: 1e-12 });
  });
  it('rejects a negative radius and a wordy angle with a message naming the field', () => {
    const a = parsePolar('-1', '10', 'deg', 1000);
    const b = parsePolar('0.5', 'ten', 'deg', 1000);
    expect(a.ok || b.ok).toBe(false);
    if (!a.ok) expect(a.message).toMatch(/Radius/);
    if (!b.ok) expect(b.message).toMatch(/Angle “ten”.*degrees/);
  });
});

describe('parseCartesian', () => {
  it('reads both parts or says which one is wrong', () => {
    const ok = parseCartesian('-0.5', '0.25');
    expect(ok).toEqual({ ok: true, value: { re: -0.5, im: 0.25 } });
    const bad = parseCartesian('0.1', '');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/Imaginary part/);
  });
});
