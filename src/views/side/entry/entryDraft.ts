/**
 * The system entry's text, kept for this tab (sessionStorage) while it is typed, so a reload or a switch to
 * another side page does not lose a half-typed equation. It is not part of the design until applied.
 */

const KEY = 'polewright.entry';

function session(): Storage | null {
  try {
    return globalThis.sessionStorage ?? null;
  } catch {
    return null;
  }
}

/** The text this tab was typing, or ''. */
export function readEntryDraft(): string {
  try {
    return session()?.getItem(KEY) ?? '';
  } catch {
    return '';
  }
}

/** Keeps the text being typed (an empty box keeps nothing). */
export function keepEntryDraft(text: string): void {
  try {
    if (text) session()?.setItem(KEY, text);
    else session()?.removeItem(KEY);
  } catch {
    // A full or blocked storage only means a reload starts with an empty box.
  }
}
