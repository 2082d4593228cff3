/** Tab bar of the side column's pages (WAI-ARIA tabs: arrow keys move between tabs). */
import type { KeyboardEvent } from 'react';
import type { SidePage } from './sideTabs.ts';

interface Props {
  pages: readonly SidePage[];
  current: string;
  onSelect: (id: string) => void;
}

export function SideTabBar({ pages, current, onSelect }: Props) {
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    if (e.key !== 'ArrowRight' && e.key !== 'ArrowLeft') return;
    const i = pages.findIndex((p) => p.id === current);
    const next = pages[(i + (e.key === 'ArrowRight' ? 1 : pages.length - 1)) % pages.length]!;
    onSelect(next.id);
    document.getElementById(`pw-side-tab-${next.id}`)?.focus();
    e.preventDefault();
  };
  return (
    <div className="pw-side-tabs" role="tablist" aria-label="Side column pages" onKeyDown={onKey}>
      {pages.map((p) => (
        <button
          key={p.id}
          id={`pw-side-tab-${p.id}`}
          role="tab"
          type="button"
          aria-selected={p.id === current}
          aria-controls={`pw-side-page-${p.id}`}
          tabIndex={p.id === current ? 0 : -1}
          title={p.title}
          className={p.id === current ? 'pw-side-tab pw-side-tab-on' : 'pw-side-tab'}
          onClick={() => onSelect(p.id)}
        >
          {p.label}
        </button>
      ))}
    </div>
  );
}
