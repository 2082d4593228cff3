/**
 * The parts of a composed design as the Design page lists them: each designed part with whether its roots
 * were edited by hand since it was designed. Only the Design page reads it (it loads with that page).
 */
import type { Result, Root } from '../core/types.ts';
import {
  runDesigner,
  type DesignerSpec,
  type DesignResult,
  type FamilyChoice,
} from '../core/design/index.ts';
import type { Design } from '../core/model/design.ts';
import { partsOf } from '../core/model/parts.ts';
import type { WorkbenchState } from './store.ts';
import { memoLast } from './memo.ts';

const sameRoots = (a: readonly Root[], b: readonly Root[]) =>
  a.length === b.length &&
  a.every((r, i) => r.re === b[i]!.re && r.im === b[i]!.im && r.multiplicity === b[i]!.multiplicity);

/** What one part of the cascade is and whether its roots were edited by hand since it was designed. */
export interface PartStatus {
  index: number;
  /** Absent for the roots placed by hand. */
  designer?: DesignerSpec;
  zeros: number;
  poles: number;
  /** The roots of a designed part differ from what its designer gives now (moved or removed by hand). */
  editedByHand: boolean;
  /** For "any family": the family its designer picked and every family's order. */
  family?: FamilyChoice;
}

/** The status of every part, re-running each designer through `run` (memoised by the caller). */
export function partStatuses(
  design: Design,
  run: (spec: DesignerSpec) => Result<DesignResult>,
): PartStatus[] {
  const parts = partsOf(design);
  let z = 0;
  let p = 0;
  return parts.map((part, index) => {
    const zeros = design.zeros.slice(z, z + part.zeros);
    const poles = design.poles.slice(p, p + part.poles);
    z += part.zeros;
    p += part.poles;
    let editedByHand = false;
    let family: FamilyChoice | undefined;
    if (part.designer) {
      const r = run(part.designer);
      family = r.ok ? r.value.family : undefined;
      editedByHand =
        !r.ok ||
        part.designer.fs !== design.sampleRate ||
        !sameRoots(zeros, r.value.zpk.zeros) ||
        !sameRoots(poles, r.value.zpk.poles);
    }
    return {
      index,
      ...(part.designer && { designer: part.designer }),
      zeros: part.zeros,
      poles: part.poles,
      editedByHand,
      ...(family && { family }),
    };
  });
}

/** Designer outputs by description object (a part's description is kept while its roots are dragged). */
const partOutputs = new WeakMap<DesignerSpec, Result<DesignResult>>();
const runPartDesigner = (spec: DesignerSpec) => {
  let r = partOutputs.get(spec);
  if (!r) partOutputs.set(spec, (r = runDesigner(spec)));
  return r;
};
const partStatusesOf = memoLast((design: Design) => partStatuses(design, runPartDesigner));
/**
 * The parts of the cascade with whether each designed part was edited by hand; a designer runs once per
 * description, so a drag only compares roots.
 */
export const selectPartStatuses = (s: WorkbenchState): PartStatus[] => partStatusesOf(s.design);
