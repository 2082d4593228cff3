/** A hook that reports an element's content-box size in CSS pixels, kept current by a ResizeObserver. */
import { useLayoutEffect, useState, type RefObject } from 'react';

export interface Size {
  width: number;
  height: number;
}

/** Width and height of the referenced element's content box (0 × 0 until it is laid out). */
export function useElementSize(ref: RefObject<Element | null>): Size {
  const [size, setSize] = useState<Size>({ width: 0, height: 0 });
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const update = (width: number, height: number) => {
      // Whole pixels: sub-pixel jitter from the layout must not re-render the charts.
      const w = Math.floor(width);
      const h = Math.floor(height);
      setSize((old) => (old.width === w && old.height === h ? old : { width: w, height: h }));
    };
    const box = el.getBoundingClientRect();
    update(box.width, box.height);
    const observer = new ResizeObserver((entries) => {
      const rect = entries[entries.length - 1]?.contentRect;
      if (rect) update(rect.width, rect.height);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return size;
}
