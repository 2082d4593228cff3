/**
 * Messages from sharing and saving (a link that could not be opened, a file that was opened, work that is
 * not saved, …), shown as plain text over the page with their actions as buttons. Errors and persistent
 * notices stay until dismissed or resolved; information fades after a while unless the pointer or focus
 * is on it.
 */
import './notices.css';
import { useEffect, useState } from 'react';
import { useStore } from 'zustand';
import { dismissNotice, noticeStore, runNoticeAction, type Notice } from '../../store/notices.ts';

/** How long an information notice stays, ms. */
export const INFO_NOTICE_MS = 8000;

function NoticeItem({ notice }: { notice: Notice }) {
  const [held, setHeld] = useState(false);
  useEffect(() => {
    if (notice.tone !== 'info' || notice.persistent || held) return;
    const t = window.setTimeout(() => dismissNotice(notice.id), INFO_NOTICE_MS);
    return () => window.clearTimeout(t);
  }, [notice, held]);
  return (
    <p
      className={`pw-notice pw-notice-${notice.tone}`}
      role={notice.tone === 'error' ? 'alert' : 'status'}
      data-testid="notice"
      data-tone={notice.tone}
      onPointerEnter={() => setHeld(true)}
      onPointerLeave={() => setHeld(false)}
      onFocus={() => setHeld(true)}
      onBlur={() => setHeld(false)}
    >
      <span>{notice.text}</span>
      {notice.actions?.map((a) => (
        <button
          key={a.label}
          type="button"
          className="pw-small-button pw-notice-action"
          onClick={() => runNoticeAction(notice, a)}
        >
          {a.label}
        </button>
      ))}
      <button
        type="button"
        className="pw-small-button"
        onClick={() => {
          dismissNotice(notice.id);
          notice.onDismiss?.();
        }}
        aria-label="Dismiss message"
      >
        ×
      </button>
    </p>
  );
}

export function Notices() {
  const notices = useStore(noticeStore, (s) => s.notices);
  if (notices.length === 0) return null;
  return (
    <div className="pw-notices">
      {notices.map((n) => (
        <NoticeItem key={n.id} notice={n} />
      ))}
    </div>
  );
}
