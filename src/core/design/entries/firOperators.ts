/**
 * Registry entries of the equiripple FIR operators: a differentiator (H ≈ jω) and a Hilbert transformer
 * (H ≈ −j on positive frequencies), both antisymmetric, so their phase is linear plus a quarter turn.
 */
import { defineDesigner } from '../parameters.ts';
import { DesignInputError, MAX_FIR_ORDER } from '../validate.ts';
import { remezTaps } from '../fir/remez.ts';
import { tfToZpk } from '../../system/transferFunction.ts';
import type { FirBand } from '../fir/bands.ts';
import { snapLinearPhaseZeros } from '../fir/linearPhaseZeros.ts';
import { fmt, r3 } from './common.ts';

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

/** Equiripple taps of an operator, refusing what the exchange cannot settle. */
function operatorTaps(order: number, band: FirBand, kind: 'differentiator' | 'hilbert') {
  if (order < 2)
    throw new DesignInputError(`order ${order} is too low for a ${kind}`, 'an order from 2', 'order');
  const r = remezTaps(order + 1, [band], kind);
  if (!r.converged)
    throw new DesignInputError(
      `the equiripple exchange did not settle at order ${order}`,
      'a lower order or a narrower band',
      'order',
    );
  return r;
}

const linear = (order: number) => `linear phase, delay ${fmt(order / 2)} samples`;

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
  design(spec) {
    // H ≈ jω with ω in rad/sample: the amplitude 2π·f for f in cycles per sample, relative error weighted
    const r = operatorTaps(
      spec.order,
      { lo: 0, hi: spec.upToHz / spec.fs, from: 2 * Math.PI, to: 2 * Math.PI, weight: 1 },
      'differentiator',
    );
    return {
      zpk: snapLinearPhaseZeros(tfToZpk({ b: Array.from(r.taps), a: [1] })),
      note: `order ${spec.order} equiripple differentiator, gain ω (rad/sample; × fs for per second) within ${fmt((100 * r.deviation) / (2 * Math.PI))} % up to ${fmt(spec.upToHz)} Hz, ${linear(spec.order)}, fs ${fmt(spec.fs)} Hz`,
    };
  },
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
  design(spec) {
    const [lo, hi] = spec.bandHz as [number, number];
    // −1 with H = j·A·e^{−jωM}: H ≈ −j on positive frequencies, the Hilbert transformer's sign
    const r = operatorTaps(
      spec.order,
      { lo: lo / spec.fs, hi: hi / spec.fs, from: -1, to: -1, weight: 1 },
      'hilbert',
    );
    return {
      zpk: snapLinearPhaseZeros(tfToZpk({ b: Array.from(r.taps), a: [1] })),
      note: `order ${spec.order} equiripple Hilbert transformer, gain 1 within ±${fmt(r.deviation)} from ${fmt(lo)} to ${fmt(hi)} Hz, ${linear(spec.order)} plus a quarter turn, fs ${fmt(spec.fs)} Hz`,
    };
  },
});
