/**
 * A design as an implementable cascade of second-order sections: pole–zero pairing (system/sections.ts's nearest-zero
 * rules), ordering by pole radius, distribution of the gain k over the sections, and scaling of each
 * section's input so that the partial cascade up to its output has norm 1.
 *
 * Scaling (the cascade scaling of L. B. Jackson, 1970): with F_i = H₁…H_i the cascade up to section i,
 * section i's numerator is multiplied by s_i chosen so that ‖F_i‖ = 1 after scaling, for the chosen norm:
 * - 'l1': Σ|f_i[n]| = 1 — no input bounded by 1 can overflow any section output (the only guarantee);
 * - 'linf': max |F_i(e^{iω})| = 1 — no sinusoid of amplitude ≤ 1 overflows in steady state;
 * - 'l2': √Σ f_i[n]² = 1 — no input of energy ≤ 1 overflows (the mildest; for noise-like signals);
 * - 'none': the sections as distributed.
 * The scaled cascade computes H(z)/outputGain; multiply its output by outputGain to get H exactly.
 */
import type { Root, Section, Zpk } from '../types.ts';
import { zpkToSections, sectionsToZpk } from '../system/index.ts';
import type { SectionPairing } from '../system/index.ts';
import { peakMagnitude } from './peak.ts';
import { partialCascadeNorms } from './norms.ts';

/** Order of the sections by largest pole radius: 'ascending' runs the pole nearest the circle last. */
export type SectionOrdering = 'ascending' | 'descending';
/** 'first': all of k in the first section; 'spread': every section given the same peak gain |k·ΠP_i|^(1/N). */
export type GainDistribution = 'first' | 'spread';
/** The norm each partial cascade is scaled to 1 in, or 'none'. */
export type ScalingNorm = 'linf' | 'l2' | 'l1' | 'none';

export interface CascadeOptions {
  pairing?: SectionPairing;
  ordering?: SectionOrdering;
  gain?: GainDistribution;
  scaling?: ScalingNorm;
}

/** One section of the cascade as implemented, with what a sections table shows. */
export interface CascadeSection {
  /** [b0, b1, b2, 1, a1, a2]: a0 normalised to 1, the input scale folded into b. */
  coefficients: Section;
  /** Zeros and poles of this section (stored form, conjugates implied). */
  zeros: Root[];
  poles: Root[];
  /** Largest pole radius of the section (0 when it has no poles). */
  poleRadius: number;
  /** Peak of this section's own |H_i(e^{iω})| after scaling, dB. */
  peakGainDb: number;
  /** Factor the scaling multiplied into this section's numerator (1 with scaling 'none'). */
  scale: number;
  /** Peak |F_i| of the cascade up to and including this section, after scaling, dB. */
  cascadePeakDb: number;
  /** Σ|f_i[n]| of that partial cascade after scaling: the worst-case output for inputs bounded by 1. */
  cascadeL1: number;
}

/** The cascade and how it was formed. */
export interface Cascade {
  sections: CascadeSection[];
  /** H(z) = outputGain · Π H_i(z): the factor the scaling took out of the cascade. */
  outputGain: number;
  options: Required<CascadeOptions>;
  /** False when the L1/L2 norms could not be summed to convergence (poles on, outside or very near the circle). */
  normsConverged: boolean;
  notes: string[];
}

export const DEFAULT_CASCADE_OPTIONS: Required<CascadeOptions> = {
  pairing: 'nearest',
  ordering: 'ascending',
  gain: 'first',
  scaling: 'linf',
};

const radiusOf = (s: Section) =>
  sectionsToZpk([s]).poles.reduce((r, p) => Math.max(r, Math.hypot(p.re, p.im)), 0);

/** The section with a0 = 1. */
function monic(s: Section, index: number): Section {
  const a0 = s[3];
  if (a0 === 0 || !Number.isFinite(a0)) throw new RangeError(`section ${index} has a0 = ${a0}`);
  return [s[0] / a0, s[1] / a0, s[2] / a0, 1, s[4] / a0, s[5] / a0];
}

