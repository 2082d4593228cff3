/**
 * The bit-exact fixed-point cascade, one sample at a time, in direct form I or transposed direct form II.
 * The order of every addition is part of the definition (saturation is not associative) and is repeated
 * exactly by the exported C:
 * - DF1:  acc = b0·x; += b1·x1; += b2·x2; −= a1·y1; −= a2·y2 (or += with negated feedback); y = data(acc).
 *         States x1, x2, y1, y2 are data codes.
 * - DF2T: acc = b0·x; += s1; y = data(acc); s1 = b1·x; += s2; −= a1·y;  s2 = b2·x; −= a2·y.
 *         States s1, s2 are accumulator values (D−1+F fraction bits), fitted to A bits.
 */
import type { Arith } from './arith.ts';
import type { FixedSection } from './quantize.ts';
import type { FeedbackSign, Structure } from './settings.ts';

/** Where an overflow happened: in an accumulator sum (or DF2T state), or when the result was fitted to the data word. */
export type OverflowPlace = 'accumulator' | 'output';

/** One overflow: the sample index, the section (0-based) and the place. */
export interface OverflowEvent {
  sample: number;
  section: number;
  place: OverflowPlace;
}

/** A running fixed-point cascade with its state. */
export class FixedCascade<T> {
  /** DF1: [x1, x2, y1, y2] per section (data codes); DF2T: [s1, s2] per section (accumulator values). */
  readonly state: T[] | number[];
  private readonly c: Float64Array;
  private readonly n: number;

  constructor(
    private readonly ar: Arith<T>,
    codes: readonly FixedSection[],
    private readonly structure: Structure,
    private readonly feedback: FeedbackSign,
    private readonly onOverflow: (e: OverflowEvent) => void,
  ) {
    this.n = codes.length;
    this.c = new Float64Array(5 * this.n);
    codes.forEach((s, i) => this.c.set([...s.b, ...s.a], 5 * i));
    this.state =
      structure === 'df1' ? new Array<number>(4 * this.n).fill(0) : new Array<T>(2 * this.n).fill(ar.zero);
  }

  private fb(p: T): T {
    return this.feedback === 'denominator' ? this.ar.negate(p) : p;
  }

  private report(sample: number, section: number): void {
    const ar = this.ar;
    if (ar.accOverflow) this.onOverflow({ sample, section, place: 'accumulator' });
    if (ar.dataOverflow) this.onOverflow({ sample, section, place: 'output' });
    ar.accOverflow = false;
    ar.dataOverflow = false;
  }

  /** Filters one input code (sample index `n`, for overflow reports) and returns the output code. */
  step(x: number, n: number): number {
    const { ar, c } = this;
    let v = x;
    if (this.structure === 'df1') {
      const st = this.state as number[];
      for (let s = 0; s < this.n; s++) {
        const k = 5 * s;
        const j = 4 * s;
        let acc = ar.add(ar.zero, ar.product(c[k]!, v));
        acc = ar.add(acc, ar.product(c[k + 1]!, st[j]!));
        acc = ar.add(acc, ar.product(c[k + 2]!, st[j + 1]!));
        acc = ar.add(acc, this.fb(ar.product(c[k + 3]!, st[j + 2]!)));
        acc = ar.add(acc, this.fb(ar.product(c[k + 4]!, st[j + 3]!)));
        const y = ar.toData(acc);
        st[j + 1] = st[j]!;
        st[j] = v;
        st[j + 3] = st[j + 2]!;
        st[j + 2] = y;
        this.report(n, s);
        v = y;
      }
      return v;
    }
    const st = this.state as T[];
    for (let s = 0; s < this.n; s++) {
      const k = 5 * s;
      const j = 2 * s;
      const acc = ar.add(ar.add(ar.zero, ar.product(c[k]!, v)), st[j]!);
      const y = ar.toData(acc);
      let t = ar.add(ar.zero, ar.product(c[k + 1]!, v));
      t = ar.add(t, st[j + 1]!);
      st[j] = ar.add(t, this.fb(ar.product(c[k + 3]!, y)));
      const u = ar.add(ar.zero, ar.product(c[k + 2]!, v));
      st[j + 1] = ar.add(u, this.fb(ar.product(c[k + 4]!, y)));
      this.report(n, s);
      v = y;
    }
    return v;
  }

  /** A copy of the state, for cycle detection. */
  snapshot(): unknown[] {
    return [...this.state];
  }

  /** Whether the state equals a snapshot. */
  stateEquals(saved: readonly unknown[]): boolean {
    const st = this.state;
    for (let i = 0; i < st.length; i++) if (st[i] !== saved[i]) return false;
    return true;
  }

  /** Whether every state is zero (a zero-input filter then stays at rest). */
  atRest(): boolean {
    for (const v of this.state) if (v !== this.ar.zero) return false;
    return true;
  }
}
