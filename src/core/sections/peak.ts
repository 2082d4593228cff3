/**
 * Peak magnitude of a cascade's frequency response, and of every partial cascade H₁…H_i at once, on a dense
 * grid with the pole angles added. The partial cascades share one grid and one running sum of
 * log-magnitudes, so all N peaks cost about as much as N single sections (the peak of each is then refined
 * locally), instead of N whole cascades.
 */
import type { Root, Section } from '../types.ts';
import { sectionsToZpk } from '../system/index.ts';

/**
 * Evenly spaced points on [0, π] used to find a response peak. Peaks of sharp resonances sit at (or within a
 * bandwidth of) their pole angles, which are added to the grid and refined locally, so 4096 points suffice
 * even for pole radii of 0.999.
 */
export const PEAK_GRID_POINTS = 4096;

/** Golden-section steps used to refine the best grid point; each shrinks the bracket by 0.618. */
export const PEAK_REFINE_STEPS = 40;

/** One section in product form: log|k| and its roots (a root with im > 0 stands for its conjugate too). */
interface SectionFactors {
  logGain: number;
  zeros: Root[];
  poles: Root[];
}

function factorsOf(s: Section): SectionFactors {
  const z = sectionsToZpk([s]);
  return { logGain: Math.log(Math.abs(z.gain)), zeros: z.zeros, poles: z.poles };
}

/** Π|e^{iω} − r|² over the roots (conjugates and multiplicities included), at c = cos ω, s = sin ω. */
function squaredDistances(c: number, s: number, roots: readonly Root[]): number {
  let p = 1;
  for (const r of roots) {
    const dr = c - r.re;
    let d = dr * dr + (s - r.im) * (s - r.im);
    if (r.im !== 0) d *= dr * dr + (s + r.im) * (s + r.im);
    p *= r.multiplicity === 1 ? d : d ** r.multiplicity;
  }
  return p;
}

/** Σ log|e^{iω} − r|² over the roots: the slow path for roots so large or small that a product overflows. */
function logSquaredDistances(c: number, s: number, roots: readonly Root[]): number {
  let v = 0;
  for (const r of roots) {
    const dr = c - r.re;
    let d = Math.log(dr * dr + (s - r.im) * (s - r.im));
    if (r.im !== 0) d += Math.log(dr * dr + (s + r.im) * (s + r.im));
    v += d * r.multiplicity;
  }
  return v;
}

/** log|H(e^{iω})| of one section in product form, at c = cos ω, s = sin ω (one logarithm per section). */
function logMagnitude(f: SectionFactors, c: number, s: number): number {
  const num = squaredDistances(c, s, f.zeros);
  const den = squaredDistances(c, s, f.poles);
  if (num > 1e-280 && num < 1e280 && den > 1e-280 && den < 1e280)
    return f.logGain + 0.5 * Math.log(num / den);
  return f.logGain + 0.5 * (logSquaredDistances(c, s, f.zeros) - logSquaredDistances(c, s, f.poles));
}

/** log|F(e^{iω})| of a cascade of sections in product form. */
function logMagnitudeOf(factors: readonly SectionFactors[], w: number): number {
  const c = Math.cos(w);
  const s = Math.sin(w);
  let v = 0;
  for (const f of factors) v += logMagnitude(f, c, s);
  return v;
}

/** Every ω (radians per sample) the peak search starts from: an even grid plus the angles of all poles. */
function searchGrid(factors: readonly SectionFactors[]): Float64Array {
  const angles: number[] = [];
  for (let i = 0; i < PEAK_GRID_POINTS; i++) angles.push((Math.PI * i) / (PEAK_GRID_POINTS - 1));
  for (const f of factors) for (const p of f.poles) angles.push(Math.abs(Math.atan2(p.im, p.re)));
  angles.sort((a, b) => a - b);
  return Float64Array.from(angles);
}

/** Golden-section search (Kiefer 1953) of f's largest value on [lo, hi], from a best point known so far. */
function refine(
  f: (w: number) => number,
  lo: number,
  hi: number,
  best: { value: number; omega: number },
): { value: number; omega: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let c = hi - g * (hi - lo);
  let d = lo + g * (hi - lo);
  let fc = f(c);
  let fd = f(d);
  for (let k = 0; k < PEAK_REFINE_STEPS && hi - lo > 1e-15; k++) {
    if (fc > fd) {
      [hi, d, fd] = [d, c, fc];
      c = hi - g * (hi - lo);
      fc = f(c);
    } else {
      [lo, c, fc] = [c, d, fd];
      d = lo + g * (hi - lo);
      fd = f(d);
    }
  }
  let out = best;
  for (const [w, v] of [
    [c, fc],
    [d, fd],
  ] as const)
    if (v > out.value) out = { value: v, omega: w };
  return out;
}

/**
 * Largest |F_i(e^{iω})| (linear) and its ω (radians per sample) of every partial cascade F_i = H₁…H_i,
 * i = 1..N in cascade order. The grid holds the pole angles of the whole cascade, a superset of each
 * partial cascade's, so a partial peak is found at least as well as on its own grid.
 */
export function partialCascadePeaks(sections: readonly Section[]): { peak: number; omega: number }[] {
  return peaks(sections, true);
}

/** The peaks of every partial cascade (all) or of the whole cascade only, each refined from the shared grid. */
function peaks(sections: readonly Section[], all: boolean): { peak: number; omega: number }[] {
  const factors = sections.map(factorsOf);
  const grid = searchGrid(factors);
  const n = grid.length;
  const cos = grid.map(Math.cos);
  const sin = grid.map(Math.sin);
  const acc = new Float64Array(n);
  const out: { peak: number; omega: number }[] = [];
  for (let i = 0; i < factors.length; i++) {
    const f = factors[i]!;
    let best = 0;
    for (let k = 0; k < n; k++) {
      acc[k]! += logMagnitude(f, cos[k]!, sin[k]!);
      if (acc[k]! > acc[best]! || Number.isNaN(acc[best]!)) best = k;
    }
    if (!all && i < factors.length - 1) continue;
    const prefix = factors.slice(0, i + 1);
    const at = (w: number) => logMagnitudeOf(prefix, w);
    const found = refine(at, grid[Math.max(0, best - 1)]!, grid[Math.min(n - 1, best + 1)]!, {
      value: acc[best]!,
      omega: grid[best]!,
    });
    out.push({ peak: Math.exp(found.value), omega: found.omega });
  }
  return out;
}

/** Largest |H(e^{iω})| of the cascade (linear) and the ω (radians per sample) where it occurs. */
export function peakMagnitude(sections: readonly Section[]): { peak: number; omega: number } {
  if (sections.length === 0) return { peak: 1, omega: 0 };
  return peaks(sections, false)[0]!;
}
