/**
 * Amplitudes of sinusoids at known frequencies by least squares: x[n] ≈ c + Σ_k (a_k cos ω_k n + b_k sin ω_k n)
 * fitted jointly over a span of N samples, optionally weighted by a Hann window over the span. At the
 * tone's own frequency there is no scalloping (nothing falls between bins), fitting the tones jointly with a
 * constant keeps them from leaking into each other and the offset from leaking into them, and the Hann weight
 * lowers the leakage of strong content elsewhere in the spectrum (its sidelobes fall 18 dB per octave).
 *
 * The samples enter only through the projections Σ w·x·cos ω n and Σ w·x·sin ω n, accumulated block by block
 * (so a long recording streams through); the normal matrix Σ w·φ_i·φ_j is summed in closed form from the
 * Dirichlet kernel D(α) = Σ_{n<N} e^{iαn} = e^{iα(N−1)/2}·sin(Nα/2)/sin(α/2), the Hann weight being
 * ½ − ¼e^{iβn} − ¼e^{−iβn} with β = 2π/N.
 */
import { hzToOmega } from '../units.ts';

/** 'rectangular': ordinary least squares; 'hann': weighted by a periodic Hann window over the span. */
export type FitWeighting = 'rectangular' | 'hann';

/** One fitted sinusoid. */
export interface ToneEstimate {
  frequencyHz: number;
  /** Peak amplitude in the signal's units. */
  amplitude: number;
  /** 20·log10(amplitude): dB re amplitude 1 (for samples with full scale 1, dB re a full-scale sine). */
  levelDb: number;
  /** Phase at the span's first sample, radians: the tone is amplitude·cos(ω n + phase). */
  phase: number;
}

/** A column of the model: cos or sin of ω·n (ω in radians per sample; the constant is cos 0). */
interface Column {
  omega: number;
  sin: boolean;
}

/** Samples between exact re-evaluations of the rotating phasors (keeps their drift near one ulp). */
const RESYNC = 1024;
/** An angle this close to a multiple of 2π sums as exactly zero in the Dirichlet kernel (N·e^{i0}). */
const ZERO_ANGLE = 1e-15;
/**
 * A pivot below this fraction of the normal matrix's largest diagonal means two columns are nearly the same
 * sinusoid: the fit is refused rather than returned with amplitudes that noise would swing.
 */
const PIVOT_FLOOR = 1e-10;

/** Σ_{n<N} e^{iαn} as [re, im]. */
function dirichlet(alpha: number, n: number): [number, number] {
  const a = alpha - 2 * Math.PI * Math.round(alpha / (2 * Math.PI));
  if (Math.abs(a) < ZERO_ANGLE) return [n, 0];
  const mag = Math.sin((n * a) / 2) / Math.sin(a / 2);
  const ph = (a * (n - 1)) / 2;
  return [mag * Math.cos(ph), mag * Math.sin(ph)];
}

/** Fits sinusoids at fixed frequencies to a span of known length fed in blocks. */
export class ToneFitAccumulator {
  private readonly omegas: number[];
  private readonly columns: Column[];
  /** Per distinct frequency: Σ w·x·cos, Σ w·x·sin. */
  private readonly proj: Float64Array;
  private sumWx = 0;
  private n = 0;
  /** The weighted samples of one push, reused (a push of a long record's slice allocates nothing). */
  private scratch = new Float64Array(0);

  /**
   * `frequenciesHz` in 0..fs/2 (repeats are fitted once), `length` the span's sample count (the Hann weight
   * needs it in advance). Pushed samples beyond `length` are ignored.
   */
  constructor(
    readonly sampleRate: number,
    readonly frequenciesHz: readonly number[],
    readonly length: number,
    readonly weighting: FitWeighting = 'hann',
  ) {
    if (!(sampleRate > 0)) throw new RangeError(`sample rate ${sampleRate} Hz; it must be positive`);
    if (!(Number.isInteger(length) && length >= 1))
      throw new RangeError(`span of ${length} samples; a whole number ≥ 1`);
    for (const f of frequenciesHz)
      if (!(f >= 0 && f <= sampleRate / 2))
        throw new RangeError(`${f} Hz is outside 0 to ${sampleRate / 2} Hz (half the sample rate)`);
    const distinct = [...new Set(frequenciesHz)].sort((a, b) => a - b);
    const resolution = sampleRate / length;
    for (let i = 1; i < distinct.length; i++)
      if (distinct[i]! - distinct[i - 1]! < resolution) throw tooClose(resolution, length);
    this.omegas = distinct.map((f) => hzToOmega(f, sampleRate)).filter((w) => w > 0);
    this.columns = [{ omega: 0, sin: false }];
    for (const w of this.omegas) {
      this.columns.push({ omega: w, sin: false });
      if (w < Math.PI) this.columns.push({ omega: w, sin: true });
    }
    this.proj = new Float64Array(2 * this.omegas.length);
  }

  /** Adds the next samples of the span. */
  push(x: ArrayLike<number>): void {
    const take = Math.min(x.length, this.length - this.n);
    if (take <= 0) return;
    if (this.scratch.length < take) this.scratch = new Float64Array(take);
    const wx = this.scratch;
    const n0 = this.n;
    const hann = this.weighting === 'hann';
    const beta = (2 * Math.PI) / this.length;
    let sum = 0;
    for (let i = 0; i < take; i++) {
      const w = hann ? 0.5 - 0.5 * Math.cos(beta * (n0 + i)) : 1;
      wx[i] = w * x[i]!;
      sum += wx[i]!;
    }
    this.sumWx += sum;
    this.omegas.forEach((omega, k) => {
      const cr = Math.cos(omega);
      const sr = Math.sin(omega);
      let c = 0;
      let s = 0;
      let pc = 0;
      let ps = 0;
      for (let i = 0; i < take; i++) {
        if (i % RESYNC === 0) {
          c = Math.cos(omega * (n0 + i));
          s = Math.sin(omega * (n0 + i));
        }
        const v = wx[i]!;
        pc += v * c;
        ps += v * s;
        const t = c * cr - s * sr;
        s = s * cr + c * sr;
        c = t;
      }
      this.proj[2 * k] = this.proj[2 * k]! + pc;
      this.proj[2 * k + 1] = this.proj[2 * k + 1]! + ps;
    });
    this.n += take;
  }

