/**
 * `polewright simulate <design> --fixed`: the bit-exact fixed-point run of the design's implementation (the
 * arithmetic of the exported C) on a built-in input or a recording, streamed block by block. Prints the output
 * codes, or writes them (with the input codes) to a CSV file or as integer samples to a WAV file; --json
 * reports overflows, what the cascade does after the input (rest or a limit cycle), the difference from the
 * ideal filter, and the round-off noise measured beside the predicted.
 */
import {
  buildImplementation,
  codesToValues,
  containerFormat,
  FixedRun,
  inputSignal,
  qName,
  roundoffNoise,
  DEFAULT_SIGNAL_AMPLITUDE,
  type Implementation,
} from '../../core/fixed/index.ts';
import { FirStream } from '../../core/fixed/fir.ts';
import { firImplementationOf } from '../firImplementation.ts';
import { UsageError, intFlag, numberFlag, rateFlag, type ParsedArgs } from '../args.ts';
import { refuseOverwritingInputs, writeAtomically } from '../output.ts';
import { linkFragment } from '../../share/link/index.ts';
import { MAX_SAMPLE_RATE } from '../../core/model/limits.ts';
import { readDesign } from '../designInput.ts';
import { IMPLEMENTATION_FLAGS, baseSettings, choiceFlag, settingsFromArgs } from '../implementationFlags.ts';
import { codesOf, GENERATED_INPUT, GeneratedSource, generatedSpec } from '../fixedInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { CsvFileSink, WavFileSink, type SignalSink } from '../stream/sinks.ts';
import { CsvFileSource, WavFileSource, isWavPath, type SignalSource } from '../stream/sources.ts';
import { fixedJson, fixedWarnings } from '../fixedReport.ts';

/** Flags only a fixed-point run takes (besides the settings flags). */
export const FIXED_ONLY_FLAGS = ['amplitude', 'input-units'] as const;
/** Every flag `simulate --fixed` adds to `simulate`. */
export const FIXED_FLAGS = [...IMPLEMENTATION_FLAGS, ...FIXED_ONLY_FLAGS] as const;

/** Most samples whose codes are printed or held in memory (write longer runs with --output). */
export const MAX_PRINTED_SAMPLES = 10_000_000;

/** Refuses fixed-point flags on a floating-point run, naming --fixed. */
export function rejectFixedFlags(args: ParsedArgs): void {
  const given = FIXED_FLAGS.filter((f) => args.flags.has(f));
  if (given.length > 0) throw new UsageError(`--${given[0]} applies to a fixed-point run; add --fixed.`);
}

function implementationOf(args: ParsedArgs, d: ReturnType<typeof readDesign>, io: CliIo): Implementation {
  const built = buildImplementation(d.zpk, d.sampleRate, settingsFromArgs(args, baseSettings(d)));
  if (!built.ok)
    throw new UsageError(`${built.error.message}; expected ${built.error.expected ?? 'valid settings'}.`);
  for (const note of built.value.notes) io.stderr(`note: ${note}\n`);
  return built.value;
}

/** Where the codes go: a file sink, or arrays kept for printing. */
interface CodeWriter {
  write(input: Int32Array, output: Int32Array, times: Float64Array | null): Promise<void>;
  close(sampleRate: number, startTime: number): Promise<void>;
}

class MemoryWriter implements CodeWriter {
  input: number[] = [];
  output: number[] = [];
  async write(input: Int32Array, output: Int32Array): Promise<void> {
    if (this.output.length + output.length > MAX_PRINTED_SAMPLES)
      throw new UsageError(
        `more than ${MAX_PRINTED_SAMPLES} samples to print; write them to a file with --output <file.wav|file.csv>.`,
      );
    for (let i = 0; i < output.length; i++) {
      this.input.push(input[i]!);
      this.output.push(output[i]!);
    }
  }
  async close(): Promise<void> {}
}

/** Input and output codes into a CSV file (time_s, input, output), or output codes into an integer WAV file. */
class FileWriter implements CodeWriter {
  private sink: SignalSink | null = null;
  constructor(
    private readonly path: string,
    private readonly dataBits: number,
    private readonly rate: () => number,
  ) {}
  private async open(): Promise<SignalSink> {
    if (isWavPath(this.path)) return WavFileSink.create(this.path, containerFormat(this.dataBits));
    return CsvFileSink.create(this.path, this.rate(), 0, ['input', 'output']);
  }
  async write(input: Int32Array, output: Int32Array, times: Float64Array | null): Promise<void> {
    this.sink ??= await this.open();
    const channels = isWavPath(this.path)
      ? [codesToValues(output, this.dataBits)]
      : [Float64Array.from(input), Float64Array.from(output)];
    await this.sink.write(channels, times);
  }
  async close(sampleRate: number, startTime: number): Promise<void> {
    this.sink ??= await this.open();
    await this.sink.close(sampleRate, startTime);
  }
}

