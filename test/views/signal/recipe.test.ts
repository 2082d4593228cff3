import { describe, expect, it } from 'vitest';
import { PRESETS, checkRecipe, newPart, recipeSignal } from '../../../src/views/signal/recipe.ts';
import { makeHum, makeStepAt } from '../../../src/core/signal/index.ts';

describe('recipes', () => {
  it('every preset makes a signal at the asked rate and length', () => {
    for (const p of PRESETS) {
      const r = recipeSignal(p.recipe, 2000);
      expect(r.ok).toBe(true);
      if (r.ok) expect(r.value.samples.length).toBe(Math.round(Number(p.recipe.duration) * 2000));
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
    for (const k of [0, 499, 500, 999]) expect(r.value.samples[k]).toBeCloseTo(hum[k]! + step[k]!, 12);
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
