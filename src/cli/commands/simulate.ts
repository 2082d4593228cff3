/** `polewright simulate`: the filter's output for an impulse, a step, a sinusoid or samples from a CSV file. */
import { readFileSync } from 'node:fs';
import { filterSections } from '../../core/time.ts';
import { makeImpulse, makeSine, makeStep } from '../../core/signals.ts';
import { zpkToSections } from '../../core/system.ts';
import { UsageError, intFlag, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';

/** Most samples one call may ask for. */
export const MAX_SIMULATE_SAMPLES = 10_000_000;

/** Reads the first numeric column of a CSV/TSV file; a non-numeric first line is taken as a header. */
export function readCsvColumn(path: string): Float64Array {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new UsageError(
      `Cannot read the input file ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`,
    );
  }
  const values: number[] = [];
  const lines = text.split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!.trim();
    if (line === '' || line.startsWith('#')) continue;
    const cell = line.split(/[,;\t ]+/)[0]!;
    const v = Number(cell);
    if (cell === '' || !Number.isFinite(v)) {
      if (values.length === 0 && i === lines.findIndex((l) => l.trim() !== '')) continue; // header
      throw new UsageError(
        `${path}, line ${i + 1}: "${cell}" is not a number (expected one sample per line).`,
      );
    }
    values.push(v);
    if (values.length > MAX_SIMULATE_SAMPLES) {
      throw new UsageError(`${path} has more than ${MAX_SIMULATE_SAMPLES} samples.`);
    }
  }
  if (values.length === 0) throw new UsageError(`${path} holds no samples.`);
  return Float64Array.from(values);
}

/** The input signal named by --input. */
function inputSignal(spec: string, n: number | null, fs: number): Float64Array {
  const count = n ?? 64;
  if (spec === 'impulse') return makeImpulse(count);
  if (spec === 'step') return makeStep(count);
  const sine = /^sine:(.+)$/.exec(spec);
  if (sine) {
    const hz = Number(sine[1]);
    if (!Number.isFinite(hz) || hz < 0)
      throw new UsageError(`--input sine:<Hz> needs a frequency in Hz; got "${sine[1]}".`);
    return makeSine((2 * Math.PI * hz) / fs, count);
  }
  const samples = readCsvColumn(spec);
  return n === null ? samples : samples.subarray(0, Math.min(n, samples.length));
}

/** Runs `simulate`; returns the exit code. */
export function runSimulate(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, 'input', 'samples'], ['json']);
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const spec = args.flags.get('input') ?? 'impulse';
  const n = args.flags.has('samples') ? intFlag(args, 'samples', 64, 1, MAX_SIMULATE_SAMPLES) : null;
  const x = inputSignal(spec, n, d.sampleRate);
  const y = filterSections(zpkToSections(d.zpk), x);
  if (args.switches.has('json')) {
    io.stdout(toJson({ sampleRate: d.sampleRate, input: spec, output: y }));
    return 0;
  }
  io.stdout(Array.from(y, String).join('\n') + '\n');
  return 0;
}
