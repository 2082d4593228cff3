/** Load the demo design or start from an empty one; each is one undo step, so nothing is lost. */
import { demoDesign } from '../../store/demo.ts';
import { emptyDesign } from '../../core/model/design.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';

export function DesignButtons() {
  const { replaceDesign } = workbenchStore.getState();
  return (
    <div className="pw-group" role="group" aria-label="Design">
      <button
        type="button"
        onClick={() => replaceDesign(demoDesign())}
        title="Load the demo design (undo brings yours back)"
      >
        Demo design
      </button>
      <button
        type="button"
        onClick={() => replaceDesign(emptyDesign(workbenchStore.getState().design.sampleRate))}
        title="Clear every root, keeping the sample rate (undo brings them back)"
      >
        Start empty
      </button>
    </div>
  );
}
