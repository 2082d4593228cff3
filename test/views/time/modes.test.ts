import { describe, it, expect } from 'vitest';
import { evaluateClosedForm } from '../../../src/core/time/closedForm.ts';
import { closedFormResponse } from '../../../src/core/time/fromCoefficients.ts';
import { impulseResponse } from '../../../src/core/time/filter.ts';
import type { TransferFunction } from '../../../src/core/types.ts';
import { closedFormModes, type Mode } from '../../../src/views/time/modes.ts';
import { envelopeValues, envelopeWeights, fitEnvelopeWeight } from '../../../src/views/time/envelope.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** A mode's value at n from its displayed parameters (what a reader of the list would compute). */
function modeAt(m: Mode, n: number): number {
  const np = n ** m.power;
  if (m.kind === 'real') return m.amplitude * np * m.base ** n;
  return m.amplitude * np * m.radius ** n * Math.cos(m.omega * n + m.phase);
}

// Resonator with poles 0.95∠±0.6 and a real pole at −0.5: H = 1 / ((1 − 1.9cos0.6 z^-1 + 0.9025 z^-2)(1 + 0.5 z^-1)).
const c = Math.cos(0.6);
const tf: TransferFunction = {
  b: [1, 0, -1],
  a: [1, -1.9 * c + 0.5, 0.9025 - 0.95 * c, 0.45125],
};

describe('closedFormModes', () => {
  it('lists real modes (pairs combined) whose sum is the filtered impulse response', () => {
    const cf = closedFormResponse(tf, { kind: 'impulse' });
    const { modes, impulses } = closedFormModes(cf);
    expect(modes.filter((m) => m.kind === 'pair')).toHaveLength(1);
    expect(modes.filter((m) => m.kind === 'real')).toHaveLength(1);
    const y = impulseResponse(tf, 40); // transposed direct form II, independent of the partial fractions
    const sum = y.map(
      (_, n) =>
        modes.reduce((s, m) => s + modeAt(m, n), 0) + (impulses.find((d) => d.delay === n)?.value ?? 0),
    );
    expectClose(sum, y, { abs: 1e-12 });
  });
  it('puts the slowest mode first and reads its frequency and radius off the pole', () => {
    const { modes } = closedFormModes(closedFormResponse(tf, { kind: 'impulse' }));
    expect(modes[0]!.kind).toBe('pair');
    expectClose(modes[0]!.radius, 0.95, { rel: 1e-12 });
    expectClose(modes[0]!.omega, 0.6, { rel: 1e-12 });
    expectClose(modes[1]!.base, -0.5, { rel: 1e-12 });
  });
  it('shows a step response settling as a constant on the circle, not as a slowly decaying term', () => {
    const { modes } = closedFormModes(closedFormResponse({ b: [0.2], a: [1, -0.8] }, { kind: 'step' }));
    const steady = modes.find((m) => m.onCircle);
    expect(steady?.kind).toBe('real');
    expect(steady?.base).toBe(1);
    expectClose(steady!.amplitude, 1, { rel: 1e-12 }); // DC gain 0.2 / (1 − 0.8) = 1
  });
});

describe('decay envelope', () => {
  it('from the closed form bounds the impulse response everywhere', () => {
    const cf = closedFormResponse(tf, { kind: 'impulse' });
    const w = envelopeWeights(cf, 0.95)!;
    expect(w).toHaveLength(1);
    const n = 200;
    const e = envelopeValues(w, 0.95, n);
    const y = impulseResponse(tf, n);
    // Past the fast pole's transient (0.5ⁿ is negligible by n = 40) the slow modes alone set |y|.
    for (let k = 40; k < n; k++) expect(Math.abs(y[k]!)).toBeLessThanOrEqual(e[k]! * (1 + 1e-9));
    // And it is tight: the response comes within 10% of it in every time constant (~20 samples).
    for (let k = 40; k + 20 < n; k += 20) {
      const peak = Math.max(...Array.from(y.subarray(k, k + 20), Math.abs));
      expect(peak).toBeGreaterThan(0.9 * e[k + 20]!);
    }
  });
  it('fitted to data bounds the data over the fitting window', () => {
    const y = evaluateClosedForm(closedFormResponse(tf, { kind: 'impulse' }), 100);
    const cFit = fitEnvelopeWeight(y, 0, 0.95);
    const e = envelopeValues([cFit], 0.95, 100);
    for (let k = 0; k < 20; k++) expect(Math.abs(y[k]!)).toBeLessThanOrEqual(e[k]! * (1 + 1e-12));
  });
  it('follows n·rⁿ for a double pole', () => {
    const e = envelopeValues([0, 2], 0.5, 4);
    expectClose(e, [0, 1, 1, 0.75], { rel: 1e-15 }); // 2·n·0.5ⁿ
  });
});
