import { describe, it, expect } from 'vitest';
import { maskCellRule } from '../../../../src/views/side/design/MaskCell.tsx';
import { readNumberField } from '../../../../src/views/shared/fieldReading.ts';
import { DB_FIELD_CASES, HZ_FIELD_CASES, expectNumberPolicy } from '../../../helpers/numberPolicy.ts';

describe('mask table cells', () => {
  it('edges read typed numbers and Hz by the number policy', () => {
    const read = (text: string) => readNumberField(text, maskCellRule('Hz', false));
    expectNumberPolicy({ read, admissible: () => true }, HZ_FIELD_CASES);
  });
  it('limits read typed numbers and dB by the number policy, and an emptied limit means none', () => {
    const read = (text: string) => readNumberField(text, maskCellRule('dB', true));
    // The one difference from a required field: empty text removes the limit.
    const table = {
      read: (t: string) => (t.trim() === '' ? { ok: false as const, message: 'nothing is typed' } : read(t)),
    };
    expectNumberPolicy({ ...table, admissible: () => true }, DB_FIELD_CASES);
    expect(read('  ')).toEqual({ ok: true, value: undefined });
  });
});
