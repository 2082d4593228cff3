/**
 * Discrete Fourier transform of any length, on separate real and imaginary Float64Arrays (and, for Welch,
 * of real signals). Internally a self-sorting mixed-radix Cooley–Tukey transform (Cooley & Tukey 1965) in
 * the Stockham arrangement (no bit reversal: each pass reads one buffer and writes the other in order), on
 * interleaved re/im data, with written-out butterflies for radices 4, 2, 3, 5 and 7 and a direct one for any
 * other prime factor. A length whose prime factors make that slow uses Bluestein's chirp-z algorithm
 * (Bluestein 1970) instead: the DFT as a convolution done with transforms of a nearby length with small
 * factors, the chirp and its transform computed once per length and kept in the plan.
 * Forward: X[k] = Σ x[j]·e^{-2πijk/n}, no scaling; inverse scales by 1/n (numpy.fft's convention).
 */
import { butterflyPass } from './fftPasses.ts';

/**
 * The passes of a plan, four small integers each in an Int32Array: the radix; l1, the sub-transforms already
 * combined before the pass (the product of the earlier radices); ido, the length of each remaining
 * sub-transform divided by the radix, n / (l1·radix); and where the pass's twiddle factors start in the
 * plan's table. Integers in an Int32Array always reach the butterflies as small integers. In objects they
 * need not: V8 keeps one representation per field for every object of a shape, so one count that arrived
 * as a double (a division's result, or a length read out of an array of doubles) made the field a double
 * for every plan in the process, and every butterfly then did its index arithmetic in floating point
 * (measured: each pass 2× slower at every length from the first Bluestein plan on, so whichever length
 * came first decided the speed of the whole run; another copy of this module in the process, such as the
 * kernel bench's before tree, shares the shapes too).
 */
const PASS_FIELDS = 4;

interface DirectPlan {
  kind: 'direct';
  n: number;
  /** PASS_FIELDS integers per pass: radix, l1, ido, twiddle offset. */
  passes: Int32Array;
  /** Interleaved twiddles of every pass: e^{-2πi·j·i/(ido·radix)} for j = 1..radix−1, i < ido. */
  twiddles: Float64Array;
  /** Two interleaved work buffers of n complex values (the passes alternate between them). */
  a: Float64Array;
  b: Float64Array;
}

interface BluesteinPlan {
  kind: 'bluestein';
  n: number;
  m: number;
  inner: DirectPlan;
  /** The chirp e^{-iπk²/n}, k < n, interleaved. */
  chirp: Float64Array;
  /** Transform of the conjugate chirp laid out circularly in length m, scaled by 1/m, interleaved. */
  kernel: Float64Array;
  /** Work buffers: m values for the convolution, n for the result. */
  work: Float64Array;
  out: Float64Array;
}

type Plan = DirectPlan | BluesteinPlan;

/** Plans kept per length; a Welch run uses one or two lengths, so the cache stays small. */
const MAX_CACHED_PLANS = 32;
const plans = new Map<number, Plan>();

/** Radices taken first when factoring (7 is written out too, and comes after 5 in the ascending primes). */
const FAST_RADICES = [4, 2, 3, 5];
/** Rough cost per sample of one pass of each radix, in units of a radix-2 pass (for choosing Bluestein). */
function passCost(radix: number): number {
  return radix === 2
    ? 1
    : radix === 3
      ? 1.6
      : radix === 4
        ? 1.5
        : radix === 5
          ? 2.2
          : radix === 7
            ? 3
            : 0.5 * radix;
}

/** True when n is a power of two (1, 2, 4, ...). */
export function isPowerOfTwo(n: number): boolean {
  return Number.isInteger(n) && n > 0 && (n & (n - 1)) === 0;
}

/** Smallest power of two that is at least n. */
export function nextPowerOfTwo(n: number): number {
  let m = 1;
  while (m < n) m *= 2;
  return m;
}

