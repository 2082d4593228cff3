/**
 * Which computed styles a picture keeps on each SVG element. A downloaded SVG has no stylesheet, so every
 * look that came from CSS (classes, CSS variables) is written onto the element; values equal to what the
 * element would get anyway (inherited from its parent, or the SVG default) are left out to keep files small.
 */

/** Reads one computed property, as CSSStyleDeclaration.getPropertyValue does. */
export type StyleReader = (property: string) => string;

/** Properties that inherit in SVG: written only where they differ from the parent's. */
export const INHERITED_PROPERTIES = [
  'fill',
  'fill-opacity',
  'fill-rule',
  'stroke',
  'stroke-width',
  'stroke-opacity',
  'stroke-dasharray',
  'stroke-dashoffset',
  'stroke-linecap',
  'stroke-linejoin',
  'paint-order',
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
  'letter-spacing',
  'text-anchor',
  'dominant-baseline',
  'visibility',
  'shape-rendering',
] as const;

/** Properties that do not inherit, with the value that needs no writing. */
export const OWN_PROPERTIES: Record<string, string> = {
  opacity: '1',
  transform: 'none',
  'transform-origin': '',
};

/** The style attribute text for one element: `prop: value;` pairs, in a fixed order. */
export function inlineStyle(
  own: StyleReader,
  parent: StyleReader | null,
  hasTransformAttribute: boolean,
): string {
  const out: string[] = [];
  for (const p of INHERITED_PROPERTIES) {
    const v = own(p);
    if (v && (!parent || parent(p) !== v)) out.push(`${p}: ${v}`);
  }
  const transform = own('transform');
  const transformed = !hasTransformAttribute && transform !== '' && transform !== 'none';
  for (const [p, plain] of Object.entries(OWN_PROPERTIES)) {
    // A transform attribute already says the same as the computed transform (Chrome maps one to the other).
    if ((p === 'transform' || p === 'transform-origin') && !transformed) continue;
    const v = own(p);
    if (v && v !== plain) out.push(`${p}: ${v}`);
  }
  return out.join('; ');
}