const withNumeratorTimes = (s: Section, c: number): Section => [
  c * s[0],
  c * s[1],
  c * s[2],
  s[3],
  s[4],
  s[5],
];

/**
 * Pole radii closer than this count as equal when ordering, so that pole pairs placed at one radius keep the
 * pairing order instead of an order picked by rounding noise in their computed radii.
 */
export const RADIUS_TIE_TOLERANCE = 1e-9;

/** Gain-1 sections ordered by pole radius (stable: equal radii keep the pairing order). */
function orderedSections(zpk: Zpk, opts: Required<CascadeOptions>): Section[] {
  const raw = zpkToSections({ ...zpk, gain: 1 }, { pairing: opts.pairing }).map(monic);
  const keyed = raw.map((s, i) => ({ s, r: radiusOf(s), i }));
  const dir = opts.ordering === 'ascending' ? 1 : -1;
  keyed.sort((x, y) => (Math.abs(x.r - y.r) > RADIUS_TIE_TOLERANCE ? dir * (x.r - y.r) : x.i - y.i));
  return keyed.map((k) => k.s);
}

/** Puts the gain k into the sections as the distribution rule says. */
function distributeGain(sections: Section[], k: number, rule: GainDistribution): Section[] {
  if (rule === 'first' || k === 0) return sections.map((s, i) => (i === 0 ? withNumeratorTimes(s, k) : s));
  const peaks = sections.map((s) => peakMagnitude([s]).peak);
  const total = peaks.reduce((p, x) => p * x, Math.abs(k));
  const each = Math.pow(total, 1 / sections.length);
  return sections.map((s, i) => withNumeratorTimes(s, ((i === 0 ? Math.sign(k) : 1) * each) / peaks[i]!));
}

/** Splits the zpk into an ordered, gain-distributed and scaled cascade of second-order sections. */
export function buildCascade(zpk: Zpk, options: CascadeOptions = {}): Cascade {
  const opts = { ...DEFAULT_CASCADE_OPTIONS, ...options };
  const notes: string[] = [];
  const distributed = distributeGain(orderedSections(zpk, opts), zpk.gain, opts.gain);
  const { norms, converged } = partialCascadeNorms(distributed);
  const scales = distributed.map(() => 1);
  const scalable = opts.scaling !== 'none' && zpk.gain !== 0;
  const normOf = (i: number) => (opts.scaling === 'none' ? 1 : norms[i]![opts.scaling]);
  const finite = norms.every((_, i) => Number.isFinite(normOf(i)) && normOf(i) > 0);
  if (scalable && (!finite || (!converged && opts.scaling !== 'linf'))) {
    notes.push(
      `the ${opts.scaling.toUpperCase()} norm is unbounded or did not converge (a pole on, outside or very near the unit circle); the sections are not scaled`,
    );
  } else if (scalable) {
    let before = 1;
    for (let i = 0; i < scales.length; i++) {
      scales[i] = 1 / (normOf(i) * before);
      before *= scales[i]!;
    }
  } else if (zpk.gain === 0 && opts.scaling !== 'none')
    notes.push('the gain is 0; the sections are not scaled');
  const scaled = distributed.map((s, i) => withNumeratorTimes(s, scales[i]!));
  const outputGain = 1 / scales.reduce((p, s) => p * s, 1);
  // Scaling multiplies partial cascade i by the product of the first i scales, and every norm with it.
  let product = 1;
  const after = norms.map((n, i) => {
    product *= Math.abs(scales[i]!);
    return { l1: n.l1 * product, l2: n.l2 * product, linf: n.linf * product };
  });
  const sections = scaled.map((s, i): CascadeSection => {
    const z = sectionsToZpk([s]);
    return {
      coefficients: s,
      zeros: z.zeros,
      poles: z.poles,
      poleRadius: radiusOf(s),
      peakGainDb: 20 * Math.log10(peakMagnitude([s]).peak),
      scale: scales[i]!,
      cascadePeakDb: 20 * Math.log10(after[i]!.linf),
      cascadeL1: after[i]!.l1,
    };
  });
  return { sections, outputGain, options: opts, normsConverged: converged, notes };
}
