/**
 * Equiripple linear-phase FIR by the Parks–McClellan method: the Remez exchange on a dense frequency grid
 * finds the amplitude whose weighted error over the bands has the smallest largest value. The grid follows
 * the Parks–McClellan program's (16 points per coefficient, band edges on the grid), so on the same bands the
 * discrete problem and its unique answer are the same.
 *
 * The four linear-phase types write the amplitude as Q(f)·P(f), P(f) = Σ c_k cos(2πkf) a polynomial in
 * x = cos 2πf: symmetric odd taps Q = 1, symmetric even taps Q = cos πf, antisymmetric odd taps Q = sin 2πf,
 * antisymmetric even taps Q = sin πf; the exchange then approximates D/Q with weight W·Q by P.
 */
import { checkBands, type FirBand } from './bands.ts';

/** What the amplitude approximates: a band response, a differentiator (gain ∝ f) or a Hilbert transformer. */
export type RemezKind = 'bands' | 'differentiator' | 'hilbert';

/** Grid points per coefficient, as the Parks–McClellan program uses by default. */
export const REMEZ_GRID_DENSITY = 16;
/** Exchanges before giving up. */
export const REMEZ_MAX_ITERATIONS = 100;

/** The taps and how the exchange went. */
export interface RemezResult {
  taps: Float64Array;
  /** The weighted error's largest value (the ripple of a weight-1 band). */
  deviation: number;
  /** Whether the extremal set stopped changing within REMEZ_MAX_ITERATIONS. */
  converged: boolean;
  iterations: number;
}

interface Grid {
  f: Float64Array;
  x: Float64Array;
  d: Float64Array;
  w: Float64Array;
  /** Index of each point's band, so extrema are sought within a band. */
  band: Int32Array;
  /** The type's factor Q(f). */
  q: Float64Array;
}

/** The dense grid with the reduced desired response D/Q and weight W·Q. */
function makeGrid(taps: number, bands: readonly FirBand[], kind: RemezKind, n: number): Grid {
  const neg = kind !== 'bands';
  const odd = taps % 2 === 1;
  const delf = 0.5 / (REMEZ_GRID_DENSITY * n);
  const f: number[] = [];
  const bandOf: number[] = [];
  for (const [i, b] of bands.entries()) {
    let t = i === 0 && neg && b.lo < delf ? delf : b.lo;
    const start = f.length;
    while (t <= b.hi) {
      f.push(t);
      bandOf.push(i);
      t += delf;
    }
    if (f.length === start) {
      f.push(b.hi);
      bandOf.push(i);
    } else f[f.length - 1] = b.hi;
  }
  // a type that is 0 at fs/2 (symmetric even, antisymmetric odd) cannot use a point next to it
  if (neg === odd && f[f.length - 1]! > 0.5 - delf) {
    f.pop();
    bandOf.pop();
  }
  const m = f.length;
  const out: Grid = {
    f: Float64Array.from(f),
    x: new Float64Array(m),
    d: new Float64Array(m),
    w: new Float64Array(m),
    band: Int32Array.from(bandOf),
    q: new Float64Array(m),
  };
  for (let j = 0; j < m; j++) {
    const fj = f[j]!;
    const b = bands[bandOf[j]!]!;
    const along = b.hi > b.lo ? (fj - b.lo) / (b.hi - b.lo) : 0;
    let d = kind === 'differentiator' ? b.from * fj : b.from + (b.to - b.from) * along;
    // a differentiator's weight falls as 1/f, so the error is relative to the gain asked
    let w = kind === 'differentiator' && b.from > 1e-4 ? b.weight / fj : b.weight;
    const q = !neg
      ? odd
        ? 1
        : Math.cos(Math.PI * fj)
      : odd
        ? Math.sin(2 * Math.PI * fj)
        : Math.sin(Math.PI * fj);
    d /= q;
    w *= q;
    out.x[j] = Math.cos(2 * Math.PI * fj);
    out.d[j] = d;
    out.w[j] = w;
    out.q[j] = q;
  }
  return out;
}

/** Interpolation through the reference: δ, and P in barycentric form through its first n points. */
interface Interpolant {
  delta: number;
  xs: Float64Array;
  ys: Float64Array;
  bw: Float64Array;
}

