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
 *   crosses the negative real axis, so summing their atan2 values gives the unwrapped phase exactly, however
 *   close a pole is to the circle or however coarse the grid. At a root exactly on the circle the reduced
 *   number is 0 and atan2(0, 0) = 0 puts the phase halfway across its π jump.
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
    const arg = Math.atan2(ar * bi + ai * br, ar * br - ai * bi) + (inside ? 2 * omega[i]! : 0);
    phase[i]! += ms * arg;
    groupDelay[i]! += gdSign * (h === 0 ? 1 : 1 + (h / 2) * (1 / f2a + 1 / f2b));
  }
  return 0;
}
