/**
 * The design lives in the address bar: the URL fragment always holds the open design as a link, so a
 * bookmark, a copied address or a reload gives it back, and Back/Forward step through its changes.
 *
 * The rule: every committed change of the design (an edit, an undo, a design opened) adds one browser-history
 * entry; changes that follow within COALESCE_MS of the last entry (a held arrow key, a run of clicks) update
 * that entry instead, so Back goes to where the burst began rather than through each step. A root drag writes
 * nothing while the pointer moves (encoding a link every frame would slow the drag) and adds its one entry on
 * release. A view-only change (a scale, a unit, a zoom) replaces the current entry: the link carries it, but
 * Back does not step through views. Back/Forward then change the fragment, and the page opens the design it
 * holds as one undo step (src/store/persist.ts, on 'hashchange').
 */
import { MAX_LINK_CHARS } from '../share/schema/limits.ts';
import { pickSharedView, SHARED_VIEW_KEYS } from '../core/model/view.ts';
import type { WorkbenchState, WorkbenchStore } from './store.ts';
import { defaultView } from './view.ts';
import { ADDRESS_STATE, loadLinkReader, type LinkReader } from './persist.ts';

/** Changes closer than this to the last history entry join it instead of adding another, ms. */
export const COALESCE_MS = 600;
/** View-only changes (e.g. wheel zooming) reach the address bar at most this often, ms. */
export const VIEW_WRITE_MS = 250;

/** What the address bar needs from the browser; tests pass a fake. */
export interface AddressEnv {
  /** The URL fragment including '#', or ''. */
  hash(): string;
  /** Writes the fragment ('' removes it): a new history entry ('push') or the current one ('replace'). */
  write(hash: string, mode: 'push' | 'replace'): void;
  now(): number;
  setTimeout(fn: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
  /** Calls `fn` when the address changes under the page (Back/Forward, a pasted address). */
  onAddressChange?(fn: () => void): () => void;
}

/** The browser's address bar through history.pushState/replaceState (neither fires 'hashchange'). */
export function browserAddressEnv(): AddressEnv {
  return {
    hash: () => window.location.hash,
    write: (hash, mode) => {
      const url = window.location.pathname + window.location.search + hash;
      if (mode === 'push') window.history.pushState(ADDRESS_STATE, '', url);
      else window.history.replaceState(ADDRESS_STATE, '', url);
    },
    now: () => Date.now(),
    setTimeout: (fn, ms) => window.setTimeout(fn, ms),
    clearTimeout: (h) => window.clearTimeout(h as number),
    onAddressChange: (fn) => {
      window.addEventListener('popstate', fn);
      return () => window.removeEventListener('popstate', fn);
    },
  };
}

/** The fragment ('#pw2.…') of the state's design and the view settings that travel with it. */
export function fragmentOf(
  s: Pick<WorkbenchState, 'design' | 'view'>,
  { encodeLink }: Pick<LinkReader, 'encodeLink'>,
): string {
  const text = encodeLink({ design: s.design, view: pickSharedView(s.view, defaultView) });
  // A design too large for a link is kept by the autosave only: no fragment rather than one that fails.
  return text.length + 1 > MAX_LINK_CHARS ? '' : `#${text}`;
}

function sameSharedView(a: WorkbenchState['view'], b: WorkbenchState['view']): boolean {
  return SHARED_VIEW_KEYS.every((k) => Object.is(a[k], b[k]));
}

/**
 * Keeps the fragment in step with the store from now on; the fragment already there (a link the page has
 * just opened, or none) is rewritten for the current design without a new entry, unless it is a link that
 * could not be opened. The link codec is not in the first view: the address bar starts once it has loaded.
 * Returns the unsubscriber; `ready` settles when the address bar has started.
 */
export function installAddressBar(
  store: WorkbenchStore,
  env: AddressEnv,
  reader: Promise<LinkReader> = loadLinkReader(),
): (() => void) & { ready: Promise<void> } {
  let shown = store.getState();
  let lastEntry = -Infinity;
  let pending: unknown = null;
  let codec: LinkReader | null = null;
  let stopped = false;
  /** The address changed under the page: the design it brings is already there, not a new entry. */
  let fromAddress = false;
  // 'popstate' comes before the 'hashchange' on which the page opens the design the address holds.
  const offAddress = env.onAddressChange?.(() => {
    fromAddress = true;
    env.setTimeout(() => (fromAddress = false), 0);
  });

  const write = (mode: 'push' | 'replace') => {
    if (pending !== null) env.clearTimeout(pending);
    pending = null;
    if (!codec) return;
    const s = store.getState();
    shown = s;
    const hash = fragmentOf(s, codec);
    // A design that came from the address bar (a link, Back/Forward) is already there.
    if (hash === env.hash()) return;
    const now = env.now();
    if (mode === 'push' && now - lastEntry < COALESCE_MS) mode = 'replace';
    if (mode === 'push') lastEntry = now;
    env.write(hash, mode);
  };

  const ready = reader.then(
    (m) => {
      if (stopped) return;
      codec = m;
      // A link that could not be opened stays in the address bar (its notice says why) until the next
      // change, so what the user pasted is not lost; any other fragment is rewritten for the design now open.
      const start = env.hash();
      if (!(/^#pw/.test(start) && !m.decodeLink(start).ok)) write('replace');
    },
    () => {
      // Without the codec the address bar stays as it is; the autosave still keeps the design.
    },
  );
  const off = store.subscribe((s) => {
    if (s.dragging) return;
    if (s.design !== shown.design) {
      write(fromAddress ? 'replace' : 'push');
      return;
    }
    if (!sameSharedView(s.view, shown.view) && pending === null) {
      pending = env.setTimeout(() => write('replace'), VIEW_WRITE_MS);
    }
  });
  const stop = () => {
    stopped = true;
    off();
    offAddress?.();
    if (pending !== null) env.clearTimeout(pending);
  };
  return Object.assign(stop, { ready });
}