function interpolate(g: Grid, ref: Int32Array): Interpolant {
  const r = ref.length; // n + 1
  const logA = new Float64Array(r);
  const sign = new Float64Array(r);
  for (let k = 0; k < r; k++) {
    let l = 0;
    let s = 1;
    const xk = g.x[ref[k]!]!;
    for (let i = 0; i < r; i++) {
      if (i === k) continue;
      const diff = xk - g.x[ref[i]!]!;
      l -= Math.log(Math.abs(diff));
      if (diff < 0) s = -s;
    }
    logA[k] = l;
    sign[k] = s;
  }
  let top = -Infinity;
  for (let k = 0; k < r; k++) top = Math.max(top, logA[k]!);
  let num = 0;
  let den = 0;
  const a = new Float64Array(r);
  for (let k = 0; k < r; k++) {
    a[k] = sign[k]! * Math.exp(logA[k]! - top);
    num += a[k]! * g.d[ref[k]!]!;
    den += (a[k]! * (k % 2 === 0 ? 1 : -1)) / g.w[ref[k]!]!;
  }
  const delta = num / den;
  const n = r - 1;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const bw = new Float64Array(n);
  const xLast = g.x[ref[n]!]!;
  for (let k = 0; k < n; k++) {
    const j = ref[k]!;
    xs[k] = g.x[j]!;
    ys[k] = g.d[j]! - ((k % 2 === 0 ? 1 : -1) * delta) / g.w[j]!;
    bw[k] = a[k]! * (xs[k]! - xLast);
  }
  return { delta, xs, ys, bw };
}

/** P(x) from the barycentric form. */
function evaluate(p: Interpolant, x: number): number {
  let num = 0;
  let den = 0;
  for (let k = 0; k < p.xs.length; k++) {
    const dx = x - p.xs[k]!;
    if (dx === 0) return p.ys[k]!;
    const t = p.bw[k]! / dx;
    num += t * p.ys[k]!;
    den += t;
  }
  return num / den;
}

/** The next reference: the error's alternating extrema, at least as large as |δ|, n + 1 of them. */
function nextReference(g: Grid, e: Float64Array, ref: Int32Array, delta: number): Int32Array | undefined {
  const m = e.length;
  const floor = Math.abs(delta) * (1 - 1e-12);
  const candidate = new Uint8Array(m);
  for (const j of ref) candidate[j] = 1;
  for (let j = 0; j < m; j++) {
    const v = e[j]!;
    if (Math.abs(v) < floor) continue;
    const prev = j > 0 && g.band[j - 1] === g.band[j] ? e[j - 1]! : NaN;
    const next = j < m - 1 && g.band[j + 1] === g.band[j] ? e[j + 1]! : NaN;
    const up = v > 0 && !(prev > v) && !(next > v);
    const down = v < 0 && !(prev < v) && !(next < v);
    if (up || down) candidate[j] = 1;
  }
  const picked: number[] = [];
  for (let j = 0; j < m; j++) {
    if (!candidate[j]) continue;
    const last = picked[picked.length - 1];
    if (last !== undefined && Math.sign(e[last]!) === Math.sign(e[j]!)) {
      if (Math.abs(e[j]!) > Math.abs(e[last]!)) picked[picked.length - 1] = j;
    } else picked.push(j);
  }
  // too many: drop the smaller end (alternation is kept)
  while (picked.length > ref.length) {
    if (Math.abs(e[picked[0]!]!) < Math.abs(e[picked[picked.length - 1]!]!)) picked.shift();
    else picked.pop();
  }
  // fewer alternations than the reference has cannot happen in exact arithmetic: report no progress
  return picked.length === ref.length ? Int32Array.from(picked) : undefined;
}

/** The taps from P's coefficients c_k (of cos 2πkf) for the symmetry and parity. */
function tapsFromCosines(c: Float64Array, taps: number, neg: boolean): Float64Array {
  const n = c.length;
  const at = (k: number) => (k >= 0 && k < n ? c[k]! : 0);
  const h = new Float64Array(taps);
  const odd = taps % 2 === 1;
  const mid = (taps - 1) / 2;
  if (!neg && odd) {
    h[mid] = at(0);
    for (let k = 1; k < n; k++) h[mid - k] = h[mid + k] = at(k) / 2;
  } else if (!neg) {
    // cos(πf)·Σ c_k cos(2πkf) in the basis cos(2π(m + ½)f)
    for (let m = 0; m < taps / 2; m++) {
      const b = (at(m) + at(m + 1)) / 2 + (m === 0 ? at(0) / 2 : 0);
      h[taps / 2 - 1 - m] = h[taps / 2 + m] = b / 2;
    }
  } else if (odd) {
    // sin(2πf)·Σ c_k cos(2πkf) in the basis sin(2πmf), m ≥ 1; H = j·A·e^{−jωM}
    for (let m = 1; m <= mid; m++) {
      const g = (at(m - 1) - at(m + 1)) / 2 + (m === 1 ? at(0) / 2 : 0);
      h[mid - m] = g / 2;
      h[mid + m] = -g / 2;
    }
  } else {
    for (let m = 0; m < taps / 2; m++) {
      const g = (at(m) - at(m + 1)) / 2 + (m === 0 ? at(0) / 2 : 0);
      h[taps / 2 - 1 - m] = g / 2;
      h[taps / 2 + m] = -g / 2;
    }
  }
  return h;
}

