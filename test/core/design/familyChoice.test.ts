import { describe, it, expect } from 'vitest';
import { runDesigner, FAMILY_TIE_BREAK, type DesignerSpec } from '../../../src/core/design/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** A low-pass requirement at fs 1 kHz with the family left to the tool. */
const anyLowpass = (passHz: number, stopHz: number, rippleDb: number, attenuationDb: number) =>
  ({
    kind: 'iir',
    family: 'any',
    response: 'lowpass',
    order: 'auto',
    passbandHz: [passHz],
    stopbandHz: [stopHz],
    rippleDb,
    attenuationDb,
    fs: 1000,
  }) as DesignerSpec;

const orders = (spec: DesignerSpec) => {
  const r = runDesigner(spec);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

describe('any family: the least order over the four classical families', () => {
  it('finds each family’s least order as scipy’s order estimators do and picks the least', () => {
    // scipy.signal buttord / cheb1ord / cheb2ord / ellipord 1.17 (fs=1000): 13, 7, 7, 5
    const r = orders(anyLowpass(100, 150, 0.5, 40));
    expect(r.family!.trials.map((t) => [t.family, t.order])).toEqual([
      ['butterworth', 13],
      ['chebyshev1', 7],
      ['chebyshev2', 7],
      ['elliptic', 5],
    ]);
    expect(r.family!.picked).toBe('elliptic');
    expect(r.family!.tieBroken).toBe(false);
    expect(r.estimate!.order).toBe(5);
    // The picked design meets the requirement (margins ≥ 0 to rounding).
    expect(r.margin!.passMarginDb).toBeGreaterThan(-1e-9);
    expect(r.margin!.stopMarginDb).toBeGreaterThan(-1e-9);
    expect(r.note).toMatch(/elliptic low-pass.*picked from any family \(Butterworth 13, Chebyshev I 7/);
  });

  it('breaks a tie on order by the least group-delay spread across the pass band, and says so', () => {
    // scipy.signal *ord 1.17: Butterworth 4, Chebyshev I, II and elliptic 3 for 100/200 Hz, 1 dB, 20 dB.
    // Pass-band (0–100 Hz) group-delay spread, scipy.signal.group_delay 1.17 on 512 points of each
    // family's order-3 design (cheby1/cheby2/ellip at the *ord natural edges): 4.549527, 2.036748, 8.851144.
    const r = orders(anyLowpass(100, 200, 1, 20));
    const spread = Object.fromEntries(r.family!.trials.map((t) => [t.family, t.delaySpreadSamples!]));
    expect(r.family!.trials.map((t) => t.order)).toEqual([4, 3, 3, 3]);
    expectClose(spread.chebyshev1!, 4.549526606543909, { rel: 1e-6 }, 'Chebyshev I spread');
    expectClose(spread.chebyshev2!, 2.036747993695352, { rel: 1e-6 }, 'Chebyshev II spread');
    expectClose(spread.elliptic!, 8.851143902526395, { rel: 1e-6 }, 'elliptic spread');
    expect(r.family!.picked).toBe('chebyshev2');
    expect(r.family!.tieBroken).toBe(true);
    expect(r.note).toContain(FAMILY_TIE_BREAK);
    // The Butterworth, lower in spread but of higher order, is not picked: order comes first.
    expect(spread.butterworth!).toBeLessThan(spread.elliptic!);
  });

  it('refuses "any family" with a given order, naming the order', () => {
    const spec = { kind: 'iir', family: 'any', response: 'lowpass', order: 4, edgesHz: [100], fs: 1000 };
    const r = runDesigner(spec as DesignerSpec);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.parameter).toBe('order');
      expect(r.error.message).toMatch(/least order/);
    }
  });

  it('works for band shapes too: a band-stop requirement', () => {
    // scipy.signal *ord 1.17, fs=1000, pass 100/320, stop 150/250, 1 dB, 30 dB: 5, 4, 4, 3
    const spec = {
      ...anyLowpass(0, 0, 1, 30),
      response: 'bandstop',
      passbandHz: [100, 320],
      stopbandHz: [150, 250],
    } as DesignerSpec;
    const r = orders(spec);
    expect(r.family!.trials.map((t) => t.order)).toEqual([5, 4, 4, 3]);
    expect(r.family!.picked).toBe('elliptic');
  });
});
