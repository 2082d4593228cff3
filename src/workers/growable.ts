/** A Float64Array that grows by doubling, for samples whose count is known only at the end. */
export class GrowableSamples {
  private data: Float64Array;
  length = 0;

  constructor(capacity = 1 << 16) {
    this.data = new Float64Array(Math.max(1, capacity));
  }

  /** Appends the values. */
  push(values: Float64Array): void {
    const need = this.length + values.length;
    if (need > this.data.length) {
      const next = new Float64Array(Math.max(need, 2 * this.data.length));
      next.set(this.data.subarray(0, this.length));
      this.data = next;
    }
    this.data.set(values, this.length);
    this.length = need;
  }

  /** The samples, in an array of exactly their length (its buffer can be transferred). */
  take(): Float64Array {
    return this.length === this.data.length ? this.data : this.data.slice(0, this.length);
  }
}
