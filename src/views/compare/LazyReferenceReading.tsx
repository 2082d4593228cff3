/**
 * The reference's part of the frequency read-out (ReferenceReading.tsx), loaded after the first paint: a
 * reference is never pinned when the page opens (it is view state outside sessions and links), so the first
 * view does without it.
 */
import { useCompare } from '../../store/compare.ts';
import { lazyPart } from '../shared/lazyPart.tsx';
import type { ReferenceReadingProps } from './ReferenceReading.tsx';

export const referenceReading = lazyPart<ReferenceReadingProps>(() =>
  import('./ReferenceReading.tsx').then((m) => m.ReferenceReading),
);

export function LazyReferenceReading(props: ReferenceReadingProps) {
  const pinned = useCompare((s) => s.reference != null);
  return pinned ? <referenceReading.Part {...props} /> : null;
}
