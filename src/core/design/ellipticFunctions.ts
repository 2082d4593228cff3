/**
 * Complete and incomplete elliptic integrals of the first kind and the Jacobi elliptic functions sn, cn, dn
 * for real arguments, by the arithmetic–geometric mean (descending Landen transformation), as set out in
 * Abramowitz & Stegun, Handbook of Mathematical Functions, §16.4 and §17.6 (from memory). Parameters are
 * m = k² with the complement mc = 1 − m passed separately wherever m lies close to 1, so that neither is
 * formed by a cancelling subtraction.
 */

/** Relative gap |a − b| ≤ AGM_TOLERANCE·a at which the arithmetic–geometric mean is taken as converged. */
export const AGM_TOLERANCE = 4e-16;
/** Iteration limit of the AGM; it converges quadratically, so 40 steps cover any double-precision input. */
export const AGM_MAX_ITERATIONS = 40;

/** Arithmetic–geometric mean of a, b > 0 (converged flag: the gap fell below AGM_TOLERANCE). */
export function agm(a: number, b: number): { value: number; converged: boolean } {
  for (let i = 0; i < AGM_MAX_ITERATIONS; i++) {
    if (Math.abs(a - b) <= AGM_TOLERANCE * a) return { value: a, converged: true };
    [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
  }
  return { value: a, converged: false };
}

/** Complete elliptic integral K(m) = π / (2·AGM(1, √mc)), for parameter m = k² with complement mc = 1 − m. */
export function ellipticK(m: number, mc = 1 - m): number {
  if (m === 0) return Math.PI / 2;
  return Math.PI / (2 * agm(1, Math.sqrt(mc)).value);
}

/**
 * Incomplete elliptic integral F(φ, m) for φ in [0, π/2], by the AGM form of the descending Landen
 * transformation (A&S §17.6): φₙ₊₁ = φₙ + atan((bₙ/aₙ)·tan φₙ) on the continuous branch, F = φ_N/(2^N a_N).
 */
export function ellipticF(phi: number, m: number, mc = 1 - m): number {
  let a = 1;
  let b = Math.sqrt(mc);
  let p = phi;
  let twoN = 1;
  for (let i = 0; i < AGM_MAX_ITERATIONS; i++) {
    if (Math.abs(a - b) <= AGM_TOLERANCE * a) break;
    p = p + Math.atan((b / a) * Math.tan(p)) + Math.PI * Math.round(p / Math.PI);
    [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
    twoN *= 2;
  }
  return p / (twoN * a);
}

/** The three Jacobi elliptic functions at one argument. */
export interface JacobiValues {
  sn: number;
  cn: number;
  dn: number;
}

/** Jacobi sn, cn, dn of real u for parameter m = k² (complement mc), by the AGM scale (A&S 16.4). */
export function jacobiElliptic(u: number, m: number, mc = 1 - m): JacobiValues {
  if (m === 0) return { sn: Math.sin(u), cn: Math.cos(u), dn: 1 };
  if (mc === 0) {
    const sech = 1 / Math.cosh(u);
    return { sn: Math.tanh(u), cn: sech, dn: sech };
  }
  const a: number[] = [1];
  const c: number[] = [Math.sqrt(m)];
  let b = Math.sqrt(mc);
  for (let i = 0; i < AGM_MAX_ITERATIONS; i++) {
    const an = a[a.length - 1]!;
    if (Math.abs(c[c.length - 1]!) <= AGM_TOLERANCE * an) break;
    a.push((an + b) / 2);
    c.push((an - b) / 2);
    b = Math.sqrt(an * b);
  }
  const n = a.length - 1;
  let phi = 2 ** n * a[n]! * u;
  for (let i = n; i >= 1; i--) {
    phi = (phi + Math.asin((c[i]! / a[i]!) * Math.sin(phi))) / 2;
  }
  const cn = Math.cos(phi);
  // dn² = 1 − m·sn² = mc + m·cn², free of the 0/0 that cos φ0 / cos(φ1 − φ0) (A&S 16.4.3) meets at u = K.
  return { sn: Math.sin(phi), cn, dn: Math.sqrt(mc + m * cn * cn) };
}

/** Sums of the Jacobi theta series at nome q: θ₂/(2q^¼) core, θ₃ and θ₄ (terms summed until negligible). */
function thetaSums(q: number): { t2: number; t3: number; t4: number } {
  let t2 = 1; // Σ_{n≥0} q^{n(n+1)}
  let t3 = 1;
  let t4 = 1;
  for (let n = 1; n < 10000; n++) {
    const sq = q ** (n * n);
    const pr = q ** (n * (n + 1));
    t2 += pr;
    t3 += 2 * sq;
    t4 += (n % 2 === 0 ? 2 : -2) * sq;
    if (sq < 1e-18 * t3 && pr < 1e-18 * t2) break;
  }
  return { t2, t3, t4 };
}

/** Parameter m = k² and its complement from the nome q, by the theta-function identities k = θ₂²/θ₃², k' = θ₄²/θ₃². */
function modulusFromNome(q: number): { m: number; mc: number } {
  const { t2, t3, t4 } = thetaSums(q);
  return { m: 16 * q * (t2 / t3) ** 4, mc: (t4 / t3) ** 4 };
}

/**
 * Solves the degree equation of an order-n elliptic rational function, N·K(m1)·K'(m) = K'(m1)·K(m), for the
 * selectivity parameter m = k² given the discrimination parameter m1 = k1²: the nome of m is the n-th root of
 * the nome of m1. The nome closer to 0 (q or its complement q') is used, so both m and 1 − m come out accurate.
 */
export function ellipticDegree(n: number, m1: number): { m: number; mc: number } {
  const ratio = ellipticK(1 - m1, m1) / ellipticK(m1); // K'(m1)/K(m1)
  const logQ = (-Math.PI * ratio) / n;
  if (logQ <= -Math.PI) return modulusFromNome(Math.exp(logQ));
  const swapped = modulusFromNome(Math.exp((Math.PI * Math.PI) / logQ));
  return { m: swapped.mc, mc: swapped.m };
}