interface InputPlan {
  source: SignalSource;
  /** What --input named, for the report. */
  label: string;
  units: 'codes' | 'full-scale';
  path: string | null;
  maxFrames: number;
  fallbackRate: number;
}

function inputPlan(args: ParsedArgs, sampleRate: number, output: string | undefined): InputPlan {
  const spec = args.flags.get('input') ?? 'impulse';
  const units = choiceFlag(args, 'input-units', ['full-scale', 'codes'], 'full-scale');
  const generated = GENERATED_INPUT.test(spec);
  const amplitude = args.flags.has('amplitude')
    ? numberFlag(args, 'amplitude', DEFAULT_SIGNAL_AMPLITUDE)
    : DEFAULT_SIGNAL_AMPLITUDE;
  if (!(amplitude > 0 && amplitude <= 2))
    throw new UsageError(`--amplitude must be above 0 and at most 2 (1 is full scale); got "${amplitude}".`);
  if (generated) {
    if (units === 'codes') throw new UsageError('--input-units codes applies to a CSV input file.');
    if (args.flags.has('channel') || args.flags.has('input-rate'))
      throw new UsageError('--channel and --input-rate apply to an input file.');
    const n = intFlag(args, 'samples', 64, 1, MAX_PRINTED_SAMPLES);
    const samples = inputSignal(generatedSpec(spec, n, amplitude, sampleRate), sampleRate);
    return {
      source: new GeneratedSource(samples),
      label: spec,
      units,
      path: null,
      maxFrames: n,
      fallbackRate: sampleRate,
    };
  }
  if (args.flags.has('amplitude')) throw new UsageError('--amplitude applies to the built-in inputs.');
  if (output !== undefined) refuseOverwritingInputs(output, '--output', [spec]);
  const wav = isWavPath(spec);
  if (wav && units === 'codes')
    throw new UsageError(
      '--input-units codes applies to CSV input; a WAV file holds fractions of its own full scale.',
    );
  if (!wav && args.flags.has('channel'))
    throw new UsageError('--channel applies to WAV input; a CSV input has one value column.');
  if (wav && args.flags.has('input-rate'))
    throw new UsageError('--input-rate applies to CSV input; a WAV file states its own rate.');
  const channel = args.flags.has('channel') ? intFlag(args, 'channel', 1, 1, 65535) - 1 : 0;
  const inputRate = rateFlag(args, 'input-rate', sampleRate, MAX_SAMPLE_RATE);
  const maxFrames = args.flags.has('samples')
    ? intFlag(args, 'samples', 1, 1, Number.MAX_SAFE_INTEGER)
    : Infinity;
  return {
    source: wav ? new WavFileSource(spec, channel) : new CsvFileSource(spec),
    label: spec,
    units,
    path: spec,
    maxFrames,
    fallbackRate: inputRate,
  };
}

/** What runBlocks drives: the cascade's run or the FIR's. */
interface CodeRun {
  impl: { settings: { dataWordLength: number } };
  quantize(x: ArrayLike<number>): Int32Array;
  pushCodes(codes: Int32Array): Int32Array;
}

/** Feeds the source through the run into the writer; returns the frames run. */
async function runBlocks(run: CodeRun, plan: InputPlan, writer: CodeWriter): Promise<number> {
  const dataBits = run.impl.settings.dataWordLength;
  let frames = 0;
  for await (const block of plan.source.blocks()) {
    const take = Math.min(block.channels[0]!.length, plan.maxFrames - frames);
    if (take <= 0) break;
    const values = block.channels[0]!.subarray(0, take);
    const codes =
      plan.units === 'codes' ? codesOf(values, frames, dataBits, plan.path ?? 'input') : run.quantize(values);
    const output = run.pushCodes(codes);
    await writer.write(codes, output, block.times ? block.times.subarray(0, take) : null);
    frames += take;
  }
  return frames;
}

