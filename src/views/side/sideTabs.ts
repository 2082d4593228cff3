/**
 * The side column's pages. Each feature adds its page here (one line); the stability banner stays above
 * them all. Order is the order of the tab bar.
 */
import type { ComponentType } from 'react';
import { SignalPage } from '../signal/SignalPage.tsx';
import { SystemPage } from './SystemPage.tsx';
import { TargetPage } from './firmware/TargetPage.tsx';
import { FilesPage } from './files/FilesPage.tsx';
import { DesignPage } from './design/DesignPage.tsx';

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
  { id: 'design', label: 'Design', title: 'Design from a requirement; edit the mask', Page: DesignPage },
  { id: 'target', label: 'Target', title: 'Sections, fixed point, bit-exact run, export', Page: TargetPage },
  {
    id: 'signal',
    label: 'Signal',
    title: 'Open or make a recording, download it filtered',
    Page: SignalPage,
  },
  { id: 'files', label: 'Share', title: 'Links, files, library, compare, pictures', Page: FilesPage },
];
