/**
 * `polewright spectrum <recording> [<design>]`: the Welch spectrum of a recording (WAV or CSV), and with a
 * design the spectrum after filtering too; `--levels 50,150` prints the levels of the tones at those
 * frequencies instead, before and after. The recording streams through twice (first to count and to find the
 * tones, then to transform and fit), so its length is bounded by the disk, not by memory.
 */
import {
  autoSegmentLength,
  createSectionFilter,
  levelFloorDb,
  levelMethod,
  levelReadings,
  LEVEL_FLOOR_MARGIN_DB,
  LEVEL_SEARCH_FRACTION,
  parseWindowName,
  runSectionFilter,
  searchWidths,
  settleFound,
  ToneFitAccumulator,
  ToneSearchAccumulator,
  WelchAccumulator,
  WINDOW_NAMES,
  type FitWeighting,
  type SpectrumScaling,
  type WelchResult,
  type WindowName,
} from '../../core/signal/index.ts';
import { zpkToSections } from '../../core/system/index.ts';
import {
  UsageError,
  intFlag,
  numberFlag,
  parseArgs,
  rateFlag,
  readFlagList,
  type ParsedArgs,
} from '../args.ts';
import { MAX_SAMPLE_RATE } from '../../core/model/limits.ts';
import { DESIGN_FLAGS, readDesign, type CliDesign } from '../designInput.ts';
import { choiceFlag } from '../implementationFlags.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { CsvFileSource, WavFileSource, isWavPath, type SignalSource } from '../stream/sources.ts';

const FLAGS = [
  ...DESIGN_FLAGS,
  'window',
  'segment',
  'overlap',
  'scaling',
  'levels',
  'level-search',
  'level-weighting',
  'channel',
  'input-rate',
] as const;

interface Settings {
  path: string;
  channel: number | undefined;
  inputRate: number | null;
  window: WindowName;
  segment: number | 'auto';
  overlap: number | null;
  scaling: SpectrumScaling;
  levels: number[] | null;
  search: number;
  weighting: FitWeighting;
}

function readSettings(args: ParsedArgs): Settings {
  const path = args.positionals[0];
  if (path === undefined)
    throw new UsageError(
      'Give the recording to analyse: polewright spectrum <file.wav|file.csv> [<design>].',
    );
  const rawWindow = args.flags.get('window') ?? 'hann';
  const window = parseWindowName(rawWindow);
  if (window === null)
    throw new UsageError(`--window must be one of ${WINDOW_NAMES.join(', ')}; got "${rawWindow}".`);
  const rawSegment = args.flags.get('segment');
  const segment =
    rawSegment === undefined || rawSegment === 'auto' ? 'auto' : intFlag(args, 'segment', 256, 2, 1 << 24);
  const overlap = args.flags.has('overlap') ? intFlag(args, 'overlap', 0, 0, (1 << 24) - 1) : null;
  const rawLevels = args.flags.get('levels');
  let levels: number[] | null = null;
  if (rawLevels !== undefined) {
    levels = readFlagList('levels', rawLevels, 'frequencies in Hz');
    if (levels.some((f) => !(f >= 0)))
      throw new UsageError(
        `--levels needs frequencies in Hz separated by commas, e.g. 50,150; got "${rawLevels}".`,
      );
  }
  const searchPercent = numberFlag(args, 'level-search', 100 * LEVEL_SEARCH_FRACTION);
  if (!(searchPercent >= 0 && searchPercent <= 10))
    throw new UsageError(
      `--level-search is a percentage from 0 (fit exactly at the asked frequencies) to 10.`,
    );
  const wav = isWavPath(path);
  if (!wav && args.flags.has('channel'))
    throw new UsageError('--channel applies to WAV input; a CSV input has one value column.');
  if (wav && args.flags.has('input-rate'))
    throw new UsageError('--input-rate applies to CSV input; a WAV file states its own rate.');
  const inputRate = args.flags.has('input-rate') ? rateFlag(args, 'input-rate', 1, MAX_SAMPLE_RATE) : null;
  return {
    path,
    channel: args.flags.has('channel') ? intFlag(args, 'channel', 1, 1, 65535) - 1 : undefined,
    inputRate,
    window,
    segment,
    overlap,
    scaling: choiceFlag(args, 'scaling', ['density', 'spectrum'], 'density'),
    levels,
    search: searchPercent / 100,
    weighting: choiceFlag(args, 'level-weighting', ['hann', 'rectangular'], 'hann'),
  };
}

