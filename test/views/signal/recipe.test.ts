import { describe, expect, it } from 'vitest';
import {
  PRESETS,
  checkRecipe,
  durationRule,
  newPart,
  recipeSignal,
} from '../../../src/views/signal/recipe.ts';
import { readNumberField } from '../../../src/views/shared/fieldReading.ts';
import { generateSum, makeHum, makeStepAt } from '../../../src/core/signal/index.ts';
import {
  HZ_FIELD_CASES,
  NO_UNIT_CASES,
  expectListPolicy,
  expectNumberPolicy,
} from '../../helpers/numberPolicy.ts';

/** One field of a one-part recipe read as the form reads it: the value it puts in the engine's spec. */
function fieldOf(kind: 'step' | 'tones' | 'hum', key: string, pick: (spec: never) => number | number[]) {
  return (text: string) => {
    const r = checkRecipe({ duration: '1', parts: [newPart(kind, { [key]: text })] }, 2000);
    return r.ok
      ? { ok: true as const, value: pick(r.value.specs[0] as never) as never }
      : { ok: false as const, message: r.error.message };
  };
}

describe('recipe fields follow the number policy', () => {
  it('a level, a frequency, a time and the duration read typed numbers (and their units)', () => {
    const level = fieldOf('step', 'level', (s: { level: number }) => s.level);
    expectNumberPolicy({ read: level, admissible: () => true }, NO_UNIT_CASES);
    const f0 = fieldOf('hum', 'fundamental', (s: { fundamentalHz: number }) => s.fundamentalHz);
    expectNumberPolicy({ read: f0, admissible: (x) => x > 0 && x < 200 }, HZ_FIELD_CASES);
    const at = fieldOf('step', 'at', (s: { atSeconds: number }) => s.atSeconds);
    expectNumberPolicy({ read: at, admissible: (x) => x >= 0 }, [['20 ms', 0.02]]);
    const duration = (text: string) => readNumberField(text, durationRule);
    expectNumberPolicy({ read: duration, admissible: (x) => x > 0 && x <= 600 }, [['20 ms', 0.02]]);
  });
  it('tone frequencies are a list of typed numbers', () => {
    const tones = fieldOf('tones', 'frequencies', (s: { tones: { frequencyHz: number }[] }) =>
      s.tones.map((t) => t.frequencyHz),
    );
    expectListPolicy(tones as never, (x) => x >= 0 && x < 1000);
  });
});

describe('recipes', () => {
  it('every preset makes a signal at the asked rate and length', () => {
    for (const p of PRESETS) {
      const r = recipeSignal(p.recipe, 2000);
      expect(r.ok).toBe(true);
      if (r.ok) expect(r.value.n).toBe(Math.round(Number(p.recipe.duration) * 2000));
    }
  });

  it('sums the parts sample by sample', () => {
    const r = recipeSignal(
      { duration: '1', parts: [newPart('step', { at: '0.5', level: '1' }), newPart('hum', { drift: '0' })] },
      1000,
    );
    if (!r.ok) throw new Error(r.error.message);
    const hum = makeHum(1000, 1000, {
      fundamentalHz: 50,
      harmonicAmplitudes: [0.1, 0, 0.05, 0, 0.03],
      driftHz: 0,
    });
    const step = makeStepAt(1000, 1000, 0.5, 1);
    const samples = generateSum(r.value.specs, r.value.n, r.value.sampleRate);
    for (const k of [0, 499, 500, 999]) expect(samples[k]).toBeCloseTo(hum[k]! + step[k]!, 12);
  });

  it('names the part and field of a problem and says what is accepted', () => {
    const high = checkRecipe(
      { duration: '1', parts: [newPart('hum', { harmonics: '0.1, 0, 0.1, 0, 0, 0, 0, 0, 0.1' })] },
      800,
    );
    expect(high.ok === false && high.error).toMatchObject({ part: 0, field: 'harmonics' });
    expect(high.ok === false && high.error.message).toContain('Harmonic 9 (450 Hz)');
    const tone = checkRecipe(
      { duration: '1', parts: [newPart('step'), newPart('tones', { frequencies: '50, abc' })] },
      800,
    );
    expect(tone.ok === false && tone.error).toMatchObject({ part: 1, field: 'frequencies' });
    const long = checkRecipe({ duration: '900', parts: [newPart('step')] }, 800);
    expect(long.ok === false && long.error.field).toBe('duration');
    expect(checkRecipe({ duration: '1', parts: [] }, 800).ok).toBe(false);
  });
});
