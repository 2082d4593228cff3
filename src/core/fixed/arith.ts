/**
 * Exact integer arithmetic of the fixed-point data path, in two interchangeable forms: doubles (exact while
 * every intermediate stays below 2^53) and BigInt (for wide words and accumulators). Both fit sums to the
 * accumulator's A bits and results to the data word's D bits by the same rules, which the exported C repeats.
 *
 * - A product of a D-bit sample and a W-bit coefficient is exact (at most D+W−1 bits).
 * - Every addition into the accumulator (including loading the first product) is fitted to A bits:
 *   saturated or wrapped by the overflow mode.
 * - Back to data: shift right by F (the coefficient fraction bits) rounding as chosen ('nearest': add bit
 *   F−1 of the accumulator, i.e. ties up; 'truncate': floor), then saturate or wrap to D bits.
 */
import type { Overflow, Rounding } from './settings.ts';

/** The arithmetic of one data path; `accOverflow`/`dataOverflow` are set when a fit changed a value. */
export interface Arith<T> {
  readonly zero: T;
  product(coefficient: number, sample: number): T;
  negate(v: T): T;
  /** acc + v, fitted to the accumulator. */
  add(acc: T, v: T): T;
  /** The accumulator shifted and rounded back to a data code, fitted to the data word. */
  toData(acc: T): number;
  accOverflow: boolean;
  dataOverflow: boolean;
}

/** The parameters of a data path. */
export interface DataPath {
  dataBits: number;
  accumulatorBits: number;
  postShift: number;
  rounding: Rounding;
  overflow: Overflow;
}

/**
 * Largest D + W for which doubles are exact: at most five products of 2^(D+W−2) each are summed, which stays
 * below 2^(D+W+1) ≤ 2^51, and any fit to A ≤ 52 bits keeps values below 2^53.
 */
export const DOUBLE_PATH_MAX_BITS = 50;

class NumberArith implements Arith<number> {
  readonly zero = 0;
  accOverflow = false;
  dataOverflow = false;
  private readonly scale: number;
  private readonly half: number;
  private readonly nearest: boolean;
  private readonly saturate: boolean;
  /** Whether sums can reach the accumulator's limits at all (see DOUBLE_PATH_MAX_BITS). */
  private readonly accLimited: boolean;
  private readonly accMin: number;
  private readonly accMax: number;
  private readonly dataMin: number;
  private readonly dataMax: number;
  constructor(p: DataPath) {
    this.scale = 2 ** p.postShift;
    this.half = p.postShift > 0 ? 2 ** (p.postShift - 1) : Infinity;
    this.nearest = p.rounding === 'nearest';
    this.saturate = p.overflow === 'saturate';
    this.accLimited = p.accumulatorBits <= 52;
    this.accMin = -(2 ** (p.accumulatorBits - 1));
    this.accMax = 2 ** (p.accumulatorBits - 1) - 1;
    this.dataMin = -(2 ** (p.dataBits - 1));
    this.dataMax = 2 ** (p.dataBits - 1) - 1;
  }
  product(c: number, x: number): number {
    return c * x;
  }
  negate(v: number): number {
    return -v;
  }
  private fit(v: number, min: number, max: number): number {
    if (this.saturate) return v < min ? min : max;
    const span = max - min + 1;
    return v - span * Math.floor((v - min) / span);
  }
  add(acc: number, v: number): number {
    const s = acc + v;
    if (!this.accLimited || (s >= this.accMin && s <= this.accMax)) return s;
    this.accOverflow = true;
    return this.fit(s, this.accMin, this.accMax);
  }
  toData(acc: number): number {
    const q = Math.floor(acc / this.scale);
    const r = this.nearest && acc - q * this.scale >= this.half ? q + 1 : q;
    if (r >= this.dataMin && r <= this.dataMax) return r;
    this.dataOverflow = true;
    return this.fit(r, this.dataMin, this.dataMax);
  }
}

class BigArith implements Arith<bigint> {
  readonly zero = 0n;
  accOverflow = false;
  dataOverflow = false;
  private readonly a: number;
  private readonly amin: bigint;
  private readonly amax: bigint;
  private readonly shift: bigint;
  constructor(private readonly p: DataPath) {
    this.a = p.accumulatorBits;
    this.amax = (1n << BigInt(this.a - 1)) - 1n;
    this.amin = -(1n << BigInt(this.a - 1));
    this.shift = BigInt(p.postShift);
  }
  product(c: number, x: number): bigint {
    return BigInt(c) * BigInt(x);
  }
  negate(v: bigint): bigint {
    return -v;
  }
  add(acc: bigint, v: bigint): bigint {
    const s = acc + v;
    if (s >= this.amin && s <= this.amax) return s;
    this.accOverflow = true;
    if (this.p.overflow === 'wrap') return BigInt.asIntN(this.a, s);
    return s < 0n ? this.amin : this.amax;
  }
  toData(acc: bigint): number {
    let r = acc >> this.shift;
    if (this.p.rounding === 'nearest' && this.shift > 0n) r += (acc >> (this.shift - 1n)) & 1n;
    const d = this.p.dataBits;
    const max = (1n << BigInt(d - 1)) - 1n;
    const min = -(1n << BigInt(d - 1));
    if (r >= min && r <= max) return Number(r);
    this.dataOverflow = true;
    if (this.p.overflow === 'wrap') return Number(BigInt.asIntN(d, r));
    return Number(r < 0n ? min : max);
  }
}

/** The exact arithmetic for the path: doubles when D + W ≤ DOUBLE_PATH_MAX_BITS, BigInt otherwise. */
export function makeArith(path: DataPath, wordLength: number): Arith<number> | Arith<bigint> {
  return path.dataBits + wordLength <= DOUBLE_PATH_MAX_BITS ? new NumberArith(path) : new BigArith(path);
}

/** The BigInt arithmetic regardless of width (for checking the double path against it). */
export function makeBigArith(path: DataPath): Arith<bigint> {
  return new BigArith(path);
}
