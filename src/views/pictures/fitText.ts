/** Shortening text to a width, for pictures and for labels drawn in the views (no picture code needed). */

/** Text shortened with an ellipsis to at most `room` px at `charPx` per character. */
export function fitText(text: string, room: number, charPx: number): string {
  const max = Math.max(8, Math.floor(room / charPx));
  const chars = Array.from(text);
  return chars.length <= max
    ? text
    : `${chars
        .slice(0, max - 1)
        .join('')
        .trimEnd()}…`;
}
