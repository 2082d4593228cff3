import { describe, expect, it } from 'vitest';
import { parseRate, preferredUnit, rateText } from '../../../src/views/shell/sampleRate.ts';
import { HZ_FIELD_CASES, expectNumberPolicy } from '../../helpers/numberPolicy.ts';

describe('sample rate field', () => {
  it('reads typed numbers by the policy in Hz or kHz (a typed unit wins), and refuses what is not a positive rate', () => {
    const admissible = (hz: number) => hz > 0 && hz <= 1e9;
    expectNumberPolicy({ read: (t) => parseRate(t, 'Hz'), admissible }, HZ_FIELD_CASES);
    expectNumberPolicy({ read: (t) => parseRate(t, 'kHz'), admissible, scale: 1000 }, HZ_FIELD_CASES);
    expect(parseRate('48', 'kHz')).toEqual({ ok: true, value: 48000 });
    expect(parseRate(' 44,1 ', 'kHz')).toEqual({ ok: true, value: 44100 });
    expect(parseRate('−0.5', 'Hz')).toEqual({ ok: false, message: 'The sample rate must be above zero.' });
    for (const bad of ['', 'abc', '-5', '0', '1e10']) expect(parseRate(bad, 'Hz').ok, bad).toBe(false);
  });
  it('shows rates without float noise', () => {
    expect(rateText(44100, 'kHz')).toBe('44.1');
    expect(rateText(25600, 'kHz')).toBe('25.6');
    expect(preferredUnit(999)).toBe('Hz');
    expect(preferredUnit(2000)).toBe('kHz');
  });
});
