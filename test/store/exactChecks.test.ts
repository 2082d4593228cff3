/**
 * The exact checks (the stability verdict, the check of multiplied-out coefficients, the error bounds of
 * typed roots) load after the page's first paint (store/exactChecks.ts). Until they arrive the store gives
 * no verdict at all, never "stable"; then the exact verdict replaces "checking" in every store.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { EXACT_CHECKS } from '../../src/core/stability/exactChecks.ts';
import { exactChecks, installExactChecks } from '../../src/core/stability/exactChecksSlot.ts';
import { selectExpandedCheck, selectStability, selectTypedDiagnostics } from '../../src/store/derived.ts';
import type { WorkbenchStore } from '../../src/store/store.ts';

/** The exact checks' import, held until the test lets it arrive (or fail). */
const gate = await vi.hoisted(async () => (await import('../helpers/importGate.ts')).importGate());
vi.mock('../../src/store/exactChecksImport.ts', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/store/exactChecksImport.ts')>();
  return { importExactChecks: gate.gated(real.importExactChecks) };
});
const { loadExactChecks } = await import('../../src/store/exactChecks.ts');

/** A pole at 1 + 2^-40: outside the unit circle, yet within the 1e-9 that the roots alone count as "on it". */
const JUST_OUTSIDE = 1 + 2 ** -40;

/** Every verdict the store gives from now on (null while checking), in order. */
function recordVerdicts(store: WorkbenchStore): (string | null)[] {
  const seen: (string | null)[] = [selectStability(store.getState())?.verdict ?? null];
  store.subscribe((s) => seen.push(selectStability(s)?.verdict ?? null));
  return seen;
}

function typedJustOutside(store: WorkbenchStore): void {
  const problem = store.getState().loadTyped([], [{ re: JUST_OUTSIDE, im: 0, multiplicity: 1 }], 1, {
    b: [1],
    a: [1, -JUST_OUTSIDE],
    text: `b = [1]\na = [1, -${JUST_OUTSIDE}]`,
  });
  expect(problem).toBeNull();
}

describe('the exact checks arriving after the first view', () => {
  beforeEach(() => {
    gate.hold();
    gate.imports = 0;
    installExactChecks(null); // as on the page before their chunk came
  });
  afterEach(() => installExactChecks(EXACT_CHECKS));

  it('the store says "checking" and never "stable" while they are held back, then gives the exact verdict', async () => {
    const demo = createWorkbenchStore(demoDesign()); // a stable design from its roots
    const typed = createWorkbenchStore(demoDesign());
    typedJustOutside(typed);
    const demoSeen = recordVerdicts(demo);
    const typedSeen = recordVerdicts(typed);
    expect(demo.getState().exactChecks).toEqual({ state: 'checking' });
    const loading = loadExactChecks();
    // Edits while the checks are on their way: still no verdict (a drag, a typed system).
    demo.getState().moveRoot({ kind: 'pole', index: 0 }, 0.5, 0.3);
    await new Promise((r) => setTimeout(r, 20));
    expect(selectStability(demo.getState())).toBeNull();
    expect(selectStability(typed.getState())).toBeNull();
    expect(selectExpandedCheck(demo.getState())).toBeNull();
    expect(selectTypedDiagnostics(typed.getState())).toBeNull();
    expect(demoSeen.every((v) => v === null)).toBe(true);
    gate.arrive();
    await loading;
    expect(exactChecks()).not.toBeNull();
    expect(demo.getState().exactChecks).toEqual({ state: 'ready' });
    // a pole pair at radius |0.5 + 0.3j| < 1 and the demo's other poles inside: stable
    expect(demoSeen.filter((v) => v !== null)).toEqual(['stable']);
    expect(selectExpandedCheck(demo.getState())).not.toBeNull();
    // The typed pole at 1 + 2^-40 lies outside the circle: the exact test says so where the roots could not.
    const s = selectStability(typed.getState());
    expect(s).toMatchObject({ verdict: 'unstable', decidedBy: 'coefficients', rootsSuggested: 'marginal' });
    expect(typedSeen).toEqual([null, 'unstable']);
    expect(selectTypedDiagnostics(typed.getState())?.source).toBe('typed');
    expect(gate.imports).toBe(1);
  });

  it('when they cannot be fetched the store says so and still gives no verdict; trying again brings it', async () => {
    const store = createWorkbenchStore(demoDesign());
    const seen = recordVerdicts(store);
    const first = loadExactChecks();
    gate.fail();
    await expect(first).rejects.toThrow(/Failed to fetch/);
    expect(store.getState().exactChecks).toMatchObject({ state: 'failed', message: /Failed to fetch/ });
    expect(selectStability(store.getState())).toBeNull();
    gate.hold();
    const again = loadExactChecks();
    expect(store.getState().exactChecks).toEqual({ state: 'checking' });
    gate.arrive();
    await again;
    expect(store.getState().exactChecks).toEqual({ state: 'ready' });
    expect(seen.filter((v) => v !== null)).toEqual(['stable']);
    expect(gate.imports).toBe(2);
  });
});
