import { describe, expect, it } from 'vitest';
import { runDesigner, type DesignerSpec } from '../../../../src/core/design/index.ts';
import {
  linearPhaseShape,
  moveKeepingLinearPhase,
  restoreLinearPhase,
} from '../../../../src/core/design/fir/linearPhaseEdit.ts';
import { zpkToTf } from '../../../../src/core/system/transferFunction.ts';
import { responseZpk } from '../../../../src/core/response/index.ts';
import type { Root } from '../../../../src/core/types.ts';

const spec = (s: Record<string, unknown>) => ({ kind: 'iir', ...s }) as unknown as DesignerSpec;

function equiripple(order: number) {
  const r = runDesigner(
    spec({
      fs: 1000,
      response: 'lowpass',
      passbandHz: [100],
      stopbandHz: [150],
      rippleDb: 1,
      attenuationDb: 60,
      family: 'equiripple',
      order,
    }),
  );
  if (!r.ok) throw new Error(r.error.message);
  return r.value.zpk;
}

/** The taps multiplied out of the zeros (every pole at the origin). */
const taps = (zeros: Root[]) => zpkToTf({ zeros, poles: [], gain: 1 }).b;

/**
 * How far the taps are from symmetric or antisymmetric (whichever is nearer), relative to the largest tap.
 * common practice: a real FIR has linear phase exactly when its taps are symmetric or antisymmetric.
 */
function asymmetry(b: number[]): number {
  const big = Math.max(...b.map(Math.abs));
  let sym = 0;
  let anti = 0;
  for (let n = 0; n < b.length; n++) {
    sym = Math.max(sym, Math.abs(b[n]! - b[b.length - 1 - n]!));
    anti = Math.max(anti, Math.abs(b[n]! + b[b.length - 1 - n]!));
  }
  return Math.min(sym, anti) / big;
}

/** A stored zero of a quadruplet (off the circle, a pair), the one inside the circle. */
function quadIndex(zeros: Root[]): number {
  const shape = linearPhaseShape(zeros);
  const i = zeros.findIndex((z, k) => z.im > 0 && shape.partner[k] !== k && Math.hypot(z.re, z.im) < 1);
  if (i < 0) throw new Error('no quadruplet in the design');
  return i;
}

