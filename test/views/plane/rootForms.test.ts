import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../../src/store/demo.ts';
import { notchDepth, widthForPoleRadius } from '../../../src/core/rootShape.ts';
import { rootFrequencyHz } from '../../../src/core/readouts.ts';
import { hzToOmega } from '../../../src/core/units.ts';
import {
  fieldsOf,
  formsFor,
  notchPartner,
  readForm,
  type Selected,
} from '../../../src/views/plane/rootForms.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const design = demoDesign();
const fs = design.sampleRate;
const poleSel = (index: number): Selected => ({
  ref: { kind: 'pole', index },
  root: design.poles[index]!,
  partner: null,
});
const zeroSel = (index: number): Selected => {
  const ref = { kind: 'zero' as const, index };
  return { ref, root: design.zeros[index]!, partner: notchPartner(design, ref) };
};
const radius = (m: { re: number; im: number }) => Math.hypot(m.re, m.im);

describe('the root strip forms', () => {
  it('offer Q and width for a pole pair, and the notch form for a zero pair over a pole pair', () => {
    expect(formsFor(poleSel(0)).map((f) => f.form)).toEqual(['polar', 'cartesian', 'q', 'width']);
    const z = zeroSel(1);
    // The demo's 150 Hz zeros sit over its 150 Hz poles.
    expect(z.partner?.ref).toEqual({ kind: 'pole', index: 1 });
    expect(formsFor(z).map((f) => f.form)).toEqual(['polar', 'cartesian', 'notch']);
    // A zero pair far from any pole pair is no notch.
    const lone = { ...design, poles: [] };
    expect(notchPartner(lone, { kind: 'zero', index: 0 })).toBeNull();
  });

  it('set a pole pair by Q or width at a frequency, as the table then reads it', () => {
    const q = readForm('q', ['60 Hz', '30'], poleSel(0), 'hz', fs);
    if (!q.ok) throw new Error(q.message);
    const [m] = q.value;
    expectClose(rootFrequencyHz(m!, fs), 60, { rel: 1e-12 });
    expectClose(widthForPoleRadius(radius(m!), fs)!, 2, { rel: 1e-9 });
    const w = readForm('width', ['50', '4'], poleSel(0), 'hz', fs);
    if (!w.ok) throw new Error(w.message);
    expectClose(widthForPoleRadius(radius(w.value[0]!), fs)!, 4, { rel: 1e-9 });
    // The fields show the root as it stands, and reading them back leaves it where it is.
    const shown = fieldsOf('width', poleSel(2), 'hz', fs).map((f) => f.text);
    const back = readForm('width', shown, poleSel(2), 'hz', fs);
    if (!back.ok) throw new Error(back.message);
    expectClose(radius(back.value[0]!), radius(design.poles[2]!), { rel: 1e-6 });
  });

  it('set a notch by frequency, depth and width: the zero pair and its pole pair in one edit', () => {
    const r = readForm('notch', ['50.5', '-40 dB', '3'], zeroSel(0), 'hz', fs);
    if (!r.ok) throw new Error(r.message);
    const [zero, pole] = r.value;
    expect(zero!.ref).toEqual({ kind: 'zero', index: 0 });
    expect(pole!.ref).toEqual({ kind: 'pole', index: 0 });
    expectClose(rootFrequencyHz(zero!, fs), 50.5, { rel: 1e-12 });
    expectClose(rootFrequencyHz(pole!, fs), 50.5, { rel: 1e-12 });
    expectClose(widthForPoleRadius(radius(pole!), fs)!, 3, { rel: 1e-9 });
    expectClose(20 * Math.log10(notchDepth(radius(zero!), radius(pole!), hzToOmega(50.5, fs))), -40, {
      abs: 1e-9,
    });
    const onCircle = readForm('notch', ['50', '−inf', '4'], zeroSel(0), 'hz', fs);
    if (!onCircle.ok) throw new Error(onCircle.message);
    expect(radius(onCircle.value[0]!)).toBeCloseTo(1, 14);
  });

  it('name the field that is wrong, and what it takes', () => {
    const msg = (form: 'q' | 'width' | 'notch', texts: string[], sel: Selected) => {
      const r = readForm(form, texts, sel, 'hz', fs);
      return r.ok ? 'accepted' : r.message;
    };
    expect(msg('q', ['0', '10'], poleSel(0))).toMatch(/^Frequency: .*above 0 and below fs\/2 \(1000 Hz\)/);
    expect(msg('q', ['50', '-3'], poleSel(0))).toMatch(/^Q: Q is above 0/);
    expect(msg('q', ['50', '0.01'], poleSel(0))).toMatch(/^Q: .*at least 0\.1 here/);
    expect(msg('width', ['50', '600'], poleSel(0))).toMatch(/^Width: .*at most fs\/4 \(500 Hz\)/);
    expect(msg('width', ['50', 'wide'], poleSel(0))).toMatch(/^Width: /);
    expect(msg('notch', ['50', '+3', '4'], zeroSel(0))).toMatch(/^Depth: a notch depth is 0 dB or below/);
  });
});
