/**
 * The system entry's small helpers that the first view needs without the parser (readEntry.ts, which loads
 * after the first paint): where an error sits in the text, and the name a typed system takes.
 */
import type { Design } from '../../../core/model/design.ts';
import { namedAfterReplacing } from '../../../store/naming.ts';

/** The line holding a 0-based offset, with the column inside it (1-based line number). */
export function locate(text: string, position: number): { line: number; lineText: string; column: number } {
  const p = Math.min(Math.max(0, position), text.length);
  const start = text.lastIndexOf('\n', p - 1) + 1;
  const endAt = text.indexOf('\n', p);
  const end = endAt < 0 ? text.length : endAt;
  const line = text.slice(0, start).split('\n').length;
  return { line, lineText: text.slice(start, end), column: p - start };
}

/** The name a typed system takes over from a scenario's or the empty design's name. */
export const TYPED_NAME = 'Typed system';

/** Name and note for a design replaced by typed text: a name the workbench gave becomes TYPED_NAME (store/naming.ts). */
export function typedAbout(design: Pick<Design, 'name' | 'note'>): { name: string; note: string } {
  return namedAfterReplacing(design, TYPED_NAME);
}
