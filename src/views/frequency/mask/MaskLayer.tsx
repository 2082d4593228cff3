/**
 * The requirement mask in the magnitude plot (an overlay, no pointer events): hatched forbidden zones
 * beyond each region's limits, the limit lines, failing regions in the danger colour with their worst
 * point marked, and the tightest point marked when everything passes.
 */
import { useId, useMemo } from 'react';
import { selectMaskResult } from '../../../store/derived.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { toPixel } from '../../chart/pixels.ts';
import { formatHz, formatSignedDb } from '../../shared/format.ts';
import type { MagnitudeOverlayProps } from '../overlays.ts';
import { levelToY, regionShapes } from './maskGeometry.ts';
import './mask.css';

/** Depth of the hatched strip along a limit line, on its forbidden side, px. */
const HATCH_PX = 14;
/** A limit line this far above the plot's top is still drawn, on the top edge, px. */
const EDGE_PX = 4;

export function MaskLayer({ rect, xMap, yMap, db }: MagnitudeOverlayProps) {
  const mask = useWorkbench((s) => s.design.mask);
  const result = useWorkbench(selectMaskResult);
  const uid = useId().replace(/:/g, '');
  const shapes = useMemo(
    () => (mask ? regionShapes(mask.regions, xMap, yMap, db, rect) : []),
    [mask, xMap, yMap, db, rect],
  );
  if (!mask || !result || shapes.length === 0) return null;
  const verdict = new Map(result.regions.map((r) => [r.id, r]));
  const marks = result.regions.filter((r) => (result.pass ? r.id === result.worstRegionId : !r.pass));
  return (
    <g className="pw-mask" data-testid="mask-layer" data-pass={result.pass}>
      <defs>
        {(['ok', 'fail'] as const).map((tone) => (
          <pattern
            key={tone}
            id={`${uid}-${tone}`}
            width={6}
            height={6}
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <line x1={0} y1={0} x2={0} y2={6} className={`pw-mask-hatch-${tone}`} />
          </pattern>
        ))}
      </defs>
      {shapes.map((s) => {
        const v = verdict.get(s.id);
        const fail = v?.pass === false;
        return (
          <g key={s.id} className="pw-mask-region" data-region={s.id} data-pass={!fail}>
            {s.limits.map((l) => {
              // Only the limit that is broken turns red; the region's other limit stays neutral.
              const broken = fail && v.limit === (l.edge === 'upperDb' ? 'upper' : 'lower');
              const tone = broken ? 'fail' : 'ok';
              return (
                <g key={l.edge} className={`pw-mask-${tone}`}>
                  {l.zoneBottom > l.zoneTop && (
                    <>
                      <rect
                        className="pw-mask-zone"
                        x={s.x0}
                        y={l.zoneTop}
                        width={s.x1 - s.x0}
                        height={l.zoneBottom - l.zoneTop}
                      />
                      <rect
                        x={s.x0}
                        y={l.edge === 'upperDb' ? Math.max(l.zoneTop, l.zoneBottom - HATCH_PX) : l.zoneTop}
                        width={s.x1 - s.x0}
                        height={Math.min(HATCH_PX, l.zoneBottom - l.zoneTop)}
                        fill={`url(#${uid}-${tone})`}
                      />
                    </>
                  )}
                  {/* A limit just above the top (within the axis' edge allowance) is drawn on the edge. */}
                  {l.y >= rect.top - EDGE_PX && l.y <= rect.bottom && (
                    <line
                      className="pw-mask-limit"
                      x1={s.x0}
                      x2={s.x1}
                      y1={Math.max(l.y, rect.top)}
                      y2={Math.max(l.y, rect.top)}
                    />
                  )}
                </g>
              );
            })}
          </g>
        );
      })}
      {marks.map((r) => {
        const x = toPixel(xMap, r.worstAtHz);
        const y = levelToY(yMap, r.worstDb, db);
        if (!Number.isFinite(x) || !Number.isFinite(y)) return null;
        const cy = Math.min(rect.bottom - 4, Math.max(rect.top + 4, y));
        const right = x < (rect.left + rect.right) / 2;
        const text = formatSignedDb(r.worstMarginDb, 3);
        // Only the worst region's margin is written beside its point, so labels never overlap; the other
        // failing points carry theirs as a tooltip, and the Design tab lists every region's verdict.
        const labelled = r.id === result.worstRegionId;
        return (
          <g
            key={r.id}
            className={`pw-mask-worst ${r.pass ? 'pw-mask-ok' : 'pw-mask-fail'}`}
            data-testid={`mask-worst-${r.id}`}
          >
            <circle cx={x} cy={cy} r={labelled ? 4.5 : 3.5}>
              {!labelled && <title>{`${r.id}: ${text} at ${formatHz(r.worstAtHz)}`}</title>}
            </circle>
            {labelled && (
              <text
                x={right ? x + 8 : x - 8}
                y={cy - 6 < rect.top + 12 ? cy + 16 : cy - 6}
                textAnchor={right ? 'start' : 'end'}
              >
                {text}
              </text>
            )}
          </g>
        );
      })}
    </g>
  );
}
