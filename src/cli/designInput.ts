/** Resolves the design a command works on: a design file, a design link, or coefficients/equation/H(z) given as flags. */
import { existsSync, readFileSync, statSync } from 'node:fs';
import type { TransferFunction, Zpk } from '../core/types.ts';
import { parseCoefficients, parseDifferenceEquation, parseSystem } from '../core/parse/index.ts';
import { compressRoots } from '../core/system/index.ts';
import { tfToZpk } from '../core/system/fromCoefficients.ts';
import { resolveGain } from '../core/gainRule.ts';
import { MAX_FILE_BYTES, readSharedFileBytes, tooLarge } from '../share/designFile.ts';
import type { SharedDesign } from '../share/document.ts';
import { decodeLink, linkFragment } from '../share/link/index.ts';
import { UsageError, numberFlag, type ParsedArgs } from './args.ts';
import { describeProblem, designProblem } from '../core/model/check.ts';
import type { Design } from '../core/model/design.ts';
import type { Root } from '../core/types.ts';
import { gainKeepingLevel, maskAtRate, rootsKeepingHz } from '../core/model/rate.ts';
import { partsAtRate } from '../core/model/partsRate.ts';
import { runDesigner } from '../core/design/index.ts';
import { maskFromDesigner } from '../core/mask/index.ts';
import { sameMask } from '../core/mask/same.ts';
import { shortNumber } from '../core/shortNumber.ts';

/** Flags every design-taking command accepts. */
export const DESIGN_FLAGS = ['b', 'a', 'eq', 'tf', 'fs'] as const;

export interface CliDesign {
  /** Stored roots (complex roots once, im > 0) and the resolved gain. */
  zpk: Zpk;
  /** Coefficients exactly as given, when the design came as coefficients, an equation or H(z). */
  typed: TransferFunction | null;
  sampleRate: number;
  /** Where the design came from, for messages. */
  source: string;
  /** Things the user should know about how the input was read. */
  notes: string[];
  /** The whole design as the workbench holds it (designer, mask, implementation, view), for `link`. */
  shared?: SharedDesign;
}

/** The bytes of a design file, its size checked before anything is read (a 200 MB file costs nothing). */
function readFileBounded(file: string): Uint8Array {
  const why = (e: unknown) => (e as NodeJS.ErrnoException).code ?? (e as Error).message;
  let size: number;
  try {
    const st = statSync(file);
    if (!st.isFile()) throw new UsageError(`${file} is not a file (a design file, or a link with #pw2.…).`);
    size = st.size;
  } catch (e) {
    if (e instanceof UsageError) throw e;
    throw new UsageError(`Cannot read the design file ${file}: ${why(e)}`);
  }
  if (size > MAX_FILE_BYTES) throw new UsageError(`${file}: ${tooLarge(size)}`);
  try {
    return readFileSync(file);
  } catch (e) {
    throw new UsageError(`Cannot read the design file ${file}: ${why(e)}`);
  }
}

/** The shared design of a design file (its size checked first); usage errors name the file. */
export function readDesignFileArg(file: string): SharedDesign {
  const read = readSharedFileBytes(readFileBounded(file));
  if (!read.ok) throw new UsageError(`${file}: ${read.message}`);
  return read.value;
}

/** Whether a positional argument is a design link (a URL or fragment with #pw…) rather than a file. */
function isLink(arg: string): boolean {
  return linkFragment(arg) !== null && !existsSync(arg);
}

/**
 * The design at another sample rate, kept in hertz as the page keeps it: a design as its designer made it is
 * designed again at the new rate (its own mask rebuilt); other roots move so their frequencies in Hz stay
 * (core/model/rate.ts); a user's mask is clipped to the new fs/2; a composed design goes part by part
 * (core/model/partsRate.ts). The note says which happened.
 */
