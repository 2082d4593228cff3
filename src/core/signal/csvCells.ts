/**
 * Cells of a delimited text line: the delimiter and decimal mark, guessed from the first data line unless
 * given, and strict number reading (plain decimals with an optional exponent; nothing that merely
 * JavaScript's Number() would accept, such as "" or "0x1f").
 */

/** Cell separators read: comma, semicolon, tab, or runs of spaces. */
export type CsvDelimiter = ',' | ';' | '\t' | ' ';

/** How cells are separated and which mark starts the fraction. */
export interface CsvDialect {
  delimiter: CsvDelimiter;
  decimal: '.' | ',';
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Lines that are skipped wherever they appear: starting with #, % or //. */
export function isCommentLine(trimmed: string): boolean {
  return trimmed.startsWith('#') || trimmed.startsWith('%') || trimmed.startsWith('//');
}

/**
 * Guesses the dialect from a data line: tab, then semicolon, then comma, then spaces, as the separator; a
 * decimal comma when the separator is not a comma and a cell looks like "0,25".
 */
export function guessDialect(line: string, given: Partial<CsvDialect> = {}): CsvDialect {
  const delimiter: CsvDelimiter =
    given.delimiter ??
    (line.includes('\t') ? '\t' : line.includes(';') ? ';' : line.includes(',') ? ',' : ' ');
  const decimal = given.decimal ?? (delimiter !== ',' && /\d,\d/.test(line) ? ',' : '.');
  return { delimiter, decimal };
}

/** Splits a trimmed line into trimmed cells, dropping surrounding double quotes and trailing empty cells. */
export function splitCells(trimmed: string, delimiter: CsvDelimiter): string[] {
  const cells = delimiter === ' ' ? trimmed.split(/\s+/) : trimmed.split(delimiter).map((c) => c.trim());
  while (cells.length > 1 && cells[cells.length - 1] === '') cells.pop();
  return cells.map((c) =>
    c.length >= 2 && c.startsWith('"') && c.endsWith('"') ? c.slice(1, -1).trim() : c,
  );
}

/** The number a cell holds, or NaN when it is not a plain decimal number in the dialect. */
export function readNumberCell(cell: string, decimal: '.' | ','): number {
  const text = decimal === ',' ? cell.replace(',', '.') : cell;
  return NUMBER.test(text) ? Number(text) : NaN;
}

/** Digits after the decimal mark in a number cell (0 for integers and exponent forms are counted as read). */
export function decimalsOf(cell: string, decimal: '.' | ','): number {
  const m = new RegExp(`\\${decimal}(\\d*)`).exec(cell);
  const exp = /[eE]([+-]?\d+)/.exec(cell);
  return Math.max(0, (m?.[1]?.length ?? 0) - (exp ? Number(exp[1]) : 0));
}
