/** Words that describe a root: its accessible name and a short caption. */
import type { Root } from '../../core/types.ts';
import { rootFrequencyHz } from '../../core/readouts.ts';
import type { RootKind } from '../../core/model/design.ts';
import { formatHz, formatNumber } from '../shared/format.ts';

/** e.g. "Pole pair at 48 Hz, radius 0.994, multiplicity 1" or "Real zero at z = −0.5, multiplicity 2". */
export function rootAriaLabel(kind: RootKind, root: Root, fs: number): string {
  const noun = kind === 'pole' ? 'pole' : 'zero';
  const m = `multiplicity ${root.multiplicity}`;
  if (root.im === 0) {
    return `Real ${noun} at z = ${formatNumber(root.re, 4)}, ${m}`;
  }
  const r = Math.hypot(root.re, root.im);
  const Noun = noun[0]!.toUpperCase() + noun.slice(1);
  return `${Noun} pair at ${formatHz(rootFrequencyHz(root, fs), 4)}, radius ${formatNumber(r, 4)}, ${m}`;
}