function atRate(design: Design, fs: number, source: string): { design: Design; note: string } {
  const from = design.sampleRate;
  const rate = (hz: number) => `${shortNumber(hz, 10)} Hz`;
  const clip = (mask: Design['mask']) => {
    if (!mask) return {};
    const m = maskAtRate(mask, fs).mask;
    return m.regions.length ? { mask: m } : {};
  };
  if (design.parts) {
    // A composed design, part by part: its designed parts designed again, other roots keeping their Hz.
    const r = partsAtRate(design, fs, 'keep-hz');
    if (!r.ok)
      throw new UsageError(
        `--fs ${rate(fs)}: ${source}: ${r.error.message}${r.error.expected ? `; expected ${r.error.expected}` : ''}.`,
      );
    return {
      design: r.value.design,
      note: `--fs ${rate(fs)}: ${source} (made at ${rate(from)}): ${r.value.said.trim()}`,
    };
  }
  const spec = design.designer;
  if (spec) {
    const old = runDesigner(spec);
    const zpk = old.ok ? old.value.zpk : null;
    const same = (a: readonly Root[], b: readonly Root[]) =>
      a.length === b.length && a.every((r, i) => r.re === b[i]!.re && r.im === b[i]!.im);
    const asDesigned =
      zpk !== null &&
      spec.fs === from &&
      design.gainRule.kind === 'fixed' &&
      design.gainRule.value === zpk.gain &&
      same(design.zeros, zpk.zeros) &&
      same(design.poles, zpk.poles);
    if (asDesigned) {
      const next = { ...spec, fs };
      const r = runDesigner(next);
      if (!r.ok)
        throw new UsageError(
          `--fs ${rate(fs)}: the designer of ${source} cannot make its design at that rate: ${r.error.message}.`,
        );
      const own = sameMask(design.mask, maskFromDesigner(spec));
      const mask = own ? maskFromDesigner(next) : undefined;
      const { mask: _m, ...rest } = design;
      return {
        design: {
          ...rest,
          sampleRate: fs,
          zeros: r.value.zpk.zeros,
          poles: r.value.zpk.poles,
          gainRule: { kind: 'fixed', value: r.value.zpk.gain },
          designer: next,
          ...(own ? (mask ? { mask } : {}) : clip(design.mask)),
        },
        note: `--fs ${rate(fs)}: ${source} was designed again at ${rate(fs)} from its designer's specification in Hz (it was made at ${rate(from)}), so its response stays where it was in Hz`,
      };
    }
  }
  const zeros = rootsKeepingHz(design.zeros, from, fs, 'zero');
  const poles = zeros.ok ? rootsKeepingHz(design.poles, from, fs, 'pole') : zeros;
  if (!zeros.ok || !poles.ok) {
    const e = !zeros.ok ? zeros.error : !poles.ok ? poles.error : null;
    throw new UsageError(`--fs ${rate(fs)}: ${e!.message}; expected ${e!.expected}.`);
  }
  const { typed: _t, mask: _m, designer: _d, ...rest } = design;
  let gainRule = design.gainRule;
  if (gainRule.kind === 'fixed') {
    const old = { zeros: design.zeros, poles: design.poles, gain: gainRule.value };
    const moved = { zeros: zeros.value, poles: poles.value, gain: gainRule.value };
    gainRule = { kind: 'fixed', value: gainKeepingLevel(old, from, moved, fs) };
  }
  return {
    design: {
      ...rest,
      sampleRate: fs,
      zeros: zeros.value,
      poles: poles.value,
      gainRule,
      ...(spec && { designer: { ...spec, fs } }),
      ...clip(design.mask),
    },
    note: `--fs ${rate(fs)}: the roots of ${source} (made at ${rate(from)}) were moved so their frequencies in Hz stay`,
  };
}

/** The command's design from a file's or a link's shared design; --fs changes the rate, keeping Hz. */
function fromShared(shared: SharedDesign, source: string, fs: number | null): CliDesign {
  const moved = fs === null || fs === shared.design.sampleRate ? null : atRate(shared.design, fs, source);
  const d = moved ? moved.design : shared.design;
  const { gain } = resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate);
  return {
    zpk: { zeros: d.zeros, poles: d.poles, gain },
    typed: d.typed ? { b: d.typed.b, a: d.typed.a } : null,
    sampleRate: d.sampleRate,
    source,
    notes: moved ? [moved.note] : [],
    shared: { design: d, view: shared.view },
  };
}

/** Keeps what the user typed with a design given as flags, so `link` can carry it. */
function withTyped(d: CliDesign, text: string): CliDesign {
  const typed = d.typed ? { typed: { b: d.typed.b, a: d.typed.a, text } } : {};
  const design = {
    sampleRate: d.sampleRate,
    zeros: d.zpk.zeros,
    poles: d.zpk.poles,
    gainRule: { kind: 'fixed' as const, value: d.zpk.gain },
    name: '',
    note: '',
    ...typed,
  };
  return { ...d, shared: { design, view: {} } };
}

