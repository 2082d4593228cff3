/**
 * The one reader of numbers people type: every number field of the page, the CLI's flags, the CSV reader
 * and the typed lists (samples, frequencies, harmonics) read through here, so one text means one number
 * everywhere.
 *
 * Policy, one number in a field (readNumber):
 * - white space around the number is ignored; a sign may be +, - or the Unicode minus −;
 * - the decimal mark is a point or a comma: 0.5 and 0,5 are both one half; one mark at most;
 * - a comma followed by exactly three digits after one to three leading digits (1,000 or 48,000) is refused
 *   as ambiguous, since it may group thousands: type 1000 for a thousand or 1.0 for one;
 * - an exponent is e or E with an optional sign: 1e-3, 2.5E6, 1e−3;
 * - a simple fraction is two such numbers around a slash: 1/3, −2,5/4, 1e3/7 (the divisor unsigned, not 0);
 * - a field that has a unit accepts it after the number, with or without a space, in the spellings that
 *   field lists (a frequency field: 1.2 kHz, 1200Hz); a bare number is in the field's own unit;
 * - nothing else: no thousands separators, no words (inf, NaN, pi), no results beyond the double range.
 * Policy, a list of numbers (readNumberList): items are separated by commas, semicolons or white space, so
 * a comma always separates and the decimal mark is a point; each item follows the rules above otherwise
 * (signs, exponents, fractions), without units (the list's unit is shown beside it).
 * CSV cells (numberCell) follow the file's dialect: a point, or a comma when cells are separated by
 * semicolons or tabs; the CSV reader finds the dialect.
 */

/** A unit a field accepts after a number: its spelling and what one of it is in the field's own unit. */
export interface TypedUnit {
  spelling: string;
  factor: number;
}

/** The units fields accept, by the unit the field shows. */
export const TYPED_UNITS = {
  Hz: [
    { spelling: 'Hz', factor: 1 },
    { spelling: 'hz', factor: 1 },
    { spelling: 'kHz', factor: 1e3 },
    { spelling: 'khz', factor: 1e3 },
    { spelling: 'KHz', factor: 1e3 },
    { spelling: 'MHz', factor: 1e6 },
  ],
  dB: [
    { spelling: 'dB', factor: 1 },
    { spelling: 'db', factor: 1 },
  ],
  s: [
    { spelling: 's', factor: 1 },
    { spelling: 'ms', factor: 1e-3 },
  ],
  octaves: [{ spelling: 'octaves', factor: 1 }],
  samples: [{ spelling: 'samples', factor: 1 }],
  bits: [{ spelling: 'bits', factor: 1 }],
  '°': [
    { spelling: '°', factor: 1 },
    { spelling: 'deg', factor: 1 },
  ],
  rad: [{ spelling: 'rad', factor: 1 }],
} as const satisfies Record<string, readonly TypedUnit[]>;

export type TypedUnitName = keyof typeof TYPED_UNITS;

/** What a field reads besides plain numbers. */
export interface NumberOptions {
  /** The field's unit: the spellings of TYPED_UNITS[unit] may follow the number. */
  unit?: TypedUnitName;
  /** What a bare number is worth in the field's unit (e.g. 1000 when a Hz field shows kHz). Default 1. */
  bareFactor?: number;
}

/** A number read, or what was wrong and what is accepted. */
export type NumberReading = { ok: true; value: number } | { ok: false; message: string; expected: string };

/** A list read, or the first item that is not a number (0-based index) and what is accepted. */
export type NumberListReading =
  { ok: true; values: number[] } | { ok: false; message: string; expected: string; index: number };

