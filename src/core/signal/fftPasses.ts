/**
 * The butterflies of the self-sorting mixed-radix FFT (fft.ts), one pass each, on interleaved complex data.
 * A pass of radix p, with l1 sub-transforms already combined and ido = n/(l1·p), reads the input as
 * cc(i, j, k) = element i + ido·(j + p·k) and writes ch(i, k, m) = element i + ido·(k + l1·m):
 *   ch(i, k, m) = tw(m, i) · Σ_j cc(i, j, k)·e^{-2πi·jm/p},   tw(m, i) = e^{-2πi·m·i/(ido·p)},
 * the decimation-in-frequency step of Cooley–Tukey in the Stockham (autosort) order, so the last pass
 * leaves the transform in natural order. Forward transform only (the inverse conjugates around it).
 */

/** Runs one pass of the given radix from cc into ch with the twiddles at tw[twOff...]. */
export function butterflyPass(
  radix: number,
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  twOff: number,
): void {
  switch (radix) {
    case 4:
      return pass4(ido, l1, cc, ch, tw, twOff);
    case 2:
      return pass2(ido, l1, cc, ch, tw, twOff);
    case 3:
      return pass3(ido, l1, cc, ch, tw, twOff);
    case 5:
      return pass5(ido, l1, cc, ch, tw, twOff);
    case 7:
      return pass7(ido, l1, cc, ch, tw, twOff);
    default:
      return passGeneral(radix, ido, l1, cc, ch, tw, twOff);
  }
}

function pass2(
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  if (ido === 1) {
    // The last pass: every twiddle is 1.
    for (let k = 0; k < l1; k++) {
      const a = 4 * k;
      const o = 2 * k;
      const ar = cc[a]!;
      const ai = cc[a + 1]!;
      const br = cc[a + 2]!;
      const bi = cc[a + 3]!;
      ch[o] = ar + br;
      ch[o + 1] = ai + bi;
      ch[o + sOut] = ar - br;
      ch[o + sOut + 1] = ai - bi;
    }
    return;
  }
  for (let k = 0; k < l1; k++) {
    const inK = 2 * ido * 2 * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const ar = cc[a]!;
      const ai = cc[a + 1]!;
      const br = cc[a + sIn]!;
      const bi = cc[a + sIn + 1]!;
      ch[o] = ar + br;
      ch[o + 1] = ai + bi;
      const dr = ar - br;
      const di = ai - bi;
      const wr = tw[t0 + 2 * i]!;
      const wi = tw[t0 + 2 * i + 1]!;
      ch[o + sOut] = dr * wr - di * wi;
      ch[o + sOut + 1] = dr * wi + di * wr;
    }
  }
}

/**
 * Radix-4 passes with fewer sub-transform points than sub-transforms (ido < l1) run the twiddle loop outside
 * and reuse each twiddle for all l1, up to transforms of 4·SWAP_MAX = 32 768 points (two 512 KB buffers);
 * above that the reordered loop sweeps the buffers ido times and measured slower (65 536: 1.02–1.09× the
 * plain order, 20 480 and 32 768: 0.89×).
 */
const SWAP_MAX = 8192;

