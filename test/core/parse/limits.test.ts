/**
 * The parser stops at the design's own bounds (core/model/limits.ts) before doing the work: text longer than
 * a design keeps, lists longer than its coefficients, orders beyond its order, each with the place.
 */
import { describe, expect, it } from 'vitest';
import { parseCoefficients, parseSystem } from '../../../src/core/parse/index.ts';
import { MAX_COEFFICIENTS, MAX_ORDER, MAX_TYPED_TEXT_CHARS } from '../../../src/core/model/limits.ts';

const list = (n: number, v = '0.5') => Array.from({ length: n }, () => v).join(', ');

describe('parser bounds', () => {
  it('reads the longest FIR a design may hold, and refuses one tap more at that tap', () => {
    const ok = parseSystem(`b = [${list(MAX_COEFFICIENTS)}]`);
    expect(ok.ok && ok.value.tf.b.length).toBe(MAX_COEFFICIENTS);
    const text = `b = [${list(MAX_COEFFICIENTS + 1)}]`;
    const r = parseSystem(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.message).toMatch(/the list b has 1026 values/);
    // The place is the first value too many.
    expect(r.error.position).toBe(text.indexOf('0.5') + 5 * MAX_COEFFICIENTS);
    expect(r.error.expected).toMatch(/at most 1025/);
  });

  it('refuses text longer than a design keeps before reading it', () => {
    const text = ' '.repeat(MAX_TYPED_TEXT_CHARS) + '1';
    const r = parseCoefficients(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/the text is 131201 characters long/);
    // Exactly at the limit the text is read.
    expect(parseCoefficients(' '.repeat(MAX_TYPED_TEXT_CHARS - 1) + '1').ok).toBe(true);
  });

  it('refuses equation offsets and H(z) powers beyond the largest order', () => {
    const eq = parseSystem(`y[n] = x[n] + 0.5 y[n-${MAX_ORDER + 1}]`);
    expect(!eq.ok && eq.error.message).toMatch(/offset up to 1024/);
    expect(parseSystem(`y[n] = x[n] + 0.5 y[n-${MAX_ORDER}]`).ok).toBe(true);
    const tf = parseSystem(`1/(1 - 0.5z^-${MAX_ORDER + 1})`);
    expect(!tf.ok && tf.error.message).toMatch(/beyond 1024/);
  });

  it('stops a long root list at the root that passes the largest order', () => {
    const text = `zeros: ${list(MAX_ORDER + 5, '0.25')}; poles: 0 x${MAX_ORDER}`;
    const r = parseSystem(text);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.message).toMatch(/more than 1024 roots/);
      expect(r.error.position).toBe(7 + 6 * MAX_ORDER);
    }
  });

  it('refuses an equation whose two sides together pass the largest order', () => {
    const r = parseSystem(`y[n+${MAX_ORDER}] = x[n-${MAX_ORDER}]`);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/coefficients \(order|beyond/);
  });
});
