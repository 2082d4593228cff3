/**
 * Designers and requirement masks in the store: pure edits of a design, and the actions built on them.
 *
 * Undo policy: running, re-running and releasing a designer, and every mask edit, is one undo step;
 * moveRegionEdge is for drags (between beginGesture and endGesture the whole drag is one step, as for roots).
 *
 * Hand edits after a design: editing a root keeps `design.designer`, so the designer can still be re-run
 * (which replaces the hand edits; undo brings them back). Whether the roots are still the designer's is
 * not stored but derived (differsFromDesigner / selectDesignerStatus): the designer is re-run and its
 * output compared with the design, so undoing back to the designed roots reads "as designed" again.
 */
import type { Result, Root } from '../core/types.ts';
import { designerShape, runDesigner, type DesignerSpec, type DesignResult } from '../core/design/light.ts';
import * as masks from '../core/mask/index.ts';
import type { MaskRegion, MaskRegionPatch, RegionEdge, RequirementMask } from '../core/mask/index.ts';
import type { Design } from '../core/model/design.ts';
import { partsOf, replacePart } from '../core/model/parts.ts';

import { problemPlace, type DesignProblem } from '../core/model/check.ts';
import { namedAfterReplacing } from './naming.ts';

/** What happens to the mask when a designer runs. */
export type DesignerMaskPolicy =
  /** Keep the current mask; when there is none, use the one the designer's requirement implies (default). */
  | 'fill'
  /** Replace the mask by the one the designer's requirement implies (none if it implies none). */
  | 'replace'
  /** Never touch the mask. */
  | 'keep';

/** Changed designer parameters, or a function from the current description to the new one. */
export type DesignerPatch = Partial<DesignerSpec> | ((spec: DesignerSpec) => DesignerSpec);

/** Parameters that are alternatives to each other (from the designer registry): giving one drops the other. */
function alternativesOf(kind: string): readonly (readonly [string, string])[] {
  return designerShape(kind)?.alternatives?.map((a) => a.keys) ?? [];
}

/** The designer description with a patch applied; a parameter given drops its alternative (q vs bandwidth). */
export function mergeDesignerPatch(spec: DesignerSpec, patch: DesignerPatch): DesignerSpec {
  if (typeof patch === 'function') return patch(spec);
  const out: Record<string, unknown> = { ...spec };
  for (const [a, b] of alternativesOf(spec.kind)) {
    if (a in patch && !(b in patch)) delete out[b];
    if (b in patch && !(a in patch)) delete out[a];
  }
  return { ...out, ...patch } as DesignerSpec;
}

/** The design with roots, gain and sample rate from a designer's result, remembering the designer. */
function withDesigned(
  design: Design,
  spec: DesignerSpec,
  result: DesignResult,
  policy: DesignerMaskPolicy,
): Design {
  const { typed: _typed, mask, parts: _parts, ...rest } = design;
  const implied = policy === 'keep' ? null : masks.maskFromDesigner(spec);
  const nextMask = policy === 'keep' ? mask : policy === 'replace' ? implied : (mask ?? implied);
  const copy = (roots: Root[]) => roots.map((r) => ({ ...r }));
  return {
    ...rest,
    sampleRate: spec.fs,
    zeros: copy(result.zpk.zeros),
    poles: copy(result.zpk.poles),
    gainRule: { kind: 'fixed', value: result.zpk.gain },
    designer: spec,
    ...(nextMask && { mask: nextMask }),
  };
}

/**
 * Words for a designer run that replaces the design's roots: the new designer's title ("Elliptic low-pass"),
 * and the title of the designer it replaces, if any.
 */
export interface DesignerNaming {
  title: string;
  previousTitle?: string;
}

/**
 * Runs a designer on a design: the new design and the designer's result, or its InputError. With `naming`,
 * a name the workbench gave follows the new designer (store/naming.ts).
 */
export function applyDesigner(
  design: Design,
  spec: DesignerSpec,
  policy: DesignerMaskPolicy = 'fill',
  naming?: DesignerNaming,
): Result<{ design: Design; result: DesignResult }> {
  const r = runDesigner(spec);
  if (!r.ok) return r;
  const next = withDesigned(design, spec, r.value, policy);
  return {
    ok: true,
    value: {
      design: naming ? { ...next, ...namedAfterReplacing(design, naming.title, naming.previousTitle) } : next,
      result: r.value,
    },
  };
}

