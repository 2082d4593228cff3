import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { selectMaskResult } from '../../src/store/derived.ts';
import { selectPartStatuses } from '../../src/store/partsDerived.ts';
import { addPartEdit, removePartEdit, rerunPartEdit } from '../../src/store/partEdits.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import { readDesignFile, writeDesignFile } from '../../src/share/designFile.ts';
import { decodeLink, encodeLink } from '../../src/share/link/index.ts';
import { expectClose } from '../helpers/expectClose.ts';

const FS = 1000;
const LOWPASS: DesignerSpec = {
  kind: 'iir',
  family: 'butterworth',
  response: 'lowpass',
  // A given order above the least (4) leaves pass-band margin for the notches' skirts.
  order: 6,
  edgesHz: [125],
  passbandHz: [100],
  stopbandHz: [300],
  rippleDb: 1,
  attenuationDb: 40,
  fs: FS,
};
const NOTCH = (f0: number): DesignerSpec => ({ kind: 'notch', f0, bandwidthHz: 4, fs: FS });
const kinds = (s: ReturnType<typeof createWorkbenchStore>) =>
  selectPartStatuses(s.getState()).map((p) => (p.designer ? `${p.designer.kind}` : 'hand'));
const angleHz = (r: { re: number; im: number }, fs: number) => (Math.atan2(r.im, r.re) * fs) / (2 * Math.PI);

