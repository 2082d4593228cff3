/** The side column: stability at the top, then one page at a time (System, and the pages features add). */
import './side.css';
import { useState } from 'react';
import { StabilityBanner } from './StabilityBanner.tsx';
import { LinearPhaseNote } from '../linearPhase/linearPhaseSlot.tsx';
import { SideTabBar } from './SideTabBar.tsx';
import { SIDE_PAGES } from './sideTabs.ts';

export function SideColumn() {
  const [current, setCurrent] = useState(SIDE_PAGES[0]!.id);
  const page = SIDE_PAGES.find((p) => p.id === current) ?? SIDE_PAGES[0]!;
  return (
    <div className="pw-panel pw-side">
      <StabilityBanner />
      <LinearPhaseNote />
      {SIDE_PAGES.length > 1 && <SideTabBar pages={SIDE_PAGES} current={page.id} onSelect={setCurrent} />}
      <div
        className="pw-side-scroll"
        role="tabpanel"
        id={`pw-side-page-${page.id}`}
        aria-labelledby={`pw-side-tab-${page.id}`}
      >
        <page.Page />
      </div>
    </div>
  );
}
