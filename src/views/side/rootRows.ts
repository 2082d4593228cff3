/** Rows of the root read-out table: the engine's read-outs with the store reference each row selects. */
import type { RootReadout } from '../../core/readouts.ts';
import type { RootRef } from '../../core/model/design.ts';
import { formatComplex, formatNumber } from '../shared/format.ts';

export interface RootRow {
  ref: RootRef;
  readout: RootReadout;
  key: string;
}

/** Pairs each read-out with its stored root: read-outs come per kind in the design's order. */
export function rootRows(readouts: readonly RootReadout[]): RootRow[] {
  const next = { pole: 0, zero: 0 };
  return readouts.map((readout) => {
    const index = next[readout.kind]++;
    return { ref: { kind: readout.kind, index }, readout, key: `${readout.kind}-${index}` };
  });
}

/** A stored root as text: a real root, or a conjugate pair as "re ± imj". */
export function positionText(re: number, im: number, digits = 4): string {
  if (im === 0) return formatNumber(re, digits);
  return `${formatNumber(re, digits)} ± ${formatNumber(im, digits)}j`;
}

/** Words for a row, for screen readers and the row's tooltip. */
export function describeRow({ readout: r }: RootRow): string {
  const pair = r.root.im !== 0 ? ' pair' : '';
  const m = r.root.multiplicity > 1 ? `, multiplicity ${r.root.multiplicity}` : '';
  return `${r.kind}${pair} at ${formatComplex(r.root.re, r.root.im)}${m}`;
}

/** True when two root references name the same stored root. */
export function sameRef(a: RootRef | null, b: RootRef): boolean {
  return a !== null && a.kind === b.kind && a.index === b.index;
}
