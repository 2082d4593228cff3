/**
 * Signals from CSV/TSV text: one column of samples, or a time column (seconds) and a value column. Header
 * lines before the first number row are kept as column names; comment lines (#, %, //) and blank lines are
 * skipped anywhere. With a time column the sample rate is 1 / (mean step), after checking every step is
 * within TIME_STEP_TOLERANCE of the mean (plus the rounding of the printed times); without one the caller
 * must give the sample rate, or gets 'needs-sample-rate' back with the samples read. Text may arrive in
 * chunks of any size (CsvSignalReader); readCsvSignal reads a whole text.
 */
import type { InputError } from '../types.ts';
import { decimalsOf, guessDialect, isCommentLine, splitCells, type CsvDialect } from './csvCells.ts';
import { numberCell } from '../parse/typedNumber.ts';

/** Largest allowed departure of one time step from the mean step, as a fraction of the mean step. */
export const TIME_STEP_TOLERANCE = 1e-3;

/** A derived sample rate this close (relative) to a whole number of Hz is taken as that whole number. */
export const SAMPLE_RATE_SNAP = 1e-6;

/** How to read the text; everything is guessed when absent. */
export interface CsvReadOptions {
  /** 'samples': one value column; 'time-value': a time column in seconds and a value column. */
  layout?: 'auto' | 'samples' | 'time-value';
  /** 0-based column of the time (default 0). */
  timeColumn?: number;
  /** 0-based column of the values (default 0 for 'samples', 1 for 'time-value'). */
  valueColumn?: number;
  /** Sample rate in Hz, for a file without a time column (ignored when a time column is read). */
  sampleRate?: number;
  delimiter?: CsvDialect['delimiter'];
  decimal?: CsvDialect['decimal'];
}

/** A broken line: what was wrong, on which (1-based) line. */
export interface CsvError extends InputError {
  line: number;
}

/** How even the time column was. */
export interface TimeCheck {
  /** Mean step in seconds. */
  meanStep: number;
  /** Largest |step − meanStep| / meanStep found. */
  worstDeviation: number;
  /** 1-based line of the step that departed most. */
  worstLine: number;
  uniform: boolean;
}

/** A signal read from text. */
export interface CsvSignal {
  samples: Float64Array;
  /** Hz: from the time column, or as given. */
  sampleRate: number;
  /** Time of the first sample in seconds (0 without a time column). */
  startTime: number;
  /** Column names from the header line, if there was one. */
  header: string[] | null;
  timing: TimeCheck | null;
  notes: string[];
}

/** The outcome of reading a whole text. */
export type CsvSignalResult =
  | { status: 'ok'; signal: CsvSignal }
  | { status: 'needs-sample-rate'; samples: Float64Array; header: string[] | null; notes: string[] }
  | { status: 'error'; error: CsvError };

/** Samples (and times, with a time column) completed by one pushed piece of text. */
export interface CsvBlock {
  samples: Float64Array;
  times: Float64Array | null;
}

const EXPECTED_NUMBER = 'a decimal number such as -0.25, 3 or 1.5e-3';

/** A reader that takes text in chunks and returns the samples each chunk completes. */
export class CsvSignalReader {
  header: string[] | null = null;
  readonly notes: string[] = [];
  private dialect: CsvDialect | null = null;
  private timeCol = -1;
  private valueCol = 0;
  private tail = '';
  private line = 0;
  private count = 0;
  private firstTime = NaN;
  private lastTime = NaN;
  private minStep = Infinity;
  private maxStep = -Infinity;
  private minLine = 0;
  private maxLine = 0;
  private decimals = 0;
  private failure: CsvError | null = null;
  private readonly options: CsvReadOptions;

  constructor(options: CsvReadOptions = {}) {
    this.options = options;
  }

  /** True once a time column has been chosen (known after the first data line). */
  get hasTimeColumn(): boolean {
    return this.timeCol >= 0;
  }

  /** Reads the complete lines of this piece; the unfinished last line waits for the next piece. */
  push(text: string): { ok: true; value: CsvBlock } | { ok: false; error: CsvError } {
    if (this.failure) return { ok: false, error: this.failure };
    const all = this.tail + (this.line === 0 && this.tail === '' ? text.replace(/^\uFEFF/, '') : text);
    const cut = all.lastIndexOf('\n');
    this.tail = cut < 0 ? all : all.slice(cut + 1);
    return cut < 0 ? { ok: true, value: this.empty() } : this.lines(all.slice(0, cut).split('\n'));
  }

