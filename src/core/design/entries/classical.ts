/** The registry entry of the classical IIR designs: its band shapes, examples and starting values. */
import { defineDesigner, type DesignValues } from '../parameters.ts';
import { designEngine } from '../engineSlot.ts';
import { isFirFamily } from '../fir/families.ts';
import { r3 } from './common.ts';
import { BAND_SHAPE_OPTIONS, FAMILY_OPTIONS, IIR_PARAMETERS } from './classicalParameters.ts';

/** Starting values of each band shape at fs (Hz): edges that nest the right way round. */
const START: Record<string, (at: (f: number) => number) => DesignValues> = {
  lowpass: (at) => ({ edgesHz: [at(0.12)], passbandHz: [at(0.1)], stopbandHz: [at(0.4)], attenuationDb: 60 }),
  highpass: (at) => ({
    edgesHz: [at(0.1)],
    passbandHz: [at(0.12)],
    stopbandHz: [at(0.03)],
    attenuationDb: 40,
  }),
  bandpass: (at) => ({
    edgesHz: [at(0.1), at(0.2)],
    passbandHz: [at(0.11), at(0.19)],
    stopbandHz: [at(0.05), at(0.3)],
    attenuationDb: 30,
  }),
  bandstop: (at) => ({
    edgesHz: [at(0.1), at(0.2)],
    passbandHz: [at(0.07), at(0.26)],
    stopbandHz: [at(0.14), at(0.16)],
    attenuationDb: 30,
  }),
};

/** An example command line's values for a band shape, given the family and order mode chosen so far. */
function example(response: string, given: DesignValues): DesignValues {
  const family = given.family ?? 'butterworth';
  const band = response === 'bandpass' || response === 'bandstop';
  // least squares and equiripple design from the bands; an FIR's order is its taps − 1, even for these shapes
  if (
    isFirFamily(family) &&
    (given.order === 'auto' || family === 'leastsquares' || family === 'equiripple')
  ) {
    // transition bands an FIR of modest order spans (the IIR examples' are too wide for least squares)
    const [pass, stop] = {
      lowpass: [[100], [150]],
      highpass: [[400], [300]],
      bandpass: [
        [150, 250],
        [100, 300],
      ],
      bandstop: [
        [100, 300],
        [150, 250],
      ],
    }[response]!;
    const order = given.order === 'auto' ? 'auto' : 40;
    return { family, order, passbandHz: pass, stopbandHz: stop, rippleDb: 1, attenuationDb: 40, fs: 1000 };
  }
  if (given.order === 'auto') {
    const [pass, stop] = {
      lowpass: [[120], [400]],
      highpass: [[400], [120]],
      bandpass: [
        [150, 250],
        [100, 320],
      ],
      bandstop: [
        [100, 320],
        [150, 250],
      ],
    }[response]!;
    return {
      family,
      order: 'auto',
      passbandHz: pass,
      stopbandHz: stop,
      rippleDb: 1,
      attenuationDb: 60,
      fs: 1000,
    };
  }
  const edgesHz = band ? (response === 'bandpass' ? [100, 200] : [45, 55]) : [120];
  if (isFirFamily(family))
    return family === 'kaiser'
      ? { family, order: 60, edgesHz, attenuationDb: 60, fs: 1000 }
      : { family, order: 60, edgesHz, fs: 1000 };
  return family === 'butterworth' && given.family === undefined
    ? { fs: 1000, family, order: 4, edgesHz }
    : { family, order: 4, edgesHz, rippleDb: 1, attenuationDb: 60, fs: 1000 };
}

export const iirDesigner = defineDesigner({
  kind: 'iir',
  parameters: IIR_PARAMETERS,
  variants: BAND_SHAPE_OPTIONS.map(({ value, label }) => ({
    id: value,
    cli: value,
    label,
    group: 'Classical filters',
    fixed: { response: value },
    title: (v: DesignValues) =>
      v.family === 'any'
        ? `${label}, family of least order`
        : `${FAMILY_OPTIONS.find((f) => f.value === v.family)?.label ?? String(v.family)} ${label.toLowerCase()}`,
    example: (given: DesignValues) => example(value, given),
    start: (fs: number) => ({
      family: 'butterworth',
      order: 4,
      rippleDb: 1,
      ...START[value]!((f) => r3(f * fs)),
    }),
  })),
  design: (spec) => designEngine().classical(spec),
});
