/**
 * Before and after: the recording (faint), the filtered recording (bold) and, when it has run, the
 * fixed-point filter's output (thin, over it) against time in seconds, one band per pixel column when the
 * samples are dense, drawn from what the recording worker computes for the plot's width (recordingWorker.ts). The filtered trace is faint while it belongs to an earlier design
 * (the whole recording is being filtered again); during a root drag, the live preview of the dragged design
 * replaces it as far as it reaches. Wheel / drag / keys zoom and pan the time axis.
 */
import { useEffect, useId, useMemo, useRef } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { Axis } from '../chart/Axis.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import type { AxisMap } from '../chart/pixels.ts';
import { niceRange } from '../chart/range.ts';
import { linearTicks, spacedTicks } from '../chart/ticks.ts';
import { useSettledRange } from '../chart/useSettledRange.ts';
import {
  extentOf,
  spanFor,
  traceExtent,
  tracePath,
  tracePathOf,
  visibleSamples,
  type Frame,
} from './envelope.ts';
import { useAxisZoom } from '../chart/useAxisZoom.ts';
import { useCurrentFixedRun } from './fixedRecording.ts';
import { setRecordingViewport, useRecordingRuns } from './recordingWorker.ts';

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
  const zoom = useWorkbench((s) => s.signal.zoom);
  const dragging = useWorkbench((s) => s.dragging);
  const view = useRecordingRuns((r) => (r.view?.request.id === signal.id ? r.view : null));
  const outputCurrent = useRecordingRuns(
    (r) => r.view !== null && r.view.output !== null && r.view.output.version === r.wantedVersion,
  );
  const fixed = useCurrentFixedRun();
  // Output codes stand for code·2^−(D−1)·G at the design's gain: drawn through a frame scaled by that factor.
  const codeScale = fixed
    ? 2 ** -(fixed.implementation.settings.dataWordLength - 1) * fixed.implementation.cascade.outputGain
    : 1;
  const codes = fixed?.result.output ?? null;
  const svg = useRef<SVGSVGElement>(null);
  const clipId = `pw-sclip-${useId().replace(/:/g, '')}`;
  const fs = signal.sampleRate;
  const n = signal.length;
  const duration = n / fs;
  const [t0, t1] = zoom ?? [0, duration];
  const rect = useMemo(() => signalLayout(width, height), [width, height]);

  const kx = (rect.right - rect.left) / ((t1 - t0) * fs);
  const x0 = rect.left - t0 * fs * kx;
  const span = spanFor({ ...rect, x0, kx, y0: 0, ky: 1 }, n);
  const visible = width >= 80 && height >= 60;
  useEffect(() => {
    setRecordingViewport(visible ? span : null);
  }, [visible, span.i0, span.i1, span.columns, span.line]); // eslint-disable-line react-hooks/exhaustive-deps
  useEffect(() => () => setRecordingViewport(null), []);

  const preview = dragging ? (view?.preview ?? null) : null;
  // Each part depends on its own trace only: during a drag only the preview's change.
  const request = view?.request ?? null;
  const input = view?.input ?? null;
  const output = view?.output ?? null;
  const inputExtent = useMemo(() => (input ? traceExtent(input) : null), [input]);
  const outputExtent = useMemo(() => (output ? traceExtent(output.trace) : null), [output]);
  const previewExtent = useMemo(
    () => (preview ? traceExtent(preview.trace, preview.filled) : null),
    [preview],
  );
  const fixedExtent = useMemo((): [number, number] | null => {
    if (!codes) return null;
    const [v0, v1] = visibleSamples({ ...rect, x0, kx, y0: 0, ky: 1 }, n);
    const [a, b] = extentOf(codes, v0, v1).map((v) => v * codeScale) as [number, number];
    return [Math.min(a, b), Math.max(a, b)];
  }, [codes, codeScale, rect, x0, kx, n]);
  const data = useMemo(() => {
    let lo = 0;
    let hi = 0;
    for (const e of [inputExtent, outputExtent, previewExtent, fixedExtent]) {
      if (e) [lo, hi] = [Math.min(lo, e[0]), Math.max(hi, e[1])];
    }
    return [lo, hi] as const;
  }, [inputExtent, outputExtent, previewExtent, fixedExtent]);
  const wanted = useMemo(() => {
    const size = Math.max(Math.abs(data[0]), Math.abs(data[1]), 1e-12);
    return niceRange(data[0], data[1], 0.05 * size, 5);
  }, [data]);
  const range = useSettledRange(`${signal.id}:${zoom?.join() ?? 'all'}`, data, wanted, dragging);

  const frame = useMemo<Frame>(() => {
    const ky = (rect.bottom - rect.top) / (range[1] - range[0]);
    return { ...rect, x0, kx, y0: rect.bottom + range[0] * ky, ky };
  }, [rect, x0, kx, range]);
  const inputPath = useMemo(
    () => (input && request ? tracePathOf(input, request, frame) : null),
    [input, request, frame],
  );
  // During a drag the preview covers its live stretch; the last full output shows beyond it only.
  const outputFrom = preview ? preview.filled : 0;
  const outputPath = useMemo(
    () => (output && request ? tracePathOf(output.trace, request, frame, outputFrom) : null),
    [output, request, frame, outputFrom],
  );
  const fixedPath = useMemo(
    () => (codes ? tracePath(codes, { ...frame, ky: frame.ky * codeScale }) : null),
    [codes, codeScale, frame],
  );
  const previewPath = useMemo(
    () => (request && preview ? tracePathOf(preview.trace, request, frame, 0, preview.filled) : null),
    [request, preview, frame],
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
  const gestures = useAxisZoom(
    svg,
    {
      span: [t0, t1],
      kind: 'linear',
      valueAt: (px) => t0 + ((px - rect.left) / (rect.right - rect.left)) * (t1 - t0),
      set,
    },
    { drag: 'pan', scope: 'recording' },
  );

  if (!visible) return <svg ref={svg} width={width} height={height} />;
  const zeroY = frame.y0;
  const spanText = `${formatSpan(t0 + signal.startTime)} to ${formatSpan(t1 + signal.startTime)}`;
  const outputState = preview ? 'beyond-preview' : outputCurrent ? 'current' : 'stale';
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
        {inputPath ? (
          <path
            className={`pw-signal-input${inputPath.band ? ' pw-band' : ''}`}
            data-testid="signal-input-trace"
            d={inputPath.d}
          />
        ) : null}
        {outputPath ? (
          <path
            className={`pw-signal-output${outputPath.band ? ' pw-band' : ''}${outputState === 'current' ? '' : ' pw-stale'}`}
            data-testid="signal-output-trace"
            data-state={outputState}
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
        {previewPath ? (
          <path
            className={`pw-signal-output pw-preview${previewPath.band ? ' pw-band' : ''}`}
            data-testid="signal-preview-trace"
            d={previewPath.d}
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
        {...gestures.handlers}
        onKeyDown={gestures.onKey}
      />
    </svg>
  );
}

function formatSpan(s: number): string {
  return `${s.toPrecision(Math.max(3, Math.ceil(Math.log10(Math.abs(s) + 1)) + 3))} s`;
}
