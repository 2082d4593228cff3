/**
 * What the page's first view needs of the designer registry (registry.ts): each kind's parameters as the
 * checks see them (key, type, range, presence, bounds, the choices' values) and its alternatives. The
 * file readers and the design's bounds check run on these; the registry's texts, variants and design
 * functions load with the design algorithms (engine.ts) and the Design page. The registry stays the
 * source: test/core/design/shapes.test.ts fails when a shape here differs from its entry.
 */
import { isFirFamily } from './fir/families.ts';
import type { DesignValues, ListParameter, NumberParameter, OrderParameter } from './parameters.ts';
import { MAX_DESIGN_ORDER, MAX_FIR_ORDER } from './validate.ts';
import { MAX_HARMONICS } from '../model/limits.ts';

type Presence = 'required' | 'optional';

/** A parameter as the checks see it. */
export type ParameterShape = { readonly key: string; readonly presence: Presence } & (
  | { readonly type: 'number'; readonly range: NumberParameter['range']; readonly max?: number }
  | Pick<OrderParameter, 'type' | 'max' | 'maxFor'>
  | { readonly type: 'list'; readonly item: ListParameter['item']; readonly count: { readonly max: number } }
  | { readonly type: 'choice'; readonly options: readonly { readonly value: string }[] }
);

/** A designer kind as the checks see it. */
export interface DesignerShape {
  readonly kind: string;
  readonly parameters: readonly ParameterShape[];
  readonly alternatives?: readonly { readonly keys: readonly [string, string] }[];
}

const num = (key: string, range: NumberParameter['range'], presence: Presence = 'required', max?: number) =>
  ({ key, type: 'number', presence, range, ...(max !== undefined && { max }) }) as const;
const list = (key: string, item: ListParameter['item'], max: number, presence: Presence = 'required') =>
  ({ key, type: 'list', presence, item, count: { max } }) as const;
const choice = (key: string, values: readonly string[]) =>
  ({ key, type: 'choice', presence: 'required', options: values.map((value) => ({ value })) }) as const;

const F0 = num('f0', 'band');
const GAIN = num('gainDb', 'finite');
const Q = num('q', 'positive', 'optional');
const WIDTH = [num('bandwidthHz', 'positive', 'optional'), Q];
const BY_WIDTH = [{ keys: ['bandwidthHz', 'q'] }] as const;
const shelf = (kind: string): DesignerShape => ({
  kind,
  parameters: [F0, GAIN, Q, num('slope', 'positive', 'optional')],
  alternatives: [{ keys: ['q', 'slope'] }],
});

export const DESIGNER_SHAPES: readonly DesignerShape[] = [
  { kind: 'notch', parameters: [F0, ...WIDTH], alternatives: BY_WIDTH },
  {
    kind: 'harmonicNotch',
    parameters: [F0, list('harmonics', 'whole', MAX_HARMONICS), ...WIDTH],
    alternatives: BY_WIDTH,
  },
  { kind: 'comb', parameters: [F0, choice('type', ['notch', 'peak']), ...WIDTH], alternatives: BY_WIDTH },
  { kind: 'peak', parameters: [F0, ...WIDTH], alternatives: BY_WIDTH },
  { kind: 'dcBlocker', parameters: [num('cutoffHz', 'band')] },
  {
    kind: 'peakingEq',
    parameters: [F0, GAIN, Q, num('bandwidthOctaves', 'positive', 'optional')],
    alternatives: [{ keys: ['q', 'bandwidthOctaves'] }],
  },
  shelf('lowShelf'),
  shelf('highShelf'),
  {
    kind: 'iir',
    parameters: [
      choice('family', [
        'butterworth',
        'chebyshev1',
        'chebyshev2',
        'elliptic',
        'any',
        'kaiser',
        'hann',
        'hamming',
        'blackman',
        'leastsquares',
        'equiripple',
      ]),
      choice('response', ['lowpass', 'highpass', 'bandpass', 'bandstop']),
      {
        key: 'order',
        type: 'order',
        presence: 'required',
        max: MAX_FIR_ORDER,
        maxFor: (v: DesignValues) => (isFirFamily(v.family) ? MAX_FIR_ORDER : MAX_DESIGN_ORDER),
      },
      list('edgesHz', 'band', 2, 'optional'),
      list('passbandHz', 'band', 2, 'optional'),
      list('stopbandHz', 'band', 2, 'optional'),
      num('rippleDb', 'positive', 'optional'),
      num('attenuationDb', 'positive', 'optional'),
    ],
  },
  {
    kind: 'differentiator',
    parameters: [num('order', 'whole', 'required', MAX_FIR_ORDER), num('upToHz', 'band')],
  },
  {
    kind: 'hilbert',
    parameters: [num('order', 'whole', 'required', MAX_FIR_ORDER), list('bandHz', 'band', 2)],
  },
];

/** The shape of a kind, or undefined for a kind the registry does not hold. */
export function designerShape(kind: string): DesignerShape | undefined {
  return DESIGNER_SHAPES.find((s) => s.kind === kind);
}
