/**
 * What a design is called after its roots are replaced wholesale (a designer run from the Design page, a
 * typed system). A name the user gave stays, with their note: they are iterating on their filter. A name
 * the workbench gave — the empty design's, the demo's, or the title of what is being replaced (a previous
 * designer's title, "Typed system") — would now describe another filter, so it becomes the new title, and
 * the demo's note (a hum-notch scenario) goes with the demo's name.
 */
import { emptyDesign, type Design } from '../core/model/design.ts';
import { DEMO_NAME, DEMO_NOTE } from './demo.ts';

export function namedAfterReplacing(
  design: Pick<Design, 'name' | 'note'>,
  title: string,
  previousTitle?: string,
): Pick<Design, 'name' | 'note'> {
  const name = design.name.trim();
  const given =
    name === '' ||
    name === emptyDesign().name ||
    name === DEMO_NAME ||
    name === title ||
    name === previousTitle;
  if (!given) return { name: design.name, note: design.note };
  return { name: title, note: design.note === DEMO_NOTE ? '' : design.note };
}
