import { describe, it, expect } from 'vitest';
import { emptyDesign, withRoots, type Design } from '../../../src/core/model/design.ts';
import { addPart, partRoots, partsOf, removePart, replacePart } from '../../../src/core/model/parts.ts';
import { designProblem } from '../../../src/core/model/check.ts';
import { runDesigner, type DesignerSpec } from '../../../src/core/design/index.ts';
import { expandRoots } from '../../../src/core/system/index.ts';
import { composeMask } from '../../../src/core/mask/index.ts';
import type { Root, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const FS = 1000;
const LOWPASS: DesignerSpec = {
  kind: 'iir',
  family: 'butterworth',
  response: 'lowpass',
  order: 4,
  edgesHz: [120],
  fs: FS,
};
const NOTCH_50: DesignerSpec = { kind: 'notch', f0: 50, bandwidthHz: 4, fs: FS };
// Not a harmonic of 50 Hz: any frequency may be notched.
const NOTCH_73: DesignerSpec = { kind: 'notch', f0: 73.3, bandwidthHz: 2, fs: FS };

const zpkOf = (spec: DesignerSpec): Zpk => {
  const r = runDesigner(spec);
  if (!r.ok) throw new Error(r.error.message);
  return r.value.zpk;
};
const designOf = (spec: DesignerSpec): Design => {
  const z = zpkOf(spec);
  return {
    ...emptyDesign(FS),
    zeros: z.zeros,
    poles: z.poles,
    gainRule: { kind: 'fixed', value: z.gain },
    designer: spec,
  };
};

/** 20·log10|H(e^{iω})| from the expanded roots, by a direct product over roots written here (not the engine's). */
function dbOf(d: Design, hz: number): number {
  const w = (2 * Math.PI * hz) / d.sampleRate;
  const [cr, ci] = [Math.cos(w), Math.sin(w)];
  const prod = (roots: Root[]) =>
    expandRoots(roots).reduce((acc, r) => acc * Math.hypot(cr - r.re, ci - r.im) ** r.multiplicity, 1);
  const k = d.gainRule.kind === 'fixed' ? d.gainRule.value : NaN;
  return 20 * Math.log10((Math.abs(k) * prod(d.zeros)) / prod(d.poles));
}

const composed = () => {
  const lp = designOf(LOWPASS);
  const n1 = zpkOf(NOTCH_50);
  const n2 = zpkOf(NOTCH_73);
  return addPart(addPart(lp, NOTCH_50, n1), NOTCH_73, n2);
};

describe('composed designs: a cascade of parts', () => {
  it('adds a notch on top of a low-pass as a part of its own; the whole is the product of the parts', () => {
    const d = composed();
    expect(d.designer).toBeUndefined();
    expect(d.parts!.map((p) => p.designer?.kind)).toEqual(['iir', 'notch', 'notch']);
    expect(designProblem(d)).toBeNull();
    // scipy.signal.butter(4, 120, fs=1000, output='zpk') + freqz_zpk 1.17, in dB at 10, 100, 200, 300 Hz
    const butter = { 10: -6.84221678e-9, 100: -8.12468038e-1, 200: -2.11252319e1, 300: -4.3290022e1 };
    const notchesAlone = (hz: number) => dbOf(designOf(NOTCH_50), hz) + dbOf(designOf(NOTCH_73), hz);
    for (const [hz, db] of Object.entries(butter))
      expectClose(dbOf(d, Number(hz)), db + notchesAlone(Number(hz)), { abs: 1e-6 }, `${hz} Hz`);
    // Each notch still puts its zeros on the unit circle at its own frequency (common practice).
    for (const f0 of [50, 73.3]) expect(dbOf(d, f0)).toBeLessThan(-200);
    // The low-pass keeps its part: its roots are exactly the low-pass designer's.
    expect(partRoots(d, 0).poles).toEqual(zpkOf(LOWPASS).poles);
  });

  it('re-runs, edits and removes one part and leaves the others as they were', () => {
    const d = composed();
    const moved = { ...NOTCH_73, f0: 81 };
    const edited = replacePart(d, 2, moved, zpkOf(moved));
    expect(edited.parts![2]!.designer).toEqual(moved);
    expect(partRoots(edited, 0)).toEqual(partRoots(d, 0));
    expect(partRoots(edited, 1)).toEqual(partRoots(d, 1));
    expect(dbOf(edited, 81)).toBeLessThan(-200);
    expect(dbOf(edited, 73.3)).toBeGreaterThan(-1);
    // Removing both notches gives back the low-pass alone, in its one-designer form (as older files hold it).
    const back = removePart(removePart(d, 2), 1);
    expect(back.parts).toBeUndefined();
    expect(back.designer).toEqual(LOWPASS);
    expect(back.zeros).toEqual(designOf(LOWPASS).zeros);
    expect(back.poles).toEqual(designOf(LOWPASS).poles);
    expectClose((back.gainRule as { value: number }).value, zpkOf(LOWPASS).gain, { rel: 1e-14 }, 'gain');
  });

  it('keeps roots placed by hand as a part of their own, last, through re-runs of the others', () => {
    const d = composed();
    const hand: Root = { re: -0.5, im: 0, multiplicity: 1 };
    const withHand = withRoots(d, 'zero', [...d.zeros, hand]);
    const parts = partsOf(withHand);
    expect(parts.map((p) => p.designer?.kind ?? 'hand')).toEqual(['iir', 'notch', 'notch', 'hand']);
    expect(designProblem(withHand)).toBeNull();
    const moved = { ...NOTCH_50, f0: 60 };
    const rerun = replacePart(withHand, 1, moved, zpkOf(moved));
    expect(partRoots(rerun, 3).zeros).toEqual([hand]);
    // A notch added later goes before the hand part.
    const more = addPart(rerun, NOTCH_73, zpkOf(NOTCH_73));
    expect(partsOf(more).map((p) => p.designer?.kind ?? 'hand')).toEqual([
      'iir',
      'notch',
      'notch',
      'notch',
      'hand',
    ]);
    // A root added by hand to a one-designer design makes it a cascade: the designer part and the hand part.
    const alone = designOf(LOWPASS);
    const lp = withRoots(alone, 'pole', [...alone.poles, { re: 0.2, im: 0, multiplicity: 1 }]);
    expect(partsOf(lp).map((p) => p.designer?.kind ?? 'hand')).toEqual(['iir', 'hand']);
    // Deleting a designed root leaves its part, edited; deleting the only hand root removes the hand part.
    const del = withRoots(withHand, 'zero', withHand.zeros.slice(0, -1));
    expect(partsOf(del).map((p) => p.designer?.kind ?? 'hand')).toEqual(['iir', 'notch', 'notch']);
  });

  it('refuses parts that do not add up to the roots, or a hand part that is not last', () => {
    const d = composed();
    expect(
      designProblem({ ...d, parts: d.parts!.map((p, i) => (i === 0 ? { ...p, poles: p.poles + 1 } : p)) })
        ?.path,
    ).toEqual(['parts']);
    const hand = { zeros: 0, poles: 0, gain: 1 };
    expect(designProblem({ ...d, parts: [hand, ...d.parts!] })?.message).toMatch(/not the last part/);
    expect(designProblem({ ...d, designer: LOWPASS })?.path).toEqual(['designer']);
  });
});

describe('the whole mask after adding a part', () => {
  it('carves a notch’s stop region out of a low-pass pass band and keeps the stop band', () => {
    const lowpassMask = {
      regions: [
        { id: 'pass', kind: 'pass' as const, fromHz: 0, toHz: 100, lowerDb: -1 },
        { id: 'stop', kind: 'stop' as const, fromHz: 200, toHz: 500, upperDb: -40 },
      ],
    };
    const notchMask = {
      regions: [
        { id: 'pass', kind: 'pass' as const, fromHz: 0, toHz: 30, lowerDb: -0.2, upperDb: 0.2 },
        { id: 'notch', kind: 'stop' as const, fromHz: 49.9, toHz: 50.1, upperDb: -20 },
        { id: 'pass-2', kind: 'pass' as const, fromHz: 70, toHz: 500, lowerDb: -0.2, upperDb: 0.2 },
      ],
    };
    const m = composeMask(lowpassMask, notchMask, FS);
    expect(m.regions.map((r) => [r.id, r.kind, r.fromHz, r.toHz])).toEqual([
      ['pass', 'pass', 0, 30],
      ['pass-2', 'pass', 70, 100],
      ['stop', 'stop', 200, 500],
      ['notch', 'stop', 49.9, 50.1],
    ]);
  });
});
