import { describe, it, expect } from 'vitest';
import {
  angleRule,
  multiplicityRule,
  parseCartesian,
  parsePolar,
  parseReal,
  partRule,
  radiusRule,
} from '../../../src/views/plane/numberEntry.ts';
import { readNumberField, type NumberFieldRule } from '../../../src/views/shared/fieldReading.ts';
import { HZ_FIELD_CASES, NO_UNIT_CASES, expectNumberPolicy } from '../../helpers/numberPolicy.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('the root editor fields follow the number policy', () => {
  const field = (rule: NumberFieldRule) => (text: string) => readNumberField(text, rule);
  const any = () => true;
  it('position, real and imaginary parts: any number, no unit', () => {
    expectNumberPolicy({ read: field(partRule), admissible: any }, NO_UNIT_CASES);
    const real = (text: string) => {
      const r = parseReal(text);
      return r.ok ? r : { ok: false as const, message: r.message };
    };
    expectNumberPolicy({ read: real, admissible: any }, NO_UNIT_CASES);
    expectNumberPolicy(
      {
        read: (text) => {
          const r = parseCartesian(text, '0');
          return r.ok ? { ok: true, value: r.value.re } : r;
        },
        admissible: any,
      },
      NO_UNIT_CASES,
    );
  });
  it('radius: 0 or more; angle in Hz, degrees or radians (that unit may be typed)', () => {
    expectNumberPolicy({ read: field(radiusRule), admissible: (x) => x >= 0 }, NO_UNIT_CASES);
    expectNumberPolicy({ read: field(angleRule('hz')), admissible: any }, HZ_FIELD_CASES);
    expect(field(angleRule('deg'))('45°')).toEqual({ ok: true, value: 45 });
    expect(field(angleRule('rad'))('0,5 rad')).toEqual({ ok: true, value: 0.5 });
    expect(field(angleRule('deg'))('45 Hz').ok).toBe(false);
  });
  it('multiplicity: a whole number from 1 to 64', () => {
    expectNumberPolicy(
      { read: field(multiplicityRule), admissible: (x) => Number.isInteger(x) && x >= 1 && x <= 64 },
      NO_UNIT_CASES,
    );
  });
  it('0,5 typed as a radius is one half (it used to be refused here)', () => {
    const p = parsePolar('0,5', '0', 'hz', 1000);
    expect(p).toEqual({ ok: true, value: { re: 0.5, im: 0 } });
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
    if (!b.ok) expect(b.message).toMatch(/^Angle: "ten" is not a number.*in ° or deg/);
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