/** The Remez exchange from an evenly spread reference whose points sit `shift` of a step further on. */
function exchange(g: Grid, n: number, shift: number) {
  const m = g.f.length;
  let ref: Int32Array = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) ref[j] = Math.min(m - 2, Math.floor(((j + shift) * (m - 1)) / n));
  ref[n] = m - 1;
  for (let j = 1; j <= n; j++) if (ref[j]! <= ref[j - 1]!) ref[j] = ref[j - 1]! + 1;
  if (ref[n]! > m - 1) return { p: interpolate(g, ref.subarray(0, 2)), converged: false, iterations: 0 };
  const e = new Float64Array(m);
  let p = interpolate(g, ref);
  let converged = false;
  let iterations = 0;
  while (iterations < REMEZ_MAX_ITERATIONS) {
    iterations++;
    for (let j = 0; j < m; j++) e[j] = g.w[j]! * (g.d[j]! - evaluate(p, g.x[j]!));
    const next = nextReference(g, e, ref, p.delta);
    if (!next) break;
    if (next.every((v, i) => v === ref[i])) {
      converged = true;
      break;
    }
    ref = next;
    p = interpolate(g, ref);
  }
  return { p, converged, iterations };
}

/**
 * Equiripple taps over the bands (cycles per sample). For 'bands' each band asks a constant amplitude
 * (`from`); for 'differentiator' the amplitude `from`·f; for 'hilbert' the amplitude `from`. The
 * differentiator and Hilbert transformer are antisymmetric: H = j·A(ω)·e^{−jω(taps−1)/2}.
 */
export function remezTaps(taps: number, bands: readonly FirBand[], kind: RemezKind = 'bands'): RemezResult {
  checkBands(bands);
  const neg = kind !== 'bands';
  const odd = taps % 2 === 1;
  const n = !neg ? (odd ? (taps + 1) / 2 : taps / 2) : odd ? (taps - 1) / 2 : taps / 2;
  if (n < 1) throw new RangeError(`${taps} taps are too few for this design`);
  const g = makeGrid(taps, bands, kind, n);
  const m = g.f.length;
  if (m < n + 1) throw new RangeError(`the bands are too narrow for ${taps} taps`);
  // The program's start spreads the reference evenly over the grid's indices. A start whose δ is 0 (the
  // desired values happen to lie on a lower-degree polynomial there) has no alternation to exchange from,
  // so the exchange is retried from the same spread shifted by a fraction of its step.
  let run = exchange(g, n, 0);
  for (const shift of [0.5, 0.25, 0.75]) {
    if (run.converged) break;
    run = exchange(g, n, shift);
  }
  const { p, converged, iterations } = run;
  // P's coefficients from its values at f_j = j/(2n − 1) (an even sequence of period 2n − 1)
  const len = 2 * n - 1;
  const values = new Float64Array(n);
  for (let j = 0; j < n; j++) values[j] = evaluate(p, Math.cos((2 * Math.PI * j) / len));
  const c = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    let s = values[0]!;
    for (let j = 1; j < n; j++) s += 2 * values[j]! * Math.cos((2 * Math.PI * j * k) / len);
    c[k] = (k === 0 ? 1 : 2) * (s / len);
  }
  return { taps: tapsFromCosines(c, taps, neg), deviation: Math.abs(p.delta), converged, iterations };
}

/**
 * The largest weighted error of any taps on the grid remezTaps uses for these bands: for comparing two
 * answers to the same discrete minimax problem (the smaller is the nearer).
 */
export function remezGridError(
  h: ArrayLike<number>,
  bands: readonly FirBand[],
  kind: RemezKind = 'bands',
): number {
  const taps = h.length;
  const neg = kind !== 'bands';
  const odd = taps % 2 === 1;
  const n = !neg ? (odd ? (taps + 1) / 2 : taps / 2) : odd ? (taps - 1) / 2 : taps / 2;
  const g = makeGrid(taps, bands, kind, n);
  const mid = (taps - 1) / 2;
  let worst = 0;
  for (let j = 0; j < g.f.length; j++) {
    const w = 2 * Math.PI * g.f[j]!;
    let a = 0;
    for (let t = 0; t < taps; t++) a += h[t]! * (neg ? -Math.sin(w * (t - mid)) : Math.cos(w * (t - mid)));
    worst = Math.max(worst, Math.abs(g.w[j]! * (g.d[j]! - a / g.q[j]!)));
  }
  return worst;
}
