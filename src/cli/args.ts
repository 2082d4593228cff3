/**
 * Command-line argument reading: `--flag value`, `--flag=value`, boolean switches, and positionals. Numbers
 * in flags are read by the one reader of typed numbers (core/parse/typedNumber.ts): a flag with one number
 * reads it as a page field does (0.5 or 0,5, −2, 1e-3, 1/3, and the flag's unit, e.g. --fs 48kHz); a flag
 * with a list reads commas as separators.
 */
import { readNumber, readNumberList, type TypedUnitName } from '../core/parse/typedNumber.ts';

export class UsageError extends Error {}

export interface ParsedArgs {
  positionals: string[];
  flags: Map<string, string>;
  switches: Set<string>;
}

/**
 * Splits argv by the command's accepted flags (which take a value) and switches (which do not). An unknown
 * `--name` is an error that lists what the command accepts.
 */
export function parseArgs(
  argv: string[],
  valueFlags: readonly string[],
  switchFlags: readonly string[],
): ParsedArgs {
  const positionals: string[] = [];
  const flags = new Map<string, string>();
  const switches = new Set<string>();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (!arg.startsWith('--') || arg === '--') {
      positionals.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = eq > 0 ? arg.slice(2, eq) : arg.slice(2);
    if (switchFlags.includes(name)) {
      if (eq > 0) throw new UsageError(`--${name} takes no value.`);
      switches.add(name);
    } else if (valueFlags.includes(name)) {
      const value = eq > 0 ? arg.slice(eq + 1) : argv[++i];
      if (value === undefined) throw new UsageError(`--${name} needs a value.`);
      if (flags.has(name)) throw new UsageError(`--${name} was given twice.`);
      flags.set(name, value);
    } else {
      const accepted = [...valueFlags, ...switchFlags].map((f) => `--${f}`).join(', ');
      throw new UsageError(`Unknown option --${name}. This command accepts: ${accepted}.`);
    }
  }
  return { positionals, flags, switches };
}

/** One number typed on the command line for --name (`what` says what it is), or a usage error that quotes it. */
export function readFlagNumber(name: string, raw: string, what?: string, unit?: TypedUnitName): number {
  const r = readNumber(raw, unit ? { unit } : {});
  if (!r.ok)
    throw new UsageError(
      `--${name} must be a number${what ? ` (${what})` : ''}; got "${raw}": ${r.message}; expected ${r.expected}.`,
    );
  return r.value;
}

/** A list of numbers typed on the command line for --name (commas separate), or a usage error. */
export function readFlagList(name: string, raw: string, what?: string): number[] {
  const r = readNumberList(raw);
  if (!r.ok)
    throw new UsageError(
      `--${name} must be numbers separated by commas${what ? ` (${what})` : ''}; got "${raw}": ${r.message}.`,
    );
  return r.values;
}

/** A positive integer flag within [min, max], or the default when absent. */
export function intFlag(args: ParsedArgs, name: string, fallback: number, min: number, max: number): number {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  const r = readNumber(raw);
  if (!r.ok || !Number.isInteger(r.value) || r.value < min || r.value > max) {
    const why = r.ok ? '' : `: ${r.message}`;
    throw new UsageError(`--${name} must be a whole number from ${min} to ${max}; got "${raw}"${why}.`);
  }
  return r.value;
}

/** A finite number flag (in `unit`, which may also be typed after it), or the default when absent. */
export function numberFlag(args: ParsedArgs, name: string, fallback: number, unit?: TypedUnitName): number {
  const raw = args.flags.get(name);
  return raw === undefined ? fallback : readFlagNumber(name, raw, undefined, unit);
}

/**
 * The frequency of a built-in sine input named "sine:<Hz>" (read by the number policy; a unit may follow),
 * or null when the name is not one; a usage error when the frequency is not from 0 up to `highest` Hz.
 */
export function sineInputHz(name: string, highest: number): number | null {
  const sine = /^sine:(.+)$/.exec(name);
  if (!sine) return null;
  const r = readNumber(sine[1]!, { unit: 'Hz' });
  if (!r.ok || !(r.value >= 0 && r.value <= highest)) {
    const range = Number.isFinite(highest) ? `from 0 to ${highest} Hz (half the sample rate)` : 'in Hz';
    const why = r.ok ? '' : `: ${r.message}`;
    throw new UsageError(`--input sine:<Hz> needs a frequency ${range}; got "${sine[1]}"${why}.`);
  }
  return r.value;
}

/** A rate flag in Hz: a number above 0 and at most `max` Hz (a unit may follow it), or the default when absent. */
export function rateFlag(args: ParsedArgs, name: string, fallback: number, max: number): number {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  const v = readFlagNumber(name, raw, 'a rate in Hz', 'Hz');
  if (!(v > 0 && v <= max))
    throw new UsageError(`--${name} must be a rate above 0 and at most ${max} Hz; got "${raw}".`);
  return v;
}
