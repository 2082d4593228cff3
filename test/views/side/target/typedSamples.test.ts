import { describe, it, expect } from 'vitest';
import {
  readTypedSamples,
  runLengthRule,
  runLevelRule,
  runSineRule,
} from '../../../../src/views/side/target/typedSamples.ts';
import { bitsRule } from '../../../../src/views/side/target/settingCheck.ts';
import { DEFAULT_IMPLEMENTATION } from '../../../../src/core/fixed/index.ts';
import { readNumberField, type NumberFieldRule } from '../../../../src/views/shared/fieldReading.ts';
import {
  HZ_FIELD_CASES,
  NO_UNIT_CASES,
  expectListPolicy,
  expectNumberPolicy,
} from '../../../helpers/numberPolicy.ts';

const field = (rule: NumberFieldRule) => (text: string) => readNumberField(text, rule);

describe('the Target page fields follow the number policy', () => {
  it('typed samples are a list of typed numbers', () => {
    expectListPolicy((text) => {
      const r = readTypedSamples(text);
      return r.ok ? { ok: true, value: r.values } : r;
    });
  });
  it("the run's length, level and sine frequency", () => {
    const whole = (lo: number, hi: number) => (x: number) => Number.isInteger(x) && x >= lo && x <= hi;
    expectNumberPolicy({ read: field(runLengthRule), admissible: whole(1, 65536) }, NO_UNIT_CASES.slice(1));
    expectNumberPolicy({ read: field(runLevelRule), admissible: (x) => x > 0 && x <= 2 }, NO_UNIT_CASES);
    expectNumberPolicy(
      { read: field(runSineRule(2000)), admissible: (x) => x >= 0 && x <= 1000 },
      HZ_FIELD_CASES,
    );
  });
  it('word lengths in bits: whole numbers the engine accepts', () => {
    const s = DEFAULT_IMPLEMENTATION;
    expectNumberPolicy(
      { read: field(bitsRule(s, 'wordLength')), admissible: (x) => Number.isInteger(x) && x >= 8 && x <= 32 },
      NO_UNIT_CASES.slice(1),
    );
    expect(field(bitsRule(s, 'wordLength'))('16 bits')).toEqual({ ok: true, value: 16 });
    expect(field(bitsRule(s, 'wordLength'))('16,5')).toEqual({
      ok: false,
      message: 'Type a whole number of bits.',
    });
  });
});
