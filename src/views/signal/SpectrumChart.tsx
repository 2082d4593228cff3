/**
 * The recording's spectrum before (faint) and after (bold) the filter, as tone levels in dB re amplitude 1
 * (dBFS for audio), with the design's |H| dashed on its own axis at the right (0 dB = passes unchanged), and
 * thin marks at the read-out frequencies.
 */
import { memo, useId, useMemo, useRef } from 'react';
import type { FrequencyResponse } from '../../core/response/index.ts';
import type { WelchResult } from '../../core/signal/index.ts';
import { Axis } from '../chart/Axis.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import { linePath } from '../chart/paths.ts';
import { toPixel, toPixels, type AxisMap } from '../chart/pixels.ts';
import { dbRange, niceRange, type Range } from '../chart/range.ts';
import { linearTicks, logTicks, spacedTicks } from '../chart/ticks.ts';

/** Deepest level shown below the highest, dB. */
export const SPECTRUM_DEPTH_DB = 120;
/** Lowest frequency of the log axis as a fraction of the sample rate. */
export const SPECTRUM_LOG_MIN_FRACTION = 1e-4;

/** Tone level per bin, dB re amplitude 1: 10·log10(2·P) for a 'spectrum'-scaled estimate. */
export function binLevels(spec: WelchResult): Float64Array {
  const out = new Float64Array(spec.power.length);
  for (let k = 0; k < out.length; k++) {
    const p = spec.power[k]!;
    out[k] = p > 0 ? 10 * Math.log10(2 * p) : -Infinity;
  }
  return out;
}

export interface SpectrumChartProps {
  width: number;
  height: number;
  before: WelchResult;
  after: WelchResult | null;
  /** The design's response on its own grid of angles (radians per sample), drawn at the recording's rate. */
  response: FrequencyResponse | null;
  markersHz: readonly number[];
  log: boolean;
  /** True while `after` is the input's estimate shaped by |H|² rather than the filtered recording's own. */
  afterShaped: boolean;
}

export function spectrumLayout(width: number, height: number) {
  return { left: 52, right: Math.max(53, width - 44), top: 10, bottom: Math.max(11, height - 34) };
}

/**
 * Drawn again only when its inputs change (not with every progress line of the view around it): the paths
 * over every bin are the page's largest piece of work when a spectrum arrives.
 */