  /** Reads the last line and returns the timing check, once all text has been pushed. */
  finish():
    { ok: true; value: { block: CsvBlock; timing: TimeCheck | null } } | { ok: false; error: CsvError } {
    const r = this.lines(this.tail === '' ? [] : [this.tail]);
    this.tail = '';
    if (!r.ok) return r;
    if (this.count === 0) {
      return this.fail({
        message: 'The text holds no samples.',
        line: Math.max(1, this.line),
        expected: EXPECTED_NUMBER,
      });
    }
    return { ok: true, value: { block: r.value, timing: this.timing() } };
  }

  private empty(): CsvBlock {
    return { samples: new Float64Array(0), times: this.timeCol >= 0 ? new Float64Array(0) : null };
  }

  private fail(error: CsvError): { ok: false; error: CsvError } {
    this.failure = error;
    return { ok: false, error };
  }

  private lines(lines: string[]): { ok: true; value: CsvBlock } | { ok: false; error: CsvError } {
    const samples = new Float64Array(lines.length);
    const times = new Float64Array(this.timeCol >= 0 || this.dialect === null ? lines.length : 0);
    let n = 0;
    for (const raw of lines) {
      this.line++;
      const trimmed = raw.trim();
      if (trimmed === '' || isCommentLine(trimmed)) continue;
      if (this.dialect === null) {
        const d = guessDialect(trimmed, this.givenDialect());
        const first = splitCells(trimmed, d.delimiter)[0]!;
        if (Number.isNaN(numberCell(first, d.decimal))) {
          if (this.header === null) {
            this.header = splitCells(trimmed, d.delimiter);
            continue;
          }
        }
        this.dialect = d;
        const e = this.chooseColumns(splitCells(trimmed, d.delimiter).length);
        if (e) return this.fail(e);
      }
      const cells = splitCells(trimmed, this.dialect.delimiter);
      const need = Math.max(this.valueCol, this.timeCol) + 1;
      if (cells.length < need) {
        return this.fail({
          message: `Line ${this.line} has ${cells.length} column(s); column ${need} is read.`,
          line: this.line,
          expected: `at least ${need} columns separated by "${shown(this.dialect.delimiter)}"`,
        });
      }
      const v = numberCell(cells[this.valueCol]!, this.dialect.decimal);
      if (Number.isNaN(v)) return this.fail(notNumber(this.line, cells[this.valueCol]!, this.valueCol));
      if (this.timeCol >= 0) {
        const cell = cells[this.timeCol]!;
        const t = numberCell(cell, this.dialect.decimal);
        if (Number.isNaN(t)) return this.fail(notNumber(this.line, cell, this.timeCol));
        const e = this.step(t, cell);
        if (e) return this.fail(e);
        times[n] = t;
      }
      samples[n++] = v;
      this.count++;
    }
    return {
      ok: true,
      value: { samples: samples.subarray(0, n), times: this.timeCol >= 0 ? times.subarray(0, n) : null },
    };
  }

  private givenDialect(): Partial<CsvDialect> {
    const d: Partial<CsvDialect> = {};
    if (this.options.delimiter) d.delimiter = this.options.delimiter;
    if (this.options.decimal) d.decimal = this.options.decimal;
    return d;
  }

  private chooseColumns(columns: number): CsvError | null {
    const layout = this.options.layout ?? 'auto';
    const timed = layout === 'time-value' || (layout === 'auto' && columns >= 2);
    this.timeCol = timed ? (this.options.timeColumn ?? 0) : -1;
    this.valueCol = this.options.valueColumn ?? (timed ? (this.timeCol === 0 ? 1 : 0) : 0);
    if (timed && this.timeCol === this.valueCol) {
      return { message: `The time and value columns are both column ${this.valueCol + 1}.`, line: this.line };
    }
    const name = (c: number) => (this.header?.[c] ? ` ("${this.header[c]}")` : '');
    this.notes.push(
      timed
        ? `Read column ${this.timeCol + 1}${name(this.timeCol)} as time in seconds and column ` +
            `${this.valueCol + 1}${name(this.valueCol)} as the samples.`
        : `Read column ${this.valueCol + 1}${name(this.valueCol)} as the samples (no time column).`,
    );
    return null;
  }

