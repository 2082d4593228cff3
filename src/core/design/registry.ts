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
import { differentiatorDesigner, hilbertDesigner } from './entries/firOperators.ts';
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
  differentiatorDesigner,
  hilbertDesigner,
] as const;

/** A designer kind of the registry. */
export type DesignerKind = (typeof DESIGNERS)[number]['kind'];

/** A variant (a choice a user picks from) with its entry. */
export interface VariantOfEntry {
  entry: DesignerEntry;
  variant: DesignerVariant;
}

/** The lookups of a list of entries (the registry's own, or a list with more kinds in tests). */
export function registryOf(entries: readonly DesignerEntry[]) {
  const variants: readonly VariantOfEntry[] = entries.flatMap((entry) =>
    entry.variants.map((variant) => ({ entry, variant })),
  );
  return {
    /** Every variant with its entry, in the registry's order. */
    variants,
    /** The entry of a kind, or undefined for a kind the registry does not hold. */
    entry: (kind: string) => entries.find((e) => e.kind === kind),
    /** The variant a description was made by: the first of its entry whose fixed values it has. */
    variantOf: (spec: { kind: string } & Record<string, unknown>) =>
      variants.find(
        ({ entry, variant }) =>
          entry.kind === spec.kind && Object.entries(variant.fixed ?? {}).every(([k, v]) => spec[k] === v),
      ),
  };
}

const registry = registryOf(DESIGNERS as readonly DesignerEntry[]);

/** Every variant (the choices a user picks from), with its entry, in the registry's order. */
export const DESIGNER_VARIANTS: readonly VariantOfEntry[] = registry.variants;
/** The registry entry of a kind, or undefined for a kind the registry does not hold. */
export const designerEntry: (kind: string) => DesignerEntry | undefined = registry.entry;
/** The variant a description was made by. */
export const variantOf: (spec: { kind: string } & Record<string, unknown>) => VariantOfEntry | undefined =
  registry.variantOf;