export const SpectrumChart = memo(function SpectrumChart({
  width,
  height,
  before,
  after,
  response,
  markersHz,
  log,
  afterShaped,
}: SpectrumChartProps) {
  const clipId = `pw-spclip-${useId().replace(/:/g, '')}`;
  const rect = useMemo(() => spectrumLayout(width, height), [width, height]);
  const fs = before.sampleRate;
  const fMin = log ? Math.max(before.binWidthHz, fs * SPECTRUM_LOG_MIN_FRACTION) : 0;
  const xMap = useMemo<AxisMap>(
    () => ({ kind: log ? 'log' : 'linear', d0: fMin, d1: fs / 2, p0: rect.left, p1: rect.right }),
    [log, fMin, fs, rect.left, rect.right],
  );
  const xTicks = useMemo(
    () => (log ? logTicks(fMin, fs / 2) : linearTicks(0, fs / 2, Math.max(2, (rect.right - rect.left) / 70))),
    [log, fMin, fs, rect.left, rect.right],
  );
  const levelsBefore = useMemo(() => binLevels(before), [before]);
  const levelsAfter = useMemo(() => (after ? binLevels(after) : null), [after]);
  // The same range by value keeps the axis map (and the path of the spectrum before) when only "after" changed.
  const lastRange = useRef<Range | null>(null);
  const range = useMemo(() => {
    let top = -Infinity;
    for (const v of levelsBefore) if (v > top) top = v;
    if (levelsAfter) for (const v of levelsAfter) if (v > top) top = v;
    if (!Number.isFinite(top)) top = 0;
    let low = Infinity;
    for (const v of levelsBefore) if (v < low && v > -Infinity) low = v;
    const r = niceRange(Math.max(low, top - SPECTRUM_DEPTH_DB), top, 20, 5);
    const held = lastRange.current;
    return held && held[0] === r[0] && held[1] === r[1] ? held : r;
  }, [levelsBefore, levelsAfter]);
  lastRange.current = range;
  const yMap = useMemo<AxisMap>(
    () => ({ kind: 'linear', d0: range[0], d1: range[1], p0: rect.bottom, p1: rect.top }),
    [range, rect],
  );
  const yTicks = useMemo(() => spacedTicks(range[0], range[1], rect.bottom - rect.top, 28), [range, rect]);
  const hRange = useMemo(() => (response ? dbRange(response.magnitudeDb) : null), [response]);
  const hMap = useMemo<AxisMap | null>(
    () => (hRange ? { kind: 'linear', d0: hRange[0], d1: hRange[1], p0: rect.bottom, p1: rect.top } : null),
    [hRange, rect],
  );
  const hTicks = useMemo(
    () => (hRange ? spacedTicks(hRange[0], hRange[1], rect.bottom - rect.top, 28) : []),
    [hRange, rect],
  );

  const px = useMemo(() => toPixels(xMap, before.frequencies), [xMap, before]);
  const hx = useMemo(
    () => (response ? toPixels(xMap, response.omega, fs / (2 * Math.PI)) : null),
    [xMap, response, fs],
  );
  const line = (x: Float64Array, values: Float64Array, map: AxisMap) =>
    linePath(x, toPixels(map, values), { top: rect.top, bottom: rect.bottom, thin: true });
  const beforePath = useMemo(() => line(px, levelsBefore, yMap), [levelsBefore, yMap, px]); // eslint-disable-line react-hooks/exhaustive-deps
  const afterPath = useMemo(() => (levelsAfter ? line(px, levelsAfter, yMap) : ''), [levelsAfter, yMap, px]); // eslint-disable-line react-hooks/exhaustive-deps
  const hPath = useMemo(
    () => (response && hMap && hx ? line(hx, response.magnitudeDb, hMap) : ''),
    [response, hMap, hx], // eslint-disable-line react-hooks/exhaustive-deps
  );

  if (width < 120 || height < 60) return <svg width={width} height={height} />;
  return (
    <svg
      className="pw-chart pw-spectrum-chart"
      width={width}
      height={height}
      role="img"
      aria-label="Spectrum before and after the filter"
    >
      <PlotFrame
        rect={rect}
        clipId={clipId}
        x={{ map: xMap, ticks: xTicks }}
        y={{ map: yMap, ticks: yTicks }}
      />
      <g clipPath={`url(#${clipId})`}>
        {markersHz.map((f) => {
          const x = toPixel(xMap, f);
          return Number.isFinite(x) ? (
            <path
              key={f}
              className="pw-spectrum-marker"
              d={`M${Math.round(x) + 0.5} ${rect.top}V${rect.bottom}`}
            />
          ) : null;
        })}
        <path className="pw-spectrum-before" data-testid="spectrum-before" d={beforePath} />
        {afterPath ? (
          <path
            className={`pw-spectrum-after${afterShaped ? ' pw-estimated' : ''}`}
            data-testid="spectrum-after"
            data-measured={afterShaped ? 'false' : 'true'}
            d={afterPath}
          />
        ) : null}
        {hPath ? <path className="pw-spectrum-response" data-testid="spectrum-response" d={hPath} /> : null}
      </g>
      <Axis side="left" map={yMap} ticks={yTicks} at={rect.left} title="Level (dB re 1)" />
      {hMap ? <Axis side="right" map={hMap} ticks={hTicks} at={rect.right} title="|H| (dB)" /> : null}
      <Axis side="bottom" map={xMap} ticks={xTicks} at={rect.bottom} title="Frequency (Hz)" />
    </svg>
  );
});
