/** The frequency view: magnitude, phase and group delay of the current system, with an exact-value cross-hair. */
import { useMemo, useRef, useState } from 'react';
import { selectZpk } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { useElementSize } from '../chart/useElementSize.ts';
import { PictureMenu } from '../pictures/PictureMenu.tsx';
import { FrequencyChart } from './FrequencyChart.tsx';
import { FrequencyControls } from './FrequencyControls.tsx';
import { FrequencyReadout } from './FrequencyReadout.tsx';
import { readAt } from '../../core/response/readAt.ts';
import { useSelectedRootHz } from './useSelectedRootHz.ts';
import '../chart/chart.css';
import './frequency.css';

export function FrequencyPanel() {
  const box = useRef<HTMLDivElement>(null);
  const { width, height } = useElementSize(box);
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const zpk = useWorkbench(selectZpk);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const phaseMode = useWorkbench((s) => s.view.phaseMode);
  const marker = useSelectedRootHz();
  // Re-evaluated on every design change, so the read-out follows a drag under a still pointer.
  const reading = useMemo(
    () => (cursorHz === null ? null : readAt(zpk, fs, Math.min(cursorHz, fs / 2))),
    [zpk, fs, cursorHz],
  );
  return (
    <section aria-label="frequency response" className="pw-panel pw-view pw-freq">
      <header className="pw-view-head">
        <h2>Response</h2>
        <FrequencyControls />
        <PictureMenu view="frequency" />
      </header>
      <FrequencyReadout reading={reading} phaseMode={phaseMode} />
      <div className="pw-chart-box" ref={box}>
        <FrequencyChart
          width={width}
          height={height}
          reading={reading}
          onCursor={setCursorHz}
          marker={marker}
        />
      </div>
    </section>
  );
}
