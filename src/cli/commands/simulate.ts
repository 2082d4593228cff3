/**
 * `polewright simulate`: the filter's output for an impulse, a step, a sinusoid, or a recording (CSV/TSV
 * or WAV). With --output the recording is filtered as a stream into a WAV or CSV file, so long files use
 * bounded memory; without it the output samples are printed.
 */
import { readFileSync } from 'node:fs';
import { filterSections, filterTf } from '../../core/time/filter.ts';
import { makeImpulse, makeSine, makeStep } from '../../core/time/inputs.ts';
import { zpkToSections } from '../../core/system/index.ts';
import {
  SAMPLE_FORMATS,
  parseSampleFormat,
  readCsvSignal,
  readWav,
  writeCsvSignal,
  writeWav,
  type SampleFormat,
} from '../../core/signal/index.ts';
import type { Section, TransferFunction } from '../../core/types.ts';
import { UsageError, intFlag, parseArgs, rateFlag, sineInputHz, type ParsedArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign, type CliDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { refuseOverwritingInputs, writeAtomically, writeFileAtomic } from '../output.ts';
import { linkFragment } from '../../share/link/index.ts';
import { MAX_SAMPLE_RATE } from '../../core/model/limits.ts';
import { filterStream, type StreamRunSummary } from '../stream/filterFile.ts';
import { CsvFileSink, WavFileSink, wavRate } from '../stream/sinks.ts';
import { CsvFileSource, WavFileSource, isWavPath } from '../stream/sources.ts';
import { FIXED_FLAGS, rejectFixedFlags, runSimulateFixed } from './simulateFixed.ts';
import { hzToOmega } from '../../core/units.ts';

/** Most samples one call may ask for when the output is printed or the input is generated in memory. */
export const MAX_SIMULATE_SAMPLES = 10_000_000;

const GENERATED = /^(impulse|step|sine:.*)$/;

/** An input signal read into memory, with what the user should know about how it was read. */
interface LoadedInput {
  samples: Float64Array;
  /** Hz, when the input carries its own rate (WAV, CSV with a time column). */
  sampleRate: number | null;
  notes: string[];
}

function readText(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    throw new UsageError(
      `Cannot read the input file ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`,
    );
  }
}

/** Reads a CSV/TSV signal (one sample column, or time and value columns) into memory. */
function loadCsv(path: string, fallbackRate: number): LoadedInput {
  const r = readCsvSignal(readText(path), { sampleRate: fallbackRate });
  if (r.status === 'error') {
    const expected = r.error.expected ? ` Expected: ${r.error.expected}.` : '';
    throw new UsageError(`${path}: ${r.error.message}${expected}`);
  }
  const samples = r.status === 'ok' ? r.signal.samples : r.samples;
  if (samples.length > MAX_SIMULATE_SAMPLES) {
    throw new UsageError(`${path} has more than ${MAX_SIMULATE_SAMPLES} samples; write them with --output.`);
  }
  const timed = r.status === 'ok' && r.signal.timing !== null;
  return {
    samples,
    sampleRate: timed ? r.signal.sampleRate : null,
    notes: r.status === 'ok' ? r.signal.notes : r.notes,
  };
}

/** Reads one channel of a WAV file into memory. */
function loadWav(path: string, channel: number | undefined): LoadedInput {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    throw new UsageError(
      `Cannot read the input file ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`,
    );
  }
  const r = readWav(bytes, { channel: channel ?? 0 });
  if (!r.ok) {
    throw new UsageError(
      `${path}: ${r.error.message}${r.error.expected ? ` Expected: ${r.error.expected}.` : ''}`,
    );
  }
  const notes = [...r.value.notes];
  if (channel === undefined && r.value.info.channelCount > 1) {
    notes.push(
      `${path} has ${r.value.info.channelCount} channels; channel 1 was used (choose with --channel N).`,
    );
  }
  const samples = r.value.channels[0]!;
  if (samples.length > MAX_SIMULATE_SAMPLES) {
    throw new UsageError(`${path} has more than ${MAX_SIMULATE_SAMPLES} samples; write them with --output.`);
  }
  return { samples, sampleRate: r.value.sampleRate, notes };
}