/** The radices of n: fours first, then a two, threes, fives, then any other prime factors ascending. */
export function factorize(n: number): number[] {
  const out: number[] = [];
  let r = n;
  for (const f of FAST_RADICES) {
    while (r % f === 0) {
      out.push(f);
      r = (r / f) | 0;
    }
  }
  for (let p = 7; p * p <= r; p += 2) {
    while (r % p === 0) {
      out.push(p);
      r = (r / p) | 0;
    }
  }
  if (r > 1) out.push(r);
  return out;
}

/** Smallest m ≥ n whose only prime factors are 2, 3 and 5. */
export function smoothLength(n: number): number {
  let best = nextPowerOfTwo(n);
  for (let p5 = 1; p5 < best; p5 *= 5) {
    for (let p35 = p5; p35 < best; p35 *= 3) {
      let m = p35;
      while (m < n) m *= 2;
      if (m < best) best = m;
    }
  }
  return best;
}

/**
 * The convolution length for Bluestein of length n: of the lengths ≥ 2n − 1 with no prime factor above 7
 * (and below twice the next power of two), the one whose transform the cost model says is cheapest, for
 * which more, shorter passes can beat a slightly shorter length (10 007: 20 160 = 4³·3²·5·7, not 20 250).
 */
export function convolutionLength(n: number): number {
  const need = 2 * n - 1;
  const limit = 2 * nextPowerOfTwo(need);
  let best = nextPowerOfTwo(need);
  let bestCost = directCost(best);
  for (let p7 = 1; p7 < limit; p7 *= 7)
    for (let p5 = p7; p5 < limit; p5 *= 5)
      for (let p3 = p5; p3 < limit; p3 *= 3) {
        let m = p3;
        while (m < need) m *= 2;
        if (m >= limit) continue;
        const cost = directCost(m);
        if (cost < bestCost) {
          // Two assignments, not a destructured [m, cost]: that array holds doubles, so m would come out as
          // a boxed double, and every count computed from it (see directPlan) with it.
          best = m;
          bestCost = cost;
        }
      }
  return best;
}

function directCost(n: number): number {
  return n * factorize(n).reduce((s, f) => s + passCost(f), 0);
}

/**
 * Forgets the plans and scratch buffers of lengths from `fromLength` on. A one-off transform of millions of
 * points (the tone search over an hour-long recording) otherwise keeps hundreds of MB in the caches.
 */
export function dropLargePlans(fromLength = 1 << 18): void {
  for (const n of [...plans.keys()]) if (n >= fromLength) plans.delete(n);
  for (const n of [...interleaved.keys()]) if (n >= fromLength) interleaved.delete(n);
  for (const n of [...untangleTables.keys()]) if (n >= fromLength) untangleTables.delete(n);
}

function remember(n: number, make: () => Plan): Plan {
  let plan = plans.get(n);
  if (plan === undefined) {
    if (plans.size >= MAX_CACHED_PLANS) plans.delete(plans.keys().next().value!);
    plan = make();
    plans.set(n, plan);
  }
  return plan;
}

function directPlan(n: number): DirectPlan {
  const radices = factorize(n);
  const passes = new Int32Array(PASS_FIELDS * radices.length);
  let l1 = 1;
  let size = 0;
  for (const [p, radix] of radices.entries()) {
    const ido = n / (l1 * radix);
    passes.set([radix, l1, ido, size], PASS_FIELDS * p);
    size += 2 * (radix - 1) * ido;
    l1 *= radix;
  }
  const twiddles = new Float64Array(size);
  for (let p = 0; p < passes.length; p += PASS_FIELDS) {
    const radix = passes[p]!;
    const ido = passes[p + 2]!;
    const twOffset = passes[p + 3]!;
    const len = ido * radix;
    for (let j = 1; j < radix; j++) {
      for (let i = 0; i < ido; i++) {
        // (j·i) mod len keeps the angle below 2π, so it is exact to a rounding however long the transform.
        const angle = (-2 * Math.PI * ((j * i) % len)) / len;
        const at = twOffset + 2 * ((j - 1) * ido + i);
        twiddles[at] = Math.cos(angle);
        twiddles[at + 1] = Math.sin(angle);
      }
    }
  }
  return { kind: 'direct', n, passes, twiddles, a: new Float64Array(2 * n), b: new Float64Array(2 * n) };
}

