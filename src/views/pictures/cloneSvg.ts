/**
 * A stand-alone copy of an SVG on the page, written as markup: every element's computed look as
 * presentation attributes (CSS variables resolved to colours), interactive-only parts left out (cross-hair,
 * focus rings, hit areas), hidden parts dropped. The page's own SVG is only read; nothing is built in the
 * page's DOM.
 */
import { escapeXml } from './pictureDocument.ts';
import { PRESENTATION_PROPERTIES, presentationAttributes, type StyleReader } from './styleInline.ts';

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
  'script',
].join(',');

/** Attributes that only matter on the page (styling hooks, focus, events, assistive roles, test ids). */
function dropped(name: string): boolean {
  return (
    name === 'class' ||
    name === 'style' ||
    name === 'tabindex' ||
    name === 'role' ||
    name === 'xmlns' ||
    name.startsWith('aria-') ||
    name.startsWith('data-') ||
    name.startsWith('on') ||
    // The element's own transform stays; computed looks replace every other presentation attribute.
    (PRESENTATION_PROPERTIES.has(name) && name !== 'transform')
  );
}

function reader(el: Element): StyleReader {
  const cs = getComputedStyle(el);
  return (p) => cs.getPropertyValue(p);
}

function attributes(el: Element, own: StyleReader, parent: StyleReader | null): string {
  let s = '';
  for (const a of Array.from(el.attributes)) {
    if (!dropped(a.name)) s += ` ${a.name}="${escapeXml(a.value)}"`;
  }
  for (const [name, value] of presentationAttributes(own, parent, el.hasAttribute('transform'))) {
    s += ` ${name}="${escapeXml(value)}"`;
  }
  return s;
}

/** The content of `source` as one <g> element's markup, looks written out, interactive parts left out. */
export function svgContentMarkup(source: SVGSVGElement): string {
  const walk = (from: Element, parent: StyleReader): string => {
    let out = '';
    for (const node of Array.from(from.childNodes)) {
      if (node.nodeType === Node.TEXT_NODE) {
        out += escapeXml(node.textContent ?? '');
        continue;
      }
      if (!(node instanceof SVGElement) || node.matches(INTERACTIVE_ONLY)) continue;
      const own = reader(node);
      if (own('display') === 'none') continue;
      const tag = node.tagName;
      out += `<${tag}${attributes(node, own, parent)}>${walk(node, own)}</${tag}>`;
    }
    return out;
  };
  const root = reader(source);
  const top = presentationAttributes(root, null, false)
    .map(([n, v]) => ` ${n}="${escapeXml(v)}"`)
    .join('');
  return `<g${top}>${walk(source, root)}</g>`;
}
