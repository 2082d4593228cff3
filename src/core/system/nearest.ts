/**
 * Nearest-point queries over a list of points in the plane from which points are removed one by one, as
 * section pairing needs for zeros: the nearest remaining point to a query, among the real ones (im = 0), the
 * complex ones or all, with ties going to the point earliest in the list. Identical points share one bucket
 * and the buckets are sorted by real part, so a query looks only at buckets whose real part is within the
 * best distance found so far: O(log n) plus the points that close, instead of every point.
 */

interface Bucket {
  re: number;
  im: number;
  /** List indices of the points here, increasing; `head` is the first not yet removed. */
  indices: number[];
  head: number;
}

/** The buckets of one kind (real or complex), sorted by real part, with links that skip empty buckets. */
class Side {
  readonly buckets: Bucket[];
  private readonly next: Int32Array;
  private readonly prev: Int32Array;
  count = 0;

  constructor(points: readonly { re: number; im: number; index: number }[]) {
    const sorted = points.slice().sort((a, b) => a.re - b.re || a.im - b.im || a.index - b.index);
    const buckets: Bucket[] = [];
    for (const p of sorted) {
      const last = buckets[buckets.length - 1];
      if (last && Object.is(last.re, p.re) && Object.is(last.im, p.im)) last.indices.push(p.index);
      else buckets.push({ re: p.re, im: p.im, indices: [p.index], head: 0 });
    }
    this.buckets = buckets;
    this.count = sorted.length;
    const n = buckets.length;
    this.next = Int32Array.from({ length: n }, (_, i) => i + 1);
    this.prev = Int32Array.from({ length: n }, (_, i) => i - 1);
  }

  /** Takes the first remaining index out of bucket b. */
  take(b: number): void {
    const bucket = this.buckets[b]!;
    bucket.head++;
    this.count--;
    if (bucket.head < bucket.indices.length) return;
    const p = this.prev[b]!;
    const q = this.next[b]!;
    if (p >= 0) this.next[p] = q;
    if (q < this.buckets.length) this.prev[q] = p;
  }

  /** The first bucket whose real part is at least re (by binary search), or the end. */
  private lowerBound(re: number): number {
    let lo = 0;
    let hi = this.buckets.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.buckets[mid]!.re < re) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }

  /** A live bucket at or after i (following the links), or the end. */
  private liveFrom(i: number): number {
    const n = this.buckets.length;
    while (i < n && this.buckets[i]!.head >= this.buckets[i]!.indices.length) i = this.next[i]!;
    return i;
  }

  /** A live bucket at or before i, or -1. */
  private liveBefore(i: number): number {
    while (i >= 0 && this.buckets[i]!.head >= this.buckets[i]!.indices.length) i = this.prev[i]!;
    return i;
  }

  /** Improves `best` with the nearest remaining point of this side to (re, im). */
  nearest(
    re: number,
    im: number,
    best: { d: number; index: number; bucket: number; side: Side | null },
  ): void {
    if (this.count === 0) return;
    const start = this.lowerBound(re);
    const consider = (b: number) => {
      const bucket = this.buckets[b]!;
      const d = Math.hypot(bucket.re - re, bucket.im - im);
      const index = bucket.indices[bucket.head]!;
      if (d < best.d || (d === best.d && index < best.index)) {
        best.d = d;
        best.index = index;
        best.bucket = b;
        best.side = this;
      }
    };
    // Past this gap in the real part no point can be nearer; the margin keeps exact ties in view.
    const far = (b: number) => Math.abs(this.buckets[b]!.re - re) > best.d * (1 + 1e-12) + 1e-300;
    for (let b = this.liveFrom(start); b < this.buckets.length; b = this.liveFrom(this.next[b]!)) {
      if (far(b)) break;
      consider(b);
    }
    for (let b = this.liveBefore(start - 1); b >= 0; b = this.liveBefore(this.prev[b]!)) {
      if (far(b)) break;
      consider(b);
    }
  }
}

/** Points (by list index) that can be queried for the nearest remaining one and removed. */
export class NearestPoints {
  private readonly real: Side;
  private readonly complex: Side;
  private readonly where: { side: Side; bucket: number }[];

  constructor(points: readonly { re: number; im: number }[]) {
    const indexed = points.map((p, index) => ({ re: p.re, im: p.im, index }));
    this.real = new Side(indexed.filter((p) => p.im === 0));
    this.complex = new Side(indexed.filter((p) => p.im !== 0));
    this.where = [];
    for (const side of [this.real, this.complex])
      side.buckets.forEach((b, bucket) => b.indices.forEach((i) => (this.where[i] = { side, bucket })));
  }

  /** Remaining real points, or complex ones. */
  count(which: 'real' | 'complex'): number {
    return which === 'real' ? this.real.count : this.complex.count;
  }

  /** The list index of the remaining point nearest to (re, im) of that kind (earliest on ties), or -1. */
  nearest(re: number, im: number, which: 'real' | 'complex' | 'any'): number {
    const best = { d: Infinity, index: -1, bucket: -1, side: null as Side | null };
    if (which !== 'complex') this.real.nearest(re, im, best);
    if (which !== 'real') this.complex.nearest(re, im, best);
    return best.index;
  }

  /** Removes a point by its list index; it must be the earliest remaining one of its bucket (as nearest gives). */
  remove(index: number): void {
    const w = this.where[index]!;
    w.side.take(w.bucket);
  }
}
