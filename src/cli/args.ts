/** Command-line argument reading: `--flag value`, `--flag=value`, boolean switches, and positionals. */

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

/** A positive integer flag within [min, max], or the default when absent. */
export function intFlag(args: ParsedArgs, name: string, fallback: number, min: number, max: number): number {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  const v = Number(raw);
  if (!Number.isInteger(v) || v < min || v > max) {
    throw new UsageError(`--${name} must be a whole number from ${min} to ${max}; got "${raw}".`);
  }
  return v;
}

/** A finite number flag, or the default when absent. */
export function numberFlag(args: ParsedArgs, name: string, fallback: number): number {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  const v = Number(raw.trim());
  if (raw.trim() === '' || !Number.isFinite(v))
    throw new UsageError(`--${name} must be a number; got "${raw}".`);
  return v;
}
