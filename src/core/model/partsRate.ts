/**
 * A composed design (parts.ts) at another sample rate, kept in hertz part by part: each part still as its
 * designer made it is designed again at the new rate from the same description in Hz; the roots placed by
 * hand, and a designed part edited by hand since, keep their frequencies in Hz (rate.ts) or, when asked,
 * their places in the plane. The mask the parts imply is rebuilt for the new rate; any other mask is clipped
 * to the new fs/2. Shared by the page (store/sampleRate.ts) and `--fs` of the command line.
 *
 * Designers run through the design engine's door (design/light.ts): before the engine is installed this
 * throws DesignEnginePending, and the caller waits for it.
 */
import type { Result, Root } from '../types.ts';
import type { RequirementMask } from '../mask/index.ts';
import { sameMask } from '../mask/same.ts';
import { runDesigner, type DesignerSpec } from '../design/light.ts';
import { shortNumber } from '../shortNumber.ts';
import type { Design } from './design.ts';
import { partsOf, replacePart, type DesignPart } from './parts.ts';
import { maskOfParts } from './compose.ts';
import { gainKeepingLevel, maskAtRate, rootsKeepingHz } from './rate.ts';

/** What to do with roots not as a designer made them: keep their frequencies in Hz, or their places. */
export type RateChoice = 'keep-hz' | 'keep-places';

/** "4 kHz", "250 Hz". */
export const rateText = (hz: number) =>
  hz >= 1000 ? `${shortNumber(hz / 1000, 6)} kHz` : `${shortNumber(hz, 6)} Hz`;

const sameRoots = (a: readonly Root[], b: readonly Root[]) =>
  a.length === b.length &&
  a.every((r, i) => r.re === b[i]!.re && r.im === b[i]!.im && r.multiplicity === b[i]!.multiplicity);

/** Where each part's roots start in the design's lists. */
function starts(parts: readonly DesignPart[]): { zeros: number; poles: number }[] {
  let zeros = 0;
  let poles = 0;
  return parts.map((p) => {
    const s = { zeros, poles };
    zeros += p.zeros;
    poles += p.poles;
    return s;
  });
}

/** For each part: true when it is a designed part whose roots are as its designer made them. */
export function partsAsDesigned(design: Design): boolean[] {
  const parts = partsOf(design);
  const at = starts(parts);
  return parts.map((part, i) => {
    if (!part.designer || part.designer.fs !== design.sampleRate) return false;
    const r = runDesigner(part.designer);
    if (!r.ok) return false;
    const s = at[i]!;
    return (
      sameRoots(design.zeros.slice(s.zeros, s.zeros + part.zeros), r.value.zpk.zeros) &&
      sameRoots(design.poles.slice(s.poles, s.poles + part.poles), r.value.zpk.poles)
    );
  });
}

/**
 * The gain rule after roots were moved to keep their Hz (`old` and `moved` hold only the moved roots): a
 * fixed gain keeps their level where they are loudest; a gain rule's frequency above the new fs/2 gives way
 * to a 0 dB peak.
 */
export function gainAfterMove(
  gainRule: Design['gainRule'],
  old: { zeros: readonly Root[]; poles: readonly Root[] },
  fsOld: number,
  moved: { zeros: readonly Root[]; poles: readonly Root[] },
  fsNew: number,
): Design['gainRule'] {
  if (gainRule.kind === 'fixed') {
    const factor = gainKeepingLevel(
      { zeros: [...old.zeros], poles: [...old.poles], gain: 1 },
      fsOld,
      { zeros: [...moved.zeros], poles: [...moved.poles], gain: 1 },
      fsNew,
    );
    return { kind: 'fixed', value: gainRule.value * factor };
  }
  if (gainRule.kind === 'frequency' && gainRule.hz >= fsNew / 2) return { kind: 'peak' };
  return gainRule;
}

/** A sentence when the gain rule's frequency gave way (see gainAfterMove), else ''. */
export function gainRuleWords(before: Design, after: Design): string {
  return after.gainRule.kind === 'peak' && before.gainRule.kind === 'frequency'
    ? ` The gain rule's ${rateText(before.gainRule.hz)} is above the new fs/2 = ${rateText(after.sampleRate / 2)}: the gain now sets the peak to 0 dB.`
    : '';
}

/** A mask clipped to the new fs/2, with words saying which regions were clipped or removed. */
export function clippedMask(
  mask: RequirementMask,
  hz: number,
): { mask: RequirementMask | null; words: string } {
  const r = maskAtRate(mask, hz);
  const parts: string[] = [];
  if (r.clipped.length) parts.push(`${r.clipped.join(', ')} clipped at ${rateText(hz / 2)}`);
  if (r.dropped.length) parts.push(`${r.dropped.join(', ')} removed (above ${rateText(hz / 2)})`);
  return {
    mask: r.mask.regions.length ? r.mask : null,
    words: parts.length ? ` Mask regions ${parts.join('; ')}.` : '',
  };
}

