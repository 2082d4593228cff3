/**
 * The workbench store (zustand, framework-free). The design is the source of truth; every change goes
 * through a named action with an undo policy: 'record' pushes one undo step, 'gesture' edits inside a
 * gesture (a drag) and leaves the single step to endGesture, 'none' does not touch history.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Result, Root } from '../core/types.ts';
import { demoDesign } from './demo.ts';
import {
  emptyDesign,
  type Design,
  type GainRule,
  type RootRef,
  type TypedCoefficients,
} from '../core/model/design.ts';
import { MAX_SAMPLE_RATE } from '../core/model/limits.ts';
import { describeProblem, designProblem, type DesignProblem } from '../core/model/check.ts';
import { postNotice } from './notices.ts';
import { closeGesture, emptyHistory, recordEdit, type History } from './history.ts';
import * as edits from './rootEdits.ts';
import { linearPhaseMove, restoreLinearPhaseOf } from './linearPhase.ts';
import { defaultView, type ViewSettings, type ViewState } from './view.ts';
import { framed } from './planeFit.ts';
import { designerActions, rerunAllPartsOn, rerunDesignerOn, type DesignerActions } from './designer.ts';
import { whenDesignEngine } from './designEngine.ts';
import { exactChecksStatus, watchExactChecks, type ExactChecksStatus } from './exactChecks.ts';
import type { DesignResult } from '../core/design/light.ts';
import { implementationActions, type ImplementationActions } from './implementation.ts';
import { defaultSignalView, signalActions, type SignalActions, type SignalState } from './signal.ts';

export interface DesignActions {
  /**
   * Moves a root (a drag's step, a keyboard step). A zero of a linear-phase FIR takes its reciprocal partner
   * with it, so the filter stays linear phase (store/linearPhase.ts).
   */
  moveRoot(ref: RootRef, re: number, im: number): void;
  /** Moves several roots at once (a notch's zeros and poles set by number): one undo step. */
  moveRoots(moves: readonly { ref: RootRef; re: number; im: number }[]): void;
  addRoot(kind: RootRef['kind'], root: Root): void;
  deleteRoot(ref: RootRef): void;
  setMultiplicity(ref: RootRef, multiplicity: number): void;
  splitRoot(ref: RootRef): void;
  joinPair(ref: RootRef): void;
  /**
   * Gives every zero of an FIR that lost its reciprocal partner one again (linear phase back; the selected
   * zero stays where it is); one undo step.
   */
  restoreLinearPhase(): void;
  setGainRule(rule: GainRule): void;
  setSampleRate(hz: number): void;
  /**
   * Takes a sample rate for the design (a recording's) and re-runs its designer at that rate, so a notch
   * designed at 50 Hz stays at 50 Hz; one undo step. Returns the re-run's result (null when the design has
   * no designer, or the rate is not accepted); when the designer refuses the new rate, the rate still
   * changes and the roots stay, and the error says why. When the design has a designer and the design
   * algorithms have not arrived (the page loads them after its first paint, store/designEngine.ts), nothing
   * changes until they have: the whole step is taken then and a promise of its result is returned.
   */
  adoptSampleRate(hz: number): Result<DesignResult> | null | Promise<Result<DesignResult> | null>;
  /**
   * Replaces the roots and gain by a system the user typed, keeping the typed coefficients; `about`
   * optionally replaces the name and note in the same undo step (the old note described other roots).
   */
  loadTyped(
    zeros: Root[],
    poles: Root[],
    gain: number,
    typed: TypedCoefficients,
    about?: { name?: string; note?: string },
  ): DesignProblem | null;
  /** Replaces the whole design (demo, empty, opened file or link); one undo step. */
  replaceDesign(design: Design): void;
  setName(name: string): void;
  /** Replaces the design's note (free text); one undo step. */
  setNote(note: string): void;
}

export interface HistoryActions {
  beginGesture(): void;
  endGesture(): void;
  undo(): void;
  redo(): void;
}

export interface ViewActions {
  select(ref: RootRef | null): void;
  setView(patch: Partial<ViewSettings>): void;
  setDragging(dragging: boolean): void;
}

export interface WorkbenchState
  extends
    ViewState,
    DesignActions,
    HistoryActions,
    ViewActions,
    DesignerActions,
    ImplementationActions,
    SignalState,
    SignalActions {
  design: Design;
  history: History;
  /** Whether the exact checks have arrived (exactChecks.ts); the verdicts wait for them. */
  exactChecks: ExactChecksStatus;
}

export type WorkbenchStore = StoreApi<WorkbenchState>;

/** What the page says when an edit would leave the bounds every design keeps (core/model/limits.ts). */
export function refusedEditText(p: DesignProblem): string {
  return `That change was not made: ${describeProblem(p)}. The workbench holds only designs it can save, link and reopen.`;
}

/** Applies a pure edit to a design if the result keeps the design's bounds; returns the edit's outcome. */
export type Apply = (fn: (d: Design) => Design) => DesignProblem | null;

