import { describe, expect, it } from 'vitest';
import {
  clampBandHz,
  clampSamples,
  LOG_AXIS_MIN_FRACTION,
  MIN_BAND_FRACTION,
  MIN_SAMPLE_SPAN,
  shownBandHz,
  shownSamples,
} from '../../src/store/zoom.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { selectResponse } from '../../src/store/derived.ts';
import { omegaGridToHz } from '../../src/core/units.ts';

describe('the frequency band shown', () => {
  it('is clipped to the axis at the current sample rate; the whole axis or an empty band is null', () => {
    expect(shownBandHz([40, 60], 2000, 'linear')).toEqual([40, 60]);
    expect(shownBandHz([900, 1500], 2000, 'linear')).toEqual([900, 1000]);
    expect(shownBandHz([0, 1000], 2000, 'linear')).toBeNull();
    // A band kept from a higher rate that lies beyond the new Nyquist frequency.
    expect(shownBandHz([3000, 4000], 2000, 'linear')).toBeNull();
    expect(shownBandHz([0, 60], 2000, 'log')).toEqual([LOG_AXIS_MIN_FRACTION * 2000, 60]);
    expect(shownBandHz(null, 2000, 'linear')).toBeNull();
  });

  it('clamping keeps a pan from shrinking the band and widens a band below the narrowest', () => {
    expect(clampBandHz([-5, 15], 2000, 'linear')).toEqual([0, 20]);
    expect(clampBandHz([990, 1010], 2000, 'linear')).toEqual([980, 1000]);
    const tiny = clampBandHz([50, 50], 2000, 'linear')!;
    // Rounding of 50 ± 5e-5: a few ulps of 50.
    expect(Math.abs(tiny[1] - tiny[0] - MIN_BAND_FRACTION * 1000)).toBeLessThan(1e-13);
    expect(clampBandHz([-10, 2000], 2000, 'linear')).toBeNull();
  });

  it('the display response is evaluated on the band with the same number of points', () => {
    const store = createWorkbenchStore();
    const whole = selectResponse(store.getState());
    store.getState().setView({ frequencySpan: [49.99, 50.01] });
    const zoomed = selectResponse(store.getState());
    expect(zoomed.omega.length).toBe(whole.omega.length);
    const hz = omegaGridToHz(zoomed.omega, store.getState().design.sampleRate);
    expect(hz[0]).toBeCloseTo(49.99, 9);
    expect(hz[hz.length - 1]).toBeCloseTo(50.01, 9);
    // Not an undo step.
    expect(store.getState().history.past).toHaveLength(0);
  });
});

describe('the samples shown', () => {
  it('are clipped to the signal and at least MIN_SAMPLE_SPAN wide', () => {
    expect(shownSamples([10, 40], 256)).toEqual([10, 40]);
    expect(shownSamples([-0.5, 255.5], 256)).toBeNull();
    expect(shownSamples([300, 400], 256)).toBeNull();
    const s = clampSamples([20, 20.5], 256)!;
    expect(s[1] - s[0]).toBe(MIN_SAMPLE_SPAN);
    expect(clampSamples([-10, 20], 256)).toEqual([-0.5, 29.5]);
  });
});
