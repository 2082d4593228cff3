/**
 * A held-back dynamic import for tests of what loads after the first paint: the test holds the gate, the
 * store asks for the module (counted in `imports`), and the import arrives or fails when the test says so.
 * Use it from a vi.mock factory through `await vi.hoisted(async () => (await import(...)).importGate())`.
 */
export interface ImportGate {
  /** From now on, imports wait until arrive() or fail(). */
  hold(): void;
  arrive(): void;
  /** The held imports throw what a browser throws when the chunk cannot be fetched. */
  fail(): void;
  /** How many times the import was asked for. */
  imports: number;
  /** Wraps the real import: counts it, waits for the gate, then imports (or throws). */
  gated<T>(real: () => Promise<T>): () => Promise<T>;
}

export function importGate(): ImportGate {
  let open: (ok: boolean) => void = () => {};
  let wait = Promise.resolve(true);
  const gate: ImportGate = {
    hold() {
      wait = new Promise<boolean>((r) => (open = r));
    },
    arrive: () => open(true),
    fail: () => open(false),
    imports: 0,
    gated: (real) => async () => {
      gate.imports++;
      if (!(await wait)) throw new Error('Failed to fetch dynamically imported module');
      return real();
    },
  };
  return gate;
}
