/** Registry entries of the equaliser sections: peaking EQ and low/high shelves. */
import { defineDesigner } from '../parameters.ts';
import type { EqWidth } from '../equaliser.ts';
import { designEngine } from '../engineSlot.ts';
import { DesignInputError } from '../validate.ts';
import { centre, fmt, gainDb, quality, r3 } from './common.ts';

const GROUP = 'Equaliser sections';
const tail = (fs: number) => `, fs ${fmt(fs)} Hz`;

export const peakingEqDesigner = defineDesigner({
  kind: 'peakingEq',
  parameters: [
    centre('Centre', 'centre in Hz'),
    gainDb('gain at f0 in dB'),
    quality('quality factor, or give --octaves'),
    {
      key: 'bandwidthOctaves',
      flag: 'octaves',
      label: 'Width',
      short: 'width',
      what: 'bandwidth in octaves',
      unit: 'octaves',
      type: 'number',
      range: 'positive',
      presence: 'optional',
    },
  ],
  alternatives: [{ keys: ['q', 'bandwidthOctaves'], label: 'Width as' }],
  variants: [
    {
      id: 'peakingEq',
      cli: 'peaking-eq',
      label: 'Peaking EQ',
      group: GROUP,
      example: () => ({ fs: 48000, f0: 1000, gainDb: 6, q: 1.4 }),
      start: (fs) => ({ f0: r3(0.1 * fs), gainDb: 6, q: 1, bandwidthOctaves: 1 }),
    },
  ],
  design(spec) {
    const width: EqWidth =
      spec.q !== undefined ? { q: spec.q } : { bandwidthOctaves: spec.bandwidthOctaves! };
    return {
      zpk: designEngine().designPeakingEq(spec.f0, spec.gainDb, width, spec.fs),
      note: `peaking EQ ${fmt(spec.gainDb)} dB at ${fmt(spec.f0)} Hz${tail(spec.fs)}`,
    };
  },
});

function shelfDesigner<const K extends 'lowShelf' | 'highShelf'>(kind: K) {
  const low = kind === 'lowShelf';
  return defineDesigner({
    kind,
    parameters: [
      centre('Midpoint', 'shelf midpoint in Hz'),
      gainDb('shelf gain in dB'),
      quality('quality factor, or give --slope'),
      {
        key: 'slope',
        flag: 'slope',
        label: 'Slope',
        short: 'slope',
        hint: '1 = steepest without overshoot',
        what: 'shelf slope, 1 = steepest monotone',
        type: 'number',
        range: 'positive',
        presence: 'optional',
      },
    ],
    alternatives: [{ keys: ['q', 'slope'], label: 'Width as' }],
    variants: [
      {
        id: kind,
        cli: low ? 'low-shelf' : 'high-shelf',
        label: low ? 'Low shelf' : 'High shelf',
        group: GROUP,
        example: () => ({ fs: 48000, f0: low ? 200 : 4000, gainDb: -6, slope: 1 }),
        start: (fs) => ({ f0: r3((low ? 0.05 : 0.2) * fs), gainDb: low ? 6 : -6, q: 0.707, slope: 1 }),
      },
    ],
    design(spec) {
      const g = spec.gainDb;
      const a = 10 ** (g / 40);
      if (spec.slope !== undefined && (a + 1 / a) * (1 / spec.slope - 1) + 2 < 0)
        throw new DesignInputError(
          `shelf slope ${fmt(spec.slope)} is too steep for ${fmt(g)} dB`,
          `a slope up to ${fmt(1 / (1 - 2 / (a + 1 / a)))}`,
          'slope',
        );
      const width: EqWidth = spec.q !== undefined ? { q: spec.q } : { slope: spec.slope! };
      return {
        zpk: designEngine().designShelf(low, spec.f0, g, width, spec.fs),
        note: `${low ? 'low' : 'high'} shelf ${fmt(g)} dB, midpoint ${fmt(spec.f0)} Hz${tail(spec.fs)}`,
      };
    },
  });
}

export const lowShelfDesigner = shelfDesigner('lowShelf');
export const highShelfDesigner = shelfDesigner('highShelf');