/** Creates a store holding the given design (the demo design by default). */
export function createWorkbenchStore(initial: Design = demoDesign()): WorkbenchStore {
  return createStore<WorkbenchState>()((set, get) => {
    watchExactChecks((status) => set({ exactChecks: status }));
    /**
     * Applies a pure edit; records one undo step unless inside a gesture. A result outside the design's
     * bounds is not applied and its problem returned, so nothing the page holds is lost on reload.
     */
    const apply: Apply = (fn) => {
      const { design, history } = get();
      const next = fn(design);
      if (next === design) return null;
      const problem = designProblem(next, design);
      if (problem) return problem;
      set({ design: next, history: recordEdit(history, design) });
      return null;
    };
    /** apply, saying so in a notice when the edit is refused. */
    const edit = (fn: (d: Design) => Design) => {
      const problem = apply(fn);
      if (problem) postNotice('error', refusedEditText(problem));
    };
    return {
      design: initial,
      history: emptyHistory,
      view: defaultView,
      selection: null,
      dragging: false,
      signal: defaultSignalView,
      exactChecks: exactChecksStatus(),

      moveRoot: (ref, re, im) =>
        edit(
          (d) =>
            (ref.kind === 'zero' ? linearPhaseMove(d, ref.index, re, im) : null) ??
            edits.moveRoot(d, ref, re, im),
        ),
      moveRoots: (moves) => edit((d) => moves.reduce((x, m) => edits.moveRoot(x, m.ref, m.re, m.im), d)),
      addRoot: (kind, root) => {
        edit((d) => edits.addRoot(d, kind, root));
        const n = kind === 'zero' ? get().design.zeros.length : get().design.poles.length;
        set({ selection: { kind, index: n - 1 } });
      },
      deleteRoot: (ref) => {
        edit((d) => edits.deleteRoot(d, ref));
        set({ selection: null });
      },
      setMultiplicity: (ref, m) => edit((d) => edits.setMultiplicity(d, ref, m)),
      splitRoot: (ref) => edit((d) => edits.splitRoot(d, ref)),
      joinPair: (ref) => edit((d) => edits.joinPair(d, ref)),
      restoreLinearPhase: () => {
        const sel = get().selection;
        edit((d) => restoreLinearPhaseOf(d, sel?.kind === 'zero' ? sel.index : null));
      },
      setGainRule: (rule) => edit((d) => ({ ...d, gainRule: rule })),
      setSampleRate: (hz) => {
        if (!(hz > 0 && hz <= MAX_SAMPLE_RATE)) return;
        edit((d) => (d.sampleRate === hz ? d : { ...d, sampleRate: hz }));
      },
      loadTyped: (zeros, poles, gain, typed, about) => {
        // Typed coefficients replace the whole cascade: no part owns their roots.
        const problem = apply(({ parts: _parts, ...d }) => ({
          ...d,
          ...about,
          zeros,
          poles,
          gainRule: { kind: 'fixed', value: gain },
          typed,
        }));
        if (!problem) set({ selection: null, view: framed(get().view, get().design) });
        return problem;
      },
      replaceDesign: (design) => {
        edit(() => design);
        set({ selection: null, view: framed(get().view, get().design) });
      },
      adoptSampleRate: (hz) => {
        if (!(hz > 0 && hz <= MAX_SAMPLE_RATE)) return null;
        const adopt = () => {
          let rerun: Result<DesignResult> | null = null;
          edit((d) => {
            const rated = d.sampleRate === hz ? d : { ...d, sampleRate: hz };
            if (!rated.designer && !rated.parts) return rated;
            // A composed design re-runs each designed part's description (in Hz) at the new rate.
            // Either throws DesignEnginePending before any change.
            const r = rated.parts ? rerunAllPartsOn(rated) : rerunDesignerOn(rated, {});
            rerun = r.ok ? { ok: true, value: r.value.result } : r;
            return r.ok ? r.value.design : rated;
          });
          if (rerun !== null && (rerun as Result<DesignResult>).ok) set({ selection: null });
          return rerun;
        };
        const done = whenDesignEngine(adopt);
        if (!(done instanceof Promise)) return done;
        // the design algorithms had not arrived: the whole step waits for them
        return done.catch((e: unknown): Result<DesignResult> => {
          edit((d) => (d.sampleRate === hz ? d : { ...d, sampleRate: hz }));
          return {
            ok: false,
            error: {
              message: `the design algorithms could not be loaded (${e instanceof Error ? e.message : String(e)})`,
              expected: 'reload the page and take the rate again',
            },
          };
        });
      },
      setName: (name) => edit((d) => (d.name === name ? d : { ...d, name })),
      setNote: (note) => edit((d) => (d.note === note ? d : { ...d, note })),
      ...designerActions(
        get,
        apply,
        edit,
        () => set({ selection: null }),
        () => set({ view: framed(get().view, get().design) }),
      ),
      ...implementationActions(get, edit),
      ...signalActions(set, get),

      beginGesture: () => {
        const { history, design } = get();
        if (!history.gestureStart) set({ history: { ...history, gestureStart: design } });
      },
      endGesture: () => set({ history: closeGesture(get().history, get().design) }),
      undo: () => {
        const { history, design } = get();
        const h = history.gestureStart ? closeGesture(history, design) : history;
        const prev = h.past[h.past.length - 1];
        if (!prev) return;
        set({
          design: prev,
          history: { past: h.past.slice(0, -1), future: [design, ...h.future], gestureStart: null },
          selection: null,
        });
      },
      redo: () => {
        const { history, design } = get();
        const next = history.future[0];
        if (!next) return;
        set({
          design: next,
          history: { past: [...history.past, design], future: history.future.slice(1), gestureStart: null },
          selection: null,
        });
      },

      select: (ref) => set({ selection: ref }),
      setView: (patch) => set({ view: { ...get().view, ...patch } }),
      setDragging: (dragging) => set({ dragging }),
    };
  });
}

/** A store with the empty design, for "start empty". */
export function createEmptyStore(): WorkbenchStore {
  return createWorkbenchStore(emptyDesign());
}
