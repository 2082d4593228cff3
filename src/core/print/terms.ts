/** Number and term formatting shared by the printers. */

/** Printer options. */
export interface PrintOptions {
  /** Significant digits for display; omitted, numbers print in the shortest form that reads back exactly. */
  digits?: number;
}

/** x as text: String(x) (shortest exact round trip), or rounded to opts.digits significant digits. */
export function formatNumber(x: number, opts: PrintOptions = {}): string {
  const d = opts.digits;
  const v = d === undefined ? x : Number(x.toPrecision(Math.min(100, Math.max(1, Math.round(d)))));
  return Object.is(v, -0) ? '0' : String(v);
}

/** A coefficient times a symbol (body), e.g. 1.6 and 'z^2'; body '' is a constant. */
export interface Term {
  coef: number;
  body: string;
}

/**
 * Joins terms into 'c1 b1 - c2 b2 + ...', skipping zero coefficients and writing a unit coefficient as its
 * sign only; `glue` goes between a coefficient and its symbol. All-zero gives '0'.
 */
export function joinTerms(terms: readonly Term[], opts: PrintOptions, glue = ''): string {
  let out = '';
  for (const { coef, body } of terms) {
    if (coef === 0) continue;
    const mag = formatNumber(Math.abs(coef), opts);
    const text = body === '' ? mag : mag === '1' ? body : `${mag}${glue}${body}`;
    if (out === '') out = coef < 0 ? `-${text}` : text;
    else out += coef < 0 ? ` - ${text}` : ` + ${text}`;
  }
  return out === '' ? '0' : out;
}

/** Copy without trailing zeros (keeping at least one value): b/a arrays in z^-1 padded by others. */
export function trimTrailingZeros(p: readonly number[]): number[] {
  let e = p.length;
  while (e > 1 && p[e - 1] === 0) e--;
  return p.slice(0, e);
}
