/**
 * Before and after: the recording (faint), the filtered recording (bold) and, when it has run, the
 * fixed-point filter's output (thin, over it) against time in seconds, one
 * band per pixel column when the samples are dense. Wheel / drag / keys zoom and pan the time axis.
 */
import { useId, useLayoutEffect, useMemo, useRef } from 'react';
import { selectSignalOutput, FILTER_MARK } from '../../store/signalDerived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { Axis } from '../chart/Axis.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import type { AxisMap } from '../chart/pixels.ts';
import { niceRange } from '../chart/range.ts';
import { linearTicks, spacedTicks } from '../chart/ticks.ts';
import { useSettledRange } from '../chart/useSettledRange.ts';
import { extentOf, tracePath, visibleSamples, type Frame } from './envelope.ts';
import { useZoomGestures } from './useZoomGestures.ts';
import { useCurrentFixedRun } from './fixedRecording.ts';

/** Performance measure of one drag frame: filter pass to the plot's commit (before paint). */
export const FRAME_MEASURE = 'pw-signal-frame';
/** Performance measure of the plot's own work in a frame: envelopes, paths and commit. */
export const DRAW_MEASURE = 'pw-signal-draw';

const PX_PER_X_TICK = 80;

/** The plot rectangle: room for amplitude labels on the left and the seconds axis below. */
export function signalLayout(width: number, height: number) {
  return { left: 58, right: Math.max(59, width - 12), top: 8, bottom: Math.max(9, height - 34) };
}
const PX_PER_Y_TICK = 30;

