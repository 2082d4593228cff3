/**
 * The parser of typed systems (core/parse, through readEntry.ts) is not needed to draw the first view: it
 * loads when the entry is first applied, and prefetch.ts fetches it right after the first paint, so Apply
 * normally finds it there.
 */
let loading: Promise<typeof import('./readEntry.ts')> | null = null;

/** Loads the entry reader (once; a failed load may be retried). */
export function loadEntryReader(): Promise<typeof import('./readEntry.ts')> {
  return (loading ??= import('./readEntry.ts').catch((e: unknown) => {
    loading = null;
    throw e;
  }));
}
