/**
 * The strip under the plane: a hint while no root is selected, else the selected root by number
 * (RootNumbers.tsx — radius and angle, real and imaginary parts, a pole pair's Q or width, a notch's depth
 * and width), whose code loads after the first view (prefetched after the first paint).
 */
import { useWorkbench } from '../../store/useWorkbench.ts';
import { lazyView } from '../shared/lazyView.tsx';
import { NUDGE_FINE_STEP, NUDGE_STEP } from './nudge.ts';

export const rootNumbers = lazyView('root editor', () =>
  import('./RootNumbers.tsx').then((m) => m.RootNumbers),
);

/** The strip: the editor for the selected root, or a hint when none is selected. */
export function RootEditor() {
  const sel = useWorkbench((s) => s.selection);
  const root = useWorkbench((s) =>
    sel ? (sel.kind === 'zero' ? s.design.zeros : s.design.poles)[sel.index] : undefined,
  );
  if (!sel || !root) {
    return (
      <p className="pw-root-editor pw-root-editor-empty">
        Select a root (click, or Tab to it; N and P walk the roots) to edit it by number. Arrows nudge it by{' '}
        {NUDGE_STEP} (Shift: {NUDGE_FINE_STEP}), Page Up/Down step its radius, comma and period its frequency;
        Delete removes it.
      </p>
    );
  }
  return <rootNumbers.View />;
}