/**
 * Re-runs the design's designer with changed parameters at the design's current sample rate (so a
 * sample-rate change is followed); the mask is kept. Fails when the design has no designer.
 */
export function rerunDesignerOn(
  design: Design,
  patch: DesignerPatch,
): Result<{ design: Design; result: DesignResult }> {
  if (!design.designer)
    return {
      ok: false,
      error: { message: 'this design has no designer to re-run', expected: 'run a designer first' },
    };
  const spec = mergeDesignerPatch({ ...design.designer, fs: design.sampleRate }, patch);
  return applyDesigner(design, spec, 'keep');
}

/** The design without its designer or parts (roots, gain and mask stay), for free editing. */
export function releaseDesignerOf(design: Design): Design {
  if (!design.designer && !design.parts) return design;
  const { designer: _designer, parts: _parts, ...rest } = design;
  return rest;
}

/** Re-runs designed part `index` with changed parameters at the design's sample rate (its roots only). */
export function rerunPartOn(
  design: Design,
  index: number,
  patch: DesignerPatch = {},
): Result<{ design: Design; result: DesignResult }> {
  const part = partsOf(design)[index];
  if (!part?.designer)
    return {
      ok: false,
      error: { message: `part ${index + 1} has no designer to re-run`, expected: 'a designed part' },
    };
  const spec = mergeDesignerPatch({ ...part.designer, fs: design.sampleRate }, patch);
  const r = runDesigner(spec);
  if (!r.ok) return r;
  return { ok: true, value: { design: replacePart(design, index, spec, r.value.zpk), result: r.value } };
}

const sameRoots = (a: readonly Root[], b: readonly Root[]) =>
  a.length === b.length &&
  a.every((r, i) => r.re === b[i]!.re && r.im === b[i]!.im && r.multiplicity === b[i]!.multiplicity);

/**
 * True when the design's roots, gain or sample rate differ from what its designer produces (it was edited
 * by hand since); false when they are the designer's output or there is no designer.
 */
export function differsFromDesigner(design: Design, designed: Result<DesignResult> | null): boolean {
  if (!design.designer || !designed) return false;
  if (!designed.ok) return true;
  const { zpk } = designed.value;
  return (
    design.sampleRate !== design.designer.fs ||
    design.gainRule.kind !== 'fixed' ||
    design.gainRule.value !== zpk.gain ||
    !sameRoots(design.zeros, zpk.zeros) ||
    !sameRoots(design.poles, zpk.poles)
  );
}

/** The design with a mask set (validated at the design's sample rate) or removed (null). */
export function withMask(design: Design, mask: RequirementMask | null): Result<Design> {
  if (mask === null) {
    if (!design.mask) return { ok: true, value: design };
    const { mask: _mask, ...rest } = design;
    return { ok: true, value: rest };
  }
  const checked = masks.validateMask(mask, design.sampleRate);
  return checked.ok ? { ok: true, value: { ...design, mask } } : checked;
}

const maskOf = (d: Design): RequirementMask => d.mask ?? { regions: [] };

export interface DesignerActions {
  /**
   * Runs a designer: replaces roots, gain (a fixed k) and sample rate with its output and remembers it;
   * the mask follows `policy` (default 'fill'). One undo step. On bad parameters nothing changes and
   * the InputError says what to change. Needs the design algorithms (store/designEngine.ts): the Design
   * page, which calls it, brings them with its code; before they are installed it throws
   * DesignEnginePending and changes nothing (whenDesignEngine waits and runs again). With `naming`, a name
   * the workbench gave the design follows the new designer (store/naming.ts), in the same undo step.
   */
  runDesigner(spec: DesignerSpec, policy?: DesignerMaskPolicy, naming?: DesignerNaming): Result<DesignResult>;
  /** Re-runs the remembered designer with changed parameters (replaces the roots; one undo step). */
  rerunDesigner(patch: DesignerPatch): Result<DesignResult>;
  /** Forgets the designer and keeps the roots, for free editing (one undo step). */
  releaseDesigner(): void;
  /**
   * A designer edit of the design (adding, re-running or removing a part: store/partEdits.ts), or its
   * InputError; one undo step when it succeeds.
   */
  designerEdit(fn: (d: Design) => Result<{ design: Design; result: DesignResult }>): Result<DesignResult>;
  /** An edit of the design's parts that cannot fail (removing a part: store/partEdits.ts); one undo step. */
  partsEdit(fn: (d: Design) => Design): void;
  /** Sets (validated) or removes (null) the whole mask; one undo step. */
  setMask(mask: RequirementMask | null): Result<RequirementMask | null>;
  /** Adds a region (an id is chosen when none is given) and returns its id; one undo step. */
  addRegion(region: Omit<MaskRegion, 'id'> & { id?: string }): Result<string>;
  /** Changes a region by id (a key given as undefined removes that limit); one undo step. */
  updateRegion(id: string, patch: MaskRegionPatch): Result<MaskRegion>;
  /** Removes a region by id; one undo step. */
  deleteRegion(id: string): void;
  /** Drags an edge (Hz) or limit (dB) of a region, clamped to stay valid; use inside begin/endGesture. */
  moveRegionEdge(id: string, edge: RegionEdge, value: number): void;
}

