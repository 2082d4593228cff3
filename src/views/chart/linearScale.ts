/**
 * A straight-line map between a domain (data) and a range (pixels), and nice rounding of a domain to tick
 * steps: what the charts and the plane took from d3-scale, whose colour and number-format
 * dependencies weighed more in the first view than the charts themselves. The arithmetic is d3-scale's
 * (normalise, then interpolate as a·(1−t) + b·t), so pixels stay where they were; tick steps come from
 * d3-array's tickIncrement (1, 2, 5 × 10^k).
 */
import { tickIncrement, ticks } from 'd3-array';

export interface LinearScale {
  /** The range value of a domain value. */
  (value: number): number;
  /** The domain value of a range value. */
  invert(value: number): number;
  domain(): [number, number];
  range(): [number, number];
  /** About `count` tick values across the domain at nice steps (d3-array's ticks). */
  ticks(count?: number): number[];
}

/** t at which v lies between a and b (0.5 for an empty interval, as d3-scale does). */
const normalise = (a: number, b: number, v: number) => (b - a ? (v - a) / (b - a) : 0.5);
const lerp = (a: number, b: number, t: number) => a * (1 - t) + b * t;

/** The map taking `domain` onto `range` (no clamping: values outside extend the line). */
export function linearScale(
  domain: readonly [number, number],
  range: readonly [number, number],
): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const scale = (v: number) => lerp(r0, r1, normalise(d0, d1, v));
  scale.invert = (v: number) => lerp(d0, d1, normalise(r0, r1, v));
  scale.domain = (): [number, number] => [d0, d1];
  scale.range = (): [number, number] => [r0, r1];
  scale.ticks = (count = 10) => ticks(d0, d1, count);
  return scale;
}

/**
 * [a, b] widened outwards to multiples of the tick step for about `count` ticks, repeated until the step
 * settles (at most 10 rounds), as d3-scale's nice(); the order of a and b is kept.
 */
export function niceDomain(a: number, b: number, count = 10): [number, number] {
  const reversed = b < a;
  let start = reversed ? b : a;
  let stop = reversed ? a : b;
  let previous: number | undefined;
  for (let round = 0; round < 10; round++) {
    const step = tickIncrement(start, stop, count);
    if (step === previous) break;
    if (step > 0) {
      start = Math.floor(start / step) * step;
      stop = Math.ceil(stop / step) * step;
    } else if (step < 0) {
      start = Math.ceil(start * step) / step;
      stop = Math.floor(stop * step) / step;
    } else break;
    previous = step;
  }
  return reversed ? [stop, start] : [start, stop];
}
