import { describe, it, expect } from 'vitest';
import { readFrequencyList } from '../../../src/views/signal/LevelTable.tsx';
import { expectListPolicy } from '../../helpers/numberPolicy.ts';

describe('typed level frequencies', () => {
  it('are a list of typed numbers from 0 to Nyquist', () => {
    expectListPolicy(
      (t) => readFrequencyList(t, 1000),
      (x) => x >= 0 && x <= 1000,
    );
    const over = readFrequencyList('50, 1500', 1000);
    expect(!over.ok && over.message).toMatch(/Item 2: 1.5 kHz is not a frequency from 0 to 1 kHz/);
  });
});
