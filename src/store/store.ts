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
import { designerActions, type DesignerActions } from './designer.ts';
import { whenDesignEngine } from './designEngine.ts';
import { exactChecksStatus, watchExactChecks, type ExactChecksStatus } from './exactChecks.ts';
import type { RateChoice } from './sampleRate.ts';
import { withRateChange } from './rateChange.ts';
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
   * Changes the sample rate keeping the design in hertz (store/sampleRate.ts): a design as its designer
   * made it is designed again at the new rate; hand-placed roots keep their frequencies in Hz, or their
   * places in the plane when `choice` says so; a composed design goes part by part. One undo step, for the
   * Sample rate field and for taking a recording's rate alike. Returns what happened in a sentence, or why
   * nothing changed. When a designer must run and the design algorithms have not arrived (the page loads
   * them after its first paint, store/designEngine.ts), nothing changes until they have: the whole step is
   * taken then and a promise of its result is returned (nothing changes if they cannot be fetched).
   */
  changeSampleRate(hz: number, choice?: RateChoice): Result<string> | Promise<Result<string>>;
  /**
   * Replaces the roots and gain by a system the user typed, keeping the typed coefficients; `about`
   * optionally replaces the name and note in the same undo step (the old note described other roots).
   * The previous design's designer and requirement mask described other roots and go with them (one undo
   * step brings them back), unless `keep.mask` says the user chose to judge the new system by the same mask.
   */
  loadTyped(
    zeros: Root[],
    poles: Root[],
    gain: number,
    typed: TypedCoefficients,
    about?: { name?: string; note?: string },
    keep?: { mask?: boolean },
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
      changeSampleRate: (hz, choice) => {
        const applied: Apply = (fn) => {
          const problem = apply(fn);
          if (!problem) set({ selection: null });
          return problem;
        };
        // The rate-change code and, when a designer must run, the design algorithms: when either has not
        // arrived, the whole step waits for them, and nothing changes if they cannot be fetched.
        const done = withRateChange((m) =>
          whenDesignEngine(() => m.applyRateChange(get().design, hz, choice, applied)),
        );
        if (!(done instanceof Promise)) return done;
        return done.catch((e: unknown): Result<string> => ({
          ok: false,
          error: {
            message: `the design algorithms could not be loaded (${e instanceof Error ? e.message : String(e)})`,
            expected: 'reload the page and change the rate again',
          },
        }));
      },
      loadTyped: (zeros, poles, gain, typed, about, keep = {}) => {
        // Typed coefficients replace the whole cascade: no part or designer owns their roots, and the
        // previous design's mask goes with them unless the user chose to keep it.
        const problem = apply((d) => {
          const { mask, designer: _designer, parts: _parts, ...rest } = d;
          return {
            ...rest,
            ...about,
            zeros,
            poles,
            gainRule: { kind: 'fixed', value: gain },
            typed,
            ...(keep.mask && mask && { mask }),
          };
        });
        if (!problem) set({ selection: null, view: framed(get().view, get().design) });
        return problem;
      },
      replaceDesign: (design) => {
        edit(() => design);
        set({ selection: null, view: framed(get().view, get().design) });
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
