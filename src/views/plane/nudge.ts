/** Keyboard nudging of a root: which arrow moves it where, by how much. */

/** Step of one arrow-key press, z units. */
export const NUDGE_STEP = 0.01;
/** Step with Shift or Alt held, z units. */
export const NUDGE_FINE_STEP = 0.001;

/** The displacement an arrow key asks for, or null when the key is not an arrow. */
export function nudgeDelta(key: string, fine: boolean): { dre: number; dim: number } | null {
  const s = fine ? NUDGE_FINE_STEP : NUDGE_STEP;
  switch (key) {
    case 'ArrowLeft':
      return { dre: -s, dim: 0 };
    case 'ArrowRight':
      return { dre: s, dim: 0 };
    case 'ArrowUp':
      return { dre: 0, dim: s };
    case 'ArrowDown':
      return { dre: 0, dim: -s };
    default:
      return null;
  }
}
