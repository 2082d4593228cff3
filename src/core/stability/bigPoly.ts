/**
 * Exact integer polynomials (BigInt coefficients in ASCENDING powers, index = power, no trailing zeros except
 * for the zero polynomial []), with what the exact stability test needs: primitive parts, pseudo-remainders,
 * gcd by the primitive remainder sequence, exact division, and Sturm counts of real roots.
 */
export type BigPoly = bigint[];

const abs = (x: bigint) => (x < 0n ? -x : x);

/** Drops zero coefficients of the highest powers. */
export function trim(p: BigPoly): BigPoly {
  let n = p.length;
  while (n > 0 && p[n - 1] === 0n) n--;
  return p.slice(0, n);
}

export const degree = (p: BigPoly): number => p.length - 1;

function gcdInt(a: bigint, b: bigint): bigint {
  a = abs(a);
  b = abs(b);
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** p divided by the gcd of its coefficients, leading coefficient made positive. */
export function primitive(p: BigPoly): BigPoly {
  const q = trim(p);
  if (q.length === 0) return q;
  let g = 0n;
  for (const x of q) {
    g = gcdInt(g, x);
    if (g === 1n) break;
  }
  if (q[q.length - 1]! < 0n) g = -g;
  return q.map((x) => x / g);
}

/** Pseudo-remainder of a by b: lc(b)^(deg a − deg b + 1)·a mod b, with that factor's sign removed. */
export function pseudoRemainder(a: BigPoly, b: BigPoly): BigPoly {
  const r = trim(a).slice();
  const db = degree(b);
  const lb = b[db]!;
  let steps = 0;
  while (r.length - 1 >= db && r.length > 0) {
    const dr = r.length - 1;
    const lr = r[dr]!;
    for (let k = 0; k < r.length; k++) r[k] = r[k]! * lb;
    for (let k = 0; k <= db; k++) r[dr - db + k] = r[dr - db + k]! - lr * b[k]!;
    r.length = dr; // the top coefficient is now zero
    while (r.length > 0 && r[r.length - 1] === 0n) r.length--;
    steps++;
  }
  // Each step multiplied by lb: undo the sign of lb^steps so the result is a positive multiple of a mod b.
  return lb < 0n && steps % 2 === 1 ? r.map((x) => -x) : r;
}

/** Greatest common divisor, primitive with positive leading coefficient. */
export function gcd(a: BigPoly, b: BigPoly): BigPoly {
  let x = primitive(a);
  let y = primitive(b);
  while (y.length > 0) {
    const r = primitive(pseudoRemainder(x, y));
    x = y;
    y = r;
  }
  return x;
}

/** a / b when b divides a exactly over the integers (b primitive); throws otherwise. */
export function divideExact(a: BigPoly, b: BigPoly): BigPoly {
  const r = trim(a).slice();
  const db = degree(b);
  const lb = b[db]!;
  const q = new Array<bigint>(Math.max(0, r.length - db)).fill(0n);
  while (r.length - 1 >= db && r.length > 0) {
    const dr = r.length - 1;
    const t = r[dr]! / lb;
    if (t * lb !== r[dr]) throw new Error('divideExact: the division is not exact');
    q[dr - db] = t;
    for (let k = 0; k <= db; k++) r[dr - db + k] = r[dr - db + k]! - t * b[k]!;
    while (r.length > 0 && r[r.length - 1] === 0n) r.length--;
  }
  if (r.length > 0) throw new Error('divideExact: the division leaves a remainder');
  return trim(q);
}

export function derivative(p: BigPoly): BigPoly {
  return trim(p.slice(1).map((x, k) => x * BigInt(k + 1)));
}

/** p(x) at an integer x. */
export function evaluate(p: BigPoly, x: bigint): bigint {
  let acc = 0n;
  for (let k = p.length - 1; k >= 0; k--) acc = acc * x + p[k]!;
  return acc;
}

/** The reversed polynomial z^deg · p(1/z). */
export function reversed(p: BigPoly): BigPoly {
  return trim(p.slice().reverse());
}

/** Number of distinct real roots of p in (lo, hi], by Sturm's theorem (lo, hi integers). */
export function sturmCount(p: BigPoly, lo: bigint, hi: bigint): number {
  const chain: BigPoly[] = [primitive(p), primitive(derivative(p))];
  while (chain[chain.length - 1]!.length > 1) {
    const r = pseudoRemainder(chain[chain.length - 2]!, chain[chain.length - 1]!);
    if (r.length === 0) break;
    // Sturm's chain takes −remainder; primitive() would fix the sign positive, so scale by the content only.
    const prim = primitive(r);
    const sameSign = prim[prim.length - 1]! > 0n === r[r.length - 1]! > 0n;
    chain.push(sameSign ? prim.map((x) => -x) : prim);
  }
  const changes = (x: bigint) => {
    let count = 0;
    let last = 0;
    for (const q of chain) {
      const v = evaluate(q, x);
      const s = v > 0n ? 1 : v < 0n ? -1 : 0;
      if (s === 0) continue;
      if (last !== 0 && s !== last) count++;
      last = s;
    }
    return count;
  };
  return changes(lo) - changes(hi);
}
