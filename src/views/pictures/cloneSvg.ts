/**
 * A stand-alone copy of an SVG on the page: every element's computed look written onto it (CSS variables
 * resolved to colours), interactive-only parts left out (cross-hair, focus rings, hit areas), hidden parts
 * dropped. The page's own SVG is only read.
 */
import { inlineStyle, type StyleReader } from './styleInline.ts';

/** Parts of a view that only serve the pointer or the keyboard, never a printed picture. */
export const INTERACTIVE_ONLY = [
  '.pw-crosshair',
  '.pw-crosshair-dot',
  '.pw-focus-ring',
  '.pw-plot-area',
  '.pw-root-hit',
  '.pw-root-ring',
  '.pw-root-marker',
  'foreignObject',
].join(',');

const SVG_NS = 'http://www.w3.org/2000/svg';
/** Attributes that only matter on the page (styling hooks, focus, assistive roles, test ids). */
const DROPPED_ATTRIBUTES = [
  'class',
  'tabindex',
  'role',
  'aria-label',
  'aria-pressed',
  'aria-hidden',
  'aria-roledescription',
  'data-testid',
];

function reader(el: Element): StyleReader {
  const cs = getComputedStyle(el);
  return (p) => cs.getPropertyValue(p);
}

/** Copies `source` into a new <g>, with styles inlined and interactive-only parts omitted. */
export function cloneSvgContent(source: SVGSVGElement): SVGGElement {
  const out = document.createElementNS(SVG_NS, 'g');
  const rootStyle = reader(source);
  out.setAttribute('style', inlineStyle(rootStyle, null, false));
  const walk = (from: Element, into: Element, parentStyle: StyleReader) => {
    for (const node of Array.from(from.childNodes)) {
      if (node.nodeType === Node.TEXT_NODE) {
        into.appendChild(node.cloneNode());
        continue;
      }
      if (!(node instanceof SVGElement) || node.matches(INTERACTIVE_ONLY)) continue;
      const own = reader(node);
      if (own('display') === 'none') continue;
      const copy = node.cloneNode(false) as SVGElement;
      for (const a of DROPPED_ATTRIBUTES) copy.removeAttribute(a);
      const style = inlineStyle(own, parentStyle, node.hasAttribute('transform'));
      if (style) copy.setAttribute('style', style);
      else copy.removeAttribute('style');
      into.appendChild(copy);
      walk(node, copy, own);
    }
  };
  walk(source, out, rootStyle);
  return out;
}