function planFor(n: number): Plan {
  return remember(n, () => {
    const largest = factorize(n).at(-1) ?? 1;
    if (largest > 5) {
      const m = convolutionLength(n);
      if (2 * directCost(m) + 8 * m < directCost(n)) return bluesteinPlan(n, m);
    }
    return directPlan(n);
  });
}

function bluesteinPlan(n: number, m: number): BluesteinPlan {
  const inner = planFor(m);
  if (inner.kind !== 'direct') throw new Error(`fft: length ${m} should have small factors`);
  const chirp = new Float64Array(2 * n);
  for (let k = 0; k < n; k++) {
    // k² mod 2n keeps the angle small, so it stays accurate for long transforms.
    const angle = (-Math.PI * ((k * k) % (2 * n))) / n;
    chirp[2 * k] = Math.cos(angle);
    chirp[2 * k + 1] = Math.sin(angle);
  }
  const kernel = new Float64Array(2 * m);
  kernel[0] = chirp[0]! / m;
  kernel[1] = -chirp[1]! / m;
  for (let k = 1; k < n; k++) {
    const re = chirp[2 * k]! / m;
    const im = -chirp[2 * k + 1]! / m;
    kernel[2 * k] = kernel[2 * (m - k)] = re;
    kernel[2 * k + 1] = kernel[2 * (m - k) + 1] = im;
  }
  const out = runDirect(inner, kernel);
  kernel.set(out);
  const work = new Float64Array(2 * m);
  const result = new Float64Array(2 * n);
  return { kind: 'bluestein', n, m, inner, chirp, kernel, work, out: result };
}

/** Runs the passes on data (interleaved, n values), which is left as is; returns the buffer holding X. */
function runDirect(plan: DirectPlan, data: Float64Array): Float64Array {
  let src = data;
  let dst = plan.a;
  const passes = plan.passes;
  for (let p = 0; p < passes.length; p += PASS_FIELDS) {
    butterflyPass(passes[p]!, passes[p + 2]!, passes[p + 1]!, src, dst, plan.twiddles, passes[p + 3]!);
    src = dst;
    dst = dst === plan.a ? plan.b : plan.a;
  }
  if (src === data) plan.a.set(data.subarray(0, 2 * plan.n));
  return src === data ? plan.a : src;
}

/**
 * Bluestein: X_k = w_k·Σ_j (x_j w_j)·conj(w_{k−j}) with w_j = e^{-iπj²/n}, the sum a circular convolution in
 * length m done as forward transforms (the inverse as the conjugate of a forward one).
 */
function runBluestein(plan: BluesteinPlan, data: Float64Array, powerOnly = false): Float64Array {
  const { chirp, kernel, inner, work, out } = plan;
  // | 0: small integers in the loops below whatever representation the plan's fields have (see PASS_FIELDS).
  const n = plan.n | 0;
  const m = plan.m | 0;
  work.fill(0, 2 * n);
  for (let k = 0; k < n; k++) {
    const xr = data[2 * k]!;
    const xi = data[2 * k + 1]!;
    const wr = chirp[2 * k]!;
    const wi = chirp[2 * k + 1]!;
    work[2 * k] = xr * wr - xi * wi;
    work[2 * k + 1] = xr * wi + xi * wr;
  }
  const A = runDirect(inner, work);
  // conj(A·K) into work, then its forward transform is conj of the inverse (the 1/m sits in the kernel).
  for (let k = 0; k < m; k++) {
    const ar = A[2 * k]!;
    const ai = A[2 * k + 1]!;
    const kr = kernel[2 * k]!;
    const ki = kernel[2 * k + 1]!;
    work[2 * k] = ar * kr - ai * ki;
    work[2 * k + 1] = -(ar * ki + ai * kr);
  }
  const C = runDirect(inner, work);
  // |X_k| = |C_k| (the chirp has modulus 1): for powers the first n values of C serve as they are.
  if (powerOnly) return C;
  for (let k = 0; k < n; k++) {
    const cr = C[2 * k]!;
    const ci = -C[2 * k + 1]!;
    const wr = chirp[2 * k]!;
    const wi = chirp[2 * k + 1]!;
    out[2 * k] = cr * wr - ci * wi;
    out[2 * k + 1] = cr * wi + ci * wr;
  }
  return out;
}

