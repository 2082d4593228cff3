import { describe, expect, it } from 'vitest';
import { locate, readEntry, typedAbout, TYPED_NAME } from '../../../../src/views/side/entry/readEntry.ts';
import { DEMO_NAME, DEMO_NOTE } from '../../../../src/store/demo.ts';
import { ENTRY_EXAMPLES } from '../../../../src/views/side/entry/examples.ts';
import { expectClose } from '../../../helpers/expectClose.ts';

describe('readEntry', () => {
  it('reads a delay-form equation into stored roots, gain and the typed coefficients', () => {
    const text = 'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]';
    const r = readEntry(text);
    if (!r.ok) throw new Error(r.error.message);
    // Worked by hand: 1 − 1.6z⁻¹ + 0.64z⁻² = (1 − 0.8z⁻¹)², zeros ±1.
    expect(r.value.poles).toHaveLength(1);
    expectClose(r.value.poles[0]!.re, 0.8, { abs: 1e-7 });
    expect(r.value.poles[0]!.im).toBe(0);
    expect(r.value.poles[0]!.multiplicity).toBe(2);
    expect(r.value.zeros.map((z) => z.re).sort()).toEqual([-1, 1].map((v) => expect.closeTo(v, 12)));
    expect(r.value.gain).toBe(1);
    expect(r.value.typed).toEqual({ b: [1, 0, -1], a: [1, -1.6, 0.64], text });
    expect(r.value.detail).toMatch(/difference equation, delay/);
  });

  it('keeps complex roots once, with im > 0 (conjugate implied)', () => {
    const r = readEntry('zeros: none; poles: 0.9∠60°; gain: 1');
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.poles).toHaveLength(1);
    expectClose(r.value.poles[0]!.im, 0.9 * Math.sin(Math.PI / 3), { abs: 1e-12 }); // worked by hand
  });

  it('returns a positioned error for bad input, never throws', () => {
    const r = readEntry('y[n] = 0.5 y[n-1] + * x[n]');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.position).toBe(20);
    const zeroDen = readEntry('b = [1]; a = [0, 0]');
    expect(zeroDen.ok).toBe(false);
  });

  it('reads every example chip', () => {
    for (const ex of ENTRY_EXAMPLES) expect(readEntry(ex.text).ok, ex.label).toBe(true);
  });
});

describe('locate', () => {
  it('finds line and column of an offset', () => {
    expect(locate('ab\ncde\nf', 4)).toEqual({ line: 2, lineText: 'cde', column: 1 });
    expect(locate('abc', 3)).toEqual({ line: 1, lineText: 'abc', column: 3 });
    expect(locate('ab\n', 3)).toEqual({ line: 2, lineText: '', column: 0 });
  });
});

describe('typedAbout', () => {
  it("drops the demo's name and note, keeps a name and note the user chose", () => {
    expect(typedAbout({ name: DEMO_NAME, note: DEMO_NOTE })).toEqual({ name: TYPED_NAME, note: '' });
    expect(typedAbout({ name: 'My loop filter', note: '' })).toEqual({ name: 'My loop filter', note: '' });
    expect(typedAbout({ name: 'My loop filter', note: 'gyro rate loop' })).toEqual({
      name: 'My loop filter',
      note: 'gyro rate loop',
    });
    expect(typedAbout({ name: 'Empty design', note: '' })).toEqual({ name: TYPED_NAME, note: '' });
    expect(typedAbout({ name: TYPED_NAME, note: 'from the old board' })).toEqual({
      name: TYPED_NAME,
      note: 'from the old board',
    });
  });
});
