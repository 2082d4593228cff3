/**
 * The time plot: input (faint) and output (bold) against the sample index, seconds on a second axis, the
 * slowest pole's decay envelope dashed, and a cross-hair that reads one sample (pointer or arrow keys).
 */
import { useId, useMemo, useRef } from 'react';
import { selectTimeInput, selectTimeOutput } from '../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { clampSamples, shownSamples } from '../../store/zoom.ts';
import { useAxisZoom } from '../chart/useAxisZoom.ts';
import { Axis } from '../chart/Axis.tsx';
import { CursorArea } from '../chart/CursorArea.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import { fromPixel, toPixel, toPixels, type AxisMap } from '../chart/pixels.ts';
import { finiteExtent, niceRange, type Range } from '../chart/range.ts';
import { linearTicks, spacedTicks } from '../chart/ticks.ts';
import { useSettledRange } from '../chart/useSettledRange.ts';
import { samplePaths } from './samplePaths.ts';
import { timeLayout, timeUnit } from './layout.ts';
import type { EnvelopeResult } from './useEnvelope.ts';
import { sampleAfterKey } from './sampleKeys.ts';
import { OffScaleNote, SampleCrosshair } from './TimeOverlays.tsx';
import { ReferenceTimeTrace } from './ReferenceTimeTrace.tsx';

export interface TimeChartProps {
  width: number;
  height: number;
  cursor: number | null;
  onCursor: (n: number | null) => void;
  envelope: EnvelopeResult;
  /** Fit the amplitude axis to samples from n = 1 on, so a large first sample does not flatten the rest. */
  fitTail: boolean;
}

const PX_PER_X_TICK = 70;
const PX_PER_Y_TICK = 32;

/** y range of input and output together over samples from … to−1, always including 0 (the baseline). */
export function valueRange(x: Float64Array, y: Float64Array, from: number, to = y.length): Range {
  const a = finiteExtent(x.subarray(from, to)) ?? [0, 0];
  const b = finiteExtent(y.subarray(from, to)) ?? [0, 0];
  return [Math.min(a[0], b[0], 0), Math.max(a[1], b[1], 0)];
}

/** Smallest amplitude span shown, relative to the data's largest magnitude (and absolutely). */
const MIN_SPAN_RELATIVE = 0.05;
const MIN_SPAN_ABSOLUTE = 1e-12;