/** The forward DFT of interleaved data (n complex values); the result is in a buffer the plan may reuse. */
function transform(n: number, data: Float64Array): Float64Array {
  const plan = planFor(n);
  return plan.kind === 'direct' ? runDirect(plan, data) : runBluestein(plan, data);
}

/**
 * Values whose squared moduli are those of the forward DFT of data (n complex values), first n of the
 * buffer returned: the DFT itself, or for Bluestein the DFT before its last chirp factor of modulus 1.
 */
function transformForPower(n: number, data: Float64Array): Float64Array {
  const plan = planFor(n);
  return plan.kind === 'direct' ? runDirect(plan, data) : runBluestein(plan, data, true);
}

const interleaved = new Map<number, Float64Array>();
function scratch(n: number): Float64Array {
  let s = interleaved.get(n);
  if (!s) {
    if (interleaved.size >= MAX_CACHED_PLANS) interleaved.delete(interleaved.keys().next().value!);
    s = new Float64Array(2 * n);
    interleaved.set(n, s);
  }
  return s;
}

function complexTransform(re: Float64Array, im: Float64Array, inverse: boolean, what: string): void {
  if (re.length !== im.length) throw new Error(`${what}: re has ${re.length} values, im ${im.length}`);
  const n = re.length;
  if (n <= 1) return;
  const s = scratch(n);
  // The inverse DFT is the forward one of the conjugate, conjugated.
  const sign = inverse ? -1 : 1;
  for (let k = 0; k < n; k++) {
    s[2 * k] = re[k]!;
    s[2 * k + 1] = sign * im[k]!;
  }
  const X = transform(n, s);
  const scale = inverse ? 1 / n : 1;
  for (let k = 0; k < n; k++) {
    re[k] = X[2 * k]! * scale;
    im[k] = sign * X[2 * k + 1]! * scale;
  }
}

/**
 * Forward DFT of interleaved data (n = data.length / 2 complex values), unscaled, without the copies `fft`
 * makes; the result is returned in a buffer of the transform's plan (valid until its next use), `data` may
 * be overwritten. For one-off transforms of millions of points, where every copy is tens of MB.
 */
export function fftInterleaved(data: Float64Array): Float64Array {
  const n = data.length >> 1;
  return n <= 1 ? data : transform(n, data);
}

/** Forward DFT of (re, im) in place, any length, unscaled. */
export function fft(re: Float64Array, im: Float64Array): void {
  complexTransform(re, im, false, 'fft');
}

/** Inverse DFT of (re, im) in place, any length, scaled by 1/n so that ifft(fft(x)) = x. */
export function ifft(re: Float64Array, im: Float64Array): void {
  complexTransform(re, im, true, 'ifft');
}

/** cos and sin of −2πk/n for k ≤ n/2, per even length, for untangling a packed real transform. */
const untangleTables = new Map<number, Float64Array>();
function untangleTable(n: number): Float64Array {
  let t = untangleTables.get(n);
  if (!t) {
    if (untangleTables.size >= MAX_CACHED_PLANS) untangleTables.delete(untangleTables.keys().next().value!);
    const h = n >> 1;
    t = new Float64Array(2 * (h + 1));
    for (let k = 0; k <= h; k++) {
      t[2 * k] = Math.cos((-2 * Math.PI * k) / n);
      t[2 * k + 1] = Math.sin((-2 * Math.PI * k) / n);
    }
    untangleTables.set(n, t);
  }
  return t;
}

/**
 * DFT of a real signal, bins 0..floor(n/2) (the rest are their conjugates), written into outRe/outIm.
 * Even lengths pack the signal into a complex one of half the length and untangle the result (the
 * standard real-input trick), which halves the work; odd lengths transform it as complex.
 */
