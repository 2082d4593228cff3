/**
 * An FIR runs as taps on the target (store/firDerived.ts), so the quantized mask verdict beside the ideal one
 * judges the quantized taps, the same as the export's warning; not the sections the taps' roots would make.
 */
import { describe, expect, it } from 'vitest';
import { EQUIRIPPLE_LOWPASS_8K } from '../helpers/firDesigns.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { selectFirQuantizedMask } from '../../src/store/firDerived.ts';
import { selectExportWarnings } from '../../src/store/exportDerived.ts';
import { selectRunsAsTaps } from '../../src/store/implementationDerived.ts';

describe('the quantized verdict of an FIR design', () => {
  it('judges the quantized taps: 24-bit taps pass the mask, 8-bit taps fail it, and the export warns alike', () => {
    const store = createWorkbenchStore();
    const r = store.getState().runDesigner(EQUIRIPPLE_LOWPASS_8K, 'replace');
    expect(r.ok).toBe(true);
    expect(store.getState().design.mask?.regions.find((g) => g.kind === 'pass')?.toHz).toBe(1000);
    expect(selectRunsAsTaps(store.getState())).toBe(true);
    // no target settings: no quantized verdict at all
    expect(selectFirQuantizedMask(store.getState())).toBeNull();
    store.getState().setImplementation({ wordLength: 24, accumulatorBits: 56 });
    expect(selectFirQuantizedMask(store.getState())?.pass).toBe(true);
    // 8 bits cannot hold a 60 dB stop band (common practice: about 6 dB per bit of coefficient word)
    store.getState().setImplementation({ wordLength: 8 });
    const v = selectFirQuantizedMask(store.getState());
    expect(v?.pass).toBe(false);
    expect(selectExportWarnings(store.getState())?.map((w) => w.key)).toContain('mask-fails-quantized');
  });
});