/** The input signal named by --input, in memory. */
function inputSignal(spec: string, n: number | null, fs: number, channel: number | undefined): LoadedInput {
  const count = n ?? 64;
  if (spec === 'impulse') return { samples: makeImpulse(count), sampleRate: null, notes: [] };
  if (spec === 'step') return { samples: makeStep(count), sampleRate: null, notes: [] };
  const hz = sineInputHz(spec, Infinity);
  if (hz !== null) return { samples: makeSine(hzToOmega(hz, fs), count), sampleRate: null, notes: [] };
  const loaded = isWavPath(spec) ? loadWav(spec, channel) : loadCsv(spec, fs);
  if (n !== null) loaded.samples = loaded.samples.subarray(0, Math.min(n, loaded.samples.length));
  return loaded;
}

/** The 0-based channel from --channel N (1-based), if given. */
function channelFlag(args: ParsedArgs): number | undefined {
  return args.flags.has('channel') ? intFlag(args, 'channel', 1, 1, 65535) - 1 : undefined;
}

function outputFormatFlag(args: ParsedArgs): SampleFormat | null {
  const raw = args.flags.get('output-format');
  if (raw === undefined) return null;
  const f = parseSampleFormat(raw);
  if (f === null)
    throw new UsageError(`--output-format must be one of ${SAMPLE_FORMATS.join(', ')}; got "${raw}".`);
  return f;
}

/** A note when the recording's rate differs from the rate the design was made for. */
function rateNote(d: CliDesign, args: ParsedArgs, signalRate: number | null): string | null {
  const designRateGiven = args.flags.has('fs') || !d.source.startsWith('--');
  if (signalRate === null || !designRateGiven || signalRate === d.sampleRate) return null;
  return (
    `the signal's sample rate (${signalRate} Hz) differs from the design's (${d.sampleRate} Hz); the filter ` +
    `acts on samples, so its frequencies scale by ${(signalRate / d.sampleRate).toPrecision(4)}.`
  );
}

function clipWarning(
  summary: { clipped: number; frames: number; channels: number },
  format: SampleFormat,
): string | null {
  if (summary.clipped === 0) return null;
  const total = summary.frames * summary.channels;
  const share = ((100 * summary.clipped) / Math.max(1, total)).toPrecision(3);
  return (
    `warning: ${summary.clipped} of ${total} output samples (${share} %) exceeded full scale and were clipped ` +
    `to the ${format} range; --output-format f32 keeps them.\n`
  );
}

/** Streams a recording through the filter into --output. */
async function streamToFile(
  args: ParsedArgs,
  d: CliDesign,
  io: CliIo,
  input: string,
  output: string,
): Promise<number> {
  refuseOverwritingInputs(output, '--output', [input, designFileOf(args)]);
  const channel = channelFlag(args);
  const inputRate = inputRateFlag(args);
  const wavIn = isWavPath(input);
  if (!wavIn && channel !== undefined)
    throw new UsageError('--channel applies to WAV input; a CSV input has one value column.');
  if (wavIn && inputRate !== null)
    throw new UsageError('--input-rate applies to CSV input; a WAV file states its own rate.');
  const wavOut = isWavPath(output);
  const chosen = outputFormatFlag(args);
  if (chosen !== null && !wavOut)
    throw new UsageError('--output-format applies to WAV output (a .wav file).');
  const maxFrames = args.flags.has('samples')
    ? intFlag(args, 'samples', 1, 1, Number.MAX_SAFE_INTEGER)
    : undefined;
  const source = wavIn ? new WavFileSource(input, channel) : new CsvFileSource(input);
  const fallbackRate = inputRate ?? d.sampleRate;
  let format: SampleFormat = chosen ?? 'f32';
  const makeSink = (path: string) => async (rate: number) => {
    if (!wavOut) return CsvFileSink.create(path, rate);
    wavRate(rate); // fails early when the rate known so far cannot be stored
    return WavFileSink.create(path, format);
  };
  // A WAV input's own format is the default output format; it is known after the header, so peek at it.
  if (wavIn && chosen === null) format = (await wavFormatOf(input)) ?? format;
  const opts = {
    fallbackRate,
    outputFormat: wavOut ? format : ('csv' as const),
    ...(maxFrames ? { maxFrames } : {}),
  };
  // Written beside --output and renamed over it only when the whole run succeeded.
  const system = filterSystem(d, io);
  const summary: StreamRunSummary = await writeAtomically(output, (path) =>
    filterStream(source, makeSink(path), system, opts),
  );
  for (const note of summary.source.notes) io.stderr(`note: ${note}\n`);
  const rate = summary.source.sampleRate ?? fallbackRate;
  const mismatch = rateNote(d, args, summary.source.sampleRate);
  if (mismatch) io.stderr(`note: ${mismatch}\n`);
  if (wavOut && !Number.isInteger(rate))
    io.stderr(`note: WAV stores whole hertz; the rate ${rate} Hz was written as ${Math.round(rate)} Hz.\n`);
  if (wavOut) {
    const warning = clipWarning(summary, format);
    if (warning) io.stderr(warning);
  }
  if (args.switches.has('json')) {
    io.stdout(
      toJson({
        output,
        sampleRate: rate,
        frames: summary.frames,
        channels: summary.channels,
        format: summary.outputFormat,
        clipped: summary.clipped,
      }),
    );
  }
  return 0;
}

