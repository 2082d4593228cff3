/**
 * Strings a link writes as a small index instead of spelling them out: field names and enumerated values
 * of the open-ended parts (designer, mask, implementation, view). APPEND ONLY: an entry's index
 * is part of link format 1, so entries are never removed or reordered, only added at the end.
 */
/** The designer's words (kinds, parameter keys, choices) of link format 1; a test holds them to the registry. */
export const DESIGNER_WORDS: readonly string[] = [
  'designer',
  'kind',
  'fs',
  'f0',
  'q',
  'bandwidthHz',
  'cutoffHz',
  'harmonics',
  'type',
  'gainDb',
  'bandwidthOctaves',
  'slope',
  'family',
  'response',
  'order',
  'edgesHz',
  'rippleDb',
  'attenuationDb',
  'passbandHz',
  'stopbandHz',
  'notch',
  'peak',
  'dcBlocker',
  'harmonicNotch',
  'comb',
  'peakingEq',
  'lowShelf',
  'highShelf',
  'iir',
  'butterworth',
  'chebyshev1',
  'chebyshev2',
  'elliptic',
  'lowpass',
  'highpass',
  'bandpass',
  'bandstop',
  'auto',
];

/** The shared view settings' words (keys and values) of link format 1. */
export const VIEW_WORDS: readonly string[] = [
  'view',
  'magnitudeScale',
  'phaseMode',
  'delayUnit',
  'frequencyAxis',
  'responsePoints',
  'timeInput',
  'sineHz',
  'timeSamples',
  'timeStyle',
  'noiseSeed',
  'db',
  'linear',
  'wrapped',
  'unwrapped',
  'samples',
  'ms',
  'log',
  'impulse',
  'step',
  'sine',
  'noise',
  'stems',
  'line',
];

/** The design's other open-ended parts. */
const PART_WORDS: readonly string[] = ['mask', 'implementation'];

/** Words added after the first release, at the end (append only): "any family", and composed designs' parts. */
export const LATER_WORDS: readonly string[] = ['any', 'parts', 'zeros', 'poles', 'gain'];

export const LINK_DICTIONARY: readonly string[] = [
  ...DESIGNER_WORDS,
  ...VIEW_WORDS,
  ...PART_WORDS,
  ...LATER_WORDS,
];

const INDEX = new Map(LINK_DICTIONARY.map((s, i) => [s, i]));

/** The dictionary index of a string, if it has one. */
export function dictionaryIndex(s: string): number | undefined {
  return INDEX.get(s);
}
