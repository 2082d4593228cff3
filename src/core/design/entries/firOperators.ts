/**
 * Registry entries of the equiripple FIR operators: a differentiator (H ≈ jω) and a Hilbert transformer
 * (H ≈ −j on positive frequencies), both antisymmetric, so their phase is linear plus a quarter turn.
 */
import { defineDesigner } from '../parameters.ts';
import { MAX_FIR_ORDER } from '../validate.ts';
import { designEngine } from '../engineSlot.ts';
import { r3 } from './common.ts';

const GROUP = 'FIR operators';

const ORDER = {
  key: 'order',
  flag: 'order',
  label: 'Order',
  short: 'order',
  what: `taps − 1, a whole number from 2 to ${MAX_FIR_ORDER}`,
  hint: 'taps − 1; an odd order leaves fs/2 free',
  type: 'number',
  range: 'whole',
  max: MAX_FIR_ORDER,
  presence: 'required',
} as const;

export const differentiatorDesigner = defineDesigner({
  kind: 'differentiator',
  parameters: [
    ORDER,
    {
      key: 'upToHz',
      flag: 'up-to',
      label: 'Works up to',
      short: 'up to',
      what: 'the highest frequency in Hz where the gain must follow ω',
      unit: 'Hz',
      type: 'number',
      range: 'band',
      presence: 'required',
    },
  ],
  variants: [
    {
      id: 'differentiator',
      cli: 'differentiator',
      label: 'Differentiator',
      group: GROUP,
      example: () => ({ fs: 1000, order: 31, upToHz: 400 }),
      start: (fs) => ({ order: 31, upToHz: r3(0.4 * fs) }),
    },
  ],
  design: (spec) => designEngine().differentiator(spec),
});

export const hilbertDesigner = defineDesigner({
  kind: 'hilbert',
  parameters: [
    ORDER,
    {
      key: 'bandHz',
      name: 'band',
      flag: 'band',
      label: 'Band',
      short: 'band',
      what: 'low,high in Hz: where the gain must be 1 with a quarter-turn phase',
      pairLabel: 'Band edge',
      unit: 'Hz',
      type: 'list',
      item: 'band',
      count: { exactly: () => 2, max: 2 },
      increasing: true,
      noun: 'edge',
      presence: 'required',
    },
  ],
  variants: [
    {
      id: 'hilbert',
      cli: 'hilbert',
      label: 'Hilbert transformer',
      group: GROUP,
      example: () => ({ fs: 48000, order: 62, bandHz: [500, 23500] }),
      start: (fs) => ({ order: 62, bandHz: [r3(0.02 * fs), r3(0.48 * fs)] }),
    },
  ],
  design: (spec) => designEngine().hilbert(spec),
});
