/** The slowest pole's decay envelope for the time view, or the reason it is not drawn. */
import { useMemo } from 'react';
import { evalZpkAt } from '../../core/response/index.ts';
import {
  selectClosedForm,
  selectReadouts,
  selectStability,
  selectTimeOutput,
  selectZpk,
} from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { envelopeValues, envelopeWeights, fitEnvelopeWeight } from './envelope.ts';

export type EnvelopeResult =
  | { shown: true; centre: number; values: Float64Array; radius: number; timeConstant: number }
  | { shown: false; note: string };

export function useEnvelope(): EnvelopeResult {
  const stability = useWorkbench(selectStability);
  const closedForm = useWorkbench(selectClosedForm);
  const output = useWorkbench(selectTimeOutput);
  const zpk = useWorkbench(selectZpk);
  const input = useWorkbench((s) => s.view.timeInput);
  const readouts = useWorkbench(selectReadouts);
  return useMemo((): EnvelopeResult => {
    if (input === 'sine' || input === 'noise') {
      return { shown: false, note: 'Decay envelope: shown for impulse and step inputs.' };
    }
    if (!stability) return { shown: false, note: 'Decay envelope: after the stability check.' };
    const r = stability.maxPoleRadius;
    if (stability.verdict !== 'stable') {
      return { shown: false, note: `No decay envelope: the system is ${stability.verdict}.` };
    }
    if (!(r > 0))
      return { shown: false, note: 'No decay envelope: every pole is at z = 0 (finite response).' };
    // A step settles at H(1); an impulse response settles at zero.
    const centre = input === 'step' ? evalZpkAt(zpk, 1, 0).re : 0;
    // The engine's time constant of the slowest pole (the stored pole with the largest radius).
    let slowest: (typeof readouts)[number] | undefined;
    for (const o of readouts) if (o.kind === 'pole' && (!slowest || o.radius > slowest.radius)) slowest = o;
    const weights = (closedForm && envelopeWeights(closedForm, r)) ?? [fitEnvelopeWeight(output, centre, r)];
    return {
      shown: true,
      centre,
      values: envelopeValues(weights, r, output.length),
      radius: r,
      timeConstant: slowest?.timeConstantSamples ?? -1 / Math.log(r),
    };
  }, [stability, closedForm, output, zpk, input, readouts]);
}
