/**
 * FIR designs on the command line: `export` and `simulate --fixed` take a design whose poles all sit at the
 * origin to the FIR implementations (core/fixed/fir.ts) instead of second-order sections. `--structure
 * fir-symmetric` or `fir-direct` picks the form; without --structure an FIR design takes the symmetric form
 * when its taps are symmetric or antisymmetric, the direct form otherwise, and `--structure df1|df2t` still
 * runs it as sections. The word, fraction, data-word, accumulator, rounding and overflow flags apply as they
 * do to sections; the sections-only flags are refused.
 */
import {
  buildFirImplementation,
  tapSymmetry,
  type FirForm,
  type FirImplementation,
  type ImplementationSettings,
} from '../core/fixed/index.ts';
import { zpkToTf } from '../core/system/transferFunction.ts';
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

/**
 * The FIR's taps, when every pole of the design sits at the origin (typed coefficients as given; else the
 * roots multiplied out, delayed by the poles beyond the zeros); null for any other design.
 */
export function firTaps(d: CliDesign): number[] | null {
  if (d.typed) {
    const { b, a } = d.typed;
    if (a.length === 0 || a[0] === 0 || a.slice(1).some((v) => v !== 0)) return null;
    return b.map((v) => v / a[0]!);
  }
  const { zpk } = d;
  if (zpk.poles.length === 0 || zpk.poles.some((p) => p.re !== 0 || p.im !== 0)) return null;
  const count = (rs: typeof zpk.zeros) => rs.reduce((n, r) => n + (r.im > 0 ? 2 : 1) * r.multiplicity, 0);
  const extra = count(zpk.poles) - count(zpk.zeros);
  if (extra < 0) return null; // more zeros than poles: not causal
  return [...new Array<number>(extra).fill(0), ...zpkToTf(zpk).b];
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
  const form: FirForm = asked ?? (tapSymmetry(taps) === 'none' ? 'direct' : 'symmetric');
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
