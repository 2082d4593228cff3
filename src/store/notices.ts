/**
 * Messages for the page about sharing and saving (a link that could not be opened, storage that is full).
 * Framework-free; the page shows them as text and dismisses them.
 */
import { createStore } from 'zustand/vanilla';

export interface Notice {
  id: number;
  tone: 'error' | 'info';
  text: string;
}

export interface NoticeState {
  notices: Notice[];
}

/** Most notices kept; older ones go. */
export const NOTICE_LIMIT = 4;

export const noticeStore = createStore<NoticeState>()(() => ({ notices: [] }));
let nextId = 1;

/** Adds a notice and returns its id. */
export function postNotice(tone: Notice['tone'], text: string): number {
  const id = nextId++;
  noticeStore.setState((s) => ({ notices: [...s.notices, { id, tone, text }].slice(-NOTICE_LIMIT) }));
  return id;
}

/** Removes a notice. */
export function dismissNotice(id: number): void {
  noticeStore.setState((s) => ({ notices: s.notices.filter((n) => n.id !== id) }));
}