function pass4(
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  const t1 = t0 + 2 * ido;
  const t2 = t0 + 4 * ido;
  if (ido === 1) {
    for (let k = 0; k < l1; k++) {
      const a = 8 * k;
      const o = 2 * k;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      const a1r = cc[a + 2]!;
      const a1i = cc[a + 3]!;
      const a2r = cc[a + 4]!;
      const a2i = cc[a + 5]!;
      const a3r = cc[a + 6]!;
      const a3i = cc[a + 7]!;
      const s02r = a0r + a2r;
      const s02i = a0i + a2i;
      const d02r = a0r - a2r;
      const d02i = a0i - a2i;
      const s13r = a1r + a3r;
      const s13i = a1i + a3i;
      const d13r = a1r - a3r;
      const d13i = a1i - a3i;
      ch[o] = s02r + s13r;
      ch[o + 1] = s02i + s13i;
      ch[o + sOut] = d02r + d13i;
      ch[o + sOut + 1] = d02i - d13r;
      ch[o + 2 * sOut] = s02r - s13r;
      ch[o + 2 * sOut + 1] = s02i - s13i;
      ch[o + 3 * sOut] = d02r - d13i;
      ch[o + 3 * sOut + 1] = d02i + d13r;
    }
    return;
  }
  if (ido < l1 && ido * l1 <= SWAP_MAX) {
    // Late passes (short sub-transforms, many of them): each twiddle is loaded once and serves all l1.
    for (let i = 0; i < ido; i++) {
      const w1r = tw[t0 + 2 * i]!;
      const w1i = tw[t0 + 2 * i + 1]!;
      const w2r = tw[t1 + 2 * i]!;
      const w2i = tw[t1 + 2 * i + 1]!;
      const w3r = tw[t2 + 2 * i]!;
      const w3i = tw[t2 + 2 * i + 1]!;
      for (let k = 0; k < l1; k++) {
        const a = 8 * ido * k + 2 * i;
        const o = 2 * ido * k + 2 * i;
        const a0r = cc[a]!;
        const a0i = cc[a + 1]!;
        const a1r = cc[a + sIn]!;
        const a1i = cc[a + sIn + 1]!;
        const a2r = cc[a + 2 * sIn]!;
        const a2i = cc[a + 2 * sIn + 1]!;
        const a3r = cc[a + 3 * sIn]!;
        const a3i = cc[a + 3 * sIn + 1]!;
        const s02r = a0r + a2r;
        const s02i = a0i + a2i;
        const d02r = a0r - a2r;
        const d02i = a0i - a2i;
        const s13r = a1r + a3r;
        const s13i = a1i + a3i;
        const d13r = a1r - a3r;
        const d13i = a1i - a3i;
        ch[o] = s02r + s13r;
        ch[o + 1] = s02i + s13i;
        const x1r = d02r + d13i;
        const x1i = d02i - d13r;
        const x2r = s02r - s13r;
        const x2i = s02i - s13i;
        const x3r = d02r - d13i;
        const x3i = d02i + d13r;
        ch[o + sOut] = x1r * w1r - x1i * w1i;
        ch[o + sOut + 1] = x1r * w1i + x1i * w1r;
        ch[o + 2 * sOut] = x2r * w2r - x2i * w2i;
        ch[o + 2 * sOut + 1] = x2r * w2i + x2i * w2r;
        ch[o + 3 * sOut] = x3r * w3r - x3i * w3i;
        ch[o + 3 * sOut + 1] = x3r * w3i + x3i * w3r;
      }
    }
    return;
  }
  for (let k = 0; k < l1; k++) {
    const inK = 8 * ido * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      const a1r = cc[a + sIn]!;
      const a1i = cc[a + sIn + 1]!;
      const a2r = cc[a + 2 * sIn]!;
      const a2i = cc[a + 2 * sIn + 1]!;
      const a3r = cc[a + 3 * sIn]!;
      const a3i = cc[a + 3 * sIn + 1]!;
      const s02r = a0r + a2r;
      const s02i = a0i + a2i;
      const d02r = a0r - a2r;
      const d02i = a0i - a2i;
      const s13r = a1r + a3r;
      const s13i = a1i + a3i;
      const d13r = a1r - a3r;
      const d13i = a1i - a3i;
      ch[o] = s02r + s13r;
      ch[o + 1] = s02i + s13i;
      // X1 = d02 − i·d13, X2 = s02 − s13, X3 = d02 + i·d13, each times its twiddle.
      const x1r = d02r + d13i;
      const x1i = d02i - d13r;
      const x2r = s02r - s13r;
      const x2i = s02i - s13i;
      const x3r = d02r - d13i;
      const x3i = d02i + d13r;
      const w1r = tw[t0 + 2 * i]!;
      const w1i = tw[t0 + 2 * i + 1]!;
      const w2r = tw[t1 + 2 * i]!;
      const w2i = tw[t1 + 2 * i + 1]!;
      const w3r = tw[t2 + 2 * i]!;
      const w3i = tw[t2 + 2 * i + 1]!;
      ch[o + sOut] = x1r * w1r - x1i * w1i;
      ch[o + sOut + 1] = x1r * w1i + x1i * w1r;
      ch[o + 2 * sOut] = x2r * w2r - x2i * w2i;
      ch[o + 2 * sOut + 1] = x2r * w2i + x2i * w2r;
      ch[o + 3 * sOut] = x3r * w3r - x3i * w3i;
      ch[o + 3 * sOut + 1] = x3r * w3i + x3i * w3r;
    }
  }
}

