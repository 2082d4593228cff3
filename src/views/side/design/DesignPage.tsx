/** The "Design" page of the side column: the designer behind the roots, the design form, and the mask. */
import './design.css';
import { useRef, useState } from 'react';
import { selectDesignerStatus } from '../../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { defaultForm } from './designKinds.ts';
import { formOf } from './designForm.ts';
import { DesignerForm } from './DesignerForm.tsx';
import { DesignerStatus } from './DesignerStatus.tsx';
import { MaskSection } from './MaskSection.tsx';
import { PartsSection } from './PartsSection.tsx';
import { partsOf } from '../../../core/model/parts.ts';

export function DesignPage() {
  const [form, setForm] = useState(() => {
    const { design } = workbenchStore.getState();
    return design.designer ? formOf(design.designer) : defaultForm('notch', design.sampleRate);
  });
  const [editingIndex, setEditing] = useState<number | null>(null);
  // A part taken away meanwhile (removed, undone) is no longer edited.
  const partCount = useWorkbench((s) => partsOf(s.design).length);
  const editing = editingIndex !== null && editingIndex < partCount ? editingIndex : null;
  const formBox = useRef<HTMLDivElement>(null);
  const showForm = () =>
    requestAnimationFrame(() => {
      formBox.current?.scrollIntoView({ block: 'nearest' });
      formBox.current?.querySelector('input')?.focus();
    });
  const changeParameters = () => {
    const status = selectDesignerStatus(workbenchStore.getState());
    if (!status) return;
    setEditing(null);
    setForm(formOf(status.spec));
    showForm();
  };
  const editPart = (index: number) => {
    const spec = partsOf(workbenchStore.getState().design)[index]?.designer;
    if (!spec) return;
    setEditing(index);
    setForm(formOf(spec));
    showForm();
  };
  return (
    <>
      <DesignerStatus onChangeParameters={changeParameters} />
      <PartsSection onEdit={editPart} editing={editing} />
      <div ref={formBox}>
        <DesignerForm
          form={form}
          setForm={setForm}
          editingPart={editing}
          onStopEditing={() => setEditing(null)}
        />
      </div>
      <MaskSection />
    </>
  );
}
