import { describe, it } from 'vitest';
import { snapRadiusRule, snapStepRule } from '../../../src/views/plane/SnapControl.tsx';
import { readNumberField } from '../../../src/views/shared/fieldReading.ts';
import { HZ_FIELD_CASES, NO_UNIT_CASES, expectNumberPolicy } from '../../helpers/numberPolicy.ts';

describe('snap fields follow the number policy', () => {
  it('the snap radius is 0 or more', () => {
    const read = (t: string) => readNumberField(t, snapRadiusRule);
    expectNumberPolicy({ read, admissible: (x) => x >= 0 }, NO_UNIT_CASES);
  });
  it('the frequency grid step is above 0 Hz', () => {
    const read = (t: string) => readNumberField(t, snapStepRule);
    expectNumberPolicy({ read, admissible: (x) => x > 0 }, HZ_FIELD_CASES);
  });
});
