/** Whether the design carries target settings, and whether the quantized filter is drawn on the plots. */
import { selectHasImplementation, selectShowQuantized } from '../../../store/implementationDerived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';

export function TargetSwitch() {
  const has = useWorkbench(selectHasImplementation);
  const shown = useWorkbench(selectShowQuantized);
  const dragging = useWorkbench((s) => s.dragging);
  const toggle = (on: boolean) => {
    const st = workbenchStore.getState();
    // Turning the overlay on with no settings yet stores the defaults the page shows (one undo step).
    if (on && !st.design.implementation) st.setImplementation({});
    st.setView({ showQuantized: on });
  };
  return (
    <section className="pw-side-section pw-target-switch" aria-label="Target settings">
      <p className="pw-hint pw-block">
        {has
          ? 'The design carries these target settings; they travel with its file and link.'
          : 'Nothing set for the target yet: the page shows a 16-bit default. Change any setting to keep it with the design.'}
      </p>
      <div className="pw-target-row">
        <label className="pw-check">
          <input type="checkbox" checked={shown} onChange={(e) => toggle(e.target.checked)} />
          Draw the quantized filter on the plane and the magnitude plot
        </label>
        {has && (
          <button
            type="button"
            title="Remove the target settings from the design (undo brings them back)"
            onClick={() => workbenchStore.getState().clearImplementation()}
          >
            Forget settings
          </button>
        )}
      </div>
      {dragging && (
        <p className="pw-hint pw-block">
          Paused while a root is dragged: this page catches up when you let go.
        </p>
      )}
    </section>
  );
}
