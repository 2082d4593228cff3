/** The "System" page of the side column: entry, gain rule, per-root read-outs and the system written out. */
import { useCallback, useRef, useState } from 'react';
import { SystemEntry } from './entry/SystemEntry.tsx';
import { keepEntryDraft, readEntryDraft } from './entry/entryDraft.ts';
import { GainRuleControl } from './GainRuleControl.tsx';
import { RootTable } from './RootTable.tsx';
import { SystemForms } from './SystemForms.tsx';
import { lazyPart } from '../shared/lazyPart.tsx';

/** The warning about ill-conditioned typed coefficients shows only for typed designs: it loads after the first paint (prefetch.ts). */
export const typedWarning = lazyPart<object>(() => import('./TypedWarning.tsx').then((m) => m.TypedWarning));
const TypedWarning = typedWarning.Part;

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
