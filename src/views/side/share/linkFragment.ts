/**
 * The address bar during sharing. Copying a link also writes it into the page's own fragment with
 * history.replaceState (no new browser-history entry, no hashchange), so the address bar shows the same
 * link. The next design edit removes it again, so the address bar never holds a stale design. The fragment
 * is not kept live on every edit: the page treats a design fragment as a link to open on load (one undo
 * step), and the autosave already restores the session after a reload.
 */
import { workbenchStore } from '../../../store/useWorkbench.ts';

let release: (() => void) | null = null;

function replaceFragment(fragment: string): void {
  const { pathname, search } = window.location;
  window.history.replaceState(window.history.state, '', pathname + search + (fragment ? `#${fragment}` : ''));
}

/** Shows `fragment` in the address bar until the design next changes. */
export function showLinkUntilEdit(fragment: string): void {
  release?.();
  replaceFragment(fragment);
  const design = workbenchStore.getState().design;
  const off = workbenchStore.subscribe((s) => {
    if (s.design === design) return;
    if (window.location.hash === `#${fragment}`) replaceFragment('');
    off();
    release = null;
  });
  release = off;
}
