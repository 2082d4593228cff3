/**
 * Places for the page's words about linear phase (LinearPhaseViews.tsx), whose code loads after the first
 * paint (shared/lazyPart.tsx): they say something only for an FIR, and only once the design engine that
 * pairs its zeros is there, so the first paint never needs them.
 */
import { lazyPart } from '../shared/lazyPart.tsx';

const views = () => import('./LinearPhaseViews.tsx');

/** Under the stability banner: linear phase and its delay, or the offer to restore it. */
export const LinearPhaseNote = lazyPart(() => views().then((m) => m.LinearPhaseNote)).Part;
/** Beside the group delay plot's title: the constant delay of a linear-phase FIR. */
export const ConstantDelay = lazyPart(() => views().then((m) => m.ConstantDelay)).Part;
