/**
 * The fixed-point settings flags, one definition shared by every command that takes a design to fixed point
 * (`export`, `simulate --fixed`): their names, their reading, and their defaults — the design file's own
 * implementation settings when it carries them, DEFAULT_IMPLEMENTATION otherwise.
 */
import {
  DEFAULT_IMPLEMENTATION,
  MAX_ACCUMULATOR_BITS,
  MAX_WORD_LENGTH,
  MIN_WORD_LENGTH,
  type ImplementationSettings,
} from '../core/fixed/index.ts';
import { UsageError, intFlag, type ParsedArgs } from './args.ts';
import type { CliDesign } from './designInput.ts';

/** The settings flags (each takes a value). */
export const IMPLEMENTATION_FLAGS = [
  'structure',
  'word',
  'fraction',
  'data-word',
  'accumulator',
  'rounding',
  'overflow',
  'scaling',
  'ordering',
  'gain',
  'pairing',
  'feedback',
] as const;

/** Their usage text, for the help. */
export const IMPLEMENTATION_USAGE =
  '[--structure df1|df2t|fir-direct|fir-symmetric] [--word 8..32] [--fraction auto|N] [--data-word 8..32] [--accumulator N]\n' +
  '                      [--rounding nearest|truncate] [--overflow saturate|wrap] [--scaling linf|l2|l1|none]\n' +
  '                      [--ordering ascending|descending] [--gain first|spread] [--pairing nearest|keep-odd]\n' +
  '                      [--feedback denominator|negated]';

/** A flag whose value must be one of the listed words, or the default when absent. */
export function choiceFlag<T extends string>(
  args: ParsedArgs,
  name: string,
  choices: readonly T[],
  fallback: T,
): T {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  if (!(choices as readonly string[]).includes(raw))
    throw new UsageError(`--${name} must be one of ${choices.join(', ')}; got "${raw}".`);
  return raw as T;
}

/** The settings a design brings: its file's implementation settings, or DEFAULT_IMPLEMENTATION. */
export function baseSettings(design: CliDesign | null): ImplementationSettings {
  return design?.shared?.design.implementation ?? DEFAULT_IMPLEMENTATION;
}

/**
 * The implementation settings the flags ask for, each absent flag taken from `base`. A longer word widens
 * the default accumulator to hold the product; a new word length with hand-set fraction bits keeps their
 * integer bits.
 */
export function settingsFromArgs(
  args: ParsedArgs,
  base: ImplementationSettings = DEFAULT_IMPLEMENTATION,
): ImplementationSettings {
  const wordLength = intFlag(args, 'word', base.wordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH);
  const dataWordLength = intFlag(args, 'data-word', base.dataWordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH);
  const rawFraction = args.flags.get('fraction');
  const keptFraction =
    typeof base.fractionBits === 'number'
      ? Math.min(wordLength - 1, Math.max(0, base.fractionBits + wordLength - base.wordLength))
      : 'auto';
  const fractionBits =
    rawFraction === undefined
      ? keptFraction
      : rawFraction === 'auto'
        ? 'auto'
        : intFlag(args, 'fraction', 0, 0, wordLength - 1);
  const product = wordLength + dataWordLength - 1;
  const accumulatorBits = intFlag(
    args,
    'accumulator',
    Math.min(MAX_ACCUMULATOR_BITS, Math.max(base.accumulatorBits, product)),
    product,
    MAX_ACCUMULATOR_BITS,
  );
  return {
    structure: choiceFlag(args, 'structure', ['df1', 'df2t'], base.structure),
    wordLength,
    fractionBits,
    dataWordLength,
    accumulatorBits,
    rounding: choiceFlag(args, 'rounding', ['nearest', 'truncate'], base.rounding),
    overflow: choiceFlag(args, 'overflow', ['saturate', 'wrap'], base.overflow),
    scaling: choiceFlag(args, 'scaling', ['linf', 'l2', 'l1', 'none'], base.scaling),
    ordering: choiceFlag(args, 'ordering', ['ascending', 'descending'], base.ordering),
    gainDistribution: choiceFlag(args, 'gain', ['first', 'spread'], base.gainDistribution),
    pairing: choiceFlag(args, 'pairing', ['nearest', 'keep-odd'], base.pairing),
    feedbackSign: choiceFlag(args, 'feedback', ['denominator', 'negated'], base.feedbackSign),
  };
}