export function TimeChart({ width, height, cursor, onCursor, envelope, fitTail }: TimeChartProps) {
  const x = useWorkbench(selectTimeInput);
  const y = useWorkbench(selectTimeOutput);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const style = useWorkbench((s) => s.view.timeStyle);
  const kind = useWorkbench((s) => s.view.timeInput);
  const spanSetting = useWorkbench((s) => s.view.timeSpan);
  const clipId = `pw-clip-${useId().replace(/:/g, '')}`;
  const svg = useRef<SVGSVGElement>(null);
  const n = y.length;
  const zoomed = useMemo(() => shownSamples(spanSetting, n), [spanSetting, n]);
  const [s0, s1] = zoomed ?? [-0.5, n - 0.5];

  const rect = useMemo(() => timeLayout(width, height), [width, height]);
  const xMap = useMemo<AxisMap>(
    () => ({ kind: 'linear', d0: s0, d1: s1, p0: rect.left, p1: rect.right }),
    [s0, s1, rect.left, rect.right],
  );
  const xTicks = useMemo(
    () =>
      linearTicks(
        Math.max(0, s0),
        Math.min(n - 1, s1),
        Math.max(2, (rect.right - rect.left) / PX_PER_X_TICK),
      ).filter((t) => Number.isInteger(t.value)),
    [n, s0, s1, rect.left, rect.right],
  );
  const seconds = useMemo(() => {
    const { unit, factor } = timeUnit((s1 - s0) / fs);
    const k = factor / fs;
    const map: AxisMap = { kind: 'linear', d0: s0 * k, d1: s1 * k, p0: rect.left, p1: rect.right };
    const ticks = linearTicks(
      Math.max(0, s0) * k,
      Math.min(n - 1, s1) * k,
      Math.max(2, (rect.right - rect.left) / PX_PER_X_TICK),
    );
    return { unit, map, ticks };
  }, [n, fs, s0, s1, rect.left, rect.right]);
  const zoom = useAxisZoom(
    svg,
    {
      span: [s0, s1],
      kind: 'linear',
      valueAt: (px) => fromPixel(xMap, px),
      set: (sp) => workbenchStore.getState().setView({ timeSpan: sp ? clampSamples(sp, n) : null }),
      focus: cursor,
    },
    { drag: 'select', scope: 'cursor' },
  );

  const data = useMemo(() => {
    // Zoomed in, the axis follows the samples shown.
    const first = Math.max(0, Math.ceil(s0));
    const end = Math.min(n, Math.floor(s1) + 1);
    const tail = fitTail ? valueRange(x, y, Math.min(Math.max(1, first), end - 1), end) : null;
    // Nothing after the first sample (e.g. a pure gain): fit everything rather than an empty axis.
    return tail && (tail[0] !== 0 || tail[1] !== 0) ? tail : valueRange(x, y, first, end);
  }, [x, y, fitTail, n, s0, s1]);
  const wanted = useMemo(() => {
    const size = Math.max(Math.abs(data[0]), Math.abs(data[1]));
    return niceRange(data[0], data[1], Math.max(MIN_SPAN_ABSOLUTE, MIN_SPAN_RELATIVE * size), 5);
  }, [data]);
  const range = useSettledRange(`${kind}:${fitTail}`, data, wanted, false);
  const yMap = useMemo<AxisMap>(
    () => ({ kind: 'linear', d0: range[0], d1: range[1], p0: rect.bottom, p1: rect.top }),
    [range, rect],
  );
  const yTicks = useMemo(
    () => spacedTicks(range[0], range[1], rect.bottom - rect.top, PX_PER_Y_TICK),
    [range, rect],
  );

  const px = useMemo(
    () =>
      toPixels(
        xMap,
        Float64Array.from({ length: n }, (_, i) => i),
      ),
    [xMap, n],
  );
  const inputPaths = useMemo(
    () => samplePaths(px, toPixels(yMap, x), toPixel(yMap, 0), rect, style),
    [px, yMap, x, rect, style],
  );
  const outputPaths = useMemo(
    () => samplePaths(px, toPixels(yMap, y), toPixel(yMap, 0), rect, style),
    [px, yMap, y, rect, style],
  );
  const envelopePaths = useMemo(() => {
    if (!envelope.shown) return null;
    const up = new Float64Array(n);
    const down = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      up[i] = envelope.centre + envelope.values[i]!;
      down[i] = envelope.centre - envelope.values[i]!;
    }
    const a = samplePaths(px, toPixels(yMap, up), 0, rect, 'line');
    const b = samplePaths(px, toPixels(yMap, down), 0, rect, 'line');
    return a.line + b.line;
  }, [envelope, n, px, yMap, rect]);

  if (width < 80 || height < 60 || n === 0) return <svg ref={svg} width={width} height={height} />;
  const cx = cursor === null ? NaN : toPixel(xMap, cursor);
  const zeroY = toPixel(yMap, 0);
  return (
    <svg
      ref={svg}
      className="pw-chart"
      width={width}
      height={height}
      role="group"
      aria-label="Input and output against time"
      data-span={zoomed ? `${s0} ${s1}` : 'all'}
    >
      <PlotFrame
        rect={rect}
        clipId={clipId}
        x={{ map: xMap, ticks: xTicks }}
        y={{ map: yMap, ticks: yTicks }}
        zeroY={zeroY}
      />
      <g clipPath={`url(#${clipId})`}>
        <g className="pw-time-input" data-testid="time-input-trace">
          <path d={inputPaths.line} />
          {inputPaths.dots ? <path className="pw-dots" d={inputPaths.dots} /> : null}
        </g>
        <g className="pw-time-output" data-testid="time-output-trace" data-style={style}>
          <path d={outputPaths.line} />
          {outputPaths.dots ? <path className="pw-dots" d={outputPaths.dots} /> : null}
        </g>
        <ReferenceTimeTrace px={px} yMap={yMap} rect={rect} />
        {envelopePaths ? (
          <path className="pw-time-envelope" data-testid="time-envelope" d={envelopePaths} />
        ) : null}
      </g>
      {s0 <= 0 ? <OffScaleNote x={toPixel(xMap, 0)} value={y[0]} range={range} rect={rect} /> : null}
      <Axis side="left" map={yMap} ticks={yTicks} at={rect.left} title="Amplitude" />
      <Axis side="bottom" map={xMap} ticks={xTicks} at={rect.bottom} title="Sample n" />
      <Axis
        side="top"
        map={seconds.map}
        ticks={seconds.ticks}
        at={rect.top}
        title={`Time (${seconds.unit})`}
      />
      {cursor !== null ? (
        <SampleCrosshair x={cx} yMap={yMap} input={x[cursor] ?? 0} output={y[cursor] ?? 0} rect={rect} />
      ) : null}
      {zoom.band ? (
        <rect
          className="pw-zoom-band"
          data-testid="zoom-band"
          x={zoom.band[0]}
          y={rect.top}
          width={zoom.band[1] - zoom.band[0]}
          height={rect.bottom - rect.top}
        />
      ) : null}
      <CursorArea
        rect={rect}
        label="Sample under the cross-hair"
        min={0}
        max={n - 1}
        value={cursor}
        valueText={cursor === null ? 'off' : `sample ${cursor}`}
        valueAt={(px) =>
          Math.min(
            Math.floor(s1 + 0.5),
            n - 1,
            Math.max(Math.ceil(s0 - 0.5), 0, Math.round(fromPixel(xMap, px))),
          )
        }
        keyTarget={(key, shift, from) => sampleAfterKey(key, shift, from, n)}
        start={Math.max(0, Math.ceil(s0))}
        onChange={onCursor}
        zoom={zoom}
      />
    </svg>
  );
}
