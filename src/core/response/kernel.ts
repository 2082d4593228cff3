/**
 * The product-form response kernel: log-free accumulation of |H|, continuous phase and group delay over a
 * frequency array, one root (or conjugate pair) at a time. No polynomial is ever expanded.
 *
 * For one factor f = e^{iω} − c with c = ρe^{iθ}:
 * - |f|² = (cos ω − Re c)² + (sin ω − Im c)², from direct differences (accurate next to the root).
 * - d(arg f)/dω = Re(e^{iω}/f) = 1/2 + (1 − ρ²)/(2|f|²). This form cannot blow up through cancellation:
 *   for a root on the circle (ρ = 1) it is exactly 1/2 at every ω, and we take 1/2 at the root itself too,
 *   which is the limit from both sides (the π jump of the phase there is not a group delay). A zero on the
 *   circle therefore contributes −1/2 sample everywhere; scipy.signal.group_delay returns 0 (with a warning)
 *   for the whole sum at such an ω and agrees elsewhere.
 * - arg f, continuous in ω: for ρ <= 1, arg f = ω + arg(e^{−iω}f) where Re(e^{−iω}f) = (|f|² + 1 − ρ²)/2 >= 0;
 *   for ρ > 1, arg f = θ − π + arg(−c̄·f) where Re(−c̄·f) = (|f|² + ρ² − 1)/2 > 0. Neither reduced number
 *   crosses the negative real axis (|arg| < π/2), so the sum of their args is the unwrapped phase exactly,
 *   however close a pole is to the circle or however coarse the grid. At a root exactly on the circle the
 *   reduced number is 0; it is given arg 0, which puts the phase halfway across its π jump.
 * - The sum of args is kept without one atan2 per root: the reduced numbers are multiplied into a running
 *   product (renormalised each step) while a winding count records every time the principal arg of the
 *   product wraps (both factors in the closed upper half-plane but the product not, or the reverse); one
 *   atan2 per frequency then gives sum = atan2(product) + 2π·winding.
 */
import type { Root } from '../types.ts';

/**
 * |1 − ρ²| at or below this counts as a root exactly on the unit circle for the response kernel: a root
 * placed at e^{iθ} from cos/sin lands within a few ulps of radius 1, and without the snap its group delay
 * would carry a rounding spike of size ~1e-16/|f|² right at the root.
 */
export const GROUP_DELAY_CIRCLE_SNAP = 8 * Number.EPSILON;

/** Scratch arrays the kernel writes: magnitude product, continuous phase, group delay, and cos/sin of ω. */
export interface KernelState {
  cos: Float64Array;
  sin: Float64Array;
  magnitude: Float64Array;
  phase: Float64Array;
  groupDelay: Float64Array;
  /** Running product of the reduced numbers (unit 1-norm) and the number of 2π wraps of its arg. */
  qre: Float64Array;
  qim: Float64Array;
  winding: Float64Array;
}

/** Fresh kernel state for a frequency array: |H| = 1, phase 0, group delay 0. */
export function kernelState(omega: ArrayLike<number>): KernelState {
  const n = omega.length;
  const s: KernelState = {
    cos: new Float64Array(n),
    sin: new Float64Array(n),
    magnitude: new Float64Array(n).fill(1),
    phase: new Float64Array(n),
    groupDelay: new Float64Array(n),
    qre: new Float64Array(n).fill(1),
    qim: new Float64Array(n),
    winding: new Float64Array(n),
  };
  for (let i = 0; i < n; i++) {
    s.cos[i] = Math.cos(omega[i]!);
    s.sin[i] = Math.sin(omega[i]!);
  }
  return s;
}

/**
 * Multiplies one root (zero: sign +1, pole: sign −1), with its conjugate if im != 0 and its multiplicity,
 * into the state. Returns the constant phase offset (radians) its continuous-phase form leaves out.
 */
