/**
 * The stacked frequency plots (magnitude, phase, group delay) on one shared frequency axis, with the
 * cross-hair (pointer or arrow keys) and the selected root's marker.
 */
import { useMemo, type KeyboardEvent, type PointerEvent } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { selectResponse, selectZpk } from '../../store/derived.ts';
import { Axis } from '../chart/Axis.tsx';
import { fromPixel, toPixel, toPixels, type AxisMap } from '../chart/pixels.ts';
import { formatHzTick, linearTicks, logTicks } from '../chart/ticks.ts';
import { useSettledRange } from '../chart/useSettledRange.ts';
import { formatHz } from '../shared/format.ts';
import { Crosshair } from './Crosshair.tsx';
import { cursorStepsForKey, startHz, stepHz } from './cursor.ts';
import { frequencyLayout } from './layout.ts';
import type { FrequencyReading } from './readAt.ts';
import { refineAtRoots } from './refine.ts';
import { RootMarker } from './RootMarker.tsx';
import { DEG_PER_RAD, delaySeries, frequencyDomain, gridHz, magnitudeSeries, phaseSeries } from './series.ts';
import { TracePlot, yMapOf } from './TracePlot.tsx';

export interface FrequencyChartProps {
  width: number;
  height: number;
  reading: FrequencyReading | null;
  onCursor: (hz: number | null) => void;
  marker: { hz: number; kind: 'zero' | 'pole' } | null;
}

/** Horizontal pixels per frequency tick label. */
const PX_PER_X_TICK = 70;
const COLOURS = { magnitude: 'var(--pw-magnitude)', phase: 'var(--pw-phase)', delay: 'var(--pw-delay)' };

