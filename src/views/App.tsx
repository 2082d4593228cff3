/** The workbench page: header, the four linked regions, and the standing caution. */
import './app.css';
import { useEffect } from 'react';
import { workbenchStore } from '../store/useWorkbench.ts';
import { FrequencyPanel } from './frequency/FrequencyPanel.tsx';
import { ZPlanePanel } from './plane/ZPlanePanel.tsx';
import { FileDrop } from './shared/FileDrop.tsx';
import { PanelBoundary } from './shared/PanelBoundary.tsx';
import { installTestProbe } from './shared/testProbe.ts';
import { Caution } from './shell/Caution.tsx';
import { Header } from './shell/Header.tsx';
import { Notices } from './shell/Notices.tsx';
import { ScenarioNote } from './shell/ScenarioNote.tsx';
import { SideColumn } from './side/SideColumn.tsx';
import { TimePanel } from './time/TimePanel.tsx';
import { useKeyboardShortcuts } from './useKeyboardShortcuts.ts';
import { prefetchAfterFirstPaint } from './prefetch.ts';

export function App() {
  useKeyboardShortcuts();
  useEffect(() => installTestProbe(workbenchStore), []);
  useEffect(() => prefetchAfterFirstPaint(), []);
  return (
    <div className="pw-app">
      <Header />
      <Notices />
      <ScenarioNote />
      <main className="pw-grid">
        <div className="pw-area pw-area-plane">
          <PanelBoundary name="z-plane">
            <ZPlanePanel />
          </PanelBoundary>
        </div>
        <div className="pw-area pw-area-frequency">
          <PanelBoundary name="frequency view">
            <FrequencyPanel />
          </PanelBoundary>
        </div>
        <div className="pw-area pw-area-time">
          <PanelBoundary name="time view">
            <TimePanel />
          </PanelBoundary>
        </div>
        <aside className="pw-area pw-area-side" aria-label="System and checks">
          <PanelBoundary name="side column">
            <SideColumn />
          </PanelBoundary>
        </aside>
      </main>
      <Caution />
      <FileDrop />
    </div>
  );
}
