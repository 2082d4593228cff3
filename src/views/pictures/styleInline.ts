/**
 * Which computed styles a picture keeps on each SVG element. A downloaded SVG has no stylesheet, so every
 * look that came from CSS (classes, CSS variables) is written onto the element as a presentation attribute
 * (not a style attribute: the page's Content-Security-Policy forbids inline styles, and attributes are what
 * other SVG readers understand best). Values the element would get anyway — inherited from its parent, or
 * the SVG default — are left out to keep files small.
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
export const OWN_PROPERTIES: Readonly<Record<string, string>> = {
  opacity: '1',
  transform: 'none',
  'transform-origin': '',
};

/** Every property a picture writes; the page's own attributes of these names are replaced. */
export const PRESENTATION_PROPERTIES: ReadonlySet<string> = new Set([
  ...INHERITED_PROPERTIES,
  ...Object.keys(OWN_PROPERTIES),
]);

/**
 * The attributes to write on one element, as [name, value] pairs in a fixed order. `parent` is the
 * parent's computed style (null at the top, where everything is written).
 */
export function presentationAttributes(
  own: StyleReader,
  parent: StyleReader | null,
  hasTransformAttribute: boolean,
): [string, string][] {
  const out: [string, string][] = [];
  for (const p of INHERITED_PROPERTIES) {
    const v = own(p);
    if (v && (!parent || parent(p) !== v)) out.push([p, v]);
  }
  const transform = own('transform');
  // A transform attribute is kept as it is: the computed transform only restates it.
  const transformed = !hasTransformAttribute && transform !== '' && transform !== 'none';
  for (const [p, plain] of Object.entries(OWN_PROPERTIES)) {
    if ((p === 'transform' || p === 'transform-origin') && !transformed) continue;
    const v = own(p);
    if (v && v !== plain) out.push([p, v]);
  }
  return out;
}
