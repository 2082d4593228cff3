/** The "System" page of the side column: entry, gain rule, per-root read-outs and the system written out. */
import { useCallback, useRef, useState } from 'react';
import { SystemEntry } from './entry/SystemEntry.tsx';
import { keepEntryDraft, readEntryDraft } from './entry/entryDraft.ts';
import { GainRuleControl } from './GainRuleControl.tsx';
import { RootTable } from './RootTable.tsx';
import { SystemForms } from './SystemForms.tsx';
import { TypedWarning } from './TypedWarning.tsx';

export function SystemPage() {
  const [text, setTextState] = useState(readEntryDraft);
  const setText = useCallback((t: string) => {
    setTextState(t);
    keepEntryDraft(t);
  }, []);
  const area = useRef<HTMLTextAreaElement>(null);
  // "Edit" on a written-out form: put its text in the box and bring the box into view, ready to change.
  const edit = useCallback(
    (t: string) => {
      setText(t);
      requestAnimationFrame(() => {
        area.current?.scrollIntoView({ block: 'nearest' });
        area.current?.focus();
      });
    },
    [setText],
  );
  return (
    <>
      <SystemEntry text={text} setText={setText} area={area} />
      <TypedWarning />
      <GainRuleControl />
      <RootTable />
      <SystemForms onEdit={edit} />
    </>
  );
}