/** cos and sin of 2π/3. */
const C3 = -0.5;
const S3 = Math.sqrt(3) / 2;

function pass3(
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  const t1 = t0 + 2 * ido;
  const last = ido === 1;
  for (let k = 0; k < l1; k++) {
    const inK = 6 * ido * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      const a1r = cc[a + sIn]!;
      const a1i = cc[a + sIn + 1]!;
      const a2r = cc[a + 2 * sIn]!;
      const a2i = cc[a + 2 * sIn + 1]!;
      const sr = a1r + a2r;
      const si = a1i + a2i;
      ch[o] = a0r + sr;
      ch[o + 1] = a0i + si;
      const mr = a0r + C3 * sr;
      const mi = a0i + C3 * si;
      // −i·sin(2π/3)·(a1 − a2)
      const qr = S3 * (a1i - a2i);
      const qi = -S3 * (a1r - a2r);
      const x1r = mr + qr;
      const x1i = mi + qi;
      const x2r = mr - qr;
      const x2i = mi - qi;
      if (last) {
        // The last pass (ido = 1): every twiddle is 1.
        ch[o + sOut] = x1r;
        ch[o + sOut + 1] = x1i;
        ch[o + 2 * sOut] = x2r;
        ch[o + 2 * sOut + 1] = x2i;
        continue;
      }
      const w1r = tw[t0 + 2 * i]!;
      const w1i = tw[t0 + 2 * i + 1]!;
      const w2r = tw[t1 + 2 * i]!;
      const w2i = tw[t1 + 2 * i + 1]!;
      ch[o + sOut] = x1r * w1r - x1i * w1i;
      ch[o + sOut + 1] = x1r * w1i + x1i * w1r;
      ch[o + 2 * sOut] = x2r * w2r - x2i * w2i;
      ch[o + 2 * sOut + 1] = x2r * w2i + x2i * w2r;
    }
  }
}

/** cos and sin of 2π/5 and 4π/5. */
const C51 = Math.cos((2 * Math.PI) / 5);
const S51 = Math.sin((2 * Math.PI) / 5);
const C52 = Math.cos((4 * Math.PI) / 5);
const S52 = Math.sin((4 * Math.PI) / 5);

function pass5(
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  const last = ido === 1;
  for (let k = 0; k < l1; k++) {
    const inK = 10 * ido * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      const a1r = cc[a + sIn]!;
      const a1i = cc[a + sIn + 1]!;
      const a2r = cc[a + 2 * sIn]!;
      const a2i = cc[a + 2 * sIn + 1]!;
      const a3r = cc[a + 3 * sIn]!;
      const a3i = cc[a + 3 * sIn + 1]!;
      const a4r = cc[a + 4 * sIn]!;
      const a4i = cc[a + 4 * sIn + 1]!;
      const s14r = a1r + a4r;
      const s14i = a1i + a4i;
      const d14r = a1r - a4r;
      const d14i = a1i - a4i;
      const s23r = a2r + a3r;
      const s23i = a2i + a3i;
      const d23r = a2r - a3r;
      const d23i = a2i - a3i;
      ch[o] = a0r + s14r + s23r;
      ch[o + 1] = a0i + s14i + s23i;
      // Xm = a0 + cos·(sums) − i·sin·(differences), for m = 1, 4 and m = 2, 3.
      const m1r = a0r + C51 * s14r + C52 * s23r;
      const m1i = a0i + C51 * s14i + C52 * s23i;
      const m2r = a0r + C52 * s14r + C51 * s23r;
      const m2i = a0i + C52 * s14i + C51 * s23i;
      const q1r = S51 * d14i + S52 * d23i;
      const q1i = -(S51 * d14r + S52 * d23r);
      const q2r = S52 * d14i - S51 * d23i;
      const q2i = -(S52 * d14r - S51 * d23r);
      if (last) {
        // The last pass (ido = 1): every twiddle is 1.
        ch[o + sOut] = m1r + q1r;
        ch[o + sOut + 1] = m1i + q1i;
        ch[o + 2 * sOut] = m2r + q2r;
        ch[o + 2 * sOut + 1] = m2i + q2i;
        ch[o + 3 * sOut] = m2r - q2r;
        ch[o + 3 * sOut + 1] = m2i - q2i;
        ch[o + 4 * sOut] = m1r - q1r;
        ch[o + 4 * sOut + 1] = m1i - q1i;
        continue;
      }
      out5(ch, o + sOut, m1r + q1r, m1i + q1i, tw, t0 + 2 * i);
      out5(ch, o + 2 * sOut, m2r + q2r, m2i + q2i, tw, t0 + 2 * ido + 2 * i);
      out5(ch, o + 3 * sOut, m2r - q2r, m2i - q2i, tw, t0 + 4 * ido + 2 * i);
      out5(ch, o + 4 * sOut, m1r - q1r, m1i - q1i, tw, t0 + 6 * ido + 2 * i);
    }
  }
}

