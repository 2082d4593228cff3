/**
 * `polewright export`: the design as second-order sections in fixed point, written as C, JSON or CSV. The
 * settings flags are shared with `simulate --fixed` (implementationFlags.ts).
 */
import { buildImplementation, qName } from '../../core/fixed/index.ts';
import {
  exportC,
  exportCsv,
  exportFirC,
  exportFirCsv,
  exportFirJson,
  exportJson,
} from '../../core/export/index.ts';
import { firImplementationOf, firSummary } from '../firImplementation.ts';
import { UsageError, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import { IMPLEMENTATION_FLAGS, baseSettings, choiceFlag, settingsFromArgs } from '../implementationFlags.ts';
import type { CliIo } from '../main.ts';
import { refuseOverwritingInputs, writeFileAtomic } from '../output.ts';
import { linkFragment } from '../../share/link/index.ts';

/** Runs `export`; returns the exit code. */
export function runExport(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, ...IMPLEMENTATION_FLAGS, 'format', 'name', 'out'], []);
  const format = choiceFlag(args, 'format', ['c', 'json', 'csv'], 'c');
  const d = readDesign(args);
  const input = args.positionals[0];
  const out = args.flags.get('out');
  if (out !== undefined)
    refuseOverwritingInputs(out, '--out', [input !== undefined && !linkFragment(input) ? input : undefined]);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const fir = firImplementationOf(args, d);
  if (fir) {
    let text: string;
    if (format === 'c') {
      const name = args.flags.get('name');
      try {
        text = exportFirC(fir, name === undefined ? {} : { name });
      } catch (e) {
        throw new UsageError(`--name: ${(e as Error).message}.`);
      }
    } else text = format === 'json' ? exportFirJson(fir) : exportFirCsv(fir);
    if (out === undefined) io.stdout(text);
    else {
      writeFileAtomic(out, text);
      io.stderr(`wrote ${out}: ${format}, ${firSummary(fir)}\n`);
    }
    if (!fir.accumulatorSafe)
      io.stderr(
        `warning: the ${fir.settings.accumulatorBits}-bit accumulator can overflow; ${fir.accumulatorNeeded} bits hold any input.\n`,
      );
    return 0;
  }
  const settings = settingsFromArgs(args, baseSettings(d));
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
  if (out === undefined) {
    io.stdout(text);
    return 0;
  }
  writeFileAtomic(out, text);
  io.stderr(
    `wrote ${out}: ${format}, ${impl.cascade.sections.length} section(s), ${settings.structure}, ` +
      `${qName(impl.quantized.format)} coefficients, quantized filter ${impl.stability.verdict}\n`,
  );
  return 0;
}
