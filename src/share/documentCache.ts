/** Document JSON of designs, cached per design object (designs in the store are never mutated). */
import type { Design } from '../core/model/design.ts';
import { toDocument, type SharedDesign } from './document.ts';
import { stringifyExact } from './exactJson.ts';

const cache = new WeakMap<Design, string>();

/** Compact exact JSON of a design's current-version document, without view settings. */
export function designJson(design: Design): string {
  let s = cache.get(design);
  if (s === undefined) {
    s = stringifyExact(toDocument({ design, view: {} } as SharedDesign));
    cache.set(design, s);
  }
  return s;
}