  private step(t: number, cell: string): CsvError | null {
    this.decimals = Math.max(this.decimals, decimalsOf(cell, this.dialect!.decimal));
    if (this.count === 0) {
      this.firstTime = t;
    } else {
      const dt = t - this.lastTime;
      if (!(dt > 0)) {
        return {
          message: `Line ${this.line}: time ${t} is not after the previous time ${this.lastTime}.`,
          line: this.line,
          expected: 'times that increase from line to line',
        };
      }
      if (dt < this.minStep) [this.minStep, this.minLine] = [dt, this.line];
      if (dt > this.maxStep) [this.maxStep, this.maxLine] = [dt, this.line];
    }
    this.lastTime = t;
    return null;
  }

  private timing(): TimeCheck | null {
    if (this.timeCol < 0 || this.count < 2) return null;
    const meanStep = (this.lastTime - this.firstTime) / (this.count - 1);
    const low = (meanStep - this.minStep) / meanStep;
    const high = (this.maxStep - meanStep) / meanStep;
    // Each printed time is rounded to half a unit of its last digit, so a step may be off by one unit.
    const allowed = TIME_STEP_TOLERANCE + 10 ** -this.decimals / meanStep;
    const worstDeviation = Math.max(low, high);
    return {
      meanStep,
      worstDeviation,
      worstLine: high >= low ? this.maxLine : this.minLine,
      uniform: worstDeviation <= allowed,
    };
  }

  /** Sample count so far. */
  get sampleCount(): number {
    return this.count;
  }

  /** Time of the first sample (NaN before any, or without a time column). */
  get startTime(): number {
    return this.firstTime;
  }
}

function shown(d: string): string {
  return d === '\t' ? 'tab' : d === ' ' ? 'spaces' : d;
}

function notNumber(line: number, cell: string, column: number): CsvError {
  const what = cell === '' ? 'is empty' : `holds "${cell.length > 40 ? cell.slice(0, 40) + '…' : cell}"`;
  return {
    message: `Line ${line}, column ${column + 1} ${what}, not a number.`,
    line,
    expected: EXPECTED_NUMBER,
  };
}

/** The sample rate in Hz of a mean time step, snapped to a whole number of Hz when within SAMPLE_RATE_SNAP. */
export function sampleRateOfStep(meanStep: number): number {
  const fs = 1 / meanStep;
  const whole = Math.round(fs);
  return whole > 0 && Math.abs(fs - whole) <= SAMPLE_RATE_SNAP * fs ? whole : fs;
}

/** A note for a time column that is not uniform within the tolerance, or null when it is. */
export function timingNote(timing: TimeCheck | null): string | null {
  if (timing === null || timing.uniform) return null;
  return (
    `The time column is not evenly spaced: the step at line ${timing.worstLine} departs from the mean step ` +
    `(${timing.meanStep.toPrecision(6)} s) by ${(100 * timing.worstDeviation).toPrecision(3)} %, beyond the ` +
    `${100 * TIME_STEP_TOLERANCE} % accepted; the samples are filtered as if evenly spaced.`
  );
}

/** Reads a whole CSV/TSV text into a signal (see the module comment for what is accepted). */
export function readCsvSignal(text: string, options: CsvReadOptions = {}): CsvSignalResult {
  const reader = new CsvSignalReader(options);
  const first = reader.push(text);
  if (!first.ok) return { status: 'error', error: first.error };
  const end = reader.finish();
  if (!end.ok) return { status: 'error', error: end.error };
  const samples = new Float64Array(first.value.samples.length + end.value.block.samples.length);
  samples.set(first.value.samples);
  samples.set(end.value.block.samples, first.value.samples.length);
  const notes = [...reader.notes];
  const { timing } = end.value;
  if (reader.hasTimeColumn) {
    const note = timingNote(timing);
    if (note) notes.push(note);
    if (timing === null) {
      if (options.sampleRate === undefined)
        return { status: 'needs-sample-rate', samples, header: reader.header, notes };
      notes.push('One time value gives no step; the given sample rate is used.');
    }
    const sampleRate = timing ? sampleRateOfStep(timing.meanStep) : options.sampleRate!;
    return {
      status: 'ok',
      signal: { samples, sampleRate, startTime: reader.startTime, header: reader.header, timing, notes },
    };
  }
  if (options.sampleRate === undefined)
    return { status: 'needs-sample-rate', samples, header: reader.header, notes };
  if (!(options.sampleRate > 0)) {
    return {
      status: 'error',
      error: { message: `Sample rate ${options.sampleRate} Hz; it must be positive.`, line: 0 },
    };
  }
  return {
    status: 'ok',
    signal: {
      samples,
      sampleRate: options.sampleRate,
      startTime: 0,
      header: reader.header,
      timing: null,
      notes,
    },
  };
}
