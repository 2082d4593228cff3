/**
 * Keyboard moves of a root, one press each: Cartesian nudges by the arrows, and polar steps — in radius by a
 * fraction of the distance to the unit circle (so no press crosses or reaches the circle), and in frequency
 * by a step that suits the sample rate, landing on that step's grid.
 */

/** Step of one arrow-key press, z units. */
export const NUDGE_STEP = 0.01;
/** Step with Shift held, z units. */
export const NUDGE_FINE_STEP = 0.001;

/** The displacement an arrow key asks for, or null when the key is not an arrow. */
export function nudgeDelta(key: string, fine: boolean): { dre: number; dim: number } | null {
  const s = fine ? NUDGE_FINE_STEP : NUDGE_STEP;
  switch (key) {
    case 'ArrowLeft':
      return { dre: -s, dim: 0 };
    case 'ArrowRight':
      return { dre: s, dim: 0 };
    case 'ArrowUp':
      return { dre: 0, dim: s };
    case 'ArrowDown':
      return { dre: 0, dim: -s };
    default:
      return null;
  }
}

/**
 * How much one radius press changes the odds r/(1 − r) (Shift: the fine factor). Near the circle that is a
 * tenth (a hundredth) of the distance to it; near the origin a tenth (a hundredth) of the radius.
 */
export const RADIUS_FACTOR = 1.1;
export const RADIUS_FINE_FACTOR = 1.01;
/** Radius a press outward gives a root at the origin (Shift: a tenth of it). */
export const RADIUS_FROM_ORIGIN = 0.01;
/** Distance from the circle a press inward gives a root on it (Shift: a tenth of it). */
export const RADIUS_FROM_CIRCLE = 0.001;
/** Radii this close to 1 count as on the circle for stepping (a few ulps: what typing "1" gives). */
const ON_CIRCLE = 1e-12;

export type RadiusMove = { ok: true; radius: number } | { ok: false; why: string };

/**
 * The radius one press moves a root at radius r to: 'out' away from the origin, 'in' towards it. A root
 * inside the circle approaches it without reaching it; one outside likewise from outside (by the same rule
 * on 1/r); a root on the circle moves off it only to the side it leans to (inside for exactly 1) — crossing
 * is for the arrows or a typed radius.
 */
export function radiusStep(r: number, direction: 'out' | 'in', fine: boolean): RadiusMove {
  if (Math.abs(r - 1) <= ON_CIRCLE) {
    // On the circle (to rounding): a press moves it off on the side it already leans to, never across.
    const away = RADIUS_FROM_CIRCLE / (fine ? 10 : 1);
    if (direction === 'in' && r <= 1) return { ok: true, radius: 1 - away };
    if (direction === 'out' && r > 1) return { ok: true, radius: 1 / (1 - away) };
    return {
      ok: false,
      why: 'on the unit circle: a radius step never takes a root across it (type a radius, or use the arrows)',
    };
  }
  if (r > 1) {
    const inner = radiusStep(1 / r, direction === 'out' ? 'in' : 'out', fine);
    return inner.ok ? { ok: true, radius: 1 / inner.radius } : inner;
  }
  if (r === 0) {
    if (direction === 'in') return { ok: false, why: 'at the origin: it cannot come any closer' };
    return { ok: true, radius: RADIUS_FROM_ORIGIN / (fine ? 10 : 1) };
  }
  const factor = fine ? RADIUS_FINE_FACTOR : RADIUS_FACTOR;
  const odds = r / (1 - r);
  const next = direction === 'out' ? odds * factor : odds / factor;
  const radius = next / (1 + next);
  if (!(radius < 1) || radius === r)
    return { ok: false, why: 'as close to the unit circle as double precision can place it' };
  return { ok: true, radius };
}

/** Hz of one frequency press at sample rate fs: 10⁻⁴ of fs's decade (0.1 Hz at 1–9.99 kHz); Shift: a tenth. */
export function frequencyStepHz(fs: number, fine: boolean): number {
  const step = 10 ** (Math.floor(Math.log10(fs)) - 4);
  return fine ? step / 10 : step;
}

/**
 * The frequency (Hz) one press moves a root at f to: the next point of the step's grid up or down (so
 * 49.97 Hz goes to 50 Hz, then 50.1 Hz), kept within 0…fs/2.
 */
export function frequencyStep(f: number, direction: 'up' | 'down', step: number, fs: number): number {
  const k = f / step;
  // A frequency already on the grid (to rounding) moves a whole step.
  const onGrid = Math.abs(k - Math.round(k)) < 1e-6;
  const n =
    direction === 'up'
      ? (onGrid ? Math.round(k) : Math.floor(k)) + 1
      : (onGrid ? Math.round(k) : Math.ceil(k)) - 1;
  return Math.min(fs / 2, Math.max(0, n * step));
}
