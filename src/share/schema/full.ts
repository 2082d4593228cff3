/**
 * The full reader: the zod schemas of every released version, with migration and messages that say what is
 * wrong and where. The page loads it on demand (reader.ts); the command line and the tests install it at start.
 */
import type { SharedView } from '../../core/model/view.ts';
import { readDocument } from './migrate.ts';
import { sharedView } from './view.ts';

export { readDocument };

/** The shared view settings of a saved session, or null when they are damaged. */
export function readView(json: unknown): SharedView | null {
  const v = sharedView.safeParse(json);
  return v.success ? v.data : null;
}
