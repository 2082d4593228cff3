/**
 * Discrete Fourier transform of any length, in place on separate real and imaginary Float64Arrays.
 * Powers of two use the iterative radix-2 Cooley–Tukey algorithm (Cooley & Tukey 1965) with a cached
 * bit-reversal table and twiddle table; every other length uses Bluestein's chirp-z algorithm
 * (Bluestein 1970), which rewrites the DFT as a convolution done with power-of-two transforms.
 * Forward: X[k] = Σ x[j]·e^{-2πijk/n}, no scaling; inverse scales by 1/n (numpy.fft's convention).
 */

interface Radix2Plan {
  n: number;
  rev: Uint32Array;
  /** cos(2πk/n) and sin(2πk/n) for k < n/2. */
  cos: Float64Array;
  sin: Float64Array;
}

interface BluesteinPlan {
  n: number;
  m: number;
  /** The chirp e^{-iπk²/n}, k < n. */
  wRe: Float64Array;
  wIm: Float64Array;
  /** FFT of the conjugate chirp laid out circularly in length m. */
  bRe: Float64Array;
  bIm: Float64Array;
  workRe: Float64Array;
  workIm: Float64Array;
}

/** Plans kept per length; a Welch run uses one or two lengths, so the cache stays small. */
const MAX_CACHED_PLANS = 32;
const radix2Plans = new Map<number, Radix2Plan>();
const bluesteinPlans = new Map<number, BluesteinPlan>();

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

function remember<T>(cache: Map<number, T>, n: number, make: () => T): T {
  let plan = cache.get(n);
  if (plan === undefined) {
    if (cache.size >= MAX_CACHED_PLANS) cache.delete(cache.keys().next().value!);
    plan = make();
    cache.set(n, plan);
  }
  return plan;
}

function radix2Plan(n: number): Radix2Plan {
  return remember(radix2Plans, n, () => {
    const bits = Math.round(Math.log2(n));
    const rev = new Uint32Array(n);
    for (let i = 1; i < n; i++) rev[i] = (rev[i >> 1]! >> 1) | ((i & 1) << (bits - 1));
    const half = n >> 1;
    const cos = new Float64Array(half);
    const sin = new Float64Array(half);
    for (let k = 0; k < half; k++) {
      cos[k] = Math.cos((2 * Math.PI * k) / n);
      sin[k] = Math.sin((2 * Math.PI * k) / n);
    }
    return { n, rev, cos, sin };
  });
}

function radix2(re: Float64Array, im: Float64Array, inverse: boolean): void {
  const n = re.length;
  if (n <= 1) return;
  const { rev, cos, sin } = radix2Plan(n);
  for (let i = 0; i < n; i++) {
    const j = rev[i]!;
    if (j > i) {
      const tr = re[i]!;
      re[i] = re[j]!;
      re[j] = tr;
      const ti = im[i]!;
      im[i] = im[j]!;
      im[j] = ti;
    }
  }
  const sign = inverse ? 1 : -1;
  // Twiddle outermost within a stage: each factor is read once per stage rather than once per butterfly.
  for (let size = 2; size <= n; size <<= 1) {
    const half = size >> 1;
    const step = n / size;
    for (let k = 0; k < half; k++) {
      const wr = cos[k * step]!;
      const wi = sign * sin[k * step]!;
      for (let a = k; a < n; a += size) {
        const b = a + half;
        const br = re[b]!;
        const bi = im[b]!;
        const xr = br * wr - bi * wi;
        const xi = br * wi + bi * wr;
        const ar = re[a]!;
        const ai = im[a]!;
        re[b] = ar - xr;
        im[b] = ai - xi;
        re[a] = ar + xr;
        im[a] = ai + xi;
      }
    }
  }
}

function bluesteinPlan(n: number): BluesteinPlan {
  return remember(bluesteinPlans, n, () => {
    const m = nextPowerOfTwo(2 * n - 1);
    const wRe = new Float64Array(n);
    const wIm = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      // k² mod 2n keeps the angle small, so it stays accurate for long transforms.
      const angle = (Math.PI * ((k * k) % (2 * n))) / n;
      wRe[k] = Math.cos(angle);
      wIm[k] = -Math.sin(angle);
    }
    const bRe = new Float64Array(m);
    const bIm = new Float64Array(m);
    bRe[0] = wRe[0]!;
    bIm[0] = -wIm[0]!;
    for (let k = 1; k < n; k++) {
      bRe[k] = bRe[m - k] = wRe[k]!;
      bIm[k] = bIm[m - k] = -wIm[k]!;
    }
    radix2(bRe, bIm, false);
    return { n, m, wRe, wIm, bRe, bIm, workRe: new Float64Array(m), workIm: new Float64Array(m) };
  });
}

