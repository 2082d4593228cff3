/**
 * `polewright export`: the design as second-order sections in fixed point, written as C, JSON or CSV. The
 * settings flags are shared with `simulate --fixed` (implementationFlags.ts).
 *
 * Warnings (core/export/warnings.ts) are written into the output itself and listed on stderr; while any are
 * present the command exits with EXPORT_WARNINGS_EXIT (the output is still written, so it can be read),
 * unless --allow-warnings says the user knows and takes the file as it is.
 */
import { buildImplementation, qName, type Implementation } from '../../core/fixed/index.ts';
import {
  exportC,
  exportCsv,
  exportFirC,
  exportFirCsv,
  exportFirJson,
  exportJson,
  exportWarnings,
  firExportWarnings,
  warningLine,
  type ExportWarning,
} from '../../core/export/index.ts';
import { evaluateMask, type MaskResult, type RequirementMask } from '../../core/mask/index.ts';
import { shortNumber } from '../../core/shortNumber.ts';
import { firImplementationOf, firSummary } from '../firImplementation.ts';
import { UsageError, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import { IMPLEMENTATION_FLAGS, baseSettings, choiceFlag, settingsFromArgs } from '../implementationFlags.ts';
import type { CliIo } from '../main.ts';
import { refuseOverwritingInputs, writeFileAtomic } from '../output.ts';
import { linkFragment } from '../../share/link/index.ts';

/** Exit code of an export that carries warnings and was not told to accept them. */
export const EXPORT_WARNINGS_EXIT = 3;
/** Warnings listed one by one on stderr; the output itself lists every one. */
const STDERR_WARNINGS = 20;
/** The switch that takes an export with warnings as it is (exit 0). */
export const ACCEPT_WARNINGS = 'allow-warnings';

/** "PASS" or "FAIL by 1.1 dB at 50 Hz" for a mask verdict. */
function verdictWords(v: MaskResult): string {
  if (v.pass) return `PASS (worst margin ${shortNumber(v.worstMarginDb, 3)} dB)`;
  const at = Number.isFinite(v.worstAtHz) ? ` at ${shortNumber(v.worstAtHz, 6)} Hz` : '';
  return Number.isFinite(v.worstMarginDb)
    ? `FAIL by ${shortNumber(-v.worstMarginDb, 3)} dB${at}`
    : `FAIL${at}`;
}

/** The mask verdicts on stderr, saying which filter each judges: the ideal one and the quantized one. */
function maskLines(impl: Implementation, mask: RequirementMask | undefined): string[] {
  if (!mask || mask.regions.length === 0) return [];
  const q = `${impl.settings.wordLength}-bit ${qName(impl.quantized.format)}`;
  return [
    `mask, ideal filter: ${verdictWords(evaluateMask(mask, impl.zpk, impl.sampleRate))}`,
    `mask, quantized filter (${q}): ${verdictWords(evaluateMask(mask, impl.quantizedZpk, impl.sampleRate))}`,
  ];
}

/** Runs `export`; returns the exit code. */
export function runExport(argv: string[], io: CliIo): number {
  const args = parseArgs(
    argv,
    [...DESIGN_FLAGS, ...IMPLEMENTATION_FLAGS, 'format', 'name', 'out'],
    [ACCEPT_WARNINGS],
  );
  const format = choiceFlag(args, 'format', ['c', 'json', 'csv'], 'c');
  const d = readDesign(args);
  const input = args.positionals[0];
  const out = args.flags.get('out');
  if (out !== undefined)
    refuseOverwritingInputs(out, '--out', [input !== undefined && !linkFragment(input) ? input : undefined]);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const fir = firImplementationOf(args, d);
  if (fir) {
    const mask = d.shared?.design.mask;
    const withMask = mask ? { mask } : {};
    let text: string;
    if (format === 'c') {
      const name = args.flags.get('name');
      try {
        text = exportFirC(fir, name === undefined ? withMask : { name, ...withMask });
      } catch (e) {
        throw new UsageError(`--name: ${(e as Error).message}.`);
      }
    } else text = format === 'json' ? exportFirJson(fir, withMask) : exportFirCsv(fir, withMask);
    if (out === undefined) io.stdout(text);
    else {
      writeFileAtomic(out, text);
      io.stderr(`wrote ${out}: ${format}, ${firSummary(fir)}\n`);
    }
    return warningsExit(
      firExportWarnings(fir, mask),
      out ?? 'standard output',
      args.switches.has(ACCEPT_WARNINGS),
      io,
    );
  }
  const settings = settingsFromArgs(args, baseSettings(d));
  const built = buildImplementation(d.zpk, d.sampleRate, settings);
  if (!built.ok)
    throw new UsageError(`${built.error.message}; expected ${built.error.expected ?? 'valid settings'}.`);
  const impl = built.value;
  for (const note of impl.notes) io.stderr(`note: ${note}\n`);
  // The mask travels with a design file or link; a design given as flags has none.
  const mask = d.shared?.design.mask;
  const withMask = mask ? { mask } : {};
  let text: string;
  if (format === 'c') {
    const name = args.flags.get('name');
    try {
      text = exportC(impl, name === undefined ? withMask : { name, ...withMask });
    } catch (e) {
      throw new UsageError(`--name: ${(e as Error).message}.`);
    }
  } else text = format === 'json' ? exportJson(impl, withMask) : exportCsv(impl, withMask);
  const where = out ?? 'standard output';
  if (out === undefined) io.stdout(text);
  else writeFileAtomic(out, text);
  const q = `${settings.wordLength}-bit ${qName(impl.quantized.format)}`;
  if (out !== undefined)
    io.stderr(
      `wrote ${out}: ${format}, ${impl.cascade.sections.length} section(s), ${settings.structure}, ` +
        `${q} coefficients; stability: ideal filter ${impl.idealStability.verdict}, ` +
        `quantized filter ${impl.stability.verdict}\n`,
    );
  for (const line of maskLines(impl, mask)) io.stderr(`${line}\n`);
  return warningsExit(exportWarnings(impl, mask), where, args.switches.has(ACCEPT_WARNINGS), io);
}

/**
 * Lists an export's warnings on stderr (the first STDERR_WARNINGS; the output lists every one) and returns
 * the exit code: 0 without warnings or when they were accepted, EXPORT_WARNINGS_EXIT otherwise.
 */
function warningsExit(warnings: ExportWarning[], where: string, accepted: boolean, io: CliIo): number {
  if (warnings.length === 0) return 0;
  for (const w of warnings.slice(0, STDERR_WARNINGS)) io.stderr(`warning: ${warningLine(w)}\n`);
  if (warnings.length > STDERR_WARNINGS)
    io.stderr(`… and ${warnings.length - STDERR_WARNINGS} more warning(s), all listed in the output\n`);
  io.stderr(
    `${warnings.length} warning(s) are written into ${where}` +
      (accepted
        ? ` (accepted with --${ACCEPT_WARNINGS}).\n`
        : `; exit code ${EXPORT_WARNINGS_EXIT}. Change the settings, or pass --${ACCEPT_WARNINGS} to take the export as it is.\n`),
  );
  return accepted ? 0 : EXPORT_WARNINGS_EXIT;
}
