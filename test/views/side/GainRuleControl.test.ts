import { describe, it } from 'vitest';
import { gainHzRule, gainValueRule } from '../../../src/views/side/GainRuleControl.tsx';
import { readNumberField } from '../../../src/views/shared/fieldReading.ts';
import { HZ_FIELD_CASES, NO_UNIT_CASES, expectNumberPolicy } from '../../helpers/numberPolicy.ts';

describe('gain fields follow the number policy', () => {
  it('a fixed k is any number', () => {
    expectNumberPolicy(
      { read: (t) => readNumberField(t, gainValueRule), admissible: () => true },
      NO_UNIT_CASES,
    );
  });
  it('the frequency of 0 dB is 0 … fs/2 Hz', () => {
    const read = (t: string) => readNumberField(t, gainHzRule(2000));
    expectNumberPolicy({ read, admissible: (x) => x >= 0 && x <= 1000 }, HZ_FIELD_CASES);
  });
});
