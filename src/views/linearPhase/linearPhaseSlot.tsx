/**
 * Places for the page's words about linear phase (LinearPhaseViews.tsx), whose code loads only when the
 * design on show is an FIR with its delay (poles, all at the origin): the first view carries these slots and
 * nothing else of it. A slot shows nothing until the code has arrived (a fraction of a second), and nothing
 * if it cannot be fetched: the words inform, the design is untouched either way.
 */
import { useEffect, useState, type ComponentType } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { firWithDelay } from '../../store/linearPhase.ts';

type Views = typeof import('./LinearPhaseViews.tsx');

let loaded: Views | null = null;
let pending: Promise<Views> | null = null;

function load(): Promise<Views> {
  return (pending ??= import('./LinearPhaseViews.tsx').then(
    (m) => (loaded = m),
    (e: unknown) => {
      pending = null; // a later FIR design tries again
      throw e;
    },
  ));
}

function slot(pick: (m: Views) => ComponentType): ComponentType {
  return function Slot() {
    const fir = useWorkbench((s) => firWithDelay(s.design.poles));
    const [views, setViews] = useState<Views | null>(() => loaded);
    useEffect(() => {
      if (!fir || views) return;
      let live = true;
      load().then(
        (m) => live && setViews(m),
        () => undefined,
      );
      return () => {
        live = false;
      };
    }, [fir, views]);
    if (!fir || !views) return null;
    const View = pick(views);
    return <View />;
  };
}

/** Under the stability banner: linear phase and its delay, or the offer to restore it. */
export const LinearPhaseNote = slot((m) => m.LinearPhaseNote);
/** Beside the group delay plot's title: the constant delay of a linear-phase FIR. */
export const ConstantDelay = slot((m) => m.ConstantDelay);
