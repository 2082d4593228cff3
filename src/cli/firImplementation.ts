/**
 * FIR designs on the command line: `export` and `simulate --fixed` take a design whose poles all sit at the
 * origin to the FIR implementations (core/fixed/fir.ts) instead of second-order sections. `--structure
 * fir-symmetric` or `fir-direct` picks the form; without --structure an FIR design takes the form its file's
 * settings name, else the symmetric form when its taps are symmetric or antisymmetric, the direct form otherwise, and `--structure df1|df2t` still
 * runs it as sections. The word, fraction, data-word, accumulator, rounding and overflow flags apply as they
 * do to sections; the sections-only flags are refused.
 */
import { type ImplementationSettings } from '../core/fixed/index.ts';
import {
  buildFirImplementation,
  firFormFor,
  firTapsOf,
  type FirForm,
  type FirImplementation,
} from '../core/fixed/fir.ts';
import { UsageError, type ParsedArgs } from './args.ts';
import type { CliDesign } from './designInput.ts';
import { baseSettings, settingsFromArgs } from './implementationFlags.ts';

/** The --structure words of the FIR forms. */
export const FIR_STRUCTURES: Record<string, FirForm> = {
  'fir-direct': 'direct',
  'fir-symmetric': 'symmetric',
};

/** Flags that shape sections only. */
const SECTION_ONLY_FLAGS = ['scaling', 'ordering', 'gain', 'pairing', 'feedback'] as const;

/** The FIR's taps (typed coefficients as given, or the roots multiplied out), or null for any other design. */
export function firTaps(d: CliDesign): number[] | null {
  return firTapsOf(d.zpk, d.typed);
}

/**
 * The FIR implementation the flags ask for, or null when the design is to run as sections (not an FIR, or
 * --structure df1|df2t given).
 */
export function firImplementationOf(args: ParsedArgs, d: CliDesign): FirImplementation | null {
  const structure = args.flags.get('structure');
  const asked = structure === undefined ? undefined : FIR_STRUCTURES[structure];
  if (structure !== undefined && !asked) return null; // sections asked for (or a bad word, refused there)
  const taps = firTaps(d);
  if (!taps) {
    if (asked)
      throw new UsageError(
        `--structure ${structure} applies to an FIR design (every pole at the origin); this design has poles elsewhere.`,
      );
    return null;
  }
  const given = SECTION_ONLY_FLAGS.filter((f) => args.flags.has(f));
  if (given.length > 0)
    throw new UsageError(
      `--${given[0]} shapes second-order sections; an FIR runs as taps (add --structure df1 or df2t for sections).`,
    );
  const rest: ParsedArgs = { ...args, flags: new Map(args.flags) };
  rest.flags.delete('structure');
  const s: ImplementationSettings = settingsFromArgs(rest, baseSettings(d));
  const form: FirForm = firFormFor(taps, asked ?? s.firForm);
  const built = buildFirImplementation(taps, d.sampleRate, {
    form,
    wordLength: s.wordLength,
    fractionBits: s.fractionBits,
    dataWordLength: s.dataWordLength,
    accumulatorBits: s.accumulatorBits,
    rounding: s.rounding,
    overflow: s.overflow,
  });
  if (!built.ok)
    throw new UsageError(`${built.error.message}; expected ${built.error.expected ?? 'valid settings'}.`);
  return built.value;
}

/** What a written FIR file says on stderr. */
export function firSummary(impl: FirImplementation): string {
  return `FIR of ${impl.codes.length} taps, ${impl.settings.form} form (${impl.multiplies} multiplies per sample), ${impl.format.wordLength}-bit taps in Q${impl.format.wordLength - 1 - impl.format.fractionBits}.${impl.format.fractionBits}, accumulator ${impl.settings.accumulatorBits} bits (${impl.accumulatorNeeded} needed for any input)`;
}
