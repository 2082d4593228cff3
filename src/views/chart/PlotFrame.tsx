/** What every chart draws beneath its curves: the clip rectangle they use, the background, the grid, a zero line. */
import { Grid, type GridProps } from './Grid.tsx';

export interface PlotFrameProps {
  /** The plot rectangle in pixels. */
  rect: Pick<GridProps, 'left' | 'right' | 'top' | 'bottom'>;
  /** Id the chart's curves refer to as `url(#clipId)`; unique per chart. */
  clipId: string;
  x: NonNullable<GridProps['x']>;
  y: NonNullable<GridProps['y']>;
  /** Pixel y of the value 0, for charts of signed samples: a line is drawn there when it lies in the plot. */
  zeroY?: number;
}

/**
 * The clip path reaches a pixel above and below the rectangle so a curve along the top or bottom edge keeps
 * its full stroke.
 */
export function PlotFrame({ rect, clipId, x, y, zeroY }: PlotFrameProps) {
  const { left, right, top, bottom } = rect;
  return (
    <>
      <clipPath id={clipId}>
        <rect x={left} y={top - 1} width={right - left} height={bottom - top + 2} />
      </clipPath>
      <rect className="pw-plot-bg" x={left} y={top} width={right - left} height={bottom - top} />
      <Grid x={x} y={y} left={left} right={right} top={top} bottom={bottom} />
      {zeroY !== undefined && zeroY >= top && zeroY <= bottom ? (
        <path className="pw-plot-zero" d={`M${left} ${Math.round(zeroY) + 0.5}H${right}`} />
      ) : null}
    </>
  );
}
