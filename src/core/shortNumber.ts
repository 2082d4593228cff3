/** A number for messages and notes: `digits` significant digits, trailing zeros dropped ("0.5", "1e-7"). */
export function shortNumber(x: number, digits: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(digits))) : String(x);
}
