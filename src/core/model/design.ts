/**
 * The design: the source of truth of the workbench. Roots are stored once (a complex root with im > 0
 * implies its conjugate), coefficients a user typed are kept exactly until a root is edited.
 */
import type { Root } from '../types.ts';
import type { GainRule } from '../gainRule.ts';
import type { DesignerSpec } from '../design/index.ts';
import type { RequirementMask } from '../mask/index.ts';
import type { ImplementationSettings } from '../fixed/index.ts';
import { partsAfterRootEdit, type DesignPart } from './parts.ts';

export type { GainRule } from '../gainRule.ts';

/** Coefficients exactly as the user typed them, with the text they came from. */
export interface TypedCoefficients {
  b: number[];
  a: number[];
  text: string;
}

export interface Design {
  /** Sample rate in Hz. */
  sampleRate: number;
  zeros: Root[];
  poles: Root[];
  gainRule: GainRule;
  /** Present while the design is exactly what the user typed; dropped on the first root edit. */
  typed?: TypedCoefficients;
  /** A short title shown on the page, e.g. the scenario the design belongs to. */
  name: string;
  /** Free text about the design (shown as text, never as markup). */
  note: string;
  /** The designer that produced the roots, kept so it can be re-run with new values (see store/designer.ts). */
  designer?: DesignerSpec;
  /**
   * A composed design: the cascade's parts, each owning a run of the root lists (parts.ts). Present for two
   * parts or more, and then `designer` is absent.
   */
  parts?: DesignPart[];
  /** The requirement mask the magnitude response is judged against. */
  mask?: RequirementMask;
  /** How the design is taken to the target (sections, fixed point); absent while only the ideal filter matters. */
  implementation?: ImplementationSettings;
}

export type RootKind = 'zero' | 'pole';

/** Identifies one stored root (its conjugate mirror, if any, goes with it). */
export interface RootRef {
  kind: RootKind;
  index: number;
}

/** Returns the design's zeros or poles array. */
export function rootsOf(design: Design, kind: RootKind): Root[] {
  return kind === 'zero' ? design.zeros : design.poles;
}

/**
 * A copy of the design with one root list replaced and typed coefficients released; the parts of a
 * composed design follow the edit (parts.ts: a root added by hand joins the hand part).
 */
export function withRoots(design: Design, kind: RootKind, roots: Root[]): Design {
  const { typed: _typed, ...rest } = partsAfterRootEdit(design, kind, roots);
  return kind === 'zero' ? { ...rest, zeros: roots } : { ...rest, poles: roots };
}

/** An empty design: no roots, gain 1, at the given sample rate. */
export function emptyDesign(sampleRate = 1000): Design {
  return {
    sampleRate,
    zeros: [],
    poles: [],
    gainRule: { kind: 'fixed', value: 1 },
    name: 'Empty design',
    note: '',
  };
}

/** Plain data equal in every field, numbers bit for bit (−0 ≠ 0), whatever the order of object keys. */
function sameData(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' || typeof b === 'number') return Object.is(a, b);
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => sameData((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

/** True when two designs hold the same values (what a file or link of either would carry). */
export function sameDesign(a: Design, b: Design): boolean {
  return sameData(a, b);
}
