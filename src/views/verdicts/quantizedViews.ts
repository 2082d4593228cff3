/**
 * The quantized filter's verdicts (views/verdicts/QuantizedVerdicts.tsx) load after the first paint
 * (views/prefetch.ts) or when a fixed-point target is first set: the first view draws the ideal verdicts
 * only, and most designs have no target.
 */
import { lazyView } from '../shared/lazyView.tsx';

const load = () => import('./QuantizedVerdicts.tsx');

export const quantizedMaskChip = lazyView('quantized mask verdict', () =>
  load().then((m) => m.QuantizedMaskChip),
);
export const quantizedStability = lazyView('quantized stability verdict', () =>
  load().then((m) => m.QuantizedStability),
);
