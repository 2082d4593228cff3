import { describe, expect, it } from 'vitest';
import { rootRows } from '../../../src/views/side/rootRows.ts';
import type { RootReadout } from '../../../src/core/readouts.ts';

describe('rootRows', () => {
  it('numbers poles and zeros separately, in order', () => {
    const r = (kind: 'pole' | 'zero'): RootReadout => ({
      root: { re: 0, im: 0, multiplicity: 1 },
      kind,
      frequencyHz: 0,
      radius: 0,
      angleRad: 0,
    });
    const rows = rootRows([r('pole'), r('pole'), r('zero')]);
    expect(rows.map((x) => x.ref)).toEqual([
      { kind: 'pole', index: 0 },
      { kind: 'pole', index: 1 },
      { kind: 'zero', index: 0 },
    ]);
  });
});
