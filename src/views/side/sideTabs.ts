/**
 * The side column's pages. Each feature adds its page here (one line); the stability banner stays above
 * them all. Order is the order of the tab bar. Pages other than the first load their code when first opened
 * (lazyView), prefetched once the first view is on screen (prefetchSidePages, called by SideColumn).
 */
import type { ComponentType } from 'react';
import { SystemPage } from './SystemPage.tsx';
import { lazyView } from '../shared/lazyView.tsx';

const design = lazyView('Design page', () => import('./design/DesignPage.tsx').then((m) => m.DesignPage));
const target = lazyView('Target page', () => import('./target/TargetPage.tsx').then((m) => m.TargetPage));
const signal = lazyView('Signal page', () => import('../signal/SignalPage.tsx').then((m) => m.SignalPage));
const share = lazyView('Share page', () => import('./share/SharePage.tsx').then((m) => m.SharePage));

/** Fetches every lazily loaded page's code (call after the first paint). */
export function prefetchSidePages(): Promise<unknown> {
  return Promise.allSettled([design, target, signal, share].map((p) => p.prefetch()));
}

export interface SidePage {
  id: string;
  /** Tab label: short, our own words. */
  label: string;
  /** What the page is for, shown as the tab's tooltip. */
  title: string;
  Page: ComponentType;
}

export const SIDE_PAGES: SidePage[] = [
  { id: 'system', label: 'System', title: 'Type a system, set the gain, read each root', Page: SystemPage },
  { id: 'design', label: 'Design', title: 'Design from a requirement; edit the mask', Page: design.View },
  { id: 'target', label: 'Target', title: 'Sections, fixed point, bit-exact run, export', Page: target.View },
  {
    id: 'signal',
    label: 'Signal',
    title: 'Open or make a recording, download it filtered',
    Page: signal.View,
  },
  { id: 'share', label: 'Share', title: 'Links, files, library, compare, pictures', Page: share.View },
];
