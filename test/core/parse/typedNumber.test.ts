import { describe, it, expect } from 'vitest';
import { numberCell, readNumber, readNumberList } from '../../../src/core/parse/typedNumber.ts';
import {
  DB_FIELD_CASES,
  HZ_FIELD_CASES,
  LIST_CASES,
  NO_UNIT_CASES,
  SINGLE_FIELD_CASES,
  expectListPolicy,
  expectNumberPolicy,
} from '../../helpers/numberPolicy.ts';

const asField = (unit?: 'Hz' | 'dB') => (text: string) => {
  const r = readNumber(text, unit ? { unit } : {});
  return r.ok ? r : { ok: false as const, message: r.message };
};

describe('readNumber: one number in a field', () => {
  it('follows the policy table, with units only where the field has them', () => {
    expectNumberPolicy({ read: asField(), admissible: () => true }, NO_UNIT_CASES);
    expectNumberPolicy({ read: asField('Hz'), admissible: () => true }, HZ_FIELD_CASES);
    expectNumberPolicy({ read: asField('dB'), admissible: () => true }, DB_FIELD_CASES);
  });

  it('says what was wrong and what is accepted', () => {
    expect(readNumber('1,000')).toMatchObject({ ok: false, message: expect.stringMatching(/ambiguous/) });
    expect(readNumber('1,000')).toMatchObject({ expected: expect.stringContaining('1000') });
    expect(readNumber('5 kg', { unit: 'Hz' })).toMatchObject({
      ok: false,
      message: '"5 kg": the unit "kg" is not accepted here',
      expected: expect.stringMatching(/in Hz or kHz or MHz$/),
    });
    expect(readNumber('x')).toMatchObject({ expected: expect.stringContaining('0,5') });
  });

  it('reads a bare number in the unit the field shows, and a typed unit over it', () => {
    expect(readNumber('44,1', { unit: 'Hz', bareFactor: 1000 })).toEqual({ ok: true, value: 44100 });
    expect(readNumber('800 Hz', { unit: 'Hz', bareFactor: 1000 })).toEqual({ ok: true, value: 800 });
    expect(readNumber('20 ms', { unit: 's' })).toEqual({ ok: true, value: 0.02 });
  });
});

describe('readNumberList: numbers in a list', () => {
  it('follows the list table: a comma always separates, decimals take a point', () => {
    expectListPolicy((text) => {
      const r = readNumberList(text);
      return r.ok ? { ok: true, value: r.values } : { ok: false, message: r.message };
    });
    expect(LIST_CASES.length).toBeGreaterThan(10);
  });

  it('names the first item that is not a number', () => {
    expect(readNumberList('0.1, 0.2, x3')).toMatchObject({
      ok: false,
      index: 2,
      message: 'item 3, "x3", is not a number',
    });
  });
});

describe('numberCell: a CSV cell in the file dialect', () => {
  it('reads the single-field table in a point file (commas there separate cells)', () => {
    for (const [text, value] of SINGLE_FIELD_CASES) {
      if (text.includes(',') || /\s/.test(text.trim()) || text.trim() === '') continue;
      const v = numberCell(text.trim(), '.');
      if (value === null) expect(v, text).toBeNaN();
      else expect(v, text).toBe(value);
    }
  });

  it('reads a decimal comma (and a point) in a semicolon or tab file', () => {
    expect(numberCell('0,25', ',')).toBe(0.25);
    expect(numberCell('−1,5e-3', ',')).toBe(-1.5e-3);
    expect(numberCell('1.5', ',')).toBe(1.5);
    expect(numberCell('0,25', '.')).toBeNaN();
    expect(numberCell('time', '.')).toBeNaN();
    expect(numberCell('', '.')).toBeNaN();
  });
});
