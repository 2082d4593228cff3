/** `polewright export`: the design as second-order sections in fixed point, written as C, JSON or CSV. */
import { writeFileSync } from 'node:fs';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  MAX_ACCUMULATOR_BITS,
  MAX_WORD_LENGTH,
  MIN_WORD_LENGTH,
  qName,
  type ImplementationSettings,
} from '../../core/fixed/index.ts';
import { exportC, exportCsv, exportJson } from '../../core/export/index.ts';
import { UsageError, intFlag, parseArgs, type ParsedArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import type { CliIo } from '../main.ts';

const EXPORT_FLAGS = [
  'format',
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
  'name',
  'out',
] as const;

/** A flag whose value must be one of the listed words, or the default when absent. */
function choiceFlag<T extends string>(args: ParsedArgs, name: string, choices: readonly T[], fallback: T): T {
  const raw = args.flags.get(name);
  if (raw === undefined) return fallback;
  if (!(choices as readonly string[]).includes(raw))
    throw new UsageError(`--${name} must be one of ${choices.join(', ')}; got "${raw}".`);
  return raw as T;
}

/** The implementation settings the flags ask for, defaults from DEFAULT_IMPLEMENTATION. */
export function settingsFromArgs(args: ParsedArgs): ImplementationSettings {
  const d = DEFAULT_IMPLEMENTATION;
  const wordLength = intFlag(args, 'word', d.wordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH);
  const dataWordLength = intFlag(args, 'data-word', d.dataWordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH);
  const rawFraction = args.flags.get('fraction');
  const fractionBits =
    rawFraction === undefined || rawFraction === 'auto'
      ? 'auto'
      : intFlag(args, 'fraction', 0, 0, wordLength - 1);
  const product = wordLength + dataWordLength - 1;
  const accumulatorBits = intFlag(
    args,
    'accumulator',
    Math.min(MAX_ACCUMULATOR_BITS, Math.max(d.accumulatorBits, product)),
    product,
    MAX_ACCUMULATOR_BITS,
  );
  return {
    structure: choiceFlag(args, 'structure', ['df1', 'df2t'], d.structure),
    wordLength,
    fractionBits,
    dataWordLength,
    accumulatorBits,
    rounding: choiceFlag(args, 'rounding', ['nearest', 'truncate'], d.rounding),
    overflow: choiceFlag(args, 'overflow', ['saturate', 'wrap'], d.overflow),
    scaling: choiceFlag(args, 'scaling', ['linf', 'l2', 'l1', 'none'], d.scaling),
    ordering: choiceFlag(args, 'ordering', ['ascending', 'descending'], d.ordering),
    gainDistribution: choiceFlag(args, 'gain', ['first', 'spread'], d.gainDistribution),
    pairing: choiceFlag(args, 'pairing', ['nearest', 'keep-odd'], d.pairing),
    feedbackSign: choiceFlag(args, 'feedback', ['denominator', 'negated'], d.feedbackSign),
  };
}

/** Runs `export`; returns the exit code. */
export function runExport(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, ...EXPORT_FLAGS], []);
  const format = choiceFlag(args, 'format', ['c', 'json', 'csv'], 'c');
  const settings = settingsFromArgs(args);
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const built = buildImplementation(d.zpk, d.sampleRate, settings);
  if (!built.ok)
    throw new UsageError(`${built.error.message}; expected ${built.error.expected ?? 'valid settings'}.`);
  const impl = built.value;
  for (const note of impl.notes) io.stderr(`note: ${note}\n`);
  let text: string;
  if (format === 'c') {
    const name = args.flags.get('name');
    try {
      text = exportC(impl, name === undefined ? {} : { name });
    } catch (e) {
      throw new UsageError(`--name: ${(e as Error).message}.`);
    }
  } else text = format === 'json' ? exportJson(impl) : exportCsv(impl);
  const out = args.flags.get('out');
  if (out === undefined) {
    io.stdout(text);
    return 0;
  }
  try {
    writeFileSync(out, text);
  } catch (e) {
    throw new UsageError(`Cannot write ${out}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
  }
  io.stderr(
    `wrote ${out}: ${format}, ${impl.cascade.sections.length} section(s), ${settings.structure}, ` +
      `${qName(impl.quantized.format)} coefficients, quantized filter ${impl.stability.verdict}\n`,
  );
  return 0;
}
