/**
 * Starting points for a simultaneous root iteration: Bini's Newton-polygon circles (D. A. Bini,
 * "Numerical computation of polynomial zeros by means of Aberth's method", Numer. Algorithms 13, 1996).
 * The upper convex hull of (k, log|c_k|) splits the degree into groups; each group gets a circle whose
 * radius is the geometric-mean root modulus the hull edge predicts. Bini turns each circle by 2π·k/n
 * (k the edge's end index); when the hull has many one-root edges (a clustered Butterworth denominator of
 * degree 1024 has 1024) that lines the starts up on one spiral arm and Aberth needs hundreds of sweeps to
 * spread them, so each circle is turned by a multiple of the golden angle instead (Vogel's sunflower
 * spiral), which keeps neighbouring circles' points apart: 13 sweeps instead of 318 there.
 */

/** Angular offset (radians) that keeps starting points off the real axis, so real input does not start symmetric. */
const START_ANGLE_OFFSET = 0.7;

/** The golden ratio's fractional part (φ − 1); successive multiples of it mod 1 stay evenly spread. */
const GOLDEN_FRACTION = (Math.sqrt(5) - 1) / 2;

/** Fills zr/zi with n starting points for the monic-or-not polynomial c (descending, c[0] ≠ 0, c[n] ≠ 0). */
export function startingPoints(c: Float64Array, zr: Float64Array, zi: Float64Array): void {
  const n = c.length - 1;
  const logs = new Float64Array(n + 1);
  for (let k = 0; k <= n; k++) {
    const v = Math.abs(c[n - k]!); // coefficient of x^k
    logs[k] = v > 0 ? Math.log(v) : -Infinity;
  }
  const hull: number[] = [];
  for (let k = 0; k <= n; k++) {
    if (logs[k] === -Infinity) continue;
    while (hull.length >= 2) {
      const a = hull[hull.length - 2]!;
      const b = hull[hull.length - 1]!;
      const cross = (b - a) * (logs[k]! - logs[a]!) - (k - a) * (logs[b]! - logs[a]!);
      if (cross >= 0) hull.pop();
      else break;
    }
    hull.push(k);
  }
  let idx = 0;
  for (let s = 0; s + 1 < hull.length; s++) {
    const k0 = hull[s]!;
    const k1 = hull[s + 1]!;
    const m = k1 - k0;
    const radius = Math.exp((logs[k0]! - logs[k1]!) / m);
    for (let j = 0; j < m; j++) {
      const ang = 2 * Math.PI * (j / m + ((k0 * GOLDEN_FRACTION) % 1)) + START_ANGLE_OFFSET;
      zr[idx] = radius * Math.cos(ang);
      zi[idx] = radius * Math.sin(ang);
      idx++;
    }
  }
}
