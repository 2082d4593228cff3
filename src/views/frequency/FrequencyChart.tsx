/**
 * The frequency plots (magnitude on top, phase and group delay below) on one shared frequency axis, with
 * the cross-hair (pointer or arrow keys) and the selected root's marker.
 */
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { selectDisplayResponse } from '../../store/derived.ts';
import { useCompare } from '../../store/compare.ts';
import { selectShowQuantized } from '../../store/implementationDerived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { clampBandHz, shownBandHz } from '../../store/zoom.ts';
import { useAxisZoom } from '../chart/useAxisZoom.ts';
import { Axis } from '../chart/Axis.tsx';
import { CursorArea } from '../chart/CursorArea.tsx';
import { fromPixel, toPixel, toPixels, type AxisMap } from '../chart/pixels.ts';
import { formatHzStepTick, linearTicks, logTicks } from '../chart/ticks.ts';
import { useSettledRange } from '../chart/useSettledRange.ts';
import { formatHz } from '../shared/format.ts';
import { Crosshair } from './Crosshair.tsx';
import { cursorStepsForKey, startHz, stepHz } from './cursor.ts';
import { frequencyLayout, type PlotKey } from './layout.ts';
import { PlotTitles } from './PlotTitles.tsx';
import type { FrequencyReading } from '../../core/response/readAt.ts';
import { RootMarker } from './RootMarker.tsx';
import { PLOT_OVERLAYS } from './overlays.ts';
import { MaskChip } from './mask/MaskChip.tsx';
import { lazyPart } from '../shared/lazyPart.tsx';
import type { MaskHandlesProps } from './mask/MaskHandles.tsx';
import {
  DEG_PER_RAD,
  delaySeries,
  frequencyDomain,
  magnitudeSeries,
  phaseSeries,
  type Series,
} from './series.ts';
import { TracePlot, yMapOf } from './TracePlot.tsx';
import { omegaGridToHz } from '../../core/units.ts';

/** The mask's drag handles are invisible grab strips: they load after the first paint (prefetch.ts). */
export const maskHandles = lazyPart<MaskHandlesProps>(() =>
  import('./mask/MaskHandles.tsx').then((m) => m.MaskHandles),
);
const MaskHandles = maskHandles.Part;

export interface FrequencyChartProps {
  width: number;
  height: number;
  reading: FrequencyReading | null;
  onCursor: (hz: number | null) => void;
  marker: { hz: number; kind: 'zero' | 'pole' } | null;
}

/** Narrowest log-axis band (high/low) labelled by decades; a narrower one gets even steps. */
const LOG_TICKS_MIN_RATIO = 4;
/** Horizontal pixels per frequency tick label. */
const PX_PER_X_TICK = 64;
const COLOURS: Record<PlotKey, string> = {
  magnitude: 'var(--pw-magnitude)',
  phase: 'var(--pw-phase)',
  delay: 'var(--pw-delay)',
};

/** The value a reading gives for one plot, in that plot's axis units. */
function readingValue(
  key: PlotKey,
  r: FrequencyReading,
  v: { db: boolean; wrapped: boolean; ms: boolean },
): number {
  if (key === 'magnitude') return v.db ? r.magnitudeDb : r.magnitude;
  if (key === 'phase') return (v.wrapped ? r.phase : r.phaseUnwrapped) * DEG_PER_RAD;
  return v.ms ? r.groupDelayMs : r.groupDelay;
}

