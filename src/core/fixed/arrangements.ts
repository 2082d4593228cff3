/**
 * The same design and word lengths arranged every way the settings allow — section ordering, scaling norm
 * and structure — with the round-off noise each arrangement adds and the headroom it leaves, so the quietest
 * arrangement that does not overflow can be picked. "Quietest" compares signal-to-noise ratios, not noise
 * powers: a scaling that lowers the noise by lowering the signal inside the cascade is no quieter. Pairing, gain distribution, words, rounding and overflow
 * mode stay as set.
 *
 * Headroom is judged at every section output (the data word, full scale 1) from the norms of the partial
 * cascades (see sections/norms.ts): an L1 norm ≤ 1 means no input within full scale can overflow; a peak
 * gain ≤ 1 means no sinusoid within full scale can, in steady state. The accumulator cannot overflow when
 * Σ|code|·2^(D−1) of every section fits it, since every partial sum (and a transposed form's states) is a
 * sum of products of data words with some of the section's five codes.
 */
import type { Zpk } from '../types.ts';
import type { ScalingNorm, SectionOrdering } from '../sections/index.ts';
import { buildImplementation, cascadeFor, type Implementation } from './implementation.ts';
import { roundoffNoise, type RoundoffNoise } from './noise.ts';
import type { ImplementationSettings, Structure } from './settings.ts';

/** Norms this close above 1 still count as 1 (the scaling makes them 1 up to rounding of doubles). */
export const HEADROOM_TOLERANCE = 1e-9;

/**
 * 'any-input': no input within full scale overflows a section output; 'sine': no full-scale sinusoid does
 * (steady state); 'none': a full-scale sinusoid can; 'unknown': the norms did not converge.
 */
export type Headroom = 'any-input' | 'sine' | 'none' | 'unknown';

/** One arrangement and its figures. */
export interface Arrangement {
  ordering: SectionOrdering;
  scaling: ScalingNorm;
  structure: Structure;
  noise: RoundoffNoise;
  /** Largest Σ|f_i[n]| over the partial cascades: the worst section-output peak for inputs within full scale. */
  peakAnyInput: number;
  /** Largest peak |F_i(e^{iω})|: the worst section-output amplitude for a full-scale sinusoid. */
  peakSine: number;
  headroom: Headroom;
  /** Whether no partial sum can overflow the accumulator (any data within the data word). */
  accumulatorSafe: boolean;
  /** Whether the quantized filter is stable. */
  stable: boolean;
  /** The settings of this arrangement (the current ones with ordering, scaling and structure replaced). */
  settings: ImplementationSettings;
  /** True for the arrangement in force. */
  current: boolean;
}

export const ORDERINGS: readonly SectionOrdering[] = ['ascending', 'descending'];
export const SCALINGS: readonly ScalingNorm[] = ['linf', 'l2', 'l1', 'none'];
export const STRUCTURES: readonly Structure[] = ['df1', 'df2t'];

/** Whether every partial sum of every section fits the accumulator for data within the data word. */
export function accumulatorSafe(impl: Implementation): boolean {
  const { dataWordLength: d, accumulatorBits: a } = impl.settings;
  const limit = 2 ** (a - 1) - 1;
  return impl.quantized.codes.every((c) => {
    const sum = [...c.b, ...c.a].reduce((s, v) => s + Math.abs(v), 0);
    return sum * 2 ** (d - 1) <= limit;
  });
}

/** The headroom verdict and peaks of an implementation's cascade. */
export function headroomOf(
  impl: Implementation,
): Pick<Arrangement, 'peakAnyInput' | 'peakSine' | 'headroom'> {
  const secs = impl.cascade.sections;
  const peakAnyInput = secs.reduce((m, s) => Math.max(m, s.cascadeL1), 0);
  const peakSine = secs.reduce((m, s) => Math.max(m, 10 ** (s.cascadePeakDb / 20)), 0);
  const ok = (x: number) => x <= 1 + HEADROOM_TOLERANCE;
  const headroom: Headroom = ok(peakSine)
    ? impl.cascade.normsConverged
      ? ok(peakAnyInput)
        ? 'any-input'
        : 'sine'
      : 'unknown'
    : 'none';
  return { peakAnyInput, peakSine, headroom };
}

/**
 * Every ordering × scaling × structure for the zpk under the settings, quietest first: highest SNR for the
 * loudest sine each delivers (see RoundoffNoise.snrDb; ties keep the order ordering, scaling, structure).
 * Arrangements whose settings do not apply are left out.
 */
export function compareArrangements(
  zpk: Zpk,
  sampleRate: number,
  settings: ImplementationSettings,
): Arrangement[] {
  const out: Arrangement[] = [];
  for (const ordering of ORDERINGS) {
    for (const scaling of SCALINGS) {
      const cascade = cascadeFor(zpk, { ...settings, ordering, scaling });
      for (const structure of STRUCTURES) {
        const s: ImplementationSettings = { ...settings, ordering, scaling, structure };
        const built = buildImplementation(zpk, sampleRate, s, cascade);
        if (!built.ok) continue;
        const impl = built.value;
        out.push({
          ordering,
          scaling,
          structure,
          noise: roundoffNoise(impl),
          ...headroomOf(impl),
          accumulatorSafe: accumulatorSafe(impl),
          stable: impl.stability.verdict === 'stable',
          settings: s,
          current:
            ordering === settings.ordering &&
            scaling === settings.scaling &&
            structure === settings.structure,
        });
      }
    }
  }
  return out.sort((a, b) => b.noise.snrDb - a.noise.snrDb);
}

/** SNRs this close count as equal when picking, so the arrangement in force is kept rather than a twin. */
export const SNR_TIE_DB = 0.01;

/**
 * The quietest stable arrangement whose accumulator is safe and whose headroom is at least `need` ('sine'
 * accepts 'any-input' too), preferring the one in force among equals; null when none qualifies.
 */
export function quietestSafe(list: readonly Arrangement[], need: 'any-input' | 'sine'): Arrangement | null {
  const fits = (h: Headroom) => h === 'any-input' || (need === 'sine' && h === 'sine');
  const safe = list.filter((a) => a.stable && a.accumulatorSafe && fits(a.headroom));
  const best = safe[0];
  if (!best) return null;
  const current = safe.find((a) => a.current);
  return current && current.noise.snrDb >= best.noise.snrDb - SNR_TIE_DB ? current : best;
}
