/** Undo history of designs: every edit is one step; a gesture (a whole drag) is one step. */
import type { Design } from '../core/model/design.ts';
import { HISTORY_LIMIT } from '../core/model/limits.ts';

export interface History {
  past: Design[];
  future: Design[];
  /** The design when the current gesture began, or null outside a gesture. */
  gestureStart: Design | null;
}

export const emptyHistory: History = { past: [], future: [], gestureStart: null };

/** History after replacing `before` with a new design by a recorded edit. */
export function recordEdit(h: History, before: Design): History {
  if (h.gestureStart) return h;
  const past = h.past.length >= HISTORY_LIMIT ? h.past.slice(1) : h.past.slice();
  past.push(before);
  return { past, future: [], gestureStart: null };
}

/** History at the end of a gesture: one step if the design changed during it. */
export function closeGesture(h: History, current: Design): History {
  const start = h.gestureStart;
  if (!start) return h;
  if (start === current) return { ...h, gestureStart: null };
  return recordEdit({ ...h, gestureStart: null }, start);
}