/**
 * A composed design at sample rate hz, and a sentence saying what happened; or why it cannot be (a part's
 * designer refuses the rate, a root lies above the new fs/2), naming the part.
 */
export function partsAtRate(
  design: Design,
  hz: number,
  choice: RateChoice = 'keep-hz',
): Result<{ design: Design; said: string }> {
  const from = design.sampleRate;
  const parts = partsOf(design);
  const asDesigned = partsAsDesigned(design);
  const at = starts(parts);
  // 1. The roots not as a designer made them: moved to keep their Hz, or left in their places.
  const zeros = design.zeros.slice();
  const poles = design.poles.slice();
  const handParts: number[] = [];
  for (let i = 0; i < parts.length; i++) {
    if (asDesigned[i]) continue;
    handParts.push(i);
    if (choice === 'keep-places') continue;
    const p = parts[i]!;
    const s = at[i]!;
    const oz = design.zeros.slice(s.zeros, s.zeros + p.zeros);
    const op = design.poles.slice(s.poles, s.poles + p.poles);
    const z = rootsKeepingHz(oz, from, hz, 'zero');
    if (!z.ok) return { ok: false, error: { ...z.error, message: `part ${i + 1}: ${z.error.message}` } };
    const q = rootsKeepingHz(op, from, hz, 'pole');
    if (!q.ok) return { ok: false, error: { ...q.error, message: `part ${i + 1}: ${q.error.message}` } };
    zeros.splice(s.zeros, p.zeros, ...z.value);
    poles.splice(s.poles, p.poles, ...q.value);
  }
  // A designed part edited by hand keeps its description, now at the new rate (it reads "edited by hand").
  const nextParts = parts.map((p) =>
    p.designer ? { ...p, designer: { ...p.designer, fs: hz } as DesignerSpec } : p,
  );
  const { typed: _typed, ...untyped } = design;
  let d: Design = {
    ...untyped,
    sampleRate: hz,
    zeros,
    poles,
    parts: nextParts,
    gainRule:
      design.gainRule.kind === 'frequency' && design.gainRule.hz >= hz / 2
        ? { kind: 'peak' }
        : design.gainRule,
  };
  // 2. The parts as their designers made them: designed again at the new rate (their roots only).
  for (let i = 0; i < parts.length; i++) {
    if (!asDesigned[i]) continue;
    const spec = { ...parts[i]!.designer!, fs: hz } as DesignerSpec;
    const r = runDesigner(spec);
    if (!r.ok)
      return {
        ok: false,
        error: {
          ...r.error,
          message: `the designer of part ${i + 1} cannot make it at ${rateText(hz)}: ${r.error.message}`,
          expected: r.error.expected ?? 'another sample rate',
        },
      };
    d = replacePart(d, i, spec, r.value.zpk);
  }
  // With roots moved by hand's choice, a fixed gain keeps the whole filter's level where it is loudest (the
  // parts designed again bring their own gains; the moved roots' level is matched on the whole).
  if (
    choice === 'keep-hz' &&
    handParts.length > 0 &&
    design.gainRule.kind === 'fixed' &&
    d.gainRule.kind === 'fixed'
  ) {
    const k = d.gainRule.value;
    const value = gainKeepingLevel(
      { zeros: design.zeros, poles: design.poles, gain: design.gainRule.value },
      from,
      { zeros: d.zeros, poles: d.poles, gain: k },
      hz,
    );
    d = { ...d, gainRule: { kind: 'fixed', value } };
  }
  // 3. The mask the parts implied follows them; any other is clipped.
  let mask: RequirementMask | null = null;
  let maskWords = '';
  if (design.mask) {
    const implied = maskOfParts(design);
    const rebuilt = implied && sameMask(implied, design.mask) ? maskOfParts(d) : null;
    if (rebuilt) {
      mask = rebuilt;
      maskWords = ' The requirement mask the parts imply was rebuilt for the new rate.';
    } else ({ mask, words: maskWords } = clippedMask(design.mask, hz));
  }
  const { mask: _old, ...rest } = d;
  const rerun = asDesigned.filter(Boolean).length;
  const words: string[] = [];
  if (rerun > 0)
    words.push(
      `${rerun === parts.length ? 'Every part was' : `${rerun} of ${parts.length} parts were`} designed again at ${rateText(hz)} from the same specification in Hz.`,
    );
  if (handParts.length > 0) {
    const which = handParts
      .map((i) => `part ${i + 1} (${parts[i]!.designer ? 'edited by hand' : 'placed by hand'})`)
      .join(', ');
    words.push(
      choice === 'keep-places'
        ? `The roots of ${which} kept their places in the plane, so their frequencies were scaled by ${(hz / from).toPrecision(3)}.`
        : `The roots of ${which} moved in the plane so that their frequencies in Hz stay.`,
    );
  }
  return {
    ok: true,
    value: {
      design: mask ? { ...rest, mask } : rest,
      said: `${words.join(' ')}${gainRuleWords(design, d)}${maskWords}`,
    },
  };
}
