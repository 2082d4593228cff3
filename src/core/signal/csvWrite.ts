/**
 * Signals as CSV/TSV text. Numbers are written in JavaScript's shortest round-trip form, so reading the
 * text back gives the same float64 values bit for bit.
 */

/** The header line for the given column names, ending in a newline. */
export function csvHeaderLine(names: readonly string[], delimiter: ',' | '\t' = ','): string {
  return names.join(delimiter) + '\n';
}

/** Rows start..start+count-1 of the columns (each an array of numbers), one line per row. */
export function csvRows(
  columns: readonly ArrayLike<number>[],
  start: number,
  count: number,
  delimiter: ',' | '\t' = ',',
): string {
  const lines = new Array<string>(count);
  for (let i = 0; i < count; i++) {
    let line = String(columns[0]![start + i]);
    for (let c = 1; c < columns.length; c++) line += delimiter + String(columns[c]![start + i]);
    lines[i] = line;
  }
  return count > 0 ? lines.join('\n') + '\n' : '';
}

/** Times t0 + k/fs in seconds for k = first..first+count-1. */
export function sampleTimes(first: number, count: number, sampleRate: number, startTime = 0): Float64Array {
  const t = new Float64Array(count);
  for (let i = 0; i < count; i++) t[i] = startTime + (first + i) / sampleRate;
  return t;
}

/** A whole signal as CSV: a time column in seconds (unless omitted) and one column per channel. */
export function writeCsvSignal(
  channels: readonly Float64Array[],
  sampleRate: number,
  options: { names?: readonly string[]; withTime?: boolean; startTime?: number; delimiter?: ',' | '\t' } = {},
): string {
  const withTime = options.withTime ?? true;
  const names =
    options.names ?? (channels.length === 1 ? ['value'] : channels.map((_, c) => `channel_${c + 1}`));
  const n = channels[0]?.length ?? 0;
  const columns = withTime
    ? [sampleTimes(0, n, sampleRate, options.startTime ?? 0), ...channels]
    : [...channels];
  const head = csvHeaderLine(withTime ? ['time_s', ...names] : names, options.delimiter);
  return head + csvRows(columns, 0, n, options.delimiter);
}
