/** Runs a classical IIR designer description: checks it, estimates the order if asked, designs, judges. */
import type { BandShape } from './iir.ts';
import { designIir } from './iir.ts';
import { requirementMargin } from './margin.ts';
import { estimateOrder } from './orderEstimate.ts';
import type { Requirement } from './requirement.ts';
import type { DesignResult, IirSpec } from './spec.ts';
import { DesignInputError, MAX_DESIGN_ORDER, designOrder, edges, positive, sampleRate } from './validate.ts';
import { shortNumber } from '../shortNumber.ts';

const FAMILIES = ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'] as const;
const RESPONSES = ['lowpass', 'highpass', 'bandpass', 'bandstop'] as const;
const FAMILY_NAMES = {
  butterworth: 'Butterworth',
  chebyshev1: 'Chebyshev I',
  chebyshev2: 'Chebyshev II',
  elliptic: 'elliptic',
};
const RESPONSE_NAMES = {
  lowpass: 'low-pass',
  highpass: 'high-pass',
  bandpass: 'band-pass',
  bandstop: 'band-stop',
};

const edgeCount = (r: BandShape) => (r === 'lowpass' || r === 'highpass' ? 1 : 2);

/** The pass-band/stop-band edges must nest the right way round for the band shape. */
function checkNesting(r: BandShape, p: number[], s: number[]): void {
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
      `pass-band ${p.join(',')} Hz and stop-band ${s.join(',')} Hz do not fit a ${RESPONSE_NAMES[r]}`,
      expected,
    );
}

function requirementOf(spec: IirSpec, fs: number, needed: boolean): Requirement | undefined {
  const complete =
    spec.passbandHz && spec.stopbandHz && spec.rippleDb !== undefined && spec.attenuationDb !== undefined;
  if (!needed && !complete) return undefined;
  const n = edgeCount(spec.response);
  const passbandHz = edges('pass-band edges', spec.passbandHz, n, fs);
  const stopbandHz = edges('stop-band edges', spec.stopbandHz, n, fs);
  checkNesting(spec.response, passbandHz, stopbandHz);
  const rippleDb = positive('pass-band ripple', spec.rippleDb, 'dB');
  const attenuationDb = positive('stop-band attenuation', spec.attenuationDb, 'dB', rippleDb);
  return { response: spec.response, passbandHz, stopbandHz, rippleDb, attenuationDb, fs };
}

/** Designs a classical filter from its description (throws DesignInputError on a bad parameter). */
export function runIir(spec: IirSpec): DesignResult {
  const fs = sampleRate(spec.fs);
  if (!FAMILIES.includes(spec.family))
    throw new DesignInputError(`family '${String(spec.family)}' is not known`, FAMILIES.join(', '));
  if (!RESPONSES.includes(spec.response))
    throw new DesignInputError(`response '${String(spec.response)}' is not known`, RESPONSES.join(', '));
  const auto = spec.order === 'auto';
  const req = requirementOf(spec, fs, auto);
  const needRipple = spec.family === 'chebyshev1' || spec.family === 'elliptic';
  const needAtten = spec.family === 'chebyshev2' || spec.family === 'elliptic';
  const rippleDb = needRipple ? positive('pass-band ripple', spec.rippleDb, 'dB') : spec.rippleDb;
  const attenuationDb = needAtten
    ? positive('stop-band attenuation', spec.attenuationDb, 'dB', spec.family === 'elliptic' ? rippleDb : 0)
    : spec.attenuationDb;
  const estimate = req && auto ? estimateOrder(spec.family, req) : undefined;
  if (estimate && estimate.order > MAX_DESIGN_ORDER)
    throw new DesignInputError(
      `the requirement needs order ${estimate.order}, above the limit of ${MAX_DESIGN_ORDER}`,
      'a wider transition band, more ripple or less attenuation',
    );
  const order = estimate ? estimate.order : designOrder(spec.order as number);
  const edgesHz = estimate
    ? estimate.naturalEdgesHz
    : edges('edges', spec.edgesHz, edgeCount(spec.response), fs);
  const zpk = designIir({
    family: spec.family,
    response: spec.response,
    order,
    edgesHz,
    fs,
    ...(rippleDb !== undefined && { rippleDb }),
    ...(attenuationDb !== undefined && { attenuationDb }),
  });
  const margin = req ? requirementMargin(zpk, req) : undefined;
  const fmt = (v: number) => shortNumber(v, 6);
  let note = `order ${order} ${FAMILY_NAMES[spec.family]} ${RESPONSE_NAMES[spec.response]}, edges ${edgesHz.map(fmt).join(', ')} Hz`;
  if (needRipple) note += `, ${fmt(rippleDb!)} dB ripple`;
  if (needAtten) note += `, ${fmt(attenuationDb!)} dB stop band`;
  note += `, fs ${fmt(fs)} Hz`;
  if (estimate) note += ' (least order meeting the requirement)';
  return { zpk, note, ...(estimate && { estimate }), ...(margin && { margin }) };
}
