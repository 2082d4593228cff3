/**
 * Drag handles for the requirement mask, drawn above the cross-hair area in the frequency chart: a strip
 * over each region edge (drag left/right, Hz) and over each limit line (drag up/down, dB). A drag is one
 * undo step (begin/endGesture around moveRegionEdge, which keeps the region valid). The handles are
 * pointer-only; the Design page's table edits the same numbers from the keyboard.
 */
import { useMemo, useRef, useState, type PointerEvent } from 'react';
import type { RegionEdge } from '../../../core/mask/index.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { fromPixel, type AxisMap } from '../../chart/pixels.ts';
import type { PlotRect } from '../layout.ts';
import { draggedValue, regionShapes, type LimitShape } from './maskGeometry.ts';

/** Thickness of a handle's grab strip, px. */
const GRAB_PX = 8;
/** Height of an edge's grab strip along a limit line (the hatched band's depth, and a little more), px. */
const EDGE_GRAB_PX = 18;

/** The y span of a region edge's grab strip next to one limit: inside the zone, along the line. */
function edgeSpan(l: LimitShape): [number, number] {
  return l.edge === 'upperDb'
    ? [Math.max(l.zoneTop, l.zoneBottom - EDGE_GRAB_PX), l.zoneBottom]
    : [l.zoneTop, Math.min(l.zoneBottom, l.zoneTop + EDGE_GRAB_PX)];
}

export interface MaskHandlesProps {
  rect: PlotRect;
  xMap: AxisMap;
  yMap: AxisMap;
  db: boolean;
  /** Moves the cross-hair: the handles pass the pointer's frequency on, so reading values still works. */
  onHover?: (hz: number | null) => void;
}

interface Drag {
  id: string;
  edge: RegionEdge;
  /** Handle position minus pointer position at the press, px, so the edge does not jump to the pointer. */
  offset: number;
}

const WORDS: Record<RegionEdge, string> = {
  fromHz: 'lower frequency edge',
  toHz: 'upper frequency edge',
  upperDb: 'upper limit',
  lowerDb: 'lower limit',
};

export function MaskHandles({ rect, xMap, yMap, db, onHover }: MaskHandlesProps) {
  const mask = useWorkbench((s) => s.design.mask);
  const drag = useRef<Drag | null>(null);
  const [active, setActive] = useState<string | null>(null);
  const shapes = useMemo(
    () => (mask ? regionShapes(mask.regions, xMap, yMap, db, rect) : []),
    [mask, xMap, yMap, db, rect],
  );
  if (shapes.length === 0) return null;

  const pointer = (e: PointerEvent<SVGRectElement>, horizontal: boolean) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    if (!box) return NaN;
    return horizontal ? e.clientX - box.left : e.clientY - box.top;
  };
  const start = (e: PointerEvent<SVGRectElement>, id: string, edge: RegionEdge, at: number) => {
    if (e.button !== 0) return;
    e.preventDefault();
    e.stopPropagation();
    e.currentTarget.setPointerCapture(e.pointerId);
    const horizontal = edge === 'fromHz' || edge === 'toHz';
    drag.current = { id, edge, offset: at - pointer(e, horizontal) };
    setActive(`${id}:${edge}`);
    workbenchStore.getState().beginGesture();
  };
  const move = (e: PointerEvent<SVGRectElement>) => {
    const x = pointer(e, true);
    const lo = Math.min(xMap.d0, xMap.d1);
    const hi = Math.max(xMap.d0, xMap.d1);
    onHover?.(Math.min(hi, Math.max(lo, fromPixel(xMap, x))));
    const d = drag.current;
    if (!d) return;
    const horizontal = d.edge === 'fromHz' || d.edge === 'toHz';
    const v = draggedValue(d.edge, pointer(e, horizontal) + d.offset, xMap, yMap, db);
    workbenchStore.getState().moveRegionEdge(d.id, d.edge, v);
  };
  const end = () => {
    if (!drag.current) return;
    drag.current = null;
    setActive(null);
    workbenchStore.getState().endGesture();
  };
  const handle = (
    id: string,
    edge: RegionEdge,
    along: string,
    at: number,
    x: number,
    y: number,
    w: number,
    h: number,
  ) => (
    <rect
      key={`${edge}-${along}`}
      className={`pw-mask-handle ${edge.endsWith('Hz') ? 'pw-mask-handle-x' : 'pw-mask-handle-y'}${
        active === `${id}:${edge}` ? ' pw-dragging' : ''
      }`}
      data-region={id}
      data-edge={edge}
      x={x}
      y={y}
      width={Math.max(1, w)}
      height={Math.max(1, h)}
      onPointerDown={(e) => start(e, id, edge, at)}
      onPointerMove={move}
      onPointerUp={end}
      onPointerCancel={end}
      onLostPointerCapture={end}
    >
      <title>{`Drag the ${WORDS[edge]} of region ${id}`}</title>
    </rect>
  );

  return (
    <g className="pw-mask-handles" data-testid="mask-handles" aria-hidden="true">
      {shapes.map((s) => {
        const inPlot = s.limits.filter((l) => l.y >= rect.top - 1 && l.y <= rect.bottom + 1);
        // A narrow region splits its width between its two edge strips; limit strips go on top.
        const narrow = s.x1 - s.x0 < 2 * GRAB_PX;
        const mid = (s.x0 + s.x1) / 2;
        const g = GRAB_PX / 2;
        const inset = narrow ? 0 : g;
        return (
          <g key={s.id}>
            {s.limits.map((l) => {
              // Edge strips cover the hatched band along the limit line, leaving the rest of the plot
              // to the cross-hair.
              const [top, bottom] = edgeSpan(l);
              if (!(bottom > top)) return null;
              return (
                <g key={l.edge}>
                  {s.x0Visible &&
                    handle(
                      s.id,
                      'fromHz',
                      l.edge,
                      s.x0,
                      s.x0 - g,
                      top,
                      narrow ? mid - s.x0 + g : GRAB_PX,
                      bottom - top,
                    )}
                  {s.x1Visible &&
                    handle(
                      s.id,
                      'toHz',
                      l.edge,
                      s.x1,
                      narrow ? mid : s.x1 - g,
                      top,
                      narrow ? s.x1 + g - mid : GRAB_PX,
                      bottom - top,
                    )}
                </g>
              );
            })}
            {inPlot.map((l) =>
              handle(s.id, l.edge, l.edge, l.y, s.x0 + inset, l.y - g, s.x1 - s.x0 - 2 * inset, GRAB_PX),
            )}
          </g>
        );
      })}
    </g>
  );
}