export function realFft(x: ArrayLike<number>, outRe: Float64Array, outIm: Float64Array): void {
  const n = x.length;
  const bins = (n >> 1) + 1;
  if (outRe.length < bins || outIm.length < bins) throw new Error(`realFft: outputs need ${bins} values`);
  if (n % 2 === 1 || n < 4) {
    const s = scratch(n);
    for (let j = 0; j < n; j++) {
      s[2 * j] = x[j]!;
      s[2 * j + 1] = 0;
    }
    const X = n === 1 ? s : transform(n, s);
    for (let k = 0; k < bins; k++) {
      outRe[k] = X[2 * k]!;
      outIm[k] = X[2 * k + 1]!;
    }
    return;
  }
  const h = n >> 1;
  const s = scratch(h);
  // x[2j] + i·x[2j+1] is exactly x read as interleaved complex values.
  for (let j = 0; j < n; j++) s[j] = x[j]!;
  const Z = transform(h, s);
  const t = untangleTable(n);
  for (let k = 0; k <= h; k++) {
    const k1 = k === h ? 0 : k;
    const k2 = k === 0 ? 0 : h - k;
    const z1r = Z[2 * k1]!;
    const z1i = Z[2 * k1 + 1]!;
    const z2r = Z[2 * k2]!;
    const z2i = Z[2 * k2 + 1]!;
    // E = (Z[k] + conj Z[h-k]) / 2 is the even samples' DFT, O = (Z[k] - conj Z[h-k]) / 2i the odd ones'.
    const er = (z1r + z2r) / 2;
    const ei = (z1i - z2i) / 2;
    const or = (z1i + z2i) / 2;
    const oi = -(z1r - z2r) / 2;
    const c = t[2 * k]!;
    const sn = t[2 * k + 1]!;
    outRe[k] = er + or * c - oi * sn;
    outIm[k] = ei + or * sn + oi * c;
  }
}

/**
 * A real transform of one length that adds |X_k|², k ≤ ⌊n/2⌋, to an accumulator: the inner step of Welch's
 * method without copies. Fill `input` (n samples), then call addPower; `input` is left as it was. Call
 * flush before reading the accumulator: an odd length (no half-length packing there) takes its inputs two
 * at a time, one as the real part and one as the imaginary part of one complex transform Z, and
 * |X_k|² + |Y_k|² = (|Z_k|² + |Z_{n−k}|²) / 2 for the two real inputs' transforms X and Y, so two segments
 * cost one transform; flush transforms an input still waiting for its partner.
 */
export class RealPowerTransform {
  readonly input: Float64Array;
  private readonly n: number;
  private readonly complex: Float64Array | null;
  /** An odd length's first input of a pair is in the complex buffer's real parts. */
  private waiting = false;

  constructor(n: number) {
    if (!(Number.isInteger(n) && n >= 1))
      throw new Error(`RealPowerTransform: length ${n}; a whole number ≥ 1`);
    this.n = n | 0;
    // Even lengths: the samples read as n/2 interleaved complex values are the packed transform's input.
    this.input = new Float64Array(n);
    this.complex = n % 2 === 1 || n < 4 ? new Float64Array(2 * n) : null;
  }

  /** Adds |X_k|² of the current input to sum[k], k ≤ ⌊n/2⌋ (for an odd length, at the latest at flush). */
  addPower(sum: Float64Array): void {
    const n = this.n;
    const c = this.complex;
    if (c) {
      if (n < 3) {
        for (let j = 0; j < n; j++) {
          c[2 * j] = this.input[j]!;
          c[2 * j + 1] = 0;
        }
        const X = n === 1 ? c : transformForPower(n, c);
        for (let k = 0; k <= n >> 1; k++) sum[k] = sum[k]! + X[2 * k]! ** 2 + X[2 * k + 1]! ** 2;
        return;
      }
      if (!this.waiting) {
        for (let j = 0; j < n; j++) c[2 * j] = this.input[j]!;
        this.waiting = true;
        return;
      }
      for (let j = 0; j < n; j++) c[2 * j + 1] = this.input[j]!;
      this.waiting = false;
      const Z = transformForPower(n, c);
      sum[0] = sum[0]! + Z[0]! ** 2 + Z[1]! ** 2;
      for (let k = 1; k <= n >> 1; k++) {
        const m = n - k;
        const p = Z[2 * k]! ** 2 + Z[2 * k + 1]! ** 2 + Z[2 * m]! ** 2 + Z[2 * m + 1]! ** 2;
        sum[k] = sum[k]! + 0.5 * p;
      }
      return;
    }
    this.addPacked(sum);
  }

