/**
 * The invisible, focusable area over a plot that moves its cross-hair: pointer (mouse, touch, pen) and keys.
 * It is a slider to assistive technology, valued in the plot's x unit, with a focus ring drawn around it.
 */
import type { KeyboardEvent, PointerEvent } from 'react';
import { shortcutAction } from '../shortcuts.ts';

/** The zoom gestures of the plot (useAxisZoom), run alongside the cross-hair's own. */
export interface CursorZoom {
  handlers: {
    onPointerDown: (e: PointerEvent<SVGElement>) => void;
    onPointerMove: (e: PointerEvent<SVGElement>) => void;
    onPointerUp: (e: PointerEvent<SVGElement>) => void;
    onPointerCancel: (e: PointerEvent<SVGElement>) => void;
    onDoubleClick: () => void;
  };
  onKey: (e: KeyboardEvent<SVGElement>) => boolean;
}

export interface CursorAreaProps {
  rect: { left: number; right: number; top: number; bottom: number };
  label: string;
  min: number;
  max: number;
  /** The cross-hair's x value, or null when none is shown. */
  value: number | null;
  valueText: string;
  /** The x value (clamped by the caller) under the pointer at `px` pixels from the SVG's left edge. */
  valueAt: (px: number) => number;
  /** The x value after a key press from `value`, or undefined for a key that does not move it. */
  keyTarget: (key: string, shift: boolean, from: number | null) => number | undefined;
  /** Where the cross-hair goes when the area gets focus with no cross-hair shown. */
  start: number;
  onChange: (value: number | null) => void;
  /** Zoom and pan of the plot's axis on the same area. */
  zoom?: CursorZoom;
}

export function CursorArea(p: CursorAreaProps) {
  const { rect, onChange } = p;
  const fromPointer = (e: { currentTarget: SVGRectElement; clientX: number }) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    return box ? p.valueAt(e.clientX - box.left) : null;
  };
  const onKeyDown = (e: KeyboardEvent<SVGRectElement>) => {
    if (shortcutAction('cursor', e) === 'cursor-off') return onChange(null);
    if (p.zoom?.onKey(e)) return;
    const to = p.keyTarget(e.key, e.shiftKey, p.value);
    if (to === undefined) return;
    e.preventDefault();
    onChange(to);
  };
  const width = rect.right - rect.left;
  const height = rect.bottom - rect.top;
  return (
    <>
      <rect
        className="pw-plot-area"
        x={rect.left}
        y={rect.top}
        width={width}
        height={height}
        fill="transparent"
        tabIndex={0}
        role="slider"
        aria-label={p.label}
        aria-valuemin={p.min}
        aria-valuemax={p.max}
        aria-valuenow={p.value ?? undefined}
        aria-valuetext={p.valueText}
        onPointerMove={(e) => {
          onChange(fromPointer(e));
          p.zoom?.handlers.onPointerMove(e);
        }}
        onPointerDown={(e) => {
          e.currentTarget.focus();
          onChange(fromPointer(e));
          p.zoom?.handlers.onPointerDown(e);
        }}
        onPointerUp={p.zoom?.handlers.onPointerUp}
        onPointerCancel={p.zoom?.handlers.onPointerCancel}
        onDoubleClick={p.zoom?.handlers.onDoubleClick}
        onPointerLeave={(e) => {
          // A focused plot keeps its cross-hair for the keys; an unfocused one lets it go.
          if (document.activeElement !== e.currentTarget) onChange(null);
        }}
        onFocus={() => {
          if (p.value === null) onChange(p.start);
        }}
        onBlur={() => onChange(null)}
        onKeyDown={onKeyDown}
      />
      <rect
        className="pw-focus-ring"
        x={rect.left - 2}
        y={rect.top - 2}
        width={width + 4}
        height={height + 4}
        rx={3}
      />
    </>
  );
}