export function FrequencyChart({ width, height, reading, onCursor, marker }: FrequencyChartProps) {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const magnitudeScale = useWorkbench((s) => s.view.magnitudeScale);
  const phaseMode = useWorkbench((s) => s.view.phaseMode);
  const delayUnit = useWorkbench((s) => s.view.delayUnit);
  const axis = useWorkbench((s) => s.view.frequencyAxis);
  const hold = useWorkbench((s) => s.view.holdScale);
  const span = useWorkbench((s) => s.view.frequencySpan);
  const svg = useRef<SVGSVGElement>(null);
  const [second, setSecond] = useState<'phase' | 'delay'>('phase');
  const overlayClip = `pw-overlay-clip-${useId().replace(/:/g, '')}`;

  const response = useWorkbench(selectDisplayResponse);
  // Keys along the magnitude plot's bottom edge: the quantized line's (or its "drawn again" note) and a
  // pinned reference's.
  const quantizedKey = useWorkbench(selectShowQuantized);
  const referenceKey = useCompare((s) => s.reference !== null);
  const keysBelow = quantizedKey || referenceKey;
  const layout = useMemo(() => frequencyLayout(width, height, second), [width, height, second]);
  const area = layout.plots[0]!.rect;
  const columns = Math.max(1, Math.round(area.right - area.left));
  useEffect(() => {
    const st = workbenchStore.getState();
    if (st.view.responseColumns !== columns) st.setView({ responseColumns: columns });
  }, [columns]);
  const hz = useMemo(() => omegaGridToHz(response.omega, fs), [response.omega, fs]);
  const band = useMemo(() => shownBandHz(span, fs, axis), [span, fs, axis]);
  const [d0, d1] = frequencyDomain(hz, fs, axis, band);
  const xMap = useMemo<AxisMap>(
    () => ({ kind: axis, d0, d1, p0: area.left, p1: area.right }),
    [axis, d0, d1, area.left, area.right],
  );
  const xTicks = useMemo(() => {
    const count = Math.max(2, (xMap.p1 - xMap.p0) / PX_PER_X_TICK);
    // A log axis zoomed to less than a factor of LOG_TICKS_MIN_RATIO has too few 1-2-5 values: even steps read.
    return axis === 'log' && d1 / d0 >= LOG_TICKS_MIN_RATIO
      ? logTicks(d0, d1, count)
      : linearTicks(d0, d1, count, formatHzStepTick);
  }, [axis, d0, d1, xMap]);
  const xPx = useMemo(() => toPixels(xMap, hz), [xMap, hz]);

  // The highest upper limit of the mask: the dB axis reaches it, so a pass-band ceiling is drawn.
  const maskTopDb = useWorkbench((s) =>
    Math.max(-Infinity, ...(s.design.mask?.regions.map((r) => r.upperDb ?? -Infinity) ?? [])),
  );
  const series: Record<PlotKey, Series> = {
    magnitude: useMemo(
      () => magnitudeSeries(response, magnitudeScale, maskTopDb),
      [response, magnitudeScale, maskTopDb],
    ),
    phase: useMemo(() => phaseSeries(response, phaseMode), [response, phaseMode]),
    delay: useMemo(() => delaySeries(response, delayUnit, fs), [response, delayUnit, fs]),
  };
  // Every range settles even while its plot is hidden, so switching plots shows a steady axis.
  const ranges = {
    magnitude: useSettledRange(series.magnitude.key, series.magnitude.data, series.magnitude.wanted, hold),
    phase: useSettledRange(series.phase.key, series.phase.data, series.phase.wanted, hold),
    delay: useSettledRange(series.delay.key, series.delay.data, series.delay.wanted, hold),
  };
  // One map per plot, kept while its rectangle and range hold, so overlay layers can memoise on it.
  const { magnitude: rMag, phase: rPhase, delay: rDelay } = ranges;
  const yMaps = useMemo(() => {
    const byKey = { magnitude: rMag, phase: rPhase, delay: rDelay };
    const maps = {} as Record<PlotKey, AxisMap>;
    for (const { key, rect } of layout.plots) maps[key] = yMapOf(rect, byKey[key]);
    return maps;
  }, [layout, rMag, rPhase, rDelay]);

  const rects = layout.plots.map((p) => p.rect);
  const units = useMemo(
    () => ({ db: magnitudeScale === 'db', wrapped: phaseMode === 'wrapped', ms: delayUnit === 'ms' }),
    [magnitudeScale, phaseMode, delayUnit],
  );
  const points = reading
    ? layout.plots.map(({ key, rect }) => ({
        map: yMapOf(rect, ranges[key]),
        value: readingValue(key, reading, units),
        colour: COLOURS[key],
        top: rect.top,
        bottom: rect.bottom,
      }))
    : [];

  const zoom = useAxisZoom(
    svg,
    {
      span: [d0, d1],
      kind: axis,
      valueAt: (px) => fromPixel(xMap, px),
      set: (sp) =>
        workbenchStore.getState().setView({ frequencySpan: sp ? clampBandHz(sp, fs, axis) : null }),
      focus: reading?.hz ?? null,
    },
    { drag: 'select', scope: 'cursor' },
  );

  const magnitudePlot = layout.plots.find((p) => p.key === 'magnitude');
  if (width < 80 || height < 80) return <svg ref={svg} width={width} height={height} />;
  const bottom = layout.axisY;
  const markerX = marker ? toPixel(xMap, marker.hz) : NaN;
  return (
    <>
      <svg
        ref={svg}
        className="pw-chart"
        width={width}
        height={height}
        role="group"
        aria-label="Magnitude, phase and group delay"
        data-band={band ? `${band[0]} ${band[1]}` : 'all'}
      >
        {layout.plots.map(({ key, rect }) => (
          <TracePlot
            key={key}
            rect={rect}
            xMap={xMap}
            xTicks={xTicks}
            xPx={xPx}
            series={series[key]}
            range={ranges[key]}
            colour={COLOURS[key]}
            name={key}
          />
        ))}
        {layout.plots.map(({ key, rect }) => (
          <g
            key={key}
            className={`pw-${key}-overlays`}
            clipPath={`url(#${overlayClip}-${key})`}
            pointerEvents="none"
          >
            <clipPath id={`${overlayClip}-${key}`}>
              <rect
                x={rect.left}
                y={rect.top}
                width={rect.right - rect.left}
                height={rect.bottom - rect.top}
              />
            </clipPath>
            {PLOT_OVERLAYS.map(({ id, Layer }) => (
              <Layer key={id} plot={key} rect={rect} xMap={xMap} yMap={yMaps[key]} units={units} />
            ))}
          </g>
        ))}
        <Axis
          side="bottom"
          map={xMap}
          ticks={xTicks}
          at={bottom}
          title={axis === 'log' ? 'Frequency (Hz, log)' : 'Frequency (Hz)'}
        />
        {marker && markerX >= area.left && markerX <= area.right ? (
          <RootMarker x={markerX} hz={marker.hz} kind={marker.kind} rects={rects} keysBelow={keysBelow} />
        ) : null}
        {reading ? <Crosshair x={toPixel(xMap, reading.hz)} rects={rects} points={points} /> : null}
        {zoom.band ? (
          <rect
            className="pw-zoom-band"
            data-testid="zoom-band"
            x={zoom.band[0]}
            y={area.top}
            width={zoom.band[1] - zoom.band[0]}
            height={bottom - area.top}
          />
        ) : null}
        <CursorArea
          rect={{ left: area.left, right: area.right, top: area.top, bottom }}
          label="Cross-hair frequency"
          min={d0}
          max={d1}
          value={reading ? reading.hz : null}
          valueText={reading ? formatHz(reading.hz) : 'off'}
          valueAt={(px) => Math.min(d1, Math.max(d0, fromPixel(xMap, px)))}
          keyTarget={(key, shift, from) => {
            const steps = cursorStepsForKey(key, shift);
            if (steps === null) return undefined;
            return from === null ? startHz([d0, d1], axis) : stepHz(from, [d0, d1], axis, steps);
          }}
          start={startHz([d0, d1], axis)}
          onChange={onCursor}
          zoom={zoom}
        />
        {magnitudePlot ? (
          <MaskHandles
            rect={magnitudePlot.rect}
            xMap={xMap}
            yMap={yMapOf(magnitudePlot.rect, ranges.magnitude)}
            db={units.db}
            onHover={onCursor}
          />
        ) : null}
      </svg>
      <PlotTitles layout={layout} second={second} onSecond={setSecond} />
      {magnitudePlot ? <MaskChip rect={magnitudePlot.rect} /> : null}
    </>
  );
}