  /** Samples received so far (at most the span length). */
  get received(): number {
    return this.n;
  }

  /** Σ w e^{iαn} over the span, [re, im]. */
  private weightSum(alpha: number): [number, number] {
    const n = this.length;
    const d = dirichlet(alpha, n);
    if (this.weighting === 'rectangular') return d;
    const beta = (2 * Math.PI) / n;
    const up = dirichlet(alpha + beta, n);
    const down = dirichlet(alpha - beta, n);
    return [0.5 * d[0] - 0.25 * (up[0] + down[0]), 0.5 * d[1] - 0.25 * (up[1] + down[1])];
  }

  private gram(p: Column, q: Column): number {
    const [dr, di] = this.weightSum(p.omega - q.omega);
    const [sr, si] = this.weightSum(p.omega + q.omega);
    if (!p.sin && !q.sin) return 0.5 * (dr + sr);
    if (p.sin && q.sin) return 0.5 * (dr - sr);
    // cos p · sin q = ½[sin(p+q) − sin(p−q)]
    return p.sin ? 0.5 * (si + di) : 0.5 * (si - di);
  }

  /**
   * The fitted tones, one per asked frequency in the asked order (0 Hz reads the constant), and the fitted
   * constant. Throws a RangeError when the span was not filled, or when two frequencies are too close to
   * tell apart in it (closer than about 1/(span in seconds)).
   */
  result(): { tones: ToneEstimate[]; offset: number } {
    if (this.n < this.length)
      throw new RangeError(`the span has ${this.length} samples but only ${this.n} were given`);
    const cols = this.columns;
    const a = cols.map((p) => cols.map((q) => this.gram(p, q)));
    const b = cols.map((c, i) => {
      if (i === 0) return this.sumWx;
      const k = this.omegas.indexOf(c.omega);
      return this.proj[2 * k + (c.sin ? 1 : 0)]!;
    });
    const coef = solve(a, b, () => tooClose(this.sampleRate / this.length, this.length));
    const tones = this.frequenciesHz.map((f): ToneEstimate => {
      const omega = hzToOmega(f, this.sampleRate);
      if (omega === 0) return tone(f, coef[0]!, 0);
      const i = cols.findIndex((c) => c.omega === omega && !c.sin);
      const j = cols.findIndex((c) => c.omega === omega && c.sin);
      return tone(f, coef[i]!, j < 0 ? 0 : coef[j]!);
    });
    return { tones, offset: coef[0]! };
  }
}

function tooClose(resolutionHz: number, length: number): RangeError {
  return new RangeError(
    `frequencies closer than ${resolutionHz.toPrecision(3)} Hz (1 / the span) cannot be told apart in ${length} samples; ask for fewer, or use a longer span`,
  );
}

function tone(frequencyHz: number, a: number, b: number): ToneEstimate {
  const amplitude = Math.hypot(a, b);
  return {
    frequencyHz,
    amplitude,
    levelDb: amplitude > 0 ? 20 * Math.log10(amplitude) : -Infinity,
    phase: Math.atan2(-b, a),
  };
}

/** Solves the symmetric system by Gaussian elimination with partial pivoting; `singular` makes the error. */
function solve(a: number[][], b: number[], singular: () => Error): number[] {
  const m = b.length;
  const scale = Math.max(...a.map((r, i) => Math.abs(r[i]!)));
  for (let col = 0; col < m; col++) {
    let p = col;
    for (let r = col + 1; r < m; r++) if (Math.abs(a[r]![col]!) > Math.abs(a[p]![col]!)) p = r;
    if (!(Math.abs(a[p]![col]!) > PIVOT_FLOOR * scale)) throw singular();
    [a[col], a[p]] = [a[p]!, a[col]!];
    [b[col], b[p]] = [b[p]!, b[col]!];
    for (let r = col + 1; r < m; r++) {
      const f = a[r]![col]! / a[col]![col]!;
      for (let c = col; c < m; c++) a[r]![c] = a[r]![c]! - f * a[col]![c]!;
      b[r] = b[r]! - f * b[col]!;
    }
  }
  const x = new Array<number>(m).fill(0);
  for (let r = m - 1; r >= 0; r--) {
    let s = b[r]!;
    for (let c = r + 1; c < m; c++) s -= a[r]![c]! * x[c]!;
    x[r] = s / a[r]![r]!;
  }
  return x;
}

/** Fits the tones over x[start, start + count) (default: all of x). */
export function fitTones(
  x: ArrayLike<number>,
  sampleRate: number,
  frequenciesHz: readonly number[],
  options: { weighting?: FitWeighting; start?: number; count?: number } = {},
): { tones: ToneEstimate[]; offset: number } {
  const start = options.start ?? 0;
  const count = options.count ?? x.length - start;
  const acc = new ToneFitAccumulator(sampleRate, frequenciesHz, count, options.weighting ?? 'hann');
  const view = ArrayBuffer.isView(x)
    ? (x as unknown as Float64Array).subarray(start, start + count)
    : Array.from({ length: count }, (_, i) => x[start + i]!);
  acc.push(view);
  return acc.result();
}
