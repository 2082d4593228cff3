/**
 * The parameters of the classical IIR designs (Butterworth, Chebyshev I and II, elliptic) in four band
 * shapes: of a given order at given edges, or of the least order meeting a requirement.
 */
import type { DesignValues, SpecOf } from '../parameters.ts';
import { MAX_DESIGN_ORDER, MAX_FIR_ORDER } from '../validate.ts';

/**
 * The four classical families, with their names in notes, and "any family": the one of least order for a
 * requirement (runIir.ts, familyChoice.ts).
 */
export const FAMILY_OPTIONS = [
  { value: 'butterworth', label: 'Butterworth', words: 'Butterworth' },
  { value: 'chebyshev1', label: 'Chebyshev I', words: 'Chebyshev I' },
  { value: 'chebyshev2', label: 'Chebyshev II', words: 'Chebyshev II' },
  { value: 'elliptic', label: 'Elliptic', words: 'elliptic' },
  { value: 'any', label: 'Any family (least order)', words: 'any family' },
  { value: 'kaiser', label: 'FIR, Kaiser window', words: 'Kaiser-window FIR' },
  { value: 'hann', label: 'FIR, Hann window', words: 'Hann-window FIR' },
  { value: 'hamming', label: 'FIR, Hamming window', words: 'Hamming-window FIR' },
  { value: 'blackman', label: 'FIR, Blackman window', words: 'Blackman-window FIR' },
  { value: 'leastsquares', label: 'FIR, least squares', words: 'least-squares FIR' },
  { value: 'equiripple', label: 'FIR, equiripple', words: 'equiripple FIR' },
] as const;

/** FIR methods among the families (runFir designs them). */
const FIR_VALUES: readonly string[] = ['kaiser', 'hann', 'hamming', 'blackman', 'leastsquares', 'equiripple'];
const isFir = (v: DesignValues) => FIR_VALUES.includes(String(v.family));
/** Least squares and equiripple design from the pass and stop bands, not from cut-offs. */
const fromBands = (v: DesignValues) => v.family === 'leastsquares' || v.family === 'equiripple';

/** The four band shapes. */
export const BAND_SHAPE_OPTIONS = [
  { value: 'lowpass', label: 'Low-pass' },
  { value: 'highpass', label: 'High-pass' },
  { value: 'bandpass', label: 'Band-pass' },
  { value: 'bandstop', label: 'Band-stop' },
] as const;

const isBand = (v: DesignValues) => v.response === 'bandpass' || v.response === 'bandstop';
const edgeCount = (v: DesignValues) => (isBand(v) ? 2 : 1);
/** A requirement is given: asked for by order 'auto', or begun with either band. */
const hasRequirement = (v: DesignValues) =>
  v.order === 'auto' || v.passbandHz !== undefined || v.stopbandHz !== undefined || fromBands(v);
const needsRipple = (v: DesignValues) => v.family === 'chebyshev1' || v.family === 'elliptic';
const needsAttenuation = (v: DesignValues) =>
  v.family === 'chebyshev2' || v.family === 'elliptic' || v.family === 'kaiser';
const pairWords = (v: DesignValues) =>
  isBand(v) ? 'low,high in Hz' : v.response === undefined ? 'in Hz (low,high for band shapes)' : 'in Hz';

const EDGE_MEANING: Record<string, string> = {
  butterworth: 'the −3 dB point',
  chebyshev1: 'where the ripple band ends',
  chebyshev2: 'where the stop band starts',
  elliptic: 'where the ripple band ends',
  any: 'chosen with the family',
  kaiser: 'half amplitude (−6 dB)',
  hann: 'half amplitude (−6 dB)',
  hamming: 'half amplitude (−6 dB)',
  blackman: 'half amplitude (−6 dB)',
};

const PASS_LABEL: Record<string, string> = {
  lowpass: 'Pass band up to',
  highpass: 'Pass band from',
  bandpass: 'Pass band',
  bandstop: 'Pass band below / above',
};
const STOP_LABEL: Record<string, string> = {
  lowpass: 'Stop band from',
  highpass: 'Stop band up to',
  bandpass: 'Stop band below / above',
  bandstop: 'Stop band',
};

