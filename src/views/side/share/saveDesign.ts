/** Saves a design as a design file download: the Share tab's Save file and the "not saved" notice's button. */
import { writeSharedFile } from '../../../share/designFile.ts';
import type { SharedDesign } from '../../../share/document.ts';
import { downloadText } from '../../shared/download.ts';
import { designFileName } from '../../shared/fileName.ts';

/** Downloads the design as `<name>.json`; returns the file name. */
export function downloadDesignFile(shared: SharedDesign): string {
  const file = designFileName(shared.design.name);
  downloadText(writeSharedFile(shared), file, 'application/json');
  return file;
}
