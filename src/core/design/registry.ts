/**
 * The registry of designers: every kind the workbench designs, in the order the form and the command line
 * list them. A new kind is one entry here (see parameters.ts for what an entry holds) plus its engine
 * function; its description type, checks, flags, form fields and file schema follow from the entry.
 */
import {
  dcBlockerDesigner,
  combDesigner,
  harmonicNotchDesigner,
  notchDesigner,
  peakDesigner,
} from './entries/notches.ts';
import { highShelfDesigner, lowShelfDesigner, peakingEqDesigner } from './entries/equalisers.ts';
import { iirDesigner } from './entries/classical.ts';
import type { DesignerEntry, DesignerVariant } from './parameters.ts';

export const DESIGNERS = [
  notchDesigner,
  harmonicNotchDesigner,
  combDesigner,
  peakDesigner,
  dcBlockerDesigner,
  peakingEqDesigner,
  lowShelfDesigner,
  highShelfDesigner,
  iirDesigner,
] as const;

/** A designer kind of the registry. */
export type DesignerKind = (typeof DESIGNERS)[number]['kind'];

/** The registry entry of a kind, or undefined for a kind the registry does not hold. */
export function designerEntry(kind: string): DesignerEntry | undefined {
  return (DESIGNERS as readonly DesignerEntry[]).find((e) => e.kind === kind);
}

/** Every variant (the choices a user picks from), with its entry, in the registry's order. */
export const DESIGNER_VARIANTS: readonly { entry: DesignerEntry; variant: DesignerVariant }[] = (
  DESIGNERS as readonly DesignerEntry[]
).flatMap((entry) => entry.variants.map((variant) => ({ entry, variant })));

/** The variant a description was made by: the first of its entry whose fixed values it has. */
export function variantOf(
  spec: { kind: string } & Record<string, unknown>,
): { entry: DesignerEntry; variant: DesignerVariant } | undefined {
  return DESIGNER_VARIANTS.find(
    ({ entry, variant }) =>
      entry.kind === spec.kind && Object.entries(variant.fixed ?? {}).every(([k, v]) => spec[k] === v),
  );
}
