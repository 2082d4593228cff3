/** The side column: stability at the top, then entry, gain, per-root read-outs and the system in every form. */
import './side.css';
import { useCallback, useRef, useState } from 'react';
import { SystemEntry } from './entry/SystemEntry.tsx';
import { GainRuleControl } from './GainRuleControl.tsx';
import { RootTable } from './RootTable.tsx';
import { StabilityBanner } from './StabilityBanner.tsx';
import { SystemForms } from './SystemForms.tsx';

export function SideColumn() {
  const [text, setText] = useState('');
  const area = useRef<HTMLTextAreaElement>(null);
  // "Edit" on a written-out form: put its text in the box and bring the box into view, ready to change.
  const edit = useCallback((t: string) => {
    setText(t);
    requestAnimationFrame(() => {
      area.current?.scrollIntoView({ block: 'nearest' });
      area.current?.focus();
    });
  }, []);
  return (
    <div className="pw-panel pw-side">
      <StabilityBanner />
      <div className="pw-side-scroll">
        <SystemEntry text={text} setText={setText} area={area} />
        <GainRuleControl />
        <RootTable />
        <SystemForms onEdit={edit} />
      </div>
    </div>
  );
}