/** A list of band edges in Hz: one for low-/high-pass, two increasing ones for band shapes. */
const EDGE_LIST = {
  unit: 'Hz',
  type: 'list',
  item: 'band',
  count: { exactly: edgeCount, max: 2 },
  increasing: true,
  noun: 'edge',
} as const;

/** Requirement edges (a band's edge or edges), shared by the pass and stop bands. */
function bandEdges<const K extends 'passbandHz' | 'stopbandHz'>(key: K) {
  const pass = key === 'passbandHz';
  return {
    key,
    name: pass ? 'pass-band edges' : 'stop-band edges',
    flag: pass ? 'passband' : 'stopband',
    what: (v: DesignValues) =>
      `${pass ? 'pass-band' : 'stop-band'} edge ${pairWords(v)}, for order auto or margins at a given order`,
    label: (v: DesignValues) => (pass ? PASS_LABEL : STOP_LABEL)[String(v.response)] ?? 'Band',
    short: pass ? 'pass band edge' : 'stop band edge',
    pairLabel: pass ? 'Pass band edge' : 'Stop band edge',
    ...EDGE_LIST,
    section: 'requirement',
    presence: 'optional',
    requiredWhen: hasRequirement,
  } as const;
}

export const IIR_PARAMETERS = [
  {
    key: 'family',
    flag: 'family',
    label: 'Family',
    what: 'the filter family',
    type: 'choice',
    options: FAMILY_OPTIONS,
    control: 'select',
    listed: false,
    presence: 'required',
  },
  {
    key: 'response',
    flag: 'response',
    label: 'Band shape',
    what: 'the band shape',
    type: 'choice',
    options: BAND_SHAPE_OPTIONS,
    presence: 'required',
  },
  {
    key: 'order',
    flag: 'order',
    label: 'Order',
    short: 'order',
    what: `a whole number from 1, or auto (IIR up to ${MAX_DESIGN_ORDER}, FIR up to ${MAX_FIR_ORDER}: taps − 1)`,
    hint: (v: DesignValues) => (isFir(v) ? 'taps − 1' : ''),
    type: 'order',
    max: MAX_FIR_ORDER,
    maxFor: (v: DesignValues) => (isFir(v) ? MAX_FIR_ORDER : MAX_DESIGN_ORDER),
    autoLabel: 'Least order that meets the requirement',
    presence: 'required',
  },
  {
    key: 'edgesHz',
    name: 'edges',
    flag: 'edge',
    what: (v: DesignValues) => `design edge ${pairWords(v)}`,
    label: (v: DesignValues) => (isBand(v) ? 'Edges' : 'Edge'),
    short: 'edges',
    hint: (v: DesignValues) => EDGE_MEANING[String(v.family)] ?? '',
    pairLabel: 'Edge',
    ...EDGE_LIST,
    presence: 'optional',
    requiredWhen: (v: DesignValues) => v.order !== 'auto' && !fromBands(v),
    shownWhen: (v: DesignValues) => v.order !== 'auto' && !fromBands(v),
  },
  bandEdges('passbandHz'),
  bandEdges('stopbandHz'),
  {
    key: 'rippleDb',
    name: 'pass-band ripple',
    flag: 'ripple',
    label: 'Pass-band loss at most',
    short: 'ripple',
    what: 'pass-band ripple in dB, for Chebyshev I, elliptic and a requirement',
    unit: 'dB',
    type: 'number',
    range: 'positive',
    section: 'requirement',
    presence: 'optional',
    requiredWhen: (v: DesignValues) => needsRipple(v) || hasRequirement(v),
  },
  {
    key: 'attenuationDb',
    name: 'stop-band attenuation',
    flag: 'attenuation',
    label: 'Stop band down by at least',
    short: 'attenuation',
    what: 'stop-band attenuation in dB, for Chebyshev II, elliptic, the Kaiser window and a requirement',
    unit: 'dB',
    type: 'number',
    range: 'positive',
    above: { key: 'rippleDb', when: (v: DesignValues) => v.family === 'elliptic' || hasRequirement(v) },
    section: 'requirement',
    presence: 'optional',
    requiredWhen: (v: DesignValues) => needsAttenuation(v) || hasRequirement(v),
  },
] as const;

/** A classical design's description. */
export type IirSpec = SpecOf<'iir', typeof IIR_PARAMETERS>;
