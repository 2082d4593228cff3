/**
 * Drag and drop of a recording onto a recording view. The drop is handled here and stopped, so a
 * page-wide drop zone for design files never sees a WAV or CSV dropped on these views.
 */
import { useState, type DragEvent } from 'react';
import { carriesFiles, loadFile } from './loader.ts';

export function useSignalDrop() {
  const [over, setOver] = useState(false);
  const accept = (e: DragEvent) => {
    if (!carriesFiles([...e.dataTransfer.types])) return false;
    e.preventDefault();
    e.stopPropagation();
    return true;
  };
  return {
    over,
    handlers: {
      onDragEnter: (e: DragEvent) => {
        if (accept(e)) setOver(true);
      },
      onDragOver: (e: DragEvent) => {
        if (accept(e)) e.dataTransfer.dropEffect = 'copy';
      },
      onDragLeave: (e: DragEvent) => {
        if (e.currentTarget.contains(e.relatedTarget as Node | null)) return;
        setOver(false);
      },
      onDrop: (e: DragEvent) => {
        if (!accept(e)) return;
        setOver(false);
        const file = e.dataTransfer.files[0];
        if (file) loadFile(file);
      },
    },
  };
}