/** The design, when one was given after the recording or by flags. */
function designOf(args: ParsedArgs): CliDesign | null {
  const rest = { ...args, positionals: args.positionals.slice(1) };
  const given = rest.positionals.length > 0 || ['b', 'eq', 'tf'].some((f) => args.flags.has(f));
  return given ? readDesign(rest) : null;
}

function sourceOf(s: Settings): SignalSource {
  return isWavPath(s.path) ? new WavFileSource(s.path, s.channel ?? 0) : new CsvFileSource(s.path);
}

/** First pass: the sample count, the rate and notes, and where the asked tones are. */
async function firstPass(s: Settings, searchFor: number[] | null) {
  const source = sourceOf(s);
  let search: ToneSearchAccumulator | null = null;
  let count = 0;
  for await (const block of source.blocks()) {
    const x = block.channels[0]!;
    if (searchFor && !search) {
      const rate = source.summary().sampleRate ?? s.inputRate ?? null;
      if (rate !== null)
        search = new ToneSearchAccumulator(rate, searchFor, searchWidths(searchFor, s.search));
    }
    search?.push(x);
    count += x.length;
  }
  const summary = source.summary();
  return { count, summary, found: search?.result() ?? null };
}

/** Second pass: Welch before (and after), and the tone fits at the found frequencies. */
async function secondPass(
  s: Settings,
  rate: number,
  count: number,
  nperseg: number,
  design: CliDesign | null,
  fitAt: number[] | null,
) {
  const opts = {
    window: s.window,
    nperseg,
    scaling: s.scaling,
    ...(s.overlap === null ? {} : { noverlap: s.overlap }),
  };
  const welchOpts = (kind: 'spectrum' | SpectrumScaling) => ({ ...opts, scaling: kind });
  const before = new WelchAccumulator(rate, welchOpts(s.scaling));
  const after = design ? new WelchAccumulator(rate, welchOpts(s.scaling)) : null;
  // Noise floors of the level readings need 'spectrum'-scaled estimates.
  const floorBefore = fitAt ? new WelchAccumulator(rate, welchOpts('spectrum')) : null;
  const floorAfter = fitAt && design ? new WelchAccumulator(rate, welchOpts('spectrum')) : null;
  const filter = design ? createSectionFilter(zpkToSections(design.zpk)) : null;
  const fitBefore = fitAt ? new ToneFitAccumulator(rate, fitAt, count, s.weighting) : null;
  const fitAfter = fitAt && design ? new ToneFitAccumulator(rate, fitAt, count, s.weighting) : null;
  for await (const block of sourceOf(s).blocks()) {
    const x = block.channels[0]!;
    before.push(x);
    floorBefore?.push(x);
    fitBefore?.push(x);
    if (filter) {
      const y = runSectionFilter(filter, x);
      after!.push(y);
      floorAfter?.push(y);
      fitAfter?.push(y);
    }
  }
  return {
    before: before.result(),
    after: after?.result() ?? null,
    floors: { before: floorBefore?.result() ?? null, after: floorAfter?.result() ?? null },
    fits: { before: fitBefore?.result().tones ?? null, after: fitAfter?.result().tones ?? null },
  };
}

const toDb = (p: number) => (p > 0 ? 10 * Math.log10(p) : -Infinity);

function spectrumCsv(before: WelchResult, after: WelchResult | null): string {
  const unit = before.scaling === 'density' ? 'psd_db' : 'power_db';
  const head = ['frequency_hz', `before_${unit}`, ...(after ? [`after_${unit}`] : [])].join(',');
  const rows = Array.from(before.frequencies, (f, k) =>
    [f, toDb(before.power[k]!), ...(after ? [toDb(after.power[k]!)] : [])].join(','),
  );
  return [head, ...rows].join('\n') + '\n';
}

