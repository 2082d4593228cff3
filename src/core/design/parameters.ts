/**
 * How a designer is described in the registry (registry.ts): its parameters with their units, ranges and
 * when each is required, the ways a user picks it (variants), and its engine function. Everything else —
 * the designer description's type, its checks, the command line's flags and help, the Design form, the file
 * schema and the link dictionary's checks — is derived from these descriptions.
 */
import type { DesignResult } from './result.ts';

/** A designer description being read or checked: any of its parameters by key, with fs. */
export type DesignValues = { readonly [key: string]: unknown };

/** Units of designer parameters (a frequency in Hz at the design's sample rate, a level in dB, a width in octaves). */
export type ParameterUnit = 'Hz' | 'dB' | 'octaves';

/** A text that may depend on the other parameters (a label that names the band shape, a hint by family). */
export type ValueText = string | ((values: DesignValues) => string);

interface ParameterBase<K extends string> {
  /** The key in the designer description (and in files and links). */
  readonly key: K;
  /** The name in messages, e.g. "pass-band ripple"; the key when absent. */
  readonly name?: string;
  /** The command-line flag, without the dashes. */
  readonly flag: string;
  /** What it is, in the command line's words (e.g. "centre in Hz"). */
  readonly what: ValueText;
  /** The form's label. */
  readonly label: ValueText;
  /** The name in the "Designed by" list; the label when absent. */
  readonly short?: string;
  /** false: left out of the "Designed by" list (the variant's title names it). */
  readonly listed?: boolean;
  readonly hint?: ValueText;
  readonly unit?: ParameterUnit;
  /** Parameters of a requirement are grouped apart in the form. */
  readonly section?: 'requirement';
  /** 'required': always there. 'optional': there when requiredWhen says so, or when the user gives it. */
  readonly presence: 'required' | 'optional';
  readonly requiredWhen?: (values: DesignValues) => boolean;
  /** Whether the form shows it for these values (default: always). */
  readonly shownWhen?: (values: DesignValues) => boolean;
}

/** One number. */
export interface NumberParameter<K extends string = string> extends ParameterBase<K> {
  readonly type: 'number';
  /**
   * 'band': a frequency strictly inside (0, fs/2) Hz; 'positive': above 0; 'finite': any number; 'whole':
   * a whole number from 1 up to `max` (a count of taps, of sections).
   */
  readonly range: 'band' | 'positive' | 'finite' | 'whole';
  readonly max?: number;
  /** Above another parameter's value too, when `when` holds (an attenuation above the ripple). */
  readonly above?: { readonly key: string; readonly when: (values: DesignValues) => boolean };
}

/** A filter order: a whole number from 1 to max, or 'auto' for the least order meeting a requirement. */
export interface OrderParameter<K extends string = string> extends ParameterBase<K> {
  readonly type: 'order';
  /** The largest order of any description; `maxFor` may lower it for some values (an IIR family's). */
  readonly max: number;
  readonly maxFor?: (values: DesignValues) => number;
  /** The form's words for 'auto'. */
  readonly autoLabel: string;
}

/** Several numbers: band frequencies (edges) or whole numbers from 1 (harmonic numbers). */
export interface ListParameter<K extends string = string> extends ParameterBase<K> {
  readonly type: 'list';
  readonly item: 'band' | 'whole';
  /** At most `max` numbers; exactly `exactly(values)` when given (one or two edges). */
  readonly count: { readonly exactly?: (values: DesignValues) => number; readonly max: number };
  readonly increasing?: boolean;
  /** What one item is called in messages ("edge" → "needs two edges"). */
  readonly noun?: string;
  /** Accessible names of a pair's two inputs start with this (e.g. "Pass band edge" low/high). */
  readonly pairLabel?: string;
}

/** One of a few named values. */
export interface ChoiceParameter<
  K extends string = string,
  V extends string = string,
