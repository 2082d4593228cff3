/** The workbench page: header, the four linked regions, and the standing caution. */
import './app.css';
import { useEffect } from 'react';
import { workbenchStore } from '../store/useWorkbench.ts';
import { FrequencyPanel } from './frequency/FrequencyPanel.tsx';
import { ZPlanePanel } from './plane/ZPlanePanel.tsx';
import { installTestProbe } from './shared/testProbe.ts';
import { Caution } from './shell/Caution.tsx';
import { Header } from './shell/Header.tsx';
import { ScenarioNote } from './shell/ScenarioNote.tsx';
import { SideColumn } from './side/SideColumn.tsx';
import { TimePanel } from './time/TimePanel.tsx';
import { useKeyboardShortcuts } from './useKeyboardShortcuts.ts';

export function App() {
  useKeyboardShortcuts();
  useEffect(() => installTestProbe(workbenchStore), []);
  return (
    <div className="pw-app">
      <Header />
      <ScenarioNote />
      <main className="pw-grid">
        <div className="pw-area pw-area-plane">
          <ZPlanePanel />
        </div>
        <div className="pw-area pw-area-frequency">
          <FrequencyPanel />
        </div>
        <div className="pw-area pw-area-time">
          <TimePanel />
        </div>
        <aside className="pw-area pw-area-side" aria-label="System and checks">
          <SideColumn />
        </aside>
      </main>
      <Caution />
    </div>
  );
}
