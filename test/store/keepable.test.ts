/**
 * Nothing the page accepts is lost: any design the workbench can be driven to (root edits, typed entries,
 * designers, masks, settings, undo and redo, in any order and with hostile values) is one its own file, link
 * and autosaved session carry and give back bit for bit, and a reload brings back the design and its undo
 * history. Edits that would break a bound are refused before they are applied.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import type { Design } from '../../src/core/model/design.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { MAX_ORDER } from '../../src/core/model/limits.ts';
import { readSharedFile, writeSharedFile } from '../../src/share/designFile.ts';
import { decodeLink, encodeLink } from '../../src/share/link/index.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import { noticeStore } from '../../src/store/notices.ts';
import { installPersistence, type PersistEnv } from '../../src/store/persist.ts';
import { createWorkbenchStore, type WorkbenchStore } from '../../src/store/store.ts';
import { readEntry } from '../../src/views/side/entry/readEntry.ts';
import { anyFinite, bitwiseDifference } from '../share/arbitraries.ts';

type Action = (store: WorkbenchStore) => void;

const kind = fc.constantFrom('zero' as const, 'pole' as const);
const index = fc.nat({ max: 6 });
const multiplicity = fc.oneof(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: MAX_ORDER + 10 }));
const coordinate = fc.oneof(fc.double({ min: -1.5, max: 1.5, noNaN: true }), anyFinite);
const hostileText = fc.string({ unit: 'binary', maxLength: 260 });

/** Text as a user might type or paste it: FIRs around the longest, root lists, equations, padding. */
const entryText = fc.oneof(
  fc
    .record({
      n: fc.oneof(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1000, max: 1100 })),
      seed: fc.nat(),
    })
    .map(({ n, seed }) =>
      Array.from({ length: n }, (_, i) => String(Math.sin(seed + i * 1.7) / 3)).join(', '),
    ),
  fc
    .record({ z: fc.integer({ min: 1, max: 1100 }), p: fc.integer({ min: 1, max: 1100 }) })
    .map(({ z, p }) => `zeros: -1 x${Math.min(z, 1024)}; poles: 0.5 x${Math.min(p, 1024)}`),
  fc.integer({ min: 1, max: 1100 }).map((k) => `y[n] = x[n] + 0.25 y[n-${k}]`),
  fc.integer({ min: 0, max: 140_000 }).map((pad) => `b = [1, -1]${' '.repeat(pad)}`),
);

const designer: fc.Arbitrary<DesignerSpec> = fc.oneof(
  fc
    .record({ n: fc.integer({ min: 2, max: 2100 }), q: fc.double({ min: 1, max: 100, noNaN: true }) })
    .map(({ n, q }): DesignerSpec => ({ kind: 'comb', fs: 48_000, f0: 48_000 / n, type: 'notch', q })),
  fc
    .record({ f0: fc.double({ min: 1, max: 900, noNaN: true }), n: fc.integer({ min: 1, max: 70 }) })
    .map(({ f0, n }): DesignerSpec => ({
      kind: 'harmonicNotch',
      fs: 2000,
      f0,
      harmonics: Array.from({ length: n }, (_, i) => i + 1),
      bandwidthHz: 0.5,
    })),
  fc
    .record({ order: fc.integer({ min: 1, max: 70 }), fs: fc.oneof(fc.constant(1000), anyFinite) })
    .map(({ order, fs }): DesignerSpec => ({
      kind: 'iir',
      fs,
      family: 'butterworth',
      response: 'lowpass',
      order,
      edgesHz: [100],
    })),
  fc
    .record({ fs: anyFinite, f0: anyFinite, q: anyFinite })
    .map((p): DesignerSpec => ({ kind: 'notch', ...p })),
);