  /** Adds the power of an input still waiting for its partner (odd lengths); nothing otherwise. */
  flush(sum: Float64Array): void {
    const c = this.complex;
    if (!c || !this.waiting) return;
    const n = this.n;
    for (let j = 0; j < n; j++) c[2 * j + 1] = 0;
    this.waiting = false;
    const X = transformForPower(n, c);
    for (let k = 0; k <= n >> 1; k++) sum[k] = sum[k]! + X[2 * k]! ** 2 + X[2 * k + 1]! ** 2;
  }

  private addPacked(sum: Float64Array): void {
    const n = this.n;
    const h = n >> 1;
    const Z = transform(h, this.input);
    const t = untangleTable(n);
    // Bins k and h − k read the same two values Z[k] and Z[h−k] (swapped), so they are untangled together:
    // E = (Z[k] + conj Z[h−k]) / 2 is the even samples' DFT, O = (Z[k] − conj Z[h−k]) / 2i the odd ones',
    // X_k = E + e^{-2πik/n}·O, and for h − k the same sums with the signs of E's and O's other part flipped
    // (exactly: a negation), so each bin gets the value the one-bin formula gives.
    addUntangled(Z, t, sum, 0, 0, 0);
    const half = h >> 1;
    for (let k = 1; k < h - k; k++) {
      const z1r = Z[2 * k]!;
      const z1i = Z[2 * k + 1]!;
      const z2r = Z[2 * (h - k)]!;
      const z2i = Z[2 * (h - k) + 1]!;
      const er = (z1r + z2r) / 2;
      const ei = (z1i - z2i) / 2;
      const or = (z1i + z2i) / 2;
      const oi = -(z1r - z2r) / 2;
      const c = t[2 * k]!;
      const sn = t[2 * k + 1]!;
      const xr = er + or * c - oi * sn;
      const xi = ei + or * sn + oi * c;
      sum[k] = sum[k]! + xr * xr + xi * xi;
      const c2 = t[2 * (h - k)]!;
      const sn2 = t[2 * (h - k) + 1]!;
      const yr = er + or * c2 + oi * sn2;
      const yi = -ei + or * sn2 - oi * c2;
      sum[h - k] = sum[h - k]! + yr * yr + yi * yi;
    }
    if (h % 2 === 0 && half > 0) addUntangled(Z, t, sum, half, half, half);
    addUntangled(Z, t, sum, h, 0, 0);
  }
}

/** Adds |X_k|² for one bin k of a packed real transform Z (k1 = k mod h, k2 = (h − k) mod h). */
function addUntangled(
  Z: Float64Array,
  t: Float64Array,
  sum: Float64Array,
  k: number,
  k1: number,
  k2: number,
) {
  const z1r = Z[2 * k1]!;
  const z1i = Z[2 * k1 + 1]!;
  const z2r = Z[2 * k2]!;
  const z2i = Z[2 * k2 + 1]!;
  const er = (z1r + z2r) / 2;
  const ei = (z1i - z2i) / 2;
  const or = (z1i + z2i) / 2;
  const oi = -(z1r - z2r) / 2;
  const c = t[2 * k]!;
  const sn = t[2 * k + 1]!;
  const xr = er + or * c - oi * sn;
  const xi = ei + or * sn + oi * c;
  sum[k] = sum[k]! + xr * xr + xi * xi;
}
