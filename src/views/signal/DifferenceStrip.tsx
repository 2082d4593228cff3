/**
 * The fixed-point output minus the ideal filter's, in output LSBs, on the same time axis as the plot above
 * it (one band per pixel column when the samples are dense).
 */
import { useId, useMemo, useRef } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { Axis } from '../chart/Axis.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import type { AxisMap } from '../chart/pixels.ts';
import { niceRange } from '../chart/range.ts';
import { linearTicks, spacedTicks } from '../chart/ticks.ts';
import { useElementSize } from '../chart/useElementSize.ts';
import { extentOf, tracePath, visibleSamples, type Frame } from './envelope.ts';
import { signalLayout } from './SignalChart.tsx';

/** Height of the strip, px. */
export const STRIP_HEIGHT = 96;

export function DifferenceStrip({ signal, difference }: { signal: LoadedSignal; difference: Float32Array }) {
  const box = useRef<HTMLDivElement>(null);
  const { width } = useElementSize(box);
  const zoom = useWorkbench((s) => s.signal.zoom);
  const clipId = `pw-dclip-${useId().replace(/:/g, '')}`;
  const fs = signal.sampleRate;
  const n = difference.length;
  const [t0, t1] = zoom ?? [0, n / fs];
  const rect = useMemo(
    () => ({ ...signalLayout(width, STRIP_HEIGHT), top: 6, bottom: STRIP_HEIGHT - 6 }),
    [width],
  );
  const [i0, i1] = useMemo(() => {
    const kx = (rect.right - rect.left) / ((t1 - t0) * fs);
    return visibleSamples({ ...rect, x0: rect.left - t0 * fs * kx, kx, y0: 0, ky: 1 }, n);
  }, [rect, t0, t1, fs, n]);
  const range = useMemo(() => {
    const [lo, hi] = extentOf(difference, i0, i1);
    const m = Math.max(Math.abs(lo), Math.abs(hi), 0.5);
    return niceRange(-m, m, 1, 3);
  }, [difference, i0, i1]);
  const frame = useMemo<Frame>(() => {
    const kx = (rect.right - rect.left) / ((t1 - t0) * fs);
    const ky = (rect.bottom - rect.top) / (range[1] - range[0]);
    return { ...rect, x0: rect.left - t0 * fs * kx, kx, y0: rect.bottom + range[0] * ky, ky };
  }, [rect, t0, t1, fs, range]);
  const path = useMemo(() => tracePath(difference, frame), [difference, frame]);
  const xMap: AxisMap = {
    kind: 'linear',
    d0: signal.startTime + t0,
    d1: signal.startTime + t1,
    p0: rect.left,
    p1: rect.right,
  };
  const xTicks = linearTicks(xMap.d0, xMap.d1, Math.max(2, (rect.right - rect.left) / 80));
  const yMap: AxisMap = { kind: 'linear', d0: range[0], d1: range[1], p0: rect.bottom, p1: rect.top };
  const yTicks = spacedTicks(range[0], range[1], rect.bottom - rect.top, 24);
  return (
    <div className="pw-difference-box" ref={box}>
      <span className="pw-signal-legend pw-signal-legend-over">
        <span className="pw-key pw-key-fixed" aria-hidden="true" /> fixed point − ideal filter, output LSB
      </span>
      {width >= 80 ? (
        <svg
          className="pw-chart pw-difference-chart"
          width={width}
          height={STRIP_HEIGHT}
          role="img"
          aria-label="Fixed-point output minus the ideal filter's, in output LSBs"
          data-testid="fixed-difference"
        >
          <PlotFrame
            rect={rect}
            clipId={clipId}
            x={{ map: xMap, ticks: xTicks }}
            y={{ map: yMap, ticks: yTicks }}
            zeroY={frame.y0}
          />
          <g clipPath={`url(#${clipId})`}>
            <path className={`pw-signal-difference${path.band ? ' pw-band' : ''}`} d={path.d} />
          </g>
          <Axis side="left" map={yMap} ticks={yTicks} at={rect.left} title="LSB" />
        </svg>
      ) : null}
    </div>
  );
}
