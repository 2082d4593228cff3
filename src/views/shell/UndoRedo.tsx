/** Undo and redo buttons; the same actions as Ctrl/Cmd+Z and Shift+Ctrl/Cmd+Z. */
import { useWorkbench } from '../../store/useWorkbench.ts';

const isMac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform);
const mod = isMac ? '⌘' : 'Ctrl+';

export function UndoRedo() {
  const canUndo = useWorkbench((s) => s.history.past.length > 0 || s.history.gestureStart !== null);
  const canRedo = useWorkbench((s) => s.history.future.length > 0);
  const undo = useWorkbench((s) => s.undo);
  const redo = useWorkbench((s) => s.redo);
  return (
    <div className="pw-group" role="group" aria-label="History">
      <button type="button" onClick={undo} disabled={!canUndo} title={`Undo (${mod}Z)`}>
        <span aria-hidden="true">↶ </span>Undo
      </button>
      <button type="button" onClick={redo} disabled={!canRedo} title={`Redo (Shift+${mod}Z)`}>
        <span aria-hidden="true">↷ </span>Redo
      </button>
    </div>
  );
}
