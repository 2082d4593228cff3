/**
 * Messages for the page about sharing and saving (a link that could not be opened, storage that is full,
 * another tab that changed the same design). Framework-free; the page shows them as text with their
 * actions as buttons. A notice posted with a key replaces the one of that key, so a state that lasts (work
 * not saved) is one notice however often it is reported, and goes when it is resolved.
 */
import { createStore } from 'zustand/vanilla';

/** A button on a notice; running it also dismisses the notice unless `keep` is set. */
export interface NoticeAction {
  label: string;
  run: () => void;
  keep?: boolean;
}

export interface Notice {
  id: number;
  tone: 'error' | 'info';
  text: string;
  actions?: NoticeAction[];
  /** Identifies a lasting state; posting the same key replaces the notice. */
  key?: string;
  /** Stays until dismissed or resolved (information notices otherwise fade). */
  persistent?: boolean;
  /** Runs when the user dismisses the notice (×). */
  onDismiss?: () => void;
}

export interface NoticeState {
  notices: Notice[];
}

/** Most notices kept; the oldest ones without a key go first. */
export const NOTICE_LIMIT = 4;

export const noticeStore = createStore<NoticeState>()(() => ({ notices: [] }));
let nextId = 1;

export interface NoticeOptions {
  key?: string;
  actions?: NoticeAction[];
  persistent?: boolean;
  onDismiss?: () => void;
}

/** Keeps at most NOTICE_LIMIT notices, dropping the oldest unkeyed ones first. */
function trim(list: Notice[]): Notice[] {
  const out = list.slice();
  while (out.length > NOTICE_LIMIT) {
    const i = out.findIndex((n) => n.key === undefined);
    out.splice(i >= 0 ? i : 0, 1);
  }
  return out;
}

/** Adds a notice (or replaces the one with the same key, in its place) and returns its id. */
export function postNotice(tone: Notice['tone'], text: string, options: NoticeOptions = {}): number {
  const id = nextId++;
  const notice: Notice = { id, tone, text, ...options };
  noticeStore.setState((s) => {
    const at = options.key === undefined ? -1 : s.notices.findIndex((n) => n.key === options.key);
    if (at < 0) return { notices: trim([...s.notices, notice]) };
    const notices = s.notices.slice();
    notices[at] = notice;
    return { notices };
  });
  return id;
}

/** Removes a notice. */
export function dismissNotice(id: number): void {
  noticeStore.setState((s) => ({ notices: s.notices.filter((n) => n.id !== id) }));
}

/** Removes the notice with a key, if there is one; returns whether there was. */
export function dismissKey(key: string): boolean {
  const had = noticeStore.getState().notices.some((n) => n.key === key);
  if (had) noticeStore.setState((s) => ({ notices: s.notices.filter((n) => n.key !== key) }));
  return had;
}

/** Runs a notice's action the way its button does: the notice goes unless the action keeps it. */
export function runNoticeAction(notice: Notice, action: NoticeAction): void {
  if (!action.keep) dismissNotice(notice.id);
  action.run();
}

/** Whether a notice with this key is shown. */
export function hasNotice(key: string): boolean {
  return noticeStore.getState().notices.some((n) => n.key === key);
}