> extends ParameterBase<K> {
  readonly type: 'choice';
  readonly options: readonly { readonly value: V; readonly label: string; readonly words?: string }[];
  /** The value when none is given on the command line. */
  readonly fallback?: V;
  /** How the form offers it. */
  readonly control?: 'select' | 'segmented';
}

export type Parameter = NumberParameter | OrderParameter | ListParameter | ChoiceParameter;

/** The value a parameter holds in a designer description. */
export type ValueOf<P> = P extends { readonly type: 'number' }
  ? number
  : P extends { readonly type: 'order' }
    ? number | 'auto'
    : P extends { readonly type: 'list' }
      ? number[]
      : P extends { readonly type: 'choice'; readonly options: readonly { readonly value: infer V }[] }
        ? V
        : never;

type Flatten<T> = { [K in keyof T]: T[K] };

/** The designer description of kind K with parameters Ps: required keys always there, optional ones may be. */
export type SpecOf<K extends string, Ps extends readonly Parameter[]> = Flatten<
  { kind: K; fs: number } & {
    [P in Ps[number] as P extends { readonly presence: 'required' } ? P['key'] : never]: ValueOf<P>;
  } & {
    [P in Ps[number] as P extends { readonly presence: 'optional' } ? P['key'] : never]?: ValueOf<P>;
  }
>;

/** Two parameters of which a description gives exactly one (a width as a bandwidth or as Q). */
export interface Alternative {
  readonly keys: readonly [string, string];
  /** The form's caption of the choice, e.g. "Width as". */
  readonly label: string;
}

/** One way a user picks a designer: a name on the command line and in the form, and values it fixes. */
export interface DesignerVariant {
  /** The form's id of the choice (unique over the registry). */
  readonly id: string;
  /** The command line's kind. */
  readonly cli: string;
  /** The form's label, e.g. "Low-pass". */
  readonly label: string;
  /** The form's group of kinds. */
  readonly group: string;
  /** Parameters this variant fixes (a band shape). */
  readonly fixed?: DesignValues;
  /** Its name in the "Designed by" list when the label alone does not say it (e.g. with the family). */
  readonly title?: (values: DesignValues) => string;
  /** Alternatives the form starts on (a resonator's width as Q); the first of each pair otherwise. */
  readonly prefer?: readonly string[];
  /** Values for an example command line, in the order printed, given what the user already chose. */
  readonly example: (given: DesignValues) => DesignValues;
  /** Starting values of the form at sample rate fs (Hz), from the invented scenarios. */
  readonly start: (fs: number) => DesignValues;
}

/** A designer in the registry: its kind, parameters, alternatives, variants and engine function. */
export interface DesignerEntry<
  K extends string = string,
  Ps extends readonly Parameter[] = readonly Parameter[],
> {
  readonly kind: K;
  readonly parameters: Ps;
  readonly alternatives?: readonly Alternative[];
  readonly variants: readonly DesignerVariant[];
  /** Designs from a description whose parameters have passed their checks; throws DesignInputError otherwise. */
  readonly design: (spec: SpecOf<K, Ps>) => DesignResult;
}

/** Declares a registry entry, keeping its parameters' literal types so that its description type follows. */
export function defineDesigner<const K extends string, const Ps extends readonly Parameter[]>(
  entry: DesignerEntry<K, Ps>,
): DesignerEntry<K, Ps> {
  return entry;
}

/** The description type of a registry entry. */
export type SpecOfEntry<E> = E extends DesignerEntry<infer K, infer Ps> ? SpecOf<K, Ps> : never;

/** The largest order an order parameter accepts for these values. */
export function orderMax(p: Pick<OrderParameter, 'max' | 'maxFor'>, values: DesignValues): number {
  return p.maxFor ? Math.min(p.max, p.maxFor(values)) : p.max;
}

/** A text that may depend on the other parameters, for these values. */
export function textFor(text: ValueText | undefined, values: DesignValues): string | undefined {
  return typeof text === 'function' ? text(values) : text;
}
