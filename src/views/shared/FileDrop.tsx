/**
 * Drop a design file anywhere on the page to open it (one undo step). While files are dragged over the
 * page a full-page target says what will happen; a file that cannot be read gives a notice and leaves the
 * design as it was.
 */
import { useEffect, useRef, useState } from 'react';
import { postNotice } from '../../store/notices.ts';
import { openShared } from '../side/share/openShared.ts';
import { readDesignBlob } from '../side/share/readFile.ts';
import './fileDrop.css';

/** Whether a drag carries files (not text or a link dragged within the page). */
function carriesFiles(e: DragEvent): boolean {
  return Array.from(e.dataTransfer?.types ?? []).includes('Files');
}

/** Opens the first dropped file; more than one is refused so it is clear which design is open. */
export async function openDroppedFiles(files: readonly File[]): Promise<void> {
  const file = files[0];
  if (!file) return;
  if (files.length > 1) {
    postNotice(
      'error',
      `${files.length} files were dropped; drop one design file at a time. Your design is unchanged.`,
    );
    return;
  }
  const r = await readDesignBlob(file);
  if (!r.ok) {
    postNotice('error', `${r.message} Your design is unchanged.`);
    return;
  }
  const changed = openShared(r.value);
  postNotice(
    'info',
    changed
      ? `Opened “${r.value.design.name || file.name}” from ${file.name}. Undo brings back the design you had.`
      : `${file.name} holds the design already open.`,
  );
}

export function FileDrop() {
  const [over, setOver] = useState(false);
  // dragenter/dragleave fire for every child crossed; count them to know when the drag has left the page.
  const depth = useRef(0);
  useEffect(() => {
    const enter = (e: DragEvent) => {
      if (!carriesFiles(e)) return;
      depth.current += 1;
      setOver(true);
    };
    const leave = (e: DragEvent) => {
      if (!carriesFiles(e)) return;
      depth.current = Math.max(0, depth.current - 1);
      if (depth.current === 0) setOver(false);
    };
    const overPage = (e: DragEvent) => {
      if (!carriesFiles(e)) return;
      e.preventDefault();
      if (e.dataTransfer) e.dataTransfer.dropEffect = 'copy';
    };
    const drop = (e: DragEvent) => {
      if (!carriesFiles(e)) return;
      e.preventDefault();
      depth.current = 0;
      setOver(false);
      void openDroppedFiles(Array.from(e.dataTransfer?.files ?? []));
    };
    window.addEventListener('dragenter', enter);
    window.addEventListener('dragleave', leave);
    window.addEventListener('dragover', overPage);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('dragenter', enter);
      window.removeEventListener('dragleave', leave);
      window.removeEventListener('dragover', overPage);
      window.removeEventListener('drop', drop);
    };
  }, []);
  if (!over) return null;
  return (
    <div className="pw-drop" data-testid="file-drop">
      <p className="pw-drop-card">
        Drop a Polewright design file to open it.
        <span className="pw-drop-hint">Your current design stays one undo away.</span>
      </p>
    </div>
  );
}
