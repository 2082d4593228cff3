/** Chooses what the time region shows: the built-in test inputs, the recording, or its spectrum. */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { Segmented } from '../chart/Segmented.tsx';

export function RegionSwitch() {
  const region = useWorkbench((s) => s.signal.region);
  return (
    <Segmented
      tabs
      label="Time region shows"
      value={region}
      options={[
        { value: 'test', label: 'Test input', title: 'Impulse, step, sine or noise through the filter' },
        {
          value: 'recording',
          label: 'Recording',
          title: 'A recording or made signal, before and after the filter',
        },
        {
          value: 'spectrum',
          label: 'Spectrum',
          title: 'Spectrum of the recording before and after, with levels in dB',
        },
      ]}
      onChange={(v) => workbenchStore.getState().setTimeRegion(v)}
    />
  );
}
