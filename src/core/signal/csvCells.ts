/**
 * Cells of a delimited text line: the delimiter and decimal mark, guessed from the first data line unless
 * given. Cells are read as numbers by the one reader of typed numbers (parse/typedNumber.ts numberCell):
 * nothing that merely JavaScript's Number() would accept, such as "" or "0x1f".
 */

/** Cell separators read: comma, semicolon, tab, or runs of spaces. */
export type CsvDelimiter = ',' | ';' | '\t' | ' ';

/** How cells are separated and which mark starts the fraction. */
export interface CsvDialect {
  delimiter: CsvDelimiter;
  decimal: '.' | ',';
}

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

/** Digits after the decimal mark in a number cell (0 for integers and exponent forms are counted as read). */
export function decimalsOf(cell: string, decimal: '.' | ','): number {
  const m = new RegExp(`\\${decimal}(\\d*)`).exec(cell);
  const exp = /[eE]([+-]?\d+)/.exec(cell);
  return Math.max(0, (m?.[1]?.length ?? 0) - (exp ? Number(exp[1]) : 0));
}
