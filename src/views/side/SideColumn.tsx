/** The side column: stability at the top, then entry, gain, per-root read-outs and the system in every form. */
import './side.css';
import { useState } from 'react';
import { SystemEntry } from './entry/SystemEntry.tsx';
import { GainRuleControl } from './GainRuleControl.tsx';
import { RootTable } from './RootTable.tsx';
import { StabilityBanner } from './StabilityBanner.tsx';
import { SystemForms } from './SystemForms.tsx';

export function SideColumn() {
  const [text, setText] = useState('');
  return (
    <div className="pw-panel pw-side">
      <StabilityBanner />
      <div className="pw-side-scroll">
        <SystemEntry text={text} setText={setText} />
        <GainRuleControl />
        <RootTable />
        <SystemForms onEdit={setText} />
      </div>
    </div>
  );
}