export function SignalChart({
  width,
  height,
  signal,
}: {
  width: number;
  height: number;
  signal: LoadedSignal;
}) {
  const y = useWorkbench(selectSignalOutput);
  const fixed = useCurrentFixedRun();
  // Output codes stand for code·2^−(D−1)·G at the design's gain: drawn through a frame scaled by that factor.
  const codeScale = fixed
    ? 2 ** -(fixed.implementation.settings.dataWordLength - 1) * fixed.implementation.cascade.outputGain
    : 1;
  const codes = fixed?.result.output ?? null;
  const zoom = useWorkbench((s) => s.signal.zoom);
  const dragging = useWorkbench((s) => s.dragging);
  const svg = useRef<SVGSVGElement>(null);
  const clipId = `pw-sclip-${useId().replace(/:/g, '')}`;
  const x = signal.samples;
  const fs = signal.sampleRate;
  const n = x.length;
  const duration = n / fs;
  const [t0, t1] = zoom ?? [0, duration];
  const rect = useMemo(() => signalLayout(width, height), [width, height]);
  const drawStart = useRef(0);
  drawStart.current = performance.now();

  const [i0, i1] = useMemo(() => {
    const kx = (rect.right - rect.left) / ((t1 - t0) * fs);
    return visibleSamples({ ...rect, x0: rect.left - t0 * fs * kx, kx, y0: 0, ky: 1 }, n);
  }, [rect, t0, t1, fs, n]);
  const inputExtent = useMemo(() => extentOf(x, i0, i1), [x, i0, i1]);
  const outputExtent = useMemo(() => (y ? extentOf(y, i0, i1) : inputExtent), [y, i0, i1, inputExtent]);
  const fixedExtent = useMemo(() => {
    if (!codes) return outputExtent;
    const [a, b] = extentOf(codes, i0, i1).map((v) => v * codeScale) as [number, number];
    return [Math.min(a, b), Math.max(a, b)] as const;
  }, [codes, codeScale, i0, i1, outputExtent]);
  const data = useMemo(
    () =>
      [
        Math.min(inputExtent[0], outputExtent[0], fixedExtent[0], 0),
        Math.max(inputExtent[1], outputExtent[1], fixedExtent[1], 0),
      ] as const,
    [inputExtent, outputExtent, fixedExtent],
  );
  const wanted = useMemo(() => {
    const size = Math.max(Math.abs(data[0]), Math.abs(data[1]), 1e-12);
    return niceRange(data[0], data[1], 0.05 * size, 5);
  }, [data]);
  const range = useSettledRange(`${signal.name}:${zoom?.join() ?? 'all'}`, data, wanted, dragging);

  const frame = useMemo<Frame>(() => {
    const kx = (rect.right - rect.left) / ((t1 - t0) * fs);
    const ky = (rect.bottom - rect.top) / (range[1] - range[0]);
    return { ...rect, x0: rect.left - t0 * fs * kx, kx, y0: rect.bottom + range[0] * ky, ky };
  }, [rect, t0, t1, fs, range]);
  const inputPath = useMemo(() => tracePath(x, frame), [x, frame]);
  const outputPath = useMemo(() => (y ? tracePath(y, frame) : null), [y, frame]);
  const fixedPath = useMemo(
    () => (codes ? tracePath(codes, { ...frame, ky: frame.ky * codeScale }) : null),
    [codes, codeScale, frame],
  );

  // Seconds throughout, however far zoomed in: ticks carry as many decimals as their step needs.
  const unit = { unit: 's', factor: 1 } as const;
  const xMap = useMemo<AxisMap>(
    () => ({
      kind: 'linear',
      d0: (signal.startTime + t0) * unit.factor,
      d1: (signal.startTime + t1) * unit.factor,
      p0: rect.left,
      p1: rect.right,
    }),
    [signal.startTime, t0, t1, unit.factor, rect.left, rect.right],
  );
  const xTicks = useMemo(
    () => linearTicks(xMap.d0, xMap.d1, Math.max(2, (rect.right - rect.left) / PX_PER_X_TICK)),
    [xMap, rect.left, rect.right],
  );
  const yMap = useMemo<AxisMap>(
    () => ({ kind: 'linear', d0: range[0], d1: range[1], p0: rect.bottom, p1: rect.top }),
    [range, rect],
  );
  const yTicks = useMemo(
    () => spacedTicks(range[0], range[1], rect.bottom - rect.top, PX_PER_Y_TICK),
    [range, rect],
  );

  const set = (span: readonly [number, number] | null) => workbenchStore.getState().setSignalZoom(span);
  const gestures = useZoomGestures(svg, {
    t0,
    t1,
    timeAt: (px) => t0 + ((px - rect.left) / (rect.right - rect.left)) * (t1 - t0),
    pxPerSecond: (rect.right - rect.left) / (t1 - t0),
    set,
  });

  useLayoutEffect(() => {
    if (typeof performance.measure !== 'function') return;
    performance.measure(DRAW_MEASURE, { start: drawStart.current });
    if (performance.getEntriesByName(`${FILTER_MARK}:start`, 'mark').length > 0) {
      performance.measure(FRAME_MEASURE, `${FILTER_MARK}:start`);
      performance.clearMarks(`${FILTER_MARK}:start`);
    }
  }, [y]);

  if (width < 80 || height < 60) return <svg ref={svg} width={width} height={height} />;
  const zeroY = frame.y0;
  const spanText = `${formatSpan(t0 + signal.startTime)} to ${formatSpan(t1 + signal.startTime)}`;
  return (
    <svg
      ref={svg}
      className="pw-chart pw-signal-chart"
      width={width}
      height={height}
      role="group"
      aria-label="Recording before and after the filter"
    >
      <PlotFrame
        rect={rect}
        clipId={clipId}
        x={{ map: xMap, ticks: xTicks }}
        y={{ map: yMap, ticks: yTicks }}
        zeroY={zeroY}
      />
      <g clipPath={`url(#${clipId})`}>
        <path
          className={`pw-signal-input${inputPath.band ? ' pw-band' : ''}`}
          data-testid="signal-input-trace"
          d={inputPath.d}
        />
        {outputPath ? (
          <path
            className={`pw-signal-output${outputPath.band ? ' pw-band' : ''}`}
            data-testid="signal-output-trace"
            d={outputPath.d}
          />
        ) : null}
        {fixedPath ? (
          <path
            className={`pw-signal-fixed${fixedPath.band ? ' pw-band' : ''}`}
            data-testid="signal-fixed-trace"
            d={fixedPath.d}
          />
        ) : null}
      </g>
      <Axis side="left" map={yMap} ticks={yTicks} at={rect.left} title="Amplitude" />
      <Axis side="bottom" map={xMap} ticks={xTicks} at={rect.bottom} title={`Time (${unit.unit})`} />
      <rect
        className="pw-plot-area pw-signal-pan"
        x={rect.left}
        y={rect.top}
        width={rect.right - rect.left}
        height={rect.bottom - rect.top}
        fill="transparent"
        tabIndex={0}
        role="slider"
        aria-label="Visible time span: + and − zoom, arrows pan, 0 shows all"
        aria-valuemin={0}
        aria-valuemax={duration}
        aria-valuenow={(t0 + t1) / 2}
        aria-valuetext={spanText}
        {...gestures}
      />
    </svg>
  );
}

function formatSpan(s: number): string {
  return `${s.toPrecision(Math.max(3, Math.ceil(Math.log10(Math.abs(s) + 1)) + 3))} s`;
}
