/** Moving the time cross-hair by keyboard: one sample per arrow, ten with Shift, a twentieth of N per page. */

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
    ArrowRight: at + step,
    ArrowUp: at + step,
    ArrowLeft: at - step,
    ArrowDown: at - step,
    PageUp: at + page,
    PageDown: at - page,
    Home: 0,
    End: n - 1,
  };
  const to = moves[key];
  return to === undefined ? undefined : Math.min(n - 1, Math.max(0, to));
}
