/**
 * A small "Picture" menu for a panel's header: download the view as SVG (vector, for documents) or PNG
 * (2× image, for slides and chat). Keyboard: Enter/Space/↓ opens, ↑/↓ move, Esc closes.
 */
import { memo, useEffect, useId, useRef, useState, type KeyboardEvent } from 'react';
import { postNotice } from '../../store/notices.ts';
import type { PictureFormat } from './savePicture.ts';
import { PICTURE_VIEWS, type PictureView } from './views.ts';
import './pictures.css';

const ITEMS: { format: PictureFormat; label: string; hint: string }[] = [
  { format: 'svg', label: 'SVG', hint: 'vector, for documents' },
  { format: 'png', label: 'PNG', hint: '2× image, for slides' },
];

/** Downloads the picture, reporting a failure as a notice. */
export function downloadPicture(view: PictureView, format: PictureFormat): Promise<void> {
  // the picture writer loads on first use (prefetched after the first paint with the side pages)
  return import('./savePicture.ts')
    .then(({ savePicture }) => savePicture(view, format))
    .then(
      () => undefined,
      (e: unknown) => void postNotice('error', `The picture could not be made: ${(e as Error).message}`),
    );
}

/** Memoised: the panels around it re-render on every root move, the menu has nothing to redraw then. */
export const PictureMenu = memo(function PictureMenu({ view }: { view: PictureView }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const id = useId();
  const label = PICTURE_VIEWS[view].label;

  useEffect(() => {
    if (!open) return;
    box.current?.querySelector<HTMLButtonElement>('[role="menuitem"]')?.focus();
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', away);
    return () => document.removeEventListener('pointerdown', away);
  }, [open]);

  const close = () => {
    setOpen(false);
    button.current?.focus();
  };
  const onMenuKey = (e: KeyboardEvent) => {
    const items = Array.from(box.current?.querySelectorAll<HTMLButtonElement>('[role="menuitem"]') ?? []);
    const i = items.indexOf(document.activeElement as HTMLButtonElement);
    if (e.key === 'Escape') close();
    else if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      const step = e.key === 'ArrowDown' ? 1 : items.length - 1;
      items[(i + step) % items.length]?.focus();
    } else if (e.key === 'Tab') setOpen(false);
    else return;
    e.preventDefault();
  };
  return (
    <div className="pw-picture" ref={box}>
      <button
        ref={button}
        type="button"
        className="pw-picture-button"
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={id}
        aria-label={`Save a picture of the ${label.toLowerCase()}`}
        title={`Picture: download the ${label.toLowerCase()} as SVG or PNG, titled, for a report`}
        onClick={() => setOpen((o) => !o)}
        onKeyDown={(e) => {
          if (e.key === 'ArrowDown') {
            e.preventDefault();
            setOpen(true);
          }
        }}
      >
        <svg className="pw-picture-icon" width="14" height="14" viewBox="0 0 14 14" aria-hidden="true">
          <path d="M7 1.5v7M4 5.5l3 3 3-3M2 10v2.5h10V10" />
        </svg>
        <span aria-hidden="true">▾</span>
      </button>
      {open ? (
        <div
          className="pw-picture-menu"
          role="menu"
          id={id}
          aria-label={`Picture of the ${label.toLowerCase()}`}
          onKeyDown={onMenuKey}
        >
          {ITEMS.map((it) => (
            <button
              key={it.format}
              type="button"
              role="menuitem"
              tabIndex={-1}
              onClick={() => {
                close();
                void downloadPicture(view, it.format);
              }}
            >
              <span className="pw-picture-format">{it.label}</span>
              <span className="pw-picture-hint">{it.hint}</span>
            </button>
          ))}
        </div>
      ) : null}
    </div>
  );
});
