/**
 * Starting points for a simultaneous root iteration: Bini's Newton-polygon circles (D. A. Bini,
 * "Numerical computation of polynomial zeros by means of Aberth's method", Numer. Algorithms 13, 1996).
 * The upper convex hull of (k, log|c_k|) splits the degree into groups; each group gets a circle whose
 * radius is the geometric-mean root modulus the hull edge predicts.
 */

/** Angular offset (radians) that keeps starting points off the real axis, so real input does not start symmetric. */
const START_ANGLE_OFFSET = 0.7;

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
      const ang = (2 * Math.PI * j) / m + (2 * Math.PI * k1) / n + START_ANGLE_OFFSET;
      zr[idx] = radius * Math.cos(ang);
      zi[idx] = radius * Math.sin(ang);
      idx++;
    }
  }
}
