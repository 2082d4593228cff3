/** The transfer function at single points. */
import type { Complex, Zpk } from '../types.ts';
import type { RadPerSample } from '../units.ts';

/** H(z) = k·Π(z − zᵢ)/Π(z − pᵢ) at the complex point z = re + i·im, conjugates and multiplicities included. */
export function evalZpkAt(zpk: Zpk, re: number, im: number): Complex {
  let hr = zpk.gain;
  let hi = 0;
  const apply = (cr: number, ci: number, divide: boolean) => {
    const fr = re - cr;
    const fi = im - ci;
    if (divide) {
      const d = fr * fr + fi * fi;
      [hr, hi] = [(hr * fr + hi * fi) / d, (hi * fr - hr * fi) / d];
    } else {
      [hr, hi] = [hr * fr - hi * fi, hr * fi + hi * fr];
    }
  };
  for (const [roots, divide] of [
    [zpk.zeros, false],
    [zpk.poles, true],
  ] as const) {
    for (const r of roots) {
      for (let m = 0; m < r.multiplicity; m++) {
        apply(r.re, r.im, divide);
        if (r.im !== 0) apply(r.re, -r.im, divide);
      }
    }
  }
  return { re: hr, im: hi };
}

/** H(e^{iω}) at one frequency ω in radians per sample. */
export function responseAt(zpk: Zpk, omega: RadPerSample): Complex {
  return evalZpkAt(zpk, Math.cos(omega), Math.sin(omega));
}