/** Runs `spectrum`; resolves to the exit code. */
export async function runSpectrum(argv: string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, FLAGS, ['json']);
  const s = readSettings(args);
  const design = designOf(args);
  for (const note of design?.notes ?? []) io.stderr(`note: ${note}\n`);
  const first = await firstPass(s, s.levels);
  for (const note of first.summary.notes) io.stderr(`note: ${note}\n`);
  const rate = first.summary.sampleRate ?? s.inputRate;
  if (rate === null)
    throw new UsageError(`${s.path} has no time column; give its sample rate with --input-rate <Hz>.`);
  if (first.count === 0) throw new UsageError(`${s.path} holds no samples.`);
  if (design && (args.flags.has('fs') || !design.source.startsWith('--')) && design.sampleRate !== rate)
    io.stderr(
      `note: the recording's sample rate (${rate} Hz) differs from the design's (${design.sampleRate} Hz); the filter acts on samples, so its frequencies scale by ${(rate / design.sampleRate).toPrecision(4)}.\n`,
    );
  if (s.levels)
    for (const f of s.levels)
      if (f > rate / 2)
        throw new UsageError(`--levels: ${f} Hz is above half the sample rate (${rate / 2} Hz).`);
  const nperseg = Math.min(
    s.segment === 'auto' ? autoSegmentLength(rate, first.count) : s.segment,
    first.count,
  );
  if (s.overlap !== null && s.overlap >= nperseg)
    throw new UsageError(`--overlap must be below the segment length (${nperseg} samples).`);
  const fitAt = s.levels && first.found ? settleFound(s.levels, first.found, rate / first.count) : null;
  const r = await secondPass(s, rate, first.count, nperseg, design, fitAt);
  const settings = {
    window: s.window,
    segment: nperseg,
    overlap: r.before.noverlap,
    scaling: s.scaling,
    segments: r.before.segments,
    binWidthHz: r.before.binWidthHz,
  };
  const levels =
    s.levels && fitAt && r.fits.before
      ? (() => {
          const readings = levelReadings(s.levels!, fitAt, r.fits.before!, r.fits.after);
          const report = {
            sampleRate: rate,
            weighting: s.weighting,
            search: s.search,
            start: 0,
            count: first.count,
          };
          const floor = (spec: WelchResult | null, f: number) =>
            spec
              ? levelFloorDb(
                  spec,
                  f,
                  fitAt.filter((g) => g !== f),
                  first.count,
                  s.weighting,
                )
              : null;
          return {
            method: levelMethod(report),
            readings: readings.map((row) => ({
              ...row,
              beforeFloorDb: floor(r.floors.before, row.fittedHz),
              afterFloorDb: floor(r.floors.after, row.fittedHz),
            })),
          };
        })()
      : null;
  if (args.switches.has('json')) {
    io.stdout(
      toJson({
        sampleRate: rate,
        samples: first.count,
        settings,
        frequencies: r.before.frequencies,
        before: r.before.power,
        ...(r.after ? { after: r.after.power } : {}),
        ...(levels ? { levels } : {}),
      }),
    );
    return 0;
  }
  if (!levels) {
    io.stdout(spectrumCsv(r.before, r.after));
    return 0;
  }
  io.stderr(`note: levels by ${levels.method}.\n`);
  for (const row of levels.readings) {
    const near = (level: number | null, floor: number | null) =>
      level !== null && floor !== null && level - floor < LEVEL_FLOOR_MARGIN_DB;
    if (near(row.beforeDb, row.beforeFloorDb) || near(row.afterDb, row.afterFloorDb))
      io.stderr(
        `note: at ${row.frequencyHz} Hz a reading is within ${LEVEL_FLOOR_MARGIN_DB} dB of the noise floor (the *_floor_db columns): the tone may be weaker than it reads.\n`,
      );
  }
  const cols = [
    'frequency_hz',
    'found_hz',
    'before_db',
    ...(design ? ['after_db', 'change_db'] : []),
    'before_floor_db',
    ...(design ? ['after_floor_db'] : []),
  ];
  const lines = levels.readings.map((row) =>
    [
      row.frequencyHz,
      row.fittedHz,
      row.beforeDb,
      ...(design ? [row.afterDb, row.changeDb] : []),
      row.beforeFloorDb,
      ...(design ? [row.afterFloorDb] : []),
    ].join(','),
  );
  io.stdout([cols.join(','), ...lines].join('\n') + '\n');
  return 0;
}
