/**
 * The design's implementation settings (sections, fixed point) in the store: a pure edit and the actions.
 *
 * Undo policy: every setImplementation and clearImplementation is one undo step. A patch that is not
 * acceptable changes nothing and returns the engine's InputError (what was wrong, what is accepted).
 *
 * Two conveniences keep a single change from being refused for a reason the user did not touch:
 * - a longer coefficient or data word widens the accumulator to hold the product (never narrows it);
 * - a new word length with hand-set fraction bits keeps the integer bits (as the word-length search does).
 */
import {
  DEFAULT_IMPLEMENTATION,
  validateSettings,
  type ImplementationSettings,
} from '../core/fixed/index.ts';
import type { InputError, Result } from '../core/types.ts';
import type { Design } from '../core/model/design.ts';

/** Largest accumulator the automatic widening goes to, bits (the engine's limit). */
const WIDEST_ACCUMULATOR = 64;

export interface ImplementationActions {
  /**
   * Changes the implementation settings (from DEFAULT_IMPLEMENTATION when the design has none yet); one
   * undo step. Returns null, or the reason nothing changed.
   */
  setImplementation(patch: Partial<ImplementationSettings>): InputError | null;
  /** Drops the implementation settings (the page falls back to the ideal filter only); one undo step. */
  clearImplementation(): void;
}

/** The settings in force: the design's own, or DEFAULT_IMPLEMENTATION when it has none. */
export function implementationOf(design: Design): ImplementationSettings {
  return design.implementation ?? DEFAULT_IMPLEMENTATION;
}

/** The settings with the patch applied and the two conveniences above, before validation. */
export function mergeImplementationPatch(
  current: ImplementationSettings,
  patch: Partial<ImplementationSettings>,
): ImplementationSettings {
  const next = { ...current, ...patch };
  if (
    patch.wordLength !== undefined &&
    patch.fractionBits === undefined &&
    typeof current.fractionBits === 'number'
  ) {
    const integerBits = current.wordLength - 1 - current.fractionBits;
    next.fractionBits = Math.min(next.wordLength - 1, Math.max(0, next.wordLength - 1 - integerBits));
  }
  if (patch.accumulatorBits === undefined) {
    const product = next.dataWordLength + next.wordLength - 1;
    next.accumulatorBits = Math.min(WIDEST_ACCUMULATOR, Math.max(next.accumulatorBits, product));
  }
  return next;
}

/** The design with the patched settings, or why the patch is not acceptable. */
export function withImplementation(design: Design, patch: Partial<ImplementationSettings>): Result<Design> {
  const checked = validateSettings(mergeImplementationPatch(implementationOf(design), patch));
  if (!checked.ok) return checked;
  return { ok: true, value: { ...design, implementation: checked.value } };
}

/** The design without implementation settings (unchanged when it has none). */
export function withoutImplementation(design: Design): Design {
  if (!design.implementation) return design;
  const { implementation: _dropped, ...rest } = design;
  return rest;
}

const sameSettings = (a: ImplementationSettings | undefined, b: ImplementationSettings): boolean =>
  a !== undefined && (Object.keys(b) as (keyof ImplementationSettings)[]).every((k) => a[k] === b[k]);

/** The implementation actions over the store's edit function (one undo step per applied edit). */
export function implementationActions(
  get: () => { design: Design },
  edit: (fn: (d: Design) => Design) => void,
): ImplementationActions {
  return {
    setImplementation: (patch) => {
      const r = withImplementation(get().design, patch);
      if (!r.ok) return r.error;
      edit((d) => (sameSettings(d.implementation, r.value.implementation!) ? d : r.value));
      return null;
    },
    clearImplementation: () => edit(withoutImplementation),
  };
}