function out5(ch: Float64Array, o: number, xr: number, xi: number, tw: Float64Array, w: number): void {
  const wr = tw[w]!;
  const wi = tw[w + 1]!;
  ch[o] = xr * wr - xi * wi;
  ch[o + 1] = xr * wi + xi * wr;
}

/** cos and sin of 2πk/7, k = 1, 2, 3. */
const C71 = Math.cos((2 * Math.PI) / 7);
const S71 = Math.sin((2 * Math.PI) / 7);
const C72 = Math.cos((4 * Math.PI) / 7);
const S72 = Math.sin((4 * Math.PI) / 7);
const C73 = Math.cos((6 * Math.PI) / 7);
const S73 = Math.sin((6 * Math.PI) / 7);

/**
 * Radix 7 written out (44 100 = 2²·3²·5²·7² and 22 050, its packed half, have two such passes): the general
 * butterfly's pairing a_j ± a_{7−j} with the angles folded into three cosines and three sines,
 * cos(2π·jm/7) and sin(2π·jm/7) taken from the table C7k/S7k by jm mod 7.
 */
function pass7(
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  for (let k = 0; k < l1; k++) {
    const inK = 14 * ido * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      const a1r = cc[a + sIn]!;
      const a1i = cc[a + sIn + 1]!;
      const a2r = cc[a + 2 * sIn]!;
      const a2i = cc[a + 2 * sIn + 1]!;
      const a3r = cc[a + 3 * sIn]!;
      const a3i = cc[a + 3 * sIn + 1]!;
      const a4r = cc[a + 4 * sIn]!;
      const a4i = cc[a + 4 * sIn + 1]!;
      const a5r = cc[a + 5 * sIn]!;
      const a5i = cc[a + 5 * sIn + 1]!;
      const a6r = cc[a + 6 * sIn]!;
      const a6i = cc[a + 6 * sIn + 1]!;
      const s1r = a1r + a6r;
      const s1i = a1i + a6i;
      const d1r = a1r - a6r;
      const d1i = a1i - a6i;
      const s2r = a2r + a5r;
      const s2i = a2i + a5i;
      const d2r = a2r - a5r;
      const d2i = a2i - a5i;
      const s3r = a3r + a4r;
      const s3i = a3i + a4i;
      const d3r = a3r - a4r;
      const d3i = a3i - a4i;
      ch[o] = a0r + s1r + s2r + s3r;
      ch[o + 1] = a0i + s1i + s2i + s3i;
      // X_m = C_m − i·S_m and X_{7−m} = C_m + i·S_m: C_m = a0 + Σ cos(2πjm/7)·s_j, S_m = Σ sin(2πjm/7)·d_j.
      const c1r = a0r + C71 * s1r + C72 * s2r + C73 * s3r;
      const c1i = a0i + C71 * s1i + C72 * s2i + C73 * s3i;
      const c2r = a0r + C72 * s1r + C73 * s2r + C71 * s3r;
      const c2i = a0i + C72 * s1i + C73 * s2i + C71 * s3i;
      const c3r = a0r + C73 * s1r + C71 * s2r + C72 * s3r;
      const c3i = a0i + C73 * s1i + C71 * s2i + C72 * s3i;
      const q1r = S71 * d1r + S72 * d2r + S73 * d3r;
      const q1i = S71 * d1i + S72 * d2i + S73 * d3i;
      const q2r = S72 * d1r - S73 * d2r - S71 * d3r;
      const q2i = S72 * d1i - S73 * d2i - S71 * d3i;
      const q3r = S73 * d1r - S71 * d2r + S72 * d3r;
      const q3i = S73 * d1i - S71 * d2i + S72 * d3i;
      const w = t0 + 2 * i;
      out5(ch, o + sOut, c1r + q1i, c1i - q1r, tw, w);
      out5(ch, o + 2 * sOut, c2r + q2i, c2i - q2r, tw, w + 2 * ido);
      out5(ch, o + 3 * sOut, c3r + q3i, c3i - q3r, tw, w + 4 * ido);
      out5(ch, o + 4 * sOut, c3r - q3i, c3i + q3r, tw, w + 6 * ido);
      out5(ch, o + 5 * sOut, c2r - q2i, c2i + q2r, tw, w + 8 * ido);
      out5(ch, o + 6 * sOut, c1r - q1i, c1i + q1r, tw, w + 10 * ido);
    }
  }
}

