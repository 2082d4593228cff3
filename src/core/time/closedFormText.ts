/**
 * Compact text for a closed-form response, e.g. "0.5·(0.8)^n + 1.2·n·(0.8)^n + 0.6·(0.9)^n·cos(0.52n + 1.1)".
 * A conjugate pair of modes c·p^n + c̄·p̄^n is written in real form 2|c|·|p|^n·cos(∠p·n + ∠c); angles are
 * in radians (per sample for the frequency).
 */
import type { ClosedForm, Term } from './closedForm.ts';

/** Modes whose coefficient is below this fraction of the largest one are left out of the text. */
export const NEGLIGIBLE_TERM_RATIO = 1e-12;

/** A number to `digits` significant digits, trailing zeros dropped. */
function num(v: number, digits: number): string {
  const s = String(Number(v.toPrecision(digits)));
  return s === '-0' ? '0' : s;
}

/** n^k factor text, empty for k = 0. */
function nPower(k: number): string {
  return k === 0 ? '' : k === 1 ? 'n' : `n^${k}`;
}

/** Joins factors with '·', dropping empty ones. */
function product(...factors: string[]): string {
  return factors.filter((f) => f !== '').join('·');
}

/** One mode as text, e.g. "-0.4·n·(0.5)^n" or "(0.3+0.2j)·(0.84∠0.59)^n" (angle in radians). */
export function describeTerm(t: Term, digits = 4): string {
  const { coefficient: c, pole: p } = t;
  const coef = c.im === 0 ? num(c.re, digits) : `(${complexText(c.re, c.im, digits)})`;
  let base: string;
  if (p.im === 0) base = p.re === 1 ? '' : `(${num(p.re, digits)})^n`;
  else base = `(${num(Math.hypot(p.re, p.im), digits)}∠${num(Math.atan2(p.im, p.re), digits)})^n`;
  return product(coef, nPower(t.power), base);
}

function complexText(re: number, im: number, digits: number): string {
  const sign = im < 0 ? '-' : '+';
  return `${num(re, digits)}${sign}${num(Math.abs(im), digits)}j`;
}

/** A real mode: a conjugate pair in cosine form, or a real pole term; undefined for the lower mate. */
function realText(t: Term, digits: number): { value: number; text: string } | undefined {
  const { coefficient: c, pole: p } = t;
  if (p.im < 0) return undefined;
  if (p.im === 0) {
    return {
      value: c.re,
      text: product(
        num(Math.abs(c.re), digits),
        nPower(t.power),
        p.re === 1 ? '' : `(${num(p.re, digits)})^n`,
      ),
    };
  }
  const amp = 2 * Math.hypot(c.re, c.im);
  const r = Math.hypot(p.re, p.im);
  const phase = Math.atan2(c.im, c.re);
  const w = num(Math.atan2(p.im, p.re), digits);
  const arg = phase === 0 ? `${w}n` : `${w}n ${phase < 0 ? '-' : '+'} ${num(Math.abs(phase), digits)}`;
  const decay = r === 1 ? '' : `(${num(r, digits)})^n`;
  return { value: amp, text: product(num(amp, digits), nPower(t.power), decay, `cos(${arg})`) };
}

/**
 * The whole response as one line: modes (conjugate pairs combined), then the finite part as
 * d·δ[n−j] terms. Assumes a real system (conjugate modes present in pairs); "0" when everything vanishes.
 */
export function formatClosedForm(cf: ClosedForm, digits = 4): string {
  const largest = Math.max(0, ...cf.terms.map((t) => Math.hypot(t.coefficient.re, t.coefficient.im)));
  const parts: { value: number; text: string }[] = [];
  for (const t of cf.terms) {
    if (Math.hypot(t.coefficient.re, t.coefficient.im) <= NEGLIGIBLE_TERM_RATIO * largest) continue;
    const part = realText(t, digits);
    if (part) parts.push(part);
  }
  cf.direct.forEach((d, j) => {
    if (d !== 0)
      parts.push({ value: d, text: product(num(Math.abs(d), digits), j === 0 ? 'δ[n]' : `δ[n-${j}]`) });
  });
  if (parts.length === 0) return '0';
  return parts
    .map((p, i) => {
      const negative = p.value < 0;
      if (i === 0) return negative ? `-${p.text}` : p.text;
      return `${negative ? '-' : '+'} ${p.text}`;
    })
    .join(' ');
}
