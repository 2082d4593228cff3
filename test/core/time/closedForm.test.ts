import { describe, it, expect } from 'vitest';
import {
  binomialInN,
  closedFormResponseZpk,
  describeTerm,
  evaluateClosedForm,
  formatClosedForm,
  type ClosedForm,
  type TimeInput,
} from '../../../src/core/time/closedForm.ts';
import { closedFormResponse } from '../../../src/core/time/fromCoefficients.ts';
import { filterSections, filterTf } from '../../../src/core/time/filter.ts';
import { zpkToTf } from '../../../src/core/system/transferFunction.ts';
import { makeImpulse, makeSine, makeStep } from '../../../src/core/time/inputs.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { polyFromRoots } from '../../../src/core/poly.ts';
import type { Root, Section, TransferFunction, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

const N = 200;

function inputSamples(input: TimeInput, n: number): Float64Array {
  if (input.kind === 'impulse') return makeImpulse(n);
  if (input.kind === 'step') return makeStep(n);
  return makeSine(input.omega, n, input.phase ?? 0);
}

/** The closed form must reproduce direct filtering (transposed direct form II, itself checked against lfilter). */
function expectMatchesFiltering(
  tf: TransferFunction,
  input: TimeInput,
  label: string,
  rel = 1e-9,
  n = N,
): ClosedForm {
  const cf = closedFormResponse(tf, input);
  const y = filterTf(tf, inputSamples(input, n));
  const scale = Math.max(1, ...Array.from(y, Math.abs));
  expectClose(evaluateClosedForm(cf, n), y, { abs: rel * scale }, `${label} ${input.kind}`);
  return cf;
}

const inputs: TimeInput[] = [
  { kind: 'impulse' },
  { kind: 'step' },
  { kind: 'sine', omega: 0.7, phase: 0.3 },
  { kind: 'sine', omega: 2.9 },
];

const realPoles = (...ps: [number, number][]): number[] =>
  Array.from(polyFromRoots(ps.map(([re, m]) => ({ re, im: 0, multiplicity: m }))));

const systems: Record<string, TransferFunction> = {
  'first order': { b: [0.2, 0.1], a: [1, -0.7] },
  'double real pole': { b: [1, -0.3], a: realPoles([0.8, 2]) },
  'triple pole (1 − 0.5z^-1)^3': { b: [1, 2], a: realPoles([0.5, 3]) },
  'quadruple pole with a simple one': { b: [0.5, 0.1, -0.2], a: realPoles([0.9, 4], [-0.6, 1]) },
  'complex double pair': {
    b: [1, -0.2, 0.3],
    a: Array.from(
      polyFromRoots([
        { re: 0.6, im: 0.5, multiplicity: 2 },
        { re: -0.3, im: 0, multiplicity: 1 },
      ]),
    ),
  },
  FIR: { b: [1, 2, 3, -1], a: [1] },
  'improper with a repeated pole': { b: [1, 0, 0, 0, 1, 2], a: realPoles([0.9, 2], [-0.4, 1]) },
  'leading a not one': { b: [2, 1, 0.5], a: [2, -1.2, 0.5] },
  'pole at z = -1 (oscillating, marginal)': { b: [1], a: [1, 1] },
};

describe('closedFormResponse reproduces filtering', () => {
  for (const [name, tf] of Object.entries(systems)) {
    for (const input of inputs) {
      it(`${name}, ${input.kind}${input.kind === 'sine' ? ` ω=${input.omega}` : ''}`, () => {
        expectMatchesFiltering(tf, input, name);
      });
    }
  }

  it('step into a pole at z = 1 gives a ramp: 1/(1 − z^-1) stepped is n + 1', () => {
    const cf = expectMatchesFiltering({ b: [1], a: [1, -1] }, { kind: 'step' }, 'integrator');
    // (n + 1)·1^n, inverse z-transform of 1/(1 − z^-1)^2 (common practice)
    const byPower = cf.terms.map((t) => [t.power, t.pole.re, t.pole.im, t.coefficient.re, t.coefficient.im]);
    expect(byPower.length).toBe(2);
    byPower.sort((p, q) => p[0]! - q[0]!);
    expectClose(byPower.flat(), [0, 1, 0, 1, 0, 1, 1, 0, 1, 0], { abs: 1e-12 });
  });

  it('a cosine at the angle of poles on the unit circle resonates: terms in n·p^n', () => {
    const w0 = 0.9;
    const tf = { b: [1], a: [1, -2 * Math.cos(w0), 1] };
    const cf = expectMatchesFiltering(tf, { kind: 'sine', omega: w0, phase: 0.2 }, 'resonance', 1e-9, 400);
    expect(
      cf.terms.some((t) => t.power === 1 && Math.abs(Math.atan2(t.pole.im, t.pole.re) - w0) < 1e-12),
    ).toBe(true);
    expect(Math.max(...cf.terms.map((t) => t.power))).toBe(1);
  });

  it('a step into a double pole at z = 1 has an n^2 term', () => {
    const cf = expectMatchesFiltering({ b: [0.5], a: [1, -2, 1] }, { kind: 'step' }, 'double integrator');
    expect(Math.max(...cf.terms.map((t) => t.power))).toBe(2);
  });

  it('folds ω outside [0, π] and handles ω = 0 and ω = π', () => {
    const tf = systems['double real pole']!;
    for (const omega of [0, Math.PI, -0.7, 2 * Math.PI + 0.4, 5.5]) {
      expectMatchesFiltering(tf, { kind: 'sine', omega, phase: 0.6 }, `ω=${omega}`);
    }
  });

  it('a cosine at ω = 0 into a pole at z = 1 ramps as cos φ·(n + 1)', () => {
    expectMatchesFiltering({ b: [1], a: [1, -1] }, { kind: 'sine', omega: 0, phase: 0.5 }, 'dc cosine');
  });

  it('sine steady-state mode is H(e^{jω})·e^{jφ}/2 at the input pole', () => {
    const tf = systems['complex double pair']!;
    const omega = 1.3;
    const phase = 0.4;
    const cf = closedFormResponse(tf, { kind: 'sine', omega, phase });
    const t = cf.terms.find(
      (t) => Math.abs(t.pole.re - Math.cos(omega)) < 1e-9 && Math.abs(t.pole.im - Math.sin(omega)) < 1e-9,
    );
    expect(t).toBeDefined();
    // H(e^{jω}) = Σ b_k e^{−jωk} / Σ a_k e^{−jωk}, times e^{jφ}/2 (common practice)
    const dtft = (c: number[]) =>
      c.reduce<[number, number]>(
        ([r, i], v, k) => [r + v * Math.cos(omega * k), i - v * Math.sin(omega * k)],
        [0, 0],
      );
    const [br, bi] = dtft(tf.b);
    const [ar, ai] = dtft(tf.a);
    const hr = (br * ar + bi * ai) / (ar * ar + ai * ai);
    const hi = (bi * ar - br * ai) / (ar * ar + ai * ai);
    const er = (hr * Math.cos(phase) - hi * Math.sin(phase)) / 2;
    const ei = (hr * Math.sin(phase) + hi * Math.cos(phase)) / 2;
    expectClose([t!.coefficient.re, t!.coefficient.im], [er, ei], { abs: 1e-12 });
  });

  it('matches the sixth-order lfilter case through coefficients', () => {
    const { cases } = loadFixture<{ cases: { name: string; b: number[]; a: number[] }[] }>('time_lfilter');
    const c = cases.find((c) => c.name === 'order_six/impulse')!;
    for (const input of inputs) expectMatchesFiltering({ b: c.b, a: c.a }, input, 'sixth order', 1e-9, 300);
  });

  describe('binomialInN', () => {
    it('expands C(n+2, 2) = (n^2 + 3n + 2)/2', () => {
      // by hand
      expectClose(binomialInN(3), [1, 1.5, 0.5], { abs: 1e-15 });
      expectClose(binomialInN(1), [1], { abs: 0 });
    });
  });

  describe('formatClosedForm', () => {
    it('writes real modes, powers of n and the finite part', () => {
      const cf: ClosedForm = {
        terms: [
          { coefficient: { re: 0.5, im: 0 }, pole: { re: 0.8, im: 0 }, power: 0 },
          { coefficient: { re: -1.2, im: 0 }, pole: { re: 0.8, im: 0 }, power: 1 },
          { coefficient: { re: 2, im: 0 }, pole: { re: 1, im: 0 }, power: 0 },
        ],
        direct: [0.25, 0, -1],
        converged: true,
      };
      expect(formatClosedForm(cf, 3)).toBe('0.5·(0.8)^n - 1.2·n·(0.8)^n + 2 + 0.25·δ[n] - 1·δ[n-2]');
    });

    it('combines a conjugate pair into a damped cosine', () => {
      const c = { re: 0.3, im: 0.4 };
      const p = { re: 0.9 * Math.cos(0.5), im: 0.9 * Math.sin(0.5) };
      const cf: ClosedForm = {
        terms: [
          { coefficient: c, pole: p, power: 0 },
          { coefficient: { re: c.re, im: -c.im }, pole: { re: p.re, im: -p.im }, power: 0 },
        ],
        direct: [],
        converged: true,
      };
      // 2|c| = 1, ∠c = atan2(0.4, 0.3) = 0.9273
      expect(formatClosedForm(cf, 4)).toBe('1·(0.9)^n·cos(0.5n + 0.9273)');
    });

    it('describes the closed form of an integrator step and of nothing', () => {
      expect(formatClosedForm(closedFormResponse({ b: [1], a: [1, -1] }, { kind: 'step' }), 4)).toMatch(
        /^1 \+ 1·n$|^1·n \+ 1$/,
      );
      expect(formatClosedForm({ terms: [], direct: [], converged: true })).toBe('0');
    });

    it('describes a single complex term with polar pole', () => {
      const text = describeTerm(
        { coefficient: { re: 0.3, im: -0.2 }, pole: { re: 0, im: 0.5 }, power: 2 },
        3,
      );
      expect(text).toBe('(0.3-0.2j)·n^2·(0.5∠1.57)^n');
    });
  });

  describe('closedFormResponseZpk', () => {
    const sectionsFixture = loadFixture<{ sos: Section[] }>('time_sosfilt');

    it('matches sosfilt for ten poles crowded near z = 1, where the coefficient form loses the poles', () => {
      // the sections of gen_time.py: poles r·e^{±jθ}, a double zero at −1 and gain b0 per section
      const radii = [0.995, 0.99, 0.985, 0.98, 0.975];
      const angles = [0.02, 0.05, 0.08, 0.1, 0.12];
      const zpk: Zpk = {
        zeros: [{ re: -1, im: 0, multiplicity: 10 }],
        poles: radii.map((r, i) => ({
          re: r * Math.cos(angles[i]!),
          im: r * Math.sin(angles[i]!),
          multiplicity: 1,
        })),
        gain: sectionsFixture.sos.reduce((g, s) => g * s[0], 1),
      };
      for (const input of inputs) {
        const y = filterSections(sectionsFixture.sos, inputSamples(input, 600));
        const scale = Math.max(...Array.from(y, Math.abs));
        // filterSections is checked against scipy.signal.sosfilt 1.17 on these sections
        expectClose(
          evaluateClosedForm(closedFormResponseZpk(zpk, input), 600),
          y,
          { abs: 1e-9 * scale },
          input.kind,
        );
      }
    });

    const zpkCases: Record<string, Zpk> = {
      'triple pole, zeros': {
        zeros: [{ re: -0.5, im: 0, multiplicity: 1 }],
        poles: [{ re: 0.5, im: 0, multiplicity: 3 }],
        gain: 2,
      },
      'complex double pair and a pole at the origin': {
        zeros: [{ re: 0.2, im: 0.9, multiplicity: 1 }],
        poles: [
          { re: 0.6, im: 0.5, multiplicity: 2 },
          { re: 0, im: 0, multiplicity: 1 },
        ],
        gain: 0.3,
      },
      'more zeros than poles': {
        zeros: [
          { re: 1, im: 0, multiplicity: 2 },
          { re: 0.1, im: 0.7, multiplicity: 1 },
        ],
        poles: [{ re: -0.8, im: 0, multiplicity: 1 }],
        gain: 1.5,
      },
      'poles on the unit circle at 0.9 rad and at z = 1': {
        zeros: [],
        poles: [
          { re: Math.cos(0.9), im: Math.sin(0.9), multiplicity: 1 },
          { re: 1, im: 0, multiplicity: 1 },
        ],
        gain: 0.1,
      },
    };
    const zpkInputs: TimeInput[] = [...inputs, { kind: 'sine', omega: 0.9, phase: -0.4 }];
    for (const [name, zpk] of Object.entries(zpkCases)) {
      it(`matches filtering of zpkToTf for ${name}`, () => {
        const tf = zpkToTf(zpk);
        for (const input of zpkInputs) {
          const y = filterTf(tf, inputSamples(input, 300));
          const scale = Math.max(1, ...Array.from(y, Math.abs));
          // filterTf is checked against scipy.signal.lfilter 1.17; zpkToTf against scipy zpk2tf
          expectClose(
            evaluateClosedForm(closedFormResponseZpk(zpk, input), 300),
            y,
            { abs: 1e-10 * scale },
            `${name} ${input.kind}`,
          );
        }
      });
    }

    it('agrees with the coefficient path on a triple pole', () => {
      const zpk = zpkCases['triple pole, zeros']!;
      const a = closedFormResponseZpk(zpk, { kind: 'step' });
      const b = closedFormResponse(zpkToTf(zpk), { kind: 'step' });
      expect(a.terms.map((t) => t.power).sort()).toEqual(b.terms.map((t) => t.power).sort());
      expectClose(evaluateClosedForm(a, 50), evaluateClosedForm(b, 50), { abs: 1e-10 });
    });
    it('matches filtering for random zeros/poles/gain with repeated poles (seeded)', () => {
      const rand = mulberry32(99);
      for (let trial = 0; trial < 30; trial++) {
        const roots: Root[] = [];
        const count = 1 + Math.floor(rand() * 3);
        while (roots.length < count) {
          const r = 0.3 + 0.65 * rand();
          const real = rand() < 0.5;
          const th = 0.2 + rand() * (Math.PI - 0.4);
          const root = {
            re: real ? r : r * Math.cos(th),
            im: real ? 0 : r * Math.sin(th),
            multiplicity: 1 + Math.floor(rand() * 3),
          };
          // keeps the coefficient form used by filterTf well enough conditioned to serve as the reference
          if (roots.every((q) => Math.hypot(q.re - root.re, q.im - root.im) > 0.2)) roots.push(root);
        }
        const zeros: Root[] = [{ re: 2 * rand() - 1, im: rand() < 0.5 ? 0 : rand(), multiplicity: 1 }];
        const zpk: Zpk = { zeros, poles: roots, gain: 0.5 + rand() };
        const input = inputs[trial % inputs.length]!;
        const y = filterTf(zpkToTf(zpk), inputSamples(input, 200));
        const scale = Math.max(1, ...Array.from(y, Math.abs));
        // filterTf is checked against scipy.signal.lfilter 1.17. Triple poles 0.2 apart carry residues in the
        // hundreds that cancel, hence 1e-7 of the output's scale.
        expectClose(
          evaluateClosedForm(closedFormResponseZpk(zpk, input), 200),
          y,
          { abs: 1e-7 * scale },
          `trial ${trial}`,
        );
      }
    });
  });
});