export function accumulateRoot(st: KernelState, omega: ArrayLike<number>, root: Root, sign: 1 | -1): number {
  const x = root.re;
  const y = root.im;
  const m = root.multiplicity;
  let h = 1 - (x * x + y * y);
  if (Math.abs(h) <= GROUP_DELAY_CIRCLE_SNAP) h = 0;
  const inside = h >= 0;
  const { cos, sin, magnitude, phase, groupDelay } = st;
  const n = omega.length;
  const ms = m * sign;
  const gdSign = -ms;
  if (y === 0) {
    for (let i = 0; i < n; i++) {
      const cw = cos[i]!;
      const sw = sin[i]!;
      const dx = cw - x;
      const f2 = dx * dx + sw * sw;
      const mag = m === 1 ? Math.sqrt(f2) : Math.pow(f2, m / 2);
      magnitude[i] = sign > 0 ? magnitude[i]! * mag : magnitude[i]! / mag;
      const arg = inside
        ? omega[i]! + Math.atan2(cw * sw - sw * dx, cw * dx + sw * sw)
        : Math.atan2(-x * sw, -x * dx);
      phase[i]! += ms * arg;
      groupDelay[i]! += gdSign * (h === 0 ? 0.5 : 0.5 + h / (2 * f2));
    }
    return inside || x < 0 ? 0 : -Math.PI * ms;
  }
  for (let i = 0; i < n; i++) {
    const cw = cos[i]!;
    const sw = sin[i]!;
    const dx = cw - x;
    const d1 = sw - y;
    const d2 = sw + y;
    const f2a = dx * dx + d1 * d1;
    const f2b = dx * dx + d2 * d2;
    const p2 = f2a * f2b;
    const mag = m === 1 ? Math.sqrt(p2) : Math.pow(p2, m / 2);
    magnitude[i] = sign > 0 ? magnitude[i]! * mag : magnitude[i]! / mag;
    let ar: number, ai: number, br: number, bi: number;
    if (inside) {
      ar = cw * dx + sw * d1;
      ai = cw * d1 - sw * dx;
      br = cw * dx + sw * d2;
      bi = cw * d2 - sw * dx;
    } else {
      ar = -(x * dx + y * d1);
      ai = -(x * d1 - y * dx);
      br = -(x * dx - y * d2);
      bi = -(x * d2 + y * dx);
    }
    // A factor that is exactly 0 (root exactly at e^{iω}) takes arg 0, the midpoint of its jump, without
    // hiding its conjugate's arg.
    if (ar === 0 && ai === 0) ar = 1;
    if (br === 0 && bi === 0) br = 1;
    const wi = ar * bi + ai * br;
    rotate(st, i, ar * br - ai * bi, sign > 0 ? wi : -wi, m);
    if (inside) phase[i]! += 2 * ms * omega[i]!;
    groupDelay[i]! += gdSign * (h === 0 ? 1 : 1 + (h * (f2a + f2b)) / (2 * p2));
  }
  return 0;
}

const upper = (re: number, im: number) => im > 0 || (im === 0 && re < 0);

/** Multiplies w = wr + i·wi (|arg w| < π) into the running product at sample i, m times, counting wraps. */
function rotate(st: KernelState, i: number, wr: number, wi: number, m: number): void {
  const wUp = upper(wr, wi);
  for (let k = 0; k < m; k++) {
    const qr = st.qre[i]!;
    const qi = st.qim[i]!;
    const pr = qr * wr - qi * wi;
    const pi = qr * wi + qi * wr;
    const qUp = upper(qr, qi);
    if (qUp === wUp && upper(pr, pi) !== qUp) st.winding[i]! += qUp ? 1 : -1;
    const scale = 1 / (Math.abs(pr) + Math.abs(pi));
    st.qre[i] = pr * scale;
    st.qim[i] = pi * scale;
  }
}

/** Adds the arg of the running product (atan2 with −0 read as +0, matching `upper`) and its wraps to the phase. */
export function finishPhase(st: KernelState): void {
  for (let i = 0; i < st.phase.length; i++) {
    st.phase[i]! += Math.atan2(st.qim[i]! + 0, st.qre[i]! + 0) + 2 * Math.PI * st.winding[i]!;
  }
}