/** cos(2πq/p) and sin(2πq/p), q < p, per odd radix p of the general butterfly. */
const rootTables = new Map<number, Float64Array>();
function rootsOfUnity(p: number): Float64Array {
  let t = rootTables.get(p);
  if (!t) {
    t = new Float64Array(2 * p);
    for (let q = 0; q < p; q++) {
      t[2 * q] = Math.cos((2 * Math.PI * q) / p);
      t[2 * q + 1] = Math.sin((2 * Math.PI * q) / p);
    }
    rootTables.set(p, t);
  }
  return t;
}

/**
 * Any odd radix p (prime factors above 5) by the DFT's definition, with the inputs paired as a_j ± a_{p−j}:
 * X_m and X_{p−m} share the cosine sums and differ in the sign of the sine sums, so a butterfly costs about
 * p²/4 complex-by-real products instead of p² complex ones.
 */
function passGeneral(
  p: number,
  ido: number,
  l1: number,
  cc: Float64Array,
  ch: Float64Array,
  tw: Float64Array,
  t0: number,
): void {
  const roots = rootsOfUnity(p);
  const half = (p - 1) >> 1;
  const sIn = 2 * ido;
  const sOut = 2 * ido * l1;
  const sr = new Float64Array(half + 1);
  const si = new Float64Array(half + 1);
  const dr = new Float64Array(half + 1);
  const di = new Float64Array(half + 1);
  for (let k = 0; k < l1; k++) {
    const inK = 2 * ido * p * k;
    const outK = 2 * ido * k;
    for (let i = 0; i < ido; i++) {
      const a = inK + 2 * i;
      const o = outK + 2 * i;
      const a0r = cc[a]!;
      const a0i = cc[a + 1]!;
      let x0r = a0r;
      let x0i = a0i;
      for (let j = 1; j <= half; j++) {
        const pr = cc[a + j * sIn]!;
        const pi = cc[a + j * sIn + 1]!;
        const qr = cc[a + (p - j) * sIn]!;
        const qi = cc[a + (p - j) * sIn + 1]!;
        sr[j] = pr + qr;
        si[j] = pi + qi;
        dr[j] = pr - qr;
        di[j] = pi - qi;
        x0r += pr + qr;
        x0i += pi + qi;
      }
      ch[o] = x0r;
      ch[o + 1] = x0i;
      for (let m = 1; m <= half; m++) {
        let cr = a0r;
        let ci = a0i;
        let snr = 0;
        let sni = 0;
        for (let j = 1, q = m; j <= half; j++, q = (q + m) % p) {
          const c = roots[2 * q]!;
          const sn = roots[2 * q + 1]!;
          cr += c * sr[j]!;
          ci += c * si[j]!;
          snr += sn * dr[j]!;
          sni += sn * di[j]!;
        }
        // X_m = C − i·S and X_{p−m} = C + i·S, with S = Σ sin·(a_j − a_{p−j}).
        const xr = cr + sni;
        const xi = ci - snr;
        const yr = cr - sni;
        const yi = ci + snr;
        const w1 = t0 + 2 * ((m - 1) * ido + i);
        const w2 = t0 + 2 * ((p - m - 1) * ido + i);
        const w1r = tw[w1]!;
        const w1i = tw[w1 + 1]!;
        const w2r = tw[w2]!;
        const w2i = tw[w2 + 1]!;
        ch[o + m * sOut] = xr * w1r - xi * w1i;
        ch[o + m * sOut + 1] = xr * w1i + xi * w1r;
        ch[o + (p - m) * sOut] = yr * w2r - yi * w2i;
        ch[o + (p - m) * sOut + 1] = yr * w2i + yi * w2r;
      }
    }
  }
}