/** What a single field accepts, as shown in messages. */
export const NUMBER_EXPECTED = 'a number such as 0.5 (or 0,5), −2, 1e-3 or 1/3';
/** What a list accepts, as shown in messages. */
export const LIST_EXPECTED =
  'numbers separated by commas, spaces or semicolons, with a point for decimals, e.g. 0.5, −0.25, 1e-3, 1/3';

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const DECIMAL = /^(\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?$/;
const THOUSANDS = /^[1-9]\d{0,2},\d{3}$/;
const UNIT = /^(.*?[\d.,])\s*([A-Za-z°µ]+)$/;

type Parts = { ok: true; value: number } | { ok: false; why: 'syntax' | 'zero' | 'thousands' };

/**
 * One decimal or simple fraction with an optional sign, no units: its value, or why it is not one. Marks:
 * which decimal marks a part may use; `thousands`: refuse "1,000" as ambiguous.
 */
function parts(text: string, marks: '.' | 'either', thousands: boolean): Parts {
  const t = text.replace(/\u2212/g, '-').replace(/\s*\/\s*/, '/');
  const negative = t[0] === '-';
  const body = t[0] === '-' || t[0] === '+' ? t.slice(1) : t;
  const slash = body.indexOf('/');
  const sides = slash < 0 ? [body] : [body.slice(0, slash), body.slice(slash + 1)];
  const values: number[] = [];
  for (const s of sides) {
    if (!DECIMAL.test(s) || (marks === '.' && s.includes(','))) return { ok: false, why: 'syntax' };
    if (thousands && THOUSANDS.test(s)) return { ok: false, why: 'thousands' };
    values.push(Number(s.replace(',', '.')));
  }
  if (values.length === 2 && values[1] === 0) return { ok: false, why: 'zero' };
  const v = values.length === 2 ? values[0]! / values[1]! : values[0]!;
  return { ok: true, value: negative ? -v : v };
}

/** The units of a field as a reader would list them: "Hz or kHz or MHz". */
function unitWords(unit: TypedUnitName): string {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const u of TYPED_UNITS[unit]) {
    const key = u.spelling.toLowerCase();
    if (!seen.has(key)) out.push(u.spelling);
    seen.add(key);
  }
  return out.join(' or ');
}

/** Reads one number typed into a field (see the policy above). */
export function readNumber(text: string, options: NumberOptions = {}): NumberReading {
  const t = text.trim();
  const expected = options.unit ? `${NUMBER_EXPECTED}, in ${unitWords(options.unit)}` : NUMBER_EXPECTED;
  const fail = (message: string, what = expected): NumberReading => ({ ok: false, message, expected: what });
  if (t === '') return fail('nothing is typed');
  let numberText = t;
  let factor = options.bareFactor ?? 1;
  const unit = UNIT.exec(t);
  if (unit) {
    const known: readonly TypedUnit[] = options.unit ? TYPED_UNITS[options.unit] : [];
    const found = known.find((u) => u.spelling === unit[2]);
    if (!found)
      return fail(
        options.unit
          ? `"${t}": the unit "${unit[2]}" is not accepted here`
          : `"${t}" is not a number (this field takes no unit)`,
      );
    numberText = unit[1]!.trim();
    factor = found.factor;
  }
  const r = parts(numberText, 'either', true);
  if (!r.ok) {
    if (r.why === 'zero') return fail(`"${t}" divides by zero`);
    if (r.why === 'thousands') {
      const digits = /[1-9]\d{0,2},\d{3}/.exec(numberText)![0];
      return fail(
        `"${t}" is ambiguous: a comma before three digits may group thousands`,
        `${digits.replace(',', '')} for a thousand-fold, or ${digits.replace(',', '.')} with a point`,
      );
    }
    return fail(`"${t}" is not a number`);
  }
  const value = r.value * factor;
  if (!Number.isFinite(value)) return fail(`"${t}" is too large`, 'a number within ±1.8e308');
  return { ok: true, value };
}

/** Reads a list of numbers (see the policy above); an empty list is an error. */
export function readNumberList(text: string): NumberListReading {
  const items = text.split(/[\s,;]+/).filter((s) => s !== '');
  if (items.length === 0)
    return { ok: false, message: 'nothing is typed', expected: LIST_EXPECTED, index: -1 };
  const values: number[] = [];
  for (let i = 0; i < items.length; i++) {
    const r = parts(items[i]!, '.', false);
    if (!r.ok || !Number.isFinite(r.value))
      return {
        ok: false,
        message:
          r.ok || r.why !== 'zero'
            ? `item ${i + 1}, "${items[i]}", is not a number`
            : `item ${i + 1}, "${items[i]}", divides by zero`,
        expected: LIST_EXPECTED,
        index: i,
      };
    values.push(r.value);
  }
  return { ok: true, values };
}

/**
 * The number a CSV cell holds, or NaN when it holds none (see the policy above). In a file with a decimal
 * comma a point is read as a decimal mark too. Plain decimals take the fast path: one regular expression.
 */
export function numberCell(cell: string, decimal: '.' | ','): number {
  const v = PLAIN.test(cell) ? Number(cell) : slowCell(cell, decimal);
  // v − v is 0 only for a finite v (NaN and ±Infinity give NaN).
  return v - v === 0 ? v : NaN;
}

/** A cell that is not a plain decimal: a comma, a Unicode minus, a fraction, or no number at all. */
function slowCell(cell: string, decimal: '.' | ','): number {
  const r = parts(cell, decimal === ',' ? 'either' : '.', false);
  return r.ok ? r.value : NaN;
}