describe('zeros of a linear-phase FIR moved by hand', () => {
  it('a designed equiripple low-pass is read as linear phase, delay order/2', () => {
    const zpk = equiripple(40);
    const shape = linearPhaseShape(zpk.zeros, [{ re: 0, im: 0, multiplicity: 40 }]);
    expect(shape.linear).toBe(true);
    expect(shape.orphans).toEqual([]);
    expect(shape.delaySamples).toBe(20);
  });

  it('a quadruplet moves together: taps symmetric to 1e-12 and the group delay constant at order/2', () => {
    const zpk = equiripple(40);
    const i = quadIndex(zpk.zeros);
    const z = zpk.zeros[i]!;
    const moved = moveKeepingLinearPhase(zpk.zeros, i, z.re * 0.9 + 0.02, z.im * 1.1);
    expect(moved).not.toBeNull();
    expect(moved![i]).toMatchObject({ re: z.re * 0.9 + 0.02, im: z.im * 1.1 });
    expect(asymmetry(taps(moved!))).toBeLessThan(1e-12);
    expect(linearPhaseShape(moved!).linear).toBe(true);
    // the same target moved alone (as for any other design) leaves the taps far from symmetric: the check
    // above can fail
    const alone = zpk.zeros.slice();
    alone[i] = { ...z, re: z.re * 0.9 + 0.02, im: z.im * 1.1 };
    expect(asymmetry(taps(alone))).toBeGreaterThan(1e-3);
    // a linear-phase FIR of order 40 delays every frequency by 20 samples (common practice), read here in
    // the pass band, away from the zeros
    const omega = Float64Array.from([0.05, 0.2, 0.4, 0.55]);
    const gd = responseZpk(
      { zeros: moved!, poles: [{ re: 0, im: 0, multiplicity: 40 }], gain: 1 },
      omega,
    ).groupDelay;
    for (const v of gd) expect(Math.abs(v - 20)).toBeLessThan(1e-8);
  });

  it('an order-128 design stays linear phase through a run of drag steps', () => {
    const zpk = equiripple(128);
    let zeros = zpk.zeros;
    const i = quadIndex(zeros);
    for (let k = 1; k <= 30; k++) {
      const z = zeros[i]!;
      zeros = moveKeepingLinearPhase(zeros, i, z.re + 0.004, z.im - 0.003)!;
    }
    const shape = linearPhaseShape(zeros);
    expect(shape.linear).toBe(true);
    // every pair exactly reciprocal, to rounding: w = 1/z*
    for (let k = 0; k < zeros.length; k++) {
      const p = shape.partner[k]!;
      if (p <= k) continue;
      const z = zeros[k]!;
      const r2 = z.re * z.re + z.im * z.im;
      expect(Math.hypot(zeros[p]!.re - z.re / r2, zeros[p]!.im - z.im / r2)).toBeLessThan(
        4e-16 * Math.sqrt(1 / r2),
      );
    }
    // multiplying 128 zeros out rounds by ~1e-10 of the largest tap at this order (the designer's own taps
    // multiplied out carry 2e-10): the moved design is no further from symmetric than that
    expect(asymmetry(taps(zeros))).toBeLessThan(1e-9);
    // and the group delay is 64 samples across the pass band (common practice: order/2)
    const omega = Float64Array.from([0.02, 0.1, 0.3, 0.5, 0.6]);
    const gd = responseZpk(
      { zeros, poles: [{ re: 0, im: 0, multiplicity: 128 }], gain: 1 },
      omega,
    ).groupDelay;
    for (const v of gd) expect(Math.abs(v - 64)).toBeLessThan(1e-6);
  });

  // A hand-built set with every kind: a quadruplet (0.5±0.4j with its reciprocal), a real pair 0.6, 1/0.6,
  // a pair on the circle at 45°, and −1 alone.
  const s = Math.SQRT1_2;
  const q = { re: 0.5, im: 0.4, multiplicity: 1 };
  const qr = { re: 0.5 / 0.41, im: 0.4 / 0.41, multiplicity: 1 };
  const hand: Root[] = [
    q,
    { re: 0.6, im: 0, multiplicity: 1 },
    { re: s, im: s, multiplicity: 1 },
    { re: -1, im: 0, multiplicity: 1 },
    qr,
    { re: 1 / 0.6, im: 0, multiplicity: 1 },
  ];

  it('pairs each kind: quadruplet, real pair, circle pair, −1 alone', () => {
    const shape = linearPhaseShape(hand);
    expect(Array.from(shape.partner)).toEqual([4, 5, 2, 3, 0, 1]);
    expect(shape.linear).toBe(true);
    expect(asymmetry(taps(hand))).toBeLessThan(1e-14);
  });

  it('a real zero takes its reciprocal along the axis; a circle zero stays on the circle; −1 stays', () => {
    const real = moveKeepingLinearPhase(hand, 1, 0.3, 0.2)!;
    expect(real[1]).toEqual({ re: 0.3, im: 0, multiplicity: 1 });
    expect(real[5]!.re).toBeCloseTo(1 / 0.3, 14);
    expect(real[5]!.im).toBe(0);
    expect(asymmetry(taps(real))).toBeLessThan(1e-13);

    const circle = moveKeepingLinearPhase(hand, 2, 0, 0.5)!;
    expect(circle[2]!.re).toBeCloseTo(0, 15);
    expect(circle[2]!.im).toBeCloseTo(1, 15);
    expect(asymmetry(taps(circle))).toBeLessThan(1e-13);

    expect(moveKeepingLinearPhase(hand, 3, -0.5, 0)).toBe(hand);
  });

  it('a zero at +1 makes the taps antisymmetric, and moves keep them so', () => {
    const odd = [...hand, { re: 1, im: 0, multiplicity: 1 }];
    const moved = moveKeepingLinearPhase(odd, 0, 0.3, 0.7)!;
    const b = taps(moved);
    const big = Math.max(...b.map(Math.abs));
    for (let n = 0; n < b.length; n++)
      expect(Math.abs(b[n]! + b[b.length - 1 - n]!)).toBeLessThan(1e-13 * big);
  });

  it('a set that is not linear phase is not moved here (null: the zero moves alone)', () => {
    const broken = hand.slice(0, 5); // 1/0.6 deleted
    expect(linearPhaseShape(broken).orphans).toEqual([1]);
    expect(moveKeepingLinearPhase(broken, 0, 0.1, 0.1)).toBeNull();
  });

  it('restores a deleted partner by adding it back', () => {
    const broken = hand.filter((_, i) => i !== 4); // one member of the quadruplet deleted
    const r = restoreLinearPhase(broken);
    expect(r).toMatchObject({ moved: 0, added: 1 });
    expect(r.zeros).toHaveLength(6);
    expect(r.zeros[5]!.re).toBeCloseTo(qr.re, 15);
    expect(r.zeros[5]!.im).toBeCloseTo(qr.im, 15);
    expect(linearPhaseShape(r.zeros).linear).toBe(true);
    expect(asymmetry(taps(r.zeros))).toBeLessThan(1e-13);
  });

  it('restores a typed value by moving its old partner, the edited zero staying', () => {
    const typed = hand.slice();
    typed[4] = { re: 0.9, im: 0.9, multiplicity: 1 }; // the outer member of the quadruplet typed elsewhere
    expect(linearPhaseShape(typed).orphans).toEqual([0, 4]);
    const r = restoreLinearPhase(typed, 4);
    expect(r).toMatchObject({ moved: 1, added: 0 });
    expect(r.zeros[4]).toEqual(typed[4]);
    expect(r.zeros[0]!.re).toBeCloseTo(0.9 / 1.62, 15);
    expect(r.zeros[0]!.im).toBeCloseTo(0.9 / 1.62, 15);
    expect(asymmetry(taps(r.zeros))).toBeLessThan(1e-13);
    // without a zero to keep, the lower index stays
    const other = restoreLinearPhase(typed);
    expect(other.zeros[0]).toEqual(q);
    expect(asymmetry(taps(other.zeros))).toBeLessThan(1e-13);
  });
});
