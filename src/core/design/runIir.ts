/**
 * Runs a classical IIR designer description whose parameters have passed their checks: estimates the order
 * if asked, designs, and judges against the requirement when there is one.
 */
import type { BandShape, IirFamily } from './iir.ts';
import { designIir } from './iir.ts';
import { requirementMargin } from './margin.ts';
import { estimateOrder } from './orderEstimate.ts';
import type { Requirement } from './requirement.ts';
import type { DesignResult } from './result.ts';
import { BAND_SHAPE_OPTIONS, FAMILY_OPTIONS, type IirSpec } from './entries/classicalParameters.ts';
import { DesignInputError, MAX_DESIGN_ORDER } from './validate.ts';
import { separationProblem } from './separation.ts';
import { shortNumber } from '../shortNumber.ts';
import { chooseFamily, FAMILY_TIE_BREAK, type FamilyChoice } from './familyChoice.ts';

/** The four classical families, in the order "any family" tries them. */
const CLASSICAL_FAMILIES: readonly IirFamily[] = ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'];
const familyWordsOf = (f: string) => FAMILY_OPTIONS.find((o) => o.value === f)!.words;

const responseWords = (r: BandShape) => BAND_SHAPE_OPTIONS.find((o) => o.value === r)!.label.toLowerCase();

/** The pass-band/stop-band edges must nest the right way round for the band shape. */
export function checkNesting(r: BandShape, p: number[], s: number[]): void {
  const ok = {
    lowpass: () => p[0]! < s[0]!,
    highpass: () => s[0]! < p[0]!,
    bandpass: () => s[0]! < p[0]! && p[1]! < s[1]!,
    bandstop: () => p[0]! < s[0]! && s[1]! < p[1]!,
  }[r]();
  const expected = {
    lowpass: 'pass-band edge < stop-band edge',
    highpass: 'stop-band edge < pass-band edge',
    bandpass: 'stop low < pass low < pass high < stop high',
    bandstop: 'pass low < stop low < stop high < pass high',
  }[r];
  if (!ok)
    throw new DesignInputError(
      `pass-band ${p.join(',')} Hz and stop-band ${s.join(',')} Hz do not fit a ${responseWords(r)}`,
      expected,
      'stopbandHz',
    );
}

/** The requirement of a description that gives one (its parameters are checked: both bands, ripple, attenuation). */
export function requirementOf(spec: IirSpec): Requirement | undefined {
  if (!spec.passbandHz || !spec.stopbandHz) return undefined;
  checkNesting(spec.response, spec.passbandHz, spec.stopbandHz);
  return {
    response: spec.response,
    passbandHz: spec.passbandHz,
    stopbandHz: spec.stopbandHz,
    rippleDb: spec.rippleDb!,
    attenuationDb: spec.attenuationDb!,
    fs: spec.fs,
  };
}

/**
 * The refusal of an order whose roots double precision cannot keep apart, naming the largest lower order
 * that works with the same edges, ripple and attenuation (each lower order is designed and checked, so the
 * answer does not assume that closeness grows with the order).
 */
function beyondPrecision(
  order: number,
  problem: string,
  at: (order: number) => ReturnType<typeof designIir>,
  estimated: boolean,
): DesignInputError {
  let works = 0;
  for (let n = order - 1; n >= 1 && works === 0; n--) if (!separationProblem(at(n))) works = n;
  const asked = estimated ? `the requirement needs order ${order}, which` : `order ${order}`;
  const advice = estimated
    ? 'a wider transition band, more pass-band ripple or less attenuation'
    : 'a lower order';
  return new DesignInputError(
    `${asked} puts ${problem}`,
    works > 0
      ? `${advice}: order ${works} is the largest that works with these edges${estimated ? ' (it does not meet the requirement)' : ''}`
      : `${advice}; no order works with these edges`,
    'order',
  );
}

/** Designs a classical filter from its checked description (throws DesignInputError on what the checks cannot see). */
export function runIir(spec: IirSpec): DesignResult {
  return spec.family === 'any' ? runAnyFamily(spec) : runFamily(spec, spec.family as IirFamily);
}

/** The families' orders in a note: "Butterworth 9, Chebyshev I 6, …" (a refused family says so). */
function trialWords(choice: FamilyChoice): string {
  return choice.trials
    .map((t) => `${familyWordsOf(t.family)} ${t.order === undefined ? 'not designable' : t.order}`)
    .join(', ');
}

/**
 * "Any family": every family at its least order for the requirement; the least order wins, ties broken by
 * the least group-delay spread across the pass band (familyChoice.ts).
 */
function runAnyFamily(spec: IirSpec): DesignResult {
  if (spec.order !== 'auto')
    throw new DesignInputError(
      'any family picks the family needing the least order, so it needs the order left to the requirement',
      "order auto ('least order that meets the requirement') with pass and stop bands",
      'order',
    );
  const req = requirementOf(spec)!;
  const r = chooseFamily(CLASSICAL_FAMILIES, req, (family) => {
    const d = runFamily(spec, family);
    return { ...d, order: d.estimate!.order };
  });
  if (!r.choice) throw r.errors[0];
  const { choice, picked } = r;
  const tie = choice.tieBroken ? `; tied on order, ${FAMILY_TIE_BREAK} decided` : '';
  const note = `${picked.note}, picked from any family (${trialWords(choice)}${tie})`;
  const { order: _order, ...result } = picked;
  return { ...result, note, family: choice };
}

/** One family's design from the description (its family replaced by `family`). */
function runFamily(spec: IirSpec, family: IirFamily): DesignResult {
  const { fs } = spec;
  const req = requirementOf(spec);
  const estimate = req && spec.order === 'auto' ? estimateOrder(family, req) : undefined;
  if (estimate && estimate.order > MAX_DESIGN_ORDER)
    throw new DesignInputError(
      `the requirement needs order ${estimate.order}, above the limit of ${MAX_DESIGN_ORDER}`,
      'a wider transition band, more ripple or less attenuation',
      'order',
    );
  const order = estimate ? estimate.order : (spec.order as number);
  const edgesHz = estimate ? estimate.naturalEdgesHz : spec.edgesHz!;
  const needRipple = family === 'chebyshev1' || family === 'elliptic';
  const needAtten = family === 'chebyshev2' || family === 'elliptic';
  const at = (n: number) =>
    designIir({
      family,
      response: spec.response,
      order: n,
      edgesHz,
      fs,
      ...(spec.rippleDb !== undefined && { rippleDb: spec.rippleDb }),
      ...(spec.attenuationDb !== undefined && { attenuationDb: spec.attenuationDb }),
    });
  const zpk = at(order);
  const beyond = separationProblem(zpk);
  if (beyond) throw beyondPrecision(order, beyond, at, estimate !== undefined);
  const margin = req ? requirementMargin(zpk, req) : undefined;
  const fmt = (v: number) => shortNumber(v, 6);
  const familyWords = familyWordsOf(family);
  let note = `order ${order} ${familyWords} ${responseWords(spec.response)}, edges ${edgesHz.map(fmt).join(', ')} Hz`;
  if (needRipple) note += `, ${fmt(spec.rippleDb!)} dB ripple`;
  if (needAtten) note += `, ${fmt(spec.attenuationDb!)} dB stop band`;
  note += `, fs ${fmt(fs)} Hz`;
  if (estimate) note += ' (least order meeting the requirement)';
  return { zpk, note, ...(estimate && { estimate }), ...(margin && { margin }) };
}
