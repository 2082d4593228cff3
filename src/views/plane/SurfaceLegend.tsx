/** The dB colour key of the |H| shading: one swatch per band, labelled every 20 dB. */
import { SURFACE_BAND_DB, SURFACE_DB_MAX, SURFACE_DB_MIN, surfaceColour } from './surfaceColours.ts';

const BAND_PX = 5;
const LABEL_STEP_DB = 20;

export function SurfaceLegend() {
  const bands: number[] = [];
  for (let d = SURFACE_DB_MAX - SURFACE_BAND_DB; d >= SURFACE_DB_MIN; d -= SURFACE_BAND_DB) bands.push(d);
  const h = bands.length * BAND_PX;
  const labels: number[] = [];
  for (let d = SURFACE_DB_MAX; d >= SURFACE_DB_MIN; d -= LABEL_STEP_DB) labels.push(d);
  return (
    <figure
      className="pw-surface-legend"
      aria-label={`Shading key: |H| from ${SURFACE_DB_MIN} dB to +${SURFACE_DB_MAX} dB`}
    >
      <figcaption>|H| dB</figcaption>
      <svg width={46} height={h + 8} aria-hidden="true">
        {bands.map((d, i) => (
          <rect key={d} x={0} y={4 + i * BAND_PX} width={12} height={BAND_PX} fill={surfaceColour(d + 0.1)} />
        ))}
        <rect x={0} y={4} width={12} height={h} className="pw-legend-frame" />
        {labels.map((level) => (
          <text key={level} x={16} y={4 + ((SURFACE_DB_MAX - level) / SURFACE_BAND_DB) * BAND_PX} dy="0.32em">
            {level > 0 ? `+${level}` : level === 0 ? '0' : `−${-level}`}
          </text>
        ))}
      </svg>
    </figure>
  );
}
