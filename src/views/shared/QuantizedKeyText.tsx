/**
 * A line of the quantized filter's keys, on the plane (top left) and on the magnitude plot (bottom left): 11 px
 * raspberry text with a white halo so it reads over grid lines and curves.
 */
import type { ReactNode } from 'react';

export function QuantizedKeyText({
  x,
  y,
  children,
  testId,
}: {
  x: number;
  y: number;
  children: ReactNode;
  testId?: string | undefined;
}) {
  return (
    <text
      x={x}
      y={y}
      fill="var(--pw-quantized)"
      fontSize={11}
      stroke="#fff"
      strokeWidth={3}
      paintOrder="stroke"
      data-testid={testId}
    >
      {children}
    </text>
  );
}