function bluestein(re: Float64Array, im: Float64Array, inverse: boolean): void {
  const n = re.length;
  const { m, wRe, wIm, bRe, bIm, workRe: ar, workIm: ai } = bluesteinPlan(n);
  // The inverse DFT is the forward one of the conjugate, conjugated.
  const s = inverse ? -1 : 1;
  ar.fill(0);
  ai.fill(0);
  for (let k = 0; k < n; k++) {
    const xr = re[k]!;
    const xi = s * im[k]!;
    ar[k] = xr * wRe[k]! - xi * wIm[k]!;
    ai[k] = xr * wIm[k]! + xi * wRe[k]!;
  }
  radix2(ar, ai, false);
  for (let k = 0; k < m; k++) {
    const r = ar[k]! * bRe[k]! - ai[k]! * bIm[k]!;
    ai[k] = ar[k]! * bIm[k]! + ai[k]! * bRe[k]!;
    ar[k] = r;
  }
  radix2(ar, ai, true);
  for (let k = 0; k < n; k++) {
    const cr = ar[k]! / m;
    const ci = ai[k]! / m;
    re[k] = cr * wRe[k]! - ci * wIm[k]!;
    im[k] = s * (cr * wIm[k]! + ci * wRe[k]!);
  }
}

/** Forward DFT of (re, im) in place, any length, unscaled. */
export function fft(re: Float64Array, im: Float64Array): void {
  if (re.length !== im.length) throw new Error(`fft: re has ${re.length} values, im ${im.length}`);
  if (isPowerOfTwo(re.length) || re.length === 0) radix2(re, im, false);
  else bluestein(re, im, false);
}

/** Inverse DFT of (re, im) in place, any length, scaled by 1/n so that ifft(fft(x)) = x. */
export function ifft(re: Float64Array, im: Float64Array): void {
  if (re.length !== im.length) throw new Error(`ifft: re has ${re.length} values, im ${im.length}`);
  const n = re.length;
  if (isPowerOfTwo(n) || n === 0) radix2(re, im, true);
  else bluestein(re, im, true);
  for (let k = 0; k < n; k++) {
    re[k] = re[k]! / n;
    im[k] = im[k]! / n;
  }
}

/** Scratch for realFft, reused between calls of the same length. */
const realScratch = new Map<
  number,
  { re: Float64Array; im: Float64Array; c?: Float64Array; s?: Float64Array }
>();

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
    const scratch = remember(realScratch, n, () => ({ re: new Float64Array(n), im: new Float64Array(n) }));
    for (let j = 0; j < n; j++) scratch.re[j] = x[j]!;
    scratch.im.fill(0);
    fft(scratch.re, scratch.im);
    outRe.set(scratch.re.subarray(0, bins));
    outIm.set(scratch.im.subarray(0, bins));
    return;
  }
  const h = n >> 1;
  const z = remember(realScratch, n, () => {
    const c = new Float64Array(h + 1);
    const s = new Float64Array(h + 1);
    for (let k = 0; k <= h; k++) {
      c[k] = Math.cos((-2 * Math.PI * k) / n);
      s[k] = Math.sin((-2 * Math.PI * k) / n);
    }
    return { re: new Float64Array(h), im: new Float64Array(h), c, s };
  });
  const cs = z.c!;
  const sn = z.s!;
  for (let j = 0; j < h; j++) {
    z.re[j] = x[2 * j]!;
    z.im[j] = x[2 * j + 1]!;
  }
  fft(z.re, z.im);
  for (let k = 0; k <= h; k++) {
    const k1 = k % h;
    const k2 = (h - k) % h;
    // E = (Z[k] + conj Z[h-k]) / 2 is the even samples' DFT, O = (Z[k] - conj Z[h-k]) / 2i the odd ones'.
    const er = (z.re[k1]! + z.re[k2]!) / 2;
    const ei = (z.im[k1]! - z.im[k2]!) / 2;
    const or = (z.im[k1]! + z.im[k2]!) / 2;
    const oi = -(z.re[k1]! - z.re[k2]!) / 2;
    const c = cs[k]!;
    const s = sn[k]!;
    outRe[k] = er + or * c - oi * s;
    outIm[k] = ei + or * s + oi * c;
  }
}