/** The sample format in a WAV file's header, read from its first bytes. */
async function wavFormatOf(path: string): Promise<SampleFormat | null> {
  const source = new WavFileSource(path);
  for await (const _ of source.blocks()) break;
  return source.info?.format ?? null;
}

/** Writes an in-memory output (a generated input's response) to --output, all or nothing. */
function writeInMemory(args: ParsedArgs, y: Float64Array, rate: number, output: string, io: CliIo): void {
  refuseOverwritingInputs(output, '--output', [designFileOf(args)]);
  if (isWavPath(output)) {
    const format = outputFormatFlag(args) ?? 'f32';
    const r = writeWav({ format, sampleRate: wavRate(rate), channels: [y] });
    writeFileAtomic(output, r.bytes);
    const warning = clipWarning({ clipped: r.clipped, frames: y.length, channels: 1 }, format);
    if (warning) io.stderr(warning);
  } else {
    writeFileAtomic(
      output,
      writeCsvSignal([y], rate, { delimiter: /\.(tsv|tab)$/i.test(output) ? '\t' : ',' }),
    );
  }
}

/** The design file named on the command line (not a link), which an output must not overwrite. */
function designFileOf(args: ParsedArgs): string | undefined {
  const file = args.positionals[0];
  return file !== undefined && !linkFragment(file) ? file : undefined;
}

/** --input-rate in Hz when given: above 0 and at most the largest sample rate a design may have. */
function inputRateFlag(args: ParsedArgs): number | null {
  return args.flags.has('input-rate') ? rateFlag(args, 'input-rate', 0, MAX_SAMPLE_RATE) : null;
}

/**
 * What the signal runs through: the coefficients exactly as typed (direct form II transposed, so an
 * unstable typed filter visibly grows), or sections built from the roots for a design kept as roots.
 */
function filterSystem(d: CliDesign, io: CliIo): readonly Section[] | TransferFunction {
  if (d.typed) {
    io.stderr(
      'note: filtering with b and a exactly as typed (direct form II transposed), not with sections.\n',
    );
    return d.typed;
  }
  return zpkToSections(d.zpk);
}

/** Runs `simulate`; resolves to the exit code. */
export async function runSimulate(argv: string[], io: CliIo): Promise<number> {
  const args = parseArgs(
    argv,
    [...DESIGN_FLAGS, 'input', 'samples', 'output', 'output-format', 'channel', 'input-rate', ...FIXED_FLAGS],
    ['json', 'fixed'],
  );
  if (args.switches.has('fixed')) return runSimulateFixed(args, io);
  rejectFixedFlags(args);
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const spec = args.flags.get('input') ?? 'impulse';
  const output = args.flags.get('output');
  if (output !== undefined && !GENERATED.test(spec)) return streamToFile(args, d, io, spec, output);
  if (output === undefined && args.flags.has('output-format'))
    throw new UsageError('--output-format needs --output <file.wav>.');
  const n = args.flags.has('samples') ? intFlag(args, 'samples', 64, 1, MAX_SIMULATE_SAMPLES) : null;
  const x = inputSignal(spec, n, inputRateFlag(args) ?? d.sampleRate, channelFlag(args));
  for (const note of x.notes) io.stderr(`note: ${note}\n`);
  const mismatch = rateNote(d, args, x.sampleRate);
  if (mismatch) io.stderr(`note: ${mismatch}\n`);
  const system = filterSystem(d, io);
  const y = Array.isArray(system)
    ? filterSections(system, x.samples)
    : filterTf(system as TransferFunction, x.samples);
  const rate = x.sampleRate ?? d.sampleRate;
  if (output !== undefined) {
    writeInMemory(args, y, rate, output, io);
    if (args.switches.has('json'))
      io.stdout(toJson({ output, sampleRate: rate, frames: y.length, channels: 1 }));
    return 0;
  }
  if (args.switches.has('json')) {
    io.stdout(toJson({ sampleRate: rate, input: spec, output: y }));
    return 0;
  }
  io.stdout(Array.from(y, String).join('\n') + '\n');
  return 0;
}
