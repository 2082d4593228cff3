/**
 * `polewright export`: the design as second-order sections in fixed point, written as C, JSON or CSV. The
 * settings flags are shared with `simulate --fixed` (implementationFlags.ts).
 */
import { writeFileSync } from 'node:fs';
import { buildImplementation, qName } from '../../core/fixed/index.ts';
import { exportC, exportCsv, exportJson } from '../../core/export/index.ts';
import { UsageError, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import { IMPLEMENTATION_FLAGS, baseSettings, choiceFlag, settingsFromArgs } from '../implementationFlags.ts';
import type { CliIo } from '../main.ts';

/** Runs `export`; returns the exit code. */
export function runExport(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, ...IMPLEMENTATION_FLAGS, 'format', 'name', 'out'], []);
  const format = choiceFlag(args, 'format', ['c', 'json', 'csv'], 'c');
  const d = readDesign(args);
  const settings = settingsFromArgs(args, baseSettings(d));
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