/** Runs `simulate --fixed` on parsed arguments; resolves to the exit code. */
export async function runSimulateFixed(args: ParsedArgs, io: CliIo): Promise<number> {
  if (args.flags.has('output-format'))
    throw new UsageError(
      '--output-format does not apply with --fixed: a WAV output holds the data-word codes in the smallest integer format that fits them.',
    );
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const sampleRate = d.sampleRate;
  const fir = firImplementationOf(args, d);
  const output = args.flags.get('output');
  const plan = inputPlan(args, sampleRate, output);
  const rate = () => plan.source.summary().sampleRate ?? plan.fallbackRate;
  const memory = output === undefined ? new MemoryWriter() : null;
  const runInto = async (run: CodeRun, writer: CodeWriter) => {
    const n = await runBlocks(run, plan, writer);
    await writer.close(rate(), plan.source.summary().startTime);
    return n;
  };
  if (output !== undefined) {
    const design = args.positionals[0];
    refuseOverwritingInputs(output, '--output', [
      design !== undefined && !linkFragment(design) ? design : undefined,
    ]);
  }
  const runAll = (run: CodeRun, dataBits: number) =>
    memory
      ? runInto(run, memory)
      : writeAtomically(output!, (path) => runInto(run, new FileWriter(path, dataBits, rate)));
  if (fir) {
    const run = new FirStream(fir);
    const frames = await runAll(run, fir.settings.dataWordLength);
    for (const note of plan.source.summary().notes) io.stderr(`note: ${note}\n`);
    if (run.inputClipped > 0)
      io.stderr(
        `warning: ${run.inputClipped} input sample(s) were beyond the data word and were saturated.\n`,
      );
    const first = run.overflows[0];
    if (first)
      io.stderr(
        `warning: ${run.overflowCount} overflow event(s); the first at sample ${first.sample} ` +
          `(${first.place === 'output' ? 'fitting the output to the data word' : 'in the accumulator'}).\n`,
      );
    if (args.switches.has('json')) {
      const codes = memory ? { inputCodes: memory.input, output: memory.output } : { output };
      io.stdout(
        toJson({
          sampleRate: rate(),
          input: plan.label,
          samples: frames,
          structure: `fir-${fir.settings.form}`,
          settings: fir.settings,
          taps: fir.codes.length,
          symmetry: fir.symmetry,
          multipliesPerSample: fir.multiplies,
          preAddBits: fir.preAddBits,
          coefficientFormat: qName(fir.format),
          dataFormat: qName(fir.dataFormat),
          outputScale: 2 ** -(fir.settings.dataWordLength - 1),
          accumulatorBitsNeeded: fir.accumulatorNeeded,
          worstCaseGain: fir.worstGain,
          inputClipped: run.inputClipped,
          overflows: { count: run.overflowCount, listed: run.overflows },
          ...codes,
        }),
      );
      return 0;
    }
    if (memory) io.stdout(memory.output.join('\n') + '\n');
    else
      io.stderr(
        `wrote ${output}: ${frames} sample(s) of ${fir.settings.dataWordLength}-bit codes (${qName(fir.dataFormat)}), ` +
          `${run.overflowCount} overflow event(s)\n`,
      );
    return 0;
  }
  const impl = implementationOf(args, d, io);
  const run = new FixedRun(impl);
  // A file output is written beside its name and renamed over it only when the whole run succeeded.
  const frames = await runAll(run, impl.settings.dataWordLength);
  const summary = plan.source.summary();
  for (const note of summary.notes) io.stderr(`note: ${note}\n`);
  const report = run.finish();
  for (const w of fixedWarnings(report)) io.stderr(`warning: ${w}\n`);
  if (output !== undefined && isWavPath(output) && !Number.isInteger(rate()))
    io.stderr(
      `note: WAV stores whole hertz; the rate ${rate()} Hz was written as ${Math.round(rate())} Hz.\n`,
    );
  if (args.switches.has('json')) {
    const base = fixedJson(impl, report, roundoffNoise(impl), {
      input: plan.label,
      sampleRate: rate(),
      frames,
    });
    const codes = memory ? { inputCodes: memory.input, output: memory.output } : { output };
    io.stdout(toJson({ ...base, ...codes }));
    return 0;
  }
  if (memory) io.stdout(memory.output.join('\n') + '\n');
  else
    io.stderr(
      `wrote ${output}: ${frames} sample(s) of ${impl.settings.dataWordLength}-bit codes (${qName(impl.dataFormat)}), ` +
        `${report.overflowCount} overflow event(s)\n`,
    );
  return 0;
}
