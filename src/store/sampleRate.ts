/**
 * Changing the sample rate keeps a design in hertz. A design its designer made (roots as designed) is
 * designed again at the new rate from the same specification in Hz; hand-placed roots are moved so their
 * frequencies in Hz stay (core/model/rate.ts), or, if the user says so, keep their places in the plane. The
 * requirement mask is in Hz: the designer's own mask is rebuilt for the new rate, a user's mask stays and is
 * clipped to the new fs/2. Everything happens in one undo step.
 */
import type { Result } from '../core/types.ts';
import type { Design } from '../core/model/design.ts';
import { gainKeepingLevel, maskAtRate, rootsKeepingHz } from '../core/model/rate.ts';
import { maskFromDesigner, type RequirementMask } from '../core/mask/index.ts';
import { shortNumber } from '../core/shortNumber.ts';
import { runDesigner } from '../core/design/index.ts';
import { applyDesigner, differsFromDesigner } from './designer.ts';

/** What to do with hand-placed roots: keep their frequencies in Hz (default) or their places in the plane. */
export type RateChoice = 'keep-hz' | 'keep-places';

/** How a rate change will go: just the rate (no roots), a re-run of the designer, or a question first. */
export type RatePlan = 'plain' | 'rerun' | 'ask';

/** How a change of sample rate would treat this design. */
export function ratePlan(design: Design): RatePlan {
  if (design.zeros.length === 0 && design.poles.length === 0 && !design.designer) return 'plain';
  if (design.designer && !differsFromDesigner(design, runDesigner(design.designer))) return 'rerun';
  return 'ask';
}

const hzText = (hz: number) => (hz >= 1000 ? `${shortNumber(hz / 1000, 6)} kHz` : `${shortNumber(hz, 6)} Hz`);
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The mask at the new rate: the designer's own rebuilt from the new specification, any other clipped. */
function maskFor(
  design: Design,
  hz: number,
  newDesigner: Design['designer'],
): { mask: RequirementMask | null; words: string } {
  const mask = design.mask;
  if (!mask) return { mask: null, words: '' };
  if (design.designer && newDesigner && same(mask, maskFromDesigner(design.designer)))
    return {
      mask: maskFromDesigner(newDesigner),
      words: ' The requirement mask was rebuilt for the new rate.',
    };
  const r = maskAtRate(mask, hz);
  const parts: string[] = [];
  if (r.clipped.length) parts.push(`${r.clipped.join(', ')} clipped at ${hzText(hz / 2)}`);
  if (r.dropped.length) parts.push(`${r.dropped.join(', ')} removed (above ${hzText(hz / 2)})`);
  return {
    mask: r.mask.regions.length ? r.mask : null,
    words: parts.length ? ` Mask regions ${parts.join('; ')}.` : '',
  };
}

function withMaskOf(d: Design, mask: RequirementMask | null): Design {
  const { mask: _old, ...rest } = d;
  return mask ? { ...rest, mask } : rest;
}

/**
 * The design at sample rate hz (one undo step for the caller) and a sentence saying what happened, or why
 * the change cannot be made (the designer refuses the rate, a root lies above the new fs/2).
 */
export function designAtRate(
  design: Design,
  hz: number,
  choice: RateChoice = 'keep-hz',
): Result<{ design: Design; said: string }> {
  const from = design.sampleRate;
  if (hz === from) return { ok: true, value: { design, said: '' } };
  const plan = ratePlan(design);
  if (plan === 'plain') {
    const m = maskFor(design, hz, undefined);
    return {
      ok: true,
      value: {
        design: withMaskOf({ ...design, sampleRate: hz }, m.mask),
        said: `Sample rate ${hzText(hz)}.${m.words}`,
      },
    };
  }
  if (plan === 'rerun') {
    const spec = { ...design.designer!, fs: hz };
    const r = applyDesigner(design, spec, 'keep');
    if (!r.ok)
      return {
        ok: false,
        error: {
          message: `the designer cannot make this design at ${hzText(hz)}: ${r.error.message}`,
          expected: r.error.expected ?? 'another sample rate',
        },
      };
    const m = maskFor(design, hz, spec);
    return {
      ok: true,
      value: {
        design: withMaskOf(r.value.design, m.mask),
        said: `Designed again at ${hzText(hz)} from the same specification in Hz, so the response stays where it was.${m.words}`,
      },
    };
  }
  if (choice === 'keep-places') {
    const { designer: _designer, ...rest } = design;
    const m = maskFor(design, hz, undefined);
    const f = (hz / from).toPrecision(3);
    return {
      ok: true,
      value: {
        design: withMaskOf({ ...rest, sampleRate: hz }, m.mask),
        said: `The roots kept their places in the plane, so every frequency was scaled by ${f}${design.designer ? '; the designer no longer describes them and was released' : ''}.${m.words}`,
      },
    };
  }
  const zeros = rootsKeepingHz(design.zeros, from, hz, 'zero');
  if (!zeros.ok) return zeros;
  const poles = rootsKeepingHz(design.poles, from, hz, 'pole');
  if (!poles.ok) return poles;
  const { typed: _typed, ...rest } = design;
  let gainRule = design.gainRule;
  if (gainRule.kind === 'fixed') {
    const old = { zeros: design.zeros, poles: design.poles, gain: gainRule.value };
    const moved = { zeros: zeros.value, poles: poles.value, gain: gainRule.value };
    gainRule = { kind: 'fixed', value: gainKeepingLevel(old, from, moved, hz) };
  } else if (gainRule.kind === 'frequency' && gainRule.hz >= hz / 2) gainRule = { kind: 'peak' };
  const newDesigner = design.designer && { ...design.designer, fs: hz };
  const m = maskFor(design, hz, newDesigner);
  const moved: Design = {
    ...rest,
    sampleRate: hz,
    zeros: zeros.value,
    poles: poles.value,
    gainRule,
    ...(newDesigner && { designer: newDesigner }),
  };
  return {
    ok: true,
    value: {
      design: withMaskOf(moved, m.mask),
      said: `The roots moved in the plane so that their frequencies in Hz stay.${gainRule.kind === 'peak' && design.gainRule.kind === 'frequency' ? ` The gain rule's ${hzText(design.gainRule.hz)} is above the new fs/2: the gain now sets the peak to 0 dB.` : ''}${m.words}`,
    },
  };
}
