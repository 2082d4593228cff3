/**
 * Changing the sample rate keeps a design in hertz. A design its designer made (roots as designed) is
 * designed again at the new rate from the same specification in Hz; hand-placed roots are moved so their
 * frequencies in Hz stay (core/model/rate.ts), or, if the user says so, keep their places in the plane. A
 * composed design (core/model/parts.ts) is treated part by part: each part still as its designer made it is
 * designed again at the new rate, and the roots placed by hand, or a designed part edited by hand since, follow
 * the same choice. The requirement mask is in Hz: the mask the designer (or the parts) implied is rebuilt for
 * the new rate, a user's mask stays and is clipped to the new fs/2. Everything happens in one undo step.
 *
 * Designers run through the design engine's door (core/design/light.ts): before the engine has arrived,
 * ratePlan and designAtRate throw DesignEnginePending, and the store's action waits for it
 * (whenDesignEngine).
 */
import type { Result } from '../core/types.ts';
import type { Design } from '../core/model/design.ts';
import { MAX_SAMPLE_RATE } from '../core/model/limits.ts';
import { describeProblem, type DesignProblem } from '../core/model/check.ts';
import { rootsKeepingHz } from '../core/model/rate.ts';
import {
  clippedMask,
  gainAfterMove,
  gainRuleWords,
  partsAsDesigned,
  partsAtRate,
  rateText as hzText,
  type RateChoice,
} from '../core/model/partsRate.ts';
import { maskFromDesigner, type RequirementMask } from '../core/mask/index.ts';
import { sameMask } from '../core/mask/same.ts';
import { runDesigner } from '../core/design/light.ts';
import { applyDesigner, differsFromDesigner } from './designer.ts';

/** What to do with hand-placed roots: keep their frequencies in Hz (default) or their places in the plane. */
export type { RateChoice };

/** How a rate change will go: just the rate (no roots), a re-run of the designer(s), or a question first. */
export type RatePlan = 'plain' | 'rerun' | 'ask';

/** How a change of sample rate would treat this design. */
export function ratePlan(design: Design): RatePlan {
  if (design.zeros.length === 0 && design.poles.length === 0 && !design.designer && !design.parts)
    return 'plain';
  if (design.parts) return partsAsDesigned(design).every(Boolean) ? 'rerun' : 'ask';
  if (design.designer && !differsFromDesigner(design, runDesigner(design.designer))) return 'rerun';
  return 'ask';
}

/**
 * The mask at the new rate: the one the designer implied rebuilt from its description at the new rate (in
 * `after`), any other clipped.
 */
function maskFor(
  design: Design,
  hz: number,
  after: Design | null,
): { mask: RequirementMask | null; words: string } {
  const mask = design.mask;
  if (!mask) return { mask: null, words: '' };
  if (after?.designer && design.designer && sameMask(mask, maskFromDesigner(design.designer))) {
    const rebuilt = maskFromDesigner(after.designer);
    if (rebuilt) return { mask: rebuilt, words: ' The requirement mask was rebuilt for the new rate.' };
  }
  return clippedMask(mask, hz);
}

function withMaskOf(d: Design, mask: RequirementMask | null): Design {
  const { mask: _old, ...rest } = d;
  return mask ? { ...rest, mask } : rest;
}

/**
 * The design at sample rate hz (one undo step for the caller) and a sentence saying what happened, or why
 * the change cannot be made (a designer refuses the rate, a root lies above the new fs/2).
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
    const m = maskFor(design, hz, null);
    return {
      ok: true,
      value: {
        design: withMaskOf({ ...design, sampleRate: hz }, m.mask),
        said: `Sample rate ${hzText(hz)}.${m.words}`,
      },
    };
  }
  if (design.parts) return partsAtRate(design, hz, choice);
  if (plan === 'rerun') {
    const spec = { ...design.designer!, fs: hz };
    const r = applyDesigner(design, spec, 'keep');
    if (!r.ok)
      return {
        ok: false,
        error: {
          ...r.error,
          message: `the designer cannot make this design at ${hzText(hz)}: ${r.error.message}`,
          expected: r.error.expected ?? 'another sample rate',
        },
      };
    const m = maskFor(design, hz, r.value.design);
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
    const m = maskFor(design, hz, null);
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
  const gainRule = gainAfterMove(
    design.gainRule,
    design,
    from,
    { zeros: zeros.value, poles: poles.value },
    hz,
  );
  const newDesigner = design.designer && { ...design.designer, fs: hz };
  const moved: Design = {
    ...rest,
    sampleRate: hz,
    zeros: zeros.value,
    poles: poles.value,
    gainRule,
    ...(newDesigner && { designer: newDesigner }),
  };
  const m = maskFor(design, hz, moved);
  return {
    ok: true,
    value: {
      design: withMaskOf(moved, m.mask),
      said: `The roots moved in the plane so that their frequencies in Hz stay.${gainRuleWords(design, moved)}${m.words}`,
    },
  };
}

/**
 * The store's changeSampleRate, once this code has arrived: the design at rate hz applied through the
 * store's checked edit `apply` (one undo step), and what happened in a sentence, or why nothing changed.
 */
export function applyRateChange(
  design: Design,
  hz: number,
  choice: RateChoice | undefined,
  apply: (fn: (d: Design) => Design) => DesignProblem | null,
): Result<string> {
  if (!(hz > 0 && hz <= MAX_SAMPLE_RATE))
    return {
      ok: false,
      error: {
        message: `sample rate ${hz} Hz is not accepted`,
        expected: `a rate above 0 Hz, at most ${MAX_SAMPLE_RATE} Hz`,
      },
    };
  const r = designAtRate(design, hz, choice);
  if (!r.ok) return r;
  const problem = apply(() => r.value.design);
  if (problem) return { ok: false, error: { message: describeProblem(problem), expected: problem.expected } };
  return { ok: true, value: r.value.said };
}