function fromTf(tf: TransferFunction, fs: number, source: string, notes: string[] = []): CliDesign {
  const zpk = tfToZpk(tf);
  return {
    zpk: { zeros: compressRoots(zpk.zeros), poles: compressRoots(zpk.poles), gain: zpk.gain },
    typed: tf,
    sampleRate: fs,
    source,
    notes,
  };
}

/** Characters of the input quoted on either side of an error's place. */
const QUOTE_CHARS = 60;

/** Turns a parse failure into a usage error that quotes the input around the place and marks it. */
function parseFailure(
  flag: string,
  text: string,
  error: { message: string; position?: number; expected?: string },
): UsageError {
  let mark = '';
  if (error.position !== undefined) {
    const from = Math.max(0, error.position - QUOTE_CHARS);
    const to = Math.min(text.length, error.position + QUOTE_CHARS);
    const lead = from > 0 ? '…' : '';
    const line = lead + text.slice(from, to).replace(/[\r\n\t]/g, ' ') + (to < text.length ? '…' : '');
    mark = `\n  ${line}\n  ${' '.repeat(lead.length + error.position - from)}^`;
  }
  const accepted = error.expected ? ` (accepted: ${error.expected})` : '';
  return new UsageError(`--${flag}: ${error.message}${accepted}${mark}`);
}

/** The design as read, refused with a usage error when it breaks the bounds every design keeps. */
function withinLimits(d: CliDesign): CliDesign {
  const design = d.shared?.design;
  const problem = design ? designProblem(design) : null;
  if (problem) throw new UsageError(`${d.source}: ${describeProblem(problem)}.`);
  return d;
}

/**
 * Reads the design from the positional file argument or from the flags, and checks it against the bounds
 * every design keeps (core/model/check.ts), as the workbench does: what a command accepts, the page can open.
 */
export function readDesign(args: ParsedArgs): CliDesign {
  return withinLimits(readAnyDesign(args));
}

function readAnyDesign(args: ParsedArgs): CliDesign {
  const fsGiven = args.flags.has('fs');
  const fs = numberFlag(args, 'fs', 1, 'Hz');
  if (!(fs > 0))
    throw new UsageError(`--fs must be a positive sample rate in Hz; got "${args.flags.get('fs')}".`);
  const file = args.positionals[0];
  const given = ['eq', 'tf', 'b'].filter((f) => args.flags.has(f));
  if (file !== undefined && given.length > 0) {
    throw new UsageError(`Give the design either as a file (${file}) or with --${given[0]}, not both.`);
  }
  if (given.length > 1) throw new UsageError(`Give the design one way only; got --${given.join(' and --')}.`);
  if (file !== undefined && isLink(file)) {
    const read = decodeLink(file);
    if (!read.ok) throw new UsageError(`the design link: ${read.message}`);
    const d = fromShared(read.value, 'the design link', fsGiven ? fs : null);
    return { ...d, notes: [...d.notes, ...(read.notes ?? [])] };
  }
  if (file !== undefined) {
    const read = readSharedFileBytes(readFileBounded(file));
    if (!read.ok) throw new UsageError(`${file}: ${read.message}`);
    return fromShared(read.value, file, fsGiven ? fs : null);
  }
  const eq = args.flags.get('eq');
  if (eq !== undefined) {
    const r = parseDifferenceEquation(eq);
    if (!r.ok) throw parseFailure('eq', eq, r.error);
    return withTyped(fromTf(r.value, fs, '--eq'), eq);
  }
  const tf = args.flags.get('tf');
  if (tf !== undefined) {
    const r = parseSystem(tf);
    if (!r.ok) throw parseFailure('tf', tf, r.error);
    if (r.value.form !== 'rational') {
      throw new UsageError(
        `--tf expects H(z) in z or z^-1; this reads as ${r.value.detail} (use --eq or --b/--a).`,
      );
    }
    return withTyped(fromTf(r.value.tf, fs, '--tf', r.value.notes), tf);
  }
  const b = args.flags.get('b');
  if (b !== undefined) {
    const a = args.flags.get('a') ?? '1';
    const text = `b = [${b}]; a = [${a}]`;
    const r = parseCoefficients(text);
    if (!r.ok) throw parseFailure('b/--a', text, r.error);
    return withTyped(fromTf(r.value, fs, '--b/--a'), text);
  }
  if (args.flags.has('a')) throw new UsageError('--a was given without --b (the numerator).');
  throw new UsageError(
    'No design given. Pass a design file or a design link, or --b "1,-2,1" --a "1,-1.6,0.64", or --eq "<difference equation>", or --tf "<H(z)>".',
  );
}
