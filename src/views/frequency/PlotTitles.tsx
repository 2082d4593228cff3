/**
 * The title row above each frequency plot, in HTML over the SVG: the quantity, its unit choice right beside
 * it, and (in a short box) tabs that switch the second plot between phase and group delay.
 */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { ViewSettings } from '../../store/view.ts';
import { Segmented } from '../chart/Segmented.tsx';
import type { FrequencyLayout, PlotKey } from './layout.ts';
import { ConstantDelay } from '../linearPhase/linearPhaseSlot.tsx';

const setView = (patch: Partial<ViewSettings>) => workbenchStore.getState().setView(patch);

export interface PlotTitlesProps {
  layout: FrequencyLayout;
  second: 'phase' | 'delay';
  onSecond: (key: 'phase' | 'delay') => void;
}

function UnitChoice({ plot }: { plot: PlotKey }) {
  const magnitudeScale = useWorkbench((s) => s.view.magnitudeScale);
  const phaseMode = useWorkbench((s) => s.view.phaseMode);
  const delayUnit = useWorkbench((s) => s.view.delayUnit);
  if (plot === 'magnitude') {
    return (
      <Segmented
        mini
        label="Magnitude scale"
        value={magnitudeScale}
        options={[
          { value: 'db', label: 'dB', title: 'Magnitude in decibels, 20·log10|H|' },
          { value: 'linear', label: 'linear', title: 'Magnitude |H| as a plain ratio' },
        ]}
        onChange={(v) => setView({ magnitudeScale: v })}
      />
    );
  }
  if (plot === 'phase') {
    return (
      <Segmented
        mini
        label="Phase"
        value={phaseMode}
        options={[
          { value: 'wrapped', label: 'wrapped', title: 'Phase folded into ±180°' },
          { value: 'unwrapped', label: 'unwrapped', title: 'Continuous phase' },
        ]}
        onChange={(v) => setView({ phaseMode: v })}
      />
    );
  }
  return (
    <Segmented
      mini
      label="Group delay unit"
      value={delayUnit}
      options={[
        { value: 'samples', label: 'samples' },
        { value: 'ms', label: 'ms' },
      ]}
      onChange={(v) => setView({ delayUnit: v })}
    />
  );
}

const NAMES: Record<PlotKey, string> = { magnitude: 'Magnitude', phase: 'Phase (°)', delay: 'Group delay' };

export function PlotTitles({ layout, second, onSecond }: PlotTitlesProps) {
  return (
    <>
      {layout.plots.map(({ key, rect }, i) => (
        <div
          key={key}
          className="pw-plot-title"
          style={{ left: rect.left, top: rect.top - 20 }}
          data-testid={`title-${key}`}
        >
          {layout.compact && i > 0 ? (
            <Segmented
              mini
              tabs
              label="Second plot"
              value={second}
              options={[
                { value: 'phase', label: 'Phase (°)' },
                { value: 'delay', label: 'Group delay' },
              ]}
              onChange={onSecond}
            />
          ) : (
            <span className="pw-plot-name">{NAMES[key]}</span>
          )}
          <UnitChoice plot={key} />
          {(key === 'delay' || (layout.compact && i > 0 && second === 'delay')) && <ConstantDelay />}
        </div>
      ))}
    </>
  );
}
