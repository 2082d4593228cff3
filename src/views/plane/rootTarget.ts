/** Finds which root (and whether its mirror) a DOM event landed on, from the data attributes of RootMark. */
import type { RootRef } from '../../core/model/design.ts';

export interface RootTarget {
  ref: RootRef;
  mirror: boolean;
  element: SVGGElement;
}

export function rootTargetOf(target: EventTarget | null): RootTarget | null {
  if (!(target instanceof Element)) return null;
  const el = target.closest<SVGGElement>('g[data-kind]');
  if (!el) return null;
  const kind = el.dataset.kind;
  const index = Number(el.dataset.index);
  if ((kind !== 'zero' && kind !== 'pole') || !Number.isInteger(index)) return null;
  return { ref: { kind, index }, mirror: el.dataset.mirror === '1', element: el };
}

/** The focusable marker of a stored root inside the plane's SVG. */
export function rootElement(svg: SVGSVGElement, ref: RootRef): SVGGElement | null {
  return svg.querySelector<SVGGElement>(
    `g[data-kind="${ref.kind}"][data-index="${ref.index}"]:not([data-mirror])`,
  );
}
