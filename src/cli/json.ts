/** JSON output for scripts: numbers print round-trip exact; non-finite numbers as the strings "Infinity", "-Infinity", "NaN". */

/** Serialises a value as one JSON object, with typed arrays as plain arrays. */
export function toJson(value: unknown): string {
  return (
    JSON.stringify(value, (_key, v: unknown) => {
      if (ArrayBuffer.isView(v) && !(v instanceof DataView))
        return Array.from(v as unknown as ArrayLike<number>);
      if (typeof v === 'number' && !Number.isFinite(v)) return String(v);
      return v;
    }) + '\n'
  );
}
