/** Moving the time cross-hair by keyboard (the cursor shortcuts): one sample per step, ten with Shift, a twentieth of N per page. */
import { shortcutAction } from '../shortcuts.ts';

/** The sample index after pressing `key` at `from` (null: none yet) among n samples; undefined for other keys. */
export function sampleAfterKey(
  key: string,
  shift: boolean,
  from: number | null,
  n: number,
): number | undefined {
  const at = from ?? 0;
  const step = shift ? 10 : 1;
  const page = Math.max(10, Math.round(n / 20));
  const moves: Record<string, number> = {
    'cursor-forward': at + step,
    'cursor-back': at - step,
    'cursor-page-forward': at + page,
    'cursor-page-back': at - page,
    'cursor-first': 0,
    'cursor-last': n - 1,
  };
  const action = shortcutAction('cursor', { key, shiftKey: shift });
  const to = action === null ? undefined : moves[action];
  return to === undefined ? undefined : Math.min(n - 1, Math.max(0, to));
}