/**
 * The designer and mask actions of a store: its design reader, its checked edit (which returns the problem
 * of a result outside the design's bounds), its edit that reports such a problem itself, a hook for new
 * roots, and one for a design that a designer made (run, re-run, a part added or re-run), after which the
 * store frames the plane on every root as after Apply or Open (store/planeFit.ts). Removing a part only
 * takes roots away, so it frames nothing.
 */
export function designerActions(
  get: () => { design: Design },
  apply: (fn: (d: Design) => Design) => DesignProblem | null,
  edit: (fn: (d: Design) => Design) => void,
  rootsReplaced: () => void = () => {},
  designArrived: () => void = () => {},
): DesignerActions {
  /** Applies an edit that may fail; records one step when it succeeds and changes something. */
  const attempt = <T>(fn: (d: Design) => Result<{ design: Design; out: T }>): Result<T> => {
    const r = fn(get().design);
    if (!r.ok) return r;
    const problem = apply(() => r.value.design);
    if (problem)
      return {
        ok: false,
        error: {
          message: `the result would not be kept: ${problemPlace(problem)}: ${problem.message}`,
          expected: problem.expected,
        },
      };
    return { ok: true, value: r.value.out };
  };
  const designed = (r: Result<{ design: Design; result: DesignResult }>) =>
    r.ok ? { ok: true as const, value: { design: r.value.design, out: r.value.result } } : r;
  return {
    runDesigner: (spec, policy = 'fill', naming) => {
      const r = attempt((d) => designed(applyDesigner(d, spec, policy, naming)));
      if (r.ok) {
        rootsReplaced();
        designArrived();
      }
      return r;
    },
    rerunDesigner: (patch) => {
      const r = attempt((d) => designed(rerunDesignerOn(d, patch)));
      if (r.ok) {
        rootsReplaced();
        designArrived();
      }
      return r;
    },
    releaseDesigner: () => edit(releaseDesignerOf),
    designerEdit: (fn) => {
      const r = attempt((d) => designed(fn(d)));
      if (r.ok) {
        rootsReplaced();
        designArrived();
      }
      return r;
    },
    partsEdit: (fn) => {
      edit(fn);
      rootsReplaced();
    },
    setMask: (mask) =>
      attempt((d) => {
        const r = withMask(d, mask);
        return r.ok ? { ok: true, value: { design: r.value, out: mask } } : r;
      }),
    addRegion: (region) =>
      attempt((d) => {
        const r = masks.addRegion(maskOf(d), region, d.sampleRate);
        return r.ok ? { ok: true, value: { design: { ...d, mask: r.value.mask }, out: r.value.id } } : r;
      }),
    updateRegion: (id, patch) =>
      attempt((d) => {
        const r = masks.updateRegion(maskOf(d), id, patch, d.sampleRate);
        if (!r.ok) return r;
        const region = r.value.regions.find((x) => x.id === id)!;
        return { ok: true, value: { design: { ...d, mask: r.value }, out: region } };
      }),
    deleteRegion: (id) =>
      edit((d) => {
        if (!d.mask) return d;
        const next = masks.deleteRegion(d.mask, id);
        return next === d.mask ? d : { ...d, mask: next };
      }),
    moveRegionEdge: (id, edge, value) =>
      edit((d) => {
        if (!d.mask) return d;
        const next = masks.moveRegionEdge(d.mask, id, edge, value, d.sampleRate);
        return next === d.mask ? d : { ...d, mask: next };
      }),
  };
}
