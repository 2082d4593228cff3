/**
 * The closed-form response as a list of real modes for display: each conjugate pair of terms c·pⁿ + c̄·p̄ⁿ
 * becomes A·rⁿ·cos(ωn + φ) with A = 2|c|, r = |p|, ω = ∠p, φ = ∠c; a real pole stays c·pⁿ. Slowest first.
 */
import type { ClosedForm } from '../../core/time/closedForm.ts';
import { NEGLIGIBLE_TERM_RATIO } from '../../core/time/closedFormText.ts';
import { UNIT_CIRCLE_TOLERANCE } from '../../core/stability/index.ts';
import { SAME_RADIUS_REL } from './envelope.ts';

export interface Mode {
  /** 'real': coefficient·nᵏ·baseⁿ; 'pair': amplitude·nᵏ·radiusⁿ·cos(omega·n + phase). */
  kind: 'real' | 'pair';
  /** Signed coefficient (real) or amplitude 2|c| ≥ 0 (pair). */
  amplitude: number;
  /** The real pole (real) or |p| (pair). */
  base: number;
  /** |p|, for ordering and the time constant. */
  radius: number;
  /** ∠p, radians per sample (pair only; 0 for real). */
  omega: number;
  /** ∠c, radians (pair only). */
  phase: number;
  /** Power of n. */
  power: number;
  /** |p| = 1 within UNIT_CIRCLE_TOLERANCE: the mode neither decays nor grows (rⁿ is left out of its text). */
  onCircle: boolean;
}

/** A finite-length part d·δ[n − delay]. */
export interface Impulse {
  value: number;
  delay: number;
}

/** Real modes of a closed form (negligible ones left out), slowest-decaying first, and its finite part. */
export function closedFormModes(cf: ClosedForm): { modes: Mode[]; impulses: Impulse[] } {
  const largest = Math.max(0, ...cf.terms.map((t) => Math.hypot(t.coefficient.re, t.coefficient.im)));
  const modes: Mode[] = [];
  for (const t of cf.terms) {
    const { coefficient: c, pole: p } = t;
    const size = Math.hypot(c.re, c.im);
    // The lower mate of a pair is folded into the upper one.
    if (size <= NEGLIGIBLE_TERM_RATIO * largest || p.im < 0) continue;
    const radius = Math.hypot(p.re, p.im);
    const onCircle = Math.abs(radius - 1) <= UNIT_CIRCLE_TOLERANCE;
    if (p.im === 0) {
      // On the circle a real pole is exactly ±1 (a constant or an alternation); print it so.
      const base = onCircle ? Math.sign(p.re) : p.re;
      modes.push({
        kind: 'real',
        amplitude: c.re,
        base,
        radius,
        omega: 0,
        phase: 0,
        power: t.power,
        onCircle,
      });
    } else {
      modes.push({
        kind: 'pair',
        amplitude: 2 * size,
        base: radius,
        radius,
        omega: Math.atan2(p.im, p.re),
        phase: Math.atan2(c.im, c.re),
        power: t.power,
        onCircle,
      });
    }
  }
  // Radii equal to rounding (e.g. the demo's three pole pairs) order by frequency instead.
  const byRadius = (a: Mode, b: Mode) =>
    Math.abs(a.radius - b.radius) <= SAME_RADIUS_REL * a.radius ? 0 : b.radius - a.radius;
  modes.sort((a, b) => byRadius(a, b) || a.omega - b.omega || b.power - a.power);
  const impulses = cf.direct.map((value, delay) => ({ value, delay })).filter((d) => d.value !== 0);
  return { modes, impulses };
}
