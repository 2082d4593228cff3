/** Messages from sharing and saving (a link that could not be opened, …), shown as plain text. */
import './notices.css';
import { useStore } from 'zustand';
import { dismissNotice, noticeStore } from '../../share/notices.ts';

export function Notices() {
  const notices = useStore(noticeStore, (s) => s.notices);
  if (notices.length === 0) return null;
  return (
    <div className="pw-notices">
      {notices.map((n) => (
        <p
          key={n.id}
          className={`pw-notice pw-notice-${n.tone}`}
          role={n.tone === 'error' ? 'alert' : 'status'}
          data-testid="notice"
        >
          <span>{n.text}</span>
          <button
            type="button"
            className="pw-small-button"
            onClick={() => dismissNotice(n.id)}
            aria-label="Dismiss message"
          >
            ×
          </button>
        </p>
      ))}
    </div>
  );
}
