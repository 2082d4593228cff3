/** The design's note (the demo's scenario), shown as plain text. */
import { useWorkbench } from '../../store/useWorkbench.ts';

export function ScenarioNote() {
  const note = useWorkbench((s) => s.design.note);
  if (!note) return null;
  return (
    <p className="pw-note" aria-label="About this design">
      {note}
    </p>
  );
}