const action: fc.Arbitrary<Action> = fc.oneof(
  fc.tuple(kind, coordinate, coordinate, multiplicity).map(
    ([k, re, im, m]): Action =>
      (s) =>
        s.getState().addRoot(k, { re, im, multiplicity: m }),
  ),
  fc.tuple(kind, index, multiplicity).map(
    ([k, i, m]): Action =>
      (s) =>
        s.getState().setMultiplicity({ kind: k, index: i }, m),
  ),
  fc.tuple(kind, index).map(
    ([k, i]): Action =>
      (s) =>
        s.getState().joinPair({ kind: k, index: i }),
  ),
  fc.tuple(kind, index).map(
    ([k, i]): Action =>
      (s) =>
        s.getState().splitRoot({ kind: k, index: i }),
  ),
  fc.tuple(kind, index).map(
    ([k, i]): Action =>
      (s) =>
        s.getState().deleteRoot({ kind: k, index: i }),
  ),
  fc.tuple(kind, index, coordinate, coordinate).map(([k, i, re, im]): Action => (s) => {
    s.getState().beginGesture();
    s.getState().moveRoot({ kind: k, index: i }, re, im);
    s.getState().endGesture();
  }),
  entryText.map((text): Action => (s) => {
    const r = readEntry(text);
    if (r.ok) s.getState().loadTyped(r.value.zeros, r.value.poles, r.value.gain, r.value.typed);
  }),
  hostileText.map(
    (name): Action =>
      (s) =>
        s.getState().setName(name),
  ),
  designer.map(
    (spec): Action =>
      (s) =>
        void s.getState().runDesigner(spec, 'replace'),
  ),
  fc
    .record({
      kind: fc.constantFrom('pass' as const, 'stop' as const, 'band' as const),
      fromHz: coordinate,
      toHz: coordinate,
      upperDb: coordinate,
      lowerDb: coordinate,
      label: hostileText,
    })
    .map(
      (r): Action =>
        (s) =>
          void s.getState().addRegion(r),
    ),
  fc.oneof(anyFinite, fc.constantFrom(1e9, 1.1e9, 0.5)).map(
    (hz): Action =>
      (s) =>
        s.getState().setSampleRate(hz),
  ),
  anyFinite.map(
    (value): Action =>
      (s) =>
        s.getState().setGainRule({ kind: 'fixed', value }),
  ),
  fc.integer({ min: 4, max: 40 }).map(
    (w): Action =>
      (s) =>
        void s.getState().setImplementation({ wordLength: w }),
  ),
  fc.constant((s: WorkbenchStore) => s.getState().undo()),
  fc.constant((s: WorkbenchStore) => s.getState().redo()),
);

/** A fake page whose timers run at once when told. */
function page(storage: ReturnType<typeof memoryStorage>, tab: string): PersistEnv & { run(): void } {
  let pending: (() => void)[] = [];
  let id: string | null = tab;
  return {
    storage,
    hash: () => '',
    listen: () => () => {},
    tabId: () => id,
    setTabId: (t) => void (id = t),
    timers: { set: (fn) => pending.push(fn), clear: () => (pending = []), now: () => 0 },
    warn: () => {},
    run: () => pending.splice(0).forEach((f) => f()),
  };
}

function roundTrips(design: Design, where: string): void {
  const file = readSharedFile(writeSharedFile({ design, view: {} }));
  if (!file.ok) throw new Error(`${where}: the file does not reopen: ${file.message}`);
  const fd = bitwiseDifference(file.value.design, design);
  if (fd) throw new Error(`${where}: the file changed it: ${fd}`);
  const link = decodeLink(encodeLink({ design, view: {} }));
  if (!link.ok) throw new Error(`${where}: the link does not reopen: ${link.message}`);
  const ld = bitwiseDifference(link.value.design, design);
  if (ld) throw new Error(`${where}: the link changed it: ${ld}`);
}

describe('any design the page can hold survives file, link and reload', () => {
  it('after random edits', () => {
    fc.assert(
      fc.property(fc.array(action, { minLength: 1, maxLength: 8 }), (actions) => {
        noticeStore.setState({ notices: [] });
        const storage = memoryStorage();
        const env = page(storage, 'tab');
        const store = createWorkbenchStore(emptyDesign(1000));
        const off = installPersistence(store, env);
        for (const act of actions) act(store);
        env.run();
        off();
        const { design, history } = store.getState();
        roundTrips(design, 'design');
        history.past.forEach((d, i) => roundTrips(d, `undo step ${i}`));
        history.future.forEach((d, i) => roundTrips(d, `redo step ${i}`));
        // A reload of the tab: the same design and the same undo and redo steps.
        const again = createWorkbenchStore(emptyDesign(1));
        installPersistence(again, page(storage, 'tab'));
        expect(bitwiseDifference(again.getState().design, design)).toBeNull();
        expect(bitwiseDifference(again.getState().history.past, history.past)).toBeNull();
        expect(bitwiseDifference(again.getState().history.future, history.future)).toBeNull();
        // Nothing was reported as unsaved.
        expect(noticeStore.getState().notices.filter((n) => n.key === 'autosave')).toEqual([]);
      }),
      { seed: 18_001, numRuns: 150 },
    );
  }, 120_000);
});
