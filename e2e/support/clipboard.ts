/**
 * The clipboard belongs to the browser process, and all workers share one browser (sharedBrowser.ts): a
 * test that copies and reads the clipboard back holds this lock meanwhile, so no other worker's copy lands
 * in between. The lock is a directory (mkdir is atomic), removed when the test's clipboard work ends.
 */
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';

export const CLIPBOARD_LOCK = join(import.meta.dirname, '..', '..', 'test-results', '.clipboard-lock');

/** Runs `work` while no other test uses the clipboard. */
export async function withClipboard<T>(work: () => Promise<T>): Promise<T> {
  mkdirSync(join(CLIPBOARD_LOCK, '..'), { recursive: true });
  for (;;) {
    try {
      mkdirSync(CLIPBOARD_LOCK);
      break;
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
      await new Promise((r) => setTimeout(r, 50));
    }
  }
  try {
    return await work();
  } finally {
    rmSync(CLIPBOARD_LOCK, { recursive: true, force: true });
  }
}
