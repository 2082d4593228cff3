/**
 * Designers say what they cannot do: a design whose roots double precision cannot keep apart is refused,
 * naming the largest order that works, instead of coming back with merged roots and a response that is not
 * defined (an order-64 elliptic band-pass gave a "20-fold pole pair" and a pass-band loss of NaN).
 */
import { describe, expect, it } from 'vitest';
import { runDesigner, type DesignerSpec } from '../../../src/core/design/index.ts';
import { designIir } from '../../../src/core/design/iir.ts';
import { ROOT_SEPARATION, separationProblem } from '../../../src/core/design/separation.ts';

const ellipticBandpass = (order: number | 'auto', extra: Partial<DesignerSpec> = {}): DesignerSpec =>
  ({
    kind: 'iir',
    fs: 1000,
    family: 'elliptic',
    response: 'bandpass',
    order,
    edgesHz: [100, 200],
    rippleDb: 0.5,
    attenuationDb: 60,
    ...extra,
  }) as DesignerSpec;

describe('designs beyond double precision', () => {
  it('refuses an order-64 elliptic band-pass and names the largest order that works, which does work', () => {
    const r = runDesigner(ellipticBandpass(64));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.message).toMatch(
      /^order 64 puts two poles .* apart, closer than double precision separates/,
    );
    expect(r.error.parameter).toBe('order');
    const largest = Number(/order (\d+) is the largest that works/.exec(r.error.expected!)![1]);
    expect(largest).toBeGreaterThan(20);
    expect(largest).toBeLessThan(64);
    // The order named works and meets its own pass band and stop band to a micro-decibel; one more does not work.
    const ok = runDesigner(ellipticBandpass(largest, { passbandHz: [100, 200], stopbandHz: [95, 205] }));
    if (!ok.ok) throw new Error(ok.error.message);
    expect(Math.abs(ok.value.margin!.passMarginDb)).toBeLessThan(1e-6);
    expect(Number.isFinite(ok.value.margin!.passbandLossDb)).toBe(true);
    expect(runDesigner(ellipticBandpass(largest + 1)).ok).toBe(false);
  });

  it('says so for an estimated order too, and that the order named does not meet the requirement', () => {
    const r = runDesigner(
      ellipticBandpass('auto', {
        fs: 48_000,
        passbandHz: [100, 200],
        stopbandHz: [99.999, 200.001],
        rippleDb: 0.1,
        attenuationDb: 120,
      }),
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.message).toMatch(/^the requirement needs order \d+, which puts two poles/);
    expect(r.error.expected).toMatch(
      /order \d+ is the largest that works with these edges \(it does not meet/,
    );
  });

  it('draws the line where the Butterworth poles of a low cutoff come within √ε of each other', () => {
    // common practice: near z = 1 the bilinear transform maps the analog poles Ωc·e^{jθk} to 1 + sT, so
    // neighbouring digital poles of an order-N Butterworth are 2π·fc/fs · 2 sin(π/2N) apart.
    const fs = 48_000;
    const n = 64;
    const gap = (fc: number) => ((2 * Math.PI * fc) / fs) * 2 * Math.sin(Math.PI / (2 * n));
    const design = (fc: number) =>
      designIir({ family: 'butterworth', response: 'lowpass', order: n, edgesHz: [fc], fs });
    const fcAt = (g: number) => g / gap(1);
    expect(separationProblem(design(fcAt(4 * ROOT_SEPARATION)))).toBeNull();
    expect(separationProblem(design(fcAt(ROOT_SEPARATION / 4)))).toMatch(/two poles .* apart/);
  });

  it('refuses a notch so narrow that its poles cannot be told from poles on the circle', () => {
    // common practice: a notch of −3 dB width B at fs has its poles at radius about 1 − π·B/fs.
    const narrow = runDesigner({ kind: 'notch', fs: 48_000, f0: 50, bandwidthHz: 1e-9 });
    expect(narrow.ok).toBe(false);
    if (narrow.ok) return;
    const inside = Number(/a pole (\S+) inside the unit circle/.exec(narrow.error.message)![1]);
    expect(Math.abs(inside / ((Math.PI * 1e-9) / 48_000) - 1)).toBeLessThan(0.05);
    expect(runDesigner({ kind: 'notch', fs: 48_000, f0: 50, bandwidthHz: 1e-3 }).ok).toBe(true);
  });

  it('keeps roots a designer repeats on purpose (a band-stop of order 64 has its zeros at two points)', () => {
    const r = runDesigner({
      kind: 'iir',
      fs: 1000,
      family: 'butterworth',
      response: 'bandstop',
      order: 64,
      edgesHz: [45, 55],
    });
    expect(r.ok).toBe(true);
  });
});
