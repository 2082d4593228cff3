/**
 * The text of a field while it is being edited, for fields that commit on Enter or when they lose focus.
 * Text that is not accepted stays in the field with its message and the committed value stays in force;
 * once a message shows, it follows the text as it changes; Escape brings the committed value back.
 */
import { useState, type ChangeEvent, type KeyboardEvent } from 'react';
import type { FieldReading } from './fieldReading.ts';

export interface Draft {
  /** The text to show: the user's while editing, else `shown`. */
  text: string;
  /** The message beside the field, or null. */
  message: string | null;
  change(text: string): void;
  commit(): void;
  cancel(): void;
}

/** The props that bind a text input to a draft: its text, typing, Enter and leaving commit, Escape reverts. */
export function draftInputProps(draft: Draft) {
  return {
    value: draft.text,
    onChange: (e: ChangeEvent<HTMLInputElement>) => draft.change(e.target.value),
    onBlur: draft.commit,
    onKeyDown: (e: KeyboardEvent<HTMLInputElement>) => {
      if (e.key === 'Enter') draft.commit();
      if (e.key === 'Escape') draft.cancel();
    },
  };
}

/**
 * A field's draft. `read` turns text into a value or a message; `apply` takes an accepted value (it may
 * still refuse, returning a message); `shown` is the committed value as text; `onMessage` hears every change
 * of the message (for a message shown away from the field).
 */
export function useDraft<T>(
  shown: string,
  read: (text: string) => FieldReading<T>,
  apply: (value: T) => string | null | void,
  onMessage?: (message: string | null) => void,
): Draft {
  const [draft, setDraft] = useState<string | null>(null);
  const [message, setShownMessage] = useState<string | null>(null);
  const setMessage = (m: string | null) => {
    setShownMessage(m);
    if (m !== message) onMessage?.(m);
  };
  const commit = () => {
    if (draft === null) return;
    const r = read(draft);
    const why = r.ok ? (apply(r.value) ?? null) : r.message;
    setMessage(why);
    if (why === null) setDraft(null);
  };
  return {
    text: draft ?? shown,
    message,
    change(text) {
      setDraft(text);
      if (message !== null) {
        const r = read(text);
        setMessage(r.ok ? null : r.message);
      }
    },
    commit,
    cancel() {
      setDraft(null);
      setMessage(null);
    },
  };
}
