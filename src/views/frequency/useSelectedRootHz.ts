/** The selected root's frequency in Hz (its angle on the plane at the design's sample rate), or null. */
import { useMemo } from 'react';
import { rootFrequencyHz } from '../../core/readouts.ts';
import { rootsOf } from '../../core/model/design.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';

export function useSelectedRootHz(): { hz: number; kind: 'zero' | 'pole' } | null {
  const kind = useWorkbench((s) => s.selection?.kind ?? null);
  // The stored Root object itself: stable until that root is edited, so this re-renders only when needed.
  const root = useWorkbench((s) =>
    s.selection ? (rootsOf(s.design, s.selection.kind)[s.selection.index] ?? null) : null,
  );
  const fs = useWorkbench((s) => s.design.sampleRate);
  return useMemo(() => {
    if (!root || !kind) return null;
    return { hz: rootFrequencyHz(root, fs), kind };
  }, [root, kind, fs]);
}
