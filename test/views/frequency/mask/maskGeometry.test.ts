import { describe, expect, it } from 'vitest';
import type { AxisMap } from '../../../../src/views/chart/pixels.ts';
import {
  MIN_REGION_PX,
  draggedValue,
  levelToY,
  regionShapes,
  roundToPixel,
  yToLevel,
} from '../../../../src/views/frequency/mask/maskGeometry.ts';
import { expectClose } from '../../../helpers/expectClose.ts';

const rect = { left: 50, right: 550, top: 20, bottom: 220 };
const xLin: AxisMap = { kind: 'linear', d0: 0, d1: 1000, p0: 50, p1: 550 };
const xLog: AxisMap = { kind: 'log', d0: 1, d1: 1000, p0: 50, p1: 550 };
const yDb: AxisMap = { kind: 'linear', d0: -100, d1: 0, p0: 220, p1: 20 };
const yLin: AxisMap = { kind: 'linear', d0: 0, d1: 1, p0: 220, p1: 20 };

describe('levelToY / yToLevel', () => {
  it('place dB levels on a dB axis and on a linear magnitude axis, and invert each other', () => {
    expect(levelToY(yDb, -50, true)).toBe(120);
    expectClose(levelToY(yLin, -6.0206, false), 120, { abs: 1e-3 }); // −6.02 dB is half the magnitude
    for (const db of [-40, -3, 0])
      for (const [map, isDb] of [
        [yDb, true],
        [yLin, false],
      ] as const)
        expectClose(yToLevel(map, levelToY(map, db, isDb), isDb), db, { abs: 1e-9 });
    expect(yToLevel(yLin, 220, false)).toBe(-Infinity);
  });
});

describe('regionShapes', () => {
  it('shades above an upper limit and below a lower one, clamped to the plot', () => {
    const [stop, pass] = regionShapes(
      [
        { id: 's', kind: 'stop', fromHz: 400, toHz: 500, upperDb: -60 },
        { id: 'p', kind: 'pass', fromHz: 0, toHz: 100, lowerDb: -1, upperDb: 20 },
      ],
      xLin,
      yDb,
      true,
      rect,
    );
    expect([stop!.x0, stop!.x1]).toEqual([250, 300]);
    expect(stop!.limits).toEqual([{ edge: 'upperDb', y: 140, zoneTop: 20, zoneBottom: 140 }]);
    const upper = pass!.limits.find((l) => l.edge === 'upperDb')!;
    expect(upper.zoneBottom).toBe(20); // +20 dB is above the axis: nothing to shade
    const lower = pass!.limits.find((l) => l.edge === 'lowerDb')!;
    expect([lower.zoneTop, lower.zoneBottom]).toEqual([22, 220]);
  });

  it('keeps a very narrow region visible and hides a 0 Hz edge on a log axis', () => {
    const [r] = regionShapes(
      [{ id: 'n', kind: 'stop', fromHz: 0, toHz: 1.001, upperDb: -20 }],
      xLog,
      yDb,
      true,
      rect,
    );
    expect(r!.x0Visible).toBe(false);
    expect(r!.x1Visible).toBe(true);
    expect(r!.x1 - r!.x0).toBeCloseTo(MIN_REGION_PX, 9);
  });
});

describe('roundToPixel / draggedValue', () => {
  it('round to the power of ten a pixel can resolve', () => {
    expect(roundToPixel(118.3724, 2)).toBe(118);
    expect(roundToPixel(118.3724, 0.2)).toBe(118.4);
    expect(roundToPixel(-40.123, 0.5)).toBe(-40.1);
    expect(roundToPixel(0.30000000000000004, 0.01)).toBe(0.3);
  });

  it('turn a pixel into Hz on either axis and into dB on either magnitude scale', () => {
    expect(draggedValue('fromHz', 300, xLin, yDb, true)).toBe(500);
    expect(draggedValue('toHz', 300, xLog, yDb, true)).toBeCloseTo(31.6, 9); // 10^1.5, rounded to 0.1 Hz
    expect(draggedValue('upperDb', 120, xLin, yDb, true)).toBe(-50);
    expect(draggedValue('lowerDb', 120, xLin, yLin, false)).toBeCloseTo(-6.02, 9);
  });
});