describe('composing a design in the store', () => {
  it('adds parts, re-runs, edits and removes them, each one undo step, and the mask judges the whole', () => {
    const store = createWorkbenchStore(emptyDesign(FS));
    const s = () => store.getState();
    expect(s().runDesigner(LOWPASS).ok).toBe(true);
    expect(s().designerEdit(addPartEdit(NOTCH(50))).ok).toBe(true);
    expect(s().designerEdit(addPartEdit(NOTCH(61.7))).ok).toBe(true);
    expect(kinds(store)).toEqual(['iir', 'notch', 'notch']);
    // The whole mask: the low-pass's pass band with both notches carved out, its stop band, both notches.
    const mask = s().design.mask!;
    expect(mask.regions.filter((r) => r.kind === 'stop')).toHaveLength(3);
    const verdict = selectMaskResult(s())!;
    expect(verdict.regions.map((r) => [r.id, r.pass])).toEqual([
      ['pass', true],
      ['pass-2', true],
      ['stop', true],
      ['notch-50', true],
      ['notch-61.7', true],
    ]);

    // Edit the second notch (re-run with a new centre): only its roots move.
    const before = s().design;
    expect(s().designerEdit(rerunPartEdit(2, { f0: 70 })).ok).toBe(true);
    expect(s().design.parts![2]!.designer).toMatchObject({ f0: 70 });
    expect(s().design.zeros.slice(0, -1)).toEqual(before.zeros.slice(0, -1));
    expectClose(angleHz(s().design.zeros.at(-1)!, FS), 70, { abs: 1e-9 }, 'notch moved to 70 Hz');
    // The mask was the one the parts imply, so it follows the edit: the stop region moves to 70 Hz.
    const stops = () =>
      s()
        .design.mask!.regions.filter((r) => r.kind === 'stop')
        .map((r) => r.id);
    expect(stops()).toEqual(['stop', 'notch-50', 'notch-70']);
    expect(selectMaskResult(s())!.pass).toBe(true);
    s().undo();
    expect(s().design).toBe(before);
    s().redo();
    expect(s().design.parts![2]!.designer).toMatchObject({ f0: 70 });

    // A root placed by hand is a part of its own and survives a re-run of the notch.
    s().addRoot('zero', { re: -0.9, im: 0, multiplicity: 1 });
    expect(kinds(store)).toEqual(['iir', 'notch', 'notch', 'hand']);
    s().designerEdit(rerunPartEdit(1, { f0: 55 }));
    expect(s().design.zeros.at(-1)).toEqual({ re: -0.9, im: 0, multiplicity: 1 });

    // Dragging a notch's root marks that part (only) as edited by hand.
    const zi = s().design.parts![0]!.zeros; // first zero of the 55 Hz notch
    s().moveRoot({ kind: 'zero', index: zi }, 0.5, 0.5);
    expect(selectPartStatuses(s()).map((p) => p.editedByHand)).toEqual([false, true, false, false]);
    s().designerEdit(rerunPartEdit(1));
    expect(selectPartStatuses(s()).map((p) => p.editedByHand)).toEqual([false, false, false, false]);

    // Remove the first notch: one undo step brings it back.
    const three = s().design;
    s().partsEdit(removePartEdit(1));
    expect(kinds(store)).toEqual(['iir', 'notch', 'hand']);
    expect(stops()).toEqual(['stop', 'notch-70']);
    s().undo();
    expect(s().design).toBe(three);
    // A mask edited by hand is the user's: changing a part leaves it as it is.
    s().updateRegion('stop', { upperDb: -45 });
    const handMask = s().design.mask;
    s().partsEdit(removePartEdit(1));
    expect(s().design.mask).toBe(handMask);
  });

  it('judges the whole cascade: a notch’s skirt can use up a low-pass’s pass-band margin', () => {
    const store = createWorkbenchStore(emptyDesign(FS));
    const s = () => store.getState();
    // The least order meets the pass band with no margin at its edge (100 Hz).
    s().runDesigner({ ...LOWPASS, order: 'auto' } as DesignerSpec);
    expect(selectMaskResult(s())!.pass).toBe(true);
    s().designerEdit(addPartEdit(NOTCH(61.7)));
    const verdict = selectMaskResult(s())!;
    expect(verdict.pass).toBe(false);
    const failing = verdict.regions.filter((r) => !r.pass);
    expect(failing.map((r) => r.id)).toEqual(['pass-2']);
    expect(failing[0]!.worstAtHz).toBeGreaterThan(95);
  });

  it('re-runs every designed part at a new sample rate, so each notch stays at its frequency in Hz', async () => {
    const store = createWorkbenchStore(emptyDesign(FS));
    const s = () => store.getState();
    s().runDesigner(LOWPASS);
    s().designerEdit(addPartEdit(NOTCH(50)));
    const r = await s().changeSampleRate(2000);
    expect(r.ok).toBe(true);
    const d = s().design;
    expect(d.sampleRate).toBe(2000);
    expect(d.parts!.every((p) => p.designer!.fs === 2000)).toBe(true);
    expectClose(angleHz(d.zeros.at(-1)!, 2000), 50, { abs: 1e-9 }, 'notch stays at 50 Hz');
  });

  it('travels in design files and links, and older files without parts still open', () => {
    const store = createWorkbenchStore(emptyDesign(FS));
    const s = () => store.getState();
    s().runDesigner(LOWPASS);
    s().designerEdit(addPartEdit(NOTCH(50)));
    s().designerEdit(addPartEdit(NOTCH(73.3)));
    const d = s().design;
    const file = readDesignFile(writeDesignFile(d));
    expect(file.ok && file.design.parts).toEqual(d.parts);
    const link = decodeLink(encodeLink({ design: d, view: {} }));
    expect(link.ok && link.value.design.parts).toEqual(d.parts);
    expect(link.ok && link.value.design.zeros).toEqual(d.zeros);
    // A file of before (one designer, no parts) opens as a one-part design.
    const old = JSON.parse(writeDesignFile({ ...emptyDesign(FS), name: 'old' }));
    expect(readDesignFile(JSON.stringify(old)).ok).toBe(true);
    // A file whose parts do not add up to its roots is refused, saying where.
    const bad = JSON.parse(writeDesignFile(d));
    bad.parts[0].poles += 1;
    const r = readDesignFile(JSON.stringify(bad));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/parts/);
  });
});