export function FrequencyChart({ width, height, reading, onCursor, marker }: FrequencyChartProps) {
  const grid = useWorkbench(selectResponse);
  const zpk = useWorkbench(selectZpk);
  const response = useMemo(() => refineAtRoots(zpk, grid), [zpk, grid]);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const magnitudeScale = useWorkbench((s) => s.view.magnitudeScale);
  const phaseMode = useWorkbench((s) => s.view.phaseMode);
  const delayUnit = useWorkbench((s) => s.view.delayUnit);
  const axis = useWorkbench((s) => s.view.frequencyAxis);
  const hold = useWorkbench((s) => s.view.holdScale);

  const layout = useMemo(() => frequencyLayout(width, height), [width, height]);
  const hz = useMemo(() => gridHz(response.omega, fs), [response.omega, fs]);
  const [d0, d1] = frequencyDomain(hz, fs, axis);
  const xMap = useMemo<AxisMap>(
    () => ({ kind: axis, d0, d1, p0: layout.magnitude.left, p1: layout.magnitude.right }),
    [axis, d0, d1, layout.magnitude.left, layout.magnitude.right],
  );
  const xTicks = useMemo(() => {
    const count = Math.max(2, (xMap.p1 - xMap.p0) / PX_PER_X_TICK);
    return axis === 'log' ? logTicks(d0, d1, count) : linearTicks(d0, d1, count, (v) => formatHzTick(v));
  }, [axis, d0, d1, xMap]);
  const xPx = useMemo(() => toPixels(xMap, hz), [xMap, hz]);

  const mag = useMemo(() => magnitudeSeries(response, magnitudeScale), [response, magnitudeScale]);
  const phase = useMemo(() => phaseSeries(response, phaseMode), [response, phaseMode]);
  const delay = useMemo(() => delaySeries(response, delayUnit, fs), [response, delayUnit, fs]);
  const magRange = useSettledRange(mag.key, mag.data, mag.wanted, hold);
  const phaseRange = useSettledRange(phase.key, phase.data, phase.wanted, hold);
  const delayRange = useSettledRange(delay.key, delay.data, delay.wanted, hold);

  const points = useMemo(() => {
    if (!reading) return [];
    const m = magnitudeScale === 'db' ? reading.magnitudeDb : reading.magnitude;
    const ph = (phaseMode === 'wrapped' ? reading.phase : reading.phaseUnwrapped) * DEG_PER_RAD;
    const gd = delayUnit === 'ms' ? reading.groupDelayMs : reading.groupDelay;
    return [
      { rect: layout.magnitude, range: magRange, value: m, colour: COLOURS.magnitude },
      { rect: layout.phase, range: phaseRange, value: ph, colour: COLOURS.phase },
      { rect: layout.delay, range: delayRange, value: gd, colour: COLOURS.delay },
    ].map((p) => ({
      map: yMapOf(p.rect, p.range),
      value: p.value,
      colour: p.colour,
      top: p.rect.top,
      bottom: p.rect.bottom,
    }));
  }, [reading, magnitudeScale, phaseMode, delayUnit, layout, magRange, phaseRange, delayRange]);

  const pointerHz = (e: PointerEvent<SVGRectElement>) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    if (!box) return null;
    const f = fromPixel(xMap, e.clientX - box.left);
    return Math.min(d1, Math.max(d0, f));
  };
  const onKeyDown = (e: KeyboardEvent<SVGRectElement>) => {
    const steps = cursorStepsForKey(e.key, e.shiftKey);
    if (steps === null) {
      if (e.key === 'Escape') onCursor(null);
      return;
    }
    e.preventDefault();
    const from = reading ? reading.hz : startHz([d0, d1], axis);
    onCursor(reading ? stepHz(from, [d0, d1], axis, steps) : from);
  };

  if (width < 80 || height < 80) return <svg width={width} height={height} />;
  const area = layout.magnitude;
  const markerX = marker ? toPixel(xMap, marker.hz) : NaN;
  return (
    <svg
      className="pw-chart"
      width={width}
      height={height}
      role="group"
      aria-label="Magnitude, phase and group delay"
    >
      <TracePlot
        rect={layout.magnitude}
        xMap={xMap}
        xTicks={xTicks}
        xPx={xPx}
        series={mag}
        range={magRange}
        colour={COLOURS.magnitude}
        name="magnitude"
      />
      <TracePlot
        rect={layout.phase}
        xMap={xMap}
        xTicks={xTicks}
        xPx={xPx}
        series={phase}
        range={phaseRange}
        colour={COLOURS.phase}
        name="phase"
      />
      <TracePlot
        rect={layout.delay}
        xMap={xMap}
        xTicks={xTicks}
        xPx={xPx}
        series={delay}
        range={delayRange}
        colour={COLOURS.delay}
        name="delay"
      />
      <Axis
        side="bottom"
        map={xMap}
        ticks={xTicks}
        at={layout.axisY}
        title={axis === 'log' ? 'Frequency (Hz, log)' : 'Frequency (Hz)'}
      />
      {marker && markerX >= area.left && markerX <= area.right ? (
        <RootMarker x={markerX} hz={marker.hz} kind={marker.kind} layout={layout} />
      ) : null}
      {reading ? <Crosshair x={toPixel(xMap, reading.hz)} layout={layout} points={points} /> : null}
      <rect
        className="pw-plot-area"
        x={area.left}
        y={area.top}
        width={area.right - area.left}
        height={layout.delay.bottom - area.top}
        fill="transparent"
        tabIndex={0}
        role="slider"
        aria-label="Cross-hair frequency"
        aria-valuemin={d0}
        aria-valuemax={d1}
        aria-valuenow={reading ? reading.hz : undefined}
        aria-valuetext={reading ? formatHz(reading.hz) : 'off'}
        onPointerMove={(e) => onCursor(pointerHz(e))}
        onPointerDown={(e) => {
          e.currentTarget.focus();
          onCursor(pointerHz(e));
        }}
        onPointerLeave={(e) => {
          if (document.activeElement !== e.currentTarget) onCursor(null);
        }}
        onFocus={() => {
          if (!reading) onCursor(startHz([d0, d1], axis));
        }}
        onBlur={() => onCursor(null)}
        onKeyDown={onKeyDown}
      />
      <rect
        className="pw-focus-ring"
        x={area.left - 2}
        y={area.top - 2}
        width={area.right - area.left + 4}
        height={layout.delay.bottom - area.top + 4}
        rx={3}
      />
    </svg>
  );
}
