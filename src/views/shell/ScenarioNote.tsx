/**
 * The design's note (the demo's scenario), shown as plain text on one line under the header; the line is
 * there (empty) without a note too, so the regions below never move when a design comes or goes.
 */
import { useWorkbench } from '../../store/useWorkbench.ts';

export function ScenarioNote() {
  const note = useWorkbench((s) => s.design.note);
  return (
    <p
      className="pw-note"
      aria-label={note ? 'About this design' : undefined}
      aria-hidden={note ? undefined : true}
      title={note || undefined}
    >
      {note}
    </p>
  );
}
